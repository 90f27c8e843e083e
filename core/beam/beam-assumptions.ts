import type { JobDocument } from "../schema/job.js";
import { fromCore, unitLabel } from "../units/quantity.js";
import type { BeamAnalysis } from "./analyse-beam.js";
import { combinationSet } from "./combinations.js";
import { windDurationOf } from "./load-categories.js";

/** What the result says about the member's supports, analysis, combinations and patterns (job in core units). */
export function beamAssumptions(job: JobDocument, beam: BeamAnalysis, set: Pick<ReturnType<typeof combinationSet>, "notes" | "omitted"> = combinationSet(job.beam, job.combinations, beam.selfWeight)): string[] {
  const at = (mm: number) => `${Number(fromCore(mm, "span", job.units).toPrecision(4))} ${unitLabel("span", job.units)}`;
  const supports = beam.supports.map((s) => `${s.type} at x = ${at(s.x)}`).join(", ");
  const overhangs = beam.regions.filter((r) => r.kind === "overhang").map((r) => r.label);
  const simple = beam.supports.length === 2 && beam.supports[0]!.x === 0 && beam.supports[1]!.x === beam.length && !beam.supports.some((s) => s.type === "fixed");
  const out: string[] = [
    simple
      ? `The member is simply supported (${supports}).`
      : `Supports: ${supports}${overhangs.length ? `; overhangs: ${overhangs.join(", ")}` : ""}. Analysed as one continuous prismatic member by the stiffness method (exact for constant E·I; shear deformation neglected; supports rigid).`,
    "Pinned and roller supports both stop vertical movement and leave rotation free; under transverse loads they act alike. A fixed support also stops rotation.",
  ];
  const { notes, omitted } = set;
  out.push(...notes);
  if (omitted.length > 0) {
    out.push(
      `${omitted.length} combination${omitted.length === 1 ? "" : "s"} left out because ${omitted.length === 1 ? "it cannot" : "they cannot"} govern: the same loads as one kept, or factors between those of two others (their actions then lie between theirs at every point, whatever the signs) or a fraction of another's, where the others hold no load category it lacks (so no shorter load duration: C_D and k_mod no higher) and have no higher λ in any live-load pattern: ${omitted.map((o) => `${o.id} ${o.name} (${o.reason})`).join("; ")}.`,
    );
  }
  out.push(
    `Load-duration class of each combination: that of its shortest-duration load (EN 1995-1-1 §3.1.3(2)), with dead permanent, live medium-term, roof live short-term, snow short-term, wind ${windDurationOf(job.beam) === "short" ? "short-term" : "instantaneous"} (${job.beam.windDuration === undefined ? "the default; the job may choose instantaneous in beam.windDuration" : "as the job chooses in beam.windDuration"}) (EN 1995-1-1 Table 2.2 as commonly applied; national annexes may class snow and wind differently), or as the job's own categories state.`,
    "NDS LRFD time effect factor λ by the combination's form (NDS-2018 Table N3, from memory): 1.4D 0.6; 1.6L principal 0.8 for live load from occupancy (the built-in live category), 0.7 from storage (a category of the job's own acting as live load with a long-term duration), 1.25 from impact (instantaneous; at most 1.0 for connections); 1.6Lr or 1.6S principal 0.8; 1.0W principal 1.0. Where the principal load is absent (a selection without it, a pattern that leaves it off) or the set names none (loads as entered, EN 1990, a table of the job's own), the least λ any load present would take as principal.",
  );
  if (beam.patterned.length > 0) {
    out.push(
      `Live-load patterns: ${beam.patterned.join(", ")} is placed span by span (each span between supports and each overhang on or off). For every combination the arrangements listed are all those that give the largest or smallest V or M somewhere along the member: at each point the worst arrangement loads exactly the regions whose own effect there has that sign, so this is the exact envelope over every arrangement. Each arrangement is its own combination (id …/P followed by the loaded spans).`,
    );
  }
  if (beam.service) {
    out.push(
      "Deflection is checked under service loads, each load as entered with factor 1.0: all loads acting together (a conservative stand-in for the serviceability combinations), and the live-limit categories alone; patterned categories take the arrangement that gives the largest deflection at each point. E·I of the transformed section, short-term; a cantilever or overhang is checked on twice its length (common practice).",
    );
  }
  return out;
}

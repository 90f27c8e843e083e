import type { JobDocument } from "../schema/job.js";
import { fromCore, unitLabel } from "../units/quantity.js";
import type { BeamAnalysis } from "./analyse-beam.js";
import { combinationSet } from "./combinations.js";
import { windDurationOf } from "./load-categories.js";

/** What the result says about the member's supports, analysis, combinations and patterns (job in core units). */
export function beamAssumptions(job: JobDocument, beam: BeamAnalysis): string[] {
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
  const { notes, omitted } = combinationSet(job.beam, job.combinations, beam.selfWeight);
  out.push(...notes);
  if (omitted.length > 0) out.push(`Combinations left out because they cannot govern (their factors lie between those of two others, so their actions lie between theirs at every point, or are a fraction of another's, so their actions are never larger; and their load duration is no shorter): ${omitted.map((o) => `${o.id} ${o.name} (${o.reason})`).join("; ")}.`);
  out.push(
    `Load-duration class of each combination: that of its shortest-duration load (EN 1995-1-1 §3.1.3(2)), with dead permanent, live medium-term, roof live short-term, snow short-term, wind ${windDurationOf(job.beam) === "short" ? "short-term" : "instantaneous"} (${job.beam.windDuration === undefined ? "the default; the job may choose instantaneous in beam.windDuration" : "as the job chooses in beam.windDuration"}) (EN 1995-1-1 Table 2.2 as commonly applied; national annexes may class snow and wind differently), or as the job's own categories state.`,
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

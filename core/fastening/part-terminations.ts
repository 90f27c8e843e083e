import type { BeamAnalysis, SectionStretch } from "../beam/analyse-beam.js";
import { momentAt } from "../beam/member-actions.js";
import type { JobDocument } from "../schema/job.js";
import type { DesignResult, Schedule, WeldResult } from "../schema/result.js";
import { kindOf } from "../connector/registry.js";
import { inJobUnits } from "../units/format.js";
import { inShownUnits, ownerOfFamilies } from "../units/shown-units.js";
import type { MemberJoint } from "./member-joints.js";

type Termination = DesignResult["terminations"][number];

/** Largest |M| over every combination at x, N·mm. */
function momentEnvelope(beam: BeamAnalysis, x: number): number {
  return Math.max(...beam.results.flatMap((r) => [Math.abs(momentAt(r.actions, x, "left")), Math.abs(momentAt(r.actions, x, "right"))]));
}

/** Elastic moment the section carries at the strengths given: min over its materials of f_b·I/(n·c); null when a material has no bending strength. */
function momentCapacity(stretch: SectionStretch): number | null {
  const s = stretch.section;
  let least = Infinity;
  for (const p of s.parts) {
    const fb = p.material.strength.bending;
    if (fb === undefined) return null;
    const c = Math.max(...p.rects.flatMap((r) => [Math.abs(r.y1 - s.centroidY), Math.abs(r.y0 - s.centroidY)]));
    least = Math.min(least, (fb * s.secondMoment) / (p.n * c));
  }
  return least;
}

/**
 * Ends of parts that stop short of the member's ends (partial-length cover plates). At each such end:
 * the theoretical cut-off, where the section without the part first carries the moment (elastic, at the
 * strengths given); the part's force there, F = M·Q_p/I of the section with it; and the connectors
 * between the cut-off and the part's end, which must develop F (AISC 360-16 §F13.3 [M]). A welded
 * part must also run on past the cut-off by a′ = 2w (no weld across the plate's end, eq. F13-6 [M]),
 * and the welds within a′ of its end must develop the force at that section.
 */
export function partTerminations(p: {
  job: JobDocument;
  beam: BeamAnalysis;
  stretches: SectionStretch[];
  joints: { joint: MemberJoint; schedule?: Schedule; weld?: WeldResult; rowResistance: number | null; weldResistance: number | null }[];
}): { terminations: Termination[]; notChecked: string[] } {
  const L = p.beam.length;
  const out: Termination[] = [];
  const notChecked: string[] = [];
  const span = (x: number) => inJobUnits(x, "span", p.job.units);
  for (const { joint, schedule, weld, rowResistance, weldResistance } of p.joints) {
    if (!joint.extent) continue;
    const held = joint.joint.held;
    const part = p.job.parts.find((x) => held.includes(x.id) && x.extent)?.id ?? held[0]!;
    const width = joint.joint.contactWidth;
    for (const end of ["left", "right"] as const) {
      const at = end === "left" ? joint.extent.from : joint.extent.to;
      if (at <= 1e-9 * L || at >= L * (1 - 1e-9)) continue;
      const inward = end === "left" ? 1 : -1;
      const outside = p.stretches.find((s) => (end === "left" ? Math.abs(s.x1 - at) <= 1e-9 * L : Math.abs(s.x0 - at) <= 1e-9 * L))!;
      const inside = joint.stretches.find((s) => (end === "left" ? Math.abs(s.from - at) <= 1e-9 * L : Math.abs(s.to - at) <= 1e-9 * L))!;
      const capacity = momentCapacity(outside);
      const far = end === "left" ? joint.extent.to : joint.extent.from;
      const mid = (at + far) / 2;
      let cutoff: number | null = null;
      let note = "";
      let needed = true;
      if (capacity === null) {
        notChecked.push(`The ${end} end of ${part} (joint ${joint.joint.id}, at ${span(at)}): with no bending strength given for every material of the section without it, its theoretical cut-off and the force to develop there are not found.`);
        continue;
      } else if (momentEnvelope(p.beam, at) > capacity * (1 + 1e-9)) {
        cutoff = at;
        note = `The section without ${part} is over its bending strength at the part's end (${span(at)}): the part must run further toward the member's end.`;
      } else {
        // Walk inward until the envelope first exceeds the reduced section's capacity, then refine.
        const steps = 400;
        let lo = at;
        let hi: number | null = null;
        for (let i = 1; i <= steps; i++) {
          const x = at + ((mid - at) * i) / steps;
          if (momentEnvelope(p.beam, x) > capacity) {
            hi = x;
            break;
          }
          lo = x;
        }
        if (hi === null) {
          needed = false;
          note = `The section without ${part} carries the moment over the whole part: it is not needed for strength, and no force has to be developed at its ends.`;
        }
        else {
          let over: number = hi;
          for (let k = 0; k < 50; k++) {
            const m: number = (lo + over) / 2;
            if (momentEnvelope(p.beam, m) > capacity) over = m;
            else lo = m;
          }
          cutoff = lo;
        }
      }
      const forceAt = cutoff ?? at;
      const force = momentEnvelope(p.beam, forceAt) * inside.flowFactor;
      const available = Math.abs(forceAt - at);
      let provided = 0;
      let connectors = "";
      let required: number | null = null;
      let developedAt = forceAt;
      let attachment: { allowed: boolean; reason: string } | undefined;
      if (schedule && rowResistance !== null) {
        const kind = kindOf(joint.connector);
        attachment = kind.mechanism === "discrete" ? kind.plateEndAttachment?.(joint.connector) : undefined;
        const rows = schedule.positions.filter((x) => (x - at) * inward >= -1e-9 && (forceAt - x) * inward >= -1e-9).length;
        provided = rows * rowResistance;
        // Per connector in the unit the page and worksheet show it in (kips for steel joined to steel in US units).
        const family = (id: string) => p.job.materials.find((m) => m.id === p.job.parts.find((x) => x.id === id)?.material)?.family ?? "other";
        const owner = ownerOfFamilies(joint.joint.lines.flatMap((l) => [l.a, l.b]).map(family));
        connectors = `${rows} row(s) × ${schedule.rows * schedule.lineCount} × ${inShownUnits(rowResistance / (schedule.rows * schedule.lineCount), "connectorForce", p.job.units, owner)} between the end and the cut-off`;
      } else if (weld && weldResistance !== null) {
        required = 2 * width;
        const reach = Math.min(required, Math.abs(far - at));
        developedAt = at + inward * reach;
        const fraction = weldFractionWithin(weld, at, developedAt);
        provided = weldResistance * reach * fraction;
        connectors = `${weld.fillets * weld.lineCount} fillet(s) over a′ = 2w = ${inJobUnits(required, "length", p.job.units)} from the end${fraction < 1 ? ` (${(fraction * 100).toFixed(0)} % welded)` : ""}`;
      }
      const demand = !needed ? 0 : weld ? momentEnvelope(p.beam, developedAt) * inside.flowFactor : force;
      const lengthOk = required === null || cutoff === null || available >= required - 1e-9;
      const utilisation = demand > 0 ? (provided > 0 ? demand / provided : null) : 0;
      const overstressedEnd = cutoff !== null && cutoff === at && capacity !== null;
      const attachmentRefused = needed && attachment !== undefined && !attachment.allowed;
      out.push({
        joint: joint.joint.id,
        part,
        end,
        at,
        cutoff,
        force: demand,
        available,
        required,
        capacity: provided,
        connectors: connectors || "no connectors of a kind that can develop a force",
        utilisation,
        passes: utilisation !== null && utilisation <= 1 + 1e-9 && lengthOk && !overstressedEnd && !attachmentRefused,
        reference: weld
          ? "AISC 360-16 §F13.3, eq. (F13-6): a′ = 2w without a weld across the plate's end [M]"
          : `AISC 360-16 §F13.3: connectors between the theoretical cut-off and the plate's end develop the plate's force${attachment ? "; the extension is attached by slip-critical bolts or welds" : ""} [M]`,
        note: [note, !lengthOk ? `The part runs ${span(available)} past the cut-off; a′ = ${inJobUnits(required!, "length", p.job.units)} is needed.` : "", attachmentRefused ? attachment!.reason : ""].filter(Boolean).join(" "),
      });
    }
  }
  return { terminations: out, notChecked };
}

/** Fraction of the joint length between a and b that is welded (continuous zones 1, intermittent segment/pitch). */
function weldFractionWithin(weld: WeldResult, a: number, b: number): number {
  const lo = Math.min(a, b);
  const hi = Math.max(a, b);
  let welded = 0;
  for (const z of weld.zones) {
    const overlap = Math.min(hi, z.to) - Math.max(lo, z.from);
    if (overlap <= 0) continue;
    welded += overlap * (z.pattern === "continuous" ? 1 : z.segmentLength! / z.pitch!);
  }
  return hi > lo ? welded / (hi - lo) : 1;
}

import type { BeamAnalysis } from "../beam/analyse-beam.js";
import type { PlyStretch } from "../fastening/side-load-transfer.js";
import { plyStiffness } from "../multi-ply/ply-shares.js";
import type { JobDocument } from "../schema/job.js";
import type { MemberCheck } from "../schema/result.js";
import { inJobUnits } from "../units/format.js";

/** Bearing length taken when the job gives none, mm: 3 in [CP], in either unit system (so that a job and its converted twin design the same). */
export const DEFAULT_BEARING_LENGTH = 76.2;

const INCH = 25.4;

/** NDS-2018 or EN 1995-1-1: by the job's combinations, then its connectors' standards, then its basis (allowable: NDS). */
function bearingStandard(job: JobDocument): "NDS" | "EN" {
  const set = job.combinations.set;
  if (set.startsWith("en1990")) return "EN";
  if (set.startsWith("asce7")) return "NDS";
  const named = job.connectors.map((c) => (c as { standard?: string }).standard ?? "");
  if (named.some((s) => s.startsWith("EN"))) return "EN";
  if (named.some((s) => s.startsWith("NDS"))) return "NDS";
  return job.basis === "allowable" ? "NDS" : "EN";
}

/**
 * Bearing perpendicular to the grain of each timber ply that reaches the bottom, at each support, on its share of
 * the reaction: the plies that bear take it in proportion to their E·I (a ply that does not reach the bottom hands
 * its share to them through the connectors). NDS-2018 §3.10.2: f_c⊥ = R_j/(b_j·ℓ_b) ≤ F_c⊥·C_b, with the bearing area
 * factor C_b = (ℓ_b + 0.375 in)/ℓ_b of §3.10.4 for ℓ_b < 6 in at least 3 in from the member's end [M]; EN 1995-1-1
 * §6.1.5: σ_c,90 = R_j/(b_j·ℓ_ef) ≤ k_c,90·f_c,90, ℓ_ef = ℓ + 30 mm (not more than ℓ) on each side where the member
 * runs on, k_c,90 = 1.0 [M] (the clause allows more for some members on discrete supports; not taken).
 */
export function plyBearingChecks(job: JobDocument, beam: BeamAnalysis, stretches: PlyStretch[]): { checks: MemberCheck[]; notChecked: string[]; assumptions: string[] } {
  const checks: MemberCheck[] = [];
  const notChecked: string[] = [];
  const assumptions: string[] = [];
  const L = beam.length;
  const standard = bearingStandard(job);
  const given = job.beam.bearingLength;
  const lb = given ?? DEFAULT_BEARING_LENGTH;
  const len = (mm: number) => inJobUnits(mm, "length", job.units);
  assumptions.push(
    given === undefined
      ? `Each support bears over ${len(lb)} along the member (none given in the job; common practice for a beam on a wall plate or post), starting at the member's end at an end support.`
      : `Each support bears over ${len(lb)} along the member (as given), starting at the member's end at an end support.`,
  );
  const supports = [...new Set(beam.results.flatMap((r) => r.reactions.map((x) => x.x)))].sort((a, b) => a - b);
  const materials = new Map(job.materials.map((m) => [m.id, m]));
  const partsById = new Map(job.parts.map((p) => [p.id, p]));
  const plateNotes = new Set<string>();
  type Worst = { demand: number; capacity: number; combination: string; at: number; reference: string };
  const worst = new Map<string, Worst>();
  const missing = new Set<string>();
  for (const x of supports) {
    const s = stretches.find((t) => x >= t.x0 - 1e-9 * L && x <= t.x1 + 1e-9 * L)!;
    const plies = s.plies;
    const bearing = plies.plies.map((p) => p.bearsAtBottom !== false);
    const total = plies.plies.reduce((sum, p, j) => sum + (bearing[j] ? plyStiffness(p) : 0), 0);
    const atEnd = x <= 1e-9 * L || x >= L * (1 - 1e-9);
    plies.parts.forEach((id, j) => {
      const material = materials.get(partsById.get(id)!.material)!;
      if (material.family === "steel") {
        if (bearing[j]) notChecked.push(`Plate ${id} reaches the bottom of the member and bears on the support at ${inJobUnits(x, "span", job.units)} on its share of the reaction: the plate's local yielding and the support's bearing under its edge.`);
        else plateNotes.add(`Plate ${id} does not reach the bottom of the member, so it does not bear on the support at ${inJobUnits(x, "span", job.units)}: its share of the reaction passes to the plies that do through the connectors within half the member depth of the support (designed with the interface).`);
        return;
      }
      if (!bearing[j]) return;
      const fc = material.strength.compressionPerp;
      if (fc === undefined) {
        missing.add(`${id} (${material.name})`);
        return;
      }
      const b = plies.plies[j]!.thickness;
      let capacity: number;
      let area: number;
      let reference: string;
      if (standard === "NDS") {
        const cb = !atEnd && lb < 6 * INCH && Math.min(x, L - x) - lb / 2 >= 3 * INCH ? (lb + 0.375 * INCH) / lb : 1;
        capacity = fc * cb;
        area = b * lb;
        reference = `NDS-2018 §3.10.2: f_c⊥ = R/(b·ℓ_b), b = ${len(b)}, ℓ_b = ${len(lb)}; F′_c⊥ = F_c⊥·C_b, C_b = ${cb.toFixed(3)} (§3.10.4${cb === 1 ? ": 1.0 at the member's end or for ℓ_b ≥ 6 in" : ""}) [M]`;
      } else {
        const extension = Math.min(30, lb) * (atEnd ? 1 : 2);
        capacity = fc;
        area = b * (lb + extension);
        reference = `EN 1995-1-1 §6.1.5: σ_c,90 = F/(b·ℓ_ef), b = ${len(b)}, ℓ_ef = ${len(lb)} + ${len(extension)}; k_c,90 = 1.0 [M]`;
      }
      for (const r of beam.results) {
        const R = Math.abs(r.reactions.find((y) => Math.abs(y.x - x) <= 1e-9 * L)?.R ?? 0);
        const share = plyStiffness(plies.plies[j]!) / total;
        const demand = (R * share) / area;
        const before = worst.get(id);
        if (!before || demand / capacity > before.demand / before.capacity) worst.set(id, { demand, capacity, combination: r.combination.id, at: x, reference });
      }
    });
  }
  for (const [id, w] of worst) {
    const part = partsById.get(id)!;
    checks.push({
      id: `bearing-ply-${id}`,
      title: `Bearing perpendicular to grain at the supports, ${part.name || id} (${materials.get(part.material)!.name})`,
      quantity: "stress",
      demand: w.demand,
      capacity: w.capacity,
      utilisation: w.demand / w.capacity,
      passes: w.demand <= w.capacity * (1 + 1e-9),
      combination: w.combination,
      at: w.at,
      reference: `${w.reference}; the ply's share of the reaction by E·I among the plies that reach the bottom`,
    });
  }
  if (missing.size > 0) notChecked.push(`Bearing perpendicular to grain at the supports of ${[...missing].join(", ")}: no compression perpendicular to grain strength (strength.compressionPerp) given.`);
  return { checks, notChecked, assumptions: [...assumptions, ...plateNotes] };
}

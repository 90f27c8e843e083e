import type { BeamAnalysis } from "../beam/analyse-beam.js";
import { deflectionChecks } from "../beam/deflection-checks.js";
import { maxAbsShear, momentExtremes, type Extreme } from "../beam/member-actions.js";
import type { JobDocument } from "../schema/job.js";
import type { MemberCheck } from "../schema/result.js";
import type { SectionModel } from "../section/section-model.js";
import { fromCore, unitLabel } from "../units/quantity.js";
import type { ProfilePoint } from "../section/stress-profile.js";
import type { StiffnessFactor } from "../fastening/composite-design.js";
import type { MultiPly } from "../fastening/side-load-transfer.js";
import { plyShares } from "../multi-ply/ply-shares.js";

export interface MemberChecks {
  checks: MemberCheck[];
  notChecked: string[];
}

export const SUPPORT_BEARING = "Bearing at the supports and under point loads, and the supports' own connections.";
const BENDING = "σ = n·M·y/I (elastic bending of the transformed section)";
const SHEAR = "τ = V·Q/(I·t) (elastic shear stress, averaged over the width at each level)";
const PLY_BENDING = "σ_j = s_j·M·c_j/I_j, s_j = E_j I_j/Σ E I (each side-by-side ply on its share of the moment)";
const PLY_SHEAR = "τ_j = 1.5·s_j·V/(t_j·d_j) (each side-by-side ply on its share of the shear, rectangular ply)";

/**
 * Bending and shear stress per material and deflection, for every combination. Where the section
 * changes along the member, call once per stretch with its `range` (stresses only there) and ask for
 * the deflection checks once.
 */
export function memberChecks(
  job: JobDocument,
  section: SectionModel,
  beam: BeamAnalysis,
  profile: ProfilePoint[],
  stiffness: StiffnessFactor | null = null,
  range: { from: number; to: number; label: string } | null = null,
  withDeflection = true,
  plies: MultiPly | null = null,
): MemberChecks {
  const a = range?.from ?? 0;
  const b = range?.to ?? beam.length;
  const where = range ? `, ${range.label}` : "";
  const checks: MemberCheck[] = [];
  const notChecked: string[] = [];
  const materials = [...new Map(section.parts.map((p) => [p.material.id, p.material])).values()];
  const I = section.secondMoment;
  // Each combination's extremes over [a, b], the same for every material: worked out once.
  const moments = beam.results.map(() => null as { max: Extreme; min: Extreme } | null);
  const shears = beam.results.map(() => null as Extreme | null);
  const momentsOf = (i: number) => (moments[i] ??= momentExtremes(beam.results[i]!.actions, a, b));
  const shearOf = (i: number) => (shears[i] ??= maxAbsShear(beam.results[i]!.actions, a, b));

  // Side-by-side plies: each ply on its own share (the transformed section's shear, averaged over the
  // whole width at a level, would understate a stiff plate's shear and overstate the timber's).
  if (plies) plyChecks(plies, section, beam, a, b, where, checks, notChecked);
  for (const material of plies ? [] : materials) {
    const parts = section.parts.filter((p) => p.material.id === material.id);
    const names = parts.map((p) => p.name || p.id).join(", ");
    const fb = material.strength.bending;
    if (fb === undefined) notChecked.push(`Bending stress in ${material.name} (${names}): no bending strength given.`);
    else {
      let worst = { demand: 0, combination: "", at: 0 as number | null };
      const fibres = parts.map((p) => Math.max(...p.rects.flatMap((rect) => [Math.abs(rect.y1 - section.centroidY), Math.abs(rect.y0 - section.centroidY)])));
      beam.results.forEach((r, i) => {
        const { max, min } = momentsOf(i);
        parts.forEach((p, q) => {
          const fibre = fibres[q]!;
          for (const m of [max, min]) {
            const sigma = (p.n * Math.abs(m.value) * fibre) / I;
            if (sigma > worst.demand) worst = { demand: sigma, combination: r.combination.id, at: m.x };
          }
        });
      });
      checks.push(stressCheck(`bending-${material.id}`, `Bending stress, ${material.name} (${names})${where}`, worst, fb, BENDING));
    }
    const fv = material.strength.shear;
    if (fv === undefined) notChecked.push(`Shear stress in ${material.name} (${names}): no shear strength given.`);
    else {
      const tol = 1e-9 * (section.bounds.y1 - section.bounds.y0);
      const factor = Math.max(0, ...profile.filter((pt) => parts.some((p) => p.rects.some((r) => occupies(r, pt, tol)))).map((pt) => pt.factor));
      let worst = { demand: 0, combination: "", at: 0 as number | null };
      beam.results.forEach((r, i) => {
        const v = shearOf(i);
        if (v.value * factor > worst.demand) worst = { demand: v.value * factor, combination: r.combination.id, at: v.x };
      });
      checks.push(stressCheck(`shear-${material.id}`, `Shear stress, ${material.name} (${names})${where}`, worst, fv, SHEAR));
    }
  }

  if (withDeflection) {
    const deflection = deflectionChecks(beam, job.beam.deflectionLimits, (mm) => `${Number(fromCore(mm, "span", job.units).toPrecision(4))} ${unitLabel("span", job.units)}`, stiffness);
    checks.push(...deflection.checks);
    notChecked.push(...deflection.notChecked);
  }
  const panelWebs = section.parts.filter(isPanelWeb);
  if (panelWebs.length > 0) {
    notChecked.push(
      `Shear deformation of the panel webs (${panelWebs.map((p) => p.name || p.id).join(", ")}): the deflections are from bending alone (E·I); a panel web's low shear modulus can add materially to them, most for short, deep members and under heavy point loads near the supports.`,
    );
  }
  notChecked.push(
    "Lateral-torsional stability and lateral bracing of the compression edge.",
    SUPPORT_BEARING,
    "Local buckling of thin plates and webs, and web crippling.",
    "Fire resistance, vibration and dynamic response.",
    "Splices and end joints within any part, holes and notches.",
    "Withdrawal, pull-through and head capacity of connectors, and splitting of the parts.",
  );
  return { checks, notChecked };
}

function plyChecks(plies: MultiPly, section: SectionModel, beam: BeamAnalysis, a: number, b: number, where: string, checks: MemberCheck[], notChecked: string[]): void {
  const shares = plyShares(plies.plies);
  plies.parts.forEach((id, j) => {
    const part = section.parts.find((p) => p.id === id)!;
    const ply = plies.plies[j]!;
    const name = `${part.name || part.id} (${part.material.name})`;
    const I = (ply.thickness * ply.depth ** 3) / 12;
    const fb = part.material.strength.bending;
    if (fb === undefined) notChecked.push(`Bending stress in ${name}: no bending strength given.`);
    else {
      let worst = { demand: 0, combination: "", at: 0 as number | null };
      for (const r of beam.results) {
        const { max, min } = momentExtremes(r.actions, a, b);
        for (const m of [max, min]) {
          const sigma = (shares[j]! * Math.abs(m.value) * (ply.depth / 2)) / I;
          if (sigma > worst.demand) worst = { demand: sigma, combination: r.combination.id, at: m.x };
        }
      }
      checks.push(stressCheck(`bending-ply-${id}`, `Bending stress, ${name}${where}`, worst, fb, PLY_BENDING));
    }
    const fv = part.material.strength.shear;
    if (fv === undefined) notChecked.push(`Shear stress in ${name}: no shear strength given.`);
    else {
      let worst = { demand: 0, combination: "", at: 0 as number | null };
      for (const r of beam.results) {
        const v = maxAbsShear(r.actions, a, b);
        const tau = (1.5 * shares[j]! * v.value) / (ply.thickness * ply.depth);
        if (tau > worst.demand) worst = { demand: tau, combination: r.combination.id, at: v.x };
      }
      checks.push(stressCheck(`shear-ply-${id}`, `Shear stress, ${name}${where}`, worst, fv, PLY_SHEAR));
    }
  });
}

/** A web: a part of a panel material (plywood, OSB) standing deeper than it is thick. */
function isPanelWeb(part: SectionModel["parts"][number]): boolean {
  if (part.material.family !== "panel") return false;
  const xs = part.rects.flatMap((r) => [r.x0, r.x1]);
  const ys = part.rects.flatMap((r) => [r.y0, r.y1]);
  return Math.max(...ys) - Math.min(...ys) > Math.max(...xs) - Math.min(...xs);
}

function occupies(r: { y0: number; y1: number }, pt: ProfilePoint, tol: number): boolean {
  if (pt.side === "below") return r.y0 < pt.y - tol && pt.y <= r.y1 + tol;
  if (pt.side === "above") return r.y0 <= pt.y + tol && pt.y < r.y1 - tol;
  return r.y0 <= pt.y + tol && pt.y <= r.y1 + tol;
}

function stressCheck(id: string, title: string, worst: { demand: number; combination: string; at: number | null }, capacity: number, reference: string): MemberCheck {
  return {
    id,
    title,
    quantity: "stress",
    demand: worst.demand,
    capacity,
    utilisation: worst.demand / capacity,
    passes: worst.demand <= capacity * (1 + 1e-9),
    combination: worst.combination,
    at: worst.at,
    reference,
  };
}

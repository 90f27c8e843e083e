import { gammaFactor, jointedResponse } from "../composite/gamma-method.js";
import { rectangularLayer, type FlangeName, type JointedSection } from "../composite/jointed-section.js";
import { ec5DurationOf, ec5Kmod } from "../connector/timber/ec5-factors.js";
import type { MemberCheck } from "../schema/result.js";
import { inJobUnits } from "../units/format.js";
import { columnCheck, finiteInteraction, step, type Axis, type ColumnDesign, type ColumnJob, type ColumnJointDemand, type ColumnRule, designStart } from "./column-rules.js";
import { solidSecondMoment, timberLaminations } from "./timber-laminations.js";

const REF = "EN 1995-1-1 Annex C [M]";

/** k_c of EN 1995-1-1 eq. (6.25)–(6.29) [M]: 1 up to λ_rel = 0.3; β_c 0.2 solid timber, 0.1 glulam and LVL. */
export function ec5BucklingFactor(lambdaRel: number, betaC: number): number {
  if (lambdaRel <= 0.3) return 1;
  const k = 0.5 * (1 + betaC * (lambdaRel - 0.3) + lambdaRel ** 2);
  return 1 / (k + Math.sqrt(k * k - lambdaRel ** 2));
}

/** V_d of EN 1995-1-1 eq. (C.5) [M]: the shear the connectors carry for the column's imperfection. N. */
export function ec5ImperfectionShear(axial: number, kc: number, lambdaEf: number): number {
  if (lambdaEf < 30) return axial / (120 * kc);
  if (lambdaEf < 60) return (axial * lambdaEf) / (3600 * kc);
  return axial / (60 * kc);
}

export const ec5MechanicallyJointed: ColumnRule = {
  id: "en1995-annex-c",
  title: "Mechanically jointed column",
  standard: "EN 1995-1-1 Annex C",
  spacingInStiffness: true,
  suits: (c) => c.joints.length > 0 && c.joints.every((j) => "standard" in j.connector && j.connector.standard === "EN1995-1-1"),
  design: (c) => design(c),
};

function design(c: ColumnJob): ColumnDesign {
  const { laminations: l, conditions } = timberLaminations(c, "EN 1995-1-1 Annex C, C.1 [M]");
  const n = l?.parts.length ?? c.section.parts.length;
  conditions.push(
    { condition: `two or three laminations, the layers of Annex B (${n})`, met: n >= 2 && n <= 3, clause: "EN 1995-1-1 Annex B, B.1.1 [M]" },
    { condition: "every joint's connectors give a slip modulus K_u", met: c.joints.length > 0 && c.joints.every((j) => j.slip !== null && j.spacing !== null), clause: "EN 1995-1-1 §7.1, Annex B [M]" },
    { condition: "the basis is factored (design values)", met: c.job.basis === "factored", clause: "EN 1990 §6.4 [M]" },
  );
  const base = designStart(ec5MechanicallyJointed, c, conditions, ["The laminations here must touch; spaced columns with packs or gussets (Annex C.3) take compression.spaced (ec5-spaced.ts)."]);
  const unmet = conditions.filter((x) => !x.met);
  if (unmet.length > 0 || l === null) return { ...base, applies: false, reason: `outside EN 1995-1-1 Annex C as built here: ${unmet.map((x) => x.condition).join("; ")}.` };
  const units = c.job.units;
  const mats = l.parts.map((p) => p.material);
  const fck = Math.min(...mats.map((m) => m.strength.compression!));
  const glulam = mats.every((m) => m.family !== "sawn-timber");
  const E05given = mats.every((m) => m.Emin !== undefined);
  // E_0,05/E_0,mean: 0.67 for solid softwood (EN 338), about 0.83 for glulam (EN 14080) [M].
  const E05 = Math.min(...mats.map((m) => m.Emin ?? m.E * (m.family === "sawn-timber" ? 0.67 : 0.83)));
  const Emean = Math.min(...mats.map((m) => m.E));
  const betaC = glulam ? 0.1 : 0.2;
  const gammaM = c.compression.gammaM ?? (glulam ? 1.25 : 1.3);
  const area = l.parts.reduce((s, p) => s + p.area, 0);
  const E = c.section.referenceModulus;

  // The jointed axis: layers across the stack, the middle (or first) lamination as Annex B's web.
  const webIndex = l.parts.length === 3 ? 1 : 0;
  const offsets = l.thicknesses.map((_, i) => l.thicknesses.slice(0, i).reduce((s, t) => s + t, 0));
  const layerOf = (i: number) => rectangularLayer({ modulus: l.parts[i]!.material.E, width: l.depths[i]!, depth: l.thicknesses[i]!, bottomY: offsets[i]! });
  const flangeOf = (i: number): FlangeName => (i < webIndex ? "bottom" : "top");
  const jointed: JointedSection = { web: layerOf(webIndex) };
  for (let i = 0; i < l.parts.length; i++) if (i !== webIndex) jointed[flangeOf(i)] = layerOf(i);
  // The joint between lamination i and its neighbour nearer the web; its connectors set that flange's γ.
  const jointOfFlange = (i: number) => c.joints.find((j) => j.lines.some((line) => { const ids = [line.a, line.b]; return ids.includes(l.parts[i]!.id) && ids.includes(l.parts[webIndex]!.id); }));
  const leJ = c.axes[l.jointedAxis].effectiveLength;
  const gammas: Partial<Record<FlangeName, number>> = {};
  for (let i = 0; i < l.parts.length; i++) {
    if (i === webIndex) continue;
    const j = jointOfFlange(i);
    // K_u of one row: connectors per row × K_u per shear plane; spacing the joint's largest before the buckling shear (the least γ) [CP].
    gammas[flangeOf(i)] = j ? gammaFactor({ modulus: l.parts[i]!.material.E, area: l.parts[i]!.area, spacing: j.spacing!, rowSlipModulus: j.slip!.ultimate * j.rows, effectiveLength: leJ }) : 0;
  }
  const response = jointedResponse(jointed, gammas);
  const EIef = response.effectiveStiffness;
  const I = (axis: Axis) => (axis === l.jointedAxis ? EIef / Emean : (E * solidSecondMoment(l, axis).whole) / Emean);
  const axisData = (["x", "y"] as Axis[]).map((axis) => {
    const a = c.axes[axis];
    const isJointed = axis === l.jointedAxis;
    const radius = Math.sqrt(I(axis) / area);
    const slenderness = a.effectiveLength / radius;
    const lambdaRel = (slenderness / Math.PI) * Math.sqrt(fck / E05);
    const kc = ec5BucklingFactor(lambdaRel, betaC);
    const stiffness = isJointed ? EIef : E * solidSecondMoment(l, axis).whole;
    return { axis, a, isJointed, radius, slenderness, lambdaRel, kc, stiffness };
  });
  const jointedAxis = axisData.find((x) => x.isJointed)!;
  const per = c.actions.map((act) => {
    const { duration } = ec5DurationOf(act.combination.duration, act.combination.categories);
    const kmod = ec5Kmod("solid", c.compression.serviceClass, duration) ?? 0;
    const fcd = (kmod * fck) / gammaM;
    const kc = Math.min(...axisData.map((x) => x.kc));
    const capacity = kc * fcd * area;
    const sigmaC = act.axial / area;
    let interaction: number | null = null;
    const fmd = Math.min(...mats.map((m) => m.strength.bending ?? NaN));
    if (act.moment > 0 && Number.isFinite(fmd)) {
      const x = axisData.find((k) => k.axis === "x")!;
      const y = axisData.find((k) => k.axis === "y")!;
      const cFibre = Math.max(c.section.bounds.y1 - c.section.centroidY, c.section.centroidY - c.section.bounds.y0);
      // σ_m from the effective E·I about x (the slip-aware one where x is jointed): at least the stress of Annex B (B.7 + B.8).
      const sigmaM = (act.moment * Emean * cFibre) / x.stiffness;
      // EN 1995-1-1 eq. (6.23), (6.24) [M], bending about x only; k_m 0.7 for rectangles.
      interaction = Math.max(sigmaC / (x.kc * fcd) + sigmaM / fmd, sigmaC / (y.kc * fcd) + (0.7 * sigmaM) / fmd);
    }
    const Vd = ec5ImperfectionShear(act.axial, jointedAxis.kc, jointedAxis.slenderness);
    return { act, kmod, fcd, kc, capacity, interaction, Vd };
  });
  const util = (p: (typeof per)[number]) => Math.max(p.act.axial / p.capacity, p.interaction ?? 0);
  const gov = per.reduce((a, b) => (util(b) > util(a) ? b : a));
  const checks: MemberCheck[] = [columnCheck("column-axial", "Column axial compression σ_c,0,d ≤ k_c·f_c,0,d", gov.act.axial, gov.capacity, "force", gov.act.combination.id, null, "EN 1995-1-1 eq. (C.3), (6.23) [M]")];
  const bending = per.filter((p) => p.interaction !== null);
  if (bending.length > 0) {
    const worst = bending.reduce((a, b) => (b.interaction! > a.interaction! ? b : a));
    checks.push(columnCheck("column-interaction", "Column bending and axial compression, EN 1995-1-1 eq. (6.23)/(6.24)", worst.interaction!, 1, "ratio", worst.act.combination.id, worst.act.momentAt, "EN 1995-1-1 §6.3.2 eq. (6.23), (6.24) [M]"));
  }
  const joints: ColumnJointDemand[] = c.joints.map((j) => {
    const i = l.parts.findIndex((p, k) => k !== webIndex && j.lines.some((line) => [line.a, line.b].includes(p.id)));
    const flow = i >= 0 ? response.joints[flangeOf(i)]!.shearFlowPerShear : 0;
    return {
      joint: j.id,
      limits: null,
      rowsRequired: null,
      bucklingShear: per.map((p) => p.Vd),
      bucklingFlow: per.map((p) => (p.Vd * flow) / j.lines.length),
      addsToLateral: l.jointedAxis === "x",
      notes: [`Buckling shear V_d by eq. (C.5) (λ_ef = ${jointedAxis.slenderness.toFixed(1)}), as a shear flow V_d·γ·E·A·a/(EI)_ef (B.10) along the whole column${l.jointedAxis === "x" ? ", added to the lateral load's shear" : ""}.`],
    };
  });
  const len = (mm: number) => inJobUnits(mm, "length", units);
  return {
    ...base,
    applies: true,
    reason: null,
    axes: axisData.map((x) => ({
      axis: x.axis,
      K: x.a.K,
      basis: x.a.basis,
      unbraced: x.a.unbraced,
      effectiveLength: x.a.effectiveLength,
      depth: x.radius,
      slenderness: x.slenderness,
      jointed: x.isJointed,
      factor: 1,
      stiffness: x.stiffness,
      euler: (Math.PI ** 2 * x.stiffness) / x.a.effectiveLength ** 2,
      stability: x.kc,
    })),
    combinations: per.map((p) => ({ combination: p.act.combination.id, axial: p.act.axial, moment: p.act.moment, ...finiteInteraction(p.interaction), strength: p.fcd, stability: p.kc, capacity: p.capacity })),
    governing: gov.act.combination.id,
    checks,
    joints,
    steps: [
      step("(EI)_ef", `γ-method about ${l.jointedAxis}, K_u, l = ${len(leJ)}`, EIef, "flexuralRigidity", "EN 1995-1-1 Annex B (B.1)–(B.5) [M]"),
      ...Object.entries(gammas).map(([f, g]) => step(`γ (${f})`, "(B.5)", g!, "ratio")),
      step("λ_ef", "l_ef·√(A_tot/I_ef), I_ef = (EI)_ef/E_mean", jointedAxis.slenderness, "ratio", "EN 1995-1-1 eq. (C.1), (C.2) [M]"),
      ...axisData.map((x) => step(`λ_rel (${x.axis})`, "(λ/π)·√(f_c,0,k/E_0,05)", x.lambdaRel, "ratio", "EN 1995-1-1 eq. (6.21), (6.22) [M]")),
      ...axisData.map((x) => step(`k_c (${x.axis})`, `β_c = ${betaC}`, x.kc, "ratio", "EN 1995-1-1 eq. (6.25)–(6.29) [M]")),
      step("k_mod", `${gov.act.combination.id}, service class ${c.compression.serviceClass}`, gov.kmod, "ratio", "EN 1995-1-1 Table 3.1"),
      step("γ_M", "timber", gammaM, "ratio", "EN 1995-1-1 Table 2.3 [M]"),
      step("f_c,0,d", "k_mod·f_c,0,k/γ_M", gov.fcd, "stress"),
      step("V_d", "eq. (C.5)", gov.Vd, "force", REF),
    ],
    notes: [...base.notes, `E_0,05 ${E05given ? "as given" : "from E_0,mean (0.67 solid softwood, 0.83 glulam) [M]"}; γ from the greatest spacing the joints' schedules are held to (every spacing built is no larger, so γ, k_c and V_d are on the safe side) [CP].`],
  };
}

import { dimensions as nailDimensions } from "../connector/nail.js";
import { MM_PER_IN } from "../connector/quantity-text.js";
import { diameterOf as boltDiameter } from "../connector/timber-bolt.js";
import { ndsLoadDurationFactor } from "../connector/timber/nds-adjustment.js";
import type { MemberCheck } from "../schema/result.js";
import { inJobUnits } from "../units/format.js";
import { exceeds, fallsShort } from "../units/limits.js";
import { columnCheck, finiteInteraction, step, type Axis, type ColumnDesign, type ColumnJob, type ColumnJointDemand, type ColumnRule, designStart } from "./column-rules.js";
import { solidSecondMoment, timberLaminations } from "./timber-laminations.js";


/**
 * C_P of NDS-2018 eq. 15.3-1 (§3.7.1 eq. 3.7-1 times K_f) [M]:
 * K_f·[(1 + α)/(2c) − √(((1 + α)/(2c))² − α/c)], α = F_cE/F_c*.
 */
export function ndsColumnStability(p: { FcE: number; FcStar: number; c: number; Kf: number }): number {
  const a = p.FcE / p.FcStar;
  const b = (1 + a) / (2 * p.c);
  return p.Kf * (b - Math.sqrt(b * b - a / p.c));
}

/** F_cE = 0.822·E_min'/(l_e/d)² (NDS-2018 §3.7.1 [M]). */
export const ndsEulerStress = (EminPrime: number, slenderness: number) => (0.822 * EminPrime) / slenderness ** 2;

/** c of eq. 3.7-1: 0.8 sawn lumber, 0.9 glulam and structural composite lumber (NDS-2018 §3.7.1 [M]). */
const cOf = (family: string) => (family === "sawn-timber" ? 0.8 : 0.9);

/** E_min from E where the job gives none: E·(1 − 1.645·COV_E)·1.03/1.66, COV_E 0.25 sawn, 0.10 glulam and SCL (NDS-2018 Appendix D eq. D-4 [M]). */
export function ndsEminFromE(E: number, family: string): number {
  const cov = family === "sawn-timber" ? 0.25 : 0.1;
  return (E * (1 - 1.645 * cov) * 1.03) / 1.66;
}

/** LRFD format conversion and resistance factors for compression and stability (NDS-2018 Table N1, N2 [M]). */
const LRFD = { KFc: 2.4, phiC: 0.9, KFs: 1.76, phiS: 0.85 };

type Fastener = { kind: "nailed" | "bolted"; diameter: number };

/** The spacing rules of §15.3.3 (nailed) and §15.3.4 (bolted) [M], D the fastener's diameter and t the thinnest lamination. mm. */
export function ndsLaminationRules(f: Fastener, t: number, depth: number) {
  const D = f.diameter;
  const r =
    f.kind === "nailed"
      ? { end: [15 * D, 18 * D], spacing: [20 * D, 6 * t], rowSpacing: [10 * D, 20 * D], edge: [5 * D, 20 * D], clause: "NDS-2018 §15.3.3" }
      : { end: [7 * D, 8.4 * D], spacing: [4 * D, 6 * t], rowSpacing: [1.5 * D, 10 * D], edge: [1.5 * D, 10 * D], clause: "NDS-2018 §15.3.4" };
  // Rows needed: two or more where the lamination is deeper than 3·t; enough that the greatest edge distance and row spacing are kept.
  const deep = exceeds(depth, 3 * t);
  const toCover = Math.max(1, Math.ceil((depth - 2 * r.edge[1]!) / r.rowSpacing[1]! - 1e-9) + 1);
  const rows = Math.max(deep ? 2 : 1, toCover);
  return { ...r, rows, deep };
}

function fastenerOf(c: ColumnJob["joints"][number]["connector"]): Fastener | null {
  if (c.kind === "nail" && c.standard === "NDS-2018") return { kind: "nailed", diameter: nailDimensions(c).diameter };
  if (c.kind === "timber-bolt" && c.standard === "NDS-2018") return { kind: "bolted", diameter: boltDiameter(c) };
  return null;
}

export const ndsBuiltUp: ColumnRule = {
  id: "nds-15.3",
  title: "Nailed or bolted built-up column",
  standard: "NDS-2018 §15.3",
  suits: (c) => c.joints.length > 0 && c.joints.every((j) => fastenerOf(j.connector) !== null),
  design: (c) => design(c),
};

function design(c: ColumnJob): ColumnDesign {
  const { laminations: l, conditions } = timberLaminations(c, "NDS-2018 §15.3.1 [M]");
  const fasteners = c.joints.map((j) => fastenerOf(j.connector));
  const kinds = new Set(fasteners.map((f) => f?.kind));
  const n = l?.parts.length ?? c.section.parts.length;
  conditions.push(
    { condition: `two to five laminations (${n})`, met: n >= 2 && n <= 5, clause: "NDS-2018 §15.3.1 [M]" },
    { condition: "each lamination at least 1.5 in thick", met: l !== null && l.thicknesses.every((t) => !fallsShort(t, 1.5 * MM_PER_IN)), clause: "NDS-2018 §15.3.1 [M]" },
    { condition: "the laminations are nailed or bolted (NDS-2018 nails or bolts), all joints alike", met: c.joints.length > 0 && fasteners.every((f) => f !== null) && kinds.size === 1, clause: "NDS-2018 §15.3.3, §15.3.4 [M]" },
    { condition: `the basis is allowable (C_D) or factored (K_F·φ·λ)`, met: true, clause: "NDS-2018 §2.3 [M]" },
  );
  const base = designStart(ndsBuiltUp, c, conditions);
  const unmet = conditions.filter((x) => !x.met);
  if (unmet.length > 0 || l === null) {
    return {
      ...base,
      applies: false,
      reason: `outside NDS-2018 §15.3: ${unmet.map((x) => x.condition).join("; ")}. Design it as a mechanically jointed column (EN 1995-1-1 Annex C, where its connectors give slip moduli) or as spaced or solid members by other means.`,
    };
  }
  const fastener = fasteners[0]!;
  const Kf = fastener.kind === "nailed" ? 0.6 : 0.75;
  const units = c.job.units;
  const factored = c.job.basis === "factored";
  const mats = l.parts.map((p) => p.material);
  // Laminations of different grades: the least strength and stiffness stand for all [CP].
  const Fc = Math.min(...mats.map((m) => m.strength.compression!));
  const EminGiven = mats.every((m) => m.Emin !== undefined);
  const Emin = Math.min(...mats.map((m) => m.Emin ?? ndsEminFromE(m.E, m.family)));
  const EminPrime = factored ? Emin * LRFD.KFs * LRFD.phiS : Emin;
  const cc = Math.min(...mats.map((m) => cOf(m.family)));
  const area = l.parts.reduce((s, p) => s + p.area, 0);
  const depth = l.depths[0]!;
  const tMin = Math.min(...l.thicknesses);

  const axisData = (["x", "y"] as Axis[]).map((axis) => {
    const a = c.axes[axis];
    const jointed = axis === l.jointedAxis;
    const d = jointed ? l.total : depth;
    const slenderness = a.effectiveLength / d;
    const FcE = ndsEulerStress(EminPrime, slenderness);
    const I = solidSecondMoment(l, axis).whole;
    return { axis, a, jointed, d, slenderness, FcE, factor: jointed ? Kf : 1, I };
  });
  const per = c.actions.map((act) => {
    const CD = ndsLoadDurationFactor(act.combination.categories, act.combination.duration).value;
    const lambda = act.combination.timeEffect?.value ?? 1;
    const FcStar = factored ? Fc * LRFD.KFc * LRFD.phiC * lambda : Fc * CD;
    const CPs = axisData.map((x) => ndsColumnStability({ FcE: x.FcE, FcStar, c: cc, Kf: x.factor }));
    const CP = Math.min(...CPs);
    const capacity = FcStar * CP * area;
    const fc = act.axial / area;
    let interaction: number | null = null;
    const fbStrength = Math.min(...mats.map((m) => m.strength.bending ?? NaN));
    if (act.moment > 0 && Number.isFinite(fbStrength)) {
      // Bending from the beam loads is about the section's x axis: F_cE1 is that axis's Euler stress.
      const x = axisData.find((k) => k.axis === "x")!;
      const cFibre = Math.max(c.section.bounds.y1 - c.section.centroidY, c.section.centroidY - c.section.bounds.y0);
      const fb = (act.moment * cFibre) / c.section.secondMoment;
      // Where f_c reaches F_cE1 the member buckles in the plane of bending and eq. 3.9-3 has no meaning: f_c/F_cE1 (≥ 1) is reported.
      interaction = fc >= x.FcE ? fc / x.FcE : (fc / (FcStar * CP)) ** 2 + fb / (fbStrength * (1 - fc / x.FcE));
    }
    return { act, CD, lambda, FcStar, CPs, CP, capacity, interaction, fc };
  });
  const util = (p: (typeof per)[number]) => Math.max(p.act.axial / p.capacity, p.interaction ?? 0);
  const gov = per.reduce((a, b) => (util(b) > util(a) ? b : a));

  const checks: MemberCheck[] = [];
  for (const x of axisData) {
    checks.push(columnCheck(`column-slenderness-${x.axis}`, `Column slenderness l_e/d about ${x.axis} (${x.jointed ? "across the laminations' joints" : "along them"})`, x.slenderness, 50, "ratio", gov.act.combination.id, null, "NDS-2018 §3.7.1.4, §15.3.2 [M]: l_e/d ≤ 50"));
  }
  checks.push(columnCheck("column-axial", "Column axial compression P ≤ F_c*·C_P·A", gov.act.axial, gov.capacity, "force", gov.act.combination.id, null, "NDS-2018 §3.6.3, §15.3.2, eq. 15.3-1 [M]"));
  const bending = per.filter((p) => p.interaction !== null);
  if (bending.length > 0) {
    const worst = bending.reduce((a, b) => (b.interaction! > a.interaction! ? b : a));
    checks.push(columnCheck("column-interaction", "Column bending and axial compression, NDS eq. 3.9-3", worst.interaction!, 1, "ratio", worst.act.combination.id, worst.act.momentAt, "NDS-2018 §3.9.2 eq. 3.9-3 [M]: (f_c/F_c')² + f_b1/[F_b1'·(1 − f_c/F_cE1)] ≤ 1"));
  } else if (per.some((p) => p.act.moment > 0)) {
    base.notes.push("Bending with axial compression (NDS-2018 §3.9.2) is not checked: a lamination has no bending strength.");
  }

  const rules = ndsLaminationRules(fastener, tMin, depth);
  const D = fastener.diameter;
  const len = (mm: number) => inJobUnits(mm, "length", units);
  const sources = [
    `end distance ${len(rules.end[0]!)} to ${len(rules.end[1]!)} (${fastener.kind === "nailed" ? "15D to 18D" : "7D to 8.4D"}): ${rules.clause} [M]`,
    `spacing along a row ${len(rules.spacing[0]!)} to ${len(rules.spacing[1]!)} (${fastener.kind === "nailed" ? "20D" : "4D"} to 6·t of the thinnest lamination): ${rules.clause} [M]`,
    `row spacing ${len(rules.rowSpacing[0]!)} to ${len(rules.rowSpacing[1]!)} (${fastener.kind === "nailed" ? "10D to 20D" : "1.5D to 10D"}): ${rules.clause} [M]`,
    `edge distance ${len(rules.edge[0]!)} to ${len(rules.edge[1]!)} (${fastener.kind === "nailed" ? "5D to 20D" : "1.5D to 10D"}): ${rules.clause} [M]`,
    `${rules.rows} row(s) across the ${len(depth)} face${rules.deep ? ` (two or more where the lamination is deeper than 3·t = ${len(3 * tMin)})` : ""}: ${rules.clause} [M]`,
    ...(fastener.kind === "nailed" ? [`adjacent nails driven from opposite faces, each through every lamination and at least 3/4 of the way into the last: ${rules.clause} [M]`] : [`a washer under each head and nut: ${rules.clause} [M]`]),
  ];
  // Nails from either face pass every lamination and reach 3/4 into the last (§15.3.3 [M]).
  const outer = Math.min(l.thicknesses[0]!, l.thicknesses[l.thicknesses.length - 1]!);
  const nailReach = l.total - outer / 4;
  const problems = (j: ColumnJob["joints"][number]) => {
    if (fastener.kind !== "nailed" || j.connector.kind !== "nail") return [];
    const length = nailDimensions(j.connector).length;
    return fallsShort(length, nailReach) ? [`a nail ${len(length)} long does not pass every lamination and reach 3/4 into the last from either face: it needs ${len(nailReach)} (${rules.clause} [M]); use longer nails or bolts`] : [];
  };
  const joints: ColumnJointDemand[] = c.joints.map((j) => ({
    problems: problems(j),
    joint: j.id,
    limits: { minSpacing: rules.spacing[0]!, maxSpacing: rules.spacing[1]!, endDistance: rules.end[0]!, edgeDistance: rules.edge[0]!, rowSpacing: rules.rowSpacing[0]!, acrossReplaces: true, sources },
    rowsRequired: { rows: rules.rows, reason: `${rules.clause} [M]: ${rules.rows} row(s) across a ${len(depth)} lamination` },
    bucklingFlow: null,
    bucklingShear: null,
    addsToLateral: false,
    notes: [],
  }));
  if (exceeds(rules.spacing[0]!, rules.spacing[1]!)) base.notes.push(`The least spacing along a row (${len(rules.spacing[0]!)}) exceeds the greatest (${len(rules.spacing[1]!)}): the fastener is too large for laminations this thin under ${rules.clause}.`);

  const steps = [
    step("n", "laminations", l.parts.length, "ratio", "NDS-2018 §15.3.1 [M]"),
    step("D", `${fastener.kind === "nailed" ? "nail" : "bolt"} diameter`, D, "length"),
    step("K_f", `${fastener.kind} laminations, buckling across their joints`, Kf, "ratio", "NDS-2018 §15.3.2 [M]"),
    step("c", cc === 0.8 ? "sawn lumber" : "glulam or structural composite lumber", cc, "ratio", "NDS-2018 §3.7.1 [M]"),
    step("F_c", "compression parallel to grain, all factors but C_D and C_P", Fc, "stress"),
    step("E_min'", EminGiven ? "as given" : "from E by NDS-2018 Appendix D eq. D-4 (COV_E 0.25 sawn, 0.10 glulam) [M]", EminPrime, "modulus"),
    step("A", "area of the laminations", area, "area"),
    ...axisData.flatMap((x) => [
      step(`l_e/d (${x.axis})`, `${inJobUnits(x.a.effectiveLength, "span", units)} ÷ ${len(x.d)}`, x.slenderness, "ratio"),
      step(`F_cE (${x.axis})`, "0.822·E_min'/(l_e/d)²", x.FcE, "stress", "NDS-2018 §3.7.1 [M]"),
    ]),
    step("C_D", `load duration, ${gov.act.combination.id}`, factored ? 1 : gov.CD, "ratio", "NDS-2018 §2.3.2 [M]"),
    ...(factored ? [step("λ", `time effect, ${gov.act.combination.id}`, gov.lambda, "ratio", "NDS-2018 Table N3 [M]")] : []),
    step("F_c*", factored ? "F_c·K_F·φ_c·λ (K_F 2.40, φ_c 0.90)" : "F_c·C_D", gov.FcStar, "stress"),
    ...axisData.map((x, i) => step(`C_P (${x.axis})`, `K_f = ${x.factor}`, gov.CPs[i]!, "ratio", "NDS-2018 eq. 3.7-1, 15.3-1 [M]")),
    step("P", `axial load, ${gov.act.combination.id}`, gov.act.axial, "force"),
    step("F_c'·A", "F_c*·C_P·A", gov.capacity, "force"),
  ];
  return {
    ...base,
    applies: true,
    reason: null,
    axes: axisData.map((x, i) => ({
      axis: x.axis,
      K: x.a.K,
      basis: x.a.basis,
      unbraced: x.a.unbraced,
      effectiveLength: x.a.effectiveLength,
      depth: x.d,
      slenderness: x.slenderness,
      jointed: x.jointed,
      factor: x.factor,
      stiffness: EminPrime * x.I,
      euler: (Math.PI ** 2 * EminPrime * x.I) / x.a.effectiveLength ** 2,
      stability: gov.CPs[i]!,
    })),
    combinations: per.map((p) => ({ combination: p.act.combination.id, axial: p.act.axial, moment: p.act.moment, ...finiteInteraction(p.interaction), strength: p.FcStar, stability: p.CP, capacity: p.capacity })),
    governing: gov.act.combination.id,
    checks,
    joints,
    steps,
    notes: [
      ...base.notes,
      `The laminations' joints weaken buckling about the ${l.jointedAxis} axis: K_f = ${Kf} there, 1 about the other (NDS-2018 §15.3.2 [M]).`,
      "The section's I is that of the transformed section; E·I and the Euler load use E_min'. The stiffness of the whole stack enters NDS only through l_e/d and K_f.",
      "Each interface's schedule is given on its own; a nail or bolt through every lamination (as §15.3 asks) serves each interface it crosses, so the counts are on the safe side where rows of two interfaces fall at one station.",
    ],
  };
}

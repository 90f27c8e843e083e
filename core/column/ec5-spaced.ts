import { ec5DurationOf, ec5Kmod, type Ec5Duration } from "../connector/timber/ec5-factors.js";
import type { Connector } from "../connector/registry.js";
import type { MemberCheck } from "../schema/result.js";
import { inJobUnits } from "../units/format.js";
import { exceeds, fallsShort } from "../units/limits.js";
import { columnCheck, finiteInteraction, step, type Axis, type ColumnDesign, type ColumnJob, type ColumnJointDemand, type ColumnRule, designStart } from "./column-rules.js";
import { ec5BucklingFactor, ec5ImperfectionShear } from "./ec5-mechanically-jointed.js";
import { rectGeometry } from "./steel-rules.js";
import type { Condition } from "./timber-laminations.js";

const REF = "EN 1995-1-1 Annex C.3 [M]";
const timberFamilies = new Set(["sawn-timber", "glulam", "engineered-wood"]);

export type PackConnection = "glued" | "nailed" | "bolted";
export type SpacedKind = "packs" | "gussets";

/**
 * η of EN 1995-1-1 Table C.1 [M], by the packs' or gussets' connection and the load duration:
 * [permanent or long-term, medium- or short-term]. Bolted gussets are not in the table.
 */
const etaTable: Record<SpacedKind, Partial<Record<PackConnection, [number, number]>>> = {
  packs: { glued: [1, 1], nailed: [4, 4.5], bolted: [3.5, 7] },
  gussets: { glued: [3, 6], nailed: [6, 7] },
};

/** η of Table C.1 [M]; null where the table gives none (bolted gussets). */
export function spacedEta(kind: SpacedKind, connection: PackConnection, duration: Ec5Duration): number | null {
  const row = etaTable[kind][connection];
  if (!row) return null;
  return duration === "permanent" || duration === "long" ? row[0] : row[1];
}

/**
 * Effective slenderness of a spaced column, EN 1995-1-1 eq. (C.12) [M]: λ_ef = √(λ² + η·n/2·λ_1²),
 * with λ_1 taken as at least 30 (C.3.2 [M]).
 */
export function spacedSlenderness(lambda: number, lambda1: number, eta: number, shafts: number): number {
  const l1 = Math.max(30, lambda1);
  return Math.sqrt(lambda ** 2 + ((eta * shafts) / 2) * l1 ** 2);
}

/** T_d = V_d·l_1/a_1, EN 1995-1-1 eq. (C.13) [M]: the shear force on each pack's connection to a shaft. N. */
export function packShear(Vd: number, packSpacing: number, centroidDistance: number): number {
  return (Vd * packSpacing) / centroidDistance;
}

/**
 * How the packs are fastened, from the packing joints' connectors: nails or bolts, one kind throughout.
 * Glued packs (η of Table C.1) are not designed here: their bond lines are not checked for T_d.
 */
function connectionOf(connectors: Connector[]): { connection: PackConnection; least: number; why: string } | null {
  if (connectors.length === 0) return null;
  if (connectors.every((c) => c.kind === "nail")) return { connection: "nailed", least: 4, why: "nails" };
  if (connectors.every((c) => c.kind === "timber-bolt")) return { connection: "bolted", least: 2, why: "bolts" };
  return null;
}

export const ec5Spaced: ColumnRule = {
  id: "en1995-c3-spaced",
  title: "Spaced column with packs or gussets",
  standard: "EN 1995-1-1 Annex C.3",
  suits: (c) => c.compression.spaced !== undefined && c.joints.length > 0 && c.joints.every((j) => "standard" in j.connector && j.connector.standard === "EN1995-1-1"),
  design: (c) => design(c),
};

function design(c: ColumnJob): ColumnDesign {
  const spaced = c.compression.spaced;
  const packing = new Set(c.compression.packing);
  const shafts = c.section.parts.filter((p) => !packing.has(p.id));
  const packs = c.section.parts.filter((p) => packing.has(p.id));
  const units = c.job.units;
  const len = (mm: number) => inJobUnits(mm, "length", units);
  const base = designStart(ec5Spaced, c, [] as Condition[], [
    "The packs (or gussets) are modelled over the whole length; their connectors are needed only over each pack's length l_2, at the spacing the schedule gives there. The end packs are taken at the column's ends (C.3.1 [M]): confirm on the drawings, and that the end packs, whose connectors start at the end distance, still hold at least 4 nails (2 bolts) per shear plane.",
    "Not checked here: the packs or gussets themselves under T_d (shear along a pack, a gusset's bending), and glued packs.",
  ]);
  const conditions = base.conditions;
  const clause = "EN 1995-1-1 C.3.1 [M]";
  conditions.push(
    { condition: "the spaced column is described (compression.spaced)", met: spaced !== undefined, clause: "job" },
    { condition: `two or more shafts, the packing left out (${shafts.length})`, met: shafts.length >= 2, clause },
    { condition: "every shaft and pack is timber (sawn, glulam or engineered wood)", met: c.section.parts.every((p) => timberFamilies.has(p.material.family)), clause },
    { condition: "every shaft is one plain rectangle", met: shafts.every((p) => p.rects.length === 1), clause },
    { condition: "every shaft has its compression strength (materials[].strength.compression)", met: shafts.every((p) => p.material.strength.compression !== undefined), clause: "job" },
    { condition: "the shafts run the full length of the column", met: c.job.parts.every((p) => packing.has(p.id) || !p.extent || ((p.extent.from ?? 0) <= 0 && (p.extent.to === undefined || !fallsShort(p.extent.to, c.height)))), clause },
    { condition: "the basis is factored (design values)", met: c.job.basis === "factored", clause: "EN 1990 §6.4 [M]" },
    { condition: "axial load only: no lateral load or eccentric axial load (bending with compression is not covered here)", met: c.actions.every((act) => !(act.moment > 0)), clause: "EN 1995-1-1 C.3 [M]" },
  );
  const early = conditions.filter((x) => !x.met);
  if (early.length > 0 || !spaced) return { ...base, applies: false, reason: `outside EN 1995-1-1 Annex C.3 as built here: ${early.map((x) => x.condition).join("; ")}.` };

  // Shafts side by side along x (the gap crossed by buckling about y) or one above another along y.
  const r = shafts.map((p) => p.rects[0]!);
  const alongX = [...r].sort((a, b) => a.x0 - b.x0);
  const alongY = [...r].sort((a, b) => a.y0 - b.y0);
  const gapsX = alongX.slice(1).map((q, i) => q.x0 - alongX[i]!.x1);
  const gapsY = alongY.slice(1).map((q, i) => q.y0 - alongY[i]!.y1);
  const jointedAxis: Axis = gapsX.every((g) => g > 0) ? "y" : "x";
  const sorted = jointedAxis === "y" ? alongX : alongY;
  const gaps = jointedAxis === "y" ? gapsX : gapsY;
  const across = (q: (typeof r)[number]) => (jointedAxis === "y" ? q.x1 - q.x0 : q.y1 - q.y0);
  const depth = (q: (typeof r)[number]) => (jointedAxis === "y" ? q.y1 - q.y0 : q.x1 - q.x0);
  const centre = (q: (typeof r)[number]) => (jointedAxis === "y" ? (q.x0 + q.x1) / 2 : (q.y0 + q.y1) / 2);
  const h = Math.min(...sorted.map(across));
  const a = Math.max(...gaps);
  // a_1: distance between the centroids of neighbouring shafts (Figure C.3 [M]), the least (largest T_d).
  const a1 = Math.min(...sorted.slice(1).map((q, i) => centre(q) - centre(sorted[i]!)));
  const l1 = spaced.packSpacing;
  const l2 = spaced.packLength;
  const packJoints = c.joints.filter((j) => j.lines.some((line) => packing.has(line.a) || packing.has(line.b)));
  const conn = connectionOf(packJoints.map((j) => j.connector));
  const gussets = spaced.kind === "gussets";
  const same = sorted.every((q) => Math.abs(across(q) - h) <= 1e-6 * h && Math.abs(depth(q) - depth(sorted[0]!)) <= 1e-6 * h);
  conditions.push(
    { condition: "the shafts are held apart across one axis (a free gap between neighbours)", met: gaps.every((g) => g > 0), clause },
    { condition: "the shafts are alike (same thickness and depth)", met: same, clause },
    { condition: `packs or gussets are listed in compression.packing and fastened to the shafts by connectors placed one by one (${packs.length} listed); glued packs are not designed here`, met: packs.length > 0 && packJoints.length > 0, clause: "job" },
    { condition: `the packs are nailed (nails) or bolted (timber bolts), one kind throughout, bolts with packs only${conn ? ` (${conn.why})` : ""}`, met: conn !== null && (conn.connection !== "bolted" || !gussets), clause: "EN 1995-1-1 Table C.1 [M]" },
    { condition: `free gap a ≤ ${gussets ? 6 : 3}·h (a = ${len(a)}, h = ${len(h)})`, met: !exceeds(a, (gussets ? 6 : 3) * h), clause },
    { condition: `pack length l_2 ≥ ${gussets ? 2 : 1.5}·a (l_2 = ${len(l2)})`, met: !fallsShort(l2, (gussets ? 2 : 1.5) * a), clause },
    { condition: `at least three bays: l_1 ≤ l/3 (l_1 = ${len(l1)}, l = ${len(c.height)})`, met: !exceeds(3 * l1, c.height), clause },
    { condition: "packs shorter than their spacing (l_2 < l_1)", met: l2 < l1, clause: "job" },
  );
  const lambda1Raw = (Math.sqrt(12) * l1) / h;
  conditions.push({ condition: `shaft slenderness λ_1 = √12·l_1/h ≤ 60 (${lambda1Raw.toFixed(1)})`, met: !exceeds(lambda1Raw, 60), clause: "EN 1995-1-1 C.3.2 [M]" });
  const unmet = conditions.filter((x) => !x.met);
  if (unmet.length > 0 || !conn) return { ...base, applies: false, reason: `outside EN 1995-1-1 Annex C.3 as built here: ${unmet.map((x) => x.condition).join("; ")}.` };

  const mats = shafts.map((p) => p.material);
  const fck = Math.min(...mats.map((m) => m.strength.compression!));
  const glulam = mats.every((m) => m.family !== "sawn-timber");
  // E_0,05/E_0,mean: 0.67 for solid softwood (EN 338), about 0.83 for glulam (EN 14080) [M].
  const E05 = Math.min(...mats.map((m) => m.Emin ?? m.E * (m.family === "sawn-timber" ? 0.67 : 0.83)));
  const Emean = Math.min(...mats.map((m) => m.E));
  const betaC = glulam ? 0.1 : 0.2;
  const gammaM = c.compression.gammaM ?? (glulam ? 1.25 : 1.3);
  const g = rectGeometry(r);
  const Atot = g.A;
  const Itot = { x: g.Ix, y: g.Iy };
  const n = shafts.length;
  const lambda1 = Math.max(30, lambda1Raw);
  const etaOf = (d: Ec5Duration) => spacedEta(spaced.kind, conn.connection, d)!;

  const per = c.actions.map((act) => {
    const { duration } = ec5DurationOf(act.combination.duration, act.combination.categories);
    const eta = etaOf(duration);
    const axes = (["x", "y"] as Axis[]).map((axis) => {
      const l = c.axes[axis].effectiveLength;
      const lambda = l * Math.sqrt(Atot / Itot[axis]);
      const slenderness = axis === jointedAxis ? spacedSlenderness(lambda, lambda1, eta, n) : lambda;
      const lambdaRel = (slenderness / Math.PI) * Math.sqrt(fck / E05);
      return { axis, lambda, slenderness, lambdaRel, kc: ec5BucklingFactor(lambdaRel, betaC) };
    });
    const kmod = ec5Kmod("solid", c.compression.serviceClass, duration) ?? 0;
    const fcd = (kmod * fck) / gammaM;
    const kc = Math.min(...axes.map((x) => x.kc));
    const capacity = kc * fcd * Atot;
    const jointed = axes.find((x) => x.axis === jointedAxis)!;
    const Vd = ec5ImperfectionShear(act.axial, jointed.kc, jointed.slenderness);
    const Td = packShear(Vd, l1, a1);
    return { act, duration, eta, axes, kmod, fcd, kc, capacity, Vd, Td };
  });
  const gov = per.reduce((p, q) => (q.act.axial / q.capacity > p.act.axial / p.capacity ? q : p));
  const checks: MemberCheck[] = [columnCheck("column-axial", "Spaced column axial compression σ_c,0,d ≤ k_c·f_c,0,d", gov.act.axial, gov.capacity, "force", gov.act.combination.id, null, "EN 1995-1-1 C.3.2, eq. (6.23), (6.24) [M]")];

  const joints: ColumnJointDemand[] = packJoints.map((j) => {
    // At least 4 nails or 2 bolts per shear plane at each pack (C.3.1 [M]): k per row fit in l_2 whatever the
    // rows' positions when s ≤ l_2/(k+1); then at least l_2 − s of every pack carries the flow, so T_d/(l_2 − s_max).
    const perRow = Math.ceil(conn.least / Math.max(1, j.rows));
    const sMax = l2 / (perRow + 1);
    return {
      joint: j.id,
      limits: { maxSpacing: sMax, sources: [`greatest spacing ${len(sMax)}: at least ${conn.least} ${conn.why} per shear plane within each pack's l_2 = ${len(l2)} (EN 1995-1-1 C.3.1 [M]), ${perRow} per row + 1 for the rows' placing [D]`] },
      rowsRequired: null,
      bucklingShear: per.map((p) => p.Td),
      bucklingFlow: per.map((p) => p.Td / (l2 - sMax)),
      addsToLateral: false,
      notes: [`Pack shear T_d = V_d·l_1/a_1 (eq. C.13 [M]) on each pack's connection to a shaft, spread over l_2 − s_max = ${len(l2 - sMax)} of the pack (the connectors sure to lie within it), along the whole column.`],
    };
  });
  const jointedGov = gov.axes.find((x) => x.axis === jointedAxis)!;
  return {
    ...base,
    applies: true,
    reason: null,
    axes: gov.axes.map((x) => ({
      axis: x.axis,
      K: c.axes[x.axis].K,
      basis: c.axes[x.axis].basis,
      unbraced: c.axes[x.axis].unbraced,
      effectiveLength: c.axes[x.axis].effectiveLength,
      depth: Math.sqrt(Itot[x.axis] / Atot),
      slenderness: x.slenderness,
      jointed: x.axis === jointedAxis,
      factor: 1,
      // The effective E·I that the slenderness stands for: E_mean·A_tot·l_ef²/λ².
      stiffness: (Emean * Atot * c.axes[x.axis].effectiveLength ** 2) / x.slenderness ** 2,
      euler: (Math.PI ** 2 * Emean * Atot) / x.slenderness ** 2,
      stability: x.kc,
    })),
    combinations: per.map((p) => ({ combination: p.act.combination.id, axial: p.act.axial, moment: p.act.moment, ...finiteInteraction(null), strength: p.fcd, stability: p.kc, capacity: p.capacity })),
    governing: gov.act.combination.id,
    checks,
    joints,
    steps: [
      step("A_tot", "shafts, packs left out", Atot, "area"),
      step("I_tot", `shafts about ${jointedAxis}, packs left out`, Itot[jointedAxis], "secondMoment"),
      step("λ", "l_ef·√(A_tot/I_tot)", jointedGov.lambda, "ratio", "EN 1995-1-1 C.3.2 [M]"),
      step("λ_1", `√12·l_1/h = ${lambda1Raw.toFixed(1)}, at least 30`, lambda1, "ratio", "EN 1995-1-1 C.3.2 [M]"),
      step("η", `${spaced.kind}, ${conn.connection}, ${gov.duration}-term`, gov.eta, "ratio", "EN 1995-1-1 Table C.1 [M]"),
      step("λ_ef", `√(λ² + η·n/2·λ_1²), n = ${n}`, jointedGov.slenderness, "ratio", "EN 1995-1-1 eq. (C.12) [M]"),
      ...gov.axes.map((x) => step(`λ_rel (${x.axis})`, "(λ/π)·√(f_c,0,k/E_0,05)", x.lambdaRel, "ratio", "EN 1995-1-1 eq. (6.21), (6.22) [M]")),
      ...gov.axes.map((x) => step(`k_c (${x.axis})`, `β_c = ${betaC}`, x.kc, "ratio", "EN 1995-1-1 eq. (6.25)–(6.29) [M]")),
      step("k_mod", `${gov.act.combination.id}, service class ${c.compression.serviceClass}`, gov.kmod, "ratio", "EN 1995-1-1 Table 3.1"),
      step("γ_M", "timber", gammaM, "ratio", "EN 1995-1-1 Table 2.3 [M]"),
      step("f_c,0,d", "k_mod·f_c,0,k/γ_M", gov.fcd, "stress"),
      step("V_d", "eq. (C.5) with λ_ef", gov.Vd, "force", "EN 1995-1-1 eq. (C.5) [M]"),
      step("T_d", `V_d·l_1/a_1, l_1 = ${len(l1)}, a_1 = ${len(a1)}`, gov.Td, "force", "EN 1995-1-1 eq. (C.13) [M]"),
    ],
    notes: [...base.notes, `${REF}: η, the limits on a, l_2, λ_1 and the connectors per pack are recalled, not seen.`],
  };
}

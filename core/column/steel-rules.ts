import { steelBoltDiameter } from "../connector/steel-bolt.js";
import type { Connector } from "../connector/registry.js";
import type { MemberCheck, WorkingLine } from "../schema/result.js";
import { rectArea, type Rect } from "../section/rectangles.js";
import type { PlacedPart } from "../section/section-model.js";
import { inJobUnits } from "../units/format.js";
import { exceeds } from "../units/limits.js";
import { columnCheck, step, type Axis, type ColumnDesign, type ColumnJob, type ColumnJointDemand, type ColumnRule, closestBuildable, designStart } from "./column-rules.js";
import { aiscFlexuralTorsional, doubleAngleSection } from "./double-angle.js";
import { aiscBuiltUpColumn, type AiscBuiltUpColumn, type BuiltUpComponents, type IntermediateConnection } from "./steel-built-up.js";
import { aiscH1Interaction } from "./steel-interaction.js";

/** Flexure: φ_b = 0.90 (LRFD), Ω_b = 1.67 (ASD), AISC 360-16 §F1. */
const PHI_B = 0.9;
const OMEGA_B = 1.67;
/** G = 11,200 ksi for E = 29,000 ksi (AISC 360-16, Symbols [M]), scaled with the part's E. */
const G_OVER_E = 11_200 / 29_000;

/** Area, centroid and second moments (about the centroid) of a set of rectangles, mm. */
export function rectGeometry(rects: Rect[]) {
  const A = rects.reduce((s, r) => s + rectArea(r), 0);
  const xc = rects.reduce((s, r) => s + (rectArea(r) * (r.x0 + r.x1)) / 2, 0) / A;
  const yc = rects.reduce((s, r) => s + (rectArea(r) * (r.y0 + r.y1)) / 2, 0) / A;
  let Ix = 0;
  let Iy = 0;
  let Ixy = 0;
  for (const r of rects) {
    const b = r.x1 - r.x0;
    const h = r.y1 - r.y0;
    const dx = (r.x0 + r.x1) / 2 - xc;
    const dy = (r.y0 + r.y1) / 2 - yc;
    Ix += (b * h ** 3) / 12 + b * h * dy * dy;
    Iy += (h * b ** 3) / 12 + b * h * dx * dx;
    Ixy += b * h * dx * dy;
  }
  // Least principal second moment: (I_x + I_y)/2 − √(((I_x − I_y)/2)² + I_xy²).
  const Imin = (Ix + Iy) / 2 - Math.sqrt(((Ix - Iy) / 2) ** 2 + Ixy ** 2);
  return { A, xc, yc, Ix, Iy, Ixy, Imin };
}

/** Plastic section modulus about a horizontal axis: the equal-area line, then Σ A·|y − y_p|, mm³. */
export function plasticModulusX(rects: Rect[]): number {
  const A = rects.reduce((s, r) => s + rectArea(r), 0);
  const below = (y: number) => rects.reduce((s, r) => s + (r.x1 - r.x0) * Math.max(0, Math.min(r.y1, y) - r.y0), 0);
  let lo = Math.min(...rects.map((r) => r.y0));
  let hi = Math.max(...rects.map((r) => r.y1));
  for (let i = 0; i < 200 && hi - lo > 1e-12 * (1 + Math.abs(hi)); i++) {
    const mid = (lo + hi) / 2;
    if (below(mid) < A / 2) lo = mid;
    else hi = mid;
  }
  const yp = (lo + hi) / 2;
  let Z = 0;
  for (const r of rects) {
    const b = r.x1 - r.x0;
    // ∫ |y − y_p| b dy over the rectangle's parts below and above the equal-area line.
    const top = Math.min(r.y1, yp);
    if (top > r.y0) Z += (b * ((yp - r.y0) ** 2 - (yp - top) ** 2)) / 2;
    const bottom = Math.max(r.y0, yp);
    if (r.y1 > bottom) Z += (b * ((r.y1 - yp) ** 2 - (bottom - yp) ** 2)) / 2;
  }
  return Z;
}

const isAiscBolt = (c: Connector) => c.kind === "steel-bolt" && c.standard === "AISC-360-16";

/** Snug-tight bolts (eq. E6-1) unless slip-critical, which are pretensioned (E6-2); the least favourable over the joints. */
function connectionOf(c: ColumnJob): IntermediateConnection {
  return c.joints.every((j) => j.connector.kind === "steel-bolt" && j.connector.slipCritical !== "no") ? "pretensioned bolts" : "snug-tight bolts";
}

function componentsOf(parts: PlacedPart[], c: ColumnJob): BuiltUpComponents {
  const types = parts.map((p) => c.job.parts.find((q) => q.id === p.id)!.shape.type);
  if (types.every((t) => t === "angle")) return "angles back to back";
  if (types.every((t) => t === "channel")) return "channels back to back";
  return "other";
}

/** Two equal angles, backs facing (mirror images), the gap between the backs: the double angle of double-angle.ts. */
function doubleAngleOf(parts: PlacedPart[], c: ColumnJob) {
  if (parts.length !== 2) return null;
  const shapes = parts.map((p) => c.job.parts.find((q) => q.id === p.id)!.shape);
  const [a, b] = shapes;
  if (a?.type !== "angle" || b?.type !== "angle" || a.d !== b.d || a.b !== b.b || a.t !== b.t) return null;
  const [l, r] = parts[0]!.rects[0]!.x0 <= parts[1]!.rects[0]!.x0 ? [0, 1] : [1, 0];
  const left = shapes[l] as typeof a;
  const right = shapes[r] as typeof a;
  if (!left.heel.endsWith("right") || !right.heel.endsWith("left") || left.heel.startsWith("top") !== right.heel.startsWith("top")) return null;
  // The vertical legs are the backs: rects[0] of an angle is its vertical leg.
  const gap = parts[r]!.rects[0]!.x0 - parts[l]!.rects[0]!.x1;
  const level = Math.abs(parts[0]!.rects[0]!.y0 - parts[1]!.rects[0]!.y0) <= 1e-6 * (1 + a.d);
  if (!(gap >= 0) || !level) return null;
  return { angle: { backLeg: a.d, outstandingLeg: a.b, thickness: a.t }, gap };
}

/** The least pitch of a bolt where the job gives none: 3d, the preferred pitch of AISC 360-16 §J3.3 (2⅔d its least) [M]. */
const leastPitch = (connector: ColumnJob["joints"][number]["connector"]) => (connector.kind === "steel-bolt" ? (connector.minSpacing ?? 3 * (steelBoltDiameter(connector) ?? 0)) : 0);

export const aiscE6: ColumnRule = {
  id: "aisc-e6",
  title: "Built-up steel compression member",
  standard: "AISC 360-16 §E6",
  suits: (c) => c.joints.length > 0 && c.joints.every((j) => isAiscBolt(j.connector)) && c.section.parts.every((p) => p.material.family === "steel"),
  design: (c) => designE6(c),
};

function designE6(c: ColumnJob): ColumnDesign {
  const packing = new Set(c.compression.packing);
  const parts = c.section.parts.filter((p) => !packing.has(p.id));
  const units = c.job.units;
  const len = (mm: number) => inJobUnits(mm, "length", units);
  const factored = c.job.basis === "factored";
  const fullLength = c.job.parts.every((p) => packing.has(p.id) || !p.extent || ((p.extent.from ?? 0) <= 0 && (p.extent.to === undefined || !(p.extent.to < c.height * (1 - 1e-9)))));
  const conditions = [
    { condition: `two or more components, packing left out (${parts.length})`, met: parts.length >= 2, clause: "AISC 360-16 §E6" },
    { condition: "every component is steel with its yield strength (materials[].yieldStrength)", met: parts.every((p) => p.material.family === "steel" && p.material.yieldStrength !== undefined), clause: "AISC 360-16 §E6, §A3.1" },
    { condition: "the intermediate connectors are AISC 360-16 bolts", met: c.joints.length > 0 && c.joints.every((j) => isAiscBolt(j.connector)), clause: "AISC 360-16 §E6.1" },
    { condition: "every component runs the full length of the member", met: fullLength, clause: "AISC 360-16 §E6" },
  ];
  const notChecked = [
    "local buckling of slender elements (AISC 360-16 §E7, Table B4.1a) beyond the legs of double angles",
    "the outside-plate spacing of §E6.2(b) (a cover plate forming a face of the member)",
    "the strength of the intermediate and end connectors themselves: AISC 360-16 §E6 gives no connector force for flexural buckling",
    "the gusset plates and the end connections' own design",
  ];
  const base = designStart(aiscE6, c, conditions);
  const unmet = conditions.filter((x) => !x.met);
  if (unmet.length > 0) return { ...base, applies: false, reason: `outside AISC 360-16 §E6 as this program applies it: ${unmet.map((x) => x.condition).join("; ")}.` };

  const E = Math.min(...parts.map((p) => p.material.E));
  const Fy = Math.min(...parts.map((p) => p.material.yieldStrength!));
  const rects = parts.flatMap((p) => p.rects);
  const g = rectGeometry(rects);
  const radius = { x: Math.sqrt(g.Ix / g.A), y: Math.sqrt(g.Iy / g.A) };
  const perPart = parts.map((p) => ({ part: p, r: Math.sqrt(rectGeometry(p.rects).Imin / p.area) }));
  const least = perPart.reduce((a, b) => (b.r < a.r ? b : a));
  const ri = least.r;
  // Vertical contact lines slide when the member bends about y, horizontal ones about x (§E6.1: the axis that shears the connectors).
  const lines = c.joints.flatMap((j) => j.lines);
  const shears: Record<Axis, boolean> = { x: lines.some((l) => l.orientation === "horizontal"), y: lines.some((l) => l.orientation === "vertical") };
  const components = componentsOf(parts, c);
  const connection = connectionOf(c);
  const bolts = c.joints.map((j) => (j.connector.kind === "steel-bolt" ? steelBoltDiameter(j.connector) : null)).filter((d): d is number => d !== null);
  const boltDiameter = bolts.length > 0 ? Math.max(...bolts) : undefined;
  const bounds = { w: Math.max(...rects.map((r) => r.x1)) - Math.min(...rects.map((r) => r.x0)), h: Math.max(...rects.map((r) => r.y1)) - Math.min(...rects.map((r) => r.y0)) };
  // §J3.5: a plate in continuous contact with a shape or another plate, with no packing between.
  const plateContacts = lines.filter((l) => !packing.has(l.a) && !packing.has(l.b)).flatMap((l) => {
    const pair = [l.a, l.b].map((id) => c.job.parts.find((q) => q.id === id)!);
    if (!pair.some((q) => q.shape.type === "rectangle")) return [];
    return [Math.min(...pair.map((q) => Math.min(...c.section.parts.find((s) => s.id === q.id)!.rects.map((r) => Math.min(r.x1 - r.x0, r.y1 - r.y0)))))];
  });
  const weathering = c.joints.some((j) => j.connector.kind === "steel-bolt" && j.connector.weathering);
  const axisNames: Axis[] = ["x", "y"];

  const at = (spacing: number): AiscBuiltUpColumn =>
    aiscBuiltUpColumn({
      grossArea: g.A,
      elasticModulus: E,
      yieldStrength: Fy,
      basis: factored ? "factored" : "allowable",
      axes: axisNames.map((a) => ({ name: a, effectiveLength: c.axes[a].effectiveLength, radiusOfGyration: radius[a], shearsConnectors: shears[a] })),
      componentRadius: ri,
      connection,
      components,
      connectorSpacing: spacing,
      ...(plateContacts.length > 0 ? { platesInContact: { thinnerThickness: Math.min(...plateContacts), exposure: weathering ? "unpainted weathering steel subject to corrosion" : "painted or not subject to corrosion" } } : {}),
      memberMaxWidth: Math.max(bounds.w, bounds.h),
      ...(boltDiameter !== undefined ? { boltDiameter } : {}),
    });

  // Double angles: flexural-torsional buckling (§E4) with F_ey at the modified slenderness.
  const pair = doubleAngleOf(parts, c);
  const pairSection = pair ? doubleAngleSection(pair.angle, pair.gap) : null;
  const legLimit = 0.45 * Math.sqrt(E / Fy);
  const legRatio = pair ? Math.max(pair.angle.backLeg, pair.angle.outstandingLeg) / pair.angle.thickness : null;
  if (legRatio !== null && exceeds(legRatio, legLimit)) {
    conditions.push({ condition: `legs not slender: b/t = ${legRatio.toFixed(1)} ≤ 0.45√(E/F_y) = ${legLimit.toFixed(1)}`, met: false, clause: "AISC 360-16 Table B4.1a case 3; §E7 otherwise" });
    return { ...base, applies: false, reason: `outside AISC 360-16 §E6 as this program applies it: a leg is slender (b/t = ${legRatio.toFixed(1)} > ${legLimit.toFixed(1)}), and §E7 is not applied here.` };
  }
  if (legRatio !== null) conditions.push({ condition: `legs not slender: b/t = ${legRatio.toFixed(1)} ≤ 0.45√(E/F_y) = ${legLimit.toFixed(1)}`, met: true, clause: "AISC 360-16 Table B4.1a case 3" });
  const strength = (spacing: number) => {
    const col = at(spacing);
    const y = col.axes.find((a) => a.axis === "y")!;
    const ft = pair && pairSection && shears.y ? aiscFlexuralTorsional(pairSection, y.strength.elasticBucklingStress, { angle: pair.angle, gap: pair.gap, length: c.height, ends: "pinned-pinned", yieldStrength: Fy, elasticModulus: E, shearModulus: G_OVER_E * E, basis: factored ? "factored" : "allowable", connection }) : null;
    const governs = ft && ft.available < col.available ? "flexural-torsional buckling (§E4)" : `flexural buckling about ${col.governingAxis}`;
    return { col, ft, available: ft ? Math.min(ft.available, col.available) : col.available, governs };
  };

  // Flexure about x (the beam loads' axis): M_c = F_y Z, φ_b/Ω_b: the plastic moment of a compact, laterally braced section (a stated simplification).
  const Z = plasticModulusX(rects);
  const Mc = factored ? PHI_B * Fy * Z : (Fy * Z) / OMEGA_B;
  // B_1 = C_m/(1 − α P_r/P_e1), C_m = 1.0, α = 1.0 (LRFD) or 1.6 (ASD), P_e1 = π²EI_x/L_cx² (AISC 360-16 Appendix 8 §8.2.1 [M]).
  const alpha = factored ? 1 : 1.6;
  const Pe1 = (Math.PI ** 2 * E * g.Ix) / c.axes.x.effectiveLength ** 2;
  const B1 = (P: number) => (alpha * P < Pe1 ? Math.max(1, 1 / (1 - (alpha * P) / Pe1)) : Infinity);
  const utilisation = (s: ReturnType<typeof strength>) =>
    Math.max(
      ...c.actions.map((act) => {
        const axial = act.axial / s.available;
        if (!(act.moment > 0)) return axial;
        const b1 = B1(act.axial);
        if (!Number.isFinite(b1)) return 1e12;
        return Math.max(axial, aiscH1Interaction({ requiredAxial: act.axial, availableAxial: s.available, requiredMomentX: b1 * act.moment, availableMomentX: Mc }).utilisation);
      }),
    );

  // The largest spacing §E6.2 allows, then closer while the strength falls short and closer connectors raise it.
  const aMax = at(1).spacing.largest;
  let aLimit = aMax;
  let spacingGoverns = `the largest spacing of ${at(1).spacing.governing.reference}`;
  // Closer than a_max only where it raises the strength, and no closer than the closest spacing the schedule can build
  // (the bolts' least spacing, c.minSpacing or 3d, AISC 360-16 §J3.3, rounded up to the spacing module): a strut that
  // fails there gets its connectors there and fails, so more load never means fewer connectors.
  const aLow = closestBuildable(c, aMax, leastPitch);
  const uMax = utilisation(strength(aMax));
  if (!(aLow < aMax)) {
    aLimit = aLow;
    spacingGoverns = "the closest spacing the bolts and the spacing module allow, which exceeds a_max";
  }
  if (uMax > 1 + 1e-9 && aLow < aMax) {
    const uLow = utilisation(strength(aLow));
    if (uLow < uMax * (1 - 1e-9)) {
      let lo = aLow;
      let hi = aMax;
      if (uLow <= 1 + 1e-9) {
        for (let i = 0; i < 60; i++) {
          const mid = (lo + hi) / 2;
          if (utilisation(strength(mid)) <= 1 + 1e-9) lo = mid;
          else hi = mid;
        }
      }
      aLimit = lo;
      spacingGoverns =
        uLow <= 1 + 1e-9
          ? "the axial strength: closer than a_max, so that the modified slenderness (§E6.1) leaves enough strength"
          : "the axial strength: the strut falls short even with the connectors as close as they can be built; a larger section is needed";
    }
  }
  const largestScheduled = c.joints.map((j) => j.spacing).filter((s): s is number => s !== null);
  const a = Math.min(aLimit, ...largestScheduled);
  const s = strength(a);
  const col = s.col;

  const per = c.actions.map((act) => {
    const b1 = act.moment > 0 ? B1(act.axial) : 1;
    const h1 = act.moment > 0 && Number.isFinite(b1) ? aiscH1Interaction({ requiredAxial: act.axial, availableAxial: s.available, requiredMomentX: b1 * act.moment, availableMomentX: Mc }) : null;
    return { act, b1, interaction: act.moment > 0 ? (h1 ? h1.utilisation : 1e12) : null, h1 };
  });
  const util = (p: (typeof per)[number]) => Math.max(p.act.axial / s.available, p.interaction ?? 0);
  const gov = per.reduce((x, y) => (util(y) > util(x) ? y : x));
  const designYield = factored ? 0.9 * Fy : Fy / 1.67;

  const checks: MemberCheck[] = [columnCheck("column-axial", `Column axial compression P_r ≤ ${factored ? "φ_c P_n" : "P_n/Ω_c"} (${s.governs})`, gov.act.axial, s.available, "force", gov.act.combination.id, null, `AISC 360-16 §E1, §E3${s.ft ? ", §E4" : ""}, §E6.1`)];
  if (exceeds(aLimit, aMax)) checks.push(columnCheck("column-connector-spacing", "Intermediate connectors' spacing a ≤ a_max", aLimit, aMax, "length", gov.act.combination.id, null, col.spacing.governing.reference));
  const bending = per.filter((p) => p.interaction !== null);
  if (bending.length > 0) {
    const worst = bending.reduce((x, y) => (y.interaction! > x.interaction! ? y : x));
    checks.push(columnCheck("column-interaction", "Column bending and axial compression, AISC H1-1", worst.interaction!, 1, "ratio", worst.act.combination.id, worst.act.momentAt, `AISC 360-16 §H1.1 eq. ${worst.h1?.equation ?? "H1-1a"} [M], M_r = B_1·M (Appendix 8 [M])`));
  }

  const sources = [`greatest spacing of the intermediate connectors ${len(aLimit)}: ${spacingGoverns}`, ...col.spacing.rules.map((r) => `${r.rule}: ${len(r.value)} (${r.reference})`)];
  const end = col.endConnection;
  const endNote = `End connections bearing on base plates or milled surfaces (AISC 360-16 §E6.2(b)): welded over at least ${len(end.weldLength)}, or bolted over ${len(end.boltedLength)} from each end${end.boltPitch !== null ? ` at a pitch of at most ${len(end.boltPitch)} (4d), ${end.boltsPerLine} bolts in a line` : ""}; not placed by this schedule: detail them at the ends.`;
  const joints: ColumnJointDemand[] = c.joints.map((j) => ({
    joint: j.id,
    limits: { maxSpacing: aLimit, sources },
    rowsRequired: null,
    bucklingFlow: null,
    bucklingShear: null,
    addsToLateral: false,
    notes: [
      "AISC 360-16 §E6 gives no force on the intermediate connectors from flexural buckling: they are set by the largest spacing, and by the lateral load's shear flow q = V·Q/I where that needs them closer.",
      j.spacing !== null && j.spacing < aLimit * (1 - 1e-9)
        ? `Joint ${j.id}: without the column's rule its schedule is already no wider than ${len(j.spacing)} (the bolts' own greatest spacing or the lateral load's q = V·Q/I), closer than the column's ${len(aLimit)}: that governs.`
        : `Joint ${j.id}: the column's greatest spacing ${len(aLimit)} (${spacingGoverns}) governs where the lateral load's q = V·Q/I does not need the connectors closer.`,
      endNote,
    ],
  }));

  const steps: WorkingLine[] = [
    step("A_g", `components${packing.size > 0 ? ", packing left out" : ""}`, g.A, "area"),
    ...axisNames.flatMap((x) => [step(`I_${x}`, `built-up section about ${x}`, x === "x" ? g.Ix : g.Iy, "secondMoment"), step(`r_${x}`, `√(I_${x}/A_g)`, radius[x], "length")]),
    step("r_i", `least radius of gyration of one component (${least.part.name || least.part.id})`, ri, "length", "AISC 360-16 §E6.1"),
    step("E", "least of the components", E, "modulus"),
    step("F_y", "least of the components", Fy, "stress"),
    ...axisNames.map((x) => step(`L_c (${x})`, c.axes[x].basis, c.axes[x].effectiveLength, "length")),
    ...(col.steps as WorkingLine[]),
    ...(s.ft ? (s.ft.steps as WorkingLine[]) : []),
    step(factored ? "φ_c P_n" : "P_n/Ω_c", `available axial strength: ${s.governs} governs`, s.available, "force", "AISC 360-16 §E1"),
    ...(bending.length > 0
      ? [
          step("Z_x", "plastic section modulus about x", Z, "firstMoment"),
          step(factored ? "φ_b M_p" : "M_p/Ω_b", `M_c = F_y Z_x ${factored ? "× 0.90" : "÷ 1.67"}: compact and laterally braced, taken as stated`, Mc, "moment", "AISC 360-16 §F1, §F2.1"),
          step("P_e1", "π²EI_x/L_cx²", Pe1, "force", "AISC 360-16 Appendix 8 [M]"),
          step("B_1", `1/(1 − ${alpha}·P_r/P_e1), C_m = 1.0, ${gov.act.combination.id}`, Number.isFinite(gov.b1) ? gov.b1 : 1e12, "ratio", "AISC 360-16 Appendix 8 eq. A-8-3 [M]"),
          ...(gov.h1 ? (gov.h1.steps as WorkingLine[]) : []),
        ]
      : []),
  ];
  const axes: ColumnDesign["axes"] = axisNames.map((x) => {
    const ax = col.axes.find((k) => k.axis === x)!;
    const slender = ax.modified ? ax.modified.value : ax.overallSlenderness;
    return {
      axis: x,
      K: c.axes[x].K,
      basis: c.axes[x].basis,
      unbraced: c.axes[x].unbraced,
      effectiveLength: c.axes[x].effectiveLength,
      depth: radius[x],
      slenderness: slender,
      jointed: shears[x],
      factor: 1,
      stiffness: E * (x === "x" ? g.Ix : g.Iy),
      euler: ax.strength.elasticBucklingStress * g.A,
      stability: ax.strength.criticalStress / Fy,
    };
  });
  const notes = [
    `Axes: r = √(I/A_g), slenderness L_c/r (the modified (L_c/r)_m of §E6.1 about the axis that shears the connectors${connection === "snug-tight bolts" ? ", eq. E6-1 for snug-tight bolts" : ", eq. E6-2 for pretensioned bolts"}); π²EI/L_c² is F_e·A_g; the stability factor is F_cr/F_y; the strength is ${factored ? "φ_c F_y" : "F_y/Ω_c"}.`,
    `The intermediate connectors' greatest spacing is ${len(aLimit)}, set by ${spacingGoverns}; the strength is taken at a = ${len(a)}.`,
    ...(axisNames.some((x) => c.compression[x].K === undefined) ? ["K_e by end conditions is taken from NDS-2018 Table G1; AISC 360-16 Commentary Table C-A-7.1 recommends the same values or less (2.0 for a pinned base under a guided top) [M]."] : []),
    ...(packing.size > 0 ? [`Packing (${[...packing].join(", ")}) is left out of A_g, I and r; the lateral-load analysis counts it as continuous.`] : []),
    ...(bending.length > 0 ? ["Flexure: M_c = F_y Z_x with φ_b/Ω_b, the plastic moment of a compact section braced against lateral-torsional buckling, taken as a stated simplification: lateral-torsional buckling (AISC 360-16 §F9 for tees and double angles, §F2.2) and local buckling in flexure are not checked."] : []),
    ...(!s.ft ? ["Torsional and flexural-torsional buckling (AISC 360-16 §E4) are not checked for this section (computed for two equal angles back to back only)."] : ["Flexural-torsional buckling (§E4) with C_w taken as 0 and J by Σbt³/3 (conservative for double angles)."]),
    ...col.warnings,
    `Not checked: ${notChecked.join("; ")}.`,
  ];
  return {
    ...base,
    applies: true,
    reason: null,
    axes,
    combinations: per.map((p) => ({ combination: p.act.combination.id, axial: p.act.axial, moment: p.act.moment, strength: designYield, stability: s.available / (designYield * g.A), capacity: s.available, interaction: p.interaction })),
    governing: gov.act.combination.id,
    checks,
    joints,
    steps,
    notes,
  };
}

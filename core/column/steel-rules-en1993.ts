import type { Connector } from "../connector/registry.js";
import { steelBoltDiameter } from "../connector/steel-bolt.js";
import { metricBoltSize } from "../connector/steel/bolt-sizes.js";
import type { MemberCheck, WorkingLine } from "../schema/result.js";
import type { PlacedPart } from "../section/section-model.js";
import { inJobUnits } from "../units/format.js";
import { exceeds } from "../units/limits.js";
import { columnCheck, step, type Axis, type ColumnDesign, type ColumnJob, type ColumnJointDemand, type ColumnRule, closestBuildable, designStart } from "./column-rules.js";
import { en1993CloselySpacedLimit, en1993CloselySpacedMember } from "./steel-built-up-en1993.js";
import { EN1993_GAMMA_M1, en1993FlexuralBuckling, type BucklingCurve } from "./steel-compression.js";
import { rectGeometry } from "./steel-rules.js";

/**
 * EN 1993-1-1 §6.4.4: closely spaced built-up members (two angles or two channels back to back, in
 * contact or through packing plates), checked as one integral member by §6.3.1 when the
 * interconnections are no further apart than 15 i_min (Table 6.9 [M]); the shear the packing plates
 * and their bolts carry from §6.4.3 with the plates as battens (§6.4.4(2) [M]). Design basis only.
 */

const isEnBolt = (c: Connector) => c.kind === "steel-bolt" && c.standard === "EN1993-1-8";

/** EN 1993-1-1 Table 6.2 [M]: L-sections curve b, U-sections curve c, about any axis. */
const CURVE: Record<"angle" | "channel", BucklingCurve> = { angle: "b", channel: "c" };

/** The least hole-to-hole spacing of an EN 1993-1-8 bolt: as given, or p_1 ≥ 2.2 d_0 (Table 3.3); d_0 = d + 2 mm off the table [M]. */
function leastPitch(c: Connector): number {
  if (c.kind !== "steel-bolt") return 0;
  const d = steelBoltDiameter(c) ?? 12;
  return c.minSpacing ?? 2.2 * (metricBoltSize(c.size ?? "")?.d0 ?? d + 2);
}

export const en1993Closely: ColumnRule = {
  id: "en1993-6.4",
  title: "Closely spaced built-up steel compression member",
  standard: "EN 1993-1-1 §6.4.4",
  suits: (c) => c.job.basis === "factored" && c.joints.length > 0 && c.joints.every((j) => isEnBolt(j.connector)) && c.section.parts.every((p) => p.material.family === "steel"),
  design: (c) => designClosely(c),
};

function componentShapes(parts: PlacedPart[], c: ColumnJob) {
  return parts.map((p) => c.job.parts.find((q) => q.id === p.id)!.shape);
}

function designClosely(c: ColumnJob): ColumnDesign {
  const packing = new Set(c.compression.packing);
  const parts = c.section.parts.filter((p) => !packing.has(p.id));
  const plates = c.section.parts.filter((p) => packing.has(p.id));
  const units = c.job.units;
  const len = (mm: number) => inJobUnits(mm, "length", units);
  const factored = c.job.basis === "factored";
  const shapes = componentShapes(parts, c);
  const kind = shapes.every((s) => s.type === "angle") ? "angle" : shapes.every((s) => s.type === "channel") ? "channel" : null;
  const same = shapes.length === 2 && JSON.stringify({ ...shapes[0], heel: undefined, toes: undefined, designation: undefined }) === JSON.stringify({ ...shapes[1], heel: undefined, toes: undefined, designation: undefined });
  const fullLength = c.job.parts.every((p) => packing.has(p.id) || !p.extent || ((p.extent.from ?? 0) <= 0 && (p.extent.to === undefined || !(p.extent.to < c.height * (1 - 1e-9)))));
  const moments = c.actions.some((a) => a.moment > 1e-9 * Math.max(1, a.axial) * c.height);
  const conditions = [
    { condition: `basis "factored": EN 1993-1-1 is a design-value (limit state) standard; basis "allowable" is refused`, met: factored, clause: "EN 1990 §6.4.3, EN 1993-1-1 §6.1" },
    { condition: `two components, packing left out (${parts.length})`, met: parts.length === 2, clause: "EN 1993-1-1 §6.4.4(1), Figure 6.12 [M]" },
    { condition: "the components are two equal angles or two equal channels", met: kind !== null && same, clause: "EN 1993-1-1 §6.4.4(1) [M]" },
    { condition: "every component is steel with its yield strength (materials[].yieldStrength)", met: parts.every((p) => p.material.family === "steel" && p.material.yieldStrength !== undefined), clause: "EN 1993-1-1 §3.2" },
    { condition: "the interconnections are EN 1993-1-8 bolts", met: c.joints.length > 0 && c.joints.every((j) => isEnBolt(j.connector)), clause: "EN 1993-1-8 §3" },
    { condition: "every component runs the full length of the member", met: fullLength, clause: "EN 1993-1-1 §6.4.1(1) [M]" },
    { condition: "axial compression alone (no lateral load, no eccentric axial load): the bending and compression interaction (§6.3.3) is not applied by this rule", met: !moments, clause: "EN 1993-1-1 §6.3.3" },
  ];
  const notChecked = [
    "the packing plates themselves and their bearing under the shear they pass",
    "the end connections and the end packing plates (EN 1993-1-1 §6.4.4 asks for interconnections at the ends as well [M]): detail them at the ends",
    "torsional and flexural-torsional buckling (EN 1993-1-1 §6.3.1.4) of the angles or channels",
    "buckling of one component between interconnections (within 15 i_min the integral member's check stands for it, Table 6.9 [M])",
  ];
  const base = designStart(en1993Closely, c, conditions);
  const unmet = conditions.filter((x) => !x.met);
  if (unmet.length > 0) {
    const basisNote = factored ? "" : `basis: set "basis" to "factored" (design values, γ_M1); EN 1993-1-1 §6.4 is not applied on an allowable basis. `;
    return { ...base, applies: false, reason: `${basisNote}outside EN 1993-1-1 §6.4.4 as this program applies it: ${unmet.map((x) => x.condition).join("; ")}.` };
  }

  const E = Math.min(...parts.map((p) => p.material.E));
  const fy = Math.min(...parts.map((p) => p.material.yieldStrength!));
  const eps = Math.sqrt(235 / fy);
  // Cross-section class 3 or better (EN 1993-1-1 Table 5.2 [M]), so that A is the gross area in §6.3.1.
  const shape = shapes[0]!;
  const classLimits =
    shape.type === "channel"
      ? [
          { name: "flange outstand c/t = (b_f − t_w)/t_f", value: (shape.bf - shape.tw) / shape.tf, limit: 14 * eps, clause: "EN 1993-1-1 Table 5.2 sheet 2, class 3 outstand [M]" },
          { name: "web c/t = (d − 2t_f)/t_w", value: (shape.d - 2 * shape.tf) / shape.tw, limit: 42 * eps, clause: "EN 1993-1-1 Table 5.2 sheet 1, class 3 internal part in compression [M]" },
        ]
      : shape.type === "angle"
        ? [
            { name: "leg h/t", value: Math.max(shape.d, shape.b) / shape.t, limit: 15 * eps, clause: "EN 1993-1-1 Table 5.2 sheet 3, angles class 3 [M]" },
            { name: "(b + h)/(2t)", value: (shape.d + shape.b) / (2 * shape.t), limit: 11.5 * eps, clause: "EN 1993-1-1 Table 5.2 sheet 3, angles class 3 [M]" },
          ]
        : [];
  for (const k of classLimits) conditions.push({ condition: `not slender (class 3 or better): ${k.name} = ${k.value.toFixed(1)} ≤ ${k.limit.toFixed(1)} (ε = √(235/f_y))`, met: !exceeds(k.value, k.limit), clause: k.clause });
  const slender = classLimits.filter((k) => exceeds(k.value, k.limit));
  if (slender.length > 0) return { ...base, applies: false, reason: `outside EN 1993-1-1 §6.4.4 as this program applies it: the section is class 4 (${slender.map((k) => k.name).join("; ")}), and effective areas (EN 1993-1-5) are not applied here.` };

  const rects = parts.flatMap((p) => p.rects);
  const g = rectGeometry(rects);
  const radius = { x: Math.sqrt(g.Ix / g.A), y: Math.sqrt(g.Iy / g.A) };
  const chords = parts.map((p) => ({ part: p, geo: rectGeometry(p.rects) }));
  const chord = chords[0]!.geo;
  const iMin = Math.min(...chords.map((k) => Math.sqrt(k.geo.Imin / k.geo.A)));
  // The chords stand side by side (centroids apart in x): buckling about y shears the interconnections; one above the other: about x.
  const dx = Math.abs(chords[0]!.geo.xc - chords[1]!.geo.xc);
  const dy = Math.abs(chords[0]!.geo.yc - chords[1]!.geo.yc);
  const jointed: Axis = dx >= dy ? "y" : "x";
  const h0 = Math.hypot(dx, dy);
  const Ich = Math.min(...chords.map((k) => (jointed === "y" ? k.geo.Iy : k.geo.Ix)));
  const Ach = Math.min(...chords.map((k) => k.geo.A));
  const curve = CURVE[kind!];
  const axisNames: Axis[] = ["x", "y"];
  const buckling = Object.fromEntries(axisNames.map((x) => [x, en1993FlexuralBuckling({ area: g.A, yieldStrength: fy, elasticModulus: E, slenderness: c.axes[x].effectiveLength / radius[x], curve })])) as Record<Axis, ReturnType<typeof en1993FlexuralBuckling>>;
  const governingAxis: Axis = buckling.x.resistance <= buckling.y.resistance ? "x" : "y";
  const NbRd = buckling[governingAxis].resistance;

  // Table 6.9: the largest spacing; the schedule cannot build one closer than its least buildable spacing.
  const limit = en1993CloselySpacedLimit({ chordMinRadius: iMin, kind: "in contact or through packing plates", spacing: 1 });
  const aMax = limit.largest;
  const aLow = closestBuildable(c, aMax, leastPitch);
  const aLimit = aLow > aMax ? aLow : aMax;
  const largestScheduled = c.joints.map((j) => j.spacing).filter((s): s is number => s !== null);
  const a = Math.min(aLimit, ...largestScheduled);

  // Packing plates as battens (§6.4.4(2) → §6.4.3 [M]): one plane of plates between the chords. A plate's length along the
  // member is not in the job: it is taken as 2 e_1 of the bolt (the least that holds one bolt), the least I_b, so the least S_v.
  const plateDepth = plates.length > 0 ? Math.min(...plates.map((p) => { const r = p.rects[0]!; return jointed === "y" ? r.y1 - r.y0 : r.x1 - r.x0; })) : null;
  const plateThickness = plates.length > 0 ? Math.min(...plates.map((p) => { const r = p.rects[0]!; return jointed === "y" ? r.x1 - r.x0 : r.y1 - r.y0; })) : null;
  // e_1 of the bolt, or its least 1.2 d_0 (EN 1993-1-8 Table 3.3); d_0 = d + 2 mm where the size is not in the table [M].
  const e1 = Math.min(
    ...c.joints.map((j) => {
      if (j.connector.kind !== "steel-bolt") return Infinity;
      const d = steelBoltDiameter(j.connector) ?? 12;
      return j.connector.endDistance ?? 1.2 * (metricBoltSize(j.connector.size ?? "")?.d0 ?? d + 2);
    }),
  );
  const plateLength = 2 * e1;
  // In contact (no packing plate): the component's own depth stands for the plate's in I_b.
  const componentDepth = Math.max(...chords[0]!.part.rects.map((r) => (jointed === "y" ? r.y1 : r.x1))) - Math.min(...chords[0]!.part.rects.map((r) => (jointed === "y" ? r.y0 : r.x0)));
  const Ib = ((plateDepth ?? componentDepth) * plateLength ** 3) / 12;
  const L = c.axes[jointed].effectiveLength;
  const integralSlenderness = L / radius[jointed];
  const packingAt = (N: number) =>
    en1993CloselySpacedMember({
      kind: "in contact or through packing plates",
      chordMinRadius: iMin,
      integral: { area: g.A, slenderness: integralSlenderness, curve },
      length: L,
      axialForce: N,
      chordArea: Ach,
      chordSecondMoment: Ich,
      chordDistance: h0,
      battenSpacing: a,
      battenSecondMoment: Ib,
      battenPlanes: 1,
      elasticModulus: E,
      yieldStrength: fy,
      chordCurve: curve,
      chordRadius: iMin,
    });
  const per = c.actions.map((act) => {
    const m = act.axial > 0 ? packingAt(act.axial) : null;
    return { act, m, stable: m ? m.packing.force.stable : true, shear: m && m.packing.force.stable ? m.packing.force.shear : 0 };
  });
  const gov = per.reduce((x, y) => (y.act.axial > x.act.axial ? y : x));
  const unstable = per.filter((p) => !p.stable).map((p) => p.act.combination.id);
  const flows = per.map((p) => p.shear / h0);

  const checks: MemberCheck[] = [columnCheck("column-axial", `Column buckling N_Ed ≤ N_b,Rd (integral member, flexural buckling about ${governingAxis}, curve ${curve})`, gov.act.axial, NbRd, "force", gov.act.combination.id, null, "EN 1993-1-1 §6.3.1, §6.4.4(1) [M]")];
  if (exceeds(aLimit, aMax)) checks.push(columnCheck("column-connector-spacing", "Interconnections' spacing a ≤ 15 i_min (the closest the bolts and the module allow)", aLimit, aMax, "length", gov.act.combination.id, null, "EN 1993-1-1 §6.4.4(1), Table 6.9 [M]"));
  const problems = unstable.length > 0 ? [`the built-up member buckles under N_Ed with the packing plates' shear stiffness (1 − N_Ed/N_cr − N_Ed/S_v ≤ 0, EN 1993-1-1 §6.4.1(6)) in ${unstable.join(", ")}: no packing-plate shear can be given`] : [];

  const spacingGoverns = exceeds(aLimit, aMax) ? "the closest spacing the bolts and the spacing module allow, which exceeds 15 i_min" : "15 i_min, EN 1993-1-1 §6.4.4(1), Table 6.9 [M]";
  const sources = [`greatest spacing of the interconnections ${len(aLimit)}: ${spacingGoverns}`];
  const gm = gov.m;
  // Unstable with the plates' shear stiffness: no shear can be given, so the bolts go as close as they can be built (the joint fails).
  const jointSpacing = unstable.length > 0 ? Math.min(aLimit, aLow) : aLimit;
  if (unstable.length > 0) sources.push(`the member buckles under N_Ed with the packing plates' shear stiffness: the bolts at the closest buildable spacing ${len(jointSpacing)}`);
  const joints: ColumnJointDemand[] = c.joints.map((j) => ({
    joint: j.id,
    limits: { maxSpacing: jointSpacing, sources },
    rowsRequired: null,
    bucklingShear: per.map((p) => p.shear),
    bucklingFlow: flows,
    ...(problems.length > 0 ? { problems } : {}),
    addsToLateral: jointed === "x",
    notes: [
      `Packing-plate shear: V_Ed = π M_Ed/L from the bow imperfection L/500 (EN 1993-1-1 §6.4.1(6), (7), §6.4.4(2) [M]), passed between the chords as a flow V_Ed/h_0 on each contact line (h_0 = ${len(h0)}), the longitudinal shear V_Ed a/h_0 of each plate (Figure 6.11 [M]).`,
      `Joint ${j.id}: the greatest spacing ${len(aLimit)} (${spacingGoverns}) governs where the packing-plate shear does not need the bolts closer.`,
    ],
  }));

  // A result holds no infinities (core/finite-verdict.ts): an unstable member's M_Ed and V_Ed show as 1e12.
  const steps: WorkingLine[] = [
    step("A", `integral member, two ${kind}s${packing.size > 0 ? ", packing left out" : ""}`, g.A, "area"),
    ...axisNames.flatMap((x) => [step(`I_${x}`, `integral member about ${x}`, x === "x" ? g.Ix : g.Iy, "secondMoment"), step(`i_${x}`, `√(I_${x}/A)`, radius[x], "length")]),
    step("E", "least of the components", E, "modulus"),
    step("f_y", "least of the components", fy, "stress"),
    step("curve", `buckling curve ${curve} (α = ${buckling.x.alpha}): ${kind === "channel" ? "U-sections" : "L-sections"}, any axis`, buckling.x.alpha, "ratio", "EN 1993-1-1 Table 6.2 [M]"),
    ...axisNames.flatMap((x) => [
      step(`L_cr (${x})`, c.axes[x].basis, c.axes[x].effectiveLength, "length"),
      ...(buckling[x].steps as WorkingLine[]).map((s) => ({ ...s, symbol: `${s.symbol} (${x})` })),
    ]),
    step("N_b,Rd", `least of the two axes: about ${governingAxis}`, NbRd, "force", "EN 1993-1-1 eq. (6.47)"),
    ...(limit.steps.slice(0, 2) as WorkingLine[]).map((s, i) => (i === 0 ? { ...s, description: `least radius of gyration of one component (one ${kind})` } : s)),
    step("a", "spacing of the interconnections taken for the packing-plate shear (the greatest the schedule may build)", a, "length"),
    step("h_0", "distance between the components' centroids", h0, "length"),
    step("I_ch", `one component about its own axis parallel to ${jointed}`, Ich, "secondMoment"),
    step("I_b", plateDepth !== null ? `one packing plate in its plane, depth ${len(plateDepth)} × (2e_1 = ${len(plateLength)})³/12` : `components in contact: the component's depth × (2e_1 = ${len(plateLength)})³/12`, Ib, "secondMoment"),
    ...(gm ? ((gm.packing.steps as WorkingLine[]).filter((s) => !/^(M_ch|M_b|N_ch,Ed \/|N_b,Rd \(chord|χ \(chord|Φ \(chord|λ̄ \(chord|α \(chord|N_cr \(chord|γ_M1 \(chord)/.test(s.symbol)).map((s) => ({ ...s, value: Number.isFinite(s.value) ? s.value : 1e12, description: `${s.description}; ${gov.act.combination.id}` }))) : []),
  ];
  const axes: ColumnDesign["axes"] = axisNames.map((x) => ({
    axis: x,
    K: c.axes[x].K,
    basis: c.axes[x].basis,
    unbraced: c.axes[x].unbraced,
    effectiveLength: c.axes[x].effectiveLength,
    depth: radius[x],
    slenderness: c.axes[x].effectiveLength / radius[x],
    jointed: x === jointed,
    factor: 1,
    stiffness: E * (x === "x" ? g.Ix : g.Iy),
    euler: buckling[x].criticalForce,
    stability: buckling[x].reduction,
  }));
  const notes = [
    `Closely spaced: the interconnections no further apart than 15 i_min = ${len(aMax)} (i_min = ${len(iMin)} of one ${kind}), so the member is checked as one integral member by §6.3.1 (EN 1993-1-1 §6.4.4(1), Table 6.9 [M]); buckling curve ${curve} for ${kind === "channel" ? "U-sections" : "L-sections"} (Table 6.2 [M]), γ_M1 = ${EN1993_GAMMA_M1} (recommended; a National Annex may set another).`,
    ...(packing.size > 0 ? [`Packing (${[...packing].join(", ")}) is left out of A, I and i${plateThickness !== null ? `; the plates are ${len(plateThickness)} thick between the components and ${len(plateDepth!)} deep, taken from their shape` : ""}; a plate's length along the member is not in the job and is taken as 2e_1 = ${len(plateLength)} (the least that holds one bolt, so the least I_b and S_v: more shear, on the safe side).`] : []),
    `The packing-plate shear is worked with the member's effective length about ${jointed} (${len(L)}) as the hinged length L of §6.4.1 and at a = ${len(a)}.`,
    ...(gm ? gm.warnings : []),
    `Not checked: ${notChecked.join("; ")}.`,
  ];
  return {
    ...base,
    applies: true,
    reason: null,
    axes,
    combinations: per.map((p) => ({ combination: p.act.combination.id, axial: p.act.axial, moment: p.act.moment, strength: fy / EN1993_GAMMA_M1, stability: NbRd / ((g.A * fy) / EN1993_GAMMA_M1), capacity: NbRd, interaction: null })),
    governing: gov.act.combination.id,
    checks,
    joints,
    steps,
    notes,
  };
}

import { z } from "zod";
import { Id, positive, Text } from "../schema/quantity.js";
import { comparedInJobUnits, formatNumber, inJobUnits } from "../units/format.js";
import type { ConnectorContext, JoinedMember, PlacementProblem, WeldDetailing, WeldKind, WeldResistance, WorkingStep } from "./connector-kind.js";
import { MM_PER_IN, N_PER_KIP, MPA_PER_KSI } from "./quantity-text.js";
import { EN1993_GAMMA_M2 } from "./steel/en1993-bolt.js";
import {
  aiscFilletStrength,
  aiscFusionFaceStrength,
  aiscMaximumEdgeFilletIn,
  aiscMinimumFilletIn,
  aiscMinimumSegmentIn,
  correlationFactor,
  electrodes,
  en1993FilletStrength,
} from "./steel/fillet-weld-strength.js";
import { steelStandards } from "./steel-bolt.js";
import { exceeds, fallsShort } from "../units/limits.js";

export const FilletWeld = z
  .strictObject({
    id: Id,
    kind: z.literal("fillet-weld"),
    label: Text(80).optional(),
    source: Text(160).default(""),
    standard: z.enum(steelStandards),
    /** Leg size w of an equal-leg fillet; or give the throat. */
    leg: positive("length").optional(),
    /** Effective throat a (EN practice: "a5"); or give the leg. */
    throat: positive("length").optional(),
    /** AISC: filler metal classification; E70 when absent. EN 1993-1-8: matching electrodes are assumed (§4.2). */
    electrode: z.enum(electrodes).optional(),
    pattern: z.enum(["continuous", "intermittent"]).default("continuous"),
    /**
     * Intermittent welds: length of each segment and its centre-to-centre pitch. In design mode the
     * pitch is the largest wanted; each zone gets its own pitch up to it.
     */
    segmentLength: positive("length").optional(),
    pitch: positive("length").optional(),
    /** Intermittent segments on the two sides of a web: opposite each other (chain) or alternating (staggered). */
    arrangement: z.enum(["chain", "staggered"]).default("staggered"),
  })
  .superRefine((c, ctx) => {
    if ((c.leg === undefined) === (c.throat === undefined)) ctx.addIssue({ code: "custom", path: [c.leg === undefined ? "leg" : "throat"], message: "give either the leg size or the throat" });
    if (c.standard === "EN1993-1-8" && c.electrode !== undefined) ctx.addIssue({ code: "custom", path: ["electrode"], message: "applies to AISC 360-16 welds only; EN 1993-1-8 assumes matching electrodes (§4.2)" });
    if (c.pattern === "intermittent") {
      if (c.segmentLength === undefined) ctx.addIssue({ code: "custom", path: ["segmentLength"], message: "is required for an intermittent weld" });
      if (c.pitch === undefined) ctx.addIssue({ code: "custom", path: ["pitch"], message: "is required for an intermittent weld" });
      if (c.segmentLength !== undefined && c.pitch !== undefined && c.pitch < c.segmentLength) ctx.addIssue({ code: "custom", path: ["pitch"], message: "must be at least the segment length" });
    } else {
      for (const key of ["segmentLength", "pitch"] as const) if (c[key] !== undefined) ctx.addIssue({ code: "custom", path: [key], message: "applies to intermittent welds only" });
    }
  });
export type FilletWeld = z.infer<typeof FilletWeld>;

const leg = (c: FilletWeld) => c.leg ?? c.throat! * Math.SQRT2;
const throat = (c: FilletWeld) => c.throat ?? c.leg! / Math.SQRT2;

/** Thickness of a steel part as a plate: the smaller of its two dimensions at the line. */
const plateThickness = (m: JoinedMember) => Math.min(m.thickness, m.width);

/** Where the fillet runs: along the edge of the narrower part (lap, cover plate), or in the corner of a T (a web on a flange). */
function arrangement(context: ConnectorContext): { thinner: number; edgeOf: JoinedMember | null } {
  const [a, b] = context.members;
  const narrower = a.width <= b.width ? a : b;
  return { thinner: Math.min(plateThickness(a), plateThickness(b)), edgeOf: narrower.thickness <= narrower.width ? narrower : null };
}

function detailing(c: FilletWeld, context: ConnectorContext): WeldDetailing {
  const w = leg(c);
  const { thinner, edgeOf } = arrangement(context);
  if (c.standard === "AISC-360-16") {
    const tIn = thinner / MM_PER_IN;
    const maxSize = edgeOf ? aiscMaximumEdgeFilletIn(edgeOf.thickness / MM_PER_IN) * MM_PER_IN : thinner;
    return {
      size: w,
      minSize: aiscMinimumFilletIn(tIn) * MM_PER_IN,
      maxSize,
      minSegmentLength: aiscMinimumSegmentIn(w / MM_PER_IN) * MM_PER_IN,
      maxPitch: Math.min(24 * thinner, 12 * MM_PER_IN),
      maxGap: null,
      sources: [
        `AISC 360-16 Table J2.4: least fillet ${formatNumber(aiscMinimumFilletIn(tIn))} in for a thinner part of ${formatNumber(tIn)} in`,
        edgeOf ? `AISC 360-16 §J2.2b: along the edge of part "${edgeOf.part}", at most t − 1/16 in (t for t < 1/4 in)` : `in the corner of a T: at most the thinner part's thickness (common practice [CP])`,
        "AISC 360-16 §J2.2b: intermittent segments at least 4w and 1-1/2 in",
        "maximum pitch of intermittent segments 24t ≤ 12 in of the thinner part, after AISC 360-16 §D4 and §J3.5 for parts in contact [M]",
      ],
    };
  }
  const a = throat(c);
  const b = Math.min(...context.members.map((m) => Math.max(m.width, m.thickness)));
  return {
    size: w,
    minSize: 3 * Math.SQRT2,
    maxSize: edgeOf ? edgeOf.thickness : thinner,
    minSegmentLength: Math.max(6 * a, 30),
    maxPitch: null,
    maxGap: Math.min(12 * thinner, 0.25 * b, 200),
    sources: [
      "EN 1993-1-8 §4.5.2(2): throat at least 3 mm (leg 4.24 mm)",
      edgeOf ? `along the edge of part "${edgeOf.part}": leg at most its thickness (common practice [CP])` : "in the corner of a T: leg at most the thinner part's thickness (common practice [CP])",
      "EN 1993-1-8 §4.5.1(2): effective length at least 6a and 30 mm [M]",
      "EN 1993-1-8 §4.3.2.2, Figure 4.1: gaps between intermittent segments at most 12t, 0.25b and 200 mm in members in compression or shear [M]",
    ],
  };
}

function problems(c: FilletWeld, context: ConnectorContext): PlacementProblem[] {
  const out: PlacementProblem[] = [];
  const len = (mm: number) => inJobUnits(mm, "length", context.units);
  const pair = (a: number, b: number) => comparedInJobUnits(a, b, "length", context.units);
  if (c.standard === "EN1993-1-8" && context.basis === "allowable") out.push({ on: "connector", field: "standard", message: `EN 1993-1-8 gives design values for factored loads, but the job's basis is "allowable": set basis to "factored" or use AISC-360-16` });
  context.members.forEach((m, i) => {
    if (m.material.family !== "steel") out.push({ on: "connector", field: "kind", message: `part "${m.part}" is not steel (family "${m.material.family}"): a fillet weld joins steel parts` });
    else if (c.standard === "AISC-360-16" && m.material.tensileStrength === undefined) out.push({ on: "material", member: i as 0 | 1, field: "tensileStrength", message: `is needed for the base metal at the weld's fusion face (AISC 360-16 §J2.4, §J4.2: shear rupture 0.60 F_u)` });
    else if (c.standard === "EN1993-1-8" && m.material.tensileStrength === undefined) out.push({ on: "material", member: i as 0 | 1, field: "tensileStrength", message: `is needed for the weld strength (EN 1993-1-8 §4.5.3.3: f_u of the weaker part)` });
    else if (c.standard === "EN1993-1-8" && m.material.yieldStrength === undefined) out.push({ on: "material", member: i as 0 | 1, field: "yieldStrength", message: `is needed for the correlation factor β_w (EN 1993-1-8 Table 4.1: by steel grade)` });
  });
  if (out.length > 0) return out;
  const d = detailing(c, context);
  const field = c.leg !== undefined ? "leg" : "throat";
  if (exceeds(d.size, d.maxSize)) out.push({ on: "connector", field, message: `a ${pair(d.size, d.maxSize)[0]} fillet is larger than the thinner part allows here (at most ${pair(d.size, d.maxSize)[1]}; ${d.sources[1]})` });
  if (fallsShort(d.size, d.minSize)) out.push({ on: "connector", field, message: `a ${pair(d.size, d.minSize)[0]} fillet is below the least size ${pair(d.size, d.minSize)[1]} (${d.sources[0]})` });
  if (c.pattern === "intermittent") {
    if (fallsShort(c.segmentLength!, d.minSegmentLength)) out.push({ on: "connector", field: "segmentLength", message: `${pair(c.segmentLength!, d.minSegmentLength).join(" is below the shortest segment ")} (${c.standard === "AISC-360-16" ? "AISC 360-16 §J2.2b: 4w and 1-1/2 in" : "EN 1993-1-8 §4.5.1(2): 6a and 30 mm"})` });
    if (d.maxPitch !== null && exceeds(c.pitch!, d.maxPitch)) out.push({ on: "connector", field: "pitch", message: `${pair(c.pitch!, d.maxPitch).join(" is above the largest pitch ")} (${d.sources[3]})` });
    if (d.maxGap !== null && exceeds(c.pitch! - c.segmentLength!, d.maxGap)) out.push({ on: "connector", field: "pitch", message: `the gap ${pair(c.pitch! - c.segmentLength!, d.maxGap)[0]} between segments is above the largest ${pair(c.pitch! - c.segmentLength!, d.maxGap)[1]} (EN 1993-1-8 §4.3.2.2)` });
  }
  return out;
}

function resistancePerLength(c: FilletWeld, context: ConnectorContext): WeldResistance {
  const w = leg(c);
  const a = throat(c);
  const steps: WorkingStep[] = [
    { symbol: "w", description: "leg size", value: w, quantity: "length" },
    { symbol: "a", description: "effective throat, w/√2 for an equal-leg fillet", value: a, quantity: "length" },
  ];
  if (c.standard === "AISC-360-16") {
    const electrode = c.electrode ?? "E70";
    const s = aiscFilletStrength({ throatIn: a / MM_PER_IN, electrode, basis: context.basis });
    const lrfd = context.basis === "factored";
    const perLength = (kipPerIn: number) => (kipPerIn * N_PER_KIP) / MM_PER_IN;
    steps.push({ symbol: "F_nw", description: `0.60 F_EXX, ${electrode}`, value: s.Fnw * MPA_PER_KSI, quantity: "stress", reference: "AISC 360-16 Table J2.5" });
    steps.push({ symbol: "R_n", description: "F_nw × throat per unit length (load along the weld axis: no directional increase)", value: perLength(s.nominal), quantity: "shearFlow", reference: "AISC 360-16 eq. J2-3" });
    steps.push({ symbol: lrfd ? "φR_n" : "R_n/Ω", description: `weld metal, ${lrfd ? "φ = 0.75" : "Ω = 2.00"}`, value: perLength(s.available), quantity: "shearFlow", reference: "AISC 360-16 §J2.4" });
    const modes = [{ mode: "weld metal", value: perLength(s.available), reference: "AISC 360-16 §J2.4(b), eq. J2-3" }];
    const governingText: Record<string, string> = { "weld metal": "weld metal shear on the effective throat" };
    for (const m of context.members) {
      const fuKsi = m.material.tensileStrength! / MPA_PER_KSI;
      const b = aiscFusionFaceStrength({ legIn: w / MM_PER_IN, tensileStrengthKsi: fuKsi, basis: context.basis });
      const mode = `base metal of "${m.part}" at the fusion face`;
      steps.push({ symbol: lrfd ? "φR_n,BM" : "R_n,BM/Ω", description: `${mode}: shear rupture 0.60 F_u × w per unit length (F_u = ${formatNumber(fuKsi)} ksi), ${lrfd ? "φ = 0.75" : "Ω = 2.00"}`, value: perLength(b.available), quantity: "shearFlow", reference: "AISC 360-16 §J2.4(a) eq. J2-2, §J4.2(b) [M]" });
      modes.push({ mode, value: perLength(b.available), reference: "AISC 360-16 §J2.4(a), Table J2.5, §J4.2(b) [M]" });
      governingText[mode] = `${mode} (shear rupture)`;
    }
    const least = modes.reduce((a, b) => (b.value < a.value ? b : a));
    return {
      value: least.value,
      governing: governingText[least.mode]!,
      reference: `AISC 360-16 §J2.4, ${lrfd ? "LRFD φR_n" : "ASD R_n/Ω"}`,
      steps,
      modes,
      warnings: [],
    };
  }
  const weaker = context.members.reduce((p, m) => ((m.material.tensileStrength ?? Infinity) < (p.material.tensileStrength ?? Infinity) ? m : p));
  const fu = weaker.material.tensileStrength!;
  const { betaW, grade } = correlationFactor(Math.min(...context.members.map((m) => m.material.yieldStrength ?? Infinity)));
  const s = en1993FilletStrength({ throat: a, tensileStrength: fu, betaW, gammaM2: EN1993_GAMMA_M2 });
  steps.push({ symbol: "f_u", description: `ultimate tensile strength of the weaker part "${weaker.part}"`, value: fu, quantity: "stress" });
  steps.push({ symbol: "β_w", description: `correlation factor (${grade}, by the lower yield strength)`, value: betaW, quantity: "ratio", reference: "EN 1993-1-8 Table 4.1" });
  steps.push({ symbol: "γ_M2", description: "partial factor (recommended value)", value: EN1993_GAMMA_M2, quantity: "ratio", reference: "EN 1993-1-8 Table 2.1" });
  steps.push({ symbol: "f_vw,d", description: "(f_u/√3)/(β_w γ_M2)", value: s.fvwd, quantity: "stress", reference: "EN 1993-1-8 eq. (4.4)" });
  steps.push({ symbol: "F_w,Rd", description: "f_vw,d × a per unit length", value: s.value, quantity: "shearFlow", reference: "EN 1993-1-8 eq. (4.3)" });
  return {
    value: s.value,
    governing: "weld throat, simplified method",
    reference: "EN 1993-1-8 §4.5.3.3",
    steps,
    modes: [{ mode: "weld throat", value: s.value, reference: "EN 1993-1-8 §4.5.3.3" }],
    warnings: [],
  };
}

function describe(c: FilletWeld): string {
  if (c.label) return c.label;
  const aisc = c.standard === "AISC-360-16";
  const size = aisc ? `${formatSixteenths(leg(c) / MM_PER_IN)} in ${c.electrode ?? "E70"} fillet` : `a${formatNumber(throat(c))} fillet (leg ${formatNumber(leg(c))} mm)`;
  const pattern = c.pattern === "intermittent" ? `, intermittent ${formatNumber(aisc ? c.segmentLength! / MM_PER_IN : c.segmentLength!)} @ ${formatNumber(aisc ? c.pitch! / MM_PER_IN : c.pitch!)} ${aisc ? "in" : "mm"}` : ", continuous";
  return `${size}${pattern}, ${aisc ? "AISC 360-16" : "EN 1993-1-8"}`;
}

/** A leg in inches as sixteenths where it is one ("3/16"), else as a decimal. */
function formatSixteenths(inches: number): string {
  const n = Math.round(inches * 16);
  if (Math.abs(n / 16 - inches) > 1e-6) return formatNumber(inches);
  let [num, den] = [n, 16];
  while (num % 2 === 0 && den > 1) [num, den] = [num / 2, den / 2];
  return den === 1 ? `${num}` : `${num}/${den}`;
}

/** Fillet welds along the contact line: AISC 360-16 §J2 or EN 1993-1-8 §4.5.3.3. */
export const filletWeldKind: WeldKind<FilletWeld> = {
  kind: "fillet-weld",
  mechanism: "weld",
  schema: FilletWeld,
  describe,
  standards: (c) => [
    c.standard === "AISC-360-16"
      ? "ANSI/AISC 360-16: §J2.4 fillet weld strength (Table J2.5), §J2.2b size and length limits, Table J2.4 minimum size"
      : "EN 1993-1-8:2005: §4.5.3.3 simplified method for fillet welds, Table 4.1 β_w, §4.5.1–4.5.2 and §4.3.2.2 detailing",
  ],
  assumptions: (c) => [
    `${describe(c)}: the weld carries the shear flow along its axis (longitudinal loading, no directional increase); each of the joint's fillets per line carries an equal share; ${
      c.standard === "AISC-360-16"
        ? "the base metal at each fusion face is checked in shear rupture, 0.60 F_u on the leg w per unit length (§J2.4(a), Table J2.5, §J4.2(b)), so an electrode stronger than matching cannot pass on the weld metal alone; shear yielding of each part along the weld is its own shear check"
        : "EN 1993-1-8 §4.5.3.3 takes f_u of the weaker part with matching electrodes (§4.2(2)), so the base metal is within the weld formula and has no separate fusion-face check"
    }.`,
    ...(c.pattern === "intermittent" && c.arrangement === "staggered"
      ? [
          `${describe(c)}, staggered: the far side's segments are laid out one at each end of the joint and one midway between each two near-side segments, and each side's segments are checked on their own positions, each fillet carrying its equal share of the flow over its tributary length (the layout rule is this program's; a segment at each end on both sides is common practice).`,
        ]
      : []),
  ],
  problems,
  resistancePerLength,
  detailing,
  layout: (c) => ({ pattern: c.pattern, segmentLength: c.segmentLength ?? null, pitch: c.pitch ?? null, arrangement: c.arrangement }),
};

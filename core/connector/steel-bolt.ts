import { z } from "zod";
import { Id, positive, Text } from "../schema/quantity.js";
import { comparedInJobUnits, formatNumber, inJobUnits } from "../units/format.js";
import { doubleShearMembers, doubleShearRefusal, type ConnectorContext, type ConnectorResistance, type DetailingLimits, type DiscreteConnectorKind, type JoinedMember, type PlacementProblem, type WorkingStep } from "./connector-kind.js";
import { MM_PER_IN, MPA_PER_KSI, N_PER_KIP } from "./quantity-text.js";
import { aiscBolt, holeTypes, type AiscPly } from "./steel/aisc-bolt.js";
import { aiscBoltGroup, inchBolt, knownAiscGrades, knownInchSizes, knownMetricSizes, metricBoltSize, propertyClasses, standardHoleIn, type InchBolt, type MetricBolt } from "./steel/bolt-sizes.js";
import { en1993Bolt, EN1993_GAMMA_M2, type En1993Ply } from "./steel/en1993-bolt.js";
import { inchSize } from "./timber/fastener-sizes.js";
import { exceeds, fallsShort } from "../units/limits.js";

export const steelStandards = ["AISC-360-16", "EN1993-1-8"] as const;

export const SteelBolt = z
  .strictObject({
    id: Id,
    kind: z.literal("steel-bolt"),
    label: Text(80).optional(),
    source: Text(160).default(""),
    standard: z.enum(steelStandards),
    /** Trade size: "3/4" (in, AISC) or "M20" (EN); or give the diameter. */
    size: Text(20).optional(),
    diameter: positive("length").optional(),
    /** AISC: "A" (A325, F1852), "B" (A490, F2280) or "A307"; EN 1993-1-8: property class "4.6" … "10.9". */
    grade: Text(30),
    /** Threads in the shear plane ("N") or excluded from it ("X"). */
    threads: z.enum(["included", "excluded"]).default("included"),
    /** Single shear (two plies) or double shear (the bolt crosses two contact lines of the joint). */
    shear: z.enum(["single", "double"]).default("single"),
    /** AISC: hole type (§J3.2, Table J3.3); EN 1993-1-8: normal round holes only. */
    holeType: z.enum(holeTypes).default("standard"),
    /** AISC: a slip-critical joint with a Class A or Class B faying surface (§J3.8). */
    slipCritical: z.enum(["no", "class-A", "class-B"]).default("no"),
    /**
     * EN 1993-1-8 §3.4.1: category A (bearing type), B (slip-resistant at serviceability) or C
     * (slip-resistant at the ultimate limit state); B and C are preloaded 8.8 or 10.9 bolts (§3.1.2(2)).
     */
    category: z.enum(["A", "B", "C"]).default("A"),
    /** EN 1993-1-8 Table 3.7: class of friction surface A, B, C or D (μ 0.5, 0.4, 0.3, 0.2), for categories B and C. */
    frictionSurface: z.enum(["A", "B", "C", "D"]).optional(),
    /** AISC: fillers between the plies (h_f of §J3.8). */
    fillers: z.number().int("must be a whole number").min(0).max(4).default(0),
    /** AISC: deformation at the bolt hole at service load is a design consideration (§J3.10). */
    deformationConsidered: z.boolean().default(true),
    /** Unpainted weathering steel exposed to corrosion (AISC §J3.5 maximum spacing). */
    weathering: z.boolean().default(false),
    /** End distance of the end bolts e₁ / L_e; the standard's minimum when absent. */
    endDistance: positive("length").optional(),
    /** Edge distance e₂; the standard's minimum when absent. */
    edgeDistance: positive("length").optional(),
    /** Least spacing p₁ of bolts along the line; 3d (AISC, preferred) or 2.2d₀ (EN) when absent. */
    minSpacing: positive("length").optional(),
  })
  .superRefine((c, ctx) => {
    const aisc = c.standard === "AISC-360-16";
    if ((c.size === undefined) === (c.diameter === undefined)) ctx.addIssue({ code: "custom", path: [c.size === undefined ? "diameter" : "size"], message: "give either a size or a diameter" });
    else if (c.size !== undefined) {
      if (aisc && (inchSize(c.size) === null || !inchBolt(inchSize(c.size)!))) ctx.addIssue({ code: "custom", path: ["size"], message: `"${c.size}" is not a bolt size of AISC Table J3.1; known: ${knownInchSizes().join(", ")} (in)` });
      if (!aisc && !metricBoltSize(c.size)) ctx.addIssue({ code: "custom", path: ["size"], message: `"${c.size}" is not a metric bolt size this program knows; known: ${knownMetricSizes().join(", ")}` });
    }
    if (aisc && !aiscBoltGroup(c.grade)) ctx.addIssue({ code: "custom", path: ["grade"], message: `"${c.grade}" is not a bolt grade of AISC 360-16 Table J3.2 this program knows; known: ${knownAiscGrades().join(", ")}` });
    if (!aisc && !propertyClasses[c.grade.trim()]) ctx.addIssue({ code: "custom", path: ["grade"], message: `"${c.grade}" is not a property class of EN 1993-1-8 Table 3.1; known: ${Object.keys(propertyClasses).join(", ")}` });
    if (!aisc) {
      for (const key of ["slipCritical", "fillers", "deformationConsidered", "holeType"] as const) {
        const fallback = { slipCritical: "no", fillers: 0, deformationConsidered: true, holeType: "standard" }[key];
        if (c[key] !== fallback) ctx.addIssue({ code: "custom", path: [key], message: "applies to AISC 360-16 bolts only; EN 1993-1-8 bolts here are in normal round holes (a slip-resistant EN bolt takes category and frictionSurface)" });
      }
      if (c.category !== "A" && c.frictionSurface === undefined) ctx.addIssue({ code: "custom", path: ["frictionSurface"], message: `is required for a slip-resistant bolt of category ${c.category} (EN 1993-1-8 Table 3.7: class A, B, C or D)` });
      if (c.category === "A" && c.frictionSurface !== undefined) ctx.addIssue({ code: "custom", path: ["frictionSurface"], message: 'applies to slip-resistant bolts only: set category to "B" or "C"' });
      if (c.category !== "A" && propertyClasses[c.grade.trim()] && !["8.8", "10.9"].includes(c.grade.trim())) ctx.addIssue({ code: "custom", path: ["grade"], message: `a slip-resistant bolt (category ${c.category}) is preloaded, and only classes 8.8 and 10.9 may be preloaded (EN 1993-1-8 §3.1.2(2))` });
    } else {
      for (const key of ["category", "frictionSurface"] as const) {
        if (c[key] !== (key === "category" ? "A" : undefined)) ctx.addIssue({ code: "custom", path: [key], message: "applies to EN 1993-1-8 bolts only; an AISC 360-16 bolt is made slip-critical by slipCritical" });
      }
    }
    if (aisc && c.slipCritical !== "no" && aiscBoltGroup(c.grade) === "A307") ctx.addIssue({ code: "custom", path: ["slipCritical"], message: "A307 bolts are not pretensioned and cannot be slip-critical" });
  });
export type SteelBolt = z.infer<typeof SteelBolt>;

type Resolved = { aisc: true; bolt: InchBolt; d: number } | { aisc: false; bolt: MetricBolt; d: number } | null;

/** The bolt's table data; null when its diameter is not a standard size. */
function resolve(c: SteelBolt): Resolved {
  if (c.standard === "AISC-360-16") {
    const inches = c.size !== undefined ? inchSize(c.size) : c.diameter! / MM_PER_IN;
    const bolt = inches === null ? null : inchBolt(inches);
    return bolt ? { aisc: true, bolt, d: bolt.diameterIn * MM_PER_IN } : null;
  }
  const bolt = c.size !== undefined ? metricBoltSize(c.size) : metricBoltSize(`M${Math.round(c.diameter!)}`);
  if (!bolt || (c.diameter !== undefined && Math.abs(c.diameter - bolt.d) > 0.05)) return null;
  return { aisc: false, bolt, d: bolt.d };
}

interface Geometry {
  /** Hole along the load, mm. */
  hole: number;
  endDistance: number;
  edgeDistance: number;
  spacing: number;
  rowSpacing: number;
  /** Absolute minima the user's values are checked against. */
  minSpacing: number;
  minEdge: number;
  minEnd: number;
  source: string;
}

function geometry(c: SteelBolt, r: NonNullable<Resolved>): Geometry {
  if (r.aisc) {
    const dIn = r.bolt.diameterIn;
    const standardHole = standardHoleIn(dIn);
    const along: Record<(typeof holeTypes)[number], number> = {
      standard: standardHole,
      oversized: r.bolt.oversizedIn,
      "short-slot-transverse": standardHole,
      "short-slot-parallel": r.bolt.shortSlotLengthIn,
      "long-slot-transverse": standardHole,
      "long-slot-parallel": 2.5 * dIn,
    };
    // The load runs along the line: the member's end is crossed by a slot along the load, its sides by a slot across it.
    const c2 = edgeIncrementIn(dIn, c.holeType);
    const minEnd = (r.bolt.minEdgeIn + c2.end) * MM_PER_IN;
    const minEdge = (r.bolt.minEdgeIn + c2.edge) * MM_PER_IN;
    const increments = c2.end > 0 || c2.edge > 0 ? ` plus C₂ of Table J3.5 [M] for ${c.holeType} holes (${formatNumber(c2.end)} in at the ends, ${formatNumber(c2.edge)} in at the edges)` : "";
    return {
      hole: along[c.holeType] * MM_PER_IN,
      endDistance: c.endDistance ?? minEnd,
      edgeDistance: c.edgeDistance ?? minEdge,
      spacing: c.minSpacing ?? 3 * r.d,
      rowSpacing: 3 * r.d,
      minSpacing: (8 / 3) * r.d,
      minEdge,
      minEnd,
      source: `AISC 360-16 §J3.3: spacing at least 2-2/3 d (${c.minSpacing === undefined ? "3d preferred, used" : "as given"}); Table J3.4 minimum edge distance ${formatNumber(r.bolt.minEdgeIn)} in${increments}${c.endDistance === undefined ? "; the least end distance is used at the ends" : ""}`,
    };
  }
  const d0 = r.bolt.d0;
  return {
    hole: d0,
    endDistance: c.endDistance ?? 1.2 * d0,
    edgeDistance: c.edgeDistance ?? 1.2 * d0,
    spacing: c.minSpacing ?? 2.2 * d0,
    rowSpacing: 2.4 * d0,
    minSpacing: 2.2 * d0,
    minEdge: 1.2 * d0,
    minEnd: 1.2 * d0,
    source: `EN 1993-1-8 Table 3.3: e₁, e₂ ≥ 1.2d₀, p₁ ≥ 2.2d₀, p₂ ≥ 2.4d₀ (d₀ = ${d0} mm, normal round hole)${c.endDistance === undefined ? "; the minima are used in the bearing resistance" : ""}`,
  };
}

/**
 * Edge distance increment C₂, in, of AISC 360-16 Table J3.5 [M] (called from §J3.4) at the member's
 * ends (across the load) and at the sides (along it): oversized holes 1/16 in up to 7/8 in bolts, 1/8 in
 * from 1 in; short slots with the long axis perpendicular to the edge 1/8 in up to 1 in, 3/16 in from
 * 1-1/8 in; long slots perpendicular to the edge 3/4 d; slots parallel to the edge 0. Slots at their
 * largest length (Table J3.3), so note [a]'s reduction is not taken.
 */
export function edgeIncrementIn(dIn: number, hole: (typeof holeTypes)[number]): { end: number; edge: number } {
  const oversized = dIn <= 0.875 + 1e-9 ? 1 / 16 : 1 / 8;
  const shortSlot = dIn <= 1 + 1e-9 ? 1 / 8 : 3 / 16;
  switch (hole) {
    case "standard":
      return { end: 0, edge: 0 };
    case "oversized":
      return { end: oversized, edge: oversized };
    case "short-slot-parallel":
      return { end: shortSlot, edge: 0 };
    case "short-slot-transverse":
      return { end: 0, edge: shortSlot };
    case "long-slot-parallel":
      return { end: 0.75 * dIn, edge: 0 };
    case "long-slot-transverse":
      return { end: 0, edge: 0.75 * dIn };
  }
}

const isSteel = (m: JoinedMember) => m.material.family === "steel";

interface Ply {
  name: string;
  member: JoinedMember;
  /** Share of the bolt force the ply bears: 1, or 1/2 for each outer ply in double shear. */
  share: number;
}

/**
 * The plies the bolt bears on. In double shear the central ply is the part between the two contact
 * lines of the joint (its geometry, not thicknesses or the head side) and bears the whole bolt force;
 * each outer ply, at its own thickness and strength, bears half.
 */
function plies(c: SteelBolt, context: ConnectorContext): Ply[] {
  if (c.shear !== "double") return context.members.map((m) => ({ name: `"${m.part}"`, member: m, share: 1 }));
  // A joint refused for double shear is reported by problems(); the hand-built reading keeps the numbers finite meanwhile.
  const { central, outer } = doubleShearMembers(context) ?? { central: context.members[1], outer: [context.members[0], context.members[0]] };
  const outers = outer[0].part === outer[1].part ? [{ name: `outer ply "${outer[0].part}" (each outer ply; the other outer ply is taken to be the same)`, member: outer[0], share: 0.5 }] : outer.map((m) => ({ name: `outer ply "${m.part}"`, member: m, share: 0.5 }));
  return [...outers, { name: `central ply "${central.part}"`, member: central, share: 1 }];
}

/** Every part the bolt crosses, once each. */
function crossed(c: SteelBolt, context: ConnectorContext): JoinedMember[] {
  return plies(c, context).map((p) => p.member);
}

function resistance(c: SteelBolt, context: ConnectorContext): ConnectorResistance {
  const r = resolve(c)!;
  const g = geometry(c, r);
  const bearingPlies = plies(c, context);
  const n = c.shear === "double" ? 2 : 1;
  const perLine = 1 / n;
  const steps: WorkingStep[] = [{ symbol: "d", description: "bolt diameter", value: r.d, quantity: "length" }];
  if (n === 2) {
    const central = bearingPlies[bearingPlies.length - 1]!.member;
    steps.push({ symbol: "t_c", description: `double shear: central ply "${central.part}" (the part between the two contact lines) bears the whole bolt force; each outer ply (${bearingPlies.slice(0, -1).map((p) => `"${p.member.part}"`).join(", ")}) half, each checked at its own thickness`, value: central.thickness, quantity: "length" });
  }
  if (r.aisc) {
    const group = aiscBoltGroup(c.grade)!;
    const plyList: AiscPly[] = bearingPlies.map((p) => ({ name: p.name, thicknessIn: p.member.thickness / MM_PER_IN, tensileStrengthKsi: p.member.material.tensileStrength! / MPA_PER_KSI, share: p.share }));
    const slip = c.slipCritical === "no" ? null : { surface: c.slipCritical === "class-A" ? ("A" as const) : ("B" as const), pretensionKips: group === "B" ? r.bolt.pretensionKips.B : r.bolt.pretensionKips.A, fillers: c.fillers };
    const out = aiscBolt({
      diameterIn: r.bolt.diameterIn,
      group: group,
      threads: c.threads,
      shearPlanes: n as 1 | 2,
      plies: plyList,
      holeAlongLoadIn: g.hole / MM_PER_IN,
      holeType: c.holeType,
      endDistanceIn: g.endDistance / MM_PER_IN,
      spacingIn: g.spacing / MM_PER_IN,
      deformationConsidered: c.deformationConsidered,
      slip,
      basis: context.basis,
    });
    const lrfd = context.basis === "factored";
    steps.push({ symbol: "A_b", description: "nominal bolt area πd²/4", value: out.areaIn2 * MM_PER_IN ** 2, quantity: "area" });
    steps.push({ symbol: "F_nv", description: `nominal shear stress, Group ${group === "A307" ? "A307" : group}, threads ${c.threads === "included" ? "included (N)" : "excluded (X)"}`, value: out.Fnv * MPA_PER_KSI, quantity: "stress", reference: "AISC 360-16 Table J3.2" });
    steps.push({ symbol: "d_h", description: `hole dimension along the load (${c.holeType})`, value: g.hole, quantity: "length", reference: "AISC 360-16 Table J3.3" });
    steps.push({ symbol: "L_e", description: `end distance of the end bolt${c.endDistance === undefined ? " (the least allowed)" : ""}`, value: g.endDistance, quantity: "length", reference: c.holeType !== "standard" ? "AISC 360-16 Tables J3.4, J3.5" : "AISC 360-16 Table J3.4" });
    steps.push({ symbol: "l_c,end", description: "clear end distance L_e − d_h/2, d_h along the load", value: g.endDistance - g.hole / 2, quantity: "length", reference: "AISC 360-16 §J3.10" });
    steps.push({ symbol: "s", description: "spacing along the line used for tear-out between bolts (the least allowed)", value: g.spacing, quantity: "length" });
    steps.push({ symbol: "l_c,s", description: "clear spacing s − d_h between holes along the load", value: g.spacing - g.hole, quantity: "length", reference: "AISC 360-16 §J3.10" });
    for (const s of out.limitStates) {
      steps.push({ symbol: `R_n`, description: `${s.name}: ${s.equation}`, value: s.nominal * N_PER_KIP, quantity: "connectorForce", reference: "AISC 360-16 §J3" });
      steps.push({ symbol: lrfd ? "φR_n" : "R_n/Ω", description: `${s.name}, ${lrfd ? `φ = ${s.phi}` : `Ω = ${s.omega}`}`, value: s.available * N_PER_KIP, quantity: "connectorForce" });
    }
    const value = out.governing.available * N_PER_KIP * perLine;
    if (n === 2) steps.push({ symbol: "R/2", description: "per contact line: the bolt in double shear serves the two contact lines of the joint", value, quantity: "connectorForce" });
    return {
      value,
      governing: out.governing.name,
      reference: `AISC 360-16 §J3, ${lrfd ? "LRFD φR_n" : "ASD R_n/Ω"}`,
      steps,
      modes: out.limitStates.map((s) => ({ mode: s.name, value: s.available * N_PER_KIP * perLine, reference: "AISC 360-16 §J3" })),
      slip: null,
      warnings: steelWarnings(c, context, g),
    };
  }
  const grade = propertyClasses[c.grade.trim()]!;
  const plyList: En1993Ply[] = bearingPlies.map((p) => ({ name: p.name, thickness: p.member.thickness, tensileStrength: p.member.material.tensileStrength!, share: p.share }));
  const out = en1993Bolt({
    d: r.d,
    d0: r.bolt.d0,
    As: r.bolt.As,
    fub: grade.fub,
    alphaVThreads: grade.alphaVThreads,
    threads: c.threads,
    shearPlanes: n as 1 | 2,
    plies: plyList,
    e1: g.endDistance,
    p1: g.spacing,
    e2: g.edgeDistance,
    p2: context.rows > 1 ? g.rowSpacing : null,
    slip: c.category === "A" ? null : { category: c.category, surface: c.frictionSurface!, ks: 1.0 },
  });
  steps.push({ symbol: "A_s", description: "tensile stress area", value: r.bolt.As, quantity: "area" });
  steps.push({ symbol: "f_ub", description: `ultimate tensile strength, property class ${c.grade.trim()}`, value: grade.fub, quantity: "stress", reference: "EN 1993-1-8 Table 3.1" });
  steps.push({ symbol: "d₀", description: "hole diameter (normal round hole)", value: r.bolt.d0, quantity: "length" });
  steps.push({ symbol: "e₁", description: "end distance", value: g.endDistance, quantity: "length" });
  steps.push({ symbol: "p₁", description: "spacing along the line (the least allowed)", value: g.spacing, quantity: "length" });
  steps.push({ symbol: "e₂", description: "edge distance", value: g.edgeDistance, quantity: "length" });
  steps.push({ symbol: "γ_M2", description: "partial factor for bolts (recommended value)", value: EN1993_GAMMA_M2, quantity: "ratio", reference: "EN 1993-1-8 §2.2, Table 2.1" });
  for (const s of out.resistances) {
    steps.push({ symbol: s.symbol, description: `${s.name}: ${s.equation}; ${Object.entries(s.factors).map(([k, v]) => `${k} = ${formatNumber(v)}`).join(", ")}`, value: s.value, quantity: "connectorForce", reference: s.reference });
  }
  const value = out.governing.value * perLine;
  if (n === 2) steps.push({ symbol: "F_Rd/2", description: "per contact line: the bolt in double shear serves the two contact lines of the joint", value, quantity: "connectorForce" });
  return {
    value,
    governing: out.governing.name,
    reference: c.category === "A" ? "EN 1993-1-8 Table 3.4 (category A, bearing type)" : `EN 1993-1-8 Table 3.2 category ${c.category}: §3.9.1 slip, Table 3.4 shear and bearing`,
    steps,
    modes: out.resistances.map((s) => ({ mode: s.name, value: s.value * perLine, reference: s.reference })),
    slip: null,
    warnings: steelWarnings(c, context, g),
  };
}

function steelWarnings(c: SteelBolt, context: ConnectorContext, g: Geometry): string[] {
  const out: string[] = [];
  if (c.standard === "EN1993-1-8" && c.category === "B") out.push(`${describe(c)}: category B is slip-resistant at serviceability; its slip resistance F_s,Rd,ser (γ_M3,ser) is checked here against the factored flow, which is not less than the serviceability flow when every load factor is at least 1 (on the safe side).`);
  if (c.endDistance === undefined) out.push(`${describe(c)}: the end bolts' resistance uses the least end distance ${inJobUnits(g.endDistance, "length", context.units)}; give endDistance if the plates run further past the last bolt.`);
  return out;
}

function thinner(c: SteelBolt, context: ConnectorContext): number {
  return Math.min(...crossed(c, context).map((m) => m.thickness));
}

function detailing(c: SteelBolt, context?: ConnectorContext): DetailingLimits {
  const r = resolve(c);
  if (!r || !context) return { minSpacing: 0, maxSpacing: null, endDistance: 0, sources: [] };
  const g = geometry(c, r);
  const t = thinner(c, context);
  let maxSpacing: number;
  let maxSource: string;
  if (r.aisc) {
    maxSpacing = c.weathering ? Math.min(14 * t, 7 * MM_PER_IN) : Math.min(24 * t, 12 * MM_PER_IN);
    maxSource = c.weathering
      ? "AISC 360-16 §J3.5: plates in contact, unpainted weathering steel: spacing ≤ 14t ≤ 7 in; edge distance ≤ 12t ≤ 6 in"
      : "AISC 360-16 §J3.5: plates in continuous contact, painted or not subject to corrosion: spacing ≤ 24t ≤ 12 in; edge distance ≤ 12t ≤ 6 in";
  } else {
    maxSpacing = Math.min(14 * t, 200);
    maxSource = "EN 1993-1-8 Table 3.3: p₁ ≤ min(14t, 200 mm) in compression members; e₁, e₂ ≤ 4t + 40 mm where exposed [M]";
  }
  return {
    minSpacing: g.spacing,
    maxSpacing,
    endDistance: g.endDistance,
    edgeDistance: g.edgeDistance,
    rowSpacing: g.rowSpacing,
    penetration: null,
    sources: [g.source, maxSource],
  };
}

function problems(c: SteelBolt, context: ConnectorContext): PlacementProblem[] {
  const found = lineProblems(c, context);
  // A bolt in double shear: its problems concern the joint's three plies, the same from either contact line.
  return c.shear === "double" ? found.map((p) => (p.on === "material" ? p : { ...p, wholeJoint: true })) : found;
}

function lineProblems(c: SteelBolt, context: ConnectorContext): PlacementProblem[] {
  const out: PlacementProblem[] = [];
  const len = (mm: number) => inJobUnits(mm, "length", context.units);
  const pair = (a: number, b: number) => comparedInJobUnits(a, b, "length", context.units);
  const r = resolve(c);
  if (!r) {
    out.push({ on: "connector", field: c.size !== undefined ? "size" : "diameter", message: c.standard === "AISC-360-16" ? `is not a bolt size of AISC 360-16 Table J3.1 (${knownInchSizes().join(", ")} in)` : `is not a metric bolt size this program knows (${knownMetricSizes().join(", ")})` });
    return out;
  }
  if (c.standard === "EN1993-1-8" && context.basis === "allowable") out.push({ on: "connector", field: "standard", message: `EN 1993-1-8 gives design values for factored loads, but the job's basis is "allowable": set basis to "factored" or use AISC-360-16` });
  const refused = c.shear === "double" ? doubleShearRefusal(context) : null;
  if (refused) {
    out.push({ on: "connector", field: "shear", message: `${refused}: use single shear at this joint, or name the central part as the held group of a joint of its own` });
    return out;
  }
  for (const m of crossed(c, context)) {
    const i = context.members.findIndex((x) => x.part === m.part);
    const at = i >= 0 ? { member: i as 0 | 1 } : { member: 0 as const, part: m.part };
    if (!isSteel(m)) out.push({ on: "connector", field: "kind", message: `part "${m.part}" is not steel (family "${m.material.family}"): a bolt through timber is a timber-bolt (NDS-2018 or EN 1995-1-1)` });
    else if (m.material.tensileStrength === undefined) out.push({ on: "material", ...at, field: "tensileStrength", message: `is needed for bearing at the bolt holes of part "${m.part}" (${c.standard === "AISC-360-16" ? "AISC 360-16 §J3.10" : "EN 1993-1-8 Table 3.4"})` });
  }
  const g = geometry(c, r);
  if (c.minSpacing !== undefined && fallsShort(c.minSpacing, g.minSpacing)) out.push({ on: "connector", field: "minSpacing", message: `${pair(c.minSpacing, g.minSpacing).join(" is below the least spacing ")} (${c.standard === "AISC-360-16" ? "AISC 360-16 §J3.3, 2-2/3 d" : "EN 1993-1-8 Table 3.3, 2.2d₀"})` });
  const aiscEdge = c.standard === "AISC-360-16" ? `AISC 360-16 Table J3.4${c.holeType !== "standard" ? ` with C₂ of Table J3.5 for ${c.holeType} holes` : ""}` : "EN 1993-1-8 Table 3.3";
  if (c.endDistance !== undefined && fallsShort(c.endDistance, g.minEnd)) out.push({ on: "connector", field: "endDistance", message: `${pair(c.endDistance, g.minEnd).join(" is below the least end distance ")} (${aiscEdge})` });
  if (c.edgeDistance !== undefined && fallsShort(c.edgeDistance, g.minEdge)) out.push({ on: "connector", field: "edgeDistance", message: `${pair(c.edgeDistance, g.minEdge).join(" is below the least edge distance ")} (${aiscEdge})` });
  for (const m of crossed(c, context)) {
    if (!fallsShort(g.hole, m.width)) {
      out.push({ on: "connector", field: c.size !== undefined ? "size" : "diameter", message: `a ${len(r.d)} bolt in a ${len(g.hole)} hole is larger than part "${m.part}" (${len(m.width)} wide across the contact line)` });
      continue;
    }
    const need = 2 * g.edgeDistance + (context.rows - 1) * g.rowSpacing;
    if (exceeds(need, m.width)) {
      out.push(context.rows > 1
        ? { on: "fastening", field: "rows", message: `${context.rows} bolts per row need ${len(need)} across part "${m.part}" (edge distances and row spacing), which is only ${len(m.width)} wide` }
        : { on: "connector", field: c.edgeDistance !== undefined ? "edgeDistance" : c.size !== undefined ? "size" : "diameter", message: `the bolt needs ${len(need)} across part "${m.part}" for its edge distances, which is only ${len(m.width)} wide` });
    }
  }
  return out;
}

function describe(c: SteelBolt): string {
  if (c.label) return c.label;
  const r = resolve(c);
  const aisc = c.standard === "AISC-360-16";
  if (!r) return `${c.size ?? formatNumber(c.diameter!)} bolt ${c.grade}, ${c.standard}`;
  if (r.aisc) {
    const g = aiscBoltGroup(c.grade);
    const named = g === "A307" ? "A307" : `Group ${g}${/^(group[- ]?)?[ab]$/i.test(c.grade.trim()) ? "" : ` (${c.grade.trim()})`}`;
    return `${r.bolt.name} in ${named} bolt, threads ${c.threads === "included" ? "included" : "excluded"}${c.slipCritical !== "no" ? `, slip-critical ${c.slipCritical}` : ""}, ${aisc ? "AISC 360-16" : c.standard}${c.shear === "double" ? ", double shear" : ""}`;
  }
  return `${r.bolt.name} ${c.grade.trim()} bolt, shear plane through the ${c.threads === "included" ? "thread" : "shank"}${c.category !== "A" ? `, preloaded, slip-resistant category ${c.category}, friction surface class ${c.frictionSurface}` : ""}, EN 1993-1-8${c.shear === "double" ? ", double shear" : ""}`;
}

/** Structural bolts joining steel plates: AISC 360-16 §J3 or EN 1993-1-8 Table 3.4. */
export const steelBoltKind: DiscreteConnectorKind<SteelBolt> = {
  kind: "steel-bolt",
  largerSizes: (c) => {
    if (c.size === undefined) return [];
    const sizes = c.standard === "AISC-360-16" ? knownInchSizes() : knownMetricSizes();
    const at = sizes.indexOf(c.size.trim());
    return at < 0 ? [] : sizes.slice(at + 1).map((size) => ({ ...c, size, label: undefined }));
  },
  mechanism: "discrete",
  schema: SteelBolt,
  describe,
  standards: (c) => [
    c.standard === "AISC-360-16"
      ? "ANSI/AISC 360-16 Specification for Structural Steel Buildings: §J3 bolts (Table J3.2 shear, §J3.10 bearing and tear-out, §J3.8 slip-critical, §J3.3–J3.5 spacing and edge distances)"
      : `EN 1993-1-8:2005 Eurocode 3 Design of joints: Table 3.4 shear and bearing resistance of bolts, Table 3.3 spacing and distances, γ_M2 = 1.25 (recommended value)${c.category !== "A" ? `; §3.9.1 slip resistance of preloaded bolts, category ${c.category} (Table 3.2), μ by Table 3.7, ${c.category === "C" ? "γ_M3 = 1.25" : "γ_M3,ser = 1.1"} (recommended value)` : ""}`,
  ],
  assumptions: (c) => [
    `${describe(c)}: every bolt of the line is checked as the weaker of an end bolt and an inner bolt at the least spacing, so the end distance and spacing used in bearing are on the safe side; the plates' own net-section and block shear are not checked.`,
    ...(c.shear === "double" ? [`${describe(c)}: in double shear the central ply is the part between the joint's two contact lines and bears the whole bolt force; each outer ply bears half, checked at its own thickness and strength.`] : []),
  ],
  problems,
  resistance,
  detailing,
  plateEndAttachment: (c) => {
    const slipResistant = c.standard === "AISC-360-16" ? c.slipCritical !== "no" : c.category !== "A";
    return slipResistant
      ? { allowed: true, reason: `${describe(c)} is slip-resistant` }
      : {
          allowed: false,
          reason: `AISC 360-16 §F13.3 [M]: the extension of a partial-length cover plate past its cut-off must be attached by slip-critical bolts or fillet welds; ${describe(c)} is a bearing-type bolt (${c.standard === "AISC-360-16" ? 'set slipCritical to "class-A" or "class-B"' : 'set category to "B" or "C" with a frictionSurface (EN 1993-1-8 §3.9; the rule is applied to EN 1993 bolts by the same reading)'}).`,
        };
  },
};

/** The bolt's diameter d, mm, or null for a size this program does not know. */
export const steelBoltDiameter = (c: SteelBolt): number | null => resolve(c)?.d ?? null;

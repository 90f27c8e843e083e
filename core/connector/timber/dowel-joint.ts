import type { Material } from "../../schema/job.js";
import { doubleShearMembers, doubleShearRefusal, type ConnectorContext, type ConnectorResistance, type DetailingLimits, type DoubleShearMembers, type JoinedMember, type ModeValue, type PlacementProblem, type SlipModuli, type WorkingStep } from "../connector-kind.js";
import { MM_PER_IN, MPA_PER_PSI, N_PER_LBF } from "../quantity-text.js";
import { comparedInJobUnits, inJobUnits } from "../../units/format.js";
import { ec5DurationOf, ec5Kmod, ec5SlipModulus, EC5_GAMMA_M_CONNECTIONS, jointMeanDensity, type Ec5Product, type ServiceClass } from "./ec5-factors.js";
import { ec5BoltEmbedment, ec5NailEmbedment, type Ec5Wood, type Embedment } from "./ec5-embedment.js";
import { johansenSteelCentral, johansenSteelSides, johansenSteelSingle, johansenTimberDouble, johansenTimberSingle, type JohansenResult, type RopeEffect } from "./ec5-johansen.js";
import {
  NDS_END_GRAIN_FACTOR,
  NDS_KF_CONNECTIONS,
  NDS_PHI_CONNECTIONS,
  NDS_TOE_NAIL_FACTOR,
  ndsGroupActionFactor,
  ndsGroupSideStiffness,
  ndsLoadDurationFactor,
  ndsTemperatureFactor,
  ndsConnectionTimeEffect,
  ndsWetServiceFactor,
  type NdsMoisture,
  type NdsTemperature,
} from "./nds-adjustment.js";
import { ndsSteelBearing, ndsWoodBearing, type NdsBearing } from "./nds-dowel-bearing.js";
import { foldAngle, ndsYieldLimit } from "./nds-yield-limit.js";
import { plateBearing } from "./plate-bearing.js";
import { ec5Spacing, ndsSpacing, type DowelFamily, type MemberSpacing } from "./timber-spacing.js";
import { exceeds, fallsShort } from "../../units/limits.js";

export const timberStandards = ["NDS-2018", "EN1995-1-1"] as const;
export type TimberStandard = (typeof timberStandards)[number];

/** Everything the yield models need about one dowel-type fastener, in core units (mm, MPa, N). */
export interface DowelSpec {
  family: DowelFamily;
  /** "nail", "wood screw", "lag screw", "bolt", "dowel": for messages. */
  noun: string;
  standard: TimberStandard;
  /** Nominal (shank or outer thread) diameter: spacings, holes, fit. */
  diameter: number;
  /** Diameter in the yield model: the root diameter where threads lie in the shear plane (NDS), d_ef = 1.1 × inner diameter for screws (EC5). */
  yieldDiameter: number;
  yieldDiameterNote: string | null;
  /** Overall length of a fastener driven from one side; null for through-fasteners (bolts, dowels). */
  length: number | null;
  /** Part of the length not counted in the penetration (tapered tip). */
  tipLength: number;
  shear: "single" | "double";
  predrilled: boolean;
  /** Least penetration into the point-side member, as a multiple of the diameter, and its source. */
  minPenetration: { multiple: number; source: string } | null;
  /** Angle between load (along the member) and grain in the head-side and point-side members, degrees. */
  angles: { side: number; main: number };
  /** Ultimate tensile strength of the bolt steel f_ub, where given (EN 1993-1-8 α_b of a plate's bearing), MPa. */
  ultimateStrength?: number;
  /** Fastener bending yield strength F_yb (NDS), MPa. */
  bendingYield: { value: number; source: string };
  nds: { moisture: NdsMoisture; temperature: NdsTemperature; endGrain: boolean; toeNailed: boolean };
  ec5: {
    serviceClass: ServiceClass;
    panel: "plywood" | "osb2" | "osb3";
    /** M_y,Rk, N·mm. */
    yieldMoment: { value: number; source: string };
    rope: RopeEffect;
    ropeNote: string;
    /** Nail embedment rules (eq. 8.15–8.22) rather than the bolt rules (eq. 8.31–8.37). */
    nailEmbedment: boolean;
  };
  groupAction: { fasteners: number; spacing: number } | null;
}

const isSteel = (m: Material) => m.family === "steel";
const isPanel = (m: Material) => m.family === "panel";

/** One evaluation of the yield model: a side member and a main member with the fastener's bearing length in each, mm. */
export interface DowelBearing {
  /** Head-side member in single shear; in double shear one of the outer members, the two taken alike. */
  side: JoinedMember;
  /** Point-side member in single shear; the central member in double shear. */
  main: JoinedMember;
  sideLength: number;
  mainLength: number;
  /** How the side bearing length was found, for the working; null when it is the member's thickness. */
  sideNote: string | null;
}

/** A part the fastener crosses, with its angle between load and grain, degrees. */
interface CrossedPart {
  member: JoinedMember;
  angle: number;
}

export interface DowelGeometry {
  /**
   * The evaluations the resistance is the least of: one in single shear; in double shear one per outer
   * member (each with the central member), and for a driven fastener one per driving direction, since
   * either outer face may take the head.
   */
  cases: DowelBearing[];
  /** Penetration into the point-side member (in double shear the far outer member, the lesser of the two driving directions); null for through-fasteners. */
  penetration: number | null;
  /** The member that penetration is into, and the one the head bears on. */
  penetratedMember: JoinedMember;
  headMember: JoinedMember;
  /** The point passes through the penetrated member (in either driving direction). */
  through: { member: JoinedMember; penetration: number } | null;
  /** Every part the fastener crosses, once each. */
  parts: CrossedPart[];
  /** The roles in double shear; null in single shear. */
  double: DoubleShearMembers | null;
}

/** Bearing lengths of the fastener in the members it crosses, mm. */
export function dowelGeometry(spec: DowelSpec, context: ConnectorContext): DowelGeometry {
  if (spec.shear === "double") return doubleShearGeometry(spec, context);
  const [head, point] = context.members;
  const parts = [{ member: head, angle: spec.angles.side }, { member: point, angle: spec.angles.main }];
  const ts = head.thickness;
  const tm = point.thickness;
  if (spec.length === null) {
    return { cases: [{ side: head, main: point, sideLength: ts, mainLength: tm, sideNote: null }], penetration: null, penetratedMember: point, headMember: head, through: null, parts, double: null };
  }
  const penetration = spec.length - ts - spec.tipLength;
  return {
    cases: [{ side: head, main: point, sideLength: ts, mainLength: Math.min(Math.max(penetration, 0), tm), sideNote: null }],
    penetration,
    penetratedMember: point,
    headMember: head,
    through: penetration > tm ? { member: point, penetration } : null,
    parts,
    double: null,
  };
}

/**
 * Double shear: the central member is fixed by the joint's geometry (`context.double`). Each outer
 * member is checked with the central member, both outer members taken like it (the double-shear
 * equations assume them alike), and the weaker governs. A driven fastener passes the head-side outer
 * member and the central member and bears in the far outer member over its penetration, at most that
 * member's thickness; the drawing does not say which face takes the head, so both directions are checked.
 */
function doubleShearGeometry(spec: DowelSpec, context: ConnectorContext): DowelGeometry {
  // A joint refused for double shear is reported by dowelProblems; the hand-built reading keeps the numbers finite meanwhile.
  const roles = doubleShearMembers(context) ?? { central: context.members[1], outer: [context.members[0], context.members[0]] as [JoinedMember, JoinedMember] };
  const { central } = roles;
  // In the order of the parts' ids, so that both contact lines of the joint (and the stack turned over) report alike.
  const byPart = [...roles.outer].sort((a, b) => a.part.localeCompare(b.part));
  const outers = byPart[0]!.part === byPart[1]!.part ? [byPart[0]!] : byPart;
  const parts = [...outers.map((m) => ({ member: m, angle: spec.angles.side })), { member: central, angle: spec.angles.main }];
  const tc = central.thickness;
  if (spec.length === null) {
    const cases = outers.map((o) => ({ side: o, main: central, sideLength: o.thickness, mainLength: tc, sideNote: null }));
    return { cases, penetration: null, penetratedMember: roles.outer[1], headMember: roles.outer[0], through: null, parts, double: roles };
  }
  const directions = (outers.length === 1 ? [[outers[0]!, outers[0]!]] : [byPart, [byPart[1]!, byPart[0]!]]).map(([head, point]) => ({
    head: head!,
    point: point!,
    penetration: spec.length! - head!.thickness - tc - spec.tipLength,
  }));
  const cases: DowelBearing[] = [];
  for (const d of directions) {
    cases.push({ side: d.head, main: central, sideLength: d.head.thickness, mainLength: tc, sideNote: null });
    cases.push({
      side: d.point,
      main: central,
      sideLength: Math.min(d.point.thickness, Math.max(d.penetration, 0)),
      mainLength: tc,
      sideNote: `point side, driven from "${d.head.part}": penetration ${d.penetration > d.point.thickness ? "beyond the member, its thickness counted" : "into it"}`,
    });
  }
  const unique = cases.filter((c, i) => cases.findIndex((x) => x.side.part === c.side.part && Math.abs(x.sideLength - c.sideLength) <= 1e-9 * (1 + c.sideLength)) === i);
  // Thicknesses come from coordinates: a difference within rounding is no difference.
  const clearly = (x: number, y: number) => x < y - 1e-9 * (1 + Math.abs(y));
  const least = directions.reduce((a, b) => (clearly(b.penetration, a.penetration) ? b : a));
  const most = directions.reduce((a, b) => (clearly(a.penetration - a.point.thickness, b.penetration - b.point.thickness) ? b : a));
  return {
    cases: unique,
    penetration: least.penetration,
    penetratedMember: least.point,
    headMember: least.head,
    through: most.penetration > most.point.thickness ? { member: most.point, penetration: most.penetration } : null,
    parts,
    double: roles,
  };
}

/**
 * The fastener as loaded at this context: a load passed across the member between side-by-side plies
 * acts perpendicular to the grain of the timber parts (θ = 90°), whatever the connector's angles say.
 */
export function oriented(spec: DowelSpec, context: ConnectorContext): DowelSpec {
  return context.direction === "across" ? { ...spec, angles: { side: 90, main: 90 } } : spec;
}

export function dowelProblems(given: DowelSpec, context: ConnectorContext): PlacementProblem[] {
  const spec = oriented(given, context);
  const problems = lineProblems(spec, context);
  // A double-shear fastener's problems concern the joint's three parts, the same from either contact line.
  return spec.shear === "double" ? problems.map((p) => (p.on === "material" ? p : { ...p, wholeJoint: true })) : problems;
}

function lineProblems(spec: DowelSpec, context: ConnectorContext): PlacementProblem[] {
  const out: PlacementProblem[] = [];
  const u = context.units;
  const len = (mm: number) => inJobUnits(mm, "length", u);
  if (spec.standard === "EN1995-1-1" && context.basis === "allowable") {
    out.push({ on: "connector", field: "standard", message: `EN 1995-1-1 gives design values for factored loads, but the job's basis is "allowable": set basis to "factored" or use the NDS-2018` });
  }
  const refused = spec.shear === "double" ? doubleShearRefusal(context) : null;
  if (refused) {
    out.push({ on: "connector", field: "shear", message: `${refused}: use single shear at this joint, or name the central part as the held group of a joint of its own` });
    return out;
  }
  const g = dowelGeometry(spec, context);
  const members = g.parts.map((p) => p.member);
  // A material problem names the part's index in `members` where it has one, or the part itself (the far outer member of a double-shear joint).
  const materialOf = (m: JoinedMember) => {
    const i = context.members.findIndex((x) => x.part === m.part);
    return i >= 0 ? { member: i as 0 | 1 } : { member: 0 as const, part: m.part };
  };
  if (members.every((m) => isSteel(m.material))) {
    out.push({ on: "connector", field: "kind", message: `${members.length === 2 ? "both parts" : "every part"} at this joint (${members.map((m) => `"${m.part}"`).join(", ")}) ${members.length === 2 ? "are" : "is"} steel: use a steel-bolt (AISC 360 or EN 1993-1-8) or a fillet-weld` });
    return out;
  }
  if (g.double) {
    const { central, outer } = g.double;
    if (isSteel(central.material) && outer.some((m) => isSteel(m.material))) {
      out.push({ on: "connector", field: "kind", message: `the central part "${central.part}" and an outer part (${outer.filter((m) => isSteel(m.material)).map((m) => `"${m.part}"`).sort().join(", ")}) are both steel: a steel-to-steel shear plane is not a timber connection` });
      return out;
    }
    if (spec.standard === "EN1995-1-1" && isSteel(outer[0].material) !== isSteel(outer[1].material)) {
      out.push({ on: "connector", field: "shear", message: `one outer part is steel and the other timber (${outer.map((m) => `"${m.part}"`).sort().join(", ")}): EN 1995-1-1 gives double-shear equations for two timber outer members (eq. 8.7), two steel outer plates (8.12, 8.13) or a steel central plate (8.11), not a mixture` });
      return out;
    }
  }
  for (const m of members) {
    const at = materialOf(m);
    if (isSteel(m.material)) {
      if (spec.standard === "NDS-2018" && m.material.tensileStrength === undefined) out.push({ on: "material", ...at, field: "tensileStrength", message: `is needed for the dowel bearing strength of steel part "${m.part}" (NDS-2018 §12.3.3: F_e = 1.5 F_u or 1.375 F_u)` });
      continue;
    }
    if (spec.standard === "NDS-2018" && m.material.specificGravity === undefined) out.push({ on: "material", ...at, field: "specificGravity", message: `is needed for the dowel bearing strength of part "${m.part}" under the NDS-2018 (§12.3.3, from the specific gravity G)` });
    if (spec.standard === "EN1995-1-1" && m.material.characteristicDensity === undefined && !(isPanel(m.material) && spec.ec5.panel !== "plywood")) {
      out.push({ on: "material", ...at, field: "characteristicDensity", message: `is needed for the embedment strength of part "${m.part}" under EN 1995-1-1 (§8.3.1, §8.5.1: from ρ_k)` });
    }
  }
  if (spec.standard === "NDS-2018" && exceeds(spec.yieldDiameter, MM_PER_IN)) {
    out.push({ on: "connector", field: "diameter", message: `${len(spec.diameter)} is beyond the NDS-2018 yield limit equations, which cover diameters up to 1 in (§12.3.3)` });
  }
  if (g.penetration !== null) {
    const where = g.double
      ? `the far outer part "${g.penetratedMember.part}" (driven from "${g.headMember.part}" through the central part "${g.double.central.part}"${g.double.outer[0].part !== g.double.outer[1].part ? "; either outer face may take the head, and this is the shorter reach" : ""})`
      : `part "${g.penetratedMember.part}"`;
    if (g.penetration <= 0) {
      out.push({ on: "connector", field: "length", message: `a ${len(spec.length!)} ${spec.noun} does not reach ${where}: it must be longer than ${len(spec.length! - g.penetration)}` });
    } else if (spec.minPenetration && fallsShort(g.penetration, spec.minPenetration.multiple * spec.diameter)) {
      out.push({
        on: "connector",
        field: "length",
        message: `penetration ${comparedInJobUnits(g.penetration, spec.minPenetration.multiple * spec.diameter, "length", u)[0]} into ${where} is below the minimum ${spec.minPenetration.multiple}d = ${comparedInJobUnits(g.penetration, spec.minPenetration.multiple * spec.diameter, "length", u)[1]} (${spec.minPenetration.source}); use a ${spec.noun} at least ${len(spec.length! - g.penetration + spec.minPenetration.multiple * spec.diameter)} long`,
      });
    }
  }
  for (const m of members) {
    if (!fallsShort(spec.diameter, m.width)) out.push({ on: "connector", field: "diameter", message: `a ${len(spec.diameter)} ${spec.noun} is as large as part "${m.part}" is wide (${len(m.width)}) across the contact line` });
  }
  if (spec.standard === "EN1995-1-1" && spec.family === "nail" && !spec.predrilled) {
    if (exceeds(spec.diameter, 6)) out.push({ on: "connector", field: "predrilled", message: `nails over 6 mm in diameter must be predrilled (EN 1995-1-1 §8.3.1.2(2), as amended by A1)` });
    for (const m of members) {
      if (isSteel(m.material) || isPanel(m.material)) continue;
      const rho = m.material.characteristicDensity;
      if (rho !== undefined && exceeds(rho, 500)) out.push({ on: "connector", field: "predrilled", message: `part "${m.part}" has ρ_k = ${rho} kg/m³ > 500: nails must be predrilled (EN 1995-1-1 §8.3.1.2(2))` });
      if (rho !== undefined) {
        const d = spec.diameter;
        const tMin = Math.max(7 * d, ((13 * d - 30) * rho) / 400);
        // Eq. (8.18) limits the timber member's thickness (splitting), not the fastener's bearing length in it.
        if (fallsShort(m.thickness, tMin)) out.push({ on: "connector", field: "predrilled", message: `part "${m.part}" is ${len(m.thickness)} thick; without predrilling EN 1995-1-1 eq. (8.18) needs at least ${len(tMin)}: predrill or use a thicker part` });
      }
    }
  }
  if (spec.standard === "EN1995-1-1") {
    for (const m of members) {
      if (isPanel(m.material) && ec5Kmod(spec.ec5.panel, spec.ec5.serviceClass, "permanent") === null) {
        out.push({ on: "connector", field: "serviceClass", message: `${spec.ec5.panel === "osb2" ? "OSB/2" : "OSB/3"} (part "${m.part}") may not be used in service class ${spec.ec5.serviceClass} (EN 1995-1-1 Table 3.1)` });
      }
    }
  }
  return out;
}

export function dowelResistance(given: DowelSpec, context: ConnectorContext): ConnectorResistance {
  const spec = oriented(given, context);
  const g = dowelGeometry(spec, context);
  const across: WorkingStep[] =
    context.direction === "across"
      ? [{ symbol: "θ", description: "angle between load and grain in the timber parts: the load passes across the member between side-by-side plies, perpendicular to the grain", value: 90, quantity: "ratio" }]
      : [];
  const each = g.cases
    .map((b) => (spec.standard === "NDS-2018" ? ndsResistance(spec, context, g, b) : ec5Resistance(spec, context, g, b)))
    .map((r) => ({ ...r, steps: [...across, ...r.steps] }));
  return withPlateBearing(g.double ? doubleShearResistance(each, { ...g, double: g.double }, context) : each[0]!, plateBearing(spec, context, g));
}

/** The timber's yield modes and the plate's bearing together: the least of all governs. */
function withPlateBearing(r: ConnectorResistance, plate: ReturnType<typeof plateBearing>): ConnectorResistance {
  if (!plate) return r;
  const modes = [...(r.modes ?? []), ...plate.modes];
  const least = plate.modes.reduce<ModeValue | null>((a, m) => (a === null || m.value < a.value ? m : a), null);
  const governs = least !== null && least.value < r.value;
  return {
    ...r,
    value: governs ? least.value : r.value,
    governing: governs ? least.mode : r.governing,
    reference: governs ? least.reference ?? r.reference : r.reference,
    steps: [...r.steps, ...plate.steps, ...(governs ? [{ symbol: "R", description: `the plate governs: ${least.mode}`, value: least.value, quantity: "connectorForce" as const }] : [])],
    modes,
    warnings: [...(r.warnings ?? []), ...plate.warnings],
  };
}

function doubleShearResistance(each: ConnectorResistance[], g: DowelGeometry & { double: DoubleShearMembers }, context: ConnectorContext): ConnectorResistance {
  // Double shear: every outer member (and driving direction) is checked with the central member; the weaker governs.
  const at = each.reduce((best, r, i) => (r.value < each[best]!.value * (1 - 1e-9) ? i : best), 0);
  const r = each[at]!;
  const { central, outer } = g.double;
  const label = (b: DowelBearing) => `outer "${b.side.part}"${b.sideNote ? ` (${b.sideNote})` : ""}`;
  const roles: WorkingStep = {
    symbol: "t_c",
    description: `double shear: central member "${central.part}" (the part between the two contact lines, crossed over this length), outer members "${outer[0].part}" and "${outer[1].part}"`,
    value: central.thickness,
    quantity: "length",
  };
  const weaker: WorkingStep[] = each.length > 1
    ? [{ symbol: "R", description: `each outer member checked with the central member, both outer members taken like it: ${g.cases.map((b, i) => `${label(b)} ${inJobUnits(each[i]!.value, "connectorForce", context.units)}`).join("; ")}; the weaker governs: ${label(g.cases[at]!)}`, value: r.value, quantity: "connectorForce" }]
    : [];
  return {
    ...r,
    governing: each.length > 1 ? `${r.governing}, outer member "${g.cases[at]!.side.part}"` : r.governing,
    steps: [roles, ...r.steps, ...weaker],
    modes: each.length > 1 ? each.flatMap((x, i) => (x.modes ?? []).map((m) => ({ ...m, mode: `${m.mode} (outer "${g.cases[i]!.side.part}", ℓ = ${round(g.cases[i]!.sideLength)} mm)` }))) : r.modes,
  };
}

function ndsResistance(spec: DowelSpec, context: ConnectorContext, g: DowelGeometry, b: DowelBearing): ConnectorResistance {
  const head = b.side;
  const point = b.main;
  const D = spec.yieldDiameter / MM_PER_IN;
  // Nominal (shank) diameter: F_e⊥, R_d's footnote for threaded fasteners, C_M and C_g.
  const nominalD = spec.diameter / MM_PER_IN;
  const bearing = (m: JoinedMember, angle: number): NdsBearing =>
    isSteel(m.material) ? ndsSteelBearing(m.material.tensileStrength! / MPA_PER_PSI, m.thickness / MM_PER_IN) : ndsWoodBearing(m.material.specificGravity!, D, angle, nominalD);
  const Fes = bearing(head, spec.angles.side);
  const Fem = bearing(point, spec.angles.main);
  const maxAngle = Math.max(...g.parts.map((p) => (isSteel(p.member.material) ? 0 : foldAngle(p.angle))));
  const yieldLimit = ndsYieldLimit({
    diameterIn: D,
    nominalDiameterIn: nominalD,
    bendingYieldPsi: spec.bendingYield.value / MPA_PER_PSI,
    sideLengthIn: b.sideLength / MM_PER_IN,
    mainLengthIn: b.mainLength / MM_PER_IN,
    sideBearingPsi: Fes.value,
    mainBearingPsi: Fem.value,
    shear: spec.shear,
    maxAngleDeg: maxAngle,
  });
  const lb = (x: number) => x * N_PER_LBF;
  const psi = (x: number) => x * MPA_PER_PSI;
  const table = spec.shear === "single" ? "NDS-2018 Table 12.3.1A (single shear)" : "NDS-2018 Table 12.3.1A (double shear)";
  const steps: WorkingStep[] = [
    { symbol: "D", description: `diameter in the yield model${spec.yieldDiameterNote ? ` (${spec.yieldDiameterNote})` : ""}`, value: spec.yieldDiameter, quantity: "length" },
    { symbol: "ℓ_s", description: g.double ? `dowel bearing length in the outer (side) member "${head.part}"${b.sideNote ? ` (${b.sideNote}, at most its thickness)` : ""}, each side member taken alike` : `dowel bearing length in the side member "${head.part}"`, value: b.sideLength, quantity: "length" },
    { symbol: "ℓ_m", description: g.double ? `dowel bearing length in the central (main) member "${point.part}"` : `dowel bearing length in the main member "${point.part}"${g.penetration !== null ? " (penetration, at most the member's thickness)" : ""}`, value: b.mainLength, quantity: "length" },
    { symbol: "F_es", description: `dowel bearing strength, ${g.double ? "outer" : "side"} member: ${Fes.formula}`, value: psi(Fes.value), quantity: "stress", reference: "NDS-2018 §12.3.3" },
    { symbol: "F_em", description: `dowel bearing strength, ${g.double ? "central" : "main"} member: ${Fem.formula}`, value: psi(Fem.value), quantity: "stress", reference: "NDS-2018 §12.3.3" },
    { symbol: "F_yb", description: `dowel bending yield strength (${spec.bendingYield.source})`, value: spec.bendingYield.value, quantity: "stress" },
    { symbol: "R_e", description: "F_em/F_es", value: yieldLimit.Re, quantity: "ratio" },
    { symbol: "R_t", description: "ℓ_m/ℓ_s", value: yieldLimit.Rt, quantity: "ratio" },
  ];
  if (yieldLimit.k1 !== null) steps.push({ symbol: "k₁", description: "mode II coefficient", value: yieldLimit.k1, quantity: "ratio", reference: table });
  if (yieldLimit.k2 !== null) steps.push({ symbol: "k₂", description: "mode IIIm coefficient", value: yieldLimit.k2, quantity: "ratio", reference: table });
  steps.push({ symbol: "k₃", description: "mode IIIs coefficient", value: yieldLimit.k3, quantity: "ratio", reference: table });
  const rdNote = D < 0.25 && nominalD >= 0.25 ? " = K_D K_θ (threaded, D ≥ 1/4 in with D_r < 1/4 in: Table 12.3.1B footnote [M])" : "";
  for (const m of yieldLimit.modes) steps.push({ symbol: `Z_${m.mode}`, description: `mode ${m.mode}, R_d = ${round(m.rd)}${rdNote}`, value: lb(m.zLb), quantity: "connectorForce", reference: `${table}; R_d Table 12.3.1B` });
  const Z = lb(yieldLimit.governing.zLb);
  steps.push({ symbol: "Z", description: `reference lateral design value (mode ${yieldLimit.governing.mode} governs)`, value: Z, quantity: "connectorForce", reference: table });

  const factors: { symbol: string; value: number; description: string; reference: string }[] = [];
  const allowable = context.basis === "allowable";
  if (allowable) {
    const CD = ndsLoadDurationFactor(context.categories, context.duration);
    factors.push({ symbol: "C_D", value: CD.value, description: `load duration factor (${CD.load}; at most 1.6 for connections)`, reference: "NDS-2018 §2.3.2, §11.3.2" });
  }
  const singleRowParallelToGrain = context.rows === 1 && context.members.every((m, i) => isSteel(m.material) || foldAngle(i === 0 ? spec.angles.side : spec.angles.main) === 0);
  const CM = ndsWetServiceFactor(spec.nds.moisture, nominalD, { singleRowParallelToGrain });
  factors.push({ symbol: "C_M", value: CM.value, description: `wet service factor (${CM.why})`, reference: "NDS-2018 Table 11.3.3 and footnotes [M]" });
  factors.push({ symbol: "C_t", value: ndsTemperatureFactor(spec.nds.temperature, spec.nds.moisture), description: `temperature factor (${spec.nds.temperature})`, reference: "NDS-2018 Table 11.3.4" });
  if (spec.groupAction && !fallsShort(nominalD, 0.25)) {
    const area = (m: JoinedMember) => (m.thickness * m.width) / MM_PER_IN ** 2;
    const E = (m: JoinedMember) => m.material.E / MPA_PER_PSI;
    // Double shear: the outer members' E·A add up (NDS-2018 §11.3.6 [M]); a hand-built context without the
    // roles has one outer member, and the far one is taken as its twin, as the yield model takes it.
    const outer = g.double ? [...g.double.outer] : spec.shear === "double" ? [head, head] : [head];
    const main = g.double ? g.double.central : point;
    const cg = ndsGroupActionFactor({
      fasteners: spec.groupAction.fasteners,
      spacingIn: spec.groupAction.spacing / MM_PER_IN,
      diameterIn: nominalD,
      mainStiffnessLb: E(main) * area(main),
      sideStiffnessLb: ndsGroupSideStiffness(outer.map((m) => ({ E: E(m), area: area(m) }))),
      woodToMetal: isSteel(head.material) || isSteel(point.material),
    });
    factors.push({ symbol: "C_g", value: cg.value, description: `group action factor, ${spec.groupAction.fasteners} in a row (γ = ${round(cg.gamma)} lb/in, u = ${round(cg.u)}, m = ${round(cg.m)}, R_EA = ${round(cg.REA)})`, reference: "NDS-2018 §11.3.6 eq. (11.3-1)" });
  } else {
    factors.push({ symbol: "C_g", value: 1, description: spec.groupAction ? "group action factor: 1.0 for D < 1/4 in (nominal diameter)" : "group action factor: 1.0 (each row carries its own tributary shear flow)", reference: "NDS-2018 §11.3.6" });
  }
  if (spec.nds.endGrain) factors.push({ symbol: "C_eg", value: NDS_END_GRAIN_FACTOR, description: "end grain factor", reference: "NDS-2018 §12.5.2" });
  if (spec.nds.toeNailed) factors.push({ symbol: "C_tn", value: NDS_TOE_NAIL_FACTOR, description: "toe-nail factor", reference: "NDS-2018 §12.5.4" });
  if (!allowable) {
    const lambda = ndsConnectionTimeEffect(context.timeEffect, context.categories);
    factors.push({ symbol: "K_F", value: NDS_KF_CONNECTIONS, description: "LRFD format conversion factor", reference: "NDS-2018 Table 11.3.1" });
    factors.push({ symbol: "φ_z", value: NDS_PHI_CONNECTIONS, description: "LRFD resistance factor, connections", reference: "NDS-2018 Table 11.3.1" });
    factors.push({ symbol: "λ", value: lambda.value, description: `time effect factor (${lambda.load})`, reference: "NDS-2018 Table N3 [M]" });
  }
  for (const f of factors) steps.push({ symbol: f.symbol, description: f.description, value: f.value, quantity: "ratio", reference: f.reference });
  const product = factors.reduce((p, f) => p * f.value, 1);
  const perLine = spec.shear === "double" ? 0.5 : 1;
  const value = Z * product * perLine;
  const name = allowable ? "Z′ (ASD)" : "Z′ (LRFD)";
  steps.push({ symbol: "Z′", description: `adjusted lateral design value, ${allowable ? "allowable (ASD)" : "factored (LRFD)"}: Z × ${factors.map((f) => f.symbol).join(" × ")}`, value: Z * product, quantity: "connectorForce", reference: "NDS-2018 Table 11.3.1" });
  if (perLine !== 1) steps.push({ symbol: "Z′/2", description: "per contact line: the fastener in double shear serves the two contact lines of the joint", value, quantity: "connectorForce" });
  const modes: ModeValue[] = yieldLimit.modes.map((m) => ({ mode: `mode ${m.mode}`, value: lb(m.zLb) * product * perLine, reference: table }));
  return {
    value,
    governing: `mode ${yieldLimit.governing.mode}`,
    reference: `${table}, ${name}`,
    steps,
    modes,
    slip: null,
    warnings: dowelWarnings(spec, context),
  };
}

function woodOf(m: Material, spec: DowelSpec): Ec5Wood {
  if (isPanel(m)) return spec.ec5.panel === "plywood" ? "plywood" : "osb";
  if (m.family === "engineered-wood") return "lvl";
  return exceeds(m.characteristicDensity ?? 0, 500) ? "hardwood" : "softwood";
}

function productOf(m: Material, spec: DowelSpec): Ec5Product {
  return isPanel(m) ? spec.ec5.panel : "solid";
}

function ec5Embedment(spec: DowelSpec, m: JoinedMember, angle: number): Embedment {
  const wood = woodOf(m.material, spec);
  const rho = m.material.characteristicDensity ?? 0;
  const d = spec.yieldDiameter;
  const nailRules = spec.ec5.nailEmbedment && !exceeds(d, 8);
  return nailRules
    ? ec5NailEmbedment({ wood, characteristicDensity: rho, diameter: d, predrilled: spec.predrilled, thickness: m.thickness })
    : ec5BoltEmbedment({ wood, characteristicDensity: rho, diameter: d, angleDeg: foldAngle(angle), thickness: m.thickness });
}

function ec5Resistance(spec: DowelSpec, context: ConnectorContext, g: DowelGeometry, b: DowelBearing): ConnectorResistance {
  const head = b.side;
  const point = b.main;
  const d = spec.yieldDiameter;
  const My = spec.ec5.yieldMoment.value;
  const steps: WorkingStep[] = [
    { symbol: "d", description: `diameter in the yield model${spec.yieldDiameterNote ? ` (${spec.yieldDiameterNote})` : ""}`, value: d, quantity: "length" },
    { symbol: "t₁", description: g.double ? `outer member thickness, "${head.part}"${b.sideNote ? ` (${b.sideNote}, at most its thickness)` : ""}, both outer members taken alike` : `head-side thickness, "${head.part}"`, value: b.sideLength, quantity: "length" },
    { symbol: "t₂", description: `${g.double ? "central member thickness" : "point-side penetration or thickness"}, "${point.part}"`, value: b.mainLength, quantity: "length" },
    { symbol: "M_y,Rk", description: `yield moment, N·mm (${spec.ec5.yieldMoment.source})`, value: My, quantity: "ratio", reference: "EN 1995-1-1 eq. (8.14), (8.30)" },
  ];
  let johansen: JohansenResult;
  let reference: string;
  const steelHead = isSteel(head.material);
  const steelPoint = isSteel(point.material);
  if (steelHead || steelPoint) {
    const timber = steelHead ? point : head;
    const plate = steelHead ? head : point;
    const fh = ec5Embedment(spec, timber, steelHead ? spec.angles.main : spec.angles.side);
    steps.push({ symbol: "f_h,k", description: `embedment strength of "${timber.part}": ${fh.formula}`, value: fh.value, quantity: "stress", reference: fh.reference });
    steps.push({ symbol: "t_plate", description: `steel plate "${plate.part}" (thin ≤ 0.5d, thick ≥ d)`, value: plate.thickness, quantity: "length" });
    const t = steelHead ? b.mainLength : b.sideLength;
    const input = { fh: fh.value, t, d, My, rope: spec.ec5.rope, plateThickness: plate.thickness };
    if (spec.shear === "single") {
      johansen = johansenSteelSingle(input);
      reference = "EN 1995-1-1 eq. (8.9), (8.10)";
    } else if (steelPoint) {
      johansen = johansenSteelCentral(input);
      reference = "EN 1995-1-1 eq. (8.11)";
    } else {
      johansen = johansenSteelSides(input);
      reference = "EN 1995-1-1 eq. (8.12), (8.13)";
    }
  } else {
    const fh1 = ec5Embedment(spec, head, spec.angles.side);
    const fh2 = ec5Embedment(spec, point, spec.angles.main);
    steps.push({ symbol: "f_h,1,k", description: `embedment strength of "${head.part}": ${fh1.formula}`, value: fh1.value, quantity: "stress", reference: fh1.reference });
    steps.push({ symbol: "f_h,2,k", description: `embedment strength of "${point.part}": ${fh2.formula}`, value: fh2.value, quantity: "stress", reference: fh2.reference });
    steps.push({ symbol: "β", description: "f_h,2,k/f_h,1,k", value: fh2.value / fh1.value, quantity: "ratio" });
    const input = { fh1: fh1.value, fh2: fh2.value, t1: b.sideLength, t2: b.mainLength, d, My, rope: spec.ec5.rope };
    if (spec.shear === "single") {
      johansen = johansenTimberSingle(input);
      reference = "EN 1995-1-1 eq. (8.6)";
    } else {
      johansen = johansenTimberDouble(input);
      reference = "EN 1995-1-1 eq. (8.7)";
    }
  }
  steps.push({ symbol: "F_ax,Rk", description: `withdrawal capacity for the rope effect (${spec.ec5.ropeNote}); its share is capped at ${Math.round(spec.ec5.rope.cap * 100)} % of the Johansen part`, value: spec.ec5.rope.axialCapacity, quantity: "connectorForce", reference: "EN 1995-1-1 §8.2.2(2)" });
  for (const m of johansen.modes) {
    steps.push({ symbol: `F_v,Rk (${m.mode})`, description: `mode ${m.mode}: ${m.equation}${m.rope > 0 ? ` (rope effect ${round(m.rope)} N included)` : ""}`, value: m.value, quantity: "connectorForce", reference });
  }
  if (johansen.interpolation) steps.push({ symbol: "F_v,Rk", description: "plate between thin and thick: linear interpolation", value: johansen.value, quantity: "connectorForce", reference: "EN 1995-1-1 §8.2.3(1)" });
  steps.push({ symbol: "F_v,Rk", description: `characteristic resistance per shear plane (mode ${johansen.governing.mode} governs)`, value: johansen.value, quantity: "connectorForce", reference });

  const duration = ec5DurationOf(context.duration, context.categories);
  const woodMembers = [head, point].filter((m) => !isSteel(m.material));
  const kmods = woodMembers.map((m) => ec5Kmod(productOf(m.material, spec), spec.ec5.serviceClass, duration.duration) ?? NaN);
  const kmod = kmods.length === 2 ? Math.sqrt(kmods[0]! * kmods[1]!) : kmods[0]!;
  steps.push({ symbol: "k_mod", description: `service class ${spec.ec5.serviceClass}, ${duration.why}${kmods.length === 2 && kmods[0] !== kmods[1] ? "; √(k_mod,1 k_mod,2) for members of different products" : ""}`, value: kmod, quantity: "ratio", reference: kmods.length === 2 && kmods[0] !== kmods[1] ? "EN 1995-1-1 Table 3.1, eq. (2.6)" : "EN 1995-1-1 Table 3.1" });
  steps.push({ symbol: "γ_M", description: "partial factor for connections (recommended value)", value: EC5_GAMMA_M_CONNECTIONS, quantity: "ratio", reference: "EN 1995-1-1 Table 2.3" });
  let factor = kmod / EC5_GAMMA_M_CONNECTIONS;
  if (spec.groupAction) {
    const nef = ec5EffectiveNumber(spec, spec.groupAction.fasteners, spec.groupAction.spacing);
    steps.push({ symbol: "n_ef/n", description: `effective number in a row of ${spec.groupAction.fasteners} (${nef.formula})`, value: nef.ratio, quantity: "ratio", reference: nef.reference });
    factor *= nef.ratio;
  }
  const value = johansen.value * factor;
  steps.push({ symbol: "F_v,Rd", description: `design resistance per shear plane: k_mod F_v,Rk/γ_M${spec.groupAction ? " × n_ef/n" : ""}${spec.shear === "double" ? " (the fastener in double shear serves the two contact lines of the joint, one plane each)" : ""}`, value, quantity: "connectorForce", reference: "EN 1995-1-1 §2.4.3, eq. (2.17)" });
  const slip = ec5Slip(spec, g.double ? [g.double.outer[0], g.double.central] : context.members);
  if (slip) {
    steps.push({ symbol: "K_ser", description: `slip modulus per shear plane: ${slip.formula}`, value: slip.serviceability, quantity: "slipModulus", reference: "EN 1995-1-1 Table 7.1" });
    steps.push({ symbol: "K_u", description: "ultimate slip modulus, 2/3 K_ser", value: slip.ultimate, quantity: "slipModulus", reference: "EN 1995-1-1 eq. (2.1)" });
  }
  const modes: ModeValue[] = johansen.modes.map((m) => ({ mode: `mode ${m.mode}`, value: m.value * factor, reference }));
  const warnings = dowelWarnings(spec, context);
  return {
    value,
    governing: `mode ${johansen.governing.mode}`,
    reference: `${reference}; F_v,Rd = k_mod F_v,Rk/γ_M`,
    steps,
    modes,
    slip: slip ? { serviceability: slip.serviceability, ultimate: slip.ultimate, reference: "EN 1995-1-1 Table 7.1, eq. (2.1)" } : null,
    warnings,
  };
}

/** Slip of the shear plane between two members (in double shear, that of this context's contact line). */
function ec5Slip(spec: DowelSpec, plane: readonly JoinedMember[]): (SlipModuli & { formula: string }) | null {
  const wood = plane.filter((m) => !isSteel(m.material));
  const densities = wood.map((m) => m.material.meanDensity);
  if (densities.some((r) => r === undefined)) return null;
  const rho = densities.length === 2 ? jointMeanDensity(densities[0]!, densities[1]!) : densities[0]!;
  const k = ec5SlipModulus({ meanDensity: rho, diameter: spec.diameter, nailNotPredrilled: spec.family === "nail" && !spec.predrilled, steelToTimber: wood.length === 1 });
  return { serviceability: k.serviceability, ultimate: k.ultimate, reference: "EN 1995-1-1 Table 7.1", formula: `${k.formula}, ρ_m = ${round(rho)} kg/m³` };
}

/** n_ef/n for a row along the grain: bolts and dowels eq. (8.34); nails eq. (8.17) with k_ef of Table 8.1. */
function ec5EffectiveNumber(spec: DowelSpec, n: number, a1: number): { ratio: number; formula: string; reference: string } {
  const d = spec.diameter;
  if (spec.family === "bolt" || spec.family === "dowel" || spec.family === "lag-screw" || (spec.family === "screw" && exceeds(d, 6))) {
    const nef = Math.min(n, n ** 0.9 * (a1 / (13 * d)) ** 0.25);
    return { ratio: nef / n, formula: "n_ef = min(n, n^0.9 (a₁/13d)^0.25)", reference: "EN 1995-1-1 eq. (8.34)" };
  }
  const points: [number, number][] = spec.predrilled ? [[4, 0.5], [7, 0.7], [10, 0.85], [14, 1]] : [[7, 0.7], [10, 0.85], [14, 1]];
  const r = a1 / d;
  let kef = points[0]![1];
  if (r >= 14) kef = 1;
  else for (let i = 0; i + 1 < points.length; i++) {
    const [x0, y0] = points[i]!;
    const [x1, y1] = points[i + 1]!;
    if (r >= x0 && r <= x1) kef = y0 + ((y1 - y0) * (r - x0)) / (x1 - x0);
  }
  return { ratio: n ** kef / n, formula: `n_ef = n^k_ef, k_ef = ${round(kef)} at a₁ = ${round(r)}d`, reference: "EN 1995-1-1 eq. (8.17), Table 8.1" };
}

function dowelWarnings(spec: DowelSpec, context: ConnectorContext): string[] {
  const out: string[] = [];
  const g = dowelGeometry(spec, context);
  const u = context.units;
  if (g.through) {
    out.push(`The ${spec.noun} point passes through part "${g.through.member.part}" (penetration ${inJobUnits(g.through.penetration, "length", u)}); only the part's thickness is counted and the protruding point is not credited.`);
  }
  // Whether a row fits across the contact is checked for every kind by the pipeline (core/fastening/row-fit.ts).
  if (spec.standard === "NDS-2018" && context.rows > 1 && g.parts.some((p) => isSteel(p.member.material)) && g.parts.some((p) => !isSteel(p.member.material))) {
    // A steel plate restrains the wood's shrinkage across the grain between the outer connectors of a row.
    const spread = (context.rows - 1) * (dowelDetailing(spec, context).rowSpacing ?? 0);
    if (exceeds(spread, 5 * MM_PER_IN)) {
      out.push(`${context.rows} ${spec.noun}s side by side through a steel plate spread at least ${inJobUnits(spread, "length", u)} across the grain, more than 5 in: NDS-2018 limits the spacing between the outer rows on a single steel plate to 5 in, as the plate restrains the wood's shrinkage (Table 12.5.1D footnote [M]); confirm the wood is dry at installation or use slotted holes or separate plates.`);
    }
  }
  return out;
}

/**
 * ℓ/D of NDS-2018 Table 12.5.1D, footnote [M]: the smaller of the length in the wood main member and the
 * total length in the wood side member(s), over D; a steel member's length does not count. Single shear:
 * the head-side and point-side members; double shear: the central member and the two outer members together.
 */
function ndsSlenderness(spec: DowelSpec, g: DowelGeometry): number {
  const wood = (m: JoinedMember) => !isSteel(m.material);
  const lengths: number[] = [];
  for (const b of g.cases) {
    if (wood(b.main)) lengths.push(b.mainLength);
    if (!wood(b.side)) continue;
    if (spec.shear === "single") lengths.push(b.sideLength);
    else {
      // Both outer members: from the joint's roles where it has them, each taken like this one otherwise.
      const other = g.double ? g.cases.find((c) => c.side.part !== b.side.part) : undefined;
      lengths.push(b.sideLength + (other ? (wood(other.side) ? other.sideLength : 0) : b.sideLength));
    }
  }
  return lengths.length > 0 ? Math.min(...lengths) / spec.diameter : 0;
}

export function dowelDetailing(given: DowelSpec, context?: ConnectorContext): DetailingLimits {
  if (!context) return { minSpacing: 0, maxSpacing: null, endDistance: 0, sources: [] };
  const spec = oriented(given, context);
  const g = dowelGeometry(spec, context);
  const per: MemberSpacing[] = [];
  const steelToTimber = g.parts.some((x) => isSteel(x.member.material));
  g.parts.forEach(({ member: m, angle }) => {
    if (isSteel(m.material)) return;
    if (spec.standard === "NDS-2018") {
      per.push(ndsSpacing({ family: spec.family, diameterIn: spec.diameter / MM_PER_IN, angleDeg: angle, prebored: spec.predrilled || spec.family === "screw", slenderness: ndsSlenderness(spec, g), ...(context.direction === "across" ? { grainAlongLine: true } : {}) }));
    } else {
      const placement = isPanel(m.material) ? (spec.ec5.panel === "plywood" ? "plywood" : "osb") : "timber";
      per.push(ec5Spacing({ family: spec.family, d: spec.diameter, angleDeg: angle, characteristicDensity: m.material.characteristicDensity ?? 0, predrilled: spec.predrilled, placement, steelToTimber, ...(context.direction === "across" ? { grainAlongLine: true } : {}) }));
    }
  });
  const max = (pick: (s: MemberSpacing) => number) => Math.max(0, ...per.map(pick));
  return {
    minSpacing: max((s) => s.along),
    maxSpacing: null,
    endDistance: max((s) => s.end),
    edgeDistance: max((s) => s.edge),
    // A force across the grain: the edge it does not push toward may be closer (the pipeline tells which edge is loaded).
    ...(per.some((s) => s.unloadedEdge !== undefined) ? { unloadedEdgeDistance: max((s) => s.unloadedEdge ?? s.edge) } : {}),
    rowSpacing: max((s) => s.across),
    penetration: g.penetration !== null && spec.minPenetration ? { required: spec.minPenetration.multiple * spec.diameter, provided: g.penetration } : null,
    sources: [...new Set(per.map((s) => s.source)), ...(spec.minPenetration && g.penetration !== null ? [`minimum penetration ${spec.minPenetration.multiple}d (${spec.minPenetration.source})`] : [])],
  };
}

const round = (x: number) => Number(x.toPrecision(4));

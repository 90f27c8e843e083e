import type { z } from "zod";
import type { Material } from "../schema/job.js";
import type { Quantity, UnitSystem } from "../units/quantity.js";

/** One line of the working behind a resistance, printed on the worksheet. */
export interface WorkingStep {
  symbol: string;
  description: string;
  value: number;
  /** Kind of the value; "ratio" for a pure number. */
  quantity: Quantity | "ratio";
  reference?: string;
}

/** A part a connector passes through, in the order it is driven: side (head) member first. */
export interface JoinedMember {
  part: string;
  material: Material;
  /** Thickness of the part in the driving direction (perpendicular to the contact line), mm. */
  thickness: number;
  /** Extent of the part along the contact line's cross direction (for edge distances), mm. */
  width: number;
}

/**
 * The roles in a double-shear joint, fixed by the geometry: the central (main) member is the part
 * both contact lines of the joint touch, the one the connector crosses between the two others; the
 * outer (side) members lie one beyond each line. Neither thicknesses nor the head side enter.
 */
export interface DoubleShearMembers {
  /** Thickness is the distance the connector crosses in it, between the two contact lines. */
  central: JoinedMember;
  /** The outer member at this context's contact line first, then the one beyond the central member. */
  outer: [JoinedMember, JoinedMember];
}

/** What a connector kind is told about the place it is used. */
export interface ConnectorContext {
  /** Duration class of the load combination: that of its shortest-duration load (EN 1995-1-1 §3.1.3(2)). */
  duration: DurationClass;
  /** Load categories present in the combination with a non-zero factor. */
  categories: string[];
  /** NDS LRFD time effect factor λ of the combination's form (NDS-2018 Table N3), where the combination gives it. */
  timeEffect?: { value: number; reason: string } | undefined;
  /**
   * For messages only: a resistance is worked out once per contact line and loading (duration, categories,
   * time effect; `memoisedByLoading`) and reused for every combination of that loading, so it must not depend on this.
   */
  combinationName: string;
  basis: "allowable" | "factored";
  /** The two parts at the contact line: head (side) member first, then the main member. In double shear read `double` instead. */
  members: [JoinedMember, JoinedMember];
  /**
   * Double shear by the joint's geometry (see `doubleShearMembers`): the roles when the joint is two
   * parallel contact lines on either face of one part, or why it is not. Set by the pipeline; absent in
   * a context built by hand for two members.
   */
  double?: DoubleShearMembers | { refused: string };
  /** Shear strengths of the materials the joint connects, where the job gives them, MPa. */
  adherends: { material: string; shearStrength: number | undefined; rollingShear: number | undefined }[];
  /** Connectors per row across the contact line (fillets per line for a weld). */
  rows: number;
  /** The job's unit system, for messages a person reads (numbers in the context are in core units). */
  units: UnitSystem;
  /**
   * Which way the connector is loaded: along the member (shear flow; the kind's own grain angles apply),
   * or across it (a load passed between side-by-side plies: perpendicular to the grain of timber parts,
   * whatever angles the connector gives). Along when absent.
   */
  direction?: "along" | "across";
}

/**
 * The members of a double-shear joint at this context: the pipeline's roles; for a context built by hand
 * (no `double`), `members[1]` is the central member and `members[0]` stands for both outer members;
 * null when the joint is not a double-shear joint (`doubleShearRefusal` says why).
 */
export function doubleShearMembers(context: ConnectorContext): DoubleShearMembers | null {
  const d = context.double;
  if (d === undefined) return { central: context.members[1], outer: [context.members[0], context.members[0]] };
  return "refused" in d ? null : d;
}

/** Why the joint at this context cannot take a connector in double shear; null when it can. */
export function doubleShearRefusal(context: ConnectorContext): string | null {
  const d = context.double;
  return d !== undefined && "refused" in d ? d.refused : null;
}

export const durationClasses = ["permanent", "long", "medium", "short", "instantaneous", "unspecified"] as const;
export type DurationClass = (typeof durationClasses)[number];

/** Value of one failure mode or limit state, N per connector (N/mm for a weld). */
export interface ModeValue {
  mode: string;
  value: number;
  reference?: string;
}

/** Slip moduli of one connector per shear plane, N/mm: K_ser for serviceability, K_u for the ultimate limit state. */
export interface SlipModuli {
  serviceability: number;
  ultimate: number;
  reference: string;
}

/** Design resistance of one connector for one load combination, N. */
export interface ConnectorResistance {
  value: number;
  governing: string;
  reference: string;
  steps: WorkingStep[];
  /** Every mode or limit state evaluated, on the same basis as `value`; the least is `value`. */
  modes?: ModeValue[];
  slip?: SlipModuli | null;
  /** Conditions the value depends on that a reviewer must confirm. */
  warnings?: string[];
}

/** Detailing limits along a connector line, mm. */
export interface DetailingLimits {
  /** Least spacing of rows along the line. */
  minSpacing: number;
  maxSpacing: number | null;
  /** Least distance from a member end to the first row. */
  endDistance: number;
  /** Least distance from a connector to the edge of a joined part across the line (for a force across the grain, to the loaded edge). */
  edgeDistance?: number | null;
  /** For a force across the grain: the least distance to an edge the connector does not push toward (unloaded), where it differs. */
  unloadedEdgeDistance?: number | null;
  /** Least spacing between connectors of one row, across the line. */
  rowSpacing?: number | null;
  /** Penetration into the point-side member: least allowed and provided. */
  penetration?: { required: number; provided: number } | null;
  sources: string[];
}

/** Design shear strength of a bond line for one load combination, MPa. */
export interface BondStrength {
  value: number;
  governing: string;
  reference: string;
  steps: WorkingStep[];
}

/** Design resistance of one weld line per unit length for one load combination, N/mm. */
export interface WeldResistance {
  value: number;
  governing: string;
  reference: string;
  steps: WorkingStep[];
  modes?: ModeValue[];
  warnings?: string[];
}

/** Weld detailing limits, mm. */
export interface WeldDetailing {
  /** Leg size of the weld as specified. */
  size: number;
  minSize: number;
  maxSize: number;
  /** Shortest segment of an intermittent weld. */
  minSegmentLength: number;
  /** Largest centre-to-centre pitch of intermittent segments, where a standard sets one. */
  maxPitch: number | null;
  /** Largest clear gap between intermittent segments, where a standard sets one. */
  maxGap: number | null;
  sources: string[];
}

/** How a weld runs along its line: continuous, or segments of a length at a pitch. */
export interface WeldLayout {
  pattern: "continuous" | "intermittent";
  segmentLength: number | null;
  pitch: number | null;
  /** Intermittent segments on the two sides of a web: opposite each other, or alternating. */
  arrangement: "chain" | "staggered";
}

/**
 * Something wrong with a connector where it is used, found before designing. `on` says which field
 * the message belongs to: the connector's own field, the fastening's (rows), or a field of one of the
 * joined members' materials (index into `context.members`, or `part`: the id of any part of the joint,
 * such as the far outer member of a double-shear joint).
 */
export type PlacementProblem =
  | { on: "connector"; field: string; message: string; /** About the whole joint (a double-shear joint's parts), not one contact line. */ wholeJoint?: boolean }
  | { on: "fastening"; field: string; message: string; wholeJoint?: boolean }
  | { on: "material"; member: 0 | 1; part?: string; field: string; message: string };

interface KindBase<C extends { kind: string }> {
  kind: C["kind"];
  /** Zod schema of the connector as it stands in the job document. */
  schema: z.ZodType<C>;
  /** Short trade description ("0.131 × 3 in nail, rated 120 lbf"). */
  describe(connector: C): string;
  standards(connector: C): string[];
  assumptions(connector: C): string[];
  /**
   * Problems of the connector at one contact line that make any result meaningless (penetration
   * below the minimum, a bolt larger than the part, an unknown grade for the standard, a material
   * property the method needs): the job is refused with these at their field paths.
   */
  problems?(connector: C, context: ConnectorContext): PlacementProblem[];
  /** The same connector in the next larger trade sizes, smallest first, for a schedule no spacing can satisfy; none when the kind has no size family. */
  largerSizes?(connector: C): C[];
}

/** Connectors placed one by one along a line: nails, screws, bolts, rated fasteners. */
export interface DiscreteConnectorKind<C extends { kind: string }> extends KindBase<C> {
  mechanism: "discrete";
  resistance(connector: C, context: ConnectorContext): ConnectorResistance;
  /**
   * Spacing limits at one contact line. Without a context (checks made before the section is built)
   * a kind returns only limits that need no joined parts; a kind computed from the parts returns
   * zero minima and no maximum then.
   */
  detailing(connector: C, context?: ConnectorContext): DetailingLimits;
  /**
   * Whether the connector may attach the extension of a partial-length steel cover plate past its
   * theoretical cut-off (AISC 360-16 §F13.3: slip-critical bolts or fillet welds [M]), with the reason.
   * Absent where the rule does not concern the kind.
   */
  plateEndAttachment?(connector: C): { allowed: boolean; reason: string };
}

/** A continuous bond line checked by its shear stress. */
export interface BondLineKind<C extends { kind: string }> extends KindBase<C> {
  mechanism: "bond-line";
  shearStrength(connector: C, context: ConnectorContext): BondStrength;
}

/** A weld along the contact line, checked by its resistance per unit length against the shear flow. */
export interface WeldKind<C extends { kind: string }> extends KindBase<C> {
  mechanism: "weld";
  /** Resistance of one weld line (one fillet) per unit of weld length, N/mm. */
  resistancePerLength(connector: C, context: ConnectorContext): WeldResistance;
  detailing(connector: C, context: ConnectorContext): WeldDetailing;
  layout(connector: C): WeldLayout;
}

export type ConnectorKind<C extends { kind: string }> = DiscreteConnectorKind<C> | BondLineKind<C> | WeldKind<C>;

/** The most restrictive of several lines' limits: largest minima, smallest maxima, every source once. */
export function governingLimits(limits: DetailingLimits[]): DetailingLimits {
  const largest = (pick: (l: DetailingLimits) => number | null | undefined) => {
    const values = limits.map(pick).filter((v): v is number => typeof v === "number");
    return values.length > 0 ? Math.max(...values) : null;
  };
  const maxima = limits.map((l) => l.maxSpacing).filter((v): v is number => v !== null);
  const penetrations = limits.map((l) => l.penetration).filter((p): p is { required: number; provided: number } => !!p);
  return {
    minSpacing: largest((l) => l.minSpacing) ?? 0,
    maxSpacing: maxima.length > 0 ? Math.min(...maxima) : null,
    endDistance: largest((l) => l.endDistance) ?? 0,
    edgeDistance: largest((l) => l.edgeDistance),
    unloadedEdgeDistance: largest((l) => l.unloadedEdgeDistance),
    rowSpacing: largest((l) => l.rowSpacing),
    penetration: penetrations.length > 0 ? penetrations.reduce((a, b) => (b.provided - b.required < a.provided - a.required ? b : a)) : null,
    sources: [...new Set(limits.flatMap((l) => l.sources))],
  };
}

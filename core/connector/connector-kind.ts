import type { z } from "zod";
import type { Material } from "../schema/job.js";
import type { Quantity } from "../units/quantity.js";

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

/** What a connector kind is told about the place it is used. */
export interface ConnectorContext {
  /** Duration class of the load combination: that of its shortest-duration load (EN 1995-1-1 §3.1.3(2)). */
  duration: DurationClass;
  /** Load categories present in the combination with a non-zero factor. */
  categories: string[];
  combinationName: string;
  basis: "allowable" | "factored";
  /** The two parts at the contact line: head (side) member first, then the main member. */
  members: [JoinedMember, JoinedMember];
  /** Shear strengths of the materials the joint connects, where the job gives them, MPa. */
  adherends: { material: string; shearStrength: number | undefined; rollingShear: number | undefined }[];
}

export const durationClasses = ["permanent", "long", "medium", "short", "instantaneous", "unspecified"] as const;
export type DurationClass = (typeof durationClasses)[number];

/** Design resistance of one connector for one load combination, N. */
export interface ConnectorResistance {
  value: number;
  governing: string;
  reference: string;
  steps: WorkingStep[];
}

/** Detailing limits along a connector line, mm. */
export interface DetailingLimits {
  minSpacing: number;
  maxSpacing: number | null;
  endDistance: number;
  sources: string[];
}

/** Design shear strength of a bond line for one load combination, MPa. */
export interface BondStrength {
  value: number;
  governing: string;
  reference: string;
  steps: WorkingStep[];
}

interface KindBase<C extends { kind: string }> {
  kind: C["kind"];
  /** Zod schema of the connector as it stands in the job document. */
  schema: z.ZodType<C>;
  /** Short trade description ("0.131 × 3 in nail, rated 120 lbf"). */
  describe(connector: C): string;
  standards(connector: C): string[];
  assumptions(connector: C): string[];
}

/** Connectors placed one by one along a line: nails, screws, bolts, rated fasteners. */
export interface DiscreteConnectorKind<C extends { kind: string }> extends KindBase<C> {
  mechanism: "discrete";
  resistance(connector: C, context: ConnectorContext): ConnectorResistance;
  detailing(connector: C): DetailingLimits;
}

/** A continuous bond line checked by its shear stress. */
export interface BondLineKind<C extends { kind: string }> extends KindBase<C> {
  mechanism: "bond-line";
  shearStrength(connector: C, context: ConnectorContext): BondStrength;
}

export type ConnectorKind<C extends { kind: string }> = DiscreteConnectorKind<C> | BondLineKind<C>;

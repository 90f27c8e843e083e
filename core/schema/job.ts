import { z } from "zod";
import { Connector } from "../connector/registry.js";
import { unitSystems } from "../units/quantity.js";
import { Id, Text, nonNegative, positive, quantity } from "./quantity.js";
import { Beam, CombinationSettings } from "./beam.js";
import { Shape } from "./shapes.js";
import { Compression } from "./column.js";

export { Shape };

export const JOB_FORMAT = "stitchplan-job";
export const JOB_VERSION = 1;

export const Material = z.strictObject({
  id: Id,
  name: Text(80).min(1, "must not be empty"),
  family: z.enum(["sawn-timber", "glulam", "engineered-wood", "panel", "steel", "other"]).default("other"),
  /** Modulus of elasticity used for the transformed section and deflection. */
  E: positive("modulus"),
  density: nonNegative("density"),
  /** Strengths on the job's basis (allowable or design values); a check without its strength is listed as not checked. */
  strength: z
    .strictObject({
      bending: positive("stress").optional(),
      shear: positive("stress").optional(),
      /** Rolling shear, where cross-layers of a panel meet a bond line. */
      rollingShear: positive("stress").optional(),
      /**
       * Compression parallel to the grain, for a column. NDS: F_c with every factor but C_D (or K_F·φ·λ) and
       * C_P applied. EN 1995-1-1: the characteristic f_c,0,k (k_mod and γ_M are applied per combination).
       */
      compression: positive("stress").optional(),
    })
    .default({}),
  /** Timber: specific gravity G (oven-dry), for dowel bearing strength under the NDS. */
  specificGravity: z.number().positive().max(1.2).optional(),
  /** Timber: characteristic density ρ_k, for embedment strength under EN 1995-1-1. */
  characteristicDensity: positive("density").optional(),
  /** Timber: mean density ρ_mean, for slip moduli under EN 1995-1-1. */
  meanDensity: positive("density").optional(),
  /** Timber columns: E_min (NDS) or E_0,05 (EN 1995-1-1); worked out from E when absent (stated in the result). */
  Emin: positive("modulus").optional(),
  /** Steel: yield strength F_y. */
  yieldStrength: positive("stress").optional(),
  /** Steel: tensile strength F_u. */
  tensileStrength: positive("stress").optional(),
  source: Text(400).default(""),
});
export type Material = z.infer<typeof Material>;

export const Placement = z.strictObject({
  /** The part this one is placed against. */
  on: Id,
  side: z.enum(["top", "bottom", "left", "right"]),
  /** Centred on that part, or flush with its left/bottom ("start") or right/top ("end") edge. */
  align: z.enum(["centre", "start", "end"]).default("centre"),
});

export const SectionPart = z
  .strictObject({
    id: Id,
    name: Text(80).default(""),
    material: Id,
    shape: Shape,
    /** Left edge of the part's bounding box, measured from any fixed vertical line. */
    x: quantity("length").optional(),
    /** Bottom edge of the part's bounding box, measured up from any fixed level. */
    y: quantity("length").optional(),
    /** Instead of x and y: stack this part against another one. */
    place: Placement.optional(),
    /** Where the part runs along the member (a cover plate over the middle half): the whole member when absent. */
    extent: z
      .strictObject({
        from: nonNegative("span").optional(),
        to: positive("span").optional(),
      })
      .optional(),
  })
  .superRefine((p, ctx) => {
    const hasXY = p.x !== undefined && p.y !== undefined;
    if (p.place && (p.x !== undefined || p.y !== undefined)) ctx.addIssue({ code: "custom", path: ["place"], message: "give either x and y, or place, not both" });
    else if (!p.place && !hasXY) ctx.addIssue({ code: "custom", path: [p.x === undefined ? "x" : "y"], message: "is required (or place the part against another with place)" });
  });
export type SectionPart = z.infer<typeof SectionPart>;

export { loadCategories, LoadCategory, UniformLoad, LinearLoad, PointLoad, MomentLoad, Load, Beam } from "./beam.js";

export const Fastening = z.strictObject({
  connector: Id,
  /** Connectors per row across each contact line (side by side at one station). */
  rows: z.number().int("must be a whole number").min(1).max(8).default(1),
  /**
   * Which part the connector is driven from (its head or side member): the held group, the other
   * side, or "auto" — the part that is thinner in the driving direction. A connector in double shear
   * does not use it: its central member is the part between the joint's two contact lines.
   */
  headSide: z.enum(["auto", "held", "other"]).default("auto"),
  /** Check mode: the schedule that exists or is proposed, to be checked instead of designed. */
  provided: z
    .discriminatedUnion("type", [
      z.strictObject({
        type: z.literal("zones"),
        zones: z
          .array(z.strictObject({ from: nonNegative("span"), to: positive("span"), spacing: positive("length") }))
          .min(1, "needs at least one zone")
          .max(60, "at most 60 zones"),
      }),
      z.strictObject({
        type: z.literal("positions"),
        /** Rows along the member, from the left end. */
        positions: z.array(nonNegative("span")).min(1, "needs at least one position").max(5000, "at most 5000 positions"),
      }),
    ])
    .optional(),
});
export type Fastening = z.infer<typeof Fastening>;

export const JointFastening = Fastening.extend({
  /** The parts held by this joint's connectors; names the joint. */
  held: z.array(Id).min(1, "must name at least one part"),
});

export const SpacingRules = z.strictObject({
  /** Spacings are whole multiples of this step. Default 5 mm or 1/4 in. */
  module: positive("length").optional(),
  /** Preferred spacings; when given, only these are used. */
  preferred: z.array(positive("length")).max(30).optional(),
  /** Overrides the connector's minimum spacing when larger. */
  minimum: positive("length").optional(),
  /** Overrides the connector's maximum spacing when smaller. */
  maximum: positive("length").optional(),
  /** Shortest zone a builder is asked to follow. Default 300 mm or 12 in. */
  minZoneLength: nonNegative("length").optional(),
  maxZonesPerSpan: z.number().int("must be a whole number").min(1).max(9).default(5),
  /** Mirror the zones about midspan when the demand is symmetric. */
  symmetric: z.boolean().default(true),
  /**
   * Whose everyday layout the schedule follows where the job leaves it open: the module (5 mm or 1/4 in),
   * the shortest zone (300 mm or 12 in), the largest spacing when the connector sets none (600 mm or
   * 24 in) and round zone boundaries (in mm or in). The job's units when absent; a conversion keeps the
   * practice of the system it came from, so the converted job designs the same schedules.
   */
  practice: z.enum(unitSystems).optional(),
});
export type SpacingRules = z.infer<typeof SpacingRules>;

export const JobDocument = z.strictObject({
  format: z.literal(JOB_FORMAT),
  version: z.literal(JOB_VERSION),
  /** si: mm, m, kN, kN/m, N, MPa, kg/m³ · us: in, ft, lbf, lbf/ft, psi, lb/ft³ */
  units: z.enum(unitSystems),
  /** allowable: service loads against allowable values · factored: factored loads against design values */
  basis: z.enum(["allowable", "factored"]),
  /** design: stitchplan lays out the schedules · check: it checks the schedules given in `fastening` */
  mode: z.enum(["design", "check"]).default("design"),
  project: z.strictObject({
    name: Text(120).min(1, "must not be empty"),
    number: Text(40).default(""),
    engineer: Text(80).default(""),
    client: Text(120).default(""),
  }),
  member: z.strictObject({
    mark: Text(40).min(1, "must not be empty"),
    description: Text(200).default(""),
    revision: Text(12).default("A"),
    date: z.string().regex(/^\d{4}-\d{2}-\d{2}$/, "must be a date written YYYY-MM-DD").optional(),
  }),
  materials: z.array(Material).min(1, "needs at least one material").max(12, "at most 12 materials"),
  parts: z.array(SectionPart).min(1, "needs at least one part").max(16, "at most 16 parts"),
  connectors: z.array(Connector).min(1, "needs at least one connector or glue line").max(12, "at most 12 connectors"),
  fastening: z.strictObject({
    default: Fastening,
    joints: z.array(JointFastening).max(32).default([]),
  }),
  beam: Beam,
  combinations: CombinationSettings.default({ set: "unfactored" }),
  spacing: SpacingRules.default({ maxZonesPerSpan: 5, symmetric: true }),
  /**
   * How the parts act together: "rigid" designs on q = V·Q/I; "slip-aware" uses the connectors' slip
   * moduli (EN 1995-1-1 Annex B, the γ-method) for timber flanges nailed or screwed to a web. Either way
   * the result shows both side by side where the section and connectors allow.
   */
  compositeAction: z
    .strictObject({
      model: z.enum(["rigid", "slip-aware"]).default("rigid"),
      /** Long-term deflection: ψ2 of the variable actions and k_def of the timber (EN 1995-1-1 Table 3.2). */
      longTerm: z.strictObject({ psi2: z.number().min(0).max(1), kdef: z.number().min(0).max(4) }).optional(),
    })
    .default({ model: "rigid" }),
  /** Axial compression: the member stands as a column (a post, a stud pack). A beam when absent. */
  compression: Compression.optional(),
});
export type JobDocument = z.infer<typeof JobDocument>;
export type JobInput = z.input<typeof JobDocument>;

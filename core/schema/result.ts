import { z } from "zod";
import { durationClasses } from "../connector/connector-kind.js";
import { quantities, unitSystems, type Quantity } from "../units/quantity.js";
import { quantity } from "./quantity.js";
import { supportConditions } from "../beam/beam-model.js";

export const RESULT_FORMAT = "stitchplan-result";
export const RESULT_VERSION = 1;

const q = (kind: Quantity) => quantity(kind);

/** A number of the given kind; null for a pure number that is never rescaled. */
const num = (kind: Quantity | null) => (kind ? quantity(kind) : z.number());

const byQuantity = <Shape extends z.ZodRawShape>(fields: (kind: Quantity | null) => Shape) =>
  z.discriminatedUnion("quantity", [
    z.object({ ...fields(null), quantity: z.literal("ratio") }),
    ...quantities.map((kind) => z.object({ ...fields(kind), quantity: z.literal(kind) })),
  ] as unknown as [z.ZodObject, ...z.ZodObject[]]);

const stepFields = (kind: Quantity | null) => ({ symbol: z.string(), description: z.string(), value: num(kind), reference: z.string().optional() });
/** One line of working; it carries its quantity kind, "ratio" for a pure number. */
const WorkingLineShape = z.object({ ...stepFields(null), quantity: z.enum(["ratio", ...quantities]) });
export type WorkingLine = z.infer<typeof WorkingLineShape>;
export const WorkingLine = byQuantity(stepFields) as unknown as z.ZodType<WorkingLine>;

const Extreme = (kind: Quantity) => z.object({ value: quantity(kind), x: q("span") });

export const SectionResult = z.object({
  referenceModulus: q("modulus"),
  area: q("area"),
  transformedArea: q("area"),
  centroidY: q("length"),
  secondMoment: q("secondMoment"),
  depth: q("length"),
  width: q("length"),
  bounds: z.object({ x0: q("length"), x1: q("length"), y0: q("length"), y1: q("length") }),
  firstMomentAtNeutralAxis: q("firstMoment"),
  widthAtNeutralAxis: q("length"),
  parts: z.array(
    z.object({
      id: z.string(),
      name: z.string(),
      material: z.string(),
      materialName: z.string(),
      modularRatio: z.number(),
      area: q("area"),
      rects: z.array(z.object({ x0: q("length"), x1: q("length"), y0: q("length"), y1: q("length") })),
      /** Distance from the neutral axis to the part's top and bottom fibres (bottom as a positive number). */
      topFibre: q("length"),
      bottomFibre: q("length"),
    }),
  ),
  /** τ per unit shear force over the depth: τ(y) = V·Q(y)/(I·t(y)). */
  stressProfile: z.array(z.object({ y: q("length"), firstMoment: q("firstMoment"), width: q("length"), factor: q("perArea") })),
  /** Elastic section modulus at the extreme fibres of each material, in that material: σ = M/S. */
  materialModuli: z.array(
    z.object({
      material: z.string(),
      name: z.string(),
      modularRatio: z.number(),
      /** Distance from the neutral axis to the material's top fibre (negative when below it) and bottom fibre (negative when above it). */
      topFibre: q("length"),
      bottomFibre: q("length"),
      topModulus: q("firstMoment").nullable(),
      bottomModulus: q("firstMoment").nullable(),
    }),
  ),
  /** The largest Q/(I·t) over the depth beside the simple forms a person checks it against. */
  shearStress: z.object({
    maxFactor: q("perArea"),
    atY: q("length"),
    /** 1.5/A for a section of one rectangle. */
    rectangleClosedForm: q("perArea").nullable(),
    /** 1/(d·t_w) (AISC 360 §G2.1 shear area) and 1/(h_w·t_w) for each I-shaped part. */
    webApproximations: z.array(z.object({ part: z.string(), label: z.string(), factor: q("perArea") })),
  }),
});

export const JointResult = z.object({
  id: z.string(),
  held: z.array(z.string()),
  found: z.boolean(),
  lines: z.array(
    z.object({
      between: z.tuple([z.string(), z.string()]),
      orientation: z.enum(["horizontal", "vertical"]),
      level: q("length"),
      from: q("length"),
      to: q("length"),
      length: q("length"),
    }),
  ),
  contactWidth: q("length"),
  firstMoment: q("firstMoment"),
  /** Q/I: shear flow per unit shear force. */
  flowFactor: q("perLength"),
  /** Q/(I·t): bond-line stress per unit shear force. */
  stressFactor: q("perArea"),
  connector: z.string(),
  connectorLabel: z.string(),
  mechanism: z.enum(["discrete", "bond-line", "weld"]),
  rows: z.number().int(),
  /** shear-flow: q = V·Q/I · side-load: force passed across a ply interface per length (side-by-side plies). */
  demand: z.enum(["shear-flow", "side-load"]),
  /** Where the joint runs along the member, when a part of it starts or stops (a cover plate); null: the whole member. */
  extent: z.object({ from: q("span"), to: q("span") }).nullable(),
  /** Q/I stretch by stretch, where the section changes along the member. */
  stretches: z.array(z.object({ from: q("span"), to: q("span"), firstMoment: q("firstMoment"), flowFactor: q("perLength") })),
  sharing: z.string(),
});
export type JointResult = z.infer<typeof JointResult>;

export const Combination = z.object({
  id: z.string(),
  name: z.string(),
  factors: z.record(z.string(), z.number()),
  /** Duration class of the shortest-duration load present (timber factors). */
  duration: z.enum(durationClasses),
  /** Load categories present in the job with a non-zero factor in this combination. */
  categories: z.array(z.string()),
  /** The categories in the principal load's role in the standard's form (ASCE/SEI 7-22 §2.3.1: the 1.6 load of combinations 2 and 3, 1.0W of 4 and 5), where it names one. */
  principal: z.array(z.string()).optional(),
  /** NDS LRFD time effect factor λ of the combination (NDS-2018 Table N3 [M]): that of its principal load, with the reading. */
  timeEffect: z.object({ value: z.number(), reason: z.string() }).optional(),
  /** For one live-load pattern of a combination: that combination's id. */
  base: z.string().optional(),
  /** For one live-load pattern: the spans (the job's numbering from 1) carrying the patterned loads. */
  pattern: z.array(z.number().int()).optional(),
});
export type Combination = z.infer<typeof Combination>;

export const BeamResult = z.object({
  length: q("span"),
  spans: z.array(q("span")),
  supports: z.array(z.object({ x: q("span"), type: z.enum(["pinned", "roller", "fixed"]) })),
  /** Condition at each span end, left to right. */
  ends: z.array(z.enum(supportConditions)),
  /** Spans between supports and overhangs beyond the end supports: where live load is patterned and deflection is measured. */
  regions: z.array(z.object({ x0: q("span"), x1: q("span"), kind: z.enum(["span", "overhang"]), spans: z.array(z.number().int()), label: z.string() })),
  /** Categories placed span by span in live-load patterns. */
  patterned: z.array(z.string()),
  selfWeight: q("lineLoad"),
  combinations: z.array(Combination),
  /** Combinations of the set left out because they cannot govern, each with the reason. */
  omitted: z.array(z.object({ id: z.string(), name: z.string(), reason: z.string() })).optional(),
  /** Stations along the member; a station repeats where V or M jumps (left value first). */
  stations: z.array(q("span")),
  perCombination: z.array(
    z.object({
      combination: z.string(),
      shear: z.array(q("force")),
      moment: z.array(q("moment")),
      /** Downward positive. */
      deflection: z.array(q("deflection")),
      /** Slope of the deflected member, radians, counter-clockwise positive. */
      rotation: z.array(z.number()),
      reactions: z.array(z.object({ x: q("span"), force: q("force"), moment: q("moment") })),
      maxShear: Extreme("force"),
      maxMoment: Extreme("moment"),
      minMoment: Extreme("moment"),
      maxDeflection: Extreme("deflection"),
    }),
  ),
  envelope: z.object({
    shearMax: z.array(q("force")),
    shearMin: z.array(q("force")),
    momentMax: z.array(q("moment")),
    momentMin: z.array(q("moment")),
    /** Combination whose |V| is largest at each station. */
    governingShear: z.array(z.string()),
    /** Combination that gives each envelope value at each station. */
    governing: z.object({
      shearMax: z.array(z.string()),
      shearMin: z.array(z.string()),
      momentMax: z.array(z.string()),
      momentMin: z.array(z.string()),
    }),
  }),
  /** Service-level cases the deflection checks use (empty when the loads were entered factored), with their deflection at the stations. */
  service: z.array(z.object({ combination: Combination, deflection: z.array(q("deflection")), maxDeflection: Extreme("deflection") })),
});
export type BeamResult = z.infer<typeof BeamResult>;

export const ConnectorResistanceResult = z.object({
  combination: z.string(),
  value: q("connectorForce"),
  governing: z.string(),
  reference: z.string(),
  steps: z.array(WorkingLine),
  /** Every failure mode or limit state evaluated, on the same basis as `value`. */
  modes: z.array(z.object({ mode: z.string(), value: q("connectorForce"), reference: z.string().optional() })).optional(),
  /** Slip moduli per connector and shear plane, where the method gives them (EN 1995-1-1 Table 7.1, or the user's rating). */
  slip: z.object({ serviceability: q("slipModulus"), ultimate: q("slipModulus"), reference: z.string() }).nullable().optional(),
  /** Conditions the value depends on that a reviewer must confirm. */
  warnings: z.array(z.string()).optional(),
});

export const Zone = z.object({
  from: q("span"),
  to: q("span"),
  spacing: q("length"),
  rows: z.number().int(),
  /** Connectors in the zone, all lines of the joint. */
  count: z.number().int(),
  /** Smallest required spacing inside the zone. */
  requiredSpacing: q("length").nullable(),
  utilisation: z.number(),
  governingCombination: z.string(),
  passes: z.boolean(),
  /** Combinations under which a row of this zone is over-utilised. */
  failingCombinations: z.array(z.string()),
  /** Why the zone is closer than the shear flow along it needs (the end row's reach, or a row where zones meet). */
  note: z.string().optional(),
});
export type Zone = z.infer<typeof Zone>;

export const Schedule = z.object({
  /** design: zones chosen by stitchplan · check: the schedule given in the job, checked. */
  mode: z.enum(["design", "check"]),
  joint: z.string(),
  connector: z.string(),
  connectorLabel: z.string(),
  rows: z.number().int(),
  lineCount: z.number().int(),
  resistance: z.array(ConnectorResistanceResult),
  limits: z.object({
    minSpacing: q("length"),
    maxSpacing: q("length"),
    endDistance: q("length"),
    module: q("length").nullable(),
    preferred: z.array(q("length")).nullable(),
    minZoneLength: q("length"),
    /** Least distance from a connector to an edge of a joined part, across the line. */
    edgeDistance: q("length").nullable().optional(),
    /** Least spacing of the connectors of one row, across the line. */
    rowSpacing: q("length").nullable().optional(),
    /** Penetration into the point-side member: least allowed and provided. */
    penetration: z.object({ required: q("length"), provided: q("length") }).nullable().optional(),
    sources: z.array(z.string()),
  }),
  zones: z.array(Zone),
  /** Positions of the rows along the member, from the left end; the same on every line. */
  positions: z.array(q("span")),
  count: z.number().int(),
  efficiency: z.object({
    /** Fewest connectors any schedule within the maximum spacing can have: ∫ max(max over combinations of q/R, n/s_max) dx, all lines. */
    lowerBound: z.number(),
    /** ∫ max over combinations of q/R dx, all lines (no spacing limit). */
    demandIntegral: z.number(),
    uniformSpacing: q("length").nullable(),
    uniformCount: z.number().int().nullable(),
    countOverLowerBound: z.number().nullable(),
    uniformOverCount: z.number().nullable(),
  }),
  verification: z.object({
    maxUtilisation: z.number(),
    at: q("span"),
    combination: z.string(),
    passes: z.boolean(),
    method: z.string(),
  }),
  /** The worst row under each combination on its own. */
  perCombination: z.array(z.object({ combination: z.string(), maxUtilisation: z.number(), at: q("span") })),
  /**
   * The connectors of one row side by side across the narrowest contact line: the width they need (two edge
   * distances and the spacings between them) and the width the line has. Absent when the connector gives
   * neither an edge distance nor, with more than one per row, a spacing across.
   */
  rowFit: z.object({ needed: q("length"), available: q("length"), between: z.tuple([z.string(), z.string()]), fits: z.boolean() }).nullable().optional(),
  /**
   * Where a row's connectors sit across the contact line, for the field sheet: offsets from a named edge
   * (one per connector of a row, increasing), the stagger along the member between alternate connectors
   * of successive rows (null when they stand in line) and the face they are driven from (null when either
   * face will do, as for a through bolt). Absent where the schedule has no discrete connectors to lay out.
   */
  layoutAcross: z
    .object({
      edge: z.string(),
      offsets: z.array(q("length")),
      stagger: q("length").nullable(),
      drivenFrom: z.string().nullable(),
    })
    .nullable()
    .optional(),
  /** Check mode: spacings of the given schedule outside the detailing limits. */
  detailingProblems: z.array(z.string()),
  passes: z.boolean(),
  infeasible: z
    .object({
      where: z.array(z.object({ from: q("span"), to: q("span") })),
      smallestRequired: q("length"),
      minSpacing: q("length"),
      /** What fails, where the flow alone would allow the minimum spacing (the end row's reach, a row where zones meet). */
      reason: z.string().optional(),
      options: z.array(z.string()),
      /** The remedies offered, each designed again with the change and passing: what changes and the utilisation it reaches. */
      remedies: z
        .array(
          z.object({
            change: z.enum(["rows", "size", "resistance"]),
            rows: z.number().int().optional(),
            size: z.string().optional(),
            resistanceFactor: z.number().optional(),
            utilisation: z.number(),
            count: z.number().int(),
          }),
        )
        .optional(),
    })
    .nullable(),
  /** Envelope of shear flow per line and required spacing at the beam stations. */
  shearFlow: z.array(q("shearFlow")),
  requiredSpacing: z.array(q("length").nullable()),
});
export type Schedule = z.infer<typeof Schedule>;

/** A weld joint: the continuous (or given intermittent) weld checked against the shear flow per line. */
export const WeldResult = z.object({
  mode: z.enum(["design", "check"]),
  joint: z.string(),
  connector: z.string(),
  connectorLabel: z.string(),
  /** Fillets per contact line (both sides of a web: 2). */
  fillets: z.number().int(),
  lineCount: z.number().int(),
  pattern: z.enum(["continuous", "intermittent"]),
  segmentLength: q("length").nullable(),
  pitch: q("length").nullable(),
  /** Intermittent segments on the two sides of a web: opposite each other (chain) or alternating (staggered). */
  arrangement: z.enum(["chain", "staggered"]),
  /** Resistance of one fillet per unit length of weld, per combination. */
  resistance: z.array(
    z.object({
      combination: z.string(),
      value: q("shearFlow"),
      governing: z.string(),
      reference: z.string(),
      steps: z.array(WorkingLine),
      modes: z.array(z.object({ mode: z.string(), value: q("shearFlow"), reference: z.string().optional() })).optional(),
      warnings: z.array(z.string()).optional(),
    }),
  ),
  limits: z.object({
    size: q("length"),
    minSize: q("length"),
    maxSize: q("length"),
    minSegmentLength: q("length"),
    maxPitch: q("length").nullable(),
    maxGap: q("length").nullable(),
    sources: z.array(z.string()),
  }),
  /** Zones along the member: continuous, or segments of a length at a pitch. */
  zones: z.array(
    z.object({
      from: q("span"),
      to: q("span"),
      pattern: z.enum(["continuous", "intermittent"]),
      segmentLength: q("length").nullable(),
      pitch: q("length").nullable(),
      utilisation: z.number(),
      passes: z.boolean(),
      failingCombinations: z.array(z.string()),
    }),
  ),
  /**
   * Centres of the weld segments along the member, as designed or checked, on each fillet (a staggered
   * weld's other side sits half the zone's pitch along); empty for a continuous weld.
   */
  positions: z.array(q("span")),
  /** Length of weld deposited, all fillets on all lines. */
  weldLength: q("span"),
  /** Where even a continuous weld of the given size fails: the leg size that would carry the flow. */
  sizeNeeded: q("length").nullable(),
  sizeNote: z.string().nullable(),
  /** Largest shear flow per line over the member and where, and the utilisation q/(fillets × R × segment/pitch). */
  maxShearFlow: q("shearFlow"),
  at: q("span"),
  combination: z.string(),
  utilisation: z.number(),
  passes: z.boolean(),
  /** Envelope of shear flow per line at the beam stations. */
  shearFlow: z.array(q("shearFlow")),
});
export type WeldResult = z.infer<typeof WeldResult>;

export const BondLineResult = z.object({
  joint: z.string(),
  connector: z.string(),
  connectorLabel: z.string(),
  width: q("length"),
  strength: z.array(z.object({ combination: z.string(), value: q("stress"), governing: z.string(), reference: z.string(), steps: z.array(WorkingLine) })),
  maxStress: q("stress"),
  at: q("span"),
  combination: z.string(),
  utilisation: z.number(),
  passes: z.boolean(),
  /** Largest bond-line stress over the combinations at each beam station. */
  stress: z.array(q("stress")),
});
export type BondLineResult = z.infer<typeof BondLineResult>;

const checkFields = (kind: Quantity | null) => ({
  id: z.string(),
  title: z.string(),
  demand: num(kind),
  capacity: num(kind),
  utilisation: z.number(),
  passes: z.boolean(),
  combination: z.string(),
  at: q("span").nullable(),
  reference: z.string(),
});
/** A member check; demand and capacity are in the unit of its quantity. */
const MemberCheckShape = z.object({ ...checkFields(null), quantity: z.enum(["ratio", ...quantities]) });
export type MemberCheck = z.infer<typeof MemberCheckShape>;
export const MemberCheck = byQuantity(checkFields) as unknown as z.ZodType<MemberCheck>;

/** A member standing as a built-up column: the rule, each axis's slenderness and stability factor, each combination's interaction, and its joints. */
export const ColumnResult = z.object({
  /** nds-15.3, en1995-annex-c, … (core/column/column-rules.ts). */
  rule: z.string(),
  title: z.string(),
  standard: z.string(),
  /** False where the section or its connectors fall outside the rule; `reason` says why and nothing is checked. */
  applies: z.boolean(),
  reason: z.string().nullable(),
  conditions: z.array(z.object({ condition: z.string(), met: z.boolean(), clause: z.string() })),
  height: q("span"),
  axes: z.array(
    z.object({
      /** Buckling about the section's x (horizontal) or y (vertical) axis. */
      axis: z.enum(["x", "y"]),
      K: z.number(),
      basis: z.string(),
      unbraced: q("span"),
      effectiveLength: q("span"),
      /** The dimension the slenderness is measured by (d of l_e/d), or the radius of gyration (EN: λ = l_e/i). */
      depth: q("length"),
      slenderness: z.number(),
      /** Buckling across the laminations' joints. */
      jointed: z.boolean(),
      /** NDS K_f (0.6 nailed, 0.75 bolted, 1 about the other axis); 1 for EN 1995-1-1. */
      factor: z.number(),
      /** E·I about the axis: effective (with slip) where jointed. */
      stiffness: q("flexuralRigidity"),
      /** Euler load π²·E·I/l_e² of the built-up section with that E·I. */
      euler: q("force"),
      /** C_P or k_c under the governing combination. */
      stability: z.number(),
    }),
  ),
  combinations: z.array(
    z.object({
      combination: z.string(),
      axial: q("force"),
      moment: q("moment"),
      /** F_c* (NDS) or f_c,0,d (EN 1995-1-1) for this combination. */
      strength: q("stress"),
      stability: z.number(),
      capacity: q("force"),
      /** The interaction of axial load and bending; null without bending. */
      interaction: z.number().nullable(),
    }),
  ),
  governing: z.string(),
  checks: z.array(MemberCheck),
  joints: z.array(
    z.object({
      joint: z.string(),
      rowsRequired: z.number().int().nullable(),
      rowsProvided: z.number().int(),
      /** The shear the column's imperfection puts on the connectors (EN 1995-1-1 eq. C.5), largest over the combinations, and its flow per contact line. */
      bucklingShear: q("force").nullable(),
      bucklingFlow: q("shearFlow").nullable(),
      /** What set the spacing: the rule's prescriptive spacing, the lateral load's shear flow, or the buckling shear. */
      governs: z.string(),
      notes: z.array(z.string()),
      sources: z.array(z.string()),
    }),
  ),
  steps: z.array(WorkingLine),
  notes: z.array(z.string()),
});
export type ColumnResult = z.infer<typeof ColumnResult>;

export const DesignResult = z.object({
  format: z.literal(RESULT_FORMAT),
  version: z.literal(RESULT_VERSION),
  program: z.object({ name: z.string(), version: z.string() }),
  units: z.enum(unitSystems),
  unitLabels: z.record(z.string(), z.string()),
  basis: z.enum(["allowable", "factored"]),
  mode: z.enum(["design", "check"]),
  project: z.object({ name: z.string(), number: z.string(), engineer: z.string(), client: z.string() }),
  member: z.object({ mark: z.string(), description: z.string(), revision: z.string(), date: z.string().optional() }),
  status: z.object({ passes: z.boolean(), summary: z.string(), failures: z.array(z.string()) }),
  section: SectionResult,
  /** Side-by-side plies (any depths, mid-depths at one level): each ply's share of a load by E·I, and the fraction of a unit load each interface passes, by the face it arrives on. */
  multiPly: z
    .object({
      /** bearsTopLoad: the ply reaches the top of the member, so loads on top bear on it (shallower plies, such as a flitch plate within the timber's depth, take theirs through the connectors). */
      plies: z.array(z.object({ part: z.string(), share: z.number(), bearsTopLoad: z.boolean() })),
      interfaces: z.array(z.object({ between: z.tuple([z.string(), z.string()]), joint: z.string().nullable(), fromLeftFace: z.number(), fromRightFace: z.number(), fromTop: z.number() })),
    })
    .nullable(),
  /** Rigid and slip-aware composite action side by side (EN 1995-1-1 Annex B), or why the γ-method does not apply. */
  composite: z
    .object({
      model: z.enum(["rigid", "slip-aware"]),
      applies: z.boolean(),
      reason: z.string().nullable(),
      effectiveLength: q("span").nullable(),
      effectiveLengthRule: z.string().nullable(),
      stiffness: z
        .object({
          rigid: q("flexuralRigidity"),
          serviceability: q("flexuralRigidity"),
          ultimate: q("flexuralRigidity"),
          final: q("flexuralRigidity").nullable(),
          noConnection: q("flexuralRigidity"),
        })
        .nullable(),
      /** Deflection with slip over deflection if rigid, (EI)_rigid/(EI)_ef with K_ser; and with the final stiffness. */
      deflectionFactor: z.number().nullable(),
      finalDeflectionFactor: z.number().nullable(),
      joints: z.array(
        z.object({
          joint: z.string(),
          flange: z.enum(["top", "bottom"]),
          serviceabilitySlip: q("slipModulus").nullable(),
          ultimateSlip: q("slipModulus").nullable(),
          shearPlanesPerRow: z.number().int(),
          /** The spacing in γ: s, or s_ef from s_min and s_max. */
          spacing: q("length"),
          minSpacing: q("length"),
          maxSpacing: q("length"),
          withinFourTimes: z.boolean(),
          gammaUltimate: z.number(),
          gammaServiceability: z.number(),
          /** q/V rigid (Q/I) and with slip (γ·E·A·a/(EI)_ef), per unit shear. */
          flowFactorRigid: q("perLength"),
          flowFactorSlip: q("perLength"),
          /** Connectors the rigid and the slip-aware schedules need. */
          rigidCount: z.number().int().nullable(),
          slipAwareCount: z.number().int().nullable(),
        }),
      ),
      iterations: z.number().int(),
      converged: z.boolean(),
      reference: z.string(),
    })
    .nullable(),
  /** The section stretch by stretch along the member, where parts start or stop; empty for a member of one section. */
  stretches: z.array(
    z.object({
      from: q("span"),
      to: q("span"),
      parts: z.array(z.string()),
      area: q("area"),
      centroidY: q("length"),
      secondMoment: q("secondMoment"),
    }),
  ),
  /** Ends of parts that stop short of the member's ends (cover plates): the force to develop and the connectors that do it. */
  terminations: z.array(
    z.object({
      joint: z.string(),
      part: z.string(),
      end: z.enum(["left", "right"]),
      /** Where the part ends. */
      at: q("span"),
      /** The theoretical cut-off: where the section without the part carries the moment; null when it does everywhere along the part, or the strengths are missing. */
      cutoff: q("span").nullable(),
      /** The part's force at the cut-off, M·Q_p/I of the full section. */
      force: q("force"),
      /** Length beyond the cut-off over which the connectors develop the force: as provided, and the least the rule requires (welds). */
      available: q("span"),
      required: q("span").nullable(),
      /** What the connectors within the available length carry. */
      capacity: q("force"),
      connectors: z.string(),
      /** Force over what the connectors there carry; null when none are there to carry it. */
      utilisation: z.number().nullable(),
      passes: z.boolean(),
      reference: z.string(),
      note: z.string(),
    }),
  ),
  joints: z.array(JointResult),
  /** The member as a built-up column, when the job gives axial compression. */
  column: ColumnResult.optional(),
  beam: BeamResult,
  schedules: z.array(Schedule),
  bondLines: z.array(BondLineResult),
  welds: z.array(WeldResult).default([]),
  checks: z.array(MemberCheck),
  notChecked: z.array(z.string()),
  assumptions: z.array(z.string()),
  standards: z.array(z.string()),
  warnings: z.array(z.string()),
  /** SHA-256 of the canonical job, the schema version and the program version; set by the service that ran the job. */
  fingerprint: z.string().optional(),
});
export type DesignResult = z.infer<typeof DesignResult>;

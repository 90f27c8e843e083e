import { z } from "zod";
import { Id, positive, Text } from "../schema/quantity.js";
import { formatNumber } from "../units/format.js";
import { doubleShearMembers, type ConnectorContext, type DiscreteConnectorKind, type PlacementProblem } from "./connector-kind.js";
import { MM_PER_IN, MPA_PER_PSI } from "./quantity-text.js";
import { dowelDetailing, dowelProblems, dowelResistance, type DowelSpec } from "./timber/dowel-joint.js";
import { dowelConditions, ec5StandardText, ndsStandardText, onSizeField, refineTimberStandard, timberAssumptions, timberDowelFields } from "./timber/dowel-schema.js";
import { ec5YieldMoment } from "./timber/ec5-embedment.js";
import { knownScrewGauges, screwGauge } from "./timber/fastener-sizes.js";
import { NDS_NAIL_FYB_RANGE_IN, ndsNailBendingYield } from "./timber/nds-dowel-bearing.js";
import { screwYieldDiameter, threadBearing } from "./timber/screw-yield-diameter.js";
import { exceeds } from "../units/limits.js";

export const WoodScrew = z
  .strictObject({
    id: Id,
    kind: z.literal("wood-screw"),
    ...timberDowelFields,
    /** Gauge ("#10"), giving the shank and root diameters; or give diameter and rootDiameter. */
    gauge: Text(12).optional(),
    /** Shank (outer thread) diameter. */
    diameter: positive("length").optional(),
    /** Root (inner thread) diameter. */
    rootDiameter: positive("length").optional(),
    length: positive("length"),
    /** Threaded length from the tip; when absent the threads are taken to cross the shear plane. */
    threadLength: positive("length").optional(),
    predrilled: z.boolean().default(true),
    bendingYieldStrength: positive("stress").optional(),
    /** EN 1995-1-1: tensile strength f_u of the screw steel, from its product declaration. */
    tensileStrength: positive("stress").optional(),
  })
  .superRefine((c, ctx) => {
    refineTimberStandard(c, ctx, ["bendingYieldStrength"], ["tensileStrength"]);
    if (c.gauge !== undefined) {
      if (c.diameter !== undefined) ctx.addIssue({ code: "custom", path: ["gauge"], message: "give either a gauge or a diameter, not both" });
      else if (!screwGauge(c.gauge)) ctx.addIssue({ code: "custom", path: ["gauge"], message: `"${c.gauge}" is not a wood screw gauge this program knows; known: ${knownScrewGauges().join(", ")}` });
    } else {
      if (c.diameter === undefined) ctx.addIssue({ code: "custom", path: ["diameter"], message: "is required when no gauge is given" });
      if (c.rootDiameter === undefined) ctx.addIssue({ code: "custom", path: ["rootDiameter"], message: "is required when no gauge is given" });
    }
    if (c.diameter !== undefined && c.rootDiameter !== undefined && c.rootDiameter >= c.diameter) ctx.addIssue({ code: "custom", path: ["rootDiameter"], message: "must be less than the shank diameter" });
    if (c.threadLength !== undefined && c.threadLength > c.length) ctx.addIssue({ code: "custom", path: ["threadLength"], message: "must not exceed the length" });
    if (c.standard === "EN1995-1-1" && c.tensileStrength === undefined) ctx.addIssue({ code: "custom", path: ["tensileStrength"], message: "EN 1995-1-1 needs the screw's tensile strength f_u (from its product declaration) for M_y,Rk" });
  });
export type WoodScrew = z.infer<typeof WoodScrew>;

function diameters(c: WoodScrew): { d: number; root: number; gauge: string | null } {
  const g = c.gauge !== undefined ? screwGauge(c.gauge) : null;
  if (g) return { d: g.diameterIn * MM_PER_IN, root: c.rootDiameter ?? g.rootDiameterIn * MM_PER_IN, gauge: g.name };
  return { d: c.diameter!, root: c.rootDiameter!, gauge: null };
}

function specOf(c: WoodScrew, context: ConnectorContext | undefined): DowelSpec {
  const { d, root } = diameters(c);
  // Depth of the shear plane nearest the point: in double shear past the thicker outer member (either face may take the head) and the central one.
  const roles = context && c.shear === "double" ? doubleShearMembers(context) : null;
  const sideThickness = roles ? Math.max(...roles.outer.map((m) => m.thickness)) + roles.central.thickness : context?.members[0].thickness ?? 0;
  const penetration = c.length - sideThickness;
  // Threads cross the shear plane unless the threaded length from the tip stays inside the point-side member.
  const threadsInPlane = c.threadLength === undefined || c.threadLength > penetration;
  const shankPenetration = penetration - (c.threadLength ?? penetration);
  const isNds = c.standard === "NDS-2018";
  // The member holding the threads: the point-side member in single shear; in double shear the far outer
  // member, past the central one: the thinner outer member when the roles are known (either face may take
  // the head), else one taken as thick as the head-side member (as the hand-built context reads).
  const mainThickness = context?.members[1].thickness ?? 0;
  const holding = roles
    ? { penetration, thickness: Math.min(...roles.outer.map((m) => m.thickness)) }
    : c.shear === "double"
      ? { penetration: penetration - mainThickness, thickness: sideThickness }
      : { penetration, thickness: context?.members[1].thickness ?? Infinity };
  const bearingLength = Math.max(0, Math.min(holding.penetration, holding.thickness));
  const threads = threadBearing({ penetration: holding.penetration, bearingLength, threadLength: c.threadLength });
  const { yieldDiameter, note } = screwYieldDiameter({ nds: isNds, shank: d, root, threadBearing: threads, bearingLength, threadsInPlane, shankPenetration });
  const conditions = dowelConditions(c, 1.0, "screws, at most 100 %");
  const fu = c.tensileStrength ?? 0;
  const My = ec5YieldMoment("round", fu, yieldDiameter);
  return {
    family: "screw",
    noun: "wood screw",
    standard: c.standard,
    diameter: d,
    yieldDiameter,
    yieldDiameterNote: note,
    length: c.length,
    tipLength: 0,
    shear: conditions.shear,
    predrilled: c.predrilled,
    minPenetration: isNds ? { multiple: 6, source: "NDS-2018 §12.1.5, least penetration 6D" } : { multiple: 6, source: "common practice after EN 1995-1-1 §8.3.1.2 [CP]" },
    angles: conditions.angles,
    bendingYield: c.bendingYieldStrength !== undefined
      ? { value: c.bendingYieldStrength, source: "given" }
      : tabulatedBendingYield(yieldDiameter),
    nds: conditions.nds,
    ec5: { ...conditions.ec5Conditions, yieldMoment: { value: My.value, source: `${My.formula} at d_ef, f_u = ${formatNumber(fu)} MPa` }, nailEmbedment: !exceeds(d, 6) },
    groupAction: conditions.groupAction,
  };
}

/** F_yb by the diameter bands of the NDS nail and screw tables at the diameter in the yield model; NaN outside them (problems() then asks for it). */
function tabulatedBendingYield(yieldDiameter: number): DowelSpec["bendingYield"] {
  const psi = ndsNailBendingYield(yieldDiameter / MM_PER_IN);
  return psi === null
    ? { value: NaN, source: "not tabulated for this diameter: give bendingYieldStrength" }
    : { value: psi * MPA_PER_PSI, source: "diameter bands of the NDS nail and screw tables, at the diameter in the yield model [M]" };
}

function describeScrew(c: WoodScrew): string {
  if (c.label) return c.label;
  const { d, gauge } = diameters(c);
  const inches = c.standard === "NDS-2018";
  const fmt = (mm: number) => formatNumber(inches ? mm / MM_PER_IN : mm);
  return `${gauge ?? fmt(d)} × ${fmt(c.length)} ${inches ? "in" : "mm"} wood screw, ${c.standard}${c.shear === "double" ? ", double shear" : ""}`;
}

/** Wood screws by the NDS-2018 yield limit equations or EN 1995-1-1 §8.7.1 (nail rules up to 6 mm, bolt rules above). */
export const woodScrewKind: DiscreteConnectorKind<WoodScrew> = {
  kind: "wood-screw",
  mechanism: "discrete",
  schema: WoodScrew,
  describe: describeScrew,
  standards: (c) => [c.standard === "NDS-2018" ? ndsStandardText : ec5StandardText],
  assumptions: (c) => [...timberAssumptions(describeScrew(c), c), `${describeScrew(c)}: installed in lead holes; ${c.threadLength === undefined ? "threads taken to cross the shear plane (no thread length given)" : "threads placed by the thread length given"}.`],
  problems: (c, context) => {
    const spec = specOf(c, context);
    const fyb: PlacementProblem[] = c.standard === "NDS-2018" && Number.isNaN(spec.bendingYield.value)
      ? [{ on: "connector", field: "bendingYieldStrength", message: `is needed: the ${formatNumber(spec.yieldDiameter / MM_PER_IN)} in diameter in the yield model is outside the diameters (${NDS_NAIL_FYB_RANGE_IN[0]} to ${NDS_NAIL_FYB_RANGE_IN[1]} in) for which the NDS tables give F_yb` }]
      : [];
    return [...fyb, ...onSizeField(dowelProblems(spec, context), c.gauge !== undefined ? "gauge" : null, ["diameter"])];
  },
  resistance: (c, context) => dowelResistance(specOf(c, context), context),
  detailing: (c, context) => dowelDetailing(specOf(c, context), context),
};

import { z } from "zod";
import { Id, positive, Text } from "../schema/quantity.js";
import { formatNumber } from "../units/format.js";
import type { ConnectorContext, DiscreteConnectorKind } from "./connector-kind.js";
import { MM_PER_IN, MPA_PER_PSI } from "./quantity-text.js";
import { dowelDetailing, dowelProblems, dowelResistance, type DowelSpec } from "./timber/dowel-joint.js";
import { dowelConditions, ec5StandardText, ndsStandardText, onSizeField, refineTimberStandard, timberAssumptions, timberDowelFields } from "./timber/dowel-schema.js";
import { ec5YieldMoment } from "./timber/ec5-embedment.js";
import { inchSize } from "./timber/fastener-sizes.js";
import { NDS_BOLT_BENDING_YIELD_PSI } from "./timber/nds-dowel-bearing.js";
import { metricBoltSize, propertyClasses } from "./steel/bolt-sizes.js";

export const TimberBolt = z
  .strictObject({
    id: Id,
    kind: z.literal("timber-bolt"),
    ...timberDowelFields,
    /** A bolt (with nut and washers) or a plain dowel. */
    type: z.enum(["bolt", "dowel"]).default("bolt"),
    /** Trade size: "3/4" (in) or "M16"; or give the diameter. */
    size: Text(20).optional(),
    diameter: positive("length").optional(),
    /** EN 1995-1-1: property class of the bolt ("4.6", "8.8"), giving f_u,k; or give tensileStrength. */
    grade: Text(10).optional(),
    /** EN 1995-1-1: tensile strength f_u,k of the bolt or dowel steel. */
    tensileStrength: positive("stress").optional(),
    /** NDS-2018: bending yield strength F_yb; 45 000 psi when absent. */
    bendingYieldStrength: positive("stress").optional(),
  })
  .superRefine((c, ctx) => {
    refineTimberStandard(c, ctx, ["bendingYieldStrength"], ["grade", "tensileStrength"]);
    if ((c.size === undefined) === (c.diameter === undefined)) ctx.addIssue({ code: "custom", path: [c.size === undefined ? "diameter" : "size"], message: "give either a size or a diameter" });
    else if (c.size !== undefined && boltDiameter(c.size) === null) ctx.addIssue({ code: "custom", path: ["size"], message: `"${c.size}" is not a bolt size: write "3/4" (inches) or "M16"` });
    if (c.standard === "EN1995-1-1") {
      if (c.grade === undefined && c.tensileStrength === undefined) ctx.addIssue({ code: "custom", path: ["grade"], message: `EN 1995-1-1 needs f_u,k for the yield moment: give a property class (${Object.keys(propertyClasses).join(", ")}) or tensileStrength` });
      if (c.grade !== undefined && c.tensileStrength !== undefined) ctx.addIssue({ code: "custom", path: ["tensileStrength"], message: "give either a grade or a tensile strength, not both" });
      if (c.grade !== undefined && !propertyClasses[c.grade]) ctx.addIssue({ code: "custom", path: ["grade"], message: `"${c.grade}" is not a property class this program knows; known: ${Object.keys(propertyClasses).join(", ")}` });
    }
  });
export type TimberBolt = z.infer<typeof TimberBolt>;

/** Diameter in mm from a trade size ("3/4", "M16"). */
function boltDiameter(size: string): number | null {
  const metric = metricBoltSize(size);
  if (metric) return metric.d;
  const inches = inchSize(size);
  return inches === null ? null : inches * MM_PER_IN;
}

export const diameterOf = (c: TimberBolt) => (c.size !== undefined ? boltDiameter(c.size)! : c.diameter!);

function specOf(c: TimberBolt): DowelSpec {
  const d = diameterOf(c);
  const isBolt = c.type === "bolt";
  const conditions = dowelConditions(c, isBolt ? 0.25 : 0, isBolt ? "bolts, at most 25 %" : "dowels, no rope effect");
  const fu = c.tensileStrength ?? (c.grade ? propertyClasses[c.grade]?.fub : undefined) ?? 400;
  const My = ec5YieldMoment("round", fu, d);
  return {
    family: isBolt ? "bolt" : "dowel",
    noun: c.type,
    standard: c.standard,
    diameter: d,
    yieldDiameter: d,
    yieldDiameterNote: null,
    length: null,
    tipLength: 0,
    shear: conditions.shear,
    predrilled: true,
    minPenetration: null,
    angles: conditions.angles,
    bendingYield: c.bendingYieldStrength !== undefined ? { value: c.bendingYieldStrength, source: "given" } : { value: NDS_BOLT_BENDING_YIELD_PSI * MPA_PER_PSI, source: "45 000 psi, the value behind the NDS bolt tables" },
    nds: conditions.nds,
    ec5: { ...conditions.ec5Conditions, yieldMoment: { value: My.value, source: `${My.formula}, f_u,k = ${formatNumber(fu)} MPa${c.grade ? ` (property class ${c.grade})` : ""}` }, nailEmbedment: false },
    groupAction: conditions.groupAction,
  };
}

function describeBolt(c: TimberBolt): string {
  if (c.label) return c.label;
  const d = diameterOf(c);
  const size = c.size !== undefined ? (metricBoltSize(c.size) ? c.size.trim().toUpperCase() : `${c.size.trim().replace(/\s*(in\.?|inch|")$/i, "")} in`) : c.standard === "NDS-2018" ? `${formatNumber(d / MM_PER_IN)} in` : `${formatNumber(d)} mm`;
  return `${size} ${c.type}${c.grade ? ` ${c.grade}` : ""} in timber, ${c.standard}${c.shear === "double" ? ", double shear" : ""}`;
}

/** Bolts and dowels through timber, panels or steel side plates, by the NDS-2018 or EN 1995-1-1. */
export const timberBoltKind: DiscreteConnectorKind<TimberBolt> = {
  kind: "timber-bolt",
  mechanism: "discrete",
  schema: TimberBolt,
  describe: describeBolt,
  standards: (c) => [c.standard === "NDS-2018" ? ndsStandardText : ec5StandardText],
  assumptions: (c) => [...timberAssumptions(describeBolt(c), c), `${describeBolt(c)}: holes bored to a close fit; the steel of a steel side plate is not checked in bearing under EN 1995-1-1 (check it to EN 1993-1-8).`],
  problems: (c, context: ConnectorContext) => onSizeField(dowelProblems(specOf(c), context), c.size !== undefined ? "size" : null, ["diameter"]),
  resistance: (c, context) => dowelResistance(specOf(c), context),
  detailing: (c, context) => dowelDetailing(specOf(c), context),
};

import { z } from "zod";
import { Id, nonNegative, positive, Text } from "../schema/quantity.js";
import { formatNumber } from "../units/format.js";
import type { ConnectorContext, DiscreteConnectorKind, PlacementProblem } from "./connector-kind.js";
import { MM_PER_IN, MPA_PER_PSI } from "./quantity-text.js";
import { dowelDetailing, dowelProblems, dowelResistance, type DowelSpec } from "./timber/dowel-joint.js";
import { dowelConditions, ec5StandardText, ndsStandardText, onSizeField, refineTimberStandard, timberAssumptions, timberDowelFields } from "./timber/dowel-schema.js";
import { ec5YieldMoment } from "./timber/ec5-embedment.js";
import { inchSize, lagScrewRoot, lagScrewTip } from "./timber/fastener-sizes.js";
import { ndsLagScrewBendingYield } from "./timber/nds-dowel-bearing.js";
import { screwYieldDiameter, threadBearing } from "./timber/screw-yield-diameter.js";
import { exceeds } from "../units/limits.js";

export const LagScrew = z
  .strictObject({
    id: Id,
    kind: z.literal("lag-screw"),
    ...timberDowelFields,
    /** Trade size in inches ("3/8"); or give the diameter. */
    size: Text(20).optional(),
    /** Shank diameter D. */
    diameter: positive("length").optional(),
    /** Root diameter D_r; from ASME B18.2.1 for the standard inch sizes when absent. */
    rootDiameter: positive("length").optional(),
    length: positive("length"),
    /** Threaded length from the point, tip included (T of NDS Appendix Table L2); when absent the threads are taken to cross the shear plane. */
    threadLength: positive("length").optional(),
    /** Length of the tapered tip E, not counted in the penetration; from NDS Appendix Table L2 for the standard inch sizes when absent. */
    tipLength: nonNegative("length").optional(),
    bendingYieldStrength: positive("stress").optional(),
    /** EN 1995-1-1: tensile strength f_u of the screw steel. */
    tensileStrength: positive("stress").optional(),
  })
  .superRefine((c, ctx) => {
    refineTimberStandard(c, ctx, ["bendingYieldStrength"], ["tensileStrength"]);
    if ((c.size === undefined) === (c.diameter === undefined)) ctx.addIssue({ code: "custom", path: [c.size === undefined ? "diameter" : "size"], message: "give either a size or a diameter" });
    else if (c.size !== undefined && inchSize(c.size) === null) ctx.addIssue({ code: "custom", path: ["size"], message: `"${c.size}" is not a size in inches such as "3/8" or "1/2"` });
    if (c.threadLength !== undefined && c.threadLength > c.length) ctx.addIssue({ code: "custom", path: ["threadLength"], message: "must not exceed the length" });
    if (c.standard === "EN1995-1-1" && c.tensileStrength === undefined) ctx.addIssue({ code: "custom", path: ["tensileStrength"], message: "EN 1995-1-1 needs the screw's tensile strength f_u for M_y,Rk" });
  });
export type LagScrew = z.infer<typeof LagScrew>;

const shankOf = (c: LagScrew) => (c.size !== undefined ? inchSize(c.size)! * MM_PER_IN : c.diameter!);

function rootOf(c: LagScrew): number | null {
  if (c.rootDiameter !== undefined) return c.rootDiameter;
  const r = lagScrewRoot(shankOf(c) / MM_PER_IN);
  return r === null ? null : r * MM_PER_IN;
}

/** Tip length E: given, or by size from NDS Appendix Table L2 [M]; null when neither. */
function tipOf(c: LagScrew): number | null {
  if (c.tipLength !== undefined) return c.tipLength;
  const e = lagScrewTip(shankOf(c) / MM_PER_IN);
  return e === null ? null : e * MM_PER_IN;
}

function specOf(c: LagScrew, context: ConnectorContext | undefined): DowelSpec {
  const d = shankOf(c);
  const root = rootOf(c) ?? d;
  const tip = tipOf(c) ?? 0;
  // Single shear: the threads are held by the point-side (main) member; the tip counts in neither the penetration nor ℓ_m.
  const penetration = c.length - (context?.members[0].thickness ?? 0) - tip;
  const mainThickness = context?.members[1].thickness ?? Infinity;
  const threads = c.threadLength === undefined ? undefined : c.threadLength - tip;
  const threadsInPlane = threads === undefined || threads > penetration;
  const shankPenetration = penetration - (threads ?? penetration);
  const isNds = c.standard === "NDS-2018";
  const bearingLength = Math.max(0, Math.min(penetration, mainThickness));
  const { yieldDiameter, note } = screwYieldDiameter({ nds: isNds, shank: d, root, threadBearing: threadBearing({ penetration, bearingLength, threadLength: threads }), bearingLength, threadsInPlane, shankPenetration });
  const conditions = dowelConditions(c, 1.0, "screws, at most 100 %");
  const fu = c.tensileStrength ?? 0;
  const My = ec5YieldMoment("round", fu, yieldDiameter);
  return {
    family: "lag-screw",
    noun: "lag screw",
    standard: c.standard,
    diameter: d,
    yieldDiameter,
    yieldDiameterNote: note,
    length: c.length,
    tipLength: tip,
    shear: "single",
    predrilled: true,
    minPenetration: isNds ? { multiple: 4, source: "NDS-2018 §12.1.4, least penetration 4D (tip excluded)" } : { multiple: 6, source: "common practice after EN 1995-1-1 §8.3.1.2 [CP]" },
    angles: conditions.angles,
    bendingYield: c.bendingYieldStrength !== undefined
      ? { value: c.bendingYieldStrength, source: "given" }
      : { value: ndsLagScrewBendingYield(d / MM_PER_IN) * MPA_PER_PSI, source: "NDS-2018 lag screw table footnote, by shank diameter [M]" },
    nds: conditions.nds,
    ec5: { ...conditions.ec5Conditions, yieldMoment: { value: My.value, source: `${My.formula} at d_ef, f_u = ${formatNumber(fu)} MPa` }, nailEmbedment: !exceeds(d, 6) },
    groupAction: conditions.groupAction,
  };
}

function describeLag(c: LagScrew): string {
  if (c.label) return c.label;
  const inches = c.standard === "NDS-2018";
  const fmt = (mm: number) => formatNumber(inches ? mm / MM_PER_IN : mm);
  const size = c.size !== undefined ? c.size.trim().replace(/\s*(in\.?|inch|")$/i, "") : fmt(shankOf(c));
  return `${size} × ${fmt(c.length)} ${inches ? "in" : "mm"} lag screw, ${c.standard}`;
}

/** Lag (coach) screws, single shear, by the NDS-2018 or EN 1995-1-1 §8.7.1 (bolt rules above 6 mm). */
export const lagScrewKind: DiscreteConnectorKind<LagScrew> = {
  kind: "lag-screw",
  mechanism: "discrete",
  schema: LagScrew,
  describe: describeLag,
  standards: (c) => [c.standard === "NDS-2018" ? ndsStandardText : ec5StandardText],
  assumptions: (c) => [
    ...timberAssumptions(describeLag(c), c),
    `${describeLag(c)}: installed in lead holes; ${c.threadLength === undefined ? "threads taken to cross the shear plane (no thread length given)" : "threads placed by the thread length given (measured from the tip, tip included)"}; the tapered tip (${c.tipLength === undefined ? "by size, NDS Appendix Table L2" : "as given"}) is not counted in the penetration or the bearing length.`,
  ],
  problems: (c, context) => {
    const out: PlacementProblem[] = [];
    if (c.shear === "double") out.push({ on: "connector", field: "shear", message: "lag screws are designed in single shear only" });
    if (rootOf(c) === null) out.push({ on: "connector", field: "rootDiameter", message: `is needed: ${formatNumber(shankOf(c) / MM_PER_IN)} in is not a standard lag screw size with a tabulated root diameter` });
    if (tipOf(c) === null) out.push({ on: "connector", field: "tipLength", message: `is needed: ${formatNumber(shankOf(c) / MM_PER_IN)} in is not a standard lag screw size with a tabulated tip length (NDS Appendix Table L2)` });
    return [...out, ...onSizeField(dowelProblems(specOf(c, context), context), c.size !== undefined ? "size" : null, ["diameter"])];
  },
  resistance: (c, context) => dowelResistance(specOf(c, context), context),
  detailing: (c, context) => dowelDetailing(specOf(c, context), context),
};

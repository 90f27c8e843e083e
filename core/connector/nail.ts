import { z } from "zod";
import { Id, positive, Text } from "../schema/quantity.js";
import { formatNumber } from "../units/format.js";
import type { DiscreteConnectorKind, PlacementProblem } from "./connector-kind.js";
import { MM_PER_IN, MPA_PER_PSI } from "./quantity-text.js";
import { dowelDetailing, dowelProblems, dowelResistance, type DowelSpec } from "./timber/dowel-joint.js";
import { dowelConditions, ec5StandardText, ndsStandardText, onSizeField, refineTimberStandard, timberAssumptions, timberDowelFields } from "./timber/dowel-schema.js";
import { ec5YieldMoment } from "./timber/ec5-embedment.js";
import { knownNailSizes, largerNailSizes, nailSize } from "./timber/fastener-sizes.js";
import { NDS_NAIL_FYB_RANGE_IN, ndsNailBendingYield } from "./timber/nds-dowel-bearing.js";

export const Nail = z
  .strictObject({
    id: Id,
    kind: z.literal("nail"),
    ...timberDowelFields,
    /** Pennyweight name of a common, box or sinker nail ("16d common"); or give diameter and length. */
    size: Text(40).optional(),
    diameter: positive("length").optional(),
    length: positive("length").optional(),
    /** Shank: smooth round, square or grooved, or threaded (ring or helical). */
    shank: z.enum(["smooth", "square", "threaded"]).default("smooth"),
    predrilled: z.boolean().default(false),
    /** NDS-2018: nail driven as a toe-nail (C_tn). */
    toeNailed: z.boolean().optional(),
    /** NDS-2018: bending yield strength F_yb, when not the value for the diameter. */
    bendingYieldStrength: positive("stress").optional(),
    /** EN 1995-1-1: tensile strength f_u of the nail wire; 600 MPa when absent. */
    tensileStrength: positive("stress").optional(),
  })
  .superRefine((c, ctx) => {
    refineTimberStandard(c, ctx, ["toeNailed", "bendingYieldStrength"], ["tensileStrength"]);
    if (c.size !== undefined) {
      if (c.diameter !== undefined || c.length !== undefined) ctx.addIssue({ code: "custom", path: ["size"], message: "give either a size or a diameter and a length, not both" });
      else if (!nailSize(c.size)) ctx.addIssue({ code: "custom", path: ["size"], message: `"${c.size}" is not a nail size this program knows; known: ${knownNailSizes().join(", ")}; or give diameter and length` });
    } else {
      if (c.diameter === undefined) ctx.addIssue({ code: "custom", path: ["diameter"], message: "is required when no size is given" });
      if (c.length === undefined) ctx.addIssue({ code: "custom", path: ["length"], message: "is required when no size is given" });
      if (c.diameter !== undefined && c.length !== undefined && c.length <= c.diameter) ctx.addIssue({ code: "custom", path: ["length"], message: "must be longer than the diameter" });
    }
  });
export type Nail = z.infer<typeof Nail>;

/** Diameter and length in core units (mm), from the size or the fields. */
export function dimensions(c: Nail): { diameter: number; length: number; sizeName: string | null } {
  const size = c.size !== undefined ? nailSize(c.size) : null;
  if (size) return { diameter: size.diameterIn * MM_PER_IN, length: size.lengthIn * MM_PER_IN, sizeName: size.name };
  return { diameter: c.diameter!, length: c.length!, sizeName: null };
}

const ropeCaps = { smooth: [0.15, "round nails, at most 15 %"], square: [0.25, "square or grooved nails, at most 25 %"], threaded: [0.5, "other nails, at most 50 %"] } as const;

function specOf(c: Nail): DowelSpec {
  const { diameter, length } = dimensions(c);
  const conditions = dowelConditions(c, ropeCaps[c.shank][0], ropeCaps[c.shank][1], c.toeNailed ?? false);
  const fu = c.tensileStrength ?? 600;
  const My = ec5YieldMoment(c.shank === "square" ? "square" : "round", fu, diameter);
  const isNds = c.standard === "NDS-2018";
  return {
    family: "nail",
    noun: "nail",
    standard: c.standard,
    diameter,
    yieldDiameter: diameter,
    yieldDiameterNote: null,
    length,
    tipLength: 0,
    shear: conditions.shear,
    predrilled: c.predrilled,
    minPenetration: isNds
      ? { multiple: 6, source: "NDS-2018 §12.1.6, least penetration 6D" }
      : c.shank === "smooth"
        ? { multiple: 8, source: "EN 1995-1-1 §8.3.1.2, smooth nails: pointside penetration at least 8d" }
        : { multiple: 6, source: "EN 1995-1-1 §8.3.1.2, other nails: pointside penetration at least 6d" },
    angles: conditions.angles,
    bendingYield: c.bendingYieldStrength !== undefined
      ? { value: c.bendingYieldStrength, source: "given" }
      : tabulatedBendingYield(diameter),
    nds: conditions.nds,
    ec5: {
      ...conditions.ec5Conditions,
      yieldMoment: { value: My.value, source: `${My.formula}, f_u = ${formatNumber(fu)} MPa${c.tensileStrength === undefined ? " (EN 14592 minimum, common practice)" : ""}` },
      nailEmbedment: true,
    },
    groupAction: conditions.groupAction,
  };
}

/** F_yb by the diameter bands of the NDS nail tables; NaN outside them (problems() then asks for it). */
function tabulatedBendingYield(diameter: number): DowelSpec["bendingYield"] {
  const psi = ndsNailBendingYield(diameter / MM_PER_IN);
  return psi === null
    ? { value: NaN, source: "not tabulated for this diameter: give bendingYieldStrength" }
    : { value: psi * MPA_PER_PSI, source: "NDS-2018 nail tables' footnotes, by diameter [M]" };
}

/** NDS-2018: a nail outside the diameters of the F_yb footnotes needs its F_yb given, not assumed. */
function bendingYieldProblems(c: Nail): PlacementProblem[] {
  if (c.standard !== "NDS-2018" || c.bendingYieldStrength !== undefined) return [];
  const d = dimensions(c).diameter / MM_PER_IN;
  if (ndsNailBendingYield(d) !== null) return [];
  const [lo, hi] = NDS_NAIL_FYB_RANGE_IN;
  return [{ on: "connector", field: "bendingYieldStrength", message: `is needed: a ${formatNumber(d)} in nail is outside the diameters (${lo} to ${hi} in) for which the NDS nail tables give F_yb; give the nail's bending yield strength (ASTM F1575)` }];
}

/** Trade description: "16d common nail", "0.131 × 3 in nail", "3.1 × 75 mm nail", with the standard. */
function describeNail(c: Nail): string {
  if (c.label) return c.label;
  const { diameter, length, sizeName } = dimensions(c);
  const inches = c.standard === "NDS-2018";
  const fmt = (mm: number) => formatNumber(inches ? mm / MM_PER_IN : mm);
  const body = sizeName
    ? `${sizeName} nail (${formatNumber(diameter / MM_PER_IN)} × ${formatNumber(length / MM_PER_IN)} in)`
    : `${fmt(diameter)} × ${fmt(length)} ${inches ? "in" : "mm"} ${c.shank === "smooth" ? "" : `${c.shank} `}nail`;
  return `${body}, ${c.standard}${c.shear === "double" ? ", double shear" : ""}`;
}

/** Nails by the NDS-2018 yield limit equations or the EN 1995-1-1 Johansen equations. */
export const nailKind: DiscreteConnectorKind<Nail> = {
  kind: "nail",
  largerSizes: (c) => (c.size !== undefined ? largerNailSizes(c.size).map((size) => ({ ...c, size, label: undefined })) : []),
  mechanism: "discrete",
  schema: Nail,
  describe: describeNail,
  standards: (c) => [c.standard === "NDS-2018" ? ndsStandardText : ec5StandardText],
  assumptions: (c) => timberAssumptions(describeNail(c), c),
  problems: (c, context) => [...bendingYieldProblems(c), ...onSizeField(dowelProblems(specOf(c), context), c.size !== undefined ? "size" : null)],
  resistance: (c, context) => dowelResistance(specOf(c), context),
  detailing: (c, context) => dowelDetailing(specOf(c), context),
};

import { z } from "zod";
import { Id, Text, nonNegative, positive, quantity } from "./quantity.js";

/**
 * End conditions of a column about one axis and the recommended effective-length factor K_e of each
 * (NDS-2018 Appendix G, Table G1 [M]; the same figures are the usual recommended design values under
 * EN 1995-1-1, which gives none of its own [CP]).
 */
export const columnEnds = {
  "pinned-pinned": 1.0,
  "fixed-fixed": 0.65,
  "fixed-pinned": 0.8,
  "fixed-guided": 1.2,
  "fixed-free": 2.1,
  "pinned-guided": 2.4,
} as const;
export type ColumnEnds = keyof typeof columnEnds;

/** An axial load at the top of the column (the member's right end), compression positive. */
export const AxialLoad = z.strictObject({
  /** A built-in category or one of `beam.categories`: it joins the same combinations as the beam loads. */
  category: Id.default("dead"),
  label: Text(60).default(""),
  P: nonNegative("force"),
  /**
   * Distance from the section's centroid, in the plane of the beam loads (up positive): the load then
   * adds a moment P·e at the top, falling linearly to nothing at the base. None when absent.
   */
  eccentricity: quantity("length").optional(),
});
export type AxialLoad = z.infer<typeof AxialLoad>;

/** How the column is held against buckling about one axis of the section. */
export const BucklingAxis = z.strictObject({
  /** End conditions; pinned at both ends when neither this nor K is given. */
  ends: z.enum(Object.keys(columnEnds) as [ColumnEnds, ...ColumnEnds[]]).optional(),
  /** Effective-length factor K_e, in place of the one the ends give. */
  K: z.number().positive().optional(),
  /** Points where the column is braced against buckling about this axis, measured from its base. */
  bracedAt: z.array(positive("span")).max(20, "at most 20 brace points").default([]),
});
export type BucklingAxis = z.infer<typeof BucklingAxis>;

export const builtUpRules = ["auto", "nds-15.3", "en1995-annex-c", "en1995-c3-spaced", "aisc-e6", "en1993-6.4"] as const;

/**
 * EN 1995-1-1 Annex C.3: a spaced column, its shafts held apart by packs or gussets at a spacing. The
 * packs (or gussets) are parts of the section listed in `packing`, modelled over the whole length; the
 * connectors of each pack are those of the packing's joints within one pack length.
 */
export const SpacedColumn = z.strictObject({
  /** Packs between the shafts, or gussets on their faces (Table C.1, C.3.1 [M]). */
  kind: z.enum(["packs", "gussets"]).default("packs"),
  /** l_1: distance between the packs' centres along the column (bays), the end packs at the column's ends. */
  packSpacing: positive("span"),
  /** l_2: length of one pack (or gusset) along the column. */
  packLength: positive("length"),
});
export type SpacedColumn = z.infer<typeof SpacedColumn>;

/**
 * Axial compression on the member, which then stands as a column: its height is the member's length
 * (the base at the left end), lateral loads (wind on a stud pack) stay the beam loads.
 */
export const Compression = z.strictObject({
  loads: z.array(AxialLoad).min(1, "needs at least one axial load").max(40, "at most 40 axial loads"),
  /** Buckling about the section's x axis (horizontal; the axis the beam loads bend about). */
  x: BucklingAxis.default({ bracedAt: [] }),
  /** Buckling about the section's y axis (vertical). */
  y: BucklingAxis.default({ bracedAt: [] }),
  /** The built-up column rule: "auto" picks it from the materials, the connectors and the basis. */
  rule: z.enum(builtUpRules).default("auto"),
  /** Steel: parts that only fill the gap between the components (gusset, packing plates): left out of the column's A, I and r. */
  packing: z.array(Id).max(10, "at most 10 packing parts").default([]),
  /** EN 1995-1-1 Annex C.3: the shafts are held apart by the `packing` parts at a spacing (a spaced column). */
  spaced: SpacedColumn.optional(),
  /** EN 1995-1-1: service class (§2.3.1.3) for k_mod, 1 when absent. */
  serviceClass: z.union([z.literal(1), z.literal(2), z.literal(3)]).default(1),
  /** EN 1995-1-1: γ_M of the timber (Table 2.3: 1.3 solid timber, 1.25 glulam [M]); that of the material's family when absent. */
  gammaM: z.number().positive().optional(),
});
export type Compression = z.infer<typeof Compression>;

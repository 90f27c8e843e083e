import { z } from "zod";
import { Text, positive } from "./quantity.js";

export const Rectangle = z.strictObject({
  type: z.literal("rectangle"),
  /** Width across the member. */
  b: positive("length"),
  /** Depth. */
  h: positive("length"),
});

/** US sawn lumber by nominal size, dressed to PS 20 sizes. */
export const Lumber = z.strictObject({
  type: z.literal("lumber"),
  /** Nominal size such as "2x10" (thickness x width, inches). */
  nominal: z.string().regex(/^\d{1,2}x\d{1,2}$/, 'must be a nominal size such as "2x10"'),
  /** "edge": the wide face vertical (a joist); "flat": the wide face horizontal (a flange). */
  orientation: z.enum(["edge", "flat"]).default("edge"),
});

/** I-shape, rolled or welded, with equal or unequal flanges; root fillets are ignored. */
export const ISection = z
  .strictObject({
    type: z.literal("i-section"),
    designation: Text(40).default(""),
    /** Overall depth. */
    d: positive("length"),
    tw: positive("length"),
    /** Top flange width and thickness. */
    bf: positive("length"),
    tf: positive("length"),
    /** Bottom flange, when it differs from the top one. */
    bfBottom: positive("length").optional(),
    tfBottom: positive("length").optional(),
  })
  .superRefine((s, ctx) => {
    if (s.tf + (s.tfBottom ?? s.tf) >= s.d) ctx.addIssue({ code: "custom", path: ["d"], message: "must exceed the two flange thicknesses together" });
    if (s.tw > Math.min(s.bf, s.bfBottom ?? s.bf)) ctx.addIssue({ code: "custom", path: ["tw"], message: "must not be wider than a flange" });
  });

/** Channel; `toes` says which way the flanges point. Root fillets are ignored. */
export const Channel = z
  .strictObject({
    type: z.literal("channel"),
    designation: Text(40).default(""),
    d: positive("length"),
    bf: positive("length"),
    tf: positive("length"),
    tw: positive("length"),
    toes: z.enum(["right", "left"]).default("right"),
  })
  .superRefine((s, ctx) => {
    if (2 * s.tf >= s.d) ctx.addIssue({ code: "custom", path: ["d"], message: "must exceed the two flange thicknesses together" });
    if (s.tw >= s.bf) ctx.addIssue({ code: "custom", path: ["tw"], message: "must be less than the flange width" });
  });

/** Tee (a split I or a welded tee); `flange` says whether the flange is at the top or the bottom. */
export const Tee = z
  .strictObject({
    type: z.literal("tee"),
    designation: Text(40).default(""),
    d: positive("length"),
    bf: positive("length"),
    tf: positive("length"),
    tw: positive("length"),
    flange: z.enum(["top", "bottom"]).default("top"),
  })
  .superRefine((s, ctx) => {
    if (s.tf >= s.d) ctx.addIssue({ code: "custom", path: ["d"], message: "must exceed the flange thickness" });
    if (s.tw > s.bf) ctx.addIssue({ code: "custom", path: ["tw"], message: "must not be wider than the flange" });
  });

/** Rectangular hollow section of uniform wall thickness; corner radii are ignored. */
export const HollowRectangle = z
  .strictObject({
    type: z.literal("hollow-rectangle"),
    designation: Text(40).default(""),
    b: positive("length"),
    h: positive("length"),
    t: positive("length"),
  })
  .superRefine((s, ctx) => {
    if (2 * s.t >= Math.min(s.b, s.h)) ctx.addIssue({ code: "custom", path: ["t"], message: "must be less than half of the smaller outside dimension" });
  });

/**
 * Angle (L) of leg lengths d (vertical) and b (horizontal), thickness t; `heel` is the corner where
 * the legs meet. Root fillets and toe rounding are ignored. Two angles back to back: the vertical
 * legs are the backs, each angle's heel towards the other (bottom-right, then bottom-left).
 */
export const Angle = z
  .strictObject({
    type: z.literal("angle"),
    designation: Text(40).default(""),
    d: positive("length"),
    b: positive("length"),
    t: positive("length"),
    heel: z.enum(["bottom-left", "bottom-right", "top-left", "top-right"]).default("bottom-left"),
  })
  .superRefine((s, ctx) => {
    if (s.t >= Math.min(s.b, s.d)) ctx.addIssue({ code: "custom", path: ["t"], message: "must be less than either leg" });
  });

export const Shape = z.discriminatedUnion("type", [Rectangle, Lumber, ISection, Channel, Tee, HollowRectangle, Angle]);
export type Shape = z.infer<typeof Shape>;

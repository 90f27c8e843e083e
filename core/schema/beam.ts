import { z } from "zod";
import { supportConditions } from "../beam/beam-model.js";
import { Id, Text, nonNegative, positive, quantity } from "./quantity.js";

/** The built-in load categories; a job may add its own in `beam.categories`. Wind acts in the direction of gravity when positive. */
export const loadCategories = ["dead", "live", "roof-live", "snow", "wind"] as const;
export const LoadCategory = z.enum(loadCategories);
export type LoadCategory = z.infer<typeof LoadCategory>;

/** Load-duration classes of EN 1995-1-1 §2.3.1.2, shortest last. */
export const loadDurations = ["permanent", "long", "medium", "short", "instantaneous"] as const;

/** A built-in category or the id of one of `beam.categories` (checked across fields). */
const CategoryName = Id;

const loadFields = {
  category: CategoryName.default("dead"),
  label: Text(60).default(""),
};

/**
 * Where a load arrives on a member of side-by-side plies: on top of every ply, or hung on the left or
 * right face (joists on one side), so that connectors must pass it across the plies.
 */
const face = z.enum(["top", "left", "right"]).default("top");

export const UniformLoad = z.strictObject({
  type: z.literal("uniform"),
  ...loadFields,
  face,
  /** Intensity, downward positive. */
  w: quantity("lineLoad"),
  /** Start of the loaded length from the left end of the member; the left end if absent. */
  from: nonNegative("span").optional(),
  /** End of the loaded length; the right end if absent. */
  to: nonNegative("span").optional(),
});

/** A line load varying linearly (a trapezoid or triangle) from wStart at `from` to wEnd at `to`. */
export const LinearLoad = z.strictObject({
  type: z.literal("linear"),
  ...loadFields,
  face,
  /** Intensity at the start of the loaded length, downward positive. */
  wStart: quantity("lineLoad"),
  /** Intensity at the end of the loaded length, downward positive. */
  wEnd: quantity("lineLoad"),
  from: nonNegative("span").optional(),
  to: nonNegative("span").optional(),
});

export const PointLoad = z.strictObject({
  type: z.literal("point"),
  ...loadFields,
  face,
  /** Force, downward positive. */
  P: quantity("force"),
  /** Position from the left end of the member. */
  at: nonNegative("span"),
});

/** An applied couple, clockwise positive as drawn with x to the right (it raises the sagging moment to its right). */
export const MomentLoad = z.strictObject({
  type: z.literal("moment"),
  ...loadFields,
  M: quantity("moment"),
  at: nonNegative("span"),
});

export const Load = z.discriminatedUnion("type", [UniformLoad, LinearLoad, PointLoad, MomentLoad]);
export type Load = z.infer<typeof Load>;

/** A load category the job names itself: it takes the factors of `actsAs` in the built-in combination sets. */
export const UserLoadCategory = z.strictObject({
  id: Id,
  name: Text(60).default(""),
  actsAs: LoadCategory,
  /** Load-duration class; that of `actsAs` when absent. */
  duration: z.enum(loadDurations).optional(),
  /** ψ0 for EN 1990 combinations; that of `actsAs` when absent. */
  psi0: z.number().min(0).max(1).optional(),
});
export type UserLoadCategory = z.infer<typeof UserLoadCategory>;

export const SupportCondition = z.enum(supportConditions);

export const DeflectionLimits = z.strictObject({
  /** Limit under every load (service level) as span ÷ this ratio. */
  total: z.number().positive().default(240),
  /** Limit under the live-type loads alone as span ÷ this ratio. */
  live: z.number().positive().default(360),
  /** The categories the live limit applies to, acting together. */
  liveCategories: z.array(CategoryName).min(1, "needs at least one category").max(12).default(["live"]),
});

export const Beam = z.strictObject({
  /** Span lengths left to right; an overhang or a cantilever is a span with a free end. */
  spans: z.array(positive("span")).min(1, "needs at least one span").max(12, "at most 12 spans"),
  /** What holds each span end, left to right (one more than the spans); pinned at the left and rollers elsewhere when absent. */
  supports: z.array(SupportCondition).optional(),
  loads: z.array(Load).max(200, "at most 200 loads"),
  /** Adds the parts' own weight as a dead load. */
  selfWeight: z.boolean().default(true),
  /** Length of each support's bearing along the member, for bearing perpendicular to the grain; 3 in (76.2 mm) when absent. */
  bearingLength: positive("length").optional(),
  categories: z.array(UserLoadCategory).max(8, "at most 8 categories of your own").default([]),
  /**
   * EN 1995-1-1 load-duration class of wind (and of categories acting as wind without a duration of their
   * own): short-term when absent. Table 2.2 [M] lists wind under short-term or instantaneous; the
   * national annex decides.
   */
  windDuration: z.enum(["short", "instantaneous"]).optional(),
  /** Categories placed span by span in the patterns that give the largest actions, where there is more than one span. */
  patternedCategories: z.array(CategoryName).max(13).default(["live"]),
  deflectionLimits: DeflectionLimits.default({ total: 240, live: 360, liveCategories: ["live"] }),
});
export type Beam = z.infer<typeof Beam>;

export const combinationSets = ["unfactored", "asce7-22-strength", "asce7-22-allowable", "en1990-6.10", "custom"] as const;
export type CombinationSet = (typeof combinationSets)[number];

export const CustomCombination = z.strictObject({
  id: Id,
  name: Text(80).default(""),
  /** Factor by load category; categories left out take 0. */
  factors: z.record(z.string(), z.number().min(0).max(10)),
  /** Load-duration class; the shortest of the categories present when absent. */
  duration: z.enum(loadDurations).optional(),
});
export type CustomCombination = z.infer<typeof CustomCombination>;

export const CombinationSettings = z.strictObject({
  set: z.enum(combinationSets).default("unfactored"),
  /** EN 1990: ψ0 by category, replacing the defaults this program states. */
  psi0: z.record(z.string(), z.number().min(0).max(1)).optional(),
  /** The combinations when `set` is "custom". */
  custom: z.array(CustomCombination).max(40, "at most 40 combinations").optional(),
});
export type CombinationSettings = z.infer<typeof CombinationSettings>;

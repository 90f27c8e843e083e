import type { UnitSystem } from "../../../core/units/quantity.js";

type Item = Record<string, unknown>;

export const shapeNames: Record<string, string> = {
  rectangle: "rectangle (plank, plate, panel)",
  lumber: "sawn lumber, nominal size",
  "i-section": "I-section",
  channel: "channel",
  tee: "tee",
  "hollow-rectangle": "rectangular hollow section",
  angle: "angle (L)",
};

/** A starting shape of each type in the job's units; invented round sizes, not catalogue sections. */
export function shapePreset(type: string, units: UnitSystem): Item {
  const us = units === "us";
  switch (type) {
    case "rectangle":
      return us ? { type, b: 1.5, h: 9.25 } : { type, b: 45, h: 195 };
    case "lumber":
      return { type, nominal: "2x10", orientation: "edge" };
    case "i-section":
      return us ? { type, d: 12, tw: 0.25, bf: 6.5, tf: 0.4 } : { type, d: 300, tw: 7, bf: 150, tf: 11 };
    case "channel":
      return us ? { type, d: 8, bf: 2.5, tf: 0.4, tw: 0.3, toes: "right" } : { type, d: 200, bf: 75, tf: 11, tw: 8.5, toes: "right" };
    case "tee":
      return us ? { type, d: 6, bf: 6, tf: 0.4, tw: 0.3, flange: "top" } : { type, d: 150, bf: 150, tf: 10, tw: 7, flange: "top" };
    case "hollow-rectangle":
      return us ? { type, b: 4, h: 8, t: 0.25 } : { type, b: 100, h: 200, t: 6 };
    case "angle":
      return us ? { type, d: 4, b: 3.5, t: 0.375, heel: "bottom-left" } : { type, d: 100, b: 90, t: 10, heel: "bottom-left" };
    default:
      return { type };
  }
}

const depthKeys = ["h", "d"];
const widthKeys = ["b", "bf"];

/** The part's shape as another type: the new type's starting values, with the old overall depth and width carried over where both have them. */
export function asShapeType(shape: Item, type: string, units: UnitSystem): Item {
  const next = shapePreset(type, units);
  const depth = depthKeys.map((k) => shape[k]).find((v) => typeof v === "number");
  const width = widthKeys.map((k) => shape[k]).find((v) => typeof v === "number");
  const nextDepth = depthKeys.find((k) => k in next);
  const nextWidth = widthKeys.find((k) => k in next);
  if (depth !== undefined && nextDepth) next[nextDepth] = depth;
  if (width !== undefined && nextWidth) next[nextWidth] = width;
  return next;
}

import type { BuilderDimensions } from "./builder-dimensions.js";
import { lineTo, moveTo, palette, type Drawing, type DrawItem } from "./drawing.js";
import type { FieldJoint } from "./field-layout.js";
import { jointStrip } from "./joint-strip.js";
import { memberElevation, type AlongMember, type MemberElevationInput } from "./member-elevation.js";

export interface FieldElevationInput extends MemberElevationInput {
  length: number;
  joints: FieldJoint[];
}

const SIDE = 14;
const BETWEEN = 10;

/**
 * The member in elevation for the builder, with one strip per joint under it on the same scale:
 * supports, point loads, spans and every zone, spacing, row and end distance along the member.
 * Positions are measured from END A, the left end as drawn.
 */
export function fieldElevation(input: FieldElevationInput, options: { width: number }): Drawing {
  const along: AlongMember = { left: SIDE, right: options.width - SIDE, length: input.length };
  const items: DrawItem[] = [];
  const member = memberElevation(input, along, 0);
  items.push(...member.items);
  let y = member.height + BETWEEN;
  const marks = { supports: input.supports, pointLoads: [...new Set(input.pointLoads.map((p) => p.at))] };
  input.joints.forEach((j, i) => {
    if (i > 0) {
      items.push({ type: "path", d: `${moveTo(along.left, y - BETWEEN / 2)}${lineTo(along.right, y - BETWEEN / 2)}`, stroke: palette.grid, strokeWidth: 0.8 });
    }
    const strip = jointStrip(j, input.dims, along, marks, y);
    items.push(...strip.items);
    y += strip.height + BETWEEN;
  });
  return { width: options.width, height: y - BETWEEN + 2, items, title: `Member in elevation with the layout of ${input.joints.length} joint${input.joints.length === 1 ? "" : "s"}, from END A` };
}

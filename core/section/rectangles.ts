import type { SectionPart, Shape } from "../schema/job.js";
import { lumberSize } from "./lumber-sizes.js";

/** Axis-aligned rectangle in section coordinates, mm: x across, y up. */
export interface Rect {
  x0: number;
  x1: number;
  y0: number;
  y1: number;
}

export const rectArea = (r: Rect) => (r.x1 - r.x0) * (r.y1 - r.y0);

const box = (x0: number, y0: number, w: number, h: number): Rect => ({ x0, x1: x0 + w, y0, y1: y0 + h });

/** The rectangles a shape is made of, with the shape's bounding box at the origin; fillets and corner radii are ignored. */
export function shapeRectangles(shape: Shape): Rect[] {
  switch (shape.type) {
    case "rectangle":
      return [box(0, 0, shape.b, shape.h)];
    case "lumber": {
      const { thickness, width } = lumberSize(shape.nominal);
      return [shape.orientation === "edge" ? box(0, 0, thickness, width) : box(0, 0, width, thickness)];
    }
    case "i-section": {
      const bfB = shape.bfBottom ?? shape.bf;
      const tfB = shape.tfBottom ?? shape.tf;
      const width = Math.max(shape.bf, bfB);
      return [
        box((width - bfB) / 2, 0, bfB, tfB),
        box((width - shape.tw) / 2, tfB, shape.tw, shape.d - tfB - shape.tf),
        box((width - shape.bf) / 2, shape.d - shape.tf, shape.bf, shape.tf),
      ];
    }
    case "channel": {
      const webX = shape.toes === "right" ? 0 : shape.bf - shape.tw;
      return [
        box(0, 0, shape.bf, shape.tf),
        box(webX, shape.tf, shape.tw, shape.d - 2 * shape.tf),
        box(0, shape.d - shape.tf, shape.bf, shape.tf),
      ];
    }
    case "tee": {
      const stemX = (shape.bf - shape.tw) / 2;
      return shape.flange === "top"
        ? [box(stemX, 0, shape.tw, shape.d - shape.tf), box(0, shape.d - shape.tf, shape.bf, shape.tf)]
        : [box(0, 0, shape.bf, shape.tf), box(stemX, shape.tf, shape.tw, shape.d - shape.tf)];
    }
    case "hollow-rectangle":
      return [
        box(0, 0, shape.b, shape.t),
        box(0, shape.t, shape.t, shape.h - 2 * shape.t),
        box(shape.b - shape.t, shape.t, shape.t, shape.h - 2 * shape.t),
        box(0, shape.h - shape.t, shape.b, shape.t),
      ];
    case "angle": {
      const { b, d, t } = shape;
      const right = shape.heel.endsWith("right");
      const top = shape.heel.startsWith("top");
      // The vertical leg whole, the horizontal leg less the thickness.
      return [box(right ? b - t : 0, 0, t, d), box(right ? 0 : t, top ? d - t : 0, b - t, t)];
    }
  }
}

/** Width and depth of a shape's bounding box, mm. */
export function shapeSize(shape: Shape): { width: number; depth: number } {
  const b = boundingBox(shapeRectangles(shape));
  return { width: b.x1 - b.x0, depth: b.y1 - b.y0 };
}

/** The rectangles of a part placed in the section (its position resolved). */
export function partRectangles(part: PositionedPart): Rect[] {
  return shapeRectangles(part.shape).map((r) => ({ x0: r.x0 + part.x, x1: r.x1 + part.x, y0: r.y0 + part.y, y1: r.y1 + part.y }));
}

/** A part whose position is known: x and y given, or resolved from its placement. */
export type PositionedPart = SectionPart & { x: number; y: number };

export function boundingBox(rects: Rect[]): Rect {
  return {
    x0: Math.min(...rects.map((r) => r.x0)),
    x1: Math.max(...rects.map((r) => r.x1)),
    y0: Math.min(...rects.map((r) => r.y0)),
    y1: Math.max(...rects.map((r) => r.y1)),
  };
}

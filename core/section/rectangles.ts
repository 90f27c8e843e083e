import type { SectionPart, Shape } from "../schema/job.js";

/** Axis-aligned rectangle in section coordinates, mm: x across, y up. */
export interface Rect {
  x0: number;
  x1: number;
  y0: number;
  y1: number;
}

export const rectArea = (r: Rect) => (r.x1 - r.x0) * (r.y1 - r.y0);

/** The rectangles a shape is made of, with the shape's bounding box at the origin. */
export function shapeRectangles(shape: Shape): Rect[] {
  switch (shape.type) {
    case "rectangle":
      return [{ x0: 0, x1: shape.b, y0: 0, y1: shape.h }];
  }
}

/** The rectangles of a part placed in the section. */
export function partRectangles(part: SectionPart): Rect[] {
  return shapeRectangles(part.shape).map((r) => ({ x0: r.x0 + part.x, x1: r.x1 + part.x, y0: r.y0 + part.y, y1: r.y1 + part.y }));
}

export function boundingBox(rects: Rect[]): Rect {
  return {
    x0: Math.min(...rects.map((r) => r.x0)),
    x1: Math.max(...rects.map((r) => r.x1)),
    y0: Math.min(...rects.map((r) => r.y0)),
    y1: Math.max(...rects.map((r) => r.y1)),
  };
}

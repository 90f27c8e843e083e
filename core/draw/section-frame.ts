import type { DesignResult } from "../schema/result.js";
import { palette, rectPath, type DrawItem } from "./drawing.js";

type Section = DesignResult["section"];
type Rect = Section["parts"][number]["rects"][number];

/** Where the section sits in a drawing: its scale and the maps from section to drawing coordinates (y up → y down). */
export interface SectionFrame {
  scale: number;
  X: (x: number) => number;
  Y: (y: number) => number;
  /** A section rectangle as a drawing path. */
  rect: (r: Rect) => string;
}

/** The section's bounding box to scale, centred in a box of width × height less the margins. */
export function fitSection(bounds: Section["bounds"], width: number, height: number, margin: { left: number; right: number; top: number; bottom: number }): SectionFrame {
  const { x0, x1, y0, y1 } = bounds;
  const innerW = width - margin.left - margin.right;
  const innerH = height - margin.top - margin.bottom;
  const scale = Math.min(innerW / (x1 - x0 || 1), innerH / (y1 - y0 || 1));
  const ox = margin.left + (innerW - (x1 - x0) * scale) / 2;
  const oy = margin.top + (innerH + (y1 - y0) * scale) / 2;
  const X = (x: number) => ox + (x - x0) * scale;
  const Y = (y: number) => oy - (y - y0) * scale;
  return { scale, X, Y, rect: (r) => rectPath(X(r.x0), Y(r.y1), (r.x1 - r.x0) * scale, (r.y1 - r.y0) * scale) };
}

/** Every part's rectangles, filled by material (one palette colour per material, in order of first use) and outlined. */
export function partRectangles(section: Section, frame: SectionFrame, strokeWidth: number): DrawItem[] {
  const materials = [...new Set(section.parts.map((p) => p.material))];
  return section.parts.flatMap((part) => {
    const fill = palette.material[materials.indexOf(part.material) % palette.material.length];
    return part.rects.map((r): DrawItem => ({ type: "path", d: frame.rect(r), fill, stroke: palette.ink, strokeWidth, role: `part ${part.id}` }));
  });
}

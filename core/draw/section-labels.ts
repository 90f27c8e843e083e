import type { Drawing, DrawItem, TextItem } from "./drawing.js";

const hasRole = (item: DrawItem, role: string): item is TextItem => item.type === "text" && (item.role ?? "").split(" ")[0] === role;

/** Vertical extent of a text item around its baseline, in drawing units. */
const extent = (t: TextItem) => ({ top: t.y - t.size * 0.8, bottom: t.y + t.size * 0.25 });

/**
 * A section drawing with the joint's t and Q labels moved clear of the neutral-axis label when the
 * joint sits at the neutral axis (side-by-side plies, a web cut at mid-depth), where they would print
 * over each other. Everything else is returned as drawn.
 */
export function spreadSectionLabels(drawing: Drawing): Drawing {
  const axis = drawing.items.find((i) => hasRole(i, "neutral-axis-label")) as TextItem | undefined;
  const width = drawing.items.find((i) => hasRole(i, "width-label")) as TextItem | undefined;
  const q = drawing.items.find((i) => hasRole(i, "q-label")) as TextItem | undefined;
  if (!axis || !width) return drawing;
  const block = { top: extent(width).top, bottom: q ? extent(q).bottom : extent(width).bottom };
  const a = extent(axis);
  if (block.bottom < a.top - 1 || block.top > a.bottom + 1) return drawing;

  const gap = q ? q.y - width.y : 0;
  let widthY = a.bottom + 4 + width.size * 0.8;
  if (widthY + gap + (q ? q.size * 0.25 : 0) > drawing.height - 2) widthY = a.top - 4 - gap - (q ? q.size * 0.25 : width.size * 0.25);
  const moved = new Map<DrawItem, DrawItem>([[width, { ...width, y: widthY }]]);
  if (q) moved.set(q, { ...q, y: widthY + gap });
  return { ...drawing, items: drawing.items.map((i) => moved.get(i) ?? i) };
}

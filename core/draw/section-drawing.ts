import type { DesignResult } from "../schema/result.js";
import { formatNumber } from "../units/format.js";
import { lineTo, moveTo, palette, type Drawing, type DrawItem } from "./drawing.js";
import { fitSection, partRectangles } from "./section-frame.js";

export interface SectionDrawingOptions {
  width: number;
  height: number;
  /** Joint whose held area is shaded and whose width t is marked; the first joint when absent. */
  joint?: string;
}

/**
 * The cross-section to scale: parts by material, every joint line, the area held by the selected
 * joint shaded, its contact width t marked, and the neutral axis. Input numbers are in the result's units.
 */
export function sectionDrawing(result: Pick<DesignResult, "section" | "joints" | "unitLabels"> & { multiPly?: DesignResult["multiPly"] }, options: SectionDrawingOptions): Drawing {
  const { section, joints } = result;
  const unit = result.unitLabels.length ?? "";
  const { x0, x1, y0, y1 } = section.bounds;
  const frame = fitSection(section.bounds, options.width, options.height, { left: 16, right: 92, top: 22, bottom: 30 });
  const { X, Y } = frame;
  const items: DrawItem[] = partRectangles(section, frame, 1);

  const selected = joints.find((j) => j.id === options.joint) ?? joints[0];
  if (selected) {
    const held = new Set(selected.held);
    for (const part of section.parts.filter((p) => held.has(p.id))) {
      for (const r of part.rects) {
        items.push({ type: "path", d: frame.rect(r), fill: palette.held, opacity: 0.55, role: `held-area ${selected.id}` });
      }
    }
  }

  for (const joint of joints) {
    const isSelected = joint === selected;
    for (const line of joint.lines) {
      const d =
        line.orientation === "horizontal"
          ? `${moveTo(X(line.from), Y(line.level))}${lineTo(X(line.to), Y(line.level))}`
          : `${moveTo(X(line.level), Y(line.from))}${lineTo(X(line.level), Y(line.to))}`;
      items.push({ type: "path", d, stroke: palette.joint, strokeWidth: isSelected ? 3.5 : 2, role: `joint-line ${joint.id}${isSelected ? " selected" : ""}` });
    }
  }

  if (selected) {
    // Width t: a tick at each end of every contact line, and the total beside the section.
    for (const line of selected.lines) {
      const tick = 5;
      const d =
        line.orientation === "horizontal"
          ? [line.from, line.to].map((x) => `${moveTo(X(x), Y(line.level) - tick)}${lineTo(X(x), Y(line.level) + tick)}`).join("")
          : [line.from, line.to].map((y) => `${moveTo(X(line.level) - tick, Y(y))}${lineTo(X(line.level) + tick, Y(y))}`).join("");
      items.push({ type: "path", d, stroke: palette.joint, strokeWidth: 1.5, role: `width-mark ${selected.id}` });
    }
    const level = selected.lines[0]!;
    const labelY = level.orientation === "horizontal" ? Y(level.level) : Y((level.from + level.to) / 2);
    items.push({ type: "text", x: X(x1) + 8, y: labelY + 4, text: `t = ${formatNumber(selected.contactWidth)} ${unit}`, size: 11, anchor: "start", fill: palette.joint, bold: true, role: `width-label ${selected.id}` });
    items.push({ type: "text", x: X(x1) + 8, y: labelY + 18, text: `Q = ${formatNumber(selected.firstMoment)} ${result.unitLabels.firstMoment ?? ""}`, size: 10, anchor: "start", fill: palette.ink, role: `q-label ${selected.id}` });
  }

  const na = Y(section.centroidY);
  items.push({ type: "path", d: `${moveTo(X(x0) - 8, na)}${lineTo(X(x1) + 8, na)}`, stroke: palette.neutral, strokeWidth: 1, dash: [6, 3], role: "neutral-axis" });
  items.push({ type: "text", x: X(x1) + 8, y: na - 4, text: "N.A.", size: 10, anchor: "start", fill: palette.neutral, role: "neutral-axis-label" });

  items.push(...shallowPlies(result, frame, unit));

  items.push({ type: "text", x: (X(x0) + X(x1)) / 2, y: Y(y0) + 18, text: `${formatNumber(x1 - x0)} ${unit}`, size: 10, anchor: "middle", fill: palette.faint });
  items.push({ type: "text", x: X(x0) - 4, y: Y(y1) - 8, text: `depth ${formatNumber(y1 - y0)} ${unit}`, size: 10, anchor: "start", fill: palette.faint });
  return { width: options.width, height: options.height, items, title: `Cross-section${selected ? `, joint ${selected.id} shaded` : ""}` };
}


/**
 * Side-by-side plies not as deep as the section (a flitch plate within the timber's depth): each
 * dimensioned on the right with its depth and where it sits, its top below the section's top.
 */
function shallowPlies(result: Pick<DesignResult, "section"> & { multiPly?: DesignResult["multiPly"] }, frame: ReturnType<typeof fitSection>, unit: string): DrawItem[] {
  const { section } = result;
  const { X, Y } = frame;
  const { x1, y0, y1 } = section.bounds;
  const depth = y1 - y0;
  const items: DrawItem[] = [];
  const plies = (result.multiPly?.plies ?? []).map((p) => section.parts.find((k) => k.id === p.part)).filter((p) => p !== undefined);
  let row = 0;
  for (const part of plies) {
    const top = Math.max(...part.rects.map((r) => r.y1));
    const bottom = Math.min(...part.rects.map((r) => r.y0));
    if (top - bottom >= depth * (1 - 1e-9) || row >= 2) continue;
    const x = X(x1) + 4 + row * 4;
    const tick = (y: number) => `${moveTo(x - 3, Y(y))}${lineTo(x + 3, Y(y))}`;
    items.push({ type: "path", d: `${moveTo(x, Y(top))}${lineTo(x, Y(bottom))}${tick(top)}${tick(bottom)}`, stroke: palette.ink, strokeWidth: 0.8, role: `ply-depth ${part.id}` });
    const below = y1 - top;
    const textY = Y(top) + 10 + row * 26;
    items.push({ type: "text", x: x + 5, y: textY, text: `${part.id} ${formatNumber(top - bottom)} ${unit} deep`, size: 9, anchor: "start", fill: palette.ink, bold: true, role: `ply-depth-label ${part.id}` });
    items.push({ type: "text", x: x + 5, y: textY + 11, text: below > depth * 1e-9 ? `top ${formatNumber(below)} ${unit} below` : "flush with the top", size: 9, anchor: "start", fill: palette.ink, role: `ply-position-label ${part.id}` });
    row++;
  }
  return items;
}

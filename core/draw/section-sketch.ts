import type { DesignResult } from "../schema/result.js";
import { lineTo, moveTo, palette, rectPath, type Drawing, type DrawItem } from "./drawing.js";
import { labelWidth } from "./label-tiers.js";
import { fitSection, partRectangles } from "./section-frame.js";

export interface SectionSketchOptions {
  width: number;
  height: number;
}

const LABEL = 8;

/**
 * Spreads wanted label positions along one direction so each starts at least its extent plus `gap`
 * after the one before (the extent is 0 for label heights, the width for labels side by side),
 * kept within [lo, hi], order kept.
 */
export function spreadApart(wanted: number[], gap: number, lo: number, hi: number, extents: number[] = []): number[] {
  const order = wanted.map((v, i) => ({ v, i })).sort((a, b) => a.v - b.v);
  const size = (k: number) => extents[order[k]!.i] ?? 0;
  const vs = order.map((o) => Math.max(lo, o.v));
  for (let k = 1; k < vs.length; k++) vs[k] = Math.max(vs[k]!, vs[k - 1]! + size(k - 1) + gap);
  for (let k = vs.length - 1; k >= 0; k--) vs[k] = Math.max(lo, Math.min(vs[k]!, k === vs.length - 1 ? hi - size(k) : vs[k + 1]! - size(k) - gap));
  const out = new Array<number>(wanted.length);
  order.forEach((o, k) => (out[o.i] = vs[k]!));
  return out;
}

/**
 * A small cross-section for the builder: the parts to scale with their ids on the left, and every
 * joint line drawn and named on the right, so the strips of the field sheet can be found on the member.
 */
export function sectionSketch(result: Pick<DesignResult, "section" | "joints">, options: SectionSketchOptions): Drawing {
  const { section, joints } = result;
  const partLabels = section.parts.map((p) => p.id);
  const jointLabels = joints.map((j) => `joint ${j.id}`);
  const centres = section.parts.map((p) => {
    const r = largestRect(p.rects);
    return { x: (r.x0 + r.x1) / 2, y: (r.y0 + r.y1) / 2 };
  });
  const spread = (v: number[]) => Math.max(...v) - Math.min(...v);
  // Parts side by side (plies) are named above the section; stacked parts (flanges and webs) on its left.
  const above = section.parts.length > 1 && spread(centres.map((c) => c.x)) > spread(centres.map((c) => c.y));
  const leftRoom = above ? 8 : Math.min(options.width * 0.3, Math.max(0, ...partLabels.map((t) => labelWidth(t, LABEL))) + 14);
  const rightRoom = Math.min(options.width * 0.4, Math.max(0, ...jointLabels.map((t) => labelWidth(t, LABEL, true))) + 16);
  const margin = { left: leftRoom, right: rightRoom, top: above ? 30 : 8, bottom: 8 };
  const frame = fitSection(section.bounds, options.width, options.height, margin);
  const { X, Y } = frame;
  const items: DrawItem[] = partRectangles(section, frame, 0.8);

  // Each part id is led to a dot in its largest rectangle. On the left, parts further right take the lower labels at one height, so leaders do not cross.
  const anchors = centres.map((c) => ({ x: X(c.x), y: Y(c.y) }));
  if (above) {
    // One row of labels over the section, spread sideways in the parts' order, each led down to its part.
    const widths = partLabels.map((t) => labelWidth(t, LABEL));
    const lefts = spreadApart(
      anchors.map((a, i) => a.x - widths[i]! / 2),
      6,
      2,
      options.width - rightRoom,
      widths,
    );
    const y = margin.top - 10;
    section.parts.forEach((p, i) => {
      const a = anchors[i]!;
      const centre = lefts[i]! + widths[i]! / 2;
      items.push({ type: "path", d: `${moveTo(centre, y + 2)}${lineTo(a.x, Math.min(a.y, y + 8))}${lineTo(a.x, a.y)}`, stroke: palette.faint, strokeWidth: 0.5 });
      items.push({ type: "path", d: rectPath(a.x - 1.2, a.y - 1.2, 2.4, 2.4), fill: palette.ink });
      items.push({ type: "text", x: centre, y, text: partLabels[i]!, size: LABEL, anchor: "middle", fill: palette.ink, role: `part-label ${p.id}` });
    });
  } else {
    const partYs = spreadApart(anchors.map((a) => a.y + a.x * 1e-3), LABEL + 2, margin.top + LABEL, options.height - 2);
    section.parts.forEach((p, i) => {
      const a = anchors[i]!;
      items.push({ type: "path", d: `${moveTo(leftRoom - 4, partYs[i]! - 3)}${lineTo(a.x, a.y)}`, stroke: palette.faint, strokeWidth: 0.5 });
      items.push({ type: "path", d: rectPath(a.x - 1.2, a.y - 1.2, 2.4, 2.4), fill: palette.ink });
      items.push({ type: "text", x: leftRoom - 6, y: partYs[i]!, text: partLabels[i]!, size: LABEL, anchor: "end", fill: palette.ink, role: `part-label ${p.id}` });
    });
  }

  // Joint lines, each joint named on the right with a leader to every one of its lines.
  const right = options.width - rightRoom + 6;
  const lineEnds = joints.map((j) =>
    j.lines.map((l) => (l.orientation === "horizontal" ? { x: X(l.to), y: Y(l.level) } : { x: X(l.level), y: Y((l.from + l.to) / 2) })),
  );
  // Joints further right take the upper labels at one height, so leaders do not cross.
  const jointYs = spreadApart(
    lineEnds.map((ends) => ends.reduce((s, e) => s + e.y - e.x * 1e-3, 0) / Math.max(1, ends.length) + 3),
    LABEL + 3,
    margin.top + LABEL,
    options.height - 2,
  );
  joints.forEach((j, i) => {
    for (const l of j.lines) {
      const d = l.orientation === "horizontal" ? `${moveTo(X(l.from), Y(l.level))}${lineTo(X(l.to), Y(l.level))}` : `${moveTo(X(l.level), Y(l.from))}${lineTo(X(l.level), Y(l.to))}`;
      items.push({ type: "path", d, stroke: palette.joint, strokeWidth: 2.6, role: `joint-line ${j.id}` });
    }
    for (const e of lineEnds[i]!) items.push({ type: "path", d: `${moveTo(e.x, e.y)}${lineTo(right - 2, jointYs[i]! - 3)}`, stroke: palette.joint, strokeWidth: 0.6 });
    items.push({ type: "text", x: right, y: jointYs[i]!, text: jointLabels[i]!, size: LABEL, anchor: "start", bold: true, fill: palette.joint, role: `joint-label ${j.id}` });
  });
  return { width: options.width, height: options.height, items, title: `Cross-section naming ${joints.length} joint${joints.length === 1 ? "" : "s"}` };
}

type Rect = { x0: number; x1: number; y0: number; y1: number };
const largestRect = (rects: Rect[]): Rect => rects.reduce((a, b) => ((b.x1 - b.x0) * (b.y1 - b.y0) > (a.x1 - a.x0) * (a.y1 - a.y0) ? b : a));

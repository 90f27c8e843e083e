import type { BuilderDimensions } from "./builder-dimensions.js";
import { lineTo, moveTo, palette, rectPath, type DrawItem } from "./drawing.js";
import { labelWidth, placeInTiers } from "./label-tiers.js";

/** The x scale shared by the member and every joint strip under it. */
export interface AlongMember {
  left: number;
  right: number;
  /** Member length, span units. */
  length: number;
}

export const xOf = (a: AlongMember, x: number) => a.left + (a.length > 0 ? (x / a.length) * (a.right - a.left) : 0);

export interface MemberElevationInput {
  dims: BuilderDimensions;
  /** Spans left to right, span units (an overhang is a span with a free end). */
  spans: number[];
  supports: { x: number; type: "pinned" | "roller" | "fixed" }[];
  /** Point loads by position, each with what it is ("column above"). */
  pointLoads: { at: number; label: string }[];
  /** Parts that start or stop along the member (a cover plate), with the face of the member they are on. */
  partRuns?: { label: string; from: number; to: number; side: "top" | "bottom" }[];
}

const LOAD_LABEL = 8;
const DIM_LABEL = 8;

/**
 * The member in elevation: END A and END B, the point loads with what they are, the member, its
 * supports, and the spans and overall length dimensioned. Returns items from y = top and the height used.
 */
export function memberElevation(input: MemberElevationInput, along: AlongMember, top: number): { items: DrawItem[]; height: number } {
  const items: DrawItem[] = [];
  const X = (x: number) => xOf(along, x);
  const { dims } = input;
  let y = top;

  items.push({ type: "text", x: along.left, y: y + 9, text: "END A", size: 9, anchor: "start", bold: true, fill: palette.ink, role: "end-a" });
  items.push({ type: "text", x: along.right, y: y + 9, text: "END B", size: 9, anchor: "end", bold: true, fill: palette.ink, role: "end-b" });
  y += 14;

  // Point loads: the same position once, with every label given there.
  const loads = new Map<number, string[]>();
  for (const p of input.pointLoads) {
    const key = Number(p.at.toPrecision(9));
    loads.set(key, [...new Set([...(loads.get(key) ?? []), p.label || "point load"])]);
  }
  const loadEntries = [...loads.entries()].sort((a, b) => a[0] - b[0]);
  const loadTexts = loadEntries.map(([at, labels]) => `${labels.join(", ")} (${dims.position(at)})`);
  const placed = placeInTiers(
    loadEntries.map(([at], i) => ({ x: X(at), width: labelWidth(loadTexts[i]!, LOAD_LABEL) })),
    along.left,
    along.right,
  );
  const tiers = placed.reduce((m, p) => Math.max(m, p.tier + 1), 0);
  const arrowTop = y + tiers * 11 + 2;
  const memberTop = arrowTop + 16;
  placed.forEach((p, i) => {
    const x = X(loadEntries[i]![0]);
    const textY = arrowTop - 3 - p.tier * 11;
    items.push({ type: "text", x: p.textX, y: textY, text: loadTexts[i]!, size: LOAD_LABEL, anchor: p.anchor, fill: palette.neutral, role: "point-load-label" });
    items.push({ type: "path", d: `${moveTo(x, textY + 2)}${lineTo(x, memberTop - 1)}`, stroke: palette.neutral, strokeWidth: 1.3, role: "point-load" });
    items.push({ type: "path", d: `${moveTo(x, memberTop - 0.5)}${lineTo(x - 3.5, memberTop - 7)}${lineTo(x + 3.5, memberTop - 7)}Z`, fill: palette.neutral });
  });

  const memberHeight = 12;
  items.push({ type: "path", d: rectPath(along.left, memberTop, along.right - along.left, memberHeight), fill: palette.material[0], stroke: palette.ink, strokeWidth: 1.2, role: "member" });
  const base = memberTop + memberHeight;
  for (const s of input.supports) items.push(...supportSymbol(X(s.x), base, s.type, s.x <= 1e-9 ? "left" : s.x >= along.length - 1e-9 ? "right" : "inside"));

  // Spans (and overhangs) dimensioned between their ends, then the overall length.
  const ends = [0, ...input.spans.map((_, i) => input.spans.slice(0, i + 1).reduce((s, v) => s + v, 0))];
  let dimY = base + 20;
  if (input.spans.length > 1) {
    items.push(...dimensionChain(ends.map(X), ends.slice(1).map((e, i) => dims.run(e - ends[i]!)), dimY));
    dimY += 16;
  }
  items.push(...dimensionChain([X(0), X(along.length)], [`${dims.run(along.length)} overall`], dimY));
  // Parts that stop short, each as a bar over its run with where it starts and stops.
  for (const run of input.partRuns ?? []) {
    dimY += 24;
    items.push({ type: "text", x: (X(run.from) + X(run.to)) / 2, y: dimY - 5, text: `${run.label}, on the ${run.side} face: ${dims.position(run.from)} to ${dims.position(run.to)} from END A`, size: 8, anchor: "middle", fill: palette.ink, role: "part-run-label" });
    items.push({ type: "path", d: rectPath(X(run.from), dimY - 2, X(run.to) - X(run.from), 5), fill: palette.material[1], stroke: palette.ink, strokeWidth: 0.9, role: "part-run" });
  }
  return { items, height: dimY + 6 - top };
}

/** A dimension line through the given x positions with a tick at each and a label over each segment. */
export function dimensionChain(xs: number[], labels: string[], y: number, colour: string = palette.ink): DrawItem[] {
  const items: DrawItem[] = [];
  const first = xs[0]!;
  const last = xs[xs.length - 1]!;
  items.push({ type: "path", d: `${moveTo(first, y)}${lineTo(last, y)}`, stroke: colour, strokeWidth: 0.6, role: "dimension" });
  items.push({ type: "path", d: xs.map((x) => `${moveTo(x - 2.5, y + 2.5)}${lineTo(x + 2.5, y - 2.5)}${moveTo(x, y - 4)}${lineTo(x, y + 4)}`).join(""), stroke: colour, strokeWidth: 0.8 });
  labels.forEach((label, i) => {
    const a = xs[i]!;
    const b = xs[i + 1]!;
    if (labelWidth(label, DIM_LABEL) > b - a - 4 && labels.length > 1) {
      items.push({ type: "text", x: (a + b) / 2, y: y + 11, text: label, size: DIM_LABEL - 0.5, anchor: "middle", fill: colour });
      return;
    }
    items.push({ type: "text", x: (a + b) / 2, y: y - 3, text: label, size: DIM_LABEL, anchor: "middle", fill: colour });
  });
  return items;
}

/** Pinned: a filled triangle on hatched ground; roller: an open triangle on a line; fixed: a hatched wall. */
export function supportSymbol(x: number, y: number, type: "pinned" | "roller" | "fixed", side: "left" | "right" | "inside", size = 7): DrawItem[] {
  const items: DrawItem[] = [];
  if (type === "fixed") {
    const wallX = side === "right" ? x + 1 : x - 1;
    const dir = side === "right" ? 1 : -1;
    const h = size * 2.4;
    const hatch = Array.from({ length: 5 }, (_, i) => {
      const yy = y - h + (i + 0.5) * (h / 5) + size * 0.6;
      return `${moveTo(wallX, yy)}${lineTo(wallX + dir * 4, yy + 4)}`;
    }).join("");
    items.push({ type: "path", d: `${moveTo(wallX, y - h + size * 0.6)}${lineTo(wallX, y + size * 0.6)}${hatch}`, stroke: palette.ink, strokeWidth: 1, role: "support fixed" });
    return items;
  }
  const triangle = `${moveTo(x, y)}${lineTo(x - size * 0.8, y + size)}${lineTo(x + size * 0.8, y + size)}Z`;
  items.push({ type: "path", d: triangle, fill: type === "pinned" ? palette.ink : "#ffffff", stroke: palette.ink, strokeWidth: 1, role: `support ${type}` });
  const groundY = y + size + (type === "roller" ? 2.5 : 0);
  const hatch = Array.from({ length: 4 }, (_, i) => {
    const hx = x - size + (i + 0.5) * (size / 2);
    return `${moveTo(hx, groundY)}${lineTo(hx - 2.5, groundY + 3)}`;
  }).join("");
  items.push({ type: "path", d: `${moveTo(x - size, groundY)}${lineTo(x + size, groundY)}${type === "pinned" ? hatch : ""}`, stroke: palette.ink, strokeWidth: 0.9 });
  return items;
}

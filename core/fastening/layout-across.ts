import type { Schedule } from "../schema/result.js";
import { geometricTolerance, type ContactLine } from "../section/contacts.js";
import type { SectionModel } from "../section/section-model.js";
import { edgeDistances } from "./row-fit.js";

export type LayoutAcross = NonNullable<Schedule["layoutAcross"]>;

/**
 * Where the connectors of a row sit across the contact, for the field sheet: offsets from a named edge,
 * one per connector of a row, increasing. The row is placed on the longest unbroken stretch of the
 * narrowest contact line, the edge distances kept at both ends of the stretch (for a force across the
 * grain the loaded edge's at each loaded edge) and the spacing across between connectors, the group
 * centred in the room left. Between side-by-side plies (a force across the member) the offsets are from
 * the top edge of the deepest timber part of the joint (the deepest part where none is timber); any other
 * contact is dimensioned from its own top edge (vertical) or left edge (horizontal) of the stretch. Null
 * when the row does not fit across the contact (the schedule fails).
 *
 * Stagger: with two or more connectors per row and a force across the grain, alternate connectors of each
 * row are set along the member (toward midspan) by half the least spacing between rows, so that the holes
 * of a row do not all stand in one cross-section [CP]. Driven from: the part the heads bear on, for a connector driven from one
 * face (one with a penetration); null for a through bolt.
 */
export function layoutAcross(schedule: Pick<Schedule, "rows" | "limits" | "rowFit" | "positions">, lines: ContactLine[], section: SectionModel, headPart: string | null, across: boolean): LayoutAcross | null {
  if (lines.length === 0 || (schedule.rowFit && !schedule.rowFit.fits)) return null;
  const line = lines.reduce((a, b) => (b.widest < a.widest ? b : a));
  const stretch = longestStretch(line, section);
  const width = stretch.to - stretch.from;
  const n = schedule.rows;
  const edges = edgeDistances(schedule.limits) ?? { high: 0, low: 0 };
  const spacing = n > 1 ? (schedule.limits.rowSpacing ?? null) : 0;
  // From the top of a vertical stretch (its high end), from the left of a horizontal one (its low end).
  const vertical = line.orientation === "vertical";
  const [first, last] = vertical ? [edges.high, edges.low] : [edges.low, edges.high];
  let fromStart: number[];
  if (spacing === null) {
    // No spacing across given: spread evenly over the room between the edge distances.
    const room = width - first - last;
    fromStart = Array.from({ length: n }, (_, i) => first + (room * (i + 1)) / (n + 1));
  } else {
    const room = width - first - last - (n - 1) * spacing;
    if (room < -1e-9 * Math.max(width, 1)) return null;
    const start = first + Math.max(0, room) / 2;
    fromStart = Array.from({ length: n }, (_, i) => start + i * spacing);
  }
  const names = new Map(section.parts.map((p) => [p.id, p.name || p.id]));
  let edge: string;
  let offsets: number[];
  if (vertical && across) {
    const joined = section.parts.filter((p) => p.id === line.a || p.id === line.b || lines.some((l) => l.a === p.id || l.b === p.id));
    const timber = joined.filter((p) => p.material.family !== "steel");
    const pool = timber.length > 0 ? timber : joined;
    const depth = (p: SectionModel["parts"][number]) => Math.max(...p.rects.map((r) => r.y1)) - Math.min(...p.rects.map((r) => r.y0));
    // The deepest; of equal depths the leftmost, so that the named edge does not depend on the order of the parts.
    const tol = geometricTolerance(section);
    const deepest = pool.reduce((a, b) => (depth(b) > depth(a) + tol || (Math.abs(depth(b) - depth(a)) <= tol && Math.min(...b.rects.map((r) => r.x0)) < Math.min(...a.rects.map((r) => r.x0))) ? b : a));
    const top = Math.max(...deepest.rects.map((r) => r.y1));
    edge = `top edge of "${names.get(deepest.id)}"`;
    offsets = fromStart.map((u) => top - (stretch.to - u));
  } else {
    // The joint's own contact, named without its parts, so that joints built alike (a box beam's top and bottom) lay out alike.
    edge = vertical ? "top edge of the contact" : "left edge of the contact";
    offsets = fromStart;
  }
  const gaps = schedule.positions.slice(1).map((x, i) => x - schedule.positions[i]!);
  const stagger = across && n >= 2 && gaps.length > 0 ? Math.min(...gaps) / 2 : null;
  return { edge, offsets, stagger, drivenFrom: headPart !== null && schedule.limits.penetration ? (names.get(headPart) ?? headPart) : null };
}

/** The longest unbroken stretch of touching faces along a contact line (the one `widest` measures). */
function longestStretch(line: ContactLine, section: SectionModel): { from: number; to: number } {
  if (line.length <= line.widest * (1 + 1e-9)) return { from: line.from, to: line.to };
  const tol = geometricTolerance(section);
  const rectsOf = (id: string) => section.parts.find((p) => p.id === id)?.rects ?? [];
  const span = (r: { x0: number; x1: number; y0: number; y1: number }) => (line.orientation === "horizontal" ? [r.x0, r.x1] : [r.y0, r.y1]) as [number, number];
  const face = (r: { x0: number; x1: number; y0: number; y1: number }) => (line.orientation === "horizontal" ? [r.y0, r.y1] : [r.x0, r.x1]);
  const at = (r: { x0: number; x1: number; y0: number; y1: number }) => face(r).some((v) => Math.abs(v - line.level) <= tol);
  const pieces: [number, number][] = [];
  for (const ra of rectsOf(line.a).filter(at)) {
    for (const rb of rectsOf(line.b).filter(at)) {
      const [a0, a1] = span(ra);
      const [b0, b1] = span(rb);
      if (Math.min(a1, b1) - Math.max(a0, b0) > tol) pieces.push([Math.max(a0, b0), Math.min(a1, b1)]);
    }
  }
  pieces.sort((p, q) => p[0] - q[0]);
  // Touching pieces join into one stretch.
  const merged: [number, number][] = [];
  for (const p of pieces) {
    const lastPiece = merged[merged.length - 1];
    if (lastPiece && p[0] <= lastPiece[1] + tol) lastPiece[1] = Math.max(lastPiece[1], p[1]);
    else merged.push([...p]);
  }
  const best = merged.reduce<[number, number] | null>((a, b) => (a === null || b[1] - b[0] > a[1] - a[0] ? b : a), null);
  return best ? { from: best[0], to: best[1] } : { from: line.from, to: line.from + line.widest };
}

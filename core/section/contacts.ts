import type { Rect } from "./rectangles.js";
import type { PlacedPart, SectionModel } from "./section-model.js";

/** Faces of two parts that touch over a non-zero length: a line where connectors or glue can act. */
export interface ContactLine {
  /** Lower part of a horizontal contact, left part of a vertical one. */
  a: string;
  b: string;
  orientation: "horizontal" | "vertical";
  /** y of a horizontal contact, x of a vertical one, mm. */
  level: number;
  /** Extent along the line: x range of a horizontal contact, y range of a vertical one, mm. */
  from: number;
  to: number;
  /** Touching length across the section (the width t this line contributes), mm. */
  length: number;
  /** Longest single stretch of touching faces along the line (the width a row of connectors has), mm. */
  widest: number;
}

export interface Overlap {
  a: string;
  b: string;
  area: number;
}

/** Length below which two faces count as coincident, mm: relative to the section's size. */
export function geometricTolerance(section: SectionModel): number {
  const { x0, x1, y0, y1 } = section.bounds;
  return 1e-6 * Math.max(x1 - x0, y1 - y0, 1);
}

export function findOverlaps(section: SectionModel): Overlap[] {
  const tol = geometricTolerance(section);
  const out: Overlap[] = [];
  forEachPair(section.parts, (p, q) => {
    let area = 0;
    for (const r of p.rects) for (const s of q.rects) {
      const w = Math.min(r.x1, s.x1) - Math.max(r.x0, s.x0);
      const h = Math.min(r.y1, s.y1) - Math.max(r.y0, s.y0);
      if (w > tol && h > tol) area += w * h;
    }
    if (area > 0) out.push({ a: p.id, b: q.id, area });
  });
  return out;
}

export function findContacts(section: SectionModel): ContactLine[] {
  const tol = geometricTolerance(section);
  const out: ContactLine[] = [];
  forEachPair(section.parts, (p, q) => {
    for (const [lo, hi] of [[p, q], [q, p]] as const) {
      collect(lo, hi, "horizontal", (r) => r.y1, (r) => r.y0, (r) => [r.x0, r.x1]);
      collect(lo, hi, "vertical", (r) => r.x1, (r) => r.x0, (r) => [r.y0, r.y1]);
    }
  });
  return out;

  function collect(
    lo: PlacedPart,
    hi: PlacedPart,
    orientation: ContactLine["orientation"],
    far: (r: Rect) => number,
    near: (r: Rect) => number,
    extent: (r: Rect) => [number, number],
  ) {
    // Most pairs of parts do not touch: the lines and their pieces are made only once a contact is found.
    let lines: ContactLine[] | null = null;
    let pieces: [number, number][][] | null = null;
    for (const r of lo.rects) for (const s of hi.rects) {
      if (Math.abs(far(r) - near(s)) > tol) continue;
      const [r0, r1] = extent(r);
      const [s0, s1] = extent(s);
      const from = Math.max(r0, s0);
      const to = Math.min(r1, s1);
      if (to - from <= tol) continue;
      const level = far(r);
      lines ??= [];
      pieces ??= [];
      // The first line, in the order they were made, at this level (within the tolerance).
      const k = lines.findIndex((l) => Math.abs(l.level - level) <= tol);
      const line = k >= 0 ? lines[k]! : undefined;
      if (line) {
        line.from = Math.min(line.from, from);
        line.to = Math.max(line.to, to);
        line.length += to - from;
        pieces[k]!.push([from, to]);
      } else {
        lines.push({ a: lo.id, b: hi.id, orientation, level, from, to, length: to - from, widest: to - from });
        pieces.push([[from, to]]);
      }
    }
    if (!lines) return;
    lines.forEach((line, k) => (line.widest = widestRun(pieces![k]!, tol)));
    out.push(...lines);
  }
}

/** Longest run of intervals that overlap or abut (within tol), mm. */
function widestRun(spans: [number, number][], tol: number): number {
  const sorted = [...spans].sort((p, q) => p[0] - q[0]);
  let widest = 0;
  let [start, end] = sorted[0]!;
  for (const [from, to] of sorted.slice(1)) {
    if (from <= end + tol) end = Math.max(end, to);
    else {
      widest = Math.max(widest, end - start);
      [start, end] = [from, to];
    }
  }
  return Math.max(widest, end - start);
}

/** Groups of parts that touch each other; more than one group means the section falls apart. */
export function connectedGroups(section: SectionModel, contacts: ContactLine[]): string[][] {
  const ids = section.parts.map((p) => p.id);
  const seen = new Set<string>();
  const groups: string[][] = [];
  for (const start of ids) {
    if (seen.has(start)) continue;
    const group: string[] = [];
    const stack = [start];
    seen.add(start);
    while (stack.length) {
      const id = stack.pop()!;
      group.push(id);
      for (const c of contacts) {
        const other = c.a === id ? c.b : c.b === id ? c.a : undefined;
        if (other !== undefined && !seen.has(other)) {
          seen.add(other);
          stack.push(other);
        }
      }
    }
    groups.push(group);
  }
  return groups;
}

function forEachPair(parts: PlacedPart[], fn: (p: PlacedPart, q: PlacedPart) => void) {
  for (let i = 0; i < parts.length; i++) for (let j = i + 1; j < parts.length; j++) fn(parts[i]!, parts[j]!);
}


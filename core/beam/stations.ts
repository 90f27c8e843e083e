import type { Side } from "./member-actions.js";

export interface Station {
  x: number;
  side: Side;
}

/**
 * Stations for diagrams and tables: an even grid plus every breakpoint; an interior breakpoint
 * appears twice, the value just left of it first, so jumps are drawn as vertical steps.
 */
export function stationsFor(length: number, breaks: number[], divisions = 100): Station[] {
  const tol = 1e-9 * length;
  const xs = [...breaks, ...Array.from({ length: divisions + 1 }, (_, i) => (length * i) / divisions)].sort((a, b) => a - b);
  const unique: number[] = [];
  for (const x of xs) if (unique.length === 0 || x - unique[unique.length - 1]! > tol) unique.push(x);
  const isBreak = (x: number) => breaks.some((b) => Math.abs(b - x) <= tol);
  const out: Station[] = [];
  for (const x of unique) {
    if (x > tol && x < length - tol && isBreak(x)) out.push({ x, side: "left" }, { x, side: "right" });
    else out.push({ x, side: x >= length - tol ? "left" : "right" });
  }
  return out;
}

import type { Side } from "./member-actions.js";

export interface Station {
  x: number;
  side: Side;
}

/**
 * Stations for diagrams and tables: a grid at a round step (about `divisions` of the length, or
 * exactly that many when `roundToStep` is false) plus
 * every breakpoint; an interior breakpoint appears twice, the value just left of it first, so jumps
 * are drawn as vertical steps.
 */
export function stationsFor(length: number, breaks: number[], divisions = 100, roundToStep = true): Station[] {
  const tol = 1e-9 * length;
  const step = roundToStep ? roundStep(length / divisions) : length / divisions;
  const grid = Array.from({ length: Math.floor(length / step + 1e-9) + 1 }, (_, i) => i * step);
  const xs = [...breaks, ...grid, length].sort((a, b) => a - b);
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

/** The smallest of 1, 2, 2.5, 5 × 10^k not below `raw`. */
function roundStep(raw: number): number {
  const magnitude = 10 ** Math.floor(Math.log10(raw));
  return [1, 2, 2.5, 5, 10].map((m) => m * magnitude).find((s) => s >= raw * (1 - 1e-12))!;
}

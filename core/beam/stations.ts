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
  const count = Math.floor(length / step + 1e-9) + 1;
  // The grid and the end, then the breaks merged in, in the order a stable sort of [breaks, grid, end] gives (breaks first on a tie).
  const rest = new Array<number>(count + 1);
  for (let i = 0; i < count; i++) rest[i] = i * step;
  rest[count] = length;
  if (rest[count - 1]! > length) rest.sort((a, b) => a - b);
  const sortedBreaks = breaks.length > 1 ? [...breaks].sort((a, b) => a - b) : breaks;
  const unique: number[] = [];
  const keep = (x: number) => {
    if (unique.length === 0 || x - unique[unique.length - 1]! > tol) unique.push(x);
  };
  let k = 0;
  for (const x of rest) {
    while (k < sortedBreaks.length && sortedBreaks[k]! <= x) keep(sortedBreaks[k++]!);
    keep(x);
  }
  while (k < sortedBreaks.length) keep(sortedBreaks[k++]!);
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

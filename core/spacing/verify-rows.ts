import type { DemandCurve } from "./demand.js";

export interface RowUtilisation {
  x: number;
  /** Tributary length of the row: halfway to each neighbour, or to the member end. */
  from: number;
  to: number;
  utilisation: number;
  combination: string;
}

/**
 * Utilisation of every row, independently of how the rows were chosen: its tributary length times
 * the largest demand intensity over that length (so the largest shear flow over n·R).
 */
export function verifyRows(positions: number[], demand: DemandCurve): RowUtilisation[] {
  const L = demand.length;
  return positions.map((x, k) => {
    const from = k === 0 ? 0 : (positions[k - 1]! + x) / 2;
    const to = k === positions.length - 1 ? L : (x + positions[k + 1]!) / 2;
    const peak = demand.maxOver(from, to);
    return { x, from, to, utilisation: (to - from) * peak.value, combination: peak.combination };
  });
}

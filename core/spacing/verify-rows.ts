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
    const peak = demand.sharedMaxOver(from, to);
    return { x, from, to, utilisation: (to - from) * peak.value, combination: peak.combination };
  });
}

/** A force that the connectors within [from, to] must carry, per combination (per contact line, N). */
export interface RowBand {
  from: number;
  to: number;
  forces: { combination: string; force: number }[];
}

export interface BandUtilisation {
  /** Index of the band in the list given. */
  band: number;
  from: number;
  to: number;
  /** Rows within the band, its edges included. */
  rows: number;
  /** The governing combination's force over what the rows within carry (Infinity when none stands within). */
  utilisation: number;
  combination: string;
  force: number;
  carried: number;
}

/**
 * Each band's utilisation: its force over what only the rows within it carry, Σ (connectors per row × R);
 * a row just outside is not credited by its tributary length (the concentrated-load rule, [CP]).
 */
export function verifyBands(positions: number[], bands: readonly RowBand[], resistances: readonly { id: string; resistance: number }[], perRow: number): BandUtilisation[] {
  return bands.map((b, band) => {
    const slack = 1e-9 * Math.max(1, Math.abs(b.to));
    const rows = positions.filter((x) => x >= b.from - slack && x <= b.to + slack).length;
    let worst = { utilisation: 0, combination: b.forces[0]?.combination ?? "", force: 0, carried: 0 };
    for (const { combination, force } of b.forces) {
      const r = resistances.find((c) => c.id === combination)?.resistance;
      if (r === undefined || !(force > 0)) continue;
      const carried = rows * perRow * r;
      const utilisation = carried > 0 ? force / carried : Infinity;
      if (utilisation > worst.utilisation) worst = { utilisation, combination, force, carried };
    }
    return { band, from: b.from, to: b.to, rows, ...worst };
  });
}

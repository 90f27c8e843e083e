import type { Zone } from "../schema/result.js";
import { maxAbsShear } from "../beam/member-actions.js";
import { piecesMet, shearBounds, type DemandCurve, type DemandTerm } from "./demand.js";
import { placeRows } from "./place-rows.js";
import { verifyRows, type RowUtilisation } from "./verify-rows.js";

export interface ProvidedZone {
  from: number;
  to: number;
  spacing: number;
}

export interface ScheduleCheck {
  zones: (Zone & { failingCombinations: string[] })[];
  positions: number[];
  rowChecks: RowUtilisation[];
  /** The worst row for each combination on its own. */
  perCombination: { combination: string; maxUtilisation: number; at: number }[];
}

/**
 * Check of an existing schedule: every row's utilisation, its tributary length times the largest
 * shear flow over that length divided by (connectors per row × R), for each combination; the worst
 * row per zone; the zones that fail and under which combinations. Rows come from the zones (placed
 * as a design would place them) or are given one by one.
 */
export function checkSchedule(p: {
  demand: DemandCurve;
  rows: number;
  lines: number;
  endDistance: number;
  /** Least gap between rows placed from zones: the connector's minimum spacing. */
  minGap?: number;
  /** Zones (rows placed from them unless positions are also given), or rows one by one. */
  provided: { zones: ProvidedZone[]; positions?: number[] } | { positions: number[] };
}): ScheduleCheck {
  const L = p.demand.length;
  const given = p.provided.positions ? [...p.provided.positions].sort((a, b) => a - b) : undefined;
  const zones: ProvidedZone[] = "zones" in p.provided ? p.provided.zones : zonesOfPositions(given!, L);
  const positions = given ?? placeRows(zones, L, p.endDistance, false, p.minGap ?? 0);
  const rowChecks = verifyRows(positions, p.demand);
  // Each combination on its own, row by row (the rows' utilisations under it alone).
  // Terms analysed on the same breaks share their pieces: each row's range of pieces is found once for them.
  const spans = new Map<number[], RowSpans>();
  const spansFor = (t: DemandTerm) => {
    let found = spans.get(t.actions.breaks);
    if (!found || found.length !== t.actions.length || found.pieces !== t.actions.pieces.length) spans.set(t.actions.breaks, (found = rowSpans(rowChecks, t, L)));
    return found;
  };
  const single = p.demand.terms.map((t) => ({ id: t.combination, utilisation: utilisationsUnder(rowChecks, t, spansFor(t)) }));
  const perCombination = single.map(({ id, utilisation }) => {
    let worst = 0;
    for (let r = 1; r < utilisation.length; r++) if (utilisation[r]! > utilisation[worst]!) worst = r;
    return { combination: id, maxUtilisation: utilisation[worst]!, at: rowChecks[worst]!.x };
  });
  const inZone = (z: ProvidedZone, i: number) => (r: { x: number }) => r.x >= z.from - 1e-9 && (i === zones.length - 1 ? r.x <= z.to + 1e-9 : r.x < z.to - 1e-9);
  return {
    positions,
    rowChecks,
    perCombination,
    zones: zones.map((z, i) => {
      const here = inZone(z, i);
      const inside: number[] = [];
      let worst: RowUtilisation | undefined;
      rowChecks.forEach((row, r) => {
        if (!here(row)) return;
        inside.push(r);
        if (!worst || row.utilisation > worst.utilisation) worst = row;
      });
      const peak = p.demand.sharedMaxOver(z.from, z.to);
      const failing = single.filter(({ utilisation }) => inside.some((r) => utilisation[r]! > 1 + 1e-9)).map((s) => s.id);
      return {
        from: z.from,
        to: z.to,
        spacing: z.spacing,
        rows: p.rows,
        count: inside.length * p.rows * p.lines,
        // A demand so small that its spacing overflows asks for no connectors at all (null, as for none).
        requiredSpacing: peak.value > 0 && Number.isFinite(1 / peak.value) ? 1 / peak.value : null,
        utilisation: worst?.utilisation ?? 0,
        governingCombination: worst?.combination ?? peak.combination,
        passes: (worst?.utilisation ?? 0) <= 1 + 1e-9,
        failingCombinations: failing,
      };
    }),
  };
}

/** Each row's tributary clipped to the member, and the first and last piece of the actions it meets (first −1: none). */
interface RowSpans {
  length: number;
  pieces: number;
  lo: Float64Array;
  hi: Float64Array;
  first: Int32Array;
  last: Int32Array;
}

function rowSpans(rows: RowUtilisation[], term: DemandTerm, length: number): RowSpans {
  const n = rows.length;
  const out: RowSpans = { length: term.actions.length, pieces: term.actions.pieces.length, lo: new Float64Array(n), hi: new Float64Array(n), first: new Int32Array(n), last: new Int32Array(n) };
  for (let r = 0; r < n; r++) {
    const lo = Math.max(0, rows[r]!.from);
    const hi = Math.min(length, rows[r]!.to);
    out.lo[r] = lo;
    out.hi[r] = hi;
    if (hi < lo) {
      out.first[r] = -1;
      out.last[r] = -2;
      continue;
    }
    const [first, last] = piecesMet(term.actions, lo, hi);
    out.first[r] = first;
    out.last[r] = last;
  }
  return out;
}

/**
 * Each row's utilisation under one combination alone, as verifyRows with that term only, where it can
 * matter: the worst row and any row above 1. A row whose bound (its tributary × k × the bound on |V| over
 * the pieces it meets) is below both the worst found and 1 is not worked out and reads −1.
 */
function utilisationsUnder(rows: RowUtilisation[], term: DemandTerm, spans: RowSpans): Float64Array {
  const n = rows.length;
  const out = new Float64Array(n);
  const pieceBounds = shearBounds(term.actions);
  const bounds = new Float64Array(n);
  for (let r = 0; r < n; r++) {
    if (spans.first[r]! < 0) continue;
    let m = 0;
    for (let p = spans.first[r]!; p <= spans.last[r]!; p++) if (pieceBounds[p]! > m) m = pieceBounds[p]!;
    bounds[r] = (rows[r]!.to - rows[r]!.from) * (term.k * m);
  }
  const exact = (r: number) => {
    const lo = spans.lo[r]!;
    const hi = spans.hi[r]!;
    const value = hi < lo ? 0 : term.k * maxAbsShear(term.actions, lo, hi).value;
    return (rows[r]!.to - rows[r]!.from) * (value > 0 ? value : 0);
  };
  let lead = 0;
  for (let r = 1; r < n; r++) if (bounds[r]! > bounds[lead]!) lead = r;
  let known = n > 0 ? (out[lead] = exact(lead)) : 0;
  for (let r = 0; r < n; r++) {
    if (r === lead) continue;
    if (bounds[r]! < known && bounds[r]! <= 1 + 1e-9) {
      out[r] = -1;
      continue;
    }
    out[r] = exact(r);
    if (out[r]! > known) known = out[r]!;
  }
  return out;
}

/** Explicit positions shown as one zone per run of equal gaps (to a tenth of a millimetre). */
function zonesOfPositions(positions: number[], length: number): ProvidedZone[] {
  if (positions.length < 2) return [{ from: 0, to: length, spacing: length }];
  const zones: ProvidedZone[] = [];
  for (let k = 1; k < positions.length; k++) {
    const gap = positions[k]! - positions[k - 1]!;
    const last = zones[zones.length - 1];
    if (last && Math.abs(last.spacing - gap) < 0.1) last.to = positions[k]!;
    else zones.push({ from: positions[k - 1]!, to: positions[k]!, spacing: gap });
  }
  zones[0]!.from = 0;
  zones[zones.length - 1]!.to = length;
  return zones;
}

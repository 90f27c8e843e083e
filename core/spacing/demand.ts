import { locateStations } from "../beam/beam-result.js";
import { firstPieceReaching, maxAbsShear, pieceAt, poly, shearAt, type Extreme, type MemberActions, type Side } from "../beam/member-actions.js";
import type { Station } from "../beam/stations.js";

const SIMPSON_PANELS = 64;

/**
 * |V| of each of `actions` at the stations, exactly as shearAt gives it, located in one sweep where the
 * actions share their breaks (a member's combinations) and the stations run along the member; null
 * otherwise (then ask shearAt).
 */
export function absShearsAtStations(actions: MemberActions[], stations: Station[]): Float64Array[] | null {
  // Asked for the same actions and stations by each joint (shear flow, required spacing): worked out once.
  const first = actions[0];
  if (!first) return null;
  let byFirst = shearsAt.get(stations);
  if (!byFirst) shearsAt.set(stations, (byFirst = new WeakMap()));
  const known = byFirst.get(first);
  if (known && known.actions.length === actions.length && known.actions.every((a, i) => a === actions[i])) return known.shears;
  const shears = locatedShears(actions, stations);
  byFirst.set(first, { actions: [...actions], shears });
  return shears;
}

const shearsAt = new WeakMap<Station[], WeakMap<MemberActions, { actions: MemberActions[]; shears: Float64Array[] | null }>>();

function locatedShears(actions: MemberActions[], stations: Station[]): Float64Array[] | null {
  const first = actions[0];
  if (!first || actions.some((a) => a.breaks !== first.breaks || a.pieces.length !== first.pieces.length || a.length !== first.length)) return null;
  for (let j = 1; j < stations.length; j++) {
    const a = stations[j - 1]!;
    const b = stations[j]!;
    if (!(a.x < b.x || (a.x === b.x && !(a.side === "right" && b.side === "left")))) return null;
  }
  const at = locateStations(first, stations);
  return actions.map((a) => {
    const out = new Float64Array(stations.length);
    for (let j = 0; j < stations.length; j++) {
      if (at.outside[j] === 1) continue;
      out[j] = Math.abs(poly(a.pieces[at.piece[j]!]!.v, at.u[j]!));
    }
    return out;
  });
}

const sameNumbers = (a: number[], b: number[]) => a.length === b.length && a.every((x, i) => x === b[i]);

/** The first and last piece that meet [lo − tol, hi + tol]: every piece maxAbsShear(actions, lo, hi) looks at. */
export function piecesMet(actions: MemberActions, lo: number, hi: number): [number, number] {
  const tol = 1e-9 * actions.length;
  const pieces = actions.pieces;
  const first = firstPieceReaching(pieces, lo - tol);
  let last = first - 1;
  while (last + 1 < pieces.length && pieces[last + 1]!.x0 <= hi + tol) last++;
  return [first, last];
}

const boundsOf = new WeakMap<MemberActions, Float64Array>();

/**
 * Per piece, a bound on |V| over the whole piece: the largest at its ends and its vertex, plus a margin
 * far above the rounding of evaluating the polynomial, so that no value maxAbsShear computes inside the
 * piece exceeds it.
 */
export function shearBounds(actions: MemberActions): Float64Array {
  let out = boundsOf.get(actions);
  if (out) return out;
  out = new Float64Array(actions.pieces.length);
  actions.pieces.forEach((p, i) => {
    const h = p.x1 - p.x0;
    const [v0, v1, v2] = p.v;
    let m = Math.max(Math.abs(v0), Math.abs(poly(p.v, h)));
    if (v2 !== 0) {
      const u = -v1 / (2 * v2);
      if (u > 0 && u < h) m = Math.max(m, Math.abs(poly(p.v, u)));
    }
    // A point just outside the piece by the rounding of its position is covered too.
    const reach = Math.max(h, 1e-6 * Math.max(Math.abs(p.x0), Math.abs(p.x1), 1));
    out[i] = m + 1e-9 * (Math.abs(v0) + Math.abs(v1) * reach + Math.abs(v2) * reach * reach) + Number.MIN_VALUE;
  });
  boundsOf.set(actions, out);
  return out;
}

/** One load combination's share of a connector line's demand: d(x) = k·|V(x)|, rows per mm. */
export interface DemandTerm {
  combination: string;
  actions: MemberActions;
  /** (Q/I) / (lines · n · R): rows per mm per newton of shear. */
  k: number;
}

export interface DemandPeak {
  /** Rows of connectors needed per mm: the inverse of the required spacing. */
  value: number;
  x: number;
  combination: string;
}

/**
 * Demand intensity along a connector line: the rows needed per unit length,
 * d(x) = max over combinations c of q_c(x) / (n·R_c), with q_c the shear flow on one line.
 */
export class DemandCurve {
  constructor(
    readonly length: number,
    readonly terms: DemandTerm[],
  ) {}

  at(x: number, side: Side = "right"): DemandPeak {
    let best: DemandPeak = { value: 0, x, combination: this.terms[0]?.combination ?? "" };
    for (const t of this.terms) {
      const value = t.k * Math.abs(shearAt(t.actions, x, side));
      if (value > best.value) best = { value, x, combination: t.combination };
    }
    return best;
  }

  /** at(x, side).value, without the peak's record. */
  private valueAt(x: number, side: Side): number {
    let best = 0;
    for (const t of this.terms) {
      const value = t.k * Math.abs(shearAt(t.actions, x, side));
      if (value > best) best = value;
    }
    return best;
  }

  /** at(x, side).value at every station. */
  valuesAtStations(stations: Station[]): Float64Array {
    const out = new Float64Array(stations.length);
    const shears = absShearsAtStations(this.terms.map((t) => t.actions), stations);
    if (!shears) {
      stations.forEach((s, j) => (out[j] = this.at(s.x, s.side).value));
      return out;
    }
    this.terms.forEach((t, i) => {
      const v = shears[i]!;
      for (let j = 0; j < stations.length; j++) {
        const value = t.k * v[j]!;
        if (value > out[j]!) out[j] = value;
      }
    });
    return out;
  }

  /** Exact maximum over [a, b] ∩ [0, L], both sides of every jump counted. */
  maxOver(a: number, b: number): DemandPeak {
    return { ...this.sharedMaxOver(a, b) };
  }

  /** maxOver(a, b) as kept for the next asker: read it, never change it. */
  sharedMaxOver(a: number, b: number): Readonly<DemandPeak> {
    // Rows that stay put while a schedule is tightened ask again for the same tributary: answered once.
    let byEnd = this.peaks.get(a);
    if (!byEnd) this.peaks.set(a, (byEnd = new Map()));
    let peak = byEnd.get(b);
    if (!peak) byEnd.set(b, (peak = this.peakOver(a, b)));
    return peak;
  }

  private readonly peaks = new Map<number, Map<number, DemandPeak>>();

  private peakOver(a: number, b: number): DemandPeak {
    const lo = Math.max(0, a);
    const hi = Math.min(this.length, b);
    let best: DemandPeak = { value: 0, x: lo, combination: this.terms[0]?.combination ?? "" };
    if (hi < lo) return best;
    const terms = this.terms;
    // With a few terms, bounding them costs more than it saves.
    if (terms.length < 4) {
      for (const t of terms) {
        const e = maxAbsShear(t.actions, lo, hi);
        const value = t.k * e.value;
        if (value > best.value) best = { value, x: e.x, combination: t.combination };
      }
      return best;
    }
    // A term whose bound over the pieces it meets is below a value already found cannot govern: only the
    // others are evaluated exactly, in their order (the first to reach the largest value keeps it, as before).
    const bounds = this.boundsOver(lo, hi);
    let lead = 0;
    for (let i = 1; i < terms.length; i++) if (bounds[i]! > bounds[lead]!) lead = i;
    const leadPeak = maxAbsShear(terms[lead]!.actions, lo, hi);
    let known = terms[lead]!.k * leadPeak.value;
    for (let i = 0; i < terms.length; i++) {
      const t = terms[i]!;
      let e: Extreme;
      if (i === lead) e = leadPeak;
      else if (bounds[i]! < known) continue;
      else e = maxAbsShear(t.actions, lo, hi);
      const value = t.k * e.value;
      if (value > known) known = value;
      if (value > best.value) best = { value, x: e.x, combination: t.combination };
    }
    return best;
  }

  private scratch = new Float64Array(0);

  private boundsByTerm: Float64Array[] | undefined;

  /** shearBounds of each term's actions, looked up once for the curve. */
  private pieceBounds(): Float64Array[] {
    return (this.boundsByTerm ??= this.terms.map((t) => shearBounds(t.actions)));
  }

  /** Per term, k × a bound on |V| over every piece that meets [lo − tol, hi + tol] (the pieces maxAbsShear looks at). */
  private boundsOver(lo: number, hi: number): Float64Array {
    if (this.scratch.length !== this.terms.length) this.scratch = new Float64Array(this.terms.length);
    const out = this.scratch;
    const termBounds = this.pieceBounds();
    let breaks: number[] | null = null;
    let first = 0;
    let last = -1;
    for (let i = 0; i < this.terms.length; i++) {
      const { actions, k } = this.terms[i]!;
      // Terms analysed on the same breaks share their pieces: find the range once.
      if (actions.breaks !== breaks) {
        breaks = actions.breaks;
        [first, last] = piecesMet(actions, lo, hi);
      }
      const pieceBounds = termBounds[i]!;
      let m = 0;
      for (let p = first; p <= last; p++) if (pieceBounds[p]! > m) m = pieceBounds[p]!;
      out[i] = k * m;
    }
    return out;
  }

  /**
   * ∫ max(d(x), floor) dx over the member (composite Simpson per piece): with floor = 1/s_max, the
   * fewest rows any schedule within the maximum spacing can have; with floor 0, the bare ∫q/(n·R) dx.
   */
  integral(floor = 0): number {
    const { breaks, values } = this.samples();
    const n = SIMPSON_PANELS;
    let sum = 0;
    for (let i = 0, row = 0; i < breaks.length - 1; i++) {
      const a = breaks[i]!;
      const b = breaks[i + 1]!;
      if (b - a <= 0) continue;
      const h = (b - a) / n;
      // The max of terms has kinks, so many panels (composite Simpson).
      const at = (k: number) => Math.max(values[row + k]!, floor);
      let s = at(0) + at(n);
      for (let k = 1; k < n; k++) s += (k % 2 ? 4 : 2) * at(k);
      sum += (s * h) / 3;
      row += n + 1;
    }
    return sum;
  }

  private sampled: { breaks: number[]; values: Float64Array } | undefined;

  /** d(x) at the Simpson panel points of every piece, computed once for every floor. */
  private samples(): { breaks: number[]; values: Float64Array } {
    if (this.sampled) return this.sampled;
    const terms = this.terms;
    const ends = new Set<number>();
    for (const t of terms) for (const b of t.actions.breaks) ends.add(b);
    const breaks = [...ends].sort((a, b) => a - b);
    const n = SIMPSON_PANELS;
    let pieceCount = 0;
    for (let i = 1; i < breaks.length; i++) if (breaks[i]! - breaks[i - 1]! > 0) pieceCount++;
    const values = new Float64Array(pieceCount * (n + 1));
    const shared = terms.every((t) => t.actions.breaks === breaks || sameNumbers(t.actions.breaks, breaks));
    const termBounds = shared ? this.pieceBounds() : [];
    const bounds = new Float64Array(terms.length);
    // Terms taken in order of their bound, largest first (the first of equal bounds first).
    const taken = new Uint8Array(terms.length);
    for (let i = 0, row = 0; i < breaks.length - 1; i++) {
      const a = breaks[i]!;
      const b = breaks[i + 1]!;
      if (b - a <= 0) continue;
      const h = (b - a) / n;
      // Inside [a, b] every term is one polynomial: find its piece once, then evaluate it at the panel points.
      const mid = (a + b) / 2;
      // Where every term has the member's breaks, the terms that cannot raise any panel point are skipped
      // (a term's bound over the piece at or below the least value found so far); the maximum is the same.
      if (shared) {
        for (let j = 0; j < terms.length; j++) bounds[j] = terms[j]!.k * termBounds[j]![i]!;
        taken.fill(0);
      }
      let least = 0;
      for (let step = 0; step < terms.length; step++) {
        let j = step;
        if (shared) {
          j = -1;
          for (let q = 0; q < terms.length; q++) if (taken[q] === 0 && (j < 0 || bounds[q]! > bounds[j]!)) j = q;
          taken[j] = 1;
          if (bounds[j]! <= least) break;
        }
        const t = terms[j]!;
        if (mid < 0 || mid > t.actions.length) continue;
        const pieces = t.actions.pieces;
        // pieceAt(actions, mid, "right"): the last piece that starts at or before mid (here usually piece i).
        const guess = pieces[i];
        const piece = guess && guess.x0 <= mid && (i + 1 >= pieces.length || pieces[i + 1]!.x0 > mid) ? guess : pieceAt(t.actions, mid, "right");
        const v0 = piece.v[0];
        const v1 = piece.v[1];
        const v2 = piece.v[2];
        const k = t.k;
        const x0 = piece.x0;
        let low = Infinity;
        for (let p = 0; p <= n; p++) {
          const u = a + p * h - x0;
          // |poly(piece.v, u)|, Horner as poly computes it.
          const v = k * Math.abs(((0 * u + v2) * u + v1) * u + v0);
          if (v > values[row + p]!) values[row + p] = v;
          if (values[row + p]! < low) low = values[row + p]!;
        }
        if (shared) least = low;
      }
      row += n + 1;
    }
    return (this.sampled = { breaks, values });
  }

  /** True when d(x) = d(L − x) at a set of stations, within a relative tolerance. */
  isSymmetric(samples = 64): boolean {
    const tol = 1e-9 * this.length;
    const breaks = this.terms.flatMap((t) => t.actions.breaks);
    if (!breaks.every((b) => breaks.some((c) => Math.abs(b + c - this.length) <= tol))) return false;
    let peak = 0;
    let diff = 0;
    for (let i = 0; i <= samples; i++) {
      const x = (this.length * i) / samples;
      const left = this.valueAt(x, "right");
      const right = this.valueAt(this.length - x, "left");
      peak = Math.max(peak, left, right);
      diff = Math.max(diff, Math.abs(left - right));
    }
    return diff <= 1e-9 * Math.max(peak, 1e-300);
  }
}

import { maxAbsShear, pieceAt, poly, shearAt, type MemberActions, type Side } from "../beam/member-actions.js";

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

  /** Exact maximum over [a, b] ∩ [0, L], both sides of every jump counted. */
  maxOver(a: number, b: number): DemandPeak {
    const lo = Math.max(0, a);
    const hi = Math.min(this.length, b);
    let best: DemandPeak = { value: 0, x: lo, combination: this.terms[0]?.combination ?? "" };
    if (hi < lo) return best;
    for (const t of this.terms) {
      const e = maxAbsShear(t.actions, lo, hi);
      const value = t.k * e.value;
      if (value > best.value) best = { value, x: e.x, combination: t.combination };
    }
    return best;
  }

  /**
   * ∫ max(d(x), floor) dx over the member (composite Simpson per piece): with floor = 1/s_max, the
   * fewest rows any schedule within the maximum spacing can have; with floor 0, the bare ∫q/(n·R) dx.
   */
  integral(floor = 0): number {
    const breaks = [...new Set(this.terms.flatMap((t) => t.actions.breaks))].sort((a, b) => a - b);
    const n = 64;
    const values = new Float64Array(n + 1);
    let sum = 0;
    for (let i = 0; i < breaks.length - 1; i++) {
      const a = breaks[i]!;
      const b = breaks[i + 1]!;
      if (b - a <= 0) continue;
      const h = (b - a) / n;
      values.fill(floor);
      // Inside [a, b] every term is one polynomial: find its piece once, then evaluate it at the panel points.
      const mid = (a + b) / 2;
      for (const t of this.terms) {
        if (mid < 0 || mid > t.actions.length) continue;
        const piece = pieceAt(t.actions, mid, "right");
        for (let k = 0; k <= n; k++) {
          const v = t.k * Math.abs(poly(piece.v, a + k * h - piece.x0));
          if (v > values[k]!) values[k] = v;
        }
      }
      // The max of terms has kinks, so many panels (composite Simpson).
      let s = values[0]! + values[n]!;
      for (let k = 1; k < n; k++) s += (k % 2 ? 4 : 2) * values[k]!;
      sum += (s * h) / 3;
    }
    return sum;
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
      const left = this.at(x, "right").value;
      const right = this.at(this.length - x, "left").value;
      peak = Math.max(peak, left, right);
      diff = Math.max(diff, Math.abs(left - right));
    }
    return diff <= 1e-9 * Math.max(peak, 1e-300);
  }
}

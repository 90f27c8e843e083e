/**
 * Shear, moment and deflection along a straight member as exact piecewise polynomials.
 *
 * Units: x in mm, forces in N, line loads in N/mm, moments in N·mm. Loads act downward when
 * positive; reactions act upward when positive. V is the sum of upward forces left of x; M is
 * sagging-positive. Between breakpoints the line load is linear, so V is quadratic and M cubic.
 */

import { rigidityAt, type RigidityStep } from "./rigidity.js";
import { rootsInto } from "./polynomial-roots.js";

export interface PointForce {
  x: number;
  /** Downward force, N. */
  P: number;
}

export interface LineLoad {
  x0: number;
  x1: number;
  /** Downward intensity at x0 and x1, N/mm. */
  w0: number;
  w1: number;
}

export interface PointMoment {
  x: number;
  /** Clockwise moment, N·mm: raises the sagging moment to its right. */
  M: number;
}

export interface LoadSet {
  points: PointForce[];
  lines: LineLoad[];
  moments: PointMoment[];
}

export interface Reaction {
  x: number;
  /** Upward force, N. */
  R: number;
  /** Clockwise moment from a fixed support, N·mm. */
  M: number;
}

/** One piece between breakpoints; coefficients in powers of u = x − x0. */
export interface Piece {
  x0: number;
  x1: number;
  v: [number, number, number];
  m: [number, number, number, number];
}

export interface MemberActions {
  length: number;
  pieces: Piece[];
  /** Every x where V or M may jump or change law, including 0 and the length. */
  breaks: number[];
}

export type Side = "left" | "right";

export const emptyLoads = (): LoadSet => ({ points: [], lines: [], moments: [] });

/**
 * Integrates the loads and reactions from the left end into exact V(x) and M(x). `extraBreaks` adds
 * piece ends where nothing changes, so that members analysed on the same breaks can be superposed
 * piece by piece (`combineActions`).
 */
export function memberActions(length: number, loads: LoadSet, reactions: Reaction[], extraBreaks: readonly number[] = []): MemberActions {
  const breaks = uniqueSorted([
    0,
    length,
    ...loads.points.map((p) => p.x),
    ...loads.moments.map((m) => m.x),
    ...loads.lines.flatMap((l) => [l.x0, l.x1]),
    ...reactions.map((r) => r.x),
    ...extraBreaks,
  ], length);
  const pieces: Piece[] = [];
  let v = 0;
  let m = 0;
  for (let k = 0; k < breaks.length - 1; k++) {
    const x0 = breaks[k]!;
    const x1 = breaks[k + 1]!;
    const at = (x: number) => Math.abs(x - x0) <= 1e-9 * Math.max(length, 1);
    for (const r of reactions) if (at(r.x)) { v += r.R; m += r.M; }
    for (const p of loads.points) if (at(p.x)) v -= p.P;
    for (const c of loads.moments) if (at(c.x)) m += c.M;
    // Line load inside [x0, x1]: w(u) = p + s·u.
    let p = 0;
    let s = 0;
    for (const l of loads.lines) {
      if (l.x1 <= x0 || l.x0 >= x1 || l.x1 <= l.x0) continue;
      const slope = (l.w1 - l.w0) / (l.x1 - l.x0);
      p += l.w0 + slope * (x0 - l.x0);
      s += slope;
    }
    const piece: Piece = { x0, x1, v: [v, -p, -s / 2], m: [m, v, -p / 2, -s / 6] };
    pieces.push(piece);
    const u = x1 - x0;
    v = poly(piece.v, u);
    m = poly(piece.m, u);
  }
  return { length, pieces, breaks };
}

/** Σ f·actions of members analysed on the same breaks (superposition). */
export function combineActions(terms: { actions: MemberActions; f: number }[], length: number, breaks: number[]): MemberActions {
  const pieces: Piece[] = [];
  for (let k = 0; k < breaks.length - 1; k++) {
    const v: [number, number, number] = [0, 0, 0];
    const m: [number, number, number, number] = [0, 0, 0, 0];
    for (const { actions, f } of terms) {
      const p = actions.pieces[k]!;
      v[0] += f * p.v[0];
      v[1] += f * p.v[1];
      v[2] += f * p.v[2];
      m[0] += f * p.m[0];
      m[1] += f * p.m[1];
      m[2] += f * p.m[2];
      m[3] += f * p.m[3];
    }
    pieces.push({ x0: breaks[k]!, x1: breaks[k + 1]!, v, m });
  }
  return { length, pieces, breaks };
}

function uniqueSorted(xs: number[], length: number): number[] {
  const tol = 1e-9 * Math.max(length, 1);
  const sorted = xs.filter((x) => x >= -tol && x <= length + tol).map((x) => Math.min(Math.max(x, 0), length)).sort((a, b) => a - b);
  const out: number[] = [];
  for (const x of sorted) if (out.length === 0 || x - out[out.length - 1]! > tol) out.push(x);
  return out;
}

export function poly(c: readonly number[], u: number): number {
  let r = 0;
  for (let i = c.length - 1; i >= 0; i--) r = r * u + c[i]!;
  return r;
}

/** The piece holding x: from the left, the first whose end is at or past x; from the right, the last that starts at or before x (binary search). */
export function pieceAt(actions: MemberActions, x: number, side: Side): Piece {
  const { pieces } = actions;
  let lo = 0;
  let hi = pieces.length - 1;
  if (side === "left") {
    while (lo < hi) {
      const mid = (lo + hi) >> 1;
      if (x <= pieces[mid]!.x1) hi = mid;
      else lo = mid + 1;
    }
    return pieces[lo]!;
  }
  while (lo < hi) {
    const mid = (lo + hi + 1) >> 1;
    if (x >= pieces[mid]!.x0) lo = mid;
    else hi = mid - 1;
  }
  return pieces[lo]!;
}

/** V at x; at a jump, the value just left or just right of x. Outside the member V is zero. */
export function shearAt(actions: MemberActions, x: number, side: Side = "right"): number {
  if (x < 0 || x > actions.length || (x === 0 && side === "left") || (x === actions.length && side === "right")) return 0;
  const p = pieceAt(actions, x, side);
  return poly(p.v, x - p.x0);
}

export function momentAt(actions: MemberActions, x: number, side: Side = "right"): number {
  if (x < 0 || x > actions.length || (x === 0 && side === "left") || (x === actions.length && side === "right")) return 0;
  const p = pieceAt(actions, x, side);
  return poly(p.m, x - p.x0);
}

export interface Extreme {
  value: number;
  x: number;
}

/** Largest |V| over the closed interval [a, b], counting both sides of every jump inside it. */
export function maxAbsShear(actions: MemberActions, a: number, b: number): Extreme {
  if (a === 0 && b === actions.length) {
    const known = overWhole(actions);
    return { ...(known.shear ??= extremeOver(actions, a, b, SHEAR, 1)) };
  }
  return extremeOver(actions, a, b, SHEAR, 1);
}

/** Largest sagging and hogging moments over [a, b]. */
export function momentExtremes(actions: MemberActions, a = 0, b = actions.length): { max: Extreme; min: Extreme } {
  if (a === 0 && b === actions.length) {
    const known = overWhole(actions);
    return { max: { ...(known.max ??= extremeOver(actions, a, b, MOMENT, 1)) }, min: { ...(known.min ??= extremeOver(actions, a, b, MOMENT, -1)) } };
  }
  return { max: extremeOver(actions, a, b, MOMENT, 1), min: extremeOver(actions, a, b, MOMENT, -1) };
}

/** The whole member's extremes, asked for by the member checks and again by the beam's result. */
const wholeMember = new WeakMap<MemberActions, { shear?: Extreme; max?: Extreme; min?: Extreme }>();
function overWhole(actions: MemberActions): { shear?: Extreme; max?: Extreme; min?: Extreme } {
  let known = wholeMember.get(actions);
  if (!known) wholeMember.set(actions, (known = {}));
  return known;
}

const SHEAR = 0;
const MOMENT = 1;
/** Index of the first piece (pieces in order along the member) that ends at or after x; the count when none does. */
export function firstPieceReaching(pieces: readonly { x1: number }[], x: number): number {
  let lo = 0;
  let hi = pieces.length;
  while (lo < hi) {
    const mid = (lo + hi) >> 1;
    if (pieces[mid]!.x1 < x) lo = mid + 1;
    else hi = mid;
  }
  return lo;
}

/** Roots of a piece's derivative, reused from call to call (this runs for every zone, row and combination). */
const scratchRoots = new Float64Array(2);

/** |V| (what = SHEAR) or sign·M (what = MOMENT) at its largest over [a, b]: piece ends and the derivative's roots. */
function extremeOver(actions: MemberActions, a: number, b: number, what: typeof SHEAR | typeof MOMENT, sign: number): Extreme {
  const absolute = what === SHEAR;
  let bestValue = -Infinity;
  let bestX = a;
  const pieces = actions.pieces;
  // A piece ending within a relative 1e-9 of the interval counts as meeting it, so a load or support
  // that a unit conversion moves by a rounding error stays on the same side of a zone boundary.
  const tol = 1e-9 * actions.length;
  // The first piece that reaches a − tol (pieces are in order along the member); then on until one starts past b + tol.
  const lo0 = firstPieceReaching(pieces, a - tol);
  for (let k = lo0; k < pieces.length; k++) {
    const p = pieces[k]!;
    if (p.x0 > b + tol) break;
    const lo = Math.max(a - tol, p.x0);
    const hi = Math.min(b + tol, p.x1);
    if (hi < lo) continue;
    const c: readonly number[] = absolute ? p.v : p.m;
    for (let e = 0; e < 2; e++) {
      const x = e === 0 ? lo : hi;
      const value = poly(c, x - p.x0);
      const score = absolute ? Math.abs(value) : sign * value;
      if (score > bestValue) {
        bestValue = score;
        bestX = x;
      }
    }
    const count = absolute ? rootsOf(p.v[1], 2 * p.v[2], 0, scratchRoots) : rootsOf(p.m[1], 2 * p.m[2], 3 * p.m[3], scratchRoots);
    for (let r = 0; r < count; r++) {
      const u = scratchRoots[r]!;
      const x = p.x0 + u;
      if (!(x > lo && x < hi)) continue;
      const value = poly(c, u);
      const score = absolute ? Math.abs(value) : sign * value;
      if (score > bestValue) {
        bestValue = score;
        bestX = x;
      }
    }
  }
  if (bestValue === -Infinity) return { value: 0, x: a };
  return { value: absolute ? bestValue : sign * bestValue, x: bestX };
}

/** Real roots of c0 + c1·u + c2·u² into `out`, without allocating: the number of roots. */
function rootsOf(c0: number, c1: number, c2: number, out: Float64Array): number {
  const scale = Math.max(Math.abs(c0), Math.abs(c1), Math.abs(c2), 1e-300);
  if (Math.abs(c2) <= 1e-14 * scale) {
    if (Math.abs(c1) <= 1e-14 * scale) return 0;
    out[0] = -c0 / c1;
    return 1;
  }
  const disc = c1 * c1 - 4 * c2 * c0;
  if (disc < 0) return 0;
  const q = -0.5 * (c1 + Math.sign(c1 || 1) * Math.sqrt(disc));
  out[0] = q / c2;
  if (q === 0) return 1;
  out[1] = c0 / q;
  return 2;
}

/** Deflected shape as pieces: rotation and upward deflection in powers of u. */
export interface DeflectionCurve {
  pieces: { x0: number; x1: number; theta: number[]; v: number[] }[];
}

/**
 * Integrates EI·v'' = M twice (EI constant, or constant between the steps given), with the constants fixed by the supports: a
 * fixed support (v = 0, θ = 0) when there is one, else the two outermost supports (v = 0). The
 * reactions must already satisfy compatibility (as statics or the stiffness method give them), so
 * any other support then has v = 0 as well.
 */
export function deflectionCurve(actions: MemberActions, flexuralRigidity: number | RigidityStep[], supports: { x: number; fixed: boolean }[]): DeflectionCurve {
  const pieces: DeflectionCurve["pieces"] = [];
  let theta = 0;
  let v = 0;
  // A stepped E·I must step at piece boundaries (pass its steps as breaks when building the actions).
  const ei = (p: Piece) => (typeof flexuralRigidity === "number" ? flexuralRigidity : rigidityAt(flexuralRigidity, (p.x0 + p.x1) / 2));
  for (const p of actions.pieces) {
    const rigidity = ei(p);
    const m = p.m.map((c) => c / rigidity);
    const t = [theta, m[0]!, m[1]! / 2, m[2]! / 3, m[3]! / 4];
    const w = [v, theta, m[0]! / 2, m[1]! / 6, m[2]! / 12, m[3]! / 20];
    pieces.push({ x0: p.x0, x1: p.x1, theta: t, v: w });
    theta = poly(t, p.x1 - p.x0);
    v = poly(w, p.x1 - p.x0);
  }
  const curve = { pieces };
  const fixed = supports.find((s) => s.fixed);
  let c0: number;
  let c1: number;
  if (fixed) {
    c1 = -evaluate(curve, fixed.x, "theta");
    c0 = -evaluate(curve, fixed.x, "v") - c1 * fixed.x;
  } else {
    const s1 = supports.reduce<{ x: number } | undefined>((a, s) => (a === undefined || s.x < a.x ? s : a), undefined);
    const s2 = supports.reduce<{ x: number } | undefined>((a, s) => (a === undefined || s.x > a.x ? s : a), undefined);
    if (!s1 || !s2 || s2.x === s1.x) throw new Error("deflection needs two supports or one fixed support");
    const v1 = evaluate(curve, s1.x, "v");
    const v2 = evaluate(curve, s2.x, "v");
    c1 = -(v2 - v1) / (s2.x - s1.x);
    c0 = -v1 - c1 * s1.x;
  }
  for (const p of pieces) {
    p.theta[0]! += c1;
    p.v[0]! += c0 + c1 * p.x0;
    p.v[1]! += c1;
  }
  return curve;
}

export function evaluate(curve: DeflectionCurve, x: number, what: "v" | "theta"): number {
  const p = curve.pieces.find((q) => x <= q.x1) ?? curve.pieces[curve.pieces.length - 1]!;
  return poly(what === "v" ? p.v : p.theta, x - p.x0);
}

const thetaRoots = new Float64Array(8);

/** Largest downward and upward deflection over [a, b], exact: piece ends and the roots of the rotation. */
export function deflectionExtremes(curve: DeflectionCurve, a = -Infinity, b = Infinity): { down: Extreme; up: Extreme } {
  let down: Extreme = { value: -Infinity, x: 0 };
  let up: Extreme = { value: -Infinity, x: 0 };
  for (const p of curve.pieces) {
    const lo = Math.max(a, p.x0);
    const hi = Math.min(b, p.x1);
    if (hi < lo) continue;
    const count = rootsInto(p.theta, p.theta.length, lo - p.x0, hi - p.x0, thetaRoots);
    for (let i = 0; i < count + 2; i++) {
      const u = i === 0 ? lo - p.x0 : i === 1 ? hi - p.x0 : thetaRoots[i - 2]!;
      const v = poly(p.v, u);
      if (-v > down.value) down = { value: -v, x: p.x0 + u };
      if (v > up.value) up = { value: v, x: p.x0 + u };
    }
  }
  if (down.value === -Infinity) return { down: { value: 0, x: 0 }, up: { value: 0, x: 0 } };
  return { down, up };
}

/** Largest downward deflection (as a positive number) and its position. */
export function maxDeflection(curve: DeflectionCurve, a = -Infinity, b = Infinity): Extreme {
  return deflectionExtremes(curve, a, b).down;
}

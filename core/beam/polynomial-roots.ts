/**
 * Real roots of a polynomial (ascending coefficients in u) inside [lo, hi], ascending. The interval
 * is split at the roots of the derivative (found the same way), so each part is monotone and a sign
 * change there is bracketed and closed in on to machine precision.
 */
export function rootsIn(c: readonly number[], lo: number, hi: number): number[] {
  const out = new Float64Array(Math.max(c.length, 1));
  return Array.from(out.subarray(0, rootsInto(c, c.length, lo, hi, out)));
}

/** Scratch for `rootsInto`, one set per level of its recursion on the derivative. */
interface Level {
  p: Float64Array;
  derivative: Float64Array;
  inner: Float64Array;
}
const levels: Level[] = [];
/** The scratch of one level, with room for `count` coefficients (at least 8: a member's pieces have at most 6). */
const levelAt = (depth: number, count: number): Level => {
  const known = levels[depth];
  if (known && known.p.length >= count) return known;
  const room = Math.max(8, count);
  return (levels[depth] = { p: new Float64Array(room), derivative: new Float64Array(room), inner: new Float64Array(room + 1) });
};

/**
 * rootsIn of c[0..count − 1] written into `out` (room for `count` roots), without allocating: the number
 * of roots. For callers that ask for many pieces' roots.
 */
export function rootsInto(c: ArrayLike<number>, count: number, lo: number, hi: number, out: Float64Array, depth = 0): number {
  if (!(hi > lo)) return 0;
  // Where |c0| exceeds Σ|c_i|·|u|^i (i ≥ 1) over the interval by far more than rounding, every value rootsIn
  // computes has c0's sign and none is zero: it finds no root (most pieces, asked for their sign changes).
  const reach = Math.max(Math.abs(lo), Math.abs(hi));
  let rest = 0;
  let power = 1;
  for (let i = 1; i < count; i++) {
    power *= reach;
    rest += Math.abs(c[i]!) * power;
  }
  const constant = Math.abs(c[0]!);
  if (constant > rest + 1e-9 * (constant + rest)) return 0;
  const span = Math.max(Math.abs(lo), Math.abs(hi), hi - lo);
  // Math.max(0, ...size) of rootsIn: NaN if any size is.
  let scale = 0;
  for (let i = 0; i < count; i++) {
    const size = Math.abs(c[i]!) * span ** i;
    if (size > scale) scale = size;
    else if (Number.isNaN(size)) scale = NaN;
  }
  if (scale === 0) return 0;
  let degree = count - 1;
  while (degree > 0 && Math.abs(c[degree]!) * span ** degree <= 1e-13 * scale) degree--;
  if (degree === 0) return 0;
  const level = levelAt(depth, count);
  const p = level.p;
  for (let i = 0; i <= degree; i++) p[i] = c[i]!;
  const n = degree + 1;
  if (degree === 1) {
    const u = -p[0]! / p[1]!;
    if (u >= lo && u <= hi) {
      out[0] = u;
      return 1;
    }
    return 0;
  }
  const derivative = level.derivative;
  for (let i = 0; i < degree; i++) derivative[i] = p[i + 1]! * (i + 1);
  const inner = level.inner;
  const innerCount = rootsInto(derivative, degree, lo, hi, inner, depth + 1);
  // A root is kept unless it is within 1e-12·span of the last one kept.
  const apart = 1e-12 * span;
  let found = 0;
  // The parts between lo, the derivative's roots and hi.
  for (let k = 0; k <= innerCount; k++) {
    const a = k === 0 ? lo : inner[k - 1]!;
    const b = k === innerCount ? hi : inner[k]!;
    const fa = polyOf(p, n, a);
    const fb = polyOf(p, n, b);
    if (fa === 0 && (found === 0 || a - out[found - 1]! > apart)) out[found++] = a;
    if (fa === 0 || fb === 0 || Math.sign(fa) === Math.sign(fb)) continue;
    const u = bracketed(p, a, b, fa, fb, span, n);
    if (found === 0 || u - out[found - 1]! > apart) out[found++] = u;
  }
  if (polyOf(p, n, hi) === 0 && (found === 0 || hi - out[found - 1]! > apart)) out[found++] = hi;
  return found;
}

/** The root of a monotone part with a sign change, by the Illinois form of false position. */
function bracketed(p: ArrayLike<number>, a: number, b: number, fa: number, fb: number, span: number, n: number): number {
  let side = 0;
  let c = a;
  for (let i = 0; i < 100; i++) {
    const next = (fa * b - fb * a) / (fa - fb);
    if (Math.abs(next - c) <= 1e-15 * span || b - a <= 1e-15 * span) return next;
    c = next;
    const fc = polyOf(p, n, c);
    if (fc === 0) return c;
    if (Math.sign(fc) === Math.sign(fb)) {
      b = c;
      fb = fc;
      if (side === -1) fa /= 2;
      side = -1;
    } else {
      a = c;
      fa = fc;
      if (side === 1) fb /= 2;
      side = 1;
    }
  }
  return c;
}

/** poly of the first n coefficients. */
function polyOf(c: ArrayLike<number>, n: number, u: number): number {
  let r = 0;
  for (let i = n - 1; i >= 0; i--) r = r * u + c[i]!;
  return r;
}

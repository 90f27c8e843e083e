// rootsIn as it was before the allocation-free form (core/beam/polynomial-roots.ts, d2b9e9c): kept as the
// reference the property test compares rootsInto with, root for root.
/**
 * Real roots of a polynomial (ascending coefficients in u) inside [lo, hi], ascending. The interval
 * is split at the roots of the derivative (found the same way), so each part is monotone and a sign
 * change there is bracketed and closed in on to machine precision.
 */
export function rootsInBefore(c: readonly number[], lo: number, hi: number): number[] {
  if (!(hi > lo)) return [];
  const span = Math.max(Math.abs(lo), Math.abs(hi), hi - lo);
  const size = c.map((k, i) => Math.abs(k) * span ** i);
  const scale = Math.max(0, ...size);
  if (scale === 0) return [];
  let degree = c.length - 1;
  while (degree > 0 && size[degree]! <= 1e-13 * scale) degree--;
  const p = c.slice(0, degree + 1);
  if (degree === 0) return [];
  if (degree === 1) {
    const u = -p[0]! / p[1]!;
    return u >= lo && u <= hi ? [u] : [];
  }
  const derivative = p.slice(1).map((k, i) => k * (i + 1));
  const edges = [lo, ...rootsInBefore(derivative, lo, hi), hi];
  const roots: number[] = [];
  const push = (u: number) => {
    if (roots.length === 0 || u - roots[roots.length - 1]! > 1e-12 * span) roots.push(u);
  };
  for (let k = 0; k < edges.length - 1; k++) {
    const a = edges[k]!;
    const b = edges[k + 1]!;
    const fa = poly(p, a);
    const fb = poly(p, b);
    if (fa === 0) push(a);
    if (fa === 0 || fb === 0 || Math.sign(fa) === Math.sign(fb)) continue;
    push(bracketed(p, a, b, fa, fb, span));
  }
  if (poly(p, hi) === 0) push(hi);
  return roots;
}

/** The root of a monotone part with a sign change, by the Illinois form of false position. */
function bracketed(p: readonly number[], a: number, b: number, fa: number, fb: number, span: number): number {
  let side = 0;
  let c = a;
  for (let i = 0; i < 100; i++) {
    const next = (fa * b - fb * a) / (fa - fb);
    if (Math.abs(next - c) <= 1e-15 * span || b - a <= 1e-15 * span) return next;
    c = next;
    const fc = poly(p, c);
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

function poly(c: readonly number[], u: number): number {
  let r = 0;
  for (let i = c.length - 1; i >= 0; i--) r = r * u + c[i]!;
  return r;
}

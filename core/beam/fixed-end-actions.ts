/**
 * Fixed-end actions of a prismatic element of length L with both ends fixed: the forces the two ends
 * exert on the element (F upward, M counter-clockwise), from any structural-analysis text (e.g.
 * AISC Manual Table 3-23 cases 15–17 for the point load; the others follow by integration).
 * Units: N, mm, N/mm, N·mm.
 */
export interface EndForces {
  F1: number;
  M1: number;
  F2: number;
  M2: number;
}

export const noEndForces = (): EndForces => ({ F1: 0, M1: 0, F2: 0, M2: 0 });

/** Downward point load P at a from the left end (b = L − a): F1 = P·b²(L + 2a)/L³, M1 = P·a·b²/L², M2 = −P·a²·b/L². */
export function pointLoadEndForces(P: number, a: number, L: number): EndForces {
  const b = L - a;
  return {
    F1: (P * b * b * (L + 2 * a)) / L ** 3,
    M1: (P * a * b * b) / L ** 2,
    F2: (P * a * a * (L + 2 * b)) / L ** 3,
    M2: -(P * a * a * b) / L ** 2,
  };
}

/**
 * Clockwise couple C at a: the derivative of the point-load actions with respect to a, times C
 * (a couple is the limit of two opposite forces): F1 = −6C·a·b/L³, M1 = C·b(b − 2a)/L², M2 = −C·a(2b − a)/L².
 */
export function coupleEndForces(C: number, a: number, L: number): EndForces {
  const b = L - a;
  return {
    F1: (-6 * C * a * b) / L ** 3,
    M1: (C * b * (b - 2 * a)) / L ** 2,
    F2: (6 * C * a * b) / L ** 3,
    M2: (-C * a * (2 * b - a)) / L ** 2,
  };
}

// Three-point Gauss–Legendre rule on [−1, 1]: exact for polynomials up to degree 5.
const GAUSS = [
  { t: -Math.sqrt(3 / 5), w: 5 / 9 },
  { t: 0, w: 8 / 9 },
  { t: Math.sqrt(3 / 5), w: 5 / 9 },
];

/**
 * Downward line load varying linearly from w0 at a0 to w1 at a1 (measured from the left end): the
 * point-load actions integrated over the loaded length. The integrand is of degree 4, so the
 * three-point Gauss rule is exact.
 */
export function lineLoadEndForces(a0: number, a1: number, w0: number, w1: number, L: number): EndForces {
  const out = noEndForces();
  const half = (a1 - a0) / 2;
  if (!(half > 0)) return out;
  for (const { t, w } of GAUSS) {
    const a = a0 + half * (t + 1);
    const intensity = w0 + ((w1 - w0) * (t + 1)) / 2;
    const f = pointLoadEndForces(intensity * half * w, a, L);
    out.F1 += f.F1;
    out.M1 += f.M1;
    out.F2 += f.F2;
    out.M2 += f.M2;
  }
  return out;
}

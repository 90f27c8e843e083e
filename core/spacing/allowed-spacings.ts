/**
 * Spacings a builder may be given, ascending, mm: multiples of the module, or the preferred list, within
 * the limits. Limits are compared with a relative tolerance of 1e-6, so a limit that is a module multiple
 * before a unit conversion stays one after it.
 */
export function allowedSpacings(p: { module: number | null; preferred: number[] | null; min: number; max: number }): number[] {
  const tol = 1e-6;
  if (p.preferred && p.preferred.length > 0) {
    return [...new Set(p.preferred)].filter((s) => s >= p.min * (1 - tol) && s <= p.max * (1 + tol)).sort((a, b) => a - b);
  }
  const module = p.module!;
  const out: number[] = [];
  for (let k = Math.ceil((p.min * (1 - tol)) / module); k * module <= p.max * (1 + tol); k++) if (k > 0) out.push(round(k * module));
  return out;
}

const round = (x: number) => Math.round(x * 1e9) / 1e9;

/** Largest allowed spacing not above s, or undefined when even the smallest is too large. */
export function largestAtMost(spacings: number[], s: number): number | undefined {
  const i = indexAtMost(spacings, s);
  return i >= 0 ? spacings[i] : undefined;
}

/** Index of the largest allowed spacing not above s, or −1. */
export function indexAtMost(spacings: number[], s: number): number {
  let lo = 0;
  let hi = spacings.length - 1;
  let found = -1;
  while (lo <= hi) {
    const mid = (lo + hi) >> 1;
    if (spacings[mid]! <= s * (1 + 1e-9)) {
      found = mid;
      lo = mid + 1;
    } else hi = mid - 1;
  }
  return found;
}

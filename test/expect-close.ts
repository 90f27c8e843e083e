import { expect } from "vitest";

/**
 * Asserts |actual − expected| ≤ max(rel·|expected|, abs) and prints both values, the difference and
 * the tolerance when it does not hold.
 */
export function expectClose(actual: number, expected: number, tolerance: { rel?: number; abs?: number } = {}, what = "value"): void {
  const rel = tolerance.rel ?? 1e-4;
  const abs = tolerance.abs ?? 0;
  const allowed = Math.max(rel * Math.abs(expected), abs);
  const delta = Math.abs(actual - expected);
  if (!(delta <= allowed)) {
    expect.fail(`${what}: got ${actual}, expected ${expected}, |Δ| = ${delta.toPrecision(3)} > tolerance ${allowed.toPrecision(3)} (rel ${rel}, abs ${abs})`);
  }
}

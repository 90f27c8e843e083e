import type { DesignResult } from "./schema/result.js";

/** Path of the first number in `value` that is not finite ("beam.perCombination[0].shear[3]"), or null. */
export function firstNonFinite(value: unknown): string | null {
  const keys = walk(value);
  if (keys === null) return null;
  return keys.reverse().map((k, i) => (typeof k === "number" ? `[${k}]` : i === 0 ? k : `.${k}`)).join("") || "(result)";
}

/** Keys leading to the first non-finite number, innermost first; null when every number is finite. */
function walk(x: unknown): (string | number)[] | null {
  if (typeof x === "number") return Number.isFinite(x) ? null : [];
  if (Array.isArray(x)) {
    if (x.length > 0 && typeof x[0] === "number") {
      const at = firstNotFiniteNumber(x);
      if (at === x.length) return null;
      if (at >= 0) return [at];
    }
    for (let i = 0; i < x.length; i++) {
      const v: unknown = x[i];
      // Most of a result is long arrays of numbers: checked here without a call each.
      if (typeof v === "number") {
        if (Number.isFinite(v)) continue;
        return [i];
      }
      const found = walk(v);
      if (found) return (found.push(i), found);
    }
    return null;
  }
  if (x !== null && typeof x === "object") {
    for (const k in x) {
      const v = (x as Record<string, unknown>)[k];
      if (typeof v === "number") {
        if (Number.isFinite(v)) continue;
        return [k];
      }
      if (typeof v !== "object" || v === null) continue;
      const found = walk(v);
      if (found) return (found.push(k), found);
    }
  }
  return null;
}

const seenFinite = new WeakSet<object>();

/**
 * True when `withFiniteVerdict` walked this very object and found every number finite, so that the edge
 * need not walk it again (a result is not changed after the design); false when unknown.
 */
export const knownFinite = (result: object): boolean => seenFinite.has(result);

/**
 * In an array that starts with a number (most of a result: values at stations), the index of the first
 * number that is not finite; the length when all are finite numbers; −1 at the first element that is not
 * a number (the caller walks the array). On its own, this loop reads arrays of numbers only, so it reads
 * them as numbers (no boxing of each one, as a loop that also meets arrays of objects does).
 */
function firstNotFiniteNumber(x: unknown[]): number {
  for (let i = 0; i < x.length; i++) {
    const v = x[i];
    if (typeof v !== "number") return -1;
    if (!Number.isFinite(v)) return i;
  }
  return x.length;
}

/**
 * The invariant at the end of the design: a result with a number that is not finite (an overflow, a
 * division by zero) cannot pass, whatever its checks say; it fails with the place of that number.
 */
export function withFiniteVerdict<R extends Pick<DesignResult, "status">>(result: R): R {
  const where = firstNonFinite(result);
  if (where === null) {
    seenFinite.add(result);
    return result;
  }
  const failure = `The result holds a number that is not finite (${where}): the job lies outside what this program can compute, and no part of the result can be relied on.`;
  return { ...result, status: { passes: false, summary: `${result.status.failures.length + 1} item(s) fail: see below.`, failures: [...result.status.failures, failure] } };
}

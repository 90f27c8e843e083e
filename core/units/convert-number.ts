import { fromCore, toCore, type Quantity, type UnitSystem } from "./quantity.js";

/**
 * Relative distance a converted number may keep from the exact conversion. Small enough that a
 * number of up to 9 significant figures comes back exactly (two such numbers differ by at least
 * 1e-9 of their size), large enough that the other system's number carries no visible noise.
 */
const CONVERSION_TOLERANCE = 2e-10;

/** The shortest decimal within the conversion tolerance of `exact` (both relative to the smaller). */
function shortestNear(exact: number, accept: (candidate: number) => boolean = () => true): number | undefined {
  for (let digits = 1; digits <= 17; digits++) {
    const candidate = Number(exact.toPrecision(digits));
    if (Math.abs(candidate - exact) <= CONVERSION_TOLERANCE * Math.min(Math.abs(candidate), Math.abs(exact)) && accept(candidate)) return candidate;
  }
  return undefined;
}

/** `x` without the noise of a unit conversion: the shortest decimal within the conversion tolerance (1600000.0000000002 → 1600000). */
export function withoutNoise(x: number): number {
  if (x === 0 || !Number.isFinite(x)) return x;
  return shortestNear(x) ?? x;
}

/**
 * One number of `from` in `to`: the shortest decimal near the exact conversion whose conversion back
 * is the number given, so that a round trip returns every number as it was entered.
 */
export function convertNumber(value: number, quantity: Quantity, from: UnitSystem, to: UnitSystem): number {
  if (from === to || value === 0 || !Number.isFinite(value)) return value;
  const there = (x: number) => fromCore(toCore(x, quantity, from), quantity, to);
  const back = (y: number) => fromCore(toCore(y, quantity, to), quantity, from);
  const exact = there(value);
  if (!Number.isFinite(exact)) return exact;
  return shortestNear(exact, (y) => shortestNear(back(y)) === value) ?? shortestNear(exact) ?? exact;
}

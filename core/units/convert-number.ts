import { quantityUnits, type Quantity, type UnitSystem } from "./quantity.js";

/**
 * Relative distance a converted number may keep from the exact conversion. Small enough that a
 * number of up to 9 significant figures comes back exactly (two such numbers differ by at least
 * 1e-9 of their size), large enough that the other system's number carries no visible noise.
 */
const CONVERSION_TOLERANCE = 2e-10;

/** A finite number's shortest decimal as an exact fraction m·10^e (m a BigInt). */
function decimal(x: number): { m: bigint; e: number } {
  const [mantissa, exponent] = Math.abs(x).toExponential().split("e") as [string, string];
  const [whole, fraction = ""] = mantissa.split(".");
  return { m: BigInt(whole + fraction), e: Number(exponent) - fraction.length };
}

/** a·10^ea and b·10^eb on a common exponent. */
function aligned(a: { m: bigint; e: number }, b: { m: bigint; e: number }): [bigint, bigint] {
  const e = Math.min(a.e, b.e);
  return [a.m * 10n ** BigInt(a.e - e), b.m * 10n ** BigInt(b.e - e)];
}

const product = (a: { m: bigint; e: number }, b: { m: bigint; e: number }) => ({ m: a.m * b.m, e: a.e + b.e });

/**
 * Whether c (in the target system, factor toFactor) is within the tolerance of x (factor fromFactor),
 * |c·f_to − x·f_from| ≤ tolerance × min(c·f_to, x·f_from), in exact decimal arithmetic: the test is
 * then the same whichever way the conversion runs, so a round trip finds the number it started from.
 */
function near(c: number, toFactor: number, x: number, fromFactor: number): boolean {
  const [p, q] = aligned(product(decimal(c), decimal(toFactor)), product(decimal(x), decimal(fromFactor)));
  const difference = p > q ? p - q : q - p;
  const smaller = p < q ? p : q;
  // CONVERSION_TOLERANCE = 2e-10.
  return difference * 10n ** 10n <= 2n * smaller;
}

/**
 * One number of `from` in `to`: the shortest decimal within the conversion tolerance of the exact
 * conversion. No two decimals of up to 9 significant figures are that close, and the test is exactly
 * symmetric, so converting back returns every such number as it was entered, and a converted number
 * converts back and forth to itself.
 */
export function convertNumber(value: number, quantity: Quantity, from: UnitSystem, to: UnitSystem): number {
  if (from === to || value === 0 || !Number.isFinite(value)) return value;
  const fromFactor = quantityUnits[quantity][from].factor;
  const toFactor = quantityUnits[quantity][to].factor;
  const exact = (value * fromFactor) / toFactor;
  if (!Number.isFinite(exact) || exact === 0) return exact;
  for (let digits = 1; digits <= 17; digits++) {
    const candidate = Number(exact.toPrecision(digits));
    if (candidate !== 0 && near(candidate, toFactor, value, fromFactor)) return candidate;
  }
  return exact;
}

/** `x` without the noise of binary arithmetic: the shortest decimal within the conversion tolerance (1600000.0000000002 → 1600000). */
export function withoutNoise(x: number): number {
  if (x === 0 || !Number.isFinite(x)) return x;
  for (let digits = 1; digits <= 17; digits++) {
    const candidate = Number(x.toPrecision(digits));
    if (Math.abs(candidate - x) <= CONVERSION_TOLERANCE * Math.min(Math.abs(candidate), Math.abs(x))) return candidate;
  }
  return x;
}

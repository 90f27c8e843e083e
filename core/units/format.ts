import { fromCore, unitLabel, type Quantity, type UnitSystem } from "./quantity.js";

const SUPERSCRIPT: Record<string, string> = { "-": "⁻", "0": "⁰", "1": "¹", "2": "²", "3": "³", "4": "⁴", "5": "⁵", "6": "⁶", "7": "⁷", "8": "⁸", "9": "⁹" };

/** A whole number as a superscript exponent: −5 → "⁻⁵". */
export const superscript = (n: number) => [...String(n)].map((c) => SUPERSCRIPT[c] ?? c).join("");

/** Below this fraction of its quantity's scale a value is rounding left over from the arithmetic, not a value. */
export const NOISE_FLOOR = 1e-9;

/** Digits grouped by thousands in the whole part: 769536667 → 769,536,667; 1234.5 → 1,234.5. */
const grouped = (text: string) => text.replace(/^(-?)(\d+)/, (_, sign: string, whole: string) => sign + whole.replace(/\B(?=(\d{3})+(?!\d))/g, ","));

/**
 * A number as a person reads it on a page or worksheet: `digits` significant figures (4 by default),
 * thousands separated, no floating-point noise, no exponent for everyday magnitudes (small ones as
 * 1.6×10⁻⁵), a true minus sign. Given `scale` (the largest magnitude of the same quantity, such as the
 * largest moment on the member), a value within NOISE_FLOOR of it shows as 0: −1.011×10⁻⁹ kN·m beside
 * 40 kN·m is rounding.
 */
export function formatNumber(value: number, digits = 4, scale?: number): string {
  if (!Number.isFinite(value)) return "—";
  if (value === 0 || Math.abs(value) < 1e-12) return "0";
  if (scale !== undefined && Number.isFinite(scale) && Math.abs(value) <= NOISE_FLOOR * Math.abs(scale)) return "0";
  const abs = Math.abs(value);
  let text: string;
  if (abs >= 10 ** digits) text = Math.round(value).toString();
  else if (abs < 1e-4) {
    const [mantissa, exponent] = value.toExponential(digits - 1).split("e") as [string, string];
    text = `${mantissa}×10${superscript(Number(exponent))}`;
  }
  else text = Number(value.toPrecision(digits)).toString();
  if (!text.includes("e") && !text.includes("×")) text = grouped(text);
  return text.replace(/^-/, "−");
}

export const withUnit = (value: number, unit: string, digits = 4) => `${formatNumber(value, digits)} ${unit}`;

/** A utilisation as a ratio with two decimals, e.g. 0.87. */
export const formatRatio = (value: number) => (Number.isFinite(value) ? value.toFixed(2) : "—");

/** A core-unit value as a person reads it in the job's own units: "38 mm", "1.5 in". */
export function inJobUnits(value: number, quantity: Quantity, units: UnitSystem): string {
  return `${formatNumber(fromCore(value, quantity, units))} ${unitLabel(quantity, units)}`;
}

/**
 * Two values that a message compares, each to the digits that tell them apart (at least `digits`, at
 * most 12): never "0.167 in is below the least size 0.167 in" when the values differ.
 */
export function formatCompared(a: number, b: number, digits = 4): [string, string] {
  for (let d = digits; d <= 12; d++) {
    const pair: [string, string] = [formatNumber(a, d), formatNumber(b, d)];
    if (pair[0] !== pair[1] || d === 12) return pair;
  }
  return [formatNumber(a, digits), formatNumber(b, digits)];
}

/** Two core-unit values of one quantity in the job's units, to the digits that tell them apart, units attached. */
export function comparedInJobUnits(a: number, b: number, quantity: Quantity, units: UnitSystem): [string, string] {
  const unit = unitLabel(quantity, units);
  const [ta, tb] = formatCompared(fromCore(a, quantity, units), fromCore(b, quantity, units));
  return [`${ta} ${unit}`, `${tb} ${unit}`];
}

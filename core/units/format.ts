import { fromCore, unitLabel, type Quantity, type UnitSystem } from "./quantity.js";

const SUPERSCRIPT: Record<string, string> = { "-": "⁻", "0": "⁰", "1": "¹", "2": "²", "3": "³", "4": "⁴", "5": "⁵", "6": "⁶", "7": "⁷", "8": "⁸", "9": "⁹" };

/** A whole number as a superscript exponent: −5 → "⁻⁵". */
export const superscript = (n: number) => [...String(n)].map((c) => SUPERSCRIPT[c] ?? c).join("");

/**
 * A number as a person reads it on a page or worksheet: `digits` significant figures (4 by default),
 * no floating-point noise, no exponent for everyday magnitudes (small ones as 1.6×10⁻⁵), a true minus sign.
 */
export function formatNumber(value: number, digits = 4): string {
  if (!Number.isFinite(value)) return "—";
  if (value === 0 || Math.abs(value) < 1e-12) return "0";
  const abs = Math.abs(value);
  let text: string;
  if (abs >= 10 ** digits) text = Math.round(value).toString();
  else if (abs < 1e-4) {
    const [mantissa, exponent] = value.toExponential(digits - 1).split("e") as [string, string];
    text = `${mantissa}×10${superscript(Number(exponent))}`;
  }
  else text = Number(value.toPrecision(digits)).toString();
  return text.replace(/^-/, "−");
}

export const withUnit = (value: number, unit: string, digits = 4) => `${formatNumber(value, digits)} ${unit}`;

/** A utilisation as a ratio with two decimals, e.g. 0.87. */
export const formatRatio = (value: number) => (Number.isFinite(value) ? value.toFixed(2) : "—");

/** A core-unit value as a person reads it in the job's own units: "38 mm", "1.5 in". */
export function inJobUnits(value: number, quantity: Quantity, units: UnitSystem): string {
  return `${formatNumber(fromCore(value, quantity, units))} ${unitLabel(quantity, units)}`;
}

import { formatNumber } from "../../core/index.js";
import { superscript } from "../../core/units/format.js";
import type { Quantity, UnitSystem } from "../../core/units/quantity.js";
import { shownLabels, shownValue, type Owner } from "../../core/units/shown-units.js";

/**
 * A number as printed on the worksheet, to `digits` significant figures: `formatNumber` for everyday
 * magnitudes (large ones rounded, 993519 → 993500); very large or very small values (I, Q/(I·t))
 * as a mantissa × a power of ten, so no column shows nine digits where four are meaningful.
 */
export function numberText(value: number, digits = 4): string {
  if (!Number.isFinite(value)) return "—";
  if (Math.abs(value) < 1e-12) return "0";
  const rounded = Number(value.toPrecision(digits));
  const abs = Math.abs(rounded);
  if (abs >= 1e-3 && abs < 1e7) return formatNumber(rounded, digits);
  let exponent = Math.floor(Math.log10(abs));
  let mantissa = Number((value / 10 ** exponent).toPrecision(digits));
  if (Math.abs(mantissa) >= 10) {
    mantissa /= 10;
    exponent += 1;
  }
  return `${formatNumber(mantissa, digits)}×10${superscript(exponent)}`;
}

/** Unit labels of the result, keyed by quantity kind ("length" → "mm"). */
export type UnitLabels = Record<string, string>;

/** Formats numbers of a given quantity kind with the unit attached. */
export function quantityText(labels: UnitLabels) {
  const unit = (kind: string) => labels[kind] ?? "";
  return {
    unit,
    /** `value` of quantity `kind`, unit attached; "ratio" prints a bare number. */
    of(value: number, kind: string, digits = 4): string {
      if (kind === "ratio") return numberText(value, digits);
      return `${numberText(value, digits)} ${unit(kind)}`.trim();
    },
    /** A range along the member, e.g. "0 – 0.7 m". */
    range(from: number, to: number, kind = "span"): string {
      return `${numberText(from)} – ${numberText(to)} ${unit(kind)}`;
    },
  };
}
export type QuantityText = ReturnType<typeof quantityText>;

/** Like `quantityText`, for values in the job's own units shown in the units of what they belong to (a steel grade's strengths in ksi). */
export function ownedText(system: UnitSystem, owner: Owner): QuantityText {
  const text = quantityText(shownLabels(system, owner));
  return {
    ...text,
    of: (value, kind, digits) => text.of(kind === "ratio" ? value : shownValue(value, kind as Quantity, system, owner), kind, digits),
  };
}


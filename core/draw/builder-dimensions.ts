import { formatNumber } from "../units/format.js";
import { fromCore, toCore, type UnitSystem } from "../units/quantity.js";

/**
 * Which way a dimension is rounded for the builder: a least distance (an end distance) up, a
 * greatest one (a spacing, a pitch) down, a position to the nearest mark.
 */
export type Rounding = "nearest" | "up" | "down";

const SIXTEENTHS = 16;
const TOLERANCE = 1e-6;

function roundTo(value: number, step: number, rounding: Rounding): number {
  const n = value / step;
  const whole = rounding === "up" ? Math.ceil(n - TOLERANCE) : rounding === "down" ? Math.floor(n + TOLERANCE) : Math.round(n);
  return whole * step;
}

function gcd(a: number, b: number): number {
  return b === 0 ? a : gcd(b, a % b);
}

/** Inches to the sixteenth as a tape reads: "2-1/2", "15/16", "3". */
export function inchesText(inches: number, rounding: Rounding = "nearest", joiner = "-"): string {
  const sixteenths = Math.round(roundTo(Math.abs(inches), 1 / SIXTEENTHS, rounding) * SIXTEENTHS);
  const whole = Math.floor(sixteenths / SIXTEENTHS);
  const rest = sixteenths % SIXTEENTHS;
  const sign = inches < 0 && sixteenths > 0 ? "−" : "";
  if (rest === 0) return `${sign}${whole}`;
  const d = gcd(rest, SIXTEENTHS);
  const fraction = `${rest / d}/${SIXTEENTHS / d}`;
  return `${sign}${whole > 0 ? `${whole}${joiner}` : ""}${fraction}`;
}

/** Feet and inches to the sixteenth: 2'-2", 14'-0", 0'-1 5/8". */
export function feetInchesText(inches: number, rounding: Rounding = "nearest"): string {
  const total = roundTo(inches, 1 / SIXTEENTHS, rounding);
  const feet = Math.floor((total + TOLERANCE) / 12);
  const rest = Math.max(0, total - feet * 12);
  return `${feet}'-${inchesText(rest, "nearest", " ")}"`;
}

/**
 * Dimensions as a builder reads them off a sheet, from numbers in a result's units (spans and
 * positions in m or ft, part sizes and spacings in mm or in): SI in whole millimetres throughout,
 * US positions in feet and inches and spacings in inches, both to the sixteenth.
 */
export interface BuilderDimensions {
  system: UnitSystem;
  /** Unit of positions along the member as printed: "mm" or "ft-in". */
  positionUnit: string;
  /** Unit of spacings as printed: "mm" or "in". */
  spacingUnit: string;
  /** A position along the member (span units), without a unit: "2167", "2'-2"". */
  position(x: number): string;
  /** A spacing, pitch or length across the member (length units), with its unit: "55 mm", "2-1/2 in". */
  length(value: number, rounding?: Rounding): string;
  /** The same without the unit, for a tight label: "55", "2-1/2". */
  bareLength(value: number, rounding?: Rounding): string;
  /** A length along the member (span units) with its unit: "1500 mm", "22'-4"". */
  run(value: number, rounding?: Rounding): string;
  /** Span units → length units (1000 for m → mm, 12 for ft → in). */
  spanToLength: number;
}

export function builderDimensions(system: UnitSystem): BuilderDimensions {
  const spanToLength = fromCore(toCore(1, "span", system), "length", system);
  if (system === "si") {
    const mm = (v: number, rounding: Rounding = "nearest") => formatNumber(roundTo(v, 1, rounding));
    return {
      system,
      positionUnit: "mm",
      spacingUnit: "mm",
      spanToLength,
      position: (x) => mm(x * spanToLength),
      length: (v, rounding) => `${mm(v, rounding)} mm`,
      bareLength: (v, rounding) => mm(v, rounding),
      run: (v, rounding) => `${mm(v * spanToLength, rounding)} mm`,
    };
  }
  return {
    system,
    positionUnit: "ft-in",
    spacingUnit: "in",
    spanToLength,
    position: (x) => (Math.abs(x) < TOLERANCE ? "0" : feetInchesText(x * spanToLength)),
    length: (v, rounding) => `${inchesText(v, rounding)} in`,
    bareLength: (v, rounding) => inchesText(v, rounding),
    run: (v, rounding) => feetInchesText(v * spanToLength, rounding),
  };
}

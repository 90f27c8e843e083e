// How numbers read on the page and the worksheet: significant figures, no floating-point noise, a true
// minus sign and powers of ten written as a person writes them. (Typography, common practice.)
import { describe, expect, test } from "vitest";
import { formatNumber, formatRatio, withUnit } from "../../../core/units/format.js";

describe("formatNumber", () => {
  test("four significant figures by default, with the noise of binary arithmetic gone", () => {
    expect(formatNumber(0.1 + 0.2)).toBe("0.3");
    expect(formatNumber(1724250)).toBe("1724250");
    expect(formatNumber(3.14159265)).toBe("3.142");
    expect(formatNumber(0.002241356)).toBe("0.002241");
    expect(formatNumber(12.5, 2)).toBe("13");
  });

  test("a true minus sign, and zero for what is rounding", () => {
    expect(formatNumber(-2.5)).toBe("−2.5");
    expect(formatNumber(1e-13)).toBe("0");
    expect(formatNumber(Number.NaN)).toBe("—");
    expect(formatNumber(Number.POSITIVE_INFINITY)).toBe("—");
  });

  test("small magnitudes as a power of ten with a superscript exponent, never 'e' or '^'", () => {
    expect(formatNumber(1.6e-5)).toBe("1.600×10⁻⁵");
    expect(formatNumber(-3.456e-12)).toBe("−3.456×10⁻¹²");
    expect(formatNumber(9.99e-5, 2)).toBe("1.0×10⁻⁴");
  });

  test("with a unit, and ratios with two decimals", () => {
    expect(withUnit(38, "mm")).toBe("38 mm");
    expect(formatRatio(0.8749)).toBe("0.87");
    expect(formatRatio(Number.NaN)).toBe("—");
  });
});

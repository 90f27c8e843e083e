// How numbers read on the page and the worksheet: significant figures, no floating-point noise, a true
// minus sign and powers of ten written as a person writes them. (Typography, common practice.)
import { describe, expect, test } from "vitest";
import { comparedInJobUnits, formatCompared, formatNumber, formatRatio, withUnit } from "../../../core/units/format.js";

describe("formatNumber", () => {
  test("four significant figures by default, with the noise of binary arithmetic gone", () => {
    expect(formatNumber(0.1 + 0.2)).toBe("0.3");
    expect(formatNumber(1724250)).toBe("1,724,250");
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

  test("thousands separated in the whole part, as a practitioner reads 769,536,667 mm⁴", () => {
    expect(formatNumber(769536667)).toBe("769,536,667");
    expect(formatNumber(1234.5)).toBe("1,235");
    expect(formatNumber(12345.67, 7)).toBe("12,345.67");
    expect(formatNumber(-4500)).toBe("−4,500");
    expect(formatNumber(999)).toBe("999");
    expect(formatNumber(0.5)).toBe("0.5");
  });

  test("a value within the noise floor of its quantity's scale is zero: a hogging moment of −1.011×10⁻⁹ beside 40", () => {
    expect(formatNumber(-1.011e-9, 4, 40)).toBe("0");
    expect(formatNumber(-1.011e-9)).toBe("−1.011×10⁻⁹");
    expect(formatNumber(-0.05, 4, 40)).toBe("−0.05");
  });

  test("two compared values are printed to the digits that tell them apart", () => {
    // 0.1666 in against 0.1667 in: four figures show both as 0.1666/0.1667; three would not.
    expect(formatCompared(0.16662, 0.16671, 3)).toEqual(["0.1666", "0.1667"]);
    expect(formatCompared(5, 5)).toEqual(["5", "5"]);
    expect(formatCompared(38, 40)).toEqual(["38", "40"]);
    // 4.2333 mm against 4.2345 mm in inches: 0.16667 and 0.16671 in.
    const [a, b] = comparedInJobUnits(4.2333, 4.2343, "length", "us");
    expect(a).not.toBe(b);
    expect(a.endsWith(" in") && b.endsWith(" in")).toBe(true);
  });

  test("with a unit, and ratios with two decimals", () => {
    expect(withUnit(38, "mm")).toBe("38 mm");
    expect(formatRatio(0.8749)).toBe("0.87");
    expect(formatRatio(Number.NaN)).toBe("—");
  });
});

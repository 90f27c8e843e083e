import { describe, expect, test } from "vitest";
import { firstNonFinite } from "../../core/finite-verdict.js";

describe("firstNonFinite", () => {
  test("names the first number that is not finite, in arrays of numbers, mixed arrays and objects", () => {
    expect(firstNonFinite({ a: [1, 2, 3], b: { c: 4 } })).toBeNull();
    expect(firstNonFinite({ a: [1, 2, NaN, Infinity] })).toBe("a[2]");
    expect(firstNonFinite({ a: [1, 2, { b: -Infinity }] })).toBe("a[2].b");
    expect(firstNonFinite({ a: [1, "x", 3, NaN] })).toBe("a[3]");
    expect(firstNonFinite({ a: [0.5, null, [1, NaN]] })).toBe("a[2][1]");
    expect(firstNonFinite({ a: { b: NaN } })).toBe("a.b");
    expect(firstNonFinite({ s: "text", n: null, t: true, a: [] })).toBeNull();
    expect(firstNonFinite([Infinity])).toBe("[0]");
    expect(firstNonFinite(NaN)).toBe("(result)");
    // Holes and numbers in an array made by length, as the beam's station values are.
    const stations = new Array<number>(4);
    stations[0] = 1;
    stations[1] = 2;
    expect(firstNonFinite({ v: stations })).toBeNull();
    stations[3] = NaN;
    expect(firstNonFinite({ v: stations })).toBe("v[3]");
  });
});

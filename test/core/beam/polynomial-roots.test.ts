import fc from "fast-check";
import { describe, expect, test } from "vitest";
import { rootsIn, rootsInto } from "../../../core/beam/polynomial-roots.js";
import { expectClose } from "../../expect-close.js";
import { rootsInBefore } from "./roots-before.js";

describe("rootsIn", () => {
  test("finds the three roots of (u − 1)(u − 2)(u − 4) inside [0, 5], and only those inside a narrower interval", () => {
    // (u − 1)(u − 2)(u − 4) = u³ − 7u² + 14u − 8
    const c = [-8, 14, -7, 1];
    const roots = rootsIn(c, 0, 5);
    expect(roots).toHaveLength(3);
    [1, 2, 4].forEach((r, i) => expectClose(roots[i]!, r, { rel: 1e-12 }));
    expect(rootsIn(c, 1.5, 3)).toHaveLength(1);
  });

  test("finds a double root where the polynomial touches zero, a root at an end, and none for a constant", () => {
    const touching = rootsIn([1, -2, 1], 0, 3); // (u − 1)²
    expect(touching).toHaveLength(1);
    expectClose(touching[0]!, 1, { abs: 1e-7 });
    expect(rootsIn([0, 1], 0, 1).map(Math.abs)).toEqual([0]);
    expect(rootsIn([3], 0, 1)).toEqual([]);
  });

  test("ignores leading coefficients too small to matter over the interval (a quintic that is really linear)", () => {
    const roots = rootsIn([-500, 1, 0, 0, 0, 1e-30], 0, 1000);
    expect(roots).toHaveLength(1);
    expectClose(roots[0]!, 500, { rel: 1e-9 });
  });

  test("rootsInto (and rootsIn, which calls it) gives the recursive form's roots bit for bit, without allocating (polynomials of degree up to 5, with repeated and zero coefficients)", () => {
    const coefficient = fc.oneof(fc.constantFrom(0, 1, -1, 2, -0.5), fc.double({ min: -1e6, max: 1e6, noNaN: true }));
    // Polynomials built from their roots, so that roots inside the interval are common.
    const fromRoots = fc.tuple(fc.array(fc.double({ min: -10, max: 60, noNaN: true }), { minLength: 1, maxLength: 4 }), fc.double({ min: -5, max: 5, noNaN: true })).map(([roots, k]) =>
      roots.reduce((c, r) => [...c.map((x, i) => x * -r + (c[i - 1] ?? 0)), c[c.length - 1]!], [k]),
    );
    const same = (c: number[], lo: number, hi: number) => {
      const out = new Float64Array(8);
      const count = rootsInto(c, c.length, lo, hi, out);
      expect(Array.from(out.subarray(0, count))).toEqual(rootsInBefore(c, lo, hi));
      expect(rootsIn(c, lo, hi)).toEqual(rootsInBefore(c, lo, hi));
    };
    fc.assert(
      fc.property(fc.oneof(fc.array(coefficient, { minLength: 1, maxLength: 6 }), fromRoots), fc.double({ min: -10, max: 10, noNaN: true }), fc.double({ min: 0, max: 100, noNaN: true }), (c, lo, width) => same(c, lo, lo + width)),
      { numRuns: 3000 },
    );
    // The constant term at the edge of the shortcut (|c0| = Σ|c_i|·h^i, give or take far less than its margin, or more).
    fc.assert(
      fc.property(fc.array(coefficient, { minLength: 2, maxLength: 5 }), fc.double({ min: 0.01, max: 100, noNaN: true }), fc.constantFrom(-1e-6, -1e-9, -1e-12, 0, 1e-12, 1e-9, 1e-6), fc.boolean(), (c, h, d, negative) => {
        const rest = c.slice(1).reduce((s, k, i) => s + Math.abs(k) * h ** (i + 1), 0);
        same([(negative ? -1 : 1) * rest * (1 + d), ...c.slice(1)], 0, h);
      }),
      { numRuns: 2000 },
    );
    // More coefficients than the scratch first holds (a member's pieces have at most 6): (u − 1)(u − 2)…(u − 9).
    const nine = [1, 2, 3, 4, 5, 6, 7, 8, 9].reduce((c, r) => [...c.map((x, i) => x * -r + (c[i - 1] ?? 0)), c[c.length - 1]!], [1]);
    expect(nine).toHaveLength(10);
    expect(rootsIn(nine, 0, 10)).toEqual(rootsInBefore(nine, 0, 10));
    expect(rootsIn(nine, 0, 10)).toHaveLength(9);
  });
});

import { describe, expect, test } from "vitest";
import { rootsIn } from "../../../core/beam/polynomial-roots.js";
import { expectClose } from "../../expect-close.js";

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
});

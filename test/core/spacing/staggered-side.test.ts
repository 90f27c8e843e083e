// The far side of a staggered intermittent fillet weld (the layout rule of this project, checked like any
// other rows): a segment at each end, as on the near side, and one midway between each two near-side ones.
// With a segment at each end on both sides, no far-side segment's tributary reaches past the member ends
// (common practice: intermittent welds start and end with a segment on both sides).
import fc from "fast-check";
import { describe, expect, test } from "vitest";
import { staggeredSide } from "../../../core/spacing/place-rows.js";
import { verifyRows } from "../../../core/spacing/verify-rows.js";
import { DemandCurve } from "../../../core/spacing/demand.js";
import { memberActions } from "../../../core/beam/member-actions.js";

describe("staggeredSide", () => {
  test("near segments at 25, 150, 275 mm → far side at 25, 87.5, 212.5, 275 mm (hand)", () => {
    expect(staggeredSide([25, 150, 275])).toEqual([25, 87.5, 212.5, 275]);
    expect(staggeredSide([100])).toEqual([100]);
    expect(staggeredSide([])).toEqual([]);
  });

  test("one more segment than the near side, the same end segments, each other one between two near ones", () => {
    fc.assert(
      fc.property(fc.uniqueArray(fc.integer({ min: 0, max: 100_000 }), { minLength: 2, maxLength: 60 }), (xs) => {
        const near = [...xs].sort((a, b) => a - b);
        const far = staggeredSide(near);
        expect(far.length).toBe(near.length + 1);
        expect(far[0]).toBe(near[0]);
        expect(far[far.length - 1]).toBe(near[near.length - 1]);
        for (let i = 1; i < far.length - 1; i++) {
          expect(far[i]!).toBeGreaterThan(near[i - 1]!);
          expect(far[i]!).toBeLessThan(near[i]!);
        }
      }),
    );
  });

  test("at an even pitch under a constant flow, the far side is never worse than the near side", () => {
    // A 1 000 mm stretch with constant demand: V = 1 N all along (equal and opposite forces at its ends)
    // and 1/100 of a segment's resistance per mm of flow per N.
    const L = 1000;
    const actions = memberActions(L, { points: [], lines: [], moments: [] }, [{ x: 0, R: 1, M: 0 }, { x: L, R: -1, M: 0 }]);
    const demand = new DemandCurve(L, [{ combination: "C", actions, k: 1 / 100 }]);
    const near = Array.from({ length: 11 }, (_, i) => 25 + i * 95); // 25 … 975 at a pitch of 95 mm
    const worst = (xs: number[]) => Math.max(...verifyRows(xs, demand).map((r) => r.utilisation));
    // Near side: the end segment reaches 25 + 47.5 = 72.5 mm, utilisation 0.725; interior 0.95.
    expect(worst(near)).toBeCloseTo(0.95, 9);
    expect(worst(staggeredSide(near))).toBeLessThanOrEqual(worst(near) + 1e-12);
  });
});

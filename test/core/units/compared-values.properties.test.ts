// Messages that compare two values print them to the digits that tell them apart, checked through
// prepareJob on a welded plate girder whose fillet is a hair below the least size. (Typography; the
// least size is AISC 360-16 Table J2.4: 3/16 in over 1/4 < t ≤ 1/2 in, [M].)
import fc from "fast-check";
import { describe, expect, test } from "vitest";
import { buildUpJob } from "../../../core/build-up/build-ups.js";
import { prepareJob } from "../../../core/check-job.js";
import { formatCompared, formatNumber } from "../../../core/units/format.js";

describe("compared values never print alike", () => {
  test("formatCompared: two different numbers give two different texts; grouping keeps the value", () => {
    fc.assert(
      fc.property(fc.double({ min: 1e-3, max: 1e9, noNaN: true }), fc.double({ min: 1e-9, max: 0.5, noNaN: true }), (a, e) => {
        const b = a * (1 - e);
        const [ta, tb] = formatCompared(a, b);
        expect(ta).not.toBe(tb);
        // The printed values keep their order, so "below" stays true as printed; separators only group digits.
        expect(Number(ta.replace(/,/g, ""))).toBeGreaterThan(Number(tb.replace(/,/g, "")));
        expect(formatNumber(a).replace(/,/g, "")).toBe(String(Number(a.toPrecision(4)) >= 1e4 ? Math.round(a) : Number(a.toPrecision(4))));
      }),
    );
  });

  test("a fillet below the least size: the message's two sizes differ", () => {
    fc.assert(
      fc.property(fc.double({ min: 1e-6, max: 0.3, noNaN: true }), (e) => {
        const job = buildUpJob("welded-plate-girder", "us", { webThickness: 0.375, flangeThickness: 0.75 }) as any;
        job.connectors[0].leg = 0.1875 * (1 - e);
        const prepared = prepareJob(job);
        expect(prepared.ok).toBe(false);
        if (prepared.ok) return;
        const issue = prepared.issues.find((i) => i.message.includes("below the least size"));
        expect(issue).toBeDefined();
        const sizes = [...issue!.message.matchAll(/([\d.,]+) in/g)].map((m) => m[1]);
        expect(sizes.length).toBeGreaterThanOrEqual(2);
        expect(sizes[0]).not.toBe(sizes[1]);
      }),
      { numRuns: 60 },
    );
  });
});

// A held group the job names (fastening.joints) on a member whose parts start and stop along it.
import { readFileSync } from "node:fs";
import { join } from "node:path";
import fc from "fast-check";
import { describe, expect, test } from "vitest";
import { prepareJob } from "../../../core/check-job.js";
import { designMember } from "../../../core/design-member.js";

const coverPlate = () => JSON.parse(readFileSync(join(import.meta.dirname, "../../../fixtures/examples/cover-plate-retrofit.us.json"), "utf8"));

const design = (job: unknown) => {
  const p = prepareJob(job);
  if (!p.ok) throw new Error(JSON.stringify(p.issues));
  return designMember(p.core);
};

describe("a named held group that runs over part of the member", () => {
  test("naming the cover plate's held group gives the schedule the joint search finds (it used to throw: the stretches without the plate made jointless copies)", () => {
    const found = design(coverPlate());
    const job = coverPlate();
    job.fastening.joints = [{ held: ["plate"], connector: "B34", rows: 2 }];
    const named = design(job);
    expect(named.joints.map((j) => [j.id, j.held, j.found])).toEqual([["plate", ["plate"], false]]);
    expect(named.schedules).toEqual(found.schedules);
  });

  test("property: wherever the plate starts and stops, a named held group designs without throwing and holds connectors only where the plate is", () => {
    fc.assert(
      fc.property(fc.integer({ min: 1, max: 240 }), fc.integer({ min: 24, max: 300 }), (start, length) => {
        const job = coverPlate();
        const span = job.beam.spans.reduce((s: number, l: number) => s + l, 0);
        const from = Math.min(start / 10, span - 2);
        const to = Math.min(from + length / 10, span);
        job.parts[0].extent = { from, to };
        job.fastening.joints = [{ held: ["plate"], connector: "B34", rows: 2 }];
        const result = design(job);
        for (const s of result.schedules) {
          for (const z of s.zones) {
            expect(z.from).toBeGreaterThanOrEqual(from * 304.8 - 1e-6);
            expect(z.to).toBeLessThanOrEqual(to * 304.8 + 1e-6);
          }
        }
      }),
      { numRuns: 12 },
    );
  });
});

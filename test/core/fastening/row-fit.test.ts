import { readFileSync } from "node:fs";
import fc from "fast-check";
import { describe, expect, test } from "vitest";
import { prepareJob } from "../../../core/check-job.js";
import { designMember } from "../../../core/design-member.js";
import type { JobInput } from "../../../core/schema/job.js";
import { expectClose } from "../../expect-close.js";
import { clone } from "../../job-builders.js";

// Issue 16 §2: the connectors of a row must fit side by side across the contact.
// 16d common nail: D = 0.162 in (REFERENCES §5.4) [V]. NDS-2018 §12.1.6 sets no numbers for nails ("sufficient to
// prevent splitting", REFERENCES §5 [V]); the code's spacing table takes edge 2.5D and 5D between rows [CP].
const D = 0.162 * 25.4;
const EDGE = 2.5 * D; // 10.29 mm [CP]
const ACROSS = 5 * D; // 20.57 mm [CP]
const WEB = 1.5 * 25.4; // a 2x web on edge: 1-1/2 in dressed (PS 20) [V]

const porch = (): JobInput => JSON.parse(readFileSync(new URL("../../../fixtures/examples/porch-beam-16d-nds.us.json", import.meta.url), "utf8")) as JobInput;

const design = (job: JobInput) => {
  const p = prepareJob(job);
  if (!p.ok) throw new Error(JSON.stringify(p.issues));
  return designMember(p.core);
};

describe("a row fits across its contact (issue 16 §2)", () => {
  test("three 16d nails across a 38 mm web edge need 2 × 2.5D + 2 × 5D = 61.7 mm: the joint fails with both widths [CP]", () => {
    const job = porch();
    job.fastening = { default: { connector: "N16", rows: 3 } };
    const result = design(job);
    const needed = 2 * EDGE + 2 * ACROSS; // 61.72 mm
    expectClose(needed, 61.72, { abs: 0.01 });
    for (const s of result.schedules) {
      expect(s.passes).toBe(false);
      expect(s.rowFit!.fits).toBe(false);
      expectClose(s.rowFit!.needed, needed, { rel: 1e-9 });
      expectClose(s.rowFit!.available, WEB, { rel: 1e-9 });
      expect(s.detailingProblems.join(" ")).toMatch(/need 2\.43 in across the contact .* only 1\.5 in wide/);
    }
    expect(result.status.passes).toBe(false);
    expect(result.status.failures.filter((f) => /a row does not fit across the contact/.test(f))).toHaveLength(2);
    // The check is the pipeline's, not a note to confirm.
    expect(result.warnings.filter((w) => /per row need/.test(w))).toEqual([]);
  });

  test("one 16d nail per row needs 2 × 2.5D = 20.6 mm and fits the 38.1 mm edge; two need 10D = 41.1 mm and do not [CP]", () => {
    const one = design(porch());
    for (const s of one.schedules) {
      expectClose(s.rowFit!.needed, 2 * EDGE, { rel: 1e-9 });
      expect(s.rowFit!.fits).toBe(true);
      expect(s.detailingProblems).toEqual([]);
    }
    const job = porch();
    job.fastening = { default: { connector: "N16", rows: 2 } };
    const two = design(job);
    for (const s of two.schedules) {
      expectClose(s.rowFit!.needed, 2 * EDGE + ACROSS, { rel: 1e-9 });
      expect(s.rowFit!.fits).toBe(false);
    }
  });

  test("two plies touching over 0.05 mm: no nail fits, and the member fails with the width available", () => {
    const job = porch();
    const overlap = 0.05 / 25.4; // in
    job.parts = [
      { id: "lower", name: "Lower 2x10", material: "DFL2", shape: { type: "rectangle", b: 1.5, h: 9.25 }, x: 0, y: 0 },
      { id: "upper", name: "Upper 2x10", material: "DFL2", shape: { type: "rectangle", b: 1.5, h: 9.25 }, x: 1.5, y: 9.25 - overlap },
    ];
    const result = design(job);
    expect(result.schedules).toHaveLength(1);
    const s = result.schedules[0]!;
    expectClose(s.rowFit!.available, 0.05, { rel: 1e-6 });
    expect(s.rowFit!.fits).toBe(false);
    expect(s.passes).toBe(false);
    expect(result.status.passes).toBe(false);
    expect(s.detailingProblems.join(" ")).toMatch(/needs 0\.81 in across the contact between "lower" and "upper" .* only 0\.001969 in wide.* make the contact at least 0\.81 in wide/);
  });

  test("generated webs, rows and nails: a schedule passes only if its row fits across the web edge, by hand [CP]", () => {
    fc.assert(
      fc.property(fc.integer({ min: 1, max: 4 }), fc.constantFrom(1.5, 2.5, 3.5), fc.constantFrom("8d common", "10d common", "16d common"), (rows, web, size) => {
        const job = clone(porch());
        job.parts = job.parts.map((p) => (p.id === "web" ? { ...p, shape: { type: "rectangle" as const, b: web, h: 9.25 }, x: (5.5 - web) / 2 } : p));
        job.connectors = [{ id: "N16", kind: "nail", standard: "NDS-2018", size }];
        job.fastening = { default: { connector: "N16", rows } };
        const result = design(job);
        // Common wire nail diameters, ASTM F1667 / NDS Table L4: 8d 0.131 in, 10d 0.148 in, 16d 0.162 in [M].
        const d = { "8d common": 0.131, "10d common": 0.148, "16d common": 0.162 }[size]! * 25.4;
        const needed = 2 * 2.5 * d + (rows - 1) * 5 * d;
        for (const s of result.schedules) {
          expectClose(s.rowFit!.available, web * 25.4, { rel: 1e-9 });
          if (needed > web * 25.4 * (1 + 1e-6)) {
            expect(s.passes).toBe(false);
            expect(result.status.passes).toBe(false);
          }
          if (s.passes) expect(needed).toBeLessThanOrEqual(web * 25.4 * (1 + 1e-6));
        }
      }),
      { numRuns: 30 },
    );
  });
});

import { readFileSync } from "node:fs";
import fc from "fast-check";
import { describe, expect, test } from "vitest";
import { prepareJob } from "../../../core/check-job.js";
import { designMember } from "../../../core/design-member.js";
import type { JobInput } from "../../../core/schema/job.js";
import type { Schedule } from "../../../core/schema/result.js";
import { clone, plankIJob } from "../../job-builders.js";
import { boltedPlates } from "../connector/connector-jobs.js";

const run = (job: JobInput) => {
  const p = prepareJob(job);
  if (!p.ok) throw new Error(JSON.stringify(p.issues));
  return designMember(p.core);
};

type Remedy = NonNullable<NonNullable<Schedule["infeasible"]>["remedies"]>[number];

/**
 * The job with one offered remedy applied, as a user would apply it; null for a factor on the resistance
 * of a connector whose resistance is computed (it is applied to rated connectors, whose resistance is given).
 */
function applied(job: JobInput, remedy: Remedy): JobInput | null {
  const next = clone(job);
  const connector = next.connectors[0] as Record<string, unknown>;
  if (remedy.change === "resistance" && typeof connector.resistance !== "number") return null;
  if (remedy.change === "rows") next.fastening.default!.rows = remedy.rows!;
  if (remedy.change === "size") connector.size = remedy.size!;
  if (remedy.change === "resistance") connector.resistance = (connector.resistance as number) * remedy.resistanceFactor!;
  return next;
}

/** Every offered remedy of every failing joint, applied and designed again through designMember, passes. */
function expectRemediesPass(job: JobInput, label: string) {
  const result = run(job);
  const failing = result.schedules.filter((s) => s.infeasible);
  expect(failing.length, `${label}: the invented member must fail`).toBeGreaterThan(0);
  const connector = job.connectors[0] as Record<string, unknown>;
  for (const s of failing) {
    const remedies = s.infeasible!.remedies ?? [];
    for (const remedy of remedies) {
      // Never the setting that just failed.
      if (remedy.change === "rows") expect(remedy.rows, label).not.toBe(s.rows);
      if (remedy.change === "size") expect(remedy.size, label).not.toBe(connector.size);
      if (remedy.change === "resistance") expect(remedy.resistanceFactor!, label).toBeGreaterThan(1);
      expect(remedy.utilisation, `${label}: ${remedy.change}`).toBeLessThanOrEqual(1 + 1e-9);
      const changed = applied(job, remedy);
      if (!changed) continue;
      const again = run(changed).schedules.find((t) => t.joint === s.joint)!;
      expect(again.passes, `${label}: ${JSON.stringify(remedy)} designed again`).toBe(true);
      expect(again.verification.maxUtilisation).toBeCloseTo(remedy.utilisation, 6);
      expect(again.count).toBe(remedy.count);
    }
    // Each kind of remedy is either offered with its utilisation or said not to pass.
    expect(s.infeasible!.options.some((o) => /connectors per row/.test(o)), label).toBe(true);
    for (const o of s.infeasible!.options.filter((t) => /designed again/.test(t))) expect(o, label).toMatch(/utilisation \d\.\d\d/);
  }
  return failing;
}

describe("remedies for a failing joint are designed before they are offered", () => {
  test("a plank I with too-weak rated nails: more per row and a stronger connector, each applied and designed again, pass", () => {
    const job = plankIJob();
    job.connectors = [{ id: "N", kind: "rated", label: "nail rated 100 N (invented)", resistance: 100, minSpacing: 40, maxSpacing: 600, endDistance: 30 }];
    const failing = expectRemediesPass(job, "plank I");
    const remedies = failing[0]!.infeasible!.remedies!;
    expect(remedies.map((r) => r.change)).toEqual(expect.arrayContaining(["rows", "resistance"]));
  });

  test("a porch beam of 16d nails (NDS-2018) loaded past them: the larger nail offered passes when designed again", () => {
    const job = JSON.parse(readFileSync(new URL("../../../fixtures/examples/porch-beam-16d-nds.us.json", import.meta.url), "utf8")) as JobInput;
    job.beam.loads = [{ type: "uniform", category: "dead", w: 160 }, { type: "uniform", category: "snow", w: 220 }];
    const failing = expectRemediesPass(job, "porch beam");
    const options = failing[0]!.infeasible!.options.join("\n");
    // A larger nail is offered only when it passes; otherwise a sentence says none does.
    expect(options).toMatch(/The next larger size that passes|No larger size of this connector/);
  });

  test("an overloaded plate bolted with 5/8 in bolts (AISC 360-16): every offered bolt size and row count passes designed again", () => {
    const job = boltedPlates({ kind: "steel-bolt", standard: "AISC-360-16", size: "5/8", grade: "A" }, "us", 1);
    job.beam.loads = [{ type: "uniform", category: "dead", w: 2200 }];
    expectRemediesPass(job, "bolted plates");
  });

  test("property: invented members with too-weak connectors — each offered remedy, applied, passes (fast-check, fixed seed)", () => {
    fc.assert(
      fc.property(
        fc.record({
          span: fc.double({ min: 2, max: 7, noNaN: true }),
          w: fc.double({ min: 0.5, max: 4, noNaN: true }),
          resistance: fc.double({ min: 60, max: 400, noNaN: true }),
          minSpacing: fc.integer({ min: 20, max: 60 }),
          endDistance: fc.integer({ min: 10, max: 60 }),
          symmetric: fc.boolean(),
        }),
        (g) => {
          const job = clone(plankIJob());
          job.beam = { spans: [g.span], loads: [{ type: "uniform", category: "dead", w: g.w }], selfWeight: false };
          job.connectors = [{ id: "N", kind: "rated", label: "rated (invented)", resistance: g.resistance, minSpacing: g.minSpacing, maxSpacing: 600, endDistance: g.endDistance }];
          job.spacing = { module: 5, minZoneLength: 200, maxZonesPerSpan: 5, symmetric: g.symmetric };
          const result = run(job);
          if (!result.schedules.some((s) => s.infeasible)) return;
          expectRemediesPass(job, JSON.stringify(g));
        },
      ),
      { numRuns: 15 },
    );
  });
});

import { describe, expect, test } from "vitest";
import { prepareJob } from "../../../core/check-job.js";
import { designMember } from "../../../core/design-member.js";
import type { JobInput } from "../../../core/schema/job.js";
import { expectClose } from "../../expect-close.js";
import { clone, plankIJob } from "../../job-builders.js";

// Three-plank I (REFERENCES §3.4): I = 16.20e6 mm⁴, Q = 120 000 mm³, R = 100 N per nail [D].
// A central 0.5 kN load on 4 m gives |V| = 250 N on both halves, so s_req = R·I/(V·Q) = 54.0 mm exactly (§3.4 table at V = 250 N).
function checkJob(spacing: number, mode: "check" | "design" = "check"): JobInput {
  const job = clone(plankIJob());
  job.mode = mode;
  job.beam = { spans: [4], loads: [{ type: "point", P: 0.5, at: 2 }], selfWeight: false };
  job.fastening = { default: { connector: "N", rows: 1, provided: { type: "zones", zones: [{ from: 0, to: 4, spacing }] } } };
  return job;
}

const run = (job: JobInput) => {
  const p = prepareJob(job);
  if (!p.ok) throw new Error(JSON.stringify(p.issues));
  return designMember(p.core);
};

describe("check mode", () => {
  test("a schedule at exactly the required 54.0 mm passes with every row at utilisation 1.00 (REFERENCES §3.4 [D])", () => {
    const result = run(checkJob(54));
    expect(result.mode).toBe("check");
    for (const s of result.schedules) {
      expect(s.mode).toBe("check");
      expectClose(s.verification.maxUtilisation, 1, { rel: 1e-9 });
      expect(s.passes).toBe(true);
      expect(s.zones).toHaveLength(1);
      expect(s.perCombination).toHaveLength(result.beam.combinations.length);
    }
    expect(result.status.passes).toBe(true);
  });

  test("the same schedule 1 % too sparse fails, names the zone's failing combination and fails the member", () => {
    const result = run(checkJob(54 * 1.01));
    for (const s of result.schedules) {
      expectClose(s.verification.maxUtilisation, 1.01, { rel: 1e-6 });
      expect(s.passes).toBe(false);
      expect(s.zones[0]!.failingCombinations.length).toBeGreaterThan(0);
    }
    expect(result.status.passes).toBe(false);
    expect(result.status.failures[0]).toMatch(/row of the given schedule is over-utilised/);
  });

  test("a spacing below the connector's minimum is reported as a detailing problem even when strong enough", () => {
    const result = run(checkJob(8));
    const s = result.schedules[0]!;
    expect(s.verification.passes).toBe(true);
    expect(s.detailingProblems[0]).toMatch(/below the minimum 10 mm/);
    expect(s.passes).toBe(false);
  });

  test("check mode without a provided schedule, or with zones that leave a gap, is refused at the field", () => {
    const missing = checkJob(54);
    delete missing.fastening.default.provided;
    const a = prepareJob(missing);
    expect(a.ok).toBe(false);
    if (!a.ok) expect(a.issues.map((i) => i.path)).toContain("fastening.default.provided");
    const gap = checkJob(54);
    gap.fastening.default.provided = { type: "zones", zones: [{ from: 0, to: 1.5, spacing: 54 }, { from: 2, to: 4, spacing: 54 }] };
    const b = prepareJob(gap);
    expect(b.ok).toBe(false);
    if (!b.ok) expect(b.issues).toContainEqual({ path: "fastening.default.provided.zones[1].from", message: "must be 1.5 m: zones run from the left end to the right end without gaps or overlaps" });
  });

  test("design mode ignores a provided schedule and lays out its own", () => {
    const result = run(checkJob(54, "design"));
    expect(result.schedules[0]!.mode).toBe("design");
    expect(result.schedules[0]!.zones.every((z) => z.spacing <= 54 + 1e-9)).toBe(true);
  });
});

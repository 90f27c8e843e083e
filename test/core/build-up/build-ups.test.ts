import { describe, expect, test } from "vitest";
import { buildUpJob, buildUps, defaultSizes } from "../../../core/build-up/build-ups.js";
import { prepareJob } from "../../../core/check-job.js";
import { designMember } from "../../../core/design-member.js";

describe("jobs from a typical build-up", () => {
  for (const units of ["si", "us"] as const) {
    for (const b of buildUps) {
      test(`${b.name} (${units}) is a valid job that designs`, () => {
        const prepared = prepareJob(buildUpJob(b.id, units));
        if (!prepared.ok) expect(prepared.issues).toEqual([]);
        expect(prepared.ok).toBe(true);
        if (!prepared.ok) return;
        const result = designMember(prepared.core);
        expect(result.joints.length).toBeGreaterThan(0);
      });
    }
  }

  for (const units of ["si", "us"] as const) {
    test(`side-by-side plies with a steel plate between (${units}) is a valid job that designs`, () => {
      const prepared = prepareJob(buildUpJob("side-by-side-plies", units, { plate: units === "us" ? 0.375 : 10 }));
      if (!prepared.ok) expect(prepared.issues).toEqual([]);
      if (!prepared.ok) return;
      expect(designMember(prepared.core).joints.length).toBeGreaterThan(0);
    });
  }

  test("the sizes given replace the defaults, and the same sizes give the same job", () => {
    const a = buildUpJob("nailed-box", "si", { depth: 500, span: 6 });
    expect(a.parts.map((p) => p.shape)).toContainEqual({ type: "rectangle", b: 18, h: 500 });
    expect(a.beam.spans).toEqual([6]);
    expect(buildUpJob("nailed-box", "si", { depth: 500, span: 6 })).toEqual(a);
  });

  test("no two parts share one shape object (an edit of one would change the other)", () => {
    for (const b of buildUps) {
      const shapes = buildUpJob(b.id, "si").parts.map((p) => p.shape);
      expect(new Set(shapes).size).toBe(shapes.length);
    }
  });

  test("laminations and plies follow the count; a plate sits between the first two plies", () => {
    expect(buildUpJob("glued-laminations", "si", { count: 4 }).parts).toHaveLength(4);
    const plies = buildUpJob("side-by-side-plies", "us", { count: 3, plate: 0.5 });
    expect(plies.parts.map((p) => p.id)).toEqual(["ply-1", "plate", "ply-2", "ply-3"]);
    // 2x12 dressed width 11.25 in (PS 20 dry sizes [M]).
    expect(plies.parts[1]!.shape).toEqual({ type: "rectangle", b: 0.5, h: 11.25 });
    expect(Object.keys(defaultSizes(buildUps[0]!, "us"))).toContain("flangeLumber");
  });
});

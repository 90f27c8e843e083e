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

  test("a flitch beam: a plate shallower than the plies sits centred on their depth, held by one joint of bolts in double shear", () => {
    const job = buildUpJob("side-by-side-plies", "us", { count: 2, plate: 0.5, plateDepth: 11 });
    expect(job.parts.map((p) => p.id)).toEqual(["ply-1", "plate", "ply-2"]);
    expect(job.parts[1]!.shape).toEqual({ type: "rectangle", b: 0.5, h: 11 });
    expect(job.parts[1]!.place).toMatchObject({ on: "ply-1", side: "right", align: "centre" });
    expect(job.fastening.joints).toEqual([{ held: ["plate"], connector: "B", rows: 2 }]);
    expect(job.connectors).toEqual([expect.objectContaining({ id: "B", shear: "double" })]);
    const prepared = prepareJob(job);
    if (!prepared.ok) expect(prepared.issues).toEqual([]);
    if (!prepared.ok) return;
    const plate = prepared.core.parts.find((p) => p.id === "plate") as { y?: number } | undefined;
    // 2x12 dressed 11.25 in (PS 20 [M]): the 11 in plate's bottom (11.25 − 11)/2 = 0.125 in up [D].
    expect((plate?.y ?? NaN) / 25.4).toBeCloseTo(0.125, 9);
    const result = designMember(prepared.core);
    expect(result.joints.map((j) => j.id)).toEqual(["plate"]);
    expect(result.multiPly?.interfaces.map((i) => i.joint)).toEqual(["plate", "plate"]);
  });
});

import { describe, expect, test } from "vitest";
import { runDesign } from "../../../server/design-service.js";
import { inputChanges, resultChanges } from "../../../server/store/compare-revisions.js";
import { example } from "./store-fixtures.js";

describe("inputChanges", () => {
  test("inputChanges(a, a) is empty", () => {
    expect(inputChanges(example("workshop-box-beam.si"), example("workshop-box-beam.si"))).toEqual([]);
  });

  test("inputChanges(a, b) reports a changed number, an added and a removed field at their paths", () => {
    const a = { beam: { spans: [4], loads: [{ w: 1 }] }, member: { mark: "B-1", date: "2025-01-01" } };
    const b = { beam: { spans: [4, 3], loads: [{ w: 2 }] }, member: { mark: "B-1", description: "x" } };
    expect(inputChanges(a, b)).toEqual([
      { path: "beam.spans[1]", change: "added", from: null, to: 3 },
      { path: "beam.loads[0].w", change: "changed", from: 1, to: 2 },
      { path: "member.date", change: "removed", from: "2025-01-01", to: null },
      { path: "member.description", change: "added", from: null, to: "x" },
    ]);
  });

  test("inputChanges matches parts by id, so inserting a part reports that part, not every one after it", () => {
    const a = example("workshop-box-beam.si");
    const b = example("workshop-box-beam.si");
    const extra = { ...structuredClone(b.parts[0]), id: "cover" };
    b.parts.splice(1, 0, extra);
    b.parts[2].name = "renamed";
    const changes = inputChanges(a, b);
    expect(changes.map((c) => [c.path, c.change])).toEqual([
      ["parts[1]", "added"],
      ["parts[2].name", "changed"],
    ]);
  });

  test("inputChanges with rel treats numbers a conversion left a hair apart as equal", () => {
    expect(inputChanges({ h: 100 }, { h: 100 * (1 + 1e-13) }, { rel: 1e-9 })).toEqual([]);
    expect(inputChanges({ h: 100 }, { h: 100.001 }, { rel: 1e-9 })).toHaveLength(1);
  });

  test("a value of another type is one change at its path", () => {
    expect(inputChanges({ rows: 1 }, { rows: [1] })).toEqual([{ path: "rows", change: "changed", from: 1, to: [1] }]);
  });
});

describe("resultChanges", () => {
  test("resultChanges(r, r) marks every joint, zone, bond line and check the same", () => {
    const { result } = runDesign(example("workshop-box-beam.si"));
    const changes = resultChanges(result, result);
    expect(changes.schedules.length).toBe(result.schedules.length);
    expect(changes.schedules.every((s) => s.change === "same" && s.zones.every((z) => z.change === "same" && z.fields.length === 0))).toBe(true);
    expect(changes.checks.every((c) => c.change === "same")).toBe(true);
  });

  test("a heavier load shows as more connectors and higher utilisation at each joint", () => {
    const job = example("workshop-box-beam.si");
    const before = runDesign(job).result;
    job.beam.loads[0].w *= 1.5;
    const after = runDesign(job).result;
    const changes = resultChanges(before, after);
    expect(changes.connectors.to!).toBeGreaterThan(changes.connectors.from!);
    for (const s of changes.schedules) {
      expect(s.change).toBe("changed");
      expect(s.count.to!).toBeGreaterThan(s.count.from!);
    }
    const bending = changes.checks.find((c) => /bending/i.test(c.title))!;
    expect(bending.utilisation.to!).toBeGreaterThan(bending.utilisation.from!);
  });

  test("a joint glued in one revision and nailed in the other is removed from the schedules and added to the bond lines", () => {
    const { result } = runDesign(example("workshop-box-beam.si"));
    const glued = { ...result, schedules: result.schedules.slice(1), bondLines: [{ ...result.schedules[0]!, joint: result.schedules[0]!.joint, utilisation: 0.5, passes: true } as never] };
    const changes = resultChanges(result, glued);
    expect(changes.schedules.find((s) => s.joint === result.schedules[0]!.joint)).toMatchObject({ change: "removed", count: { to: null } });
    expect(changes.bondLines).toMatchObject([{ change: "added", utilisation: { from: null, to: 0.5 } }]);
  });
});

import fc from "fast-check";
import { describe, expect, test } from "vitest";
import { prepareJob } from "../../../core/check-job.js";
import { designMember } from "../../../core/design-member.js";
import { edgeIncrementIn, SteelBolt, steelBoltKind } from "../../../core/connector/steel-bolt.js";
import { expectClose } from "../../expect-close.js";
import "../../fast-check-setup.js";
import { boltedPlates } from "./connector-jobs.js";
import { context, IN, KIP, KSI, member, steel } from "./contexts.js";

// AISC 360-16 §J3.4 with Table J3.5 [M]: the least edge distance of an oversized or slotted hole is that of
// a standard hole (Table J3.4 [V]: 1 in for a 3/4 in bolt, 1-1/8 in for 7/8, 1-1/4 in for 1) plus C₂:
// oversized 1/16 in (d ≤ 7/8), 1/8 in (d ≥ 1); short slots across the edge 1/8 in (d ≤ 1), 3/16 in (d ≥ 1-1/8);
// long slots across the edge 3/4 d; slots along the edge 0. Hole sizes of Table J3.3 [V]: 3/4 in bolt,
// short slot 13/16 × 1 in, long slot 13/16 × 1-7/8 in. §J3.10 [V]: tear-out 1.2 l_c t F_u, φ = 0.75, with
// l_c the clear distance along the load to the hole's edge. Numbers worked by hand [D].
const plate = (tIn: number) => member(`plate ${tIn} in`, steel(58 * KSI), tIn * IN, 12 * IN);
const ctx = context(plate(0.5), plate(0.5), { basis: "factored", units: "us" });
const bolt = (fields: Record<string, unknown>) => SteelBolt.parse({ id: "b", kind: "steel-bolt", standard: "AISC-360-16", size: "3/4", grade: "A", ...fields });
const mode = (r: ReturnType<typeof steelBoltKind.resistance>, start: string) => r.modes!.find((m) => m.mode.startsWith(start))!.value / KIP;

describe("AISC 360-16 Table J3.5 edge distance increment C₂", () => {
  test.each([
    [0.75, "oversized", 1 / 16, 1 / 16],
    [1, "oversized", 1 / 8, 1 / 8],
    [0.75, "short-slot-parallel", 1 / 8, 0],
    [1.125, "short-slot-parallel", 3 / 16, 0],
    [0.875, "short-slot-transverse", 0, 1 / 8],
    [0.75, "long-slot-parallel", 0.5625, 0],
    [1, "long-slot-transverse", 0, 0.75],
    [0.75, "standard", 0, 0],
  ] as const)("d = %s in, %s holes: C₂ %s in at the ends, %s in at the sides [M]", (d, hole, end, edge) => {
    expect(edgeIncrementIn(d, hole)).toEqual({ end, edge });
  });
  test("the least end distance of a 3/4 in bolt in a long slot along the load is 1 + 0.5625 = 1.5625 in; 1.5 in given is refused at endDistance", () => {
    const d = steelBoltKind.detailing(bolt({ holeType: "long-slot-parallel" }), ctx);
    expectClose(d.endDistance / IN, 1.5625, { rel: 1e-12 });
    expectClose(d.edgeDistance! / IN, 1, { rel: 1e-12 });
    const problems = steelBoltKind.problems!(bolt({ holeType: "long-slot-parallel", endDistance: 1.5 * IN }), ctx);
    expect(problems).toEqual([expect.objectContaining({ field: "endDistance", message: expect.stringContaining("Table J3.5") })]);
  });
  test("a 7/8 in bolt in short slots across the load needs 1-1/8 + 1/8 = 1.25 in at the sides; 1.2 in is refused at edgeDistance", () => {
    const problems = steelBoltKind.problems!(bolt({ size: "7/8", holeType: "short-slot-transverse", edgeDistance: 1.2 * IN }), ctx);
    expect(problems.map((p) => p.on === "connector" && p.field)).toEqual(["edgeDistance"]);
  });
});

describe("AISC 360-16 §J3.10 tear-out on the clear distances of a slotted hole", () => {
  test("3/4 in Group A, long slot along the load, 1/2 in plates of 58 ksi, least distances: end l_c = 1.5625 − 1.875/2 = 0.625 in → 0.75 × 1.2 × 0.625 × 0.5 × 58 = 16.3125 kip; between bolts l_c = 2.25 − 1.875 = 0.375 in → 9.7875 kip, which governs [D]", () => {
    const r = steelBoltKind.resistance(bolt({ holeType: "long-slot-parallel" }), ctx);
    expectClose(mode(r, "tear-out at the end bolt"), 16.3125, { rel: 1e-9 });
    expectClose(mode(r, "tear-out between bolts"), 9.7875, { rel: 1e-9 });
    expectClose(r.value / KIP, 9.7875, { rel: 1e-9 });
    const lc = r.steps.find((s) => s.symbol === "l_c,end")!;
    expectClose(lc.value / IN, 0.625, { rel: 1e-9 });
  });
  test("the same bolt at an end distance of 2 in given: l_c = 2 − 0.9375 = 1.0625 in → 0.75 × 1.2 × 1.0625 × 0.5 × 58 = 27.73 kip at the end [D]", () => {
    const r = steelBoltKind.resistance(bolt({ holeType: "long-slot-parallel", endDistance: 2 * IN }), ctx);
    expectClose(mode(r, "tear-out at the end bolt"), 0.75 * 1.2 * 1.0625 * 0.5 * 58, { rel: 1e-9 });
    expectClose(mode(r, "tear-out at the end bolt"), 27.73125, { rel: 1e-9 });
  });
  test("short slot across the load: the hole along the load is the standard 13/16 in, end l_c = 1 − 13/32 = 0.59375 in → 15.497 kip [D]", () => {
    const r = steelBoltKind.resistance(bolt({ holeType: "short-slot-transverse" }), ctx);
    expectClose(mode(r, "tear-out at the end bolt"), 0.75 * 1.2 * 0.59375 * 0.5 * 58, { rel: 1e-9 });
  });
});

describe("property: through designMember, every AISC bolt row keeps Table J3.4 + C₂ from the member's ends, and no tear-out uses a clear distance the holes do not leave", () => {
  // Table J3.4 least edge distance by size [V] and C₂ at the ends by Table J3.5 [M], written out here.
  const standardEdge: Record<string, number> = { "5/8": 0.875, "3/4": 1, "7/8": 1.125, "1": 1.25 };
  const diameter: Record<string, number> = { "5/8": 0.625, "3/4": 0.75, "7/8": 0.875, "1": 1 };
  const endIncrement = (size: string, hole: string) => {
    const d = diameter[size]!;
    if (hole === "oversized") return d <= 0.875 ? 1 / 16 : 1 / 8;
    if (hole === "short-slot-parallel") return 1 / 8;
    if (hole === "long-slot-parallel") return 0.75 * d;
    return 0;
  };
  test("over sizes and hole types", () => {
    fc.assert(
      fc.property(fc.constantFrom("5/8", "3/4", "7/8", "1"), fc.constantFrom("standard", "oversized", "short-slot-transverse", "short-slot-parallel", "long-slot-transverse", "long-slot-parallel"), (size, holeType) => {
        const p = prepareJob(boltedPlates({ kind: "steel-bolt", standard: "AISC-360-16", size, grade: "A", holeType }, "us", 1));
        if (!p.ok) throw new Error(JSON.stringify(p.issues));
        const result = designMember(p.core);
        const least = (standardEdge[size]! + endIncrement(size, holeType)) * IN;
        for (const s of result.schedules) {
          if (s.positions.length === 0) continue;
          expect(s.positions[0]!).toBeGreaterThanOrEqual(least - 1e-6);
          expect(10 * 12 * IN - s.positions[s.positions.length - 1]!).toBeGreaterThanOrEqual(least - 1e-6);
          for (const r of s.resistance) for (const step of r.steps.filter((x) => x.symbol.startsWith("l_c"))) expect(step.value).toBeGreaterThan(0);
        }
      }),
      { numRuns: 24 },
    );
  });
});

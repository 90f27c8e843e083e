import fc from "fast-check";
import { describe, expect, test } from "vitest";
import { simpleSpanReactions } from "../../../core/beam/analyse-beam.js";
import { memberActions, type LoadSet } from "../../../core/beam/member-actions.js";
import { allowedSpacings } from "../../../core/spacing/allowed-spacings.js";
import { checkSchedule } from "../../../core/spacing/check-schedule.js";
import { demandCurve } from "../../../core/spacing/design-schedule.js";
import { boundaryGrid, CellMaxima, evaluateZone, planZones, type ZoningProblem } from "../../../core/spacing/zoning.js";
import { expectClose } from "../../expect-close.js";

const curveFor = (L: number, loads: LoadSet, resistance: number, flowFactor = 1e-3) => {
  const actions = memberActions(L, loads, simpleSpanReactions(loads, 0, L));
  return demandCurve({ length: L, combinations: [{ id: "C", actions, resistance }], flowFactor, lines: 1, rows: 1 });
};

describe("planZones", () => {
  test("the optimiser's count equals a brute-force enumeration of every zoning on a small grid", () => {
    fc.assert(
      fc.property(
        fc.record({
          L: fc.integer({ min: 1500, max: 6000 }),
          w: fc.double({ min: 0.5, max: 10, noNaN: true }),
          P: fc.double({ min: 0, max: 20_000, noNaN: true }),
          at: fc.double({ min: 0.05, max: 0.95, noNaN: true }),
          R: fc.double({ min: 300, max: 3000, noNaN: true }),
          maxZones: fc.integer({ min: 1, max: 4 }),
          minZone: fc.constantFrom(0, 300, 700),
        }),
        (m) => {
          const demand = curveFor(m.L, { points: [{ x: m.at * m.L, P: m.P }], moments: [], lines: [{ x0: 0, x1: m.L, w0: m.w, w1: m.w }] }, m.R);
          const grid = boundaryGrid(m.L, m.L / 9);
          const cells = new CellMaxima(grid, grid.slice(0, -1).map((a, i) => demand.maxOver(a, grid[i + 1]!).value));
          const problem: ZoningProblem = {
            length: m.L,
            demand: (a, b) => cells.over(a, b),
            spacings: allowedSpacings({ module: 5, preferred: null, min: 20, max: 400 }),
            endDistance: 25,
            minZoneLength: m.minZone,
            maxZones: m.maxZones,
            mirrored: false,
            grid,
          };
          const plan = planZones(problem);
          // Brute force: every set of interior boundaries with at most maxZones − 1 of them.
          const n = grid.length - 1;
          let best = Infinity;
          for (let mask = 0; mask < 1 << (n - 1); mask++) {
            const inner = Array.from({ length: n - 1 }, (_, i) => i + 1).filter((i) => (mask >> (i - 1)) & 1);
            if (inner.length + 1 > m.maxZones) continue;
            const cuts = [0, ...inner, n];
            let cost = 0;
            for (let k = 0; k < cuts.length - 1 && cost < Infinity; k++) {
              const z = evaluateZone(problem, grid[cuts[k]!]!, grid[cuts[k + 1]!]!, cuts[k] === 0, cuts[k + 1] === n);
              cost = z ? cost + z.cost : Infinity;
            }
            best = Math.min(best, cost);
          }
          const planCost = plan.zones.reduce((s, z) => {
            const e = evaluateZone(problem, z.from, z.to, z.from === 0, z.to === m.L)!;
            return s + e.cost;
          }, 0);
          expectClose(planCost, best, { abs: 1e-6 }, "DP cost vs brute force");
        },
      ),
      { numRuns: 60 },
    );
  });
});

describe("checkSchedule", () => {
  // Constant |V| between a support and a central load: s_req = n·R/(V·Q/I) exactly.
  const L = 4000;
  const P = 20_000;
  const R = 500;
  const flowFactor = 1e-3;
  const sRequired = R / ((P / 2) * flowFactor); // 50 mm
  const demand = curveFor(L, { points: [{ x: L / 2, P }], moments: [], lines: [] }, R, flowFactor);

  test("a schedule exactly at the required spacing passes with utilisation 1.00", () => {
    const check = checkSchedule({ demand, rows: 1, lines: 1, endDistance: 0, provided: { zones: [{ from: 0, to: L, spacing: sRequired }] } });
    expectClose(Math.max(...check.rowChecks.map((r) => r.utilisation)), 1, { rel: 1e-9 });
    expect(check.zones.every((z) => z.passes)).toBe(true);
  });

  test("a schedule 1 % too sparse in one zone fails there, and the other zones pass", () => {
    const check = checkSchedule({
      demand,
      rows: 1,
      lines: 1,
      endDistance: 0,
      provided: {
        zones: [
          { from: 0, to: 1000, spacing: sRequired },
          { from: 1000, to: 3000, spacing: sRequired * 1.01 },
          { from: 3000, to: L, spacing: sRequired },
        ],
      },
    });
    expect(check.zones.map((z) => z.passes)).toEqual([true, false, true]);
    expectClose(check.zones[1]!.utilisation, 1.01, { rel: 1e-6 });
    expect(check.zones[1]!.failingCombinations).toEqual(["C"]);
    expect(check.perCombination[0]!.maxUtilisation).toBeGreaterThan(1);
  });

  test("explicit positions are checked row by row and shown as runs of equal spacing", () => {
    const positions = Array.from({ length: 81 }, (_, i) => i * sRequired);
    const check = checkSchedule({ demand, rows: 1, lines: 1, endDistance: 0, provided: { positions } });
    expect(check.zones).toHaveLength(1);
    expectClose(check.zones[0]!.spacing, 50, { rel: 1e-12 });
    expect(check.zones[0]!.passes).toBe(true);
  });
});

import fc from "fast-check";
import { describe, expect, test } from "vitest";
import { prepareJob } from "../../../core/check-job.js";
import { designMember } from "../../../core/design-member.js";
import { simpleSpanReactions } from "../../../core/beam/analyse-beam.js";
import { memberActions } from "../../../core/beam/member-actions.js";
import { demandCurve } from "../../../core/spacing/design-schedule.js";
import { verifyRows } from "../../../core/spacing/verify-rows.js";
import type { JobInput } from "../../../core/schema/job.js";
import { expectClose } from "../../expect-close.js";
import { clone, plankIJob } from "../../job-builders.js";

const design = (job: JobInput) => {
  const prepared = prepareJob(job);
  if (!prepared.ok) throw new Error(JSON.stringify(prepared.issues));
  return designMember(prepared.core);
};

describe("required spacing s = n·R/q along the span", () => {
  test("three-plank I, 4 m span, w = 250 N/m, R = 100 N: s_req at five stations (REFERENCES §3.4 [D])", () => {
    const result = design(plankIJob());
    const joint = result.joints.find((j) => j.id === "top")!;
    expectClose(result.section.secondMoment, 16.2e6, { rel: 1e-9 }, "I");
    expectClose(joint.firstMoment, 120_000, { rel: 1e-12 }, "Q");
    const schedule = result.schedules.find((s) => s.joint === "top")!;
    const expected: [number, number, number][] = [
      [0, 3.7037, 27.0],
      [500, 2.7778, 36.0],
      [1000, 1.8519, 54.0],
      [1500, 0.92593, 108.0],
      [1900, 0.18519, 540.0],
    ];
    for (const [x, q, s] of expected) {
      const i = result.beam.stations.findIndex((st) => Math.abs(st - x) < 1e-6);
      expect(i, `station ${x} mm`).toBeGreaterThanOrEqual(0);
      expectClose(schedule.shearFlow[i]!, q, { rel: 1e-4 }, `q at ${x} mm`);
      expectClose(schedule.requiredSpacing[i]!, s, { rel: 1e-4 }, `s_req at ${x} mm`);
    }
  });

  test("the same I on two continuous 4 m spans: s_req = 21.60 mm at the interior support (V = 5wL/8) and 36.00 mm at the ends (V = 3wL/8) (REFERENCES §3.5 [D])", () => {
    const job = plankIJob();
    job.beam = { spans: [4, 4], loads: [{ type: "uniform", category: "dead", w: 0.25 }], selfWeight: false };
    const result = design(job);
    const schedule = result.schedules.find((s) => s.joint === "top")!;
    const at = (x: number) => result.beam.stations.map((st, i) => [st, i] as const).filter(([st]) => Math.abs(st - x) < 1e-6).map(([, i]) => schedule.requiredSpacing[i]!);
    expectClose(Math.min(...at(4000)), 21.6, { rel: 1e-4 }, "s_req at the interior support");
    expectClose(at(0)[0]!, 36.0, { rel: 1e-4 }, "s_req at the left end");
    expectClose(at(8000)[0]!, 36.0, { rel: 1e-4 }, "s_req at the right end");
    expect(schedule.verification.passes).toBe(true);
  });

  test("the zones are symmetric about midspan and each zone's spacing is no larger than its smallest required spacing", () => {
    const schedule = design(plankIJob()).schedules[0]!;
    const zones = schedule.zones;
    for (let i = 0; i < zones.length; i++) {
      const mirror = zones[zones.length - 1 - i]!;
      expectClose(zones[i]!.from, 4000 - mirror.to, { abs: 1e-9 });
      expectClose(zones[i]!.spacing, mirror.spacing, { abs: 1e-12 });
      expect(zones[i]!.spacing).toBeLessThanOrEqual(zones[i]!.requiredSpacing! + 1e-9);
    }
    expect(zones[0]!.spacing).toBeLessThanOrEqual(27);
    expect(schedule.verification.passes).toBe(true);
    expect(schedule.efficiency.countOverLowerBound!).toBeGreaterThanOrEqual(1);
  });

  test("Gere 7e Prob. 5.11-4 box: nails F = 1200 N at s = 100 mm on two lines allow V = f·I/Q = 10.65 kN (REFERENCES §3.2 [V] answer 10.7 kN / [D])", () => {
    const I = 411.125e6;
    const Q = 926_250;
    const V = (((2 * 1200) / 100) * I) / Q;
    expectClose(V, 10_652.6, { rel: 1e-5 });
    // A 2 m span with a central load 2V: |V| is constant, so rows at 100 mm are exactly fully used.
    const L = 2000;
    const loads = { points: [{ x: 1000, P: 2 * V }], moments: [], lines: [] };
    const actions = memberActions(L, loads, simpleSpanReactions(loads, 0, L));
    const demand = demandCurve({ length: L, combinations: [{ id: "U", actions, resistance: 1200 }], flowFactor: Q / I, lines: 2, rows: 1 });
    const rows = Array.from({ length: 21 }, (_, i) => i * 100);
    const interior = verifyRows(rows, demand).slice(1, -1).filter((r) => Math.abs(r.x - 1000) > 1);
    for (const r of interior) expectClose(r.utilisation, 1, { rel: 1e-9 }, `row at ${r.x}`);
  });

  test("US timber T of two 2x8 with 16d common nails, Z′ = 141 lb: q = 46.42 lb/in and s = 3.04 in at V = 300 lb (REFERENCES §3.6 [D]; Z from NDS-2005 Table 11N [V])", () => {
    const job: JobInput = {
      ...plankIJob(),
      units: "us",
      materials: [{ id: "W", name: "DF-L", E: 1_600_000, density: 0 }],
      parts: [
        { id: "web", material: "W", shape: { type: "rectangle", b: 1.5, h: 7.25 }, x: 2.875, y: 0 },
        { id: "flange", material: "W", shape: { type: "rectangle", b: 7.25, h: 1.5 }, x: 0, y: 7.25 },
      ],
      connectors: [{ id: "N", kind: "rated", label: "16d common", resistance: 141, minSpacing: 1, maxSpacing: 24 }],
      // A 10 ft span with a central 600 lbf load gives V = 300 lbf on each side.
      beam: { spans: [10], loads: [{ type: "point", P: 600, at: 5 }], selfWeight: false },
      spacing: { module: 0.25, minZoneLength: 12, maxZonesPerSpan: 5, symmetric: true },
    };
    const result = design(job);
    const schedule = result.schedules[0]!;
    // Any station between the support and the load has V = 300 lbf; results here are in core units.
    const i = result.beam.stations.findIndex((x) => x > 0 && x < 1524);
    const toLbfPerIn = 25.4 / 4.4482216152605;
    expectClose(schedule.shearFlow[i]! * toLbfPerIn, 46.417, { rel: 1e-4 }, "q, lbf/in");
    expectClose(schedule.requiredSpacing[i]! / 25.4, 3.038, { rel: 1e-3 }, "s, in");
    expect(schedule.zones.every((z) => z.spacing / 25.4 <= 3.038)).toBe(true);
  });
});

describe("designMember schedules on random members (property-based)", () => {
  const member = fc.record({
    span: fc.double({ min: 1, max: 9, noNaN: true }),
    w: fc.double({ min: 0, max: 8, noNaN: true }),
    P: fc.double({ min: 0, max: 20, noNaN: true }),
    at: fc.double({ min: 0, max: 1, noNaN: true }),
    resistance: fc.double({ min: 200, max: 3000, noNaN: true }),
    rows: fc.integer({ min: 1, max: 3 }),
    module: fc.constantFrom(1, 5, 10, 25),
    maxZones: fc.integer({ min: 1, max: 7 }),
    symmetric: fc.boolean(),
  });

  test("every placed row carries its tributary demand in every combination, and every spacing respects the limits and the module", () => {
    fc.assert(
      fc.property(member, (m) => {
        const job = clone(plankIJob());
        job.beam = { spans: [m.span], loads: [{ type: "uniform", w: m.w }, { type: "point", P: m.P, at: m.at * m.span }], selfWeight: true };
        job.materials = [{ id: "W", name: "Timber", E: 10_000, density: 450 }];
        job.connectors = [{ id: "N", kind: "rated", label: "rated nail", resistance: m.resistance, minSpacing: 20, maxSpacing: 300, endDistance: 15 }];
        job.fastening = { default: { connector: "N", rows: m.rows } };
        job.spacing = { module: m.module, minZoneLength: 200, maxZonesPerSpan: m.maxZones, symmetric: m.symmetric };
        const result = design(job);
        for (const s of result.schedules) {
          for (const z of s.zones) {
            expect(z.spacing).toBeGreaterThanOrEqual(20 - 1e-9);
            expect(z.spacing).toBeLessThanOrEqual(300 + 1e-9);
            expectClose(z.spacing / m.module, Math.round(z.spacing / m.module), { abs: 1e-9 }, "on the module");
          }
          const positions = s.positions;
          for (let k = 1; k < positions.length; k++) expect(positions[k]! - positions[k - 1]!).toBeLessThanOrEqual(300 + 1e-6);
          if (!s.infeasible) {
            expect(s.verification.maxUtilisation).toBeLessThanOrEqual(1 + 1e-9);
            expect(s.passes).toBe(true);
            expect(s.count).toBeGreaterThanOrEqual(Math.floor(s.efficiency.lowerBound - 1e-9));
          } else {
            expect(s.passes).toBe(false);
          }
        }
      }),
      { numRuns: 60 },
    );
  });
});

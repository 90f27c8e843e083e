import { readFileSync, readdirSync } from "node:fs";
import fc from "fast-check";
import { describe, expect, test } from "vitest";
import { prepareJob } from "../../../core/check-job.js";
import { designMember } from "../../../core/design-member.js";
import { placeRows } from "../../../core/spacing/place-rows.js";
import type { JobInput } from "../../../core/schema/job.js";
import { convertJob } from "../../../core/units/convert-job.js";
import { clone, plankIJob } from "../../job-builders.js";

const folder = new URL("../../../fixtures/examples/", import.meta.url);
const examples = readdirSync(folder).filter((f) => f.endsWith(".json"));

const design = (input: unknown) => {
  const p = prepareJob(input);
  if (!p.ok) throw new Error(JSON.stringify(p.issues));
  return { job: p.job, result: designMember(p.core) };
};

/** Gaps between consecutive rows, mm. */
const gapsOf = (positions: number[]) => positions.slice(1).map((x, k) => x - positions[k]!);

// A gap may fall short of the minimum spacing by rounding only (positions are sums of spacings).
const TOLERANCE = 1e-6;

describe("no two rows closer than the minimum spacing", () => {
  for (const file of examples) {
    test(`${file}, in its own units and converted: every gap ≥ the joint's minimum spacing, and every row carries its tributary`, () => {
      const own = design(JSON.parse(readFileSync(new URL(file, folder), "utf8")));
      const other = design(convertJob(own.job, own.job.units === "si" ? "us" : "si"));
      for (const { job, result } of [own, other]) {
        for (const s of result.schedules) {
          const gaps = gapsOf(s.positions);
          const least = Math.min(...gaps);
          expect(least, `${file} (${job.units}) joint ${s.joint}: least gap ${least} against ${s.limits.minSpacing}`).toBeGreaterThanOrEqual(s.limits.minSpacing - TOLERANCE);
          expect(s.detailingProblems, `${file} (${job.units}) joint ${s.joint}`).toEqual([]);
          expect(s.verification.passes, `${file} (${job.units}) joint ${s.joint}`).toBe(true);
        }
      }
    });
  }

  test("the opening example (nailed box beam): before this rule, rows fell 10 mm apart against a 35 mm minimum where zones met", () => {
    const { result } = design(JSON.parse(readFileSync(new URL("workshop-box-beam.si.json", folder), "utf8")));
    for (const s of result.schedules) {
      expect(s.limits.minSpacing).toBe(35); // the job's connector minimum (fixture)
      expect(Math.min(...gapsOf(s.positions))).toBeGreaterThanOrEqual(35 - TOLERANCE);
    }
  });

  test("placeRows: zones whose boundaries fall off the spacing never give a gap below the minimum, and the end rows stay at the end distance", () => {
    // Invented zones of the kind zoning returns: round boundaries, spacings on a 5 mm module, minimum 35.
    const zones = [
      { from: 0, to: 400, spacing: 35 },
      { from: 400, to: 1500, spacing: 55 },
      { from: 1500, to: 3200, spacing: 130 },
      { from: 3200, to: 4100, spacing: 65 },
      { from: 4100, to: 4800, spacing: 40 },
    ];
    const rows = placeRows(zones, 4800, 20, false, 35);
    expect(rows[0]).toBe(20);
    expect(rows[rows.length - 1]).toBe(4780);
    for (const g of gapsOf(rows)) expect(g).toBeGreaterThanOrEqual(35 - TOLERANCE);
    // Each gap is at most the larger spacing of the zones it touches, plus the minimum where a short gap was shared.
    for (const g of gapsOf(rows)) expect(g).toBeLessThanOrEqual(130 + 35);
  });

  test("a mirrored plan is placed symmetrically about midspan, with no gap below the minimum", () => {
    const zones = [
      { from: 0, to: 700, spacing: 45 },
      { from: 700, to: 3300, spacing: 120 },
      { from: 3300, to: 4000, spacing: 45 },
    ];
    for (const minGap of [40, 45]) {
      const rows = placeRows(zones, 4000, 25, true, minGap);
      rows.forEach((x, k) => expect(x + rows[rows.length - 1 - k]!).toBeCloseTo(4000, 9));
      for (const g of gapsOf(rows)) expect(g).toBeGreaterThanOrEqual(minGap - TOLERANCE);
    }
  });

  test("end row governs: a constant shear flow with e > s/2 gives an end zone at s ≤ 2(s_q − e) and says why (closed form [D])", () => {
    // Point load P at midspan of L: |V| = P/2 everywhere, q = V·Q/I constant, s_q = R/q.
    // Three-plank I of REFERENCES §3.4: I = 16.2e6 mm⁴, Q = 120 000 mm³ [D].
    const job = plankIJob();
    const P = 4000; // N, invented
    job.beam = { spans: [4], loads: [{ type: "point", category: "dead", at: 2, P: P / 1000 }], selfWeight: false };
    job.connectors = [{ id: "N", kind: "rated", label: "nail rated 100 N", resistance: 100, minSpacing: 10, maxSpacing: 600, endDistance: 30 }];
    const q = ((P / 2) * 120_000) / 16.2e6; // 14.815 N/mm
    const sFlow = 100 / q; // 6.75 mm: below the minimum, so raise R
    expect(sFlow).toBeLessThan(10);
    job.connectors[0] = { ...job.connectors[0]!, resistance: 1000 } as JobInput["connectors"][number];
    const sq = 1000 / q; // 67.5 mm
    const { result } = design(job);
    const s = result.schedules.find((x) => x.joint === "top")!;
    expect(s.passes).toBe(true);
    const end = s.zones[0]!;
    // The end row carries e + s/2 ≤ s_q, so s ≤ 2(s_q − e) = 75 mm would be allowed by the end row: the flow along
    // the zone (s ≤ 67.5, 1 mm module → 67) governs here, and no note is needed.
    expect(end.spacing).toBeLessThanOrEqual(sq);
    // With e = 45 mm the end row needs s ≤ 2(67.5 − 45) = 45 mm: the end row governs and the zone says so.
    job.connectors[0] = { ...job.connectors[0]!, endDistance: 45 } as JobInput["connectors"][number];
    const governed = design(job).result.schedules.find((x) => x.joint === "top")!;
    expect(governed.passes).toBe(true);
    const z = governed.zones[0]!;
    expect(z.spacing).toBeLessThanOrEqual(2 * (sq - 45) + 1e-9);
    expect(z.note).toMatch(/End row governs/);
    expect(governed.zones[governed.zones.length - 1]!.note).toMatch(/End row governs/);
    expect(Math.min(...gapsOf(governed.positions))).toBeGreaterThanOrEqual(10 - TOLERANCE);
  });

  test("check mode: given rows closer than the minimum spacing fail, with the gap and the minimum", () => {
    const job = plankIJob();
    job.mode = "check";
    job.fastening = { default: { connector: "N", rows: 1, provided: { type: "positions", positions: [0.01, 0.03, 0.035, 0.1, 0.2, 0.3, 0.5, 0.8, 1.2, 1.8, 2.2, 2.8, 3.2, 3.5, 3.7, 3.8, 3.9, 3.97, 3.99] } } };
    const { result } = design(job);
    const s = result.schedules.find((x) => x.joint === "top")!;
    expect(s.passes).toBe(false);
    expect(s.detailingProblems.join(" ")).toMatch(/shorter than the minimum spacing of 10 mm/);
    expect(s.detailingProblems.join(" ")).toMatch(/5 mm between the rows at 30 mm and 35 mm/);
  });
});

describe("property: designed rows keep the minimum spacing and pass their tributary check (fast-check, fixed seed)", () => {
  test("generated plank I members: every gap ≥ the minimum spacing; a passing design has every row at utilisation ≤ 1", () => {
    fc.assert(
      fc.property(
        fc.record({
          span: fc.double({ min: 1.2, max: 9, noNaN: true }),
          w: fc.double({ min: 0.05, max: 3, noNaN: true }),
          point: fc.option(fc.record({ at: fc.double({ min: 0.05, max: 0.95, noNaN: true }), P: fc.double({ min: 0.1, max: 6, noNaN: true }) }), { nil: undefined }),
          resistance: fc.double({ min: 150, max: 2500, noNaN: true }),
          minSpacing: fc.integer({ min: 8, max: 60 }),
          endDistance: fc.integer({ min: 0, max: 80 }),
          module: fc.constantFrom(1, 5, 10),
          symmetric: fc.boolean(),
          zones: fc.integer({ min: 1, max: 6 }),
        }),
        (g) => {
          const job = clone(plankIJob());
          job.beam = {
            spans: [g.span],
            loads: [{ type: "uniform", category: "dead", w: g.w }, ...(g.point ? [{ type: "point" as const, category: "live", at: g.point.at * g.span, P: g.point.P }] : [])],
            selfWeight: false,
          };
          job.connectors = [{ id: "N", kind: "rated", label: "rated", resistance: g.resistance, minSpacing: g.minSpacing, maxSpacing: 600, endDistance: g.endDistance }];
          job.spacing = { module: g.module, minZoneLength: 100, maxZonesPerSpan: g.zones, symmetric: g.symmetric };
          const p = prepareJob(job);
          if (!p.ok) throw new Error(JSON.stringify(p.issues));
          const result = designMember(p.core);
          for (const s of result.schedules) {
            for (const gap of gapsOf(s.positions)) expect(gap).toBeGreaterThanOrEqual(s.limits.minSpacing - TOLERANCE);
            if (!s.infeasible) expect(s.verification.maxUtilisation, `joint ${s.joint}`).toBeLessThanOrEqual(1 + 1e-9);
          }
        },
      ),
      { numRuns: 60 },
    );
  });
});

describe("property: a joint is reported as no schedule carrying it only when rows at the minimum spacing throughout fail too (fast-check, fixed seed)", () => {
  test("generated plank I members near their connectors' limit", () => {
    fc.assert(
      fc.property(
        fc.record({
          span: fc.double({ min: 1.5, max: 8, noNaN: true }),
          w: fc.double({ min: 0.5, max: 3, noNaN: true }),
          resistance: fc.double({ min: 150, max: 900, noNaN: true }),
          minSpacing: fc.integer({ min: 8, max: 40 }),
          endDistance: fc.integer({ min: 0, max: 60 }),
          symmetric: fc.boolean(),
        }),
        (g) => {
          const job = clone(plankIJob());
          job.beam = { spans: [g.span], loads: [{ type: "uniform", category: "dead", w: g.w }], selfWeight: false };
          job.connectors = [{ id: "N", kind: "rated", label: "rated", resistance: g.resistance, minSpacing: g.minSpacing, maxSpacing: 600, endDistance: g.endDistance }];
          job.spacing = { module: 1, minZoneLength: 100, maxZonesPerSpan: 5, symmetric: g.symmetric };
          const zoned = design(job).result;
          if (!zoned.schedules.some((s) => s.infeasible)) return;
          const uniform = clone(job);
          uniform.spacing = { ...uniform.spacing, maxZonesPerSpan: 1, maximum: g.minSpacing };
          const atMinimum = design(uniform).result;
          zoned.schedules.forEach((s, i) => {
            if (s.infeasible) expect(atMinimum.schedules[i]!.passes, `joint ${s.joint}: the minimum spacing throughout passes`).toBe(false);
          });
        },
      ),
      { numRuns: 30 },
    );
  });
});

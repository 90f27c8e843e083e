import fc from "fast-check";
import { afterAll, describe, expect, test } from "vitest";
import { prepareJob } from "../../../core/check-job.js";
import { designMember } from "../../../core/design-member.js";
import type { JobInput } from "../../../core/schema/job.js";
import { expectClose } from "../../expect-close.js";

// Side loads passed across side-by-side plies, as whole members through designMember. Hand calculations [D]
// on three and four 2x12 plies (38 × 286 mm, REFERENCES §10 [V]) of one E, so each ply carries 1/n of the
// load (shares by E·I [D]); a load on the left face crosses interface k with (n − k)/n of it. The connector
// resistance R⊥ = 600 N per nail is a rated value chosen as a round number; 2 nails per row: s = 2·600/|T|.
function plies(n: number, loads: JobInput["beam"]["loads"], connector: Record<string, unknown> = {}, rows = 2): JobInput {
  return {
    format: "stitchplan-job",
    version: 1,
    units: "si",
    basis: "allowable",
    project: { name: "Side loads across plies" },
    member: { mark: "H-2" },
    materials: [{ id: "T", name: "timber", E: 11_000, density: 0 }],
    parts: Array.from({ length: n }, (_, i) => ({ id: `p${i + 1}`, material: "T", shape: { type: "rectangle" as const, b: 38, h: 286 }, ...(i === 0 ? { x: 0, y: 0 } : { place: { on: `p${i}`, side: "right" as const } }) })),
    connectors: [{ id: "N", kind: "rated", label: "nail rated 600 N", resistance: 600, minSpacing: 50, maxSpacing: 600, endDistance: 50, ...connector } as JobInput["connectors"][number]],
    fastening: { default: { connector: "N", rows } },
    beam: { spans: [4], loads, selfWeight: false },
    spacing: { module: 25, minZoneLength: 250, maxZonesPerSpan: 5, symmetric: false },
  };
}

const run = (job: JobInput) => {
  const p = prepareJob(job);
  if (!p.ok) throw new Error(JSON.stringify(p.issues));
  return designMember(p.core);
};

/** The schedules at interfaces 1, 2, … of the plies, with the required spacing at a station. */
function interfaces(result: ReturnType<typeof designMember>) {
  return result.multiPly!.interfaces.map((i) => {
    const s = result.schedules.find((x) => x.joint === i.joint)!;
    const at = (x: number) => s.requiredSpacing[result.beam.stations.findIndex((y) => Math.abs(y - x) < 1e-6)] ?? null;
    return { s, at, flow: (x: number) => s.shearFlow[result.beam.stations.findIndex((y) => Math.abs(y - x) < 1e-6)]! };
  });
}

describe("uniform side loads across plies (moved from the stand-alone side-load module onto whole members)", () => {
  test("3 plies, 6 N/mm on the left face, 2 nails of 600 N per row: T = 4 and 2 N/mm, s = 2·600/4 = 300 mm and 2·600/2 = 600 mm [D]", () => {
    const result = run(plies(3, [{ type: "uniform", w: 6, face: "left" }]));
    const [i1, i2] = interfaces(result);
    expectClose(Math.max(...i1!.s.shearFlow), 4, { rel: 1e-9 });
    expectClose(Math.max(...i2!.s.shearFlow), 2, { rel: 1e-9 });
    expectClose(i1!.s.requiredSpacing.find((v) => v !== null)!, 300, { rel: 1e-9 });
    expectClose(i2!.s.requiredSpacing.find((v) => v !== null)!, 600, { rel: 1e-9 });
    expect(Math.max(...i1!.s.zones.map((z) => z.spacing))).toBeLessThanOrEqual(300);
    expect(Math.max(...i2!.s.zones.map((z) => z.spacing))).toBeLessThanOrEqual(600);
    expect(result.status.passes).toBe(true);
  });

  test("4 plies, 8 N/mm on the left face over the member and 8 N/mm on the right face over 2–4 m: T = 6, 4, 2 N/mm then 4, 0, −4 N/mm; s = 200, 300, 600 mm then 300, none, 300 mm [D]", () => {
    const result = run(plies(4, [{ type: "uniform", w: 8, face: "left" }, { type: "uniform", w: 8, face: "right", from: 2, to: 4 }]));
    const stations = result.beam.stations;
    const [i1, i2, i3] = interfaces(result);
    const x1 = stations.find((x) => x > 200 && x < 1800)!;
    const x2 = stations.find((x) => x > 2200 && x < 3800)!;
    expect([i1!.flow(x1), i2!.flow(x1), i3!.flow(x1)].map((v) => Number(v.toFixed(9)))).toEqual([6, 4, 2]);
    expect([i1!.flow(x2), i2!.flow(x2), i3!.flow(x2)].map((v) => Number(Math.abs(v).toFixed(9)))).toEqual([4, 0, 4]);
    expectClose(i1!.at(x1)!, 200, { rel: 1e-9 });
    expectClose(i2!.at(x1)!, 300, { rel: 1e-9 });
    expectClose(i3!.at(x1)!, 600, { rel: 1e-9 });
    expectClose(i1!.at(x2)!, 300, { rel: 1e-9 });
    expect(i2!.at(x2)).toBeNull();
    expectClose(i3!.at(x2)!, 300, { rel: 1e-9 });
    for (const { s } of [i1!, i2!, i3!]) expect(s.verification.maxUtilisation).toBeLessThanOrEqual(1 + 1e-9);
  });

  test("a side load the smallest spacing cannot pass is reported with where it is: 60 N/mm on the left face needs 2·600/40 = 30 mm < 50 mm [D]", () => {
    const result = run(plies(3, [{ type: "uniform", w: 60, face: "left" }]));
    const [i1] = interfaces(result);
    expect(i1!.s.passes).toBe(false);
    expect(i1!.s.infeasible).not.toBeNull();
    expectClose(i1!.s.infeasible!.smallestRequired, 30, { rel: 1e-9 });
    expect(i1!.s.infeasible!.where.length).toBeGreaterThan(0);
    expect(result.status.passes).toBe(false);
  });
});

describe("a concentrated load hung on a face of the plies (moved from the stand-alone side-load module)", () => {
  // P = 10 kN on the left face of 3 plies at midspan: T₁ = 2/3 P = 6667 N, T₂ = 1/3 P = 3333 N, passed within
  // d/2 = 143 mm each side of the load [CP], i.e. 6667/286 = 23.31 N/mm over 286 mm [D].
  const hung = () => run(plies(3, [{ type: "point", P: 10, at: 2, face: "left" }], { minSpacing: 40 }));
  test("the flow at interface 1 is 2/3 P spread over the depth, 6667/286 = 23.31 N/mm, and 3333/286 = 11.66 N/mm at interface 2 [D]", () => {
    const result = hung();
    const [i1, i2] = interfaces(result);
    expectClose(Math.max(...i1!.s.shearFlow), 20_000 / 3 / 286, { rel: 1e-9 });
    expectClose(Math.max(...i2!.s.shearFlow), 10_000 / 3 / 286, { rel: 1e-9 });
    expect(result.status.passes).toBe(true);
  });
  test("the rows whose tributary lengths reach into d/2 each side of the load carry at least T₁ = 6667 N, and T₂ = 3333 N [D]", () => {
    const result = hung();
    for (const [k, T] of [[0, 20_000 / 3], [1, 10_000 / 3]] as const) {
      const s = interfaces(result)[k]!.s;
      const reach = s.positions.filter((x, i) => {
        const lo = i === 0 ? 0 : (x + s.positions[i - 1]!) / 2;
        const hi = i === s.positions.length - 1 ? 4000 : (x + s.positions[i + 1]!) / 2;
        return hi > 2000 - 143 && lo < 2000 + 143;
      }).length;
      expect(reach * 2 * 600).toBeGreaterThanOrEqual(T - 1e-6);
    }
  });
  // The stand-alone module asked for ⌈6667/600⌉ = 12 nails strictly within d/2 each side of the load (the [CP] rule
  // the result's assumptions state). The product once spread the load over that band and credited rows just outside it
  // by their tributary length, so at s = 50 mm only 5 rows (10 nails, 6000 N) stood inside; the rows within each band
  // are now counted on their own (a zone over the band steps down or restarts at its edge, or the joint fails).
  test("the rows strictly within d/2 each side of the load carry T₁ = 6667 N: 12 nails of 600 N, and T₂ = 3333 N: 6 nails [D, rule CP]", () => {
    const result = hung();
    for (const [k, T] of [[0, 20_000 / 3], [1, 10_000 / 3]] as const) {
      const s = interfaces(result)[k]!.s;
      const within = s.positions.filter((x) => Math.abs(x - 2000) <= 143 + 1e-9).length;
      expect(within * 2 * 600).toBeGreaterThanOrEqual(T - 1e-6);
    }
    expect(result.status.passes).toBe(true);
  });
  test("at s = 50 mm the zone over the band restarts at its edge, 2000 − 143 = 1857 mm, and says why [D]", () => {
    const s = interfaces(hung())[0]!.s;
    const zone = s.zones.find((z) => Math.abs(z.from - 1857) < 1e-6)!;
    expect(zone.spacing).toBe(50);
    expect(zone.note).toMatch(/within half the member depth/);
  });
  test("a symmetric plan keeps the rule too: the rows within 2000 ± 143 mm carry 6667 N (12 nails) and 3333 N (6 nails) [D, rule CP]", () => {
    const job = plies(3, [{ type: "point", P: 10, at: 2, face: "left" }], { minSpacing: 40 });
    job.spacing!.symmetric = true;
    const result = run(job);
    for (const [k, T] of [[0, 20_000 / 3], [1, 10_000 / 3]] as const) {
      const s = interfaces(result)[k]!.s;
      expect(s.passes).toBe(true);
      expect(s.positions.filter((x) => Math.abs(x - 2000) <= 143 + 1e-9).length * 2 * 600).toBeGreaterThanOrEqual(T - 1e-6);
    }
  });
  test("where every row passes by its tributary length but too few stand within the band, the joint fails for the band: least spacing 50 mm on a 50 mm module, rows on the 50 mm grid from the end distance, 5 within (1900…2100), 6000 N < 6667 N [D, rule CP]", () => {
    // Each row: 50 × 6667/286 = 1166 N ≤ 2 × 600 N [D], so only the band fails; restarting the rows at 1857 mm would
    // leave 1850 → 1857 mm, closer than the least spacing, and the next row comes at 1900 mm.
    const job = plies(3, [{ type: "point", P: 10, at: 2, face: "left" }], { minSpacing: 50 });
    job.spacing = { ...job.spacing!, module: 50 };
    const result = run(job);
    const s = interfaces(result)[0]!.s;
    expect(s.verification.passes).toBe(true);
    expect(s.passes).toBe(false);
    expect(s.infeasible!.reason).toMatch(/5 rows of 2 stand within it and carry 6,000 N against the 6,667 N passed there/);
    expect(s.infeasible!.remedies!.some((r) => r.change === "rows" && r.rows === 3)).toBe(true);
    expect(result.status.failures.join(" ")).toMatch(/too few rows stand within half the member depth of a concentrated force/);
  });
  test("check mode counts the rows within the band the same way: 50 mm from the end distance leaves 5 rows (6000 N < 6667 N) and fails; the same spacing with its rows shifted by 10 mm has 6 within and passes [D, rule CP]", () => {
    const checked = (provided: NonNullable<JobInput["fastening"]["default"]["provided"]>) => {
      const job = plies(3, [{ type: "point", P: 10, at: 2, face: "left" }], { minSpacing: 40 });
      job.mode = "check";
      job.fastening.default.provided = provided;
      return interfaces(run(job))[0]!.s;
    };
    // Every row passes by its tributary length: 50 × 6667/286 = 1166 N ≤ 2 × 600 N [D].
    const even = checked({ type: "zones", zones: [{ from: 0, to: 4, spacing: 50 }] });
    expect(even.positions.filter((x) => Math.abs(x - 2000) <= 143).length).toBe(5);
    expect(even.verification.passes).toBe(true);
    expect(even.passes).toBe(false);
    const over = even.zones.filter((z) => !z.passes);
    expect(over.length).toBeGreaterThan(0);
    expect(over[0]!.note).toMatch(/5 rows of 2 stand within it and carry 6,000 N against the 6,667 N/);
    const job = plies(3, [{ type: "point", P: 10, at: 2, face: "left" }], { minSpacing: 40 });
    job.mode = "check";
    job.fastening.default.provided = { type: "zones", zones: [{ from: 0, to: 4, spacing: 50 }] };
    expect(run(job).status.failures.join(" ")).toMatch(/too few rows of the given schedule stand within half the member depth/);
    const shifted = checked({ type: "positions", positions: [0.05, ...Array.from({ length: 77 }, (_, k) => (110 + 50 * k) / 1000), 3.95] });
    expect(shifted.positions.filter((x) => Math.abs(x - 2000) <= 143).length).toBe(6);
    expect(shifted.passes).toBe(true);
  });
  test("6 stations of 2 nails fit in 286 mm only at a spacing ≤ 57.2 mm: at a least spacing of 60 mm interface 1 cannot be scheduled [D]", () => {
    const result = run(plies(3, [{ type: "point", P: 10, at: 2, face: "left" }], { minSpacing: 60 }));
    const [i1] = interfaces(result);
    expect(i1!.s.passes).toBe(false);
    expect(i1!.s.infeasible).not.toBeNull();
    // At 60 mm, 5 rows at most stand within 286 mm (4 × 60 = 240 ≤ 286 < 300): 5 × 2 × 600 = 6000 N < 6667 N [D].
    expect(i1!.s.infeasible!.reason).toMatch(/within half the member depth/);
    expect(i1!.s.infeasible!.reason).toMatch(/against the 6,667 N passed there/);
    // The remedies are designed again under the same rule: 3 nails per row, 5 rows within, 9000 N ≥ 6667 N [D].
    expect(i1!.s.infeasible!.remedies!.some((r) => r.change === "rows" && r.rows === 3)).toBe(true);
  });
});

describe("rows of bolts across the depth of the plies (moved from the stand-alone rowsAcrossDepth onto whole members)", () => {
  // M12 bolts, EN 1995-1-1 Table 8.4 [V] at α = 90°: a₄,t = max((2 + 2 sin α)d; 3d) = 48 mm, a₂ = 4d = 48 mm,
  // a₃,t = max(7d; 80 mm) = 84 mm [D]. The force passes across the member and the grain runs along it, so across the
  // depth the edges are the plies' edges, a₄,t = 48 mm from each, a₂ = 48 mm between rows, and along the member
  // a₁ = (4 + |cos α|)d = 48 mm apart and a₃,t = 84 mm from its ends: n rows need 2 × 48 + (n − 1) × 48 mm [D].
  // (Before the connector context carried the force's direction, the grain was taken across the member: 84 mm at the
  // edges and 48 mm at the ends, short of a₃,t there.)
  function bolted(depth: number, rows: number): JobInput {
    const job = plies(3, [{ type: "uniform", w: 1, face: "left" }], {}, rows);
    job.basis = "factored";
    job.materials = [{ id: "T", name: "C24", family: "sawn-timber", E: 11_000, density: 0, characteristicDensity: 350, meanDensity: 420 } as JobInput["materials"][number]];
    job.parts = job.parts.map((p) => ({ ...p, shape: { type: "rectangle" as const, b: 38, h: depth } }));
    job.connectors = [{ id: "N", kind: "timber-bolt", standard: "EN1995-1-1", size: "M12", grade: "4.6", sideAngleToGrainDeg: 90, mainAngleToGrainDeg: 90 } as JobInput["connectors"][number]];
    return job;
  }
  const acrossWarnings = (r: ReturnType<typeof designMember>) => r.warnings.filter((w) => /per row need .* across part/.test(w));
  test("two rows of M12 in a 2x12 ply (286 mm): 144 mm needed, they fit, with the 48 mm row spacing of the standard and 84 mm from the member ends", () => {
    const r = run(bolted(286, 2));
    expect(acrossWarnings(r)).toEqual([]);
    for (const s of r.schedules) {
      expectClose(s.limits.rowSpacing!, 48, { rel: 1e-9 });
      expectClose(s.limits.edgeDistance!, 48, { rel: 1e-9 });
      expectClose(s.limits.endDistance, 84, { rel: 1e-9 });
    }
  });
  test("rows that do not fit the depth fail the joint with both widths: 2 rows need 144 mm and 3 rows 192 mm across an 89 mm ply [D]", () => {
    // The fit across the contact is now checked for every kind by the pipeline (core/fastening/row-fit.ts): the
    // joint fails with both widths instead of passing with a warning.
    for (const [rows, needed] of [[2, 144], [3, 192]] as const) {
      const r = run(bolted(89, rows));
      expect(r.schedules.length).toBeGreaterThan(0);
      for (const s of r.schedules) {
        expect(s.rowFit).toMatchObject({ fits: false });
        expectClose(s.rowFit!.needed, needed, { rel: 1e-9 });
        expectClose(s.rowFit!.available, 89, { rel: 1e-9 });
        expect(s.passes).toBe(false);
      }
    }
  });
});

describe("property through designMember (fast-check, fixed seed): the rows within d/2 of a face-hung load carry what it passes", () => {
  // Plies of one depth d = 286 mm, each bending about its own centroid: the E·I shares are s_j = E_j·t_j / Σ E·t
  // (d³/12 cancels) [D]. A load P on the left face crosses interface k (between plies k and k + 1, from 0) with
  // P·Σ_{j>k} s_j, on the right face with P·Σ_{j≤k} s_j [D]; the connectors within d/2 each side of it pass that
  // force (the concentrated-load rule, [CP]): rows within × connectors per row × R ≥ it, whatever rows outside carry.
  const passing: boolean[] = [];
  afterAll(() => expect(passing.filter(Boolean).length).toBeGreaterThanOrEqual(passing.length / 4));
  test("in every passing schedule, for every load, Σ over the rows within d/2 of (n·R) ≥ the share it passes", () => {
    fc.assert(
      fc.property(
        fc.array(fc.record({ t: fc.constantFrom(38, 45, 63), E: fc.constantFrom(9_000, 11_000, 13_000) }), { minLength: 2, maxLength: 4 }),
        fc.array(fc.record({ P: fc.double({ min: 0.5, max: 12, noNaN: true }), at: fc.oneof(fc.double({ min: 0.2, max: 3.8, noNaN: true }), fc.double({ min: 1.8, max: 2.2, noNaN: true })), face: fc.constantFrom("left" as const, "right" as const) }), { minLength: 1, maxLength: 3 }),
        fc.record({ R: fc.constantFrom(400, 600, 900, 1_500), rows: fc.integer({ min: 1, max: 3 }), minSpacing: fc.constantFrom(40, 50, 60) }),
        (plyList, loads, nail) => {
          const job = plies(plyList.length, loads.map((l) => ({ type: "point" as const, ...l })), { resistance: nail.R, minSpacing: nail.minSpacing }, nail.rows);
          job.materials = plyList.map((p, j) => ({ id: `T${j}`, name: "timber", E: p.E, density: 0 }));
          job.parts = job.parts.map((part, j) => ({ ...part, material: `T${j}`, shape: { type: "rectangle" as const, b: plyList[j]!.t, h: 286 } }));
          const result = run(job);
          const stiffness = plyList.map((p) => p.E * p.t);
          const total = stiffness.reduce((a, b) => a + b, 0);
          const share = (from: number, to: number) => stiffness.slice(from, to).reduce((a, b) => a + b, 0) / total;
          result.multiPly!.interfaces.forEach((face, k) => {
            const s = result.schedules.find((x) => x.joint === face.joint);
            if (!s) return;
            passing.push(s.passes);
            if (!s.passes) return;
            for (const load of loads) {
              const force = load.P * 1000 * (load.face === "left" ? share(k + 1, plyList.length) : share(0, k + 1));
              const within = s.positions.filter((x) => Math.abs(x - load.at * 1000) <= 143 * (1 + 1e-9)).length;
              expect(within * nail.rows * nail.R, `interface ${k + 1}, load ${load.P} kN at ${load.at} m on the ${load.face} face`).toBeGreaterThanOrEqual(force * (1 - 1e-9));
            }
            // Loads on one face whose bands overlap share the rows there: those within the union carry their sum [D].
            for (const a of loads) {
              for (const b of loads) {
                if (a === b || a.face !== b.face || a.at > b.at || b.at - a.at >= 0.286) continue;
                const f = (l: typeof a) => l.P * 1000 * (l.face === "left" ? share(k + 1, plyList.length) : share(0, k + 1));
                const within = s.positions.filter((x) => x >= a.at * 1000 - 143 * (1 + 1e-9) && x <= b.at * 1000 + 143 * (1 + 1e-9)).length;
                expect(within * nail.rows * nail.R, `interface ${k + 1}, loads at ${a.at} and ${b.at} m`).toBeGreaterThanOrEqual((f(a) + f(b)) * (1 - 1e-9));
              }
            }
          });
        },
      ),
      { numRuns: 40 },
    );
  });
});

import { readFileSync } from "node:fs";
import fc from "fast-check";
import { describe, expect, test } from "vitest";
import { prepareJob } from "../../../core/check-job.js";
import { designMember } from "../../../core/design-member.js";
import type { JobInput } from "../../../core/schema/job.js";
import type { Schedule } from "../../../core/schema/result.js";
import { expectClose } from "../../expect-close.js";

// Issue 18: bolts across the depth of side-by-side plies (a force across the grain), and bearing on the plate.
// 2x12 dressed 1.5 × 11.25 in (PS 20 [V]); A36 plate F_u = 58 ksi (ASTM A36 [M]); 3/4 in bolts, D = 0.75 in.

const IN = 25.4;
const LBF = 4.4482216152605;

const run = (job: JobInput) => {
  const p = prepareJob(job);
  if (!p.ok) throw new Error(JSON.stringify(p.issues));
  return designMember(p.core);
};

const example = (name: string): JobInput => JSON.parse(readFileSync(new URL(`../../../fixtures/examples/${name}`, import.meta.url), "utf8")) as JobInput;

/** Two 2x12 DF-L plies, a 1/2 in plate of depth h between them (centred), 3/4 in bolts in double shear, 14 ft, load on top. */
function flitchUs(plateDepth: number, opts: { rows?: number; basis?: "allowable" | "factored"; w?: number; size?: string } = {}): JobInput {
  return {
    format: "stitchplan-job",
    version: 1,
    units: "us",
    basis: opts.basis ?? "allowable",
    project: { name: "Flitch rows test" },
    member: { mark: "FR" },
    materials: [
      { id: "DF", name: "DF-L No. 1", family: "sawn-timber", E: 1_700_000, density: 0, specificGravity: 0.5, strength: { bending: 1000, shear: 180 } },
      { id: "PL", name: "A36 plate", family: "steel", E: 29_000_000, density: 0, yieldStrength: 36_000, tensileStrength: 58_000, strength: { bending: 21_600, shear: 12_900 } },
    ],
    parts: [
      { id: "left", name: "Left 2x12", material: "DF", shape: { type: "lumber", nominal: "2x12", orientation: "edge" }, x: 0, y: 0 },
      { id: "plate", material: "PL", shape: { type: "rectangle", b: 0.5, h: plateDepth }, place: { on: "left", side: "right" } },
      { id: "right", name: "Right 2x12", material: "DF", shape: { type: "lumber", nominal: "2x12", orientation: "edge" }, place: { on: "plate", side: "right" } },
    ],
    connectors: [{ id: "B", kind: "timber-bolt", standard: "NDS-2018", shear: "double", size: opts.size ?? "3/4" }],
    fastening: { default: { connector: "B", rows: opts.rows ?? 2 }, joints: [{ held: ["plate"], connector: "B", rows: opts.rows ?? 2 }] },
    beam: { spans: [14], loads: [{ type: "uniform", category: "dead", w: opts.w ?? 600 }], selfWeight: false },
    combinations: { set: opts.basis === "factored" ? "asce7-22-strength" : "asce7-22-allowable" },
    spacing: { module: 1, minZoneLength: 24, maxZonesPerSpan: 3, symmetric: true },
  };
}

const plateJoint = (r: ReturnType<typeof run>): Schedule => r.schedules.find((s) => s.joint === "plate")!;

describe("edge distances for a force across the grain (NDS-2018 Table 12.5.1C; EN 1995-1-1 Table 8.4)", () => {
  const D = 0.75 * IN;

  test("a plate within the depth of the timber hands its share of each reaction back near the supports: the force reverses, both edges are loaded, 4D each [M]", () => {
    const s = plateJoint(run(flitchUs(11)));
    // Table 12.5.1C, load perpendicular to grain: loaded edge 4D, unloaded edge 1.5D [M].
    expectClose(s.limits.edgeDistance!, 4 * D, { rel: 1e-9 }, "loaded edge 4D = 3 in");
    expectClose(s.limits.unloadedEdgeDistance!, 1.5 * D, { rel: 1e-9 }, "unloaded edge 1.5D = 1.125 in");
    expect(s.limits.loadedEdges).toEqual(["top", "bottom"]);
    // Within a row across the grain 4D (Table 12.5.1B: as the attached member needs [CP]); ℓ/D = 3/0.75 = 4 gives 3.75D < 4D.
    expectClose(s.limits.rowSpacing!, 4 * D, { rel: 1e-9 }, "4D across");
    // Two per row: 4D + 4D + 4D = 9 in within the 11 in plate [D].
    expectClose(s.rowFit!.needed, 12 * D, { rel: 1e-9 }, "needed 9 in");
    expectClose(s.rowFit!.available, 11 * IN, { rel: 1e-9 }, "the plate's depth");
    expect(s.limits.sources.some((t) => /both edges are loaded/.test(t))).toBe(true);
  });

  test("a plate as deep as the timber bears on the supports itself: under a top load the timber only hands load on, the bolts push it up, and only the top edge is loaded: 4D + 1.5D + 4D [M][D]", () => {
    const s = plateJoint(run(flitchUs(11.25)));
    expect(s.limits.loadedEdges).toEqual(["top"]);
    expectClose(s.rowFit!.needed, (4 + 1.5 + 4) * D, { rel: 1e-9 }, "needed 7.125 in");
    expect(s.limits.sources.some((t) => /"Left 2x12" top \(it hands load on: the connectors push it up\)/.test(t) && /the top edge is loaded, the bottom edge unloaded/.test(t))).toBe(true);
    // Layout: the group centred between 4D from the top and 1.5D from the bottom: room = 11.25 − 3 − 1.125 − 3 = 4.125 in,
    // the first bolt 3 + 2.0625 = 5.0625 in below the top, the second 3 in lower [D].
    const lay = s.layoutAcross!;
    expect(lay.edge).toBe('top edge of "Left 2x12"');
    expectClose(lay.offsets[0]!, 5.0625 * IN, { rel: 1e-9 });
    expectClose(lay.offsets[1]!, 8.0625 * IN, { rel: 1e-9 });
  });

  test("EN 1995-1-1 Table 8.4, bolts, α = 90°: a₄,t = max((2 + 2 sin α)d, 3d) = 4d at a loaded edge, a₄,c = 3d at an unloaded one [M]", () => {
    const full = example("steel-flitch-beam.si.json");
    const s = plateJoint(run(full));
    const d = 16;
    expectClose(s.limits.edgeDistance!, 4 * d, { rel: 1e-9 }, "a₄,t");
    expectClose(s.limits.unloadedEdgeDistance!, 3 * d, { rel: 1e-9 }, "a₄,c");
    // The 280 mm plate within the 300 mm timber: both edges loaded; two per row 64 + 64 + a₂ = 4d = 64 → 192 mm [D].
    expect(s.limits.loadedEdges).toEqual(["top", "bottom"]);
    expectClose(s.rowFit!.needed, 192, { rel: 1e-9 });
    // A plate the full 300 mm deep: the top edge alone is loaded, 64 + 48 + 64 = 176 mm [D].
    const deep = example("steel-flitch-beam.si.json");
    const plate = deep.parts.find((p) => p.id === "plate")!;
    (plate.shape as { h: number }).h = 300;
    const t = plateJoint(run(deep));
    expect(t.limits.loadedEdges).toEqual(["top"]);
    expectClose(t.rowFit!.needed, 176, { rel: 1e-9 });
  });

  test("a row that does not fit across the depth fails, saying how many fit; it gets no layout [D]", () => {
    // Three per row: 4D + 4D + 2 × 4D = 16D = 12 in > 11 in; two need 12D = 9 in.
    const s = plateJoint(run(flitchUs(11, { rows: 3 })));
    expect(s.rowFit!.fits).toBe(false);
    expectClose(s.rowFit!.needed, 16 * D, { rel: 1e-9 });
    expect(s.passes).toBe(false);
    expect(s.layoutAcross).toBeNull();
    expect(s.detailingProblems.join(" ")).toMatch(/At most 2 per row fit across it/);
  });
});

describe("nails between side-by-side plies: the grain runs along the member, the force across it (NDS-2018 §12.1.6, common practice)", () => {
  test("10d common (D = 0.148 in): 15D along the grain (along the member), 5D across it; loaded edge 15D, unloaded 2.5D [CP]", () => {
    const D = 0.148 * IN; // 10d common nail, NDS-2018 Table L4 [M]
    for (const s of run(example("three-ply-header.us.json")).schedules) {
      expectClose(s.limits.minSpacing, 15 * D, { rel: 1e-9 }, "15D along the grain");
      expectClose(s.limits.rowSpacing!, 5 * D, { rel: 1e-9 }, "5D across the grain");
      expectClose(s.limits.edgeDistance!, 15 * D, { rel: 1e-9 }, "loaded edge");
      expectClose(s.limits.unloadedEdgeDistance!, 2.5 * D, { rel: 1e-9 }, "unloaded edge");
      // One ply hands load on (pushed up), the next takes it (pushed down): both edges of the contact are loaded.
      expect(s.limits.loadedEdges).toEqual(["top", "bottom"]);
      expectClose(s.rowFit!.needed, (15 + 15 + 2 * 5) * D, { rel: 1e-9 });
    }
  });
});

describe("the outer bolts of a row on one steel plate at most 5 in apart (NDS-2018 Table 12.5.1D footnote [M])", () => {
  test("5/8 in bolts: ℓ/D = 3/0.625 = 4.8, so (5 × 4.8 + 10)/8 = 4.25D = 2.656 in apart across the grain; two per row spread 2.66 in, no warning; three spread 5.31 in, a warning for the reviewer [D]", () => {
    const two = run(flitchUs(11, { size: "5/8", rows: 2 }));
    expect(two.warnings.some((w) => /more than 5 in/.test(w))).toBe(false);
    const three = run(flitchUs(11, { size: "5/8", rows: 3 }));
    expectClose(plateJoint(three).limits.rowSpacing!, 4.25 * 0.625 * IN, { rel: 1e-9 }, "4.25D across");
    expect(plateJoint(three).rowFit!.fits).toBe(true); // 4D + 4D + 2 × 4.25D = 16.5D = 10.3 in ≤ 11 in
    expect(three.warnings.some((w) => /3 bolts side by side through a steel plate spread at least 5\.3\d* in across the grain, more than 5 in/.test(w))).toBe(true);
  });
});

describe("two rows when one will not carry: the designed remedy (issue 18)", () => {
  test.each(["flitch-door-header.us.json", "steel-flitch-beam.si.json"])("%s with one bolt per row fails, and the remedy is 2 per row, designed again; the example itself has 2 and passes", (name) => {
    const given = run(example(name));
    expect(plateJoint(given).rows).toBe(2);
    expect(plateJoint(given).passes).toBe(true);
    const job = example(name);
    job.fastening = { default: { ...job.fastening.default!, rows: 1 }, joints: job.fastening.joints!.map((j) => ({ ...j, rows: 1 })) };
    const s = plateJoint(run(job));
    expect(s.passes).toBe(false);
    const remedy = s.infeasible!.remedies!.find((r) => r.change === "rows")!;
    expect(remedy.rows).toBe(2);
    expect(remedy.utilisation).toBeLessThanOrEqual(1);
  });
});

describe("bearing on the plate (AISC 360-16 §J3.10; EN 1993-1-8 Table 3.4)", () => {
  test("NDS basis, allowable: R_n/Ω = 2.4 d t F_u/2.00 and tear-out 1.2 l_c t F_u/2.00, half of each per contact line for the central plate [M][D]", () => {
    const r = plateJoint(run(flitchUs(11))).resistance[0]!;
    // 2.4 × 0.75 × 0.5 × 58 000 = 52 200 lb; /2.00 = 26 100 lb; per line 13 050 lb [D].
    const bearing = r.modes!.find((m) => m.mode === 'bearing on plate "plate"')!;
    expectClose(bearing.value, 13_050 * LBF, { rel: 1e-9 }, "bearing per line");
    // l_c = 1 in (Table J3.4, 3/4 in bolt [M]) − (3/4 + 1/16)/2 = 0.59375 in; 1.2 × 0.59375 × 0.5 × 58 000 = 20 662.5 lb; /2.00/2 [D].
    const tear = r.modes!.find((m) => m.mode === 'tear-out of plate "plate"')!;
    expectClose(tear.value, (20_662.5 / 4) * LBF, { rel: 1e-9 }, "tear-out per line");
    // The timber governs here (Z′/2 ≈ 522 lb for dead load): the least mode is the value.
    expectClose(r.value, Math.min(...r.modes!.map((m) => m.value)), { rel: 0 });
    expect(r.governing).toMatch(/^mode/);
  });

  test("NDS basis, factored: φR_n with φ = 0.75 [M][D]", () => {
    const r = plateJoint(run(flitchUs(11, { basis: "factored" }))).resistance[0]!;
    expectClose(r.modes!.find((m) => m.mode === 'bearing on plate "plate"')!.value, 0.75 * 52_200 * 0.5 * LBF, { rel: 1e-9 });
  });

  test("EN 1993-1-8: F_b,Rd = k₁ α_b f_u d t/γ_M2 with e₁ = e₂ = 1.2 d₀ (Table 3.3 least): 1.66 × 0.4 × 360 × 16 × 12/1.25, half per line [M][D]", () => {
    const r = plateJoint(run(example("steel-flitch-beam.si.json"))).resistance[0]!;
    const Fb = (1.66 * 0.4 * 360 * 16 * 12) / 1.25; // 36 716.5 N [D]
    expectClose(r.modes!.find((m) => m.mode === 'bearing on plate "plate"')!.value, Fb / 2, { rel: 1e-9 });
  });

  test("a thin plate's bearing governs the bolt and is named as governing; 'bearing on the plate' leaves the not-checked list", () => {
    const job = example("steel-flitch-beam.si.json");
    const plate = job.parts.find((p) => p.id === "plate")!;
    (plate.shape as { b: number }).b = 3;
    const result = run(job);
    const r = plateJoint(result).resistance[0]!;
    const Fb = (1.66 * 0.4 * 360 * 16 * 3) / 1.25 / 2; // 4 589.6 N per line [D]
    const bearing = r.modes!.find((m) => m.mode === 'bearing on plate "plate"')!;
    expectClose(bearing.value, Fb, { rel: 1e-9 });
    if (bearing.value < Math.min(...r.modes!.filter((m) => m !== bearing).map((m) => m.value))) {
      expect(r.governing).toBe('bearing on plate "plate"');
      expectClose(r.value, Fb, { rel: 1e-9 });
    }
    expect(result.notChecked.some((n) => /^Bearing of the bolts on the steel plate/.test(n))).toBe(false);
    expect(result.notChecked.some((n) => /plate's own edge and end distances/.test(n))).toBe(true);
  });
});

describe("layout across the contact (layoutAcross)", () => {
  test("the flitch header: 2 bolts, 3 in from each loaded edge of the 11 in plate and 3 in apart, centred: 4.125 and 7.125 in below the top of the 2x12 [D]; staggered by half the least spacing; through bolts have no driving face", () => {
    const s = plateJoint(run(example("flitch-door-header.us.json")));
    const lay = s.layoutAcross!;
    expect(lay.edge).toBe('top edge of "Left 2x12"');
    // Plate 0.125 in below the top of the 11.25 in timber; room 11 − 3 − 3 − 3 = 2 in, 1 in each side.
    expectClose(lay.offsets[0]!, 4.125 * IN, { rel: 1e-9 });
    expectClose(lay.offsets[1]!, 7.125 * IN, { rel: 1e-9 });
    const gaps = s.positions.slice(1).map((x, i) => x - s.positions[i]!);
    expectClose(lay.stagger!, Math.min(...gaps) / 2, { rel: 1e-9 });
    expect(lay.drivenFrom).toBeNull();
  });

  test("nails are driven from the head part; one per row along the member stands in line (no stagger)", () => {
    const result = run(example("porch-beam-16d-nds.us.json"));
    for (const s of result.schedules) {
      expect(s.layoutAcross!.drivenFrom).toMatch(/flange/);
      expect(s.layoutAcross!.stagger).toBeNull();
      expect(s.layoutAcross!.offsets).toHaveLength(1);
      // One 16d nail centred on the 1.5 in edge of the web [D].
      expectClose(s.layoutAcross!.offsets[0]!, 0.75 * IN, { rel: 1e-9 });
    }
  });
});

describe("properties through designMember (fast-check, fixed seed)", () => {
  /** Timber | plate | timber with the timber plies of different thicknesses, in the given order from the left. */
  const job = (g: { tA: number; tB: number; h: number; hp: number; tp: number; rows: number; w: number; d: number }, order: "AB" | "BA"): JobInput => {
    const [first, last] = order === "AB" ? [g.tA, g.tB] : [g.tB, g.tA];
    return {
      format: "stitchplan-job",
      version: 1,
      units: "si",
      basis: "factored",
      project: { name: "property" },
      member: { mark: "P" },
      materials: [
        { id: "T", name: "C24", family: "sawn-timber", E: 11_000, density: 0, characteristicDensity: 350, meanDensity: 420, strength: { bending: 14.7, shear: 1.65 } },
        { id: "S", name: "S355", family: "steel", E: 210_000, density: 0, yieldStrength: 355, tensileStrength: 510, strength: { bending: 355, shear: 205 } },
      ],
      parts: [
        { id: "first", material: "T", shape: { type: "rectangle", b: first, h: g.h }, x: 0, y: 0 },
        { id: "plate", material: "S", shape: { type: "rectangle", b: g.tp, h: g.hp }, place: { on: "first", side: "right" } },
        { id: "last", material: "T", shape: { type: "rectangle", b: last, h: g.h }, place: { on: "plate", side: "right" } },
      ],
      connectors: [{ id: "M", kind: "timber-bolt", standard: "EN1995-1-1", shear: "double", size: `M${g.d}`, grade: "8.8", serviceClass: 1 }],
      fastening: { default: { connector: "M", rows: g.rows }, joints: [{ held: ["plate"], connector: "M", rows: g.rows }] },
      beam: { spans: [4.2], loads: [{ type: "uniform", category: "dead", w: g.w }], selfWeight: false },
      combinations: { set: "en1990-6.10" },
      spacing: { module: 25, minZoneLength: 300, maxZonesPerSpan: 3, symmetric: true },
    };
  };
  const arb = fc.record({
    tA: fc.integer({ min: 45, max: 100 }),
    tB: fc.integer({ min: 45, max: 100 }),
    h: fc.integer({ min: 160, max: 400 }),
    plateRatio: fc.oneof(fc.constant(1), fc.double({ min: 0.6, max: 0.98, noNaN: true })),
    tp: fc.integer({ min: 6, max: 16 }),
    rows: fc.integer({ min: 1, max: 3 }),
    w: fc.double({ min: 1, max: 12, noNaN: true }),
    d: fc.constantFrom(12, 16, 20),
    deeper: fc.integer({ min: 10, max: 120 }),
  });
  const edgeSum = (s: Schedule) => {
    const e = s.limits.edgeDistance!;
    const u = s.limits.unloadedEdgeDistance ?? e;
    return (["top", "bottom"] as const).reduce((sum, edge) => sum + (s.limits.loadedEdges?.includes(edge) === false ? u : e), 0);
  };

  test("deepening the timber plies (the plate kept) never lowers the loaded-edge distance nor the edge distances a row needs; a passing joint's row fits within its contact, every bolt its edge distances from both edges", () => {
    let passing = 0;
    fc.assert(
      fc.property(arb, (g) => {
        const base = { ...g, hp: Math.round(g.h * g.plateRatio) };
        const a = plateJoint(run(job(base, "AB")));
        const b = plateJoint(run(job({ ...base, h: g.h + g.deeper }, "AB")));
        expect(b.limits.edgeDistance!).toBeGreaterThanOrEqual(a.limits.edgeDistance! * (1 - 1e-12));
        expect(edgeSum(b)).toBeGreaterThanOrEqual(edgeSum(a) * (1 - 1e-12));
        for (const [s, h] of [[a, g.h], [b, g.h + g.deeper]] as const) {
          if (!s.passes) continue;
          passing++;
          expect(s.rowFit!.fits).toBe(true);
          expect(s.rowFit!.needed).toBeLessThanOrEqual(Math.min(s.rowFit!.available, base.hp, h) * (1 + 1e-9));
          // Offsets from the top of the timber; the plate (the contact) is centred on it.
          const top = (h - base.hp) / 2;
          const lay = s.layoutAcross!;
          expect(lay.offsets).toHaveLength(s.rows);
          const loaded = s.limits.loadedEdges ?? ["top", "bottom"];
          const eTop = loaded.includes("top") ? s.limits.edgeDistance! : s.limits.unloadedEdgeDistance!;
          const eBottom = loaded.includes("bottom") ? s.limits.edgeDistance! : s.limits.unloadedEdgeDistance!;
          expect(lay.offsets[0]! - top).toBeGreaterThanOrEqual(eTop * (1 - 1e-9));
          expect(top + base.hp - lay.offsets[lay.offsets.length - 1]!).toBeGreaterThanOrEqual(eBottom * (1 - 1e-9));
          for (let i = 1; i < lay.offsets.length; i++) expect(lay.offsets[i]! - lay.offsets[i - 1]!).toBeGreaterThanOrEqual(s.limits.rowSpacing! * (1 - 1e-9));
        }
      }),
      { numRuns: 25 },
    );
    // The generated joints are not all failing ones: the layout checks above ran.
    expect(passing).toBeGreaterThan(5);
  });

  test("swapping which timber ply is left and which right changes neither the loaded edges nor any offset (the layout is mirrored)", () => {
    fc.assert(
      fc.property(arb, (g) => {
        const base = { ...g, hp: Math.round(g.h * g.plateRatio) };
        const a = plateJoint(run(job(base, "AB")));
        const b = plateJoint(run(job(base, "BA")));
        expect(b.limits.loadedEdges).toEqual(a.limits.loadedEdges);
        if (!a.layoutAcross) expect(b.layoutAcross ?? null).toBeNull();
        else {
          expect(b.layoutAcross!.offsets).toHaveLength(a.layoutAcross.offsets.length);
          b.layoutAcross!.offsets.forEach((o, i) => expectClose(o, a.layoutAcross!.offsets[i]!, { rel: 1e-9 }));
        }
      }),
      { numRuns: 25 },
    );
  });
});

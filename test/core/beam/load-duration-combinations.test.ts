import fc from "fast-check";
import { describe, expect, test } from "vitest";
import { combinationSet } from "../../../core/beam/combinations.js";
import { prepareJob } from "../../../core/check-job.js";
import { ndsConnectionTimeEffect } from "../../../core/connector/timber/nds-adjustment.js";
import { designMember } from "../../../core/design-member.js";
import { Beam, CombinationSettings, type Load } from "../../../core/schema/beam.js";
import type { JobInput } from "../../../core/schema/job.js";
import type { DesignResult } from "../../../core/schema/result.js";
import { expectClose } from "../../expect-close.js";
import { nailedTimberI } from "../connector/connector-jobs.js";
import { IN, LBF } from "../connector/contexts.js";

// A timber connector's resistance follows the shortest-duration load of its combination, so every
// combination set must also hold the combinations without the shorter-duration loads.
// Sources and flags: NDS-2018 Table 2.3.2 C_D (REFERENCES §5.8 [V]); NDS-2018 Table N3 λ [M];
// K_F 3.32, φ_z 0.65 NDS Table 11.3.1 [V]; EN 1995-1-1 Table 3.1 k_mod (REFERENCES §6.1 [V]), γ_M 1.3 [V];
// 16d common in DF-L, 1-1/2 in side member: Z = 140.69 lb by the yield limit equations [D], table 141 lb [V]
// (REFERENCES §5.4); EC5 nail 3.1 mm in C24 (case 6.4a): F_v,Rk = 756.0 N, mode f [D] (REFERENCES §6.4).

function design(job: JobInput): DesignResult {
  const prepared = prepareJob(job);
  if (!prepared.ok) throw new Error(JSON.stringify(prepared.issues));
  return designMember(prepared.core);
}

const Z16d = 140.69 * LBF; // N, [D] REFERENCES §5.4
/** The US nailed I of connector-jobs (2x6 flanges, 2x10 web, 12 ft span), 16d commons, the given loads (lb/ft). */
const usJob = (set: string, basis: "allowable" | "factored", loads: Partial<Load>[]) =>
  nailedTimberI({ kind: "nail", standard: "NDS-2018", size: "16d common" }, { basis, combinations: { set }, beam: { spans: [12], loads, selfWeight: false } } as Partial<JobInput>);

// Shear flow factor Q/I of a flange joint of the US nailed I, by hand: flanges 5.5 × 1.5, web 1.5 × 9.25, depth 12.25 in.
const usQoverI = (5.5 * 1.5 * (12.25 / 2 - 0.75)) / ((5.5 * 12.25 ** 3) / 12 - (4 * 9.25 ** 3) / 12); // 1/in
const spanIn = 144;
/** Connectors needed over a simple span without a spacing limit, ∫ q/R dx = (Q/I)·(w L²/4)/R [D]; w in lb/ft, R in lb. */
const usDemand = (wPlf: number, resistanceLb: number) => (usQoverI * ((wPlf / 12) * spanIn ** 2)) / 4 / resistanceLb;

describe("the unfactored set: dead load with every selection of the variable loads, each at its own C_D", () => {
  test("designSchedule via designMember: dead 50 + live 200 + wind 5 lb/ft is governed by D + L at C_D = 1.0, not by every load at C_D = 1.6", () => {
    const result = design(usJob("unfactored", "allowable", [{ type: "uniform", category: "dead", w: 50 }, { type: "uniform", category: "live", w: 200 }, { type: "uniform", category: "wind", w: 5 }]));
    const s = result.schedules[0]!;
    const byName = new Map(result.beam.combinations.map((c) => [c.id, c.categories.slice().sort().join("+")]));
    const resistance = Object.fromEntries(s.resistance.map((r) => [byName.get(r.combination)!, r.value]));
    // C_D: dead 0.9, occupancy live 1.0, wind 1.6 (NDS-2018 Table 2.3.2 [V], at most 1.6 for connections §11.3.2 [V]).
    expectClose(resistance["dead"]!, 0.9 * Z16d, { rel: 2e-4 });
    expectClose(resistance["dead+live"]!, 1.0 * Z16d, { rel: 2e-4 });
    expectClose(resistance["dead+wind"]!, 1.6 * Z16d, { rel: 2e-4 });
    expectClose(resistance["dead+live+wind"]!, 1.6 * Z16d, { rel: 2e-4 });
    // max(50/0.9, 250/1.0, 55/1.6, 255/1.6) = 250: D + L governs [D]. All loads at 1.6 alone would need 255/1.6 ÷ 250 = 0.64 of it.
    expectClose(s.efficiency.demandIntegral, usDemand(250, 140.69), { rel: 1e-3 });
    expect(byName.get(s.verification.combination)).toBe("dead+live");
  });

  test("designSchedule via designMember: dead 100 + snow 10 lb/ft is governed by dead load alone at C_D = 0.9 (100/0.9 = 111.1 > 110/1.15 = 95.7) [D]", () => {
    const result = design(usJob("unfactored", "allowable", [{ type: "uniform", category: "dead", w: 100 }, { type: "uniform", category: "snow", w: 10 }]));
    const s = result.schedules[0]!;
    expect(result.beam.combinations.map((c) => c.name)).toEqual(["Loads as entered", "D, as entered"]);
    expectClose(s.efficiency.demandIntegral, usDemand(100, 0.9 * 140.69), { rel: 1e-3 });
    expect(s.verification.combination).toBe(result.beam.combinations[1]!.id);
  });
});

describe("EN 1990 (6.10): each accompanying action also absent, at its own k_mod", () => {
  test("designSchedule via designMember: G 1 + L 2 + W 0.1 kN/m, EC5 nails: 1.35G + 1.5L at k_mod 0.8 governs (4.35/0.8 = 5.44 kN/m, not 4.44/1.1 = 4.04, which is 35 % lower) [D]", () => {
    const job = nailedTimberI({ kind: "nail", standard: "EN1995-1-1", diameter: 3.1, length: 75, serviceClass: 1 }, {
      units: "si",
      basis: "factored",
      combinations: { set: "en1990-6.10" },
      materials: [{ id: "DFL", name: "C24", family: "sawn-timber", E: 11_000, density: 420, characteristicDensity: 350, meanDensity: 420, strength: { bending: 14.8, shear: 2.46 } }],
      parts: [
        { id: "bottom", material: "DFL", shape: { type: "rectangle", b: 140, h: 38 }, x: 0, y: 0 },
        { id: "web", material: "DFL", shape: { type: "rectangle", b: 38, h: 235 }, x: 51, y: 38 },
        { id: "top", material: "DFL", shape: { type: "rectangle", b: 140, h: 38 }, x: 0, y: 273 },
      ],
      beam: { spans: [3.6], loads: [{ type: "uniform", category: "dead", w: 1 }, { type: "uniform", category: "live", w: 2 }, { type: "uniform", category: "wind", w: 0.1 }], selfWeight: false },
      spacing: { module: 5, minZoneLength: 300, maxZonesPerSpan: 5, symmetric: true },
    } as Partial<JobInput>);
    const result = design(job);
    const s = result.schedules[0]!;
    const governing = result.beam.combinations.find((c) => c.id === s.verification.combination)!;
    expect(governing.factors).toEqual({ dead: 1.35, live: 1.5 }); // γG 1.35, γQ 1.5 (EN 1990 Table A1.2(B) [M])
    expect(governing.duration).toBe("medium");
    const r = s.resistance.find((x) => x.combination === governing.id)!;
    expectClose(r.value, (756.0 * 0.8) / 1.3, { abs: 0.1 }); // 465.2 N (REFERENCES §6.4a [D])
    // Q/I by hand: flanges 140 × 38, web 38 × 235, depth 311 mm; ∫|V| dx = w L²/4 on a simple span [D].
    const QoverI = (140 * 38 * (311 / 2 - 19)) / ((140 * 311 ** 3) / 12 - (102 * 235 ** 3) / 12);
    expectClose(s.efficiency.demandIntegral, (QoverI * 4.35 * 3600 ** 2) / 4 / ((756.0 * 0.8) / 1.3), { rel: 1e-3 });
  });
});

describe("NDS LRFD λ follows the combination's form (NDS-2018 Table N3 [M])", () => {
  const loads = (cats: string[]): Partial<Load>[] => cats.map((category) => ({ type: "uniform", category, w: 1 }));
  const strength = (cats: string[], extra: Record<string, unknown> = {}) =>
    combinationSet(Beam.parse({ spans: [4000], loads: loads(cats), selfWeight: false, ...extra }), CombinationSettings.parse({ set: "asce7-22-strength" }), 0).combinations;
  const lambdaOf = (list: ReturnType<typeof strength>, name: string) => list.find((c) => c.name === name)?.timeEffect?.value;

  test("combinationSet: 1.4D 0.6; 1.2D + 1.6L + 0.5Lr 0.8 (occupancy); 1.2D + 1.6Lr + 0.5W 0.8; 1.2D + 1.0S + 0.5W 0.8 (was 1.0); 1.2D + 1.0W + L + 0.5Lr 1.0; 0.9D + 1.0W 1.0", () => {
    const list = strength(["dead", "live", "roof-live", "snow", "wind"]);
    expect(lambdaOf(list, "1.4D")).toBe(0.6);
    expect(lambdaOf(list, "1.2D + 1.6L + 0.5Lr")).toBe(0.8);
    expect(lambdaOf(list, "1.2D + 1.6Lr + 0.5W")).toBe(0.8);
    expect(lambdaOf(list, "1.2D + S + 0.5W")).toBe(0.8); // 7-22: 1.0S principal with strength-level snow
    expect(lambdaOf(list, "1.2D + L + 0.5Lr + W")).toBe(1.0);
    expect(lambdaOf(list, "0.9D + W")).toBe(1.0);
    // 1.2D + 1.6L without the 0.5Lr that would shorten its duration class is there too.
    expect(list.find((c) => c.name === "1.2D + 1.6L")).toMatchObject({ duration: "medium", timeEffect: { value: 0.8 } });
  });

  test("combinationSet: live load from storage (a category acting as live, long-term) 0.7; from impact (instantaneous) 1.25, at most 1.0 for a connection (Table N3 note [M])", () => {
    const storage = strength(["dead", "stored"], { categories: [{ id: "stored", actsAs: "live", duration: "long" }] });
    expect(lambdaOf(storage, "1.2D + 1.6stored")).toBe(0.7);
    const impact = strength(["dead", "crane"], { categories: [{ id: "crane", actsAs: "live", duration: "instantaneous" }] });
    const c = impact.find((x) => x.name === "1.2D + 1.6crane")!;
    expect(c.timeEffect?.value).toBe(1.25);
    expect(ndsConnectionTimeEffect(c.timeEffect, c.categories).value).toBe(1.0);
  });

  test("designSchedule via designMember: D 50 + S 100 + W 200 lb/ft, LRFD: 1.2D + 1.0S + 0.5W at λ 0.8 governs (260/0.8 = 325 > 1.2D + 0.3S + 1.0W 290/1.0) [D]", () => {
    const result = design(usJob("asce7-22-strength", "factored", [{ type: "uniform", category: "dead", w: 50 }, { type: "uniform", category: "snow", w: 100 }, { type: "uniform", category: "wind", w: 200 }]));
    const s = result.schedules[0]!;
    const named = (name: string) => result.beam.combinations.find((c) => c.name === name)!.id;
    const Zprime = (lambda: number) => 140.69 * 3.32 * 0.65 * lambda; // Z × K_F × φ_z × λ, lb
    expectClose(s.resistance.find((r) => r.combination === named("1.2D + S + 0.5W"))!.value / LBF, Zprime(0.8), { rel: 2e-4 });
    expectClose(s.resistance.find((r) => r.combination === named("0.9D + W"))!.value / LBF, Zprime(1.0), { rel: 2e-4 });
    expect(s.verification.combination).toBe(named("1.2D + S + 0.5W"));
    expectClose(s.efficiency.demandIntegral, usDemand(1.2 * 50 + 100 + 0.5 * 200, Zprime(0.8)), { rel: 1e-3 });
  });
});

describe("property: adding a load of any category never lowers the connectors needed nor the largest utilisation, in every combination set", () => {
  const sets = [
    { set: "unfactored", basis: "allowable" },
    { set: "asce7-22-allowable", basis: "allowable" },
    { set: "asce7-22-strength", basis: "factored" },
    { set: "en1990-6.10", basis: "factored" },
  ] as const;
  const category = fc.constantFrom("dead", "live", "roof-live", "snow", "wind");
  // Full-length uniform loads on a simple span: every category's shear has the same shape, so a larger
  // load can only raise the actions of the combinations that hold it; the others stay in the set.
  const load = fc.record({ category, w: fc.integer({ min: 1, max: 40 }) });
  const summary = (job: JobInput) => {
    const designed = design(job);
    const checked = design({ ...job, mode: "check", fastening: { default: { connector: "N", rows: 1, provided: { type: "zones", zones: [{ from: 0, to: 12, spacing: 2 }] } } } } as JobInput);
    return {
      count: designed.schedules.reduce((n, s) => n + s.count, 0),
      demand: designed.schedules.reduce((n, s) => n + s.efficiency.demandIntegral, 0),
      connectorUtilisation: Math.max(...checked.schedules.map((s) => s.verification.maxUtilisation)),
      memberUtilisation: Math.max(0, ...designed.checks.map((c) => ("utilisation" in c && typeof c.utilisation === "number" ? c.utilisation : 0))),
    };
  };

  test("designMember with generated 16d-nailed members (NDS), before and after one more uniform load", () => {
    fc.assert(
      fc.property(fc.array(load, { minLength: 1, maxLength: 3 }), load, fc.constantFrom(...sets), (base, extra, { set, basis }) => {
        const toLoads = (ls: { category: string; w: number }[]): Partial<Load>[] => ls.map((l) => ({ type: "uniform", category: l.category, w: l.w }));
        const before = summary(usJob(set, basis, toLoads(base)));
        const after = summary(usJob(set, basis, toLoads([...base, extra])));
        const label = `${set}: ${JSON.stringify(base)} + ${JSON.stringify(extra)}`;
        expect(after.demand, label).toBeGreaterThanOrEqual(before.demand * (1 - 1e-9));
        expect(after.count, label).toBeGreaterThanOrEqual(before.count);
        expect(after.connectorUtilisation, label).toBeGreaterThanOrEqual(before.connectorUtilisation * (1 - 1e-9));
        expect(after.memberUtilisation, label).toBeGreaterThanOrEqual(before.memberUtilisation * (1 - 1e-9));
      }),
      { numRuns: 40 },
    );
  });
});

describe("property: the combinations left out (pruned, or held by the live-load patterns) change no result", () => {
  // Every selection written out here, independently of the program's set, as a table of the job's own
  // (which is not pruned): the loads as entered (dead with every selection of the four variable
  // categories), and EN 1990 (6.10) for dead and two variable categories: γG 1.35 or 1.0, 1.5 on the
  // leading action, 1.5ψ0 on the other (ψ0: L 0.7, S 0.5, W 0.6, EN 1990 Table A1.1 [M]), every selection.
  const subsetsOf = <T,>(xs: T[]) => Array.from({ length: 1 << xs.length }, (_, m) => xs.filter((_, i) => m & (1 << i)));
  const asEntered = subsetsOf(["live", "roof-live", "snow", "wind"]).map((kept) => Object.fromEntries(["dead", ...kept].map((c) => [c, 1])));
  const psi0: Record<string, number> = { live: 0.7, snow: 0.5, wind: 0.6 };
  const en1990 = (variable: string[]) =>
    [1.35, 1.0].flatMap((g) => [
      { dead: g },
      ...variable.flatMap((lead) => subsetsOf(variable).map((kept) => ({ dead: g, ...Object.fromEntries(kept.map((c) => [c, c === lead ? 1.5 : 1.5 * psi0[c]!])) }))),
    ]);
  const load = fc.record({
    start: fc.integer({ min: 0, max: 19 }),
    extent: fc.integer({ min: 1, max: 20 }),
    w: fc.integer({ min: -40, max: 120 }).filter((w) => w !== 0),
  });
  const spansOf = fc.array(fc.integer({ min: 6, max: 14 }), { minLength: 1, maxLength: 3 });
  /** Twentieths of the member: a load from `start` over `extent` of them, cut at the far end. */
  const placed = (raw: { start: number; extent: number; w: number }[], categories: string[], L: number, scale: number): Partial<Load>[] =>
    raw.map((l, i) => ({ type: "uniform", category: categories[i % categories.length]!, w: l.w * scale, from: (l.start * L) / 20, to: (Math.min(20, l.start + l.extent) * L) / 20 }));
  const compare = (pruned: DesignResult, full: DesignResult, label: string) => {
    expect(pruned.schedules.length).toBe(full.schedules.length);
    pruned.schedules.forEach((s, j) => {
      const f = full.schedules[j]!;
      expectClose(s.efficiency.demandIntegral, f.efficiency.demandIntegral, { rel: 1e-9, abs: 1e-9 }, label);
      expect(s.count, label).toBe(f.count);
      expectClose(s.verification.maxUtilisation, f.verification.maxUtilisation, { rel: 1e-9, abs: 1e-12 }, label);
    });
    const worst = (r: DesignResult) => Math.max(0, ...r.checks.filter((c) => !c.id.startsWith("deflection")).map((c) => ("utilisation" in c && typeof c.utilisation === "number" ? c.utilisation : 0)));
    expectClose(worst(pruned), worst(full), { rel: 1e-9, abs: 1e-12 }, label);
  };
  const custom = (list: Record<string, number>[]) => ({ set: "custom", custom: list.map((factors, i) => ({ id: `C${i + 1}`, factors })) });

  test("designMember: the unfactored set on generated continuous members with loads of either sign equals the 16 selections written out (NDS C_D by each one's shortest load)", () => {
    expect(asEntered).toHaveLength(16);
    fc.assert(
      fc.property(spansOf, fc.array(load, { minLength: 2, maxLength: 6 }), fc.shuffledSubarray(["dead", "live", "roof-live", "snow", "wind"], { minLength: 2 }), (spans, raw, categories) => {
        const loads = placed(raw, categories, spans.reduce((a, b) => a + b, 0), 1);
        const job = (combinations: Record<string, unknown>) =>
          nailedTimberI({ kind: "nail", standard: "NDS-2018", size: "16d common" }, { combinations, beam: { spans, loads, selfWeight: false } } as Partial<JobInput>);
        compare(design(job({ set: "unfactored" })), design(job(custom(asEntered))), JSON.stringify({ spans, loads }));
      }),
      { numRuns: 30 },
    );
  });

  test("designMember: EN 1990 (6.10) on generated continuous members, EC5 nails, equals every selection written out (k_mod by each one's shortest load)", () => {
    fc.assert(
      fc.property(spansOf, fc.array(load, { minLength: 2, maxLength: 6 }), fc.shuffledSubarray(["live", "snow", "wind"], { minLength: 2, maxLength: 2 }), (spans, raw, variable) => {
        const metres = spans.map((l) => l / 3);
        const loads = placed(raw, ["dead", ...variable], metres.reduce((a, b) => a + b, 0), 0.02);
        const job = (combinations: Record<string, unknown>) =>
          nailedTimberI({ kind: "nail", standard: "EN1995-1-1", diameter: 3.1, length: 75, serviceClass: 1 }, {
            units: "si",
            basis: "factored",
            combinations,
            materials: [{ id: "DFL", name: "C24", family: "sawn-timber", E: 11_000, density: 420, characteristicDensity: 350, meanDensity: 420, strength: { bending: 14.8, shear: 2.46 } }],
            parts: [
              { id: "bottom", material: "DFL", shape: { type: "rectangle", b: 140, h: 38 }, x: 0, y: 0 },
              { id: "web", material: "DFL", shape: { type: "rectangle", b: 38, h: 235 }, x: 51, y: 38 },
              { id: "top", material: "DFL", shape: { type: "rectangle", b: 140, h: 38 }, x: 0, y: 273 },
            ],
            beam: { spans: metres, loads, selfWeight: false },
            spacing: { module: 5, minZoneLength: 300, maxZonesPerSpan: 5, symmetric: true },
          } as Partial<JobInput>);
        compare(design(job({ set: "en1990-6.10" })), design(job(custom(en1990(variable)))), JSON.stringify({ spans: metres, loads }));
      }),
      { numRuns: 30 },
    );
  });
});

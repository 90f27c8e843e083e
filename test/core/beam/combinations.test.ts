import fc from "fast-check";
import { describe, expect, test } from "vitest";
import { asce7AllowableCombinations, asce7StrengthCombinations, combinationSet } from "../../../core/beam/combinations.js";
import { builtInDuration, builtInPsi0, shortestDuration } from "../../../core/beam/load-categories.js";
import { valuesAtStations } from "../../../core/beam/beam-result.js";
import { stationsFor } from "../../../core/beam/stations.js";
import { CombinationSettings, type Load } from "../../../core/schema/beam.js";
import type { Combination } from "../../../core/schema/result.js";
import { expectClose } from "../../expect-close.js";
import { analyse, coreBeam } from "./beam-test-kit.js";

// One load of every built-in category, so that every combination of a set appears.
const everyCategory: Partial<Load>[] = [
  { type: "uniform", category: "dead", w: 1 },
  { type: "uniform", category: "live", w: 1 },
  { type: "uniform", category: "roof-live", w: 1 },
  { type: "uniform", category: "snow", w: 1 },
  { type: "uniform", category: "wind", w: 1 },
];
const setOf = (set: string, loads: Partial<Load>[] = everyCategory, extra: Record<string, unknown> = {}, settings: Record<string, unknown> = {}) =>
  combinationSet(coreBeam([4000], undefined, loads, extra), CombinationSettings.parse({ set, ...settings }), 0);
const table = (list: Combination[]) => Object.fromEntries(list.map((c) => [c.id, c.factors]));
// The standard's combinations as written (the selections with loads left out carry "without" in their id).
const forms = (list: Combination[]) => list.filter((c) => !c.id.includes(" without "));

describe("combinationSet: the built-in sets against the standards' tables", () => {
  test("ASCE/SEI 7-22 §2.3.1 strength combinations 1–5 with every alternative of (Lr or S) and (L or 0.5W) written out; 1.0S principal, 0.3S companion for 7-22's strength-level snow ([M])", () => {
    const { combinations } = setOf("asce7-22-strength");
    expect(table(forms(combinations))).toEqual({
      "LRFD-1": { dead: 1.4 }, // (1) 1.4D
      "LRFD-2a": { dead: 1.2, live: 1.6, "roof-live": 0.5 }, // (2) 1.2D + 1.6L + 0.5Lr
      "LRFD-2b": { dead: 1.2, live: 1.6, snow: 0.3 }, // (2) 1.2D + 1.6L + 0.3S
      "LRFD-3a": { dead: 1.2, live: 1, "roof-live": 1.6 }, // (3) 1.2D + 1.6Lr + L
      "LRFD-3b": { dead: 1.2, "roof-live": 1.6, wind: 0.5 }, // (3) 1.2D + 1.6Lr + 0.5W
      "LRFD-3c": { dead: 1.2, live: 1, snow: 1 }, // (3) 1.2D + 1.0S + L
      "LRFD-3d": { dead: 1.2, snow: 1, wind: 0.5 }, // (3) 1.2D + 1.0S + 0.5W
      "LRFD-4a": { dead: 1.2, live: 1, "roof-live": 0.5, wind: 1 }, // (4) 1.2D + 1.0W + L + 0.5Lr
      "LRFD-4b": { dead: 1.2, live: 1, snow: 0.3, wind: 1 }, // (4) 1.2D + 1.0W + L + 0.3S
      "LRFD-5": { dead: 0.9, wind: 1 }, // (5) 0.9D + 1.0W
    });
  });

  test("ASCE/SEI 7-22 §2.4.1 allowable stress combinations 1–7 with alternatives; 0.7S in 3, 4 and 6 ([V] as excerpted in a trade-magazine article; the rest [M])", () => {
    const { combinations } = setOf("asce7-22-allowable");
    const got = table(forms(combinations));
    const expected = {
      "ASD-1": { dead: 1 }, // (1) D
      "ASD-2": { dead: 1, live: 1 }, // (2) D + L
      "ASD-3a": { dead: 1, "roof-live": 1 }, // (3) D + Lr
      "ASD-3b": { dead: 1, snow: 0.7 }, // (3) D + 0.7S
      "ASD-4a": { dead: 1, live: 0.75, "roof-live": 0.75 }, // (4) D + 0.75L + 0.75Lr
      "ASD-4b": { dead: 1, live: 0.75, snow: 0.525 }, // (4) D + 0.75L + 0.75(0.7S)
      "ASD-5": { dead: 1, wind: 0.6 }, // (5) D + 0.6W
      "ASD-6a": { dead: 1, live: 0.75, "roof-live": 0.75, wind: 0.45 }, // (6) D + 0.75L + 0.75(0.6W) + 0.75Lr
      "ASD-6b": { dead: 1, live: 0.75, snow: 0.525, wind: 0.45 }, // (6) D + 0.75L + 0.75(0.6W) + 0.75(0.7S)
      "ASD-7": { dead: 0.6, wind: 0.6 }, // (7) 0.6D + 0.6W
    };
    expect(Object.keys(got)).toEqual(Object.keys(expected));
    for (const [id, factors] of Object.entries(expected)) for (const [c, f] of Object.entries(factors)) expectClose(got[id]![c]!, f, { rel: 1e-12 }, `${id} ${c}`);
  });

  test("EN 1990 eq. (6.10): 1.35G (and 1.0G) + 1.5 × leading + 1.5ψ0 × each other variable load, ψ0 from Table A1.1: L 0.7, roofs 0, snow 0.5, wind 0.6 ([M]); roof imposed load not with snow or wind (EN 1991-1-1 §3.3.2(1) [M])", () => {
    const { combinations, omitted } = setOf("en1990-6.10");
    const got = table(forms(combinations));
    const expected = {
      "EN-1a": { dead: 1.35 },
      "EN-2a": { dead: 1.35, live: 1.5, snow: 0.75, wind: 0.9 },
      "EN-2b": { dead: 1.0, live: 1.5, snow: 0.75, wind: 0.9 },
      "EN-3a": { dead: 1.35, live: 1.05, "roof-live": 1.5 },
      "EN-3b": { dead: 1.0, live: 1.05, "roof-live": 1.5 },
      "EN-4a": { dead: 1.35, live: 1.05, snow: 1.5, wind: 0.9 },
      "EN-4b": { dead: 1.0, live: 1.05, snow: 1.5, wind: 0.9 },
      "EN-5a": { dead: 1.35, live: 1.05, snow: 0.75, wind: 1.5 },
      "EN-5b": { dead: 1.0, live: 1.05, snow: 0.75, wind: 1.5 },
    };
    expect(Object.keys(got)).toEqual(Object.keys(expected));
    for (const [id, factors] of Object.entries(expected)) {
      expect(Object.keys(got[id]!).sort(), id).toEqual(Object.keys(factors).sort());
      for (const [c, f] of Object.entries(factors)) expectClose(got[id]![c]!, f, { rel: 1e-12 }, `${id} ${c}`);
    }
    expect(omitted.find((o) => o.id === "EN-1b")?.reason).toMatch(/a fraction \(0\.7407\) of EN-1a/); // 1.0G alone is a fraction of 1.35G
    expect(builtInPsi0).toMatchObject({ live: 0.7, "roof-live": 0, snow: 0.5, wind: 0.6 });
  });

  test("EN 1990: ψ0 set in the job replaces the default (here snow 0.7, as for sites above 1000 m, Table A1.1 [M])", () => {
    const { combinations } = setOf("en1990-6.10", everyCategory, {}, { psi0: { snow: 0.7 } });
    expectClose(table(combinations)["EN-2a"]!.snow!, 1.05, { rel: 1e-12 });
  });

  test("the unfactored set keeps every load as entered, factor 1, and dead load with every selection of the variable loads (2⁴ = 16 with four variable categories), each at its own duration", () => {
    const { combinations, omitted } = setOf("unfactored");
    expect(combinations).toHaveLength(16);
    expect(omitted).toEqual([]); // the corners of a cube: none lies between others
    expect(combinations[0]).toMatchObject({ id: "U", name: "Loads as entered", factors: { dead: 1, live: 1, "roof-live": 1, snow: 1, wind: 1 }, duration: "short" });
    for (const c of combinations) expect(c.factors.dead, c.id).toBe(1);
    expect(new Set(combinations.map((c) => c.categories.slice().sort().join("+"))).size).toBe(16);
    expect(combinations.find((c) => c.categories.length === 1)).toMatchObject({ factors: { dead: 1 }, duration: "permanent" });
  });
});

describe("combinationSet: load durations and categories", () => {
  test("each combination carries the duration of its shortest-duration load (EN 1995-1-1 §3.1.3(2) [V]; classes by category [M]/[CP])", () => {
    // Wind: short-term unless the job chooses instantaneous (Table 2.2 lists both [M]; national annexes differ).
    expect(builtInDuration).toEqual({ dead: "permanent", live: "medium", "roof-live": "short", snow: "short", wind: "short" });
    const byId = Object.fromEntries(setOf("asce7-22-strength").combinations.map((c) => [c.id, c]));
    expect(byId["LRFD-1"]).toMatchObject({ duration: "permanent", categories: ["dead"] });
    expect(byId["LRFD-2b"]).toMatchObject({ duration: "short", categories: ["dead", "live", "snow"] });
    expect(byId["LRFD-4a"]!.duration).toBe("short");
    const instantaneous = Object.fromEntries(setOf("asce7-22-strength", everyCategory, { windDuration: "instantaneous" }).combinations.map((c) => [c.id, c]));
    expect(instantaneous["LRFD-4a"]!.duration).toBe("instantaneous");
    expect(instantaneous["LRFD-2b"]!.duration).toBe("short");
    expect(shortestDuration([])).toBe("unspecified");
  });

  test("a category of the job's own takes the factors of the one it acts as, and its own duration", () => {
    const loads: Partial<Load>[] = [{ type: "uniform", category: "dead", w: 1 }, { type: "uniform", category: "storage", w: 1 }];
    const { combinations } = setOf("asce7-22-strength", loads, { categories: [{ id: "storage", actsAs: "live", duration: "long" }] });
    expect(table(combinations)).toEqual({ "LRFD-1": { dead: 1.4 }, "LRFD-2": { dead: 1.2, storage: 1.6 } });
    expect(combinations[1]!.duration).toBe("long");
    // λ 0.7 for 1.2D + 1.6L with L from storage (NDS-2018 Table N3 [M]); the category's long-term class says storage.
    expect(combinations[1]!.timeEffect?.value).toBe(0.7);
    expect(combinations[1]!.name).toBe("1.2D + 1.6storage");
  });

  test("a custom table keeps its combinations as given, drops absent categories and may fix the duration", () => {
    const loads: Partial<Load>[] = [{ type: "uniform", category: "dead", w: 1 }, { type: "uniform", category: "live", w: 1 }];
    const custom = [
      { id: "C1", name: "site rule", factors: { dead: 1.3, live: 1.5, snow: 1.5 } },
      { id: "C2", factors: { dead: 1.0, live: 1.0 }, duration: "short" },
    ];
    const { combinations } = setOf("custom", loads, {}, { custom });
    expect(combinations).toMatchObject([
      { id: "C1", name: "site rule", factors: { dead: 1.3, live: 1.5 }, duration: "medium", categories: ["dead", "live"] },
      { id: "C2", name: "D + L", factors: { dead: 1, live: 1 }, duration: "short", categories: ["dead", "live"] },
    ]);
    expect(combinations.map((c) => Object.keys(c.factors))).toEqual([["dead", "live"], ["dead", "live"]]);
    // No principal load is named in a table of one's own: λ is the least any load present would take (L occupancy 0.8, NDS-2018 Table N3 [M]).
    expect(combinations.map((c) => c.timeEffect?.value)).toEqual([0.8, 0.8]);
  });
});

describe("combinationSet: combinations that cannot govern", () => {
  const deadAndLive: Partial<Load>[] = [{ type: "uniform", category: "dead", w: 1 }, { type: "uniform", category: "live", w: 1 }];

  test("with dead and live load only, ASD keeps D and D + L; D + 0.75L lies between them and 0.6D is a fraction of D", () => {
    const { combinations, omitted } = setOf("asce7-22-allowable", deadAndLive);
    expect(combinations.map((c) => c.id)).toEqual(["ASD-1", "ASD-2"]);
    const why = Object.fromEntries(omitted.map((o) => [o.id, o.reason]));
    expect(why["ASD-4a"]).toBe("between ASD-1 and ASD-2");
    expect(why["ASD-7"]).toMatch(/a fraction \(0\.6\) of ASD-1/);
  });

  test("with dead and live load only, LRFD keeps 1.4D and 1.2D + 1.6L", () => {
    expect(setOf("asce7-22-strength", deadAndLive).combinations.map((c) => c.name)).toEqual(["1.4D", "1.2D + 1.6L"]);
  });

  test("leaving them out changes neither extreme of V or M anywhere (the largest positive and the largest negative value), on random continuous members with loads of either sign", () => {
    const load = fc.record({
      category: fc.constantFrom("dead", "live", "roof-live", "snow", "wind"),
      a: fc.double({ min: 0, max: 1, noNaN: true }),
      b: fc.double({ min: 0, max: 1, noNaN: true }),
      w: fc.integer({ min: -50, max: 150 }).map((w) => w / 10),
    });
    fc.assert(
      fc.property(fc.array(fc.integer({ min: 1000, max: 6000 }), { minLength: 1, maxLength: 3 }), fc.array(load, { minLength: 1, maxLength: 6 }), fc.constantFrom("strength", "allowable"), (spans, raw, kind) => {
        const L = spans.reduce((s, l) => s + l, 0);
        const loads: Partial<Load>[] = raw.filter((l) => Math.abs(l.a - l.b) > 1e-3).map((l) => ({ type: "uniform", category: l.category, w: l.w, from: Math.min(l.a, l.b) * L, to: Math.max(l.a, l.b) * L }));
        if (loads.length === 0) return;
        const beam = coreBeam(spans, undefined, loads);
        const kept = combinationSet(beam, CombinationSettings.parse({ set: `asce7-22-${kind}` }), 0).combinations;
        const templates = kind === "strength" ? asce7StrengthCombinations : asce7AllowableCombinations;
        const all: Combination[] = templates.map((t) => ({ id: t.id, name: t.id, factors: { ...t.factors }, duration: "unspecified", categories: Object.keys(t.factors) }));
        const a = analyse(beam, kept);
        const b = analyse(beam, all);
        const stations = stationsFor(L, [...new Set(b.results.flatMap((r) => r.actions.breaks))], 200);
        const envelope = (entries: typeof a.results) => {
          const v = entries.map((e) => valuesAtStations(e.actions, e.curve, stations));
          return (pick: "shear" | "moment", f: (...x: number[]) => number) => stations.map((_, j) => f(...v.map((s) => s[pick][j]!)));
        };
        const ea = envelope(a.results);
        const eb = envelope(b.results);
        const scale = Math.max(1, ...eb("moment", Math.max).map(Math.abs), ...eb("moment", Math.min).map(Math.abs));
        const vScale = Math.max(1, ...eb("shear", Math.max).map(Math.abs), ...eb("shear", Math.min).map(Math.abs));
        // A combination that is a fraction of another can be the least extreme value at a point (nearer
        // zero than all others), never the extreme one: compare the positive maxima and negative minima.
        for (const [f, side] of [[Math.max, 1], [Math.min, -1]] as const) {
          ea("shear", f).forEach((v, j) => expectClose(side * Math.max(0, side * v), side * Math.max(0, side * eb("shear", f)[j]!), { abs: 1e-9 * vScale }, `V envelope at ${stations[j]!.x}`));
          ea("moment", f).forEach((m, j) => expectClose(side * Math.max(0, side * m), side * Math.max(0, side * eb("moment", f)[j]!), { abs: 1e-9 * scale }, `M envelope at ${stations[j]!.x}`));
        }
      }),
      { numRuns: 40 },
    );
  });
});

import { describe, expect, test } from "vitest";
import { Nail, nailKind } from "../../../core/connector/nail.js";
import { ndsGroupActionFactor, ndsLoadDurationFactor } from "../../../core/connector/timber/nds-adjustment.js";
import { hankinson, ndsNailBendingYield, ndsSteelBearing, ndsWoodBearing } from "../../../core/connector/timber/nds-dowel-bearing.js";
import { ndsReductionTerm, ndsYieldLimit } from "../../../core/connector/timber/nds-yield-limit.js";
import { TimberBolt, timberBoltKind } from "../../../core/connector/timber-bolt.js";
import { expectClose } from "../../expect-close.js";
import { context, IN, LBF, member, steel, wood } from "./contexts.js";

// Sources: ANSI/AWC NDS-2018 (and the same text in NDS-2005 ch. 11) via /work/shared/REFERENCES.md §5.
// Flags: [V] published and seen, [M] from memory, [D] derived from a closed form, [CP] common practice.

describe("ndsWoodBearing(G, D, θ): dowel bearing strength, NDS §12.3.3 (REFERENCES §5.1)", () => {
  // Formulas: 16 600 G^1.84 [M] (reproduces the [V] 16d value), 11 200 G [V], 6 100 G^1.45/√D [V]; numbers [D].
  const rows: [number, number, number, number, number][] = [
    [0.42, 3364.2, 4704, 2452.2, 2002.2],
    [0.43, 3513.1, 4816, 2537.3, 2071.7],
    [0.5, 4636.7, 5600, 3157.6, 2578.1],
    [0.55, 5525.5, 6160, 3625.5, 2960.2],
  ];
  test.each(rows)("G = %s gives F_e (D < 1/4) %s, F_e∥ %s, F_e⊥ (1/2 in) %s, F_e⊥ (3/4 in) %s psi [D]", (G, small, par, perpHalf, perpThreeQuarter) => {
    expectClose(ndsWoodBearing(G, 0.162, 0).value, small, { rel: 1e-4 });
    expectClose(ndsWoodBearing(G, 0.5, 0).value, par, { rel: 1e-4 });
    expectClose(ndsWoodBearing(G, 0.5, 90).value, perpHalf, { rel: 1e-4 });
    expectClose(ndsWoodBearing(G, 0.75, 90).value, perpThreeQuarter, { rel: 1e-4 });
  });

  test("Hankinson's formula at 30°, 45°, 60° for a 1/2 in bolt in G = 0.50 gives 4692.6, 4038.2, 3544.0 psi [D] (formula [V], NDS App. J)", () => {
    expectClose(ndsWoodBearing(0.5, 0.5, 30).value, 4692.6, { rel: 1e-4 });
    expectClose(ndsWoodBearing(0.5, 0.5, 45).value, 4038.2, { rel: 1e-4 });
    expectClose(ndsWoodBearing(0.5, 0.5, 60).value, 3544.0, { rel: 1e-4 });
    expect(hankinson(5600, 3157.6, 0)).toBeCloseTo(5600, 9);
  });

  test("a steel side plate bears at 1.5 F_u hot-rolled and 1.375 F_u cold-formed: A36 (F_u 58 ksi) → 87 000 psi and 79 750 psi [D] (formula [V], NDS Table 12.3.3 footnote)", () => {
    expect(ndsSteelBearing(58_000, 0.25).value).toBeCloseTo(87_000, 6);
    expect(ndsSteelBearing(58_000, 0.1875).value).toBeCloseTo(79_750, 6);
  });
});

describe("ndsReductionTerm(D, mode, θ): NDS Table 12.3.1B (REFERENCES §5.2)", () => {
  // Table [M]; numbers [D].
  test("K_D = 2.2 at D = 0.162, 10D + 0.5 = 2.5 at 0.20 and 2.9 at 0.24 in", () => {
    expect(ndsReductionTerm(0.162, "IV", 0)).toBe(2.2);
    expectClose(ndsReductionTerm(0.2, "Im", 0), 2.5, { rel: 1e-12 });
    expectClose(ndsReductionTerm(0.24, "II", 0), 2.9, { rel: 1e-12 });
  });
  test("D = 1/2 in: 4.0 / 3.6 / 3.2 at θ = 0 and 5.0 / 4.5 / 4.0 at θ = 90°", () => {
    expect([ndsReductionTerm(0.5, "Is", 0), ndsReductionTerm(0.5, "II", 0), ndsReductionTerm(0.5, "IV", 0)]).toEqual([4, 3.6, 3.2]);
    expect([ndsReductionTerm(0.5, "Im", 90), ndsReductionTerm(0.5, "II", 90), ndsReductionTerm(0.5, "IIIs", 90)].map((x) => Number(x.toFixed(12)))).toEqual([5, 4.5, 4]);
  });
});

describe("ndsYieldLimit(): 16d common nail, DF-L, 1-1/2 in side member (REFERENCES §5.4)", () => {
  // Yield limit equations [M] (they reproduce the [V] table value 141 lb); mode values [D].
  const Fe = 16_600 * 0.5 ** 1.84;
  const base = { diameterIn: 0.162, bendingYieldPsi: 90_000, sideLengthIn: 1.5, sideBearingPsi: Fe, mainBearingPsi: Fe, shear: "single" as const, maxAngleDeg: 0 };

  test("with ℓm = 2.0 in every mode matches: Im 682.87, Is 512.15, II 251.80, IIIm 241.89, IIIs 189.52, IV 140.69 lb; IV governs [D]", () => {
    const z = ndsYieldLimit({ ...base, mainLengthIn: 2.0 });
    const expected: Record<string, number> = { Im: 682.87, Is: 512.15, II: 251.8, IIIm: 241.89, IIIs: 189.52, IV: 140.69 };
    for (const m of z.modes) expectClose(m.zLb, expected[m.mode]!, { abs: 0.01 }, `mode ${m.mode}`);
    expect(z.governing.mode).toBe("IV");
    expectClose(z.k1!, 0.4916, { abs: 1e-4 }, "k1");
    expectClose(z.k2!, 1.0627, { abs: 1e-4 }, "k2");
    expectClose(z.k3, 1.1102, { abs: 1e-4 }, "k3");
  });

  test("with ℓm = 10D = 1.62 in: Im 553.12, II 220.90, IIIm 201.85; IV still 140.69 lb [D]", () => {
    const z = ndsYieldLimit({ ...base, mainLengthIn: 1.62 });
    const by = Object.fromEntries(z.modes.map((m) => [m.mode, m.zLb]));
    expectClose(by.Im!, 553.12, { abs: 0.01 });
    expectClose(by.II!, 220.9, { abs: 0.01 });
    expectClose(by.IIIm!, 201.85, { abs: 0.01 });
    expectClose(z.governing.zLb, 140.69, { abs: 0.01 });
  });

  test("with the tabulated F_e = 4650 psi Z = 140.9 lb [D]", () => {
    const z = ndsYieldLimit({ ...base, sideBearingPsi: 4650, mainBearingPsi: 4650, mainLengthIn: 2.0 });
    expectClose(z.governing.zLb, 140.89, { abs: 0.01 });
  });
});

describe("nailKind by trade name: NDS reference lateral design values Z (REFERENCES §5.5)", () => {
  const dfl = wood(0.5);
  const flangeOnWeb = context(member("flange", dfl, 1.5 * IN, 5.5 * IN), member("web", dfl, 9.25 * IN, 1.5 * IN), { categories: ["live"], units: "us" });
  const z = (size: string) => nailKind.resistance(Nail.parse({ id: "n", kind: "nail", standard: "NDS-2018", size }), flangeOnWeb).value / LBF;

  test("16d common → 141 lb, the NDS table value (NDS-2005 Table 11N, DF-L, 1-1/2 in side member) [V]; C_D = 1.0", () => {
    expectClose(z("16d common"), 141, { abs: 0.5 });
  });
  test("8d common → 97 lb [M] (formula 96.98 [D])", () => expectClose(z("8d common"), 97, { abs: 0.5 }));
  test("10d common → 118 lb [M] (formula 117.43 [D])", () => expectClose(z("10d"), 118, { abs: 0.6 }));
  test("12d common → 118 lb [M] (formula 117.43 [D])", () => expectClose(z("12d common"), 118, { abs: 0.6 }));
  test("20d common → 170 lb [M] (formula 169.39 [D], R_d = 10D + 0.5 = 2.42)", () => expectClose(z("20d common"), 170, { abs: 0.65 }));

  test("the result names mode IV as governing, cites Table 12.3.1A and lists all six modes", () => {
    const r = nailKind.resistance(Nail.parse({ id: "n", kind: "nail", standard: "NDS-2018", size: "16d common" }), flangeOnWeb);
    expect(r.governing).toBe("mode IV");
    expect(r.reference).toContain("Table 12.3.1A");
    expect(r.modes!.map((m) => m.mode)).toEqual(["mode Im", "mode Is", "mode II", "mode IIIm", "mode IIIs", "mode IV"]);
    expect(Math.min(...r.modes!.map((m) => m.value))).toBe(r.value);
  });

  test("F_yb by diameter band: 100, 90, 80, 70, 60, 45 ksi [M] (NDS nail tables' footnotes)", () => {
    expect([0.131, 0.162, 0.192, 0.25, 0.3, 0.36].map(ndsNailBendingYield)).toEqual([100_000, 90_000, 80_000, 70_000, 60_000, 45_000]);
  });
});

describe("NDS adjustment factors on the 16d common (REFERENCES §5.8)", () => {
  const dfl = wood(0.5);
  const nail = Nail.parse({ id: "n", kind: "nail", standard: "NDS-2018", size: "16d common" });
  const at = (options: Parameters<typeof context>[2], c = nail) => nailKind.resistance(c, context(member("flange", dfl, 1.5 * IN), member("web", dfl, 9.25 * IN), { units: "us", ...options })).value / LBF;
  const Z = at({ categories: ["live"] });

  // C_D values [V] (NDS §2.3.2 as tabulated after Breyer et al.); worked numbers on Z = 141 lb [D], assert to 0.3 % (141 vs 140.69).
  test.each([
    [["dead"], 0.9, 126.9],
    [["dead", "snow"], 1.15, 162.1],
    [["dead", "roof-live"], 1.25, 176.2],
    [["dead", "live", "wind"], 1.6, 225.6],
  ] as const)("a combination of %j takes C_D = %s, so Z′ ≈ %s lb", (categories, CD, worked) => {
    const value = at({ categories: [...categories] });
    expectClose(value, CD * Z, { rel: 1e-9 });
    expectClose(value, worked, { rel: 3e-3 });
  });

  test("C_D is capped at 1.6 for connections (NDS §11.3.2) [V]", () => {
    expect(ndsLoadDurationFactor(["wind"], "instantaneous").value).toBe(1.6);
    expect(ndsLoadDurationFactor([], "instantaneous").value).toBe(1.6);
  });

  test("toe-nailing (C_tn = 0.83) gives 117.0 lb and end grain (C_eg = 0.67) 94.5 lb [M] factors, [D] numbers", () => {
    expectClose(at({ categories: ["live"] }, Nail.parse({ id: "n", kind: "nail", standard: "NDS-2018", size: "16d common", toeNailed: true })), 117.0, { rel: 3e-3 });
    expectClose(at({ categories: ["live"] }, Nail.parse({ id: "n", kind: "nail", standard: "NDS-2018", size: "16d common", endGrain: true })), 94.5, { rel: 3e-3 });
  });

  test("LRFD: Z × K_F 3.32 × φ 0.65 × λ 0.8 = 243.4 lb [D] (K_F, φ [V] Table 11.3.1; λ [M])", () => {
    expectClose(at({ categories: ["dead", "live"], basis: "factored" }), 243.4, { rel: 3e-3 });
  });

  test("wet service C_M = 0.7 and temperature C_t = 0.7 (wet, 100–125 °F) multiply Z [M]", () => {
    const wet = Nail.parse({ id: "n", kind: "nail", standard: "NDS-2018", size: "16d common", moisture: "wet", temperature: "100-125F" });
    expectClose(at({ categories: ["live"] }, wet), 0.7 * 0.7 * Z, { rel: 1e-9 });
  });

  test("group action C_g is exactly 1 for one fastener in a row, below 1 for ten [D] (NDS §11.3.6 eq. 11.3-1 [M])", () => {
    const base = { spacingIn: 4, diameterIn: 0.75, mainStiffnessLb: 1.6e6 * 5.25, sideStiffnessLb: 1.6e6 * 5.25, woodToMetal: false };
    expect(ndsGroupActionFactor({ ...base, fasteners: 1 }).value).toBe(1);
    const ten = ndsGroupActionFactor({ ...base, fasteners: 10 }).value;
    expect(ten).toBeLessThan(1);
    expect(ten).toBeGreaterThan(0.5);
  });
});

describe("timberBoltKind by the NDS: double shear and steel side plates", () => {
  test("a bolt in double shear reports per contact line half the double-shear Z, with no mode II or IIIm", () => {
    const dfl = wood(0.5);
    const bolt = TimberBolt.parse({ id: "b", kind: "timber-bolt", standard: "NDS-2018", size: "1/2", shear: "double" });
    const r = timberBoltKind.resistance(bolt, context(member("side", dfl, 1.5 * IN, 5.5 * IN), member("main", dfl, 3.5 * IN, 5.5 * IN), { categories: ["live"], units: "us" }));
    expect(r.modes!.map((m) => m.mode)).toEqual(["mode Im", "mode Is", "mode IIIs", "mode IV"]);
    const z = ndsYieldLimit({ diameterIn: 0.5, bendingYieldPsi: 45_000, sideLengthIn: 1.5, mainLengthIn: 3.5, sideBearingPsi: 5600, mainBearingPsi: 5600, shear: "double", maxAngleDeg: 0 });
    expectClose(r.value / LBF, z.governing.zLb / 2, { rel: 1e-9 });
  });

  test("a steel side plate bears at 1.5 F_u in the yield model", () => {
    const bolt = TimberBolt.parse({ id: "b", kind: "timber-bolt", standard: "NDS-2018", size: "3/4" });
    const r = timberBoltKind.resistance(bolt, context(member("plate", steel(400), 0.25 * IN, 6 * IN), member("beam", wood(0.5), 3.5 * IN, 5.5 * IN), { units: "us" }));
    const Fes = r.steps.find((s) => s.symbol === "F_es")!;
    expectClose(Fes.value, 1.5 * 400, { rel: 1e-9 });
  });
});

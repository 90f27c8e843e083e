import { describe, expect, test } from "vitest";
import { SteelBolt, steelBoltKind } from "../../../core/connector/steel-bolt.js";
import { inchBolt, metricBoltSize } from "../../../core/connector/steel/bolt-sizes.js";
import { expectClose } from "../../expect-close.js";
import { context, IN, KIP, KSI, member, steel } from "./contexts.js";

// Sources via /work/shared/REFERENCES.md §7: AISC 360-16 §J3 (360-10 Table J3.2 [V]) and the AISC Manual Table 7-1;
// EN 1993-1-8:2005 Table 3.4 [V] and SCI/BCSA-type design tables [V]. Flags beside each claim.

const plate = (tIn: number, FuKsi = 58) => member(`plate ${tIn} in`, steel(FuKsi * KSI), tIn * IN, 12 * IN);
const aisc = (fields: Record<string, unknown>) => SteelBolt.parse({ id: "b", kind: "steel-bolt", standard: "AISC-360-16", ...fields });
const en = (fields: Record<string, unknown>) => SteelBolt.parse({ id: "b", kind: "steel-bolt", standard: "EN1993-1-8", ...fields });
const mode = (r: ReturnType<typeof steelBoltKind.resistance>, name: string) => r.modes!.find((m) => m.mode.startsWith(name))!.value;

describe("AISC 360-16 bolt shear, one plane (REFERENCES §7.1)", () => {
  const thick = (basis: "allowable" | "factored") => context(plate(1), plate(1), { basis, units: "us" });
  const shear = (fields: Record<string, unknown>, basis: "allowable" | "factored") => mode(steelBoltKind.resistance(aisc(fields), thick(basis)), "bolt shear") / KIP;

  test("3/4 in Group A, threads included: φR_n = 17.9 kips, the Manual Table 7-1 value [V] (17.892 [D])", () => {
    expectClose(shear({ size: "3/4", grade: "A" }, "factored"), 17.9, { abs: 0.1 });
    expectClose(shear({ size: "3/4", grade: "A325" }, "factored"), 17.892, { rel: 1e-4 });
  });
  test("3/4 in Group A-N: R_n/Ω = 11.9 kips [M] (11.928 [D])", () => expectClose(shear({ size: "3/4", grade: "A" }, "allowable"), 11.9, { abs: 0.1 }));
  test("3/4 in Group A-X: 22.5 / 15.0 kips [M] (22.531 / 15.021 [D])", () => {
    expectClose(shear({ size: "3/4", grade: "A", threads: "excluded" }, "factored"), 22.5, { abs: 0.1 });
    expectClose(shear({ size: "3/4", grade: "A", threads: "excluded" }, "allowable"), 15.0, { abs: 0.1 });
  });
  test("7/8 in Group A-N: 24.3 / 16.2 kips [M] (24.353 / 16.236 [D]); A-X 30.7 / 20.4 kips [M]", () => {
    expectClose(shear({ size: "7/8", grade: "A" }, "factored"), 24.353, { rel: 1e-4 });
    expectClose(shear({ size: "7/8", grade: "A" }, "factored"), 24.3, { abs: 0.1 });
    expectClose(shear({ size: "7/8", grade: "A" }, "allowable"), 16.2, { abs: 0.1 });
    expectClose(shear({ size: "7/8", grade: "A", threads: "excluded" }, "factored"), 30.7, { abs: 0.1 });
    expectClose(shear({ size: "7/8", grade: "A", threads: "excluded" }, "allowable"), 20.4, { abs: 0.1 });
  });
  test("3/4 in Group B-N 22.531 / 15.021 kips and 1 in Group A-N 31.809 / 21.206 kips [D] (F_nv [V])", () => {
    expectClose(shear({ size: "3/4", grade: "A490" }, "factored"), 22.531, { rel: 1e-4 });
    expectClose(shear({ size: "3/4", grade: "B" }, "allowable"), 15.021, { rel: 1e-4 });
    expectClose(shear({ size: "1", grade: "A" }, "factored"), 31.809, { rel: 1e-4 });
    expectClose(shear({ size: "1", grade: "A" }, "allowable"), 21.206, { rel: 1e-4 });
  });
  test("an A307 bolt takes F_nv = 27 ksi whatever the threads [V]: 3/4 in → 8.946 kips LRFD [D]", () => {
    expectClose(shear({ size: "3/4", grade: "A307" }, "factored"), 0.75 * 27 * Math.PI * 0.375 ** 2, { rel: 1e-9 });
  });
  test("double shear doubles the bolt's shear and reports half per contact line", () => {
    const r = steelBoltKind.resistance(aisc({ size: "3/4", grade: "A", shear: "double" }), thick("factored"));
    expectClose(mode(r, "bolt shear") / KIP, 17.892, { rel: 1e-4 });
  });
});

describe("AISC 360-16 slip-critical joints, §J3.8 (REFERENCES §7.1)", () => {
  const at = (fields: Record<string, unknown>, basis: "allowable" | "factored") => mode(steelBoltKind.resistance(aisc(fields), context(plate(1), plate(1), { basis, units: "us" })), "slip") / KIP;
  test("3/4 in Group A, Class A: 9.49 / 6.33 kips (Manual Table 7-3 [M]; 9.492 / 6.328 [D], μ = 0.30 [M], D_u = 1.13 [V])", () => {
    expectClose(at({ size: "3/4", grade: "A", slipCritical: "class-A" }, "factored"), 9.492, { rel: 1e-4 });
    expectClose(at({ size: "3/4", grade: "A", slipCritical: "class-A" }, "allowable"), 6.328, { rel: 1e-4 });
  });
  test("3/4 in Group A, Class B: 15.82 / 10.55 kips [D]", () => {
    expectClose(at({ size: "3/4", grade: "A", slipCritical: "class-B" }, "factored"), 15.82, { rel: 1e-3 });
    expectClose(at({ size: "3/4", grade: "A", slipCritical: "class-B" }, "allowable"), 10.55, { rel: 1e-3 });
  });
  test("7/8 in Group A Class A 13.221 / 8.814 kips and 3/4 in Group B Class A 11.865 / 7.910 kips [D]", () => {
    expectClose(at({ size: "7/8", grade: "A", slipCritical: "class-A" }, "factored"), 13.221, { rel: 1e-4 });
    expectClose(at({ size: "7/8", grade: "A", slipCritical: "class-A" }, "allowable"), 8.814, { rel: 1e-4 });
    expectClose(at({ size: "3/4", grade: "B", slipCritical: "class-A" }, "factored"), 11.865, { rel: 1e-4 });
    expectClose(at({ size: "3/4", grade: "B", slipCritical: "class-A" }, "allowable"), 7.91, { rel: 1e-3 });
  });
  test("minimum pretension T_b, Table J3.1 [V]", () => {
    expect(["1/2", "5/8", "3/4", "7/8", "1", "1-1/8", "1-1/4"].map((s) => inchBolt([0.5, 0.625, 0.75, 0.875, 1, 1.125, 1.25][["1/2", "5/8", "3/4", "7/8", "1", "1-1/8", "1-1/4"].indexOf(s)]!)!.pretensionKips)).toEqual([
      { A: 12, B: 15 },
      { A: 19, B: 24 },
      { A: 28, B: 35 },
      { A: 39, B: 49 },
      { A: 51, B: 64 },
      { A: 56, B: 80 },
      { A: 71, B: 102 },
    ]);
  });
});

describe("AISC 360-16 bearing and tear-out, §J3.10 (equation forms [V], numbers [D])", () => {
  test("3/4 in bolt in 1/2 in A36 plates at the least end distance (1 in) and 3d spacing: end-bolt tear-out 1.2 l_c t F_u governs at 15.50 kips LRFD", () => {
    const r = steelBoltKind.resistance(aisc({ size: "3/4", grade: "A" }), context(plate(0.5), plate(0.5), { basis: "factored", units: "us" }));
    expect(r.governing).toContain("tear-out at the end bolt");
    expectClose(r.value / KIP, 0.75 * 1.2 * (1 - 0.8125 / 2) * 0.5 * 58, { rel: 1e-9 });
    expectClose(r.value / KIP, 15.497, { rel: 1e-4 });
    expectClose(mode(r, "bearing at the holes") / KIP, 0.75 * 2.4 * 0.75 * 0.5 * 58, { rel: 1e-9 });
    expectClose(mode(r, "tear-out between bolts") / KIP, 0.75 * 1.2 * (2.25 - 0.8125) * 0.5 * 58, { rel: 1e-9 });
  });
  test("with deformation not a design consideration the coefficients are 1.5 and 3.0", () => {
    const r = steelBoltKind.resistance(aisc({ size: "3/4", grade: "A", deformationConsidered: false, endDistance: 2 }), context(plate(0.5), plate(0.5), { basis: "factored", units: "us" }));
    expectClose(mode(r, "bearing at the holes") / KIP, 0.75 * 3.0 * 0.75 * 0.5 * 58, { rel: 1e-9 });
  });
});

describe("AISC 360-16 spacing and edge distances (REFERENCES §7.1)", () => {
  const limits = (size: string, tIn: number, weathering = false) => steelBoltKind.detailing(aisc({ size, grade: "A", weathering }), context(plate(tIn), plate(1), { units: "us" }));
  test("minimum edge distance, Table J3.4 [V]: 1/2 → 3/4, 5/8 → 7/8, 3/4 → 1, 7/8 → 1-1/8, 1 → 1-1/4, 1-1/8 → 1-1/2, 1-1/4 → 1-5/8 in", () => {
    const sizes = ["1/2", "5/8", "3/4", "7/8", "1", "1-1/8", "1-1/4"];
    sizes.forEach((s, i) => expect(limits(s, 1).edgeDistance! / IN).toBeCloseTo([0.75, 0.875, 1, 1.125, 1.25, 1.5, 1.625][i]!, 12));
  });
  test("2-2/3 d = 2.000 in for a 3/4 in bolt and 3d = 2.25 in, the preferred minimum used [D] (J3.3 [V] / [M])", () => {
    expectClose(limits("3/4", 1).minSpacing / IN, 2.25, { rel: 1e-12 });
    const tooClose = steelBoltKind.problems!(aisc({ size: "3/4", grade: "A", minSpacing: 1.9 * IN }), context(plate(1), plate(1), { units: "us" }));
    expect(tooClose[0]!.message).toContain("2 in");
  });
  test.each([
    [0.25, 6.0, 3.5],
    [0.375, 9.0, 5.25],
    [0.5, 12.0, 7.0],
    [0.625, 12.0, 7.0],
  ])("plates in contact, thinner part t = %s in: maximum spacing 24t ≤ 12 in = %s in, weathering 14t ≤ 7 in = %s in (§J3.5 [V], numbers [D])", (t, painted, weathering) => {
    expectClose(limits("3/4", t).maxSpacing! / IN, painted, { rel: 1e-12 });
    expectClose(limits("3/4", t, true).maxSpacing! / IN, weathering, { rel: 1e-12 });
  });
});

describe("EN 1993-1-8 Table 3.4 bolt shear, one plane, γ_M2 = 1.25 (REFERENCES §7.3)", () => {
  const thick = context(member("a", steel(430), 30, 300), member("b", steel(430), 30, 300), { basis: "factored" });
  const shear = (fields: Record<string, unknown>) => mode(steelBoltKind.resistance(en(fields), thick), "bolt shear") / 1000;
  test.each([
    ["M16", "8.8", "included", 60.29, 60.3],
    ["M16", "10.9", "included", 62.8, 62.8],
    ["M16", "4.6", "included", 30.14, 30.1],
    ["M20", "8.8", "included", 94.08, 94.1],
    ["M20", "10.9", "included", 98.0, 98],
    ["M20", "4.6", "included", 47.04, 47.0],
    ["M24", "8.8", "included", 135.55, 136],
    ["M24", "10.9", "included", 141.2, 141],
  ] as const)("%s %s, threads %s: %s kN [D]; design table %s kN [V]", (size, grade, threads, derived, table) => {
    const value = shear({ size, grade, threads });
    expectClose(value, derived, { rel: 1e-3 });
    expectClose(value, table, { abs: table >= 100 ? 0.5 : 0.05 }); // the tables print three significant figures
  });
  test("shear plane through the shank: M16 8.8 77.21 kN, M20 8.8 120.64 kN, M24 8.8 173.72 kN [D]", () => {
    expectClose(shear({ size: "M16", grade: "8.8", threads: "excluded" }), 77.21, { rel: 1e-3 });
    expectClose(shear({ size: "M20", grade: "8.8", threads: "excluded" }), 120.64, { rel: 1e-3 });
    expectClose(shear({ size: "M24", grade: "8.8", threads: "excluded" }), 173.72, { rel: 1e-3 });
  });
  test("M24 4.6 through the thread: 67.78 kN [D]", () => expectClose(shear({ size: "M24", grade: "4.6" }), 67.78, { rel: 1e-3 }));
  test("tensile stress areas: M16 157, M20 245, M24 353 mm² [V]", () => {
    expect(["M16", "M20", "M24"].map((s) => metricBoltSize(s)!.As)).toEqual([157, 245, 353]);
  });
});

describe("EN 1993-1-8 Table 3.4 bearing (formula [M], numbers [D])", () => {
  test("M20 8.8 in 10 mm S275 plates (f_u 430) at the least distances e₁ = e₂ = 1.2d₀, p₁ = 2.2d₀: the end bolt bears 45.68 kN and governs", () => {
    const r = steelBoltKind.resistance(en({ size: "M20", grade: "8.8" }), context(member("a", steel(430, 275), 10, 200), member("b", steel(430, 275), 10, 200), { basis: "factored" }));
    const k1 = 2.8 * 1.2 - 1.7;
    expectClose(r.value, (k1 * 0.4 * 430 * 20 * 10) / 1.25, { rel: 1e-9 });
    expectClose(r.value / 1000, 45.683, { rel: 1e-4 });
    expectClose(mode(r, `bearing on "b", inner bolts`) / 1000, (k1 * (48.4 / 66 - 0.25) * 430 * 20 * 10) / 1.25 / 1000, { rel: 1e-9 });
    expect(r.governing).toContain("end bolt");
  });
});

describe("steel-bolt problems: unknown grades and sizes, bolts larger than the part", () => {
  test("an unknown grade is refused by the schema with the field path", () => {
    const bad = SteelBolt.safeParse({ id: "b", kind: "steel-bolt", standard: "AISC-360-16", size: "3/4", grade: "8.8" });
    expect(bad.success).toBe(false);
    expect(bad.error!.issues[0]!.path).toEqual(["grade"]);
    expect(bad.error!.issues[0]!.message).toContain("A (A325, F1852)");
    const metric = SteelBolt.safeParse({ id: "b", kind: "steel-bolt", standard: "EN1993-1-8", size: "M20", grade: "A325" });
    expect(metric.error!.issues[0]!.message).toContain("8.8");
  });
  test("a bolt whose hole is wider than the part across the line is refused", () => {
    const problems = steelBoltKind.problems!(aisc({ size: "1", grade: "A" }), context(member("strap", steel(400), 6, 0.75 * IN), plate(1), { units: "us" }));
    expect(problems.some((p) => p.on === "connector" && p.message.includes("larger than part \"strap\""))).toBe(true);
  });
  test("a steel bolt through timber points to the timber bolt", () => {
    const problems = steelBoltKind.problems!(aisc({ size: "3/4", grade: "A" }), context(plate(0.5), member("beam", { ...steel(400), family: "sawn-timber" }, 3.5 * IN, 5.5 * IN), { units: "us" }));
    expect(problems[0]!.message).toContain("timber-bolt");
  });
});

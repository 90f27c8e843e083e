import { describe, expect, test } from "vitest";
import { LagScrew, lagScrewKind } from "../../../core/connector/lag-screw.js";
import { ndsWoodBearing } from "../../../core/connector/timber/nds-dowel-bearing.js";
import { ndsYieldLimit } from "../../../core/connector/timber/nds-yield-limit.js";
import { WoodScrew, woodScrewKind } from "../../../core/connector/wood-screw.js";
import { expectClose } from "../../expect-close.js";
import { context, ec5Timber, IN, LBF, member, wood } from "./contexts.js";

// No published screw values are in REFERENCES: these check that the kinds feed the NDS yield model
// (Table 12.3.1A [M]) with the right diameter, F_yb and bearing lengths, against the equations called directly [D].

const dfl = wood(0.5);
const us = (head: number, point: number) => context(member("side", dfl, head * IN, 5.5 * IN), member("main", dfl, point * IN, 5.5 * IN), { categories: ["live"], units: "us" });

describe("woodScrewKind by the NDS", () => {
  test("a #10 × 3 in wood screw with threads in the shear plane uses the root diameter 0.152 in and F_yb 90 ksi (root in the 0.142–0.177 band)", () => {
    const r = woodScrewKind.resistance(WoodScrew.parse({ id: "s", kind: "wood-screw", standard: "NDS-2018", gauge: "#10", length: 3 * IN }), us(1.5, 3.5));
    expectClose(r.steps.find((s) => s.symbol === "D")!.value / IN, 0.152, { rel: 1e-9 });
    const Fe = ndsWoodBearing(0.5, 0.152, 0).value;
    const z = ndsYieldLimit({ diameterIn: 0.152, bendingYieldPsi: 90_000, sideLengthIn: 1.5, mainLengthIn: 1.5, sideBearingPsi: Fe, mainBearingPsi: Fe, shear: "single", maxAngleDeg: 0 });
    expectClose(r.value / LBF, z.governing.zLb, { rel: 1e-9 });
  });

  test("with threads bearing over at most a quarter of the main member's bearing length (0.5 in of 2.5 in), the shank diameter is used (§12.3.7 [M])", () => {
    const r = woodScrewKind.resistance(WoodScrew.parse({ id: "s", kind: "wood-screw", standard: "NDS-2018", gauge: "#10", length: 4 * IN, threadLength: 0.5 * IN }), us(1.5, 3.5));
    expectClose(r.steps.find((s) => s.symbol === "D")!.value / IN, 0.19, { rel: 1e-9 });
  });

  test("penetration below 6D = 1.14 in (1 in through a 2 in side member) is refused at the length field", () => {
    const problems = woodScrewKind.problems!(WoodScrew.parse({ id: "s", kind: "wood-screw", standard: "NDS-2018", gauge: "#10", length: 3 * IN }), us(1.5, 3.5));
    expect(problems).toEqual([]);
    const short = woodScrewKind.problems!(WoodScrew.parse({ id: "s", kind: "wood-screw", standard: "NDS-2018", gauge: "#10", length: 3 * IN }), us(2, 3.5));
    expect(short[0]).toMatchObject({ on: "connector", field: "length" });
  });

  test("EN 1995-1-1 screws need f_u, and take d_ef = 1.1 × the root diameter with threads in the plane (§8.7.1)", () => {
    expect(WoodScrew.safeParse({ id: "s", kind: "wood-screw", standard: "EN1995-1-1", diameter: 5, rootDiameter: 3.2, length: 80 }).error!.issues[0]!.path).toEqual(["tensileStrength"]);
    const c24 = ec5Timber(350, 420);
    const r = woodScrewKind.resistance(WoodScrew.parse({ id: "s", kind: "wood-screw", standard: "EN1995-1-1", diameter: 5, rootDiameter: 3.2, length: 80, tensileStrength: 600 }), context(member("a", c24, 38, 100), member("b", c24, 60, 100), { basis: "factored" }));
    expectClose(r.steps.find((s) => s.symbol === "d")!.value, 3.52, { rel: 1e-9 });
  });
});

describe("lagScrewKind by the NDS", () => {
  test("a 3/8 × 4 in lag screw: root 0.265 in with threads in the plane, F_yb 45 ksi [M], K_θ terms of D ≥ 1/4 in", () => {
    const r = lagScrewKind.resistance(LagScrew.parse({ id: "l", kind: "lag-screw", standard: "NDS-2018", size: "3/8", length: 4 * IN }), us(1.5, 5.5));
    expectClose(r.steps.find((s) => s.symbol === "D")!.value / IN, 0.265, { rel: 1e-9 });
    expectClose(r.steps.find((s) => s.symbol === "F_yb")!.value / (1000 * LBF / IN ** 2), 45, { rel: 1e-9 });
    // ℓ_m = 4 − 1.5 − 7/32 in: the tip of a 3/8 in lag (Appendix Table L2 [M]) is not bearing length.
    const z = ndsYieldLimit({ diameterIn: 0.265, bendingYieldPsi: 45_000, sideLengthIn: 1.5, mainLengthIn: 4 - 1.5 - 7 / 32, sideBearingPsi: 11_200 * 0.5, mainBearingPsi: 11_200 * 0.5, shear: "single", maxAngleDeg: 0 });
    expectClose(r.value / LBF, z.governing.zLb, { rel: 1e-9 });
  });
  test("penetration below 4D (tip excluded) is refused; double shear is refused", () => {
    const short = lagScrewKind.problems!(LagScrew.parse({ id: "l", kind: "lag-screw", standard: "NDS-2018", size: "1/2", length: 3 * IN, tipLength: 0.3125 * IN }), us(1.5, 5.5));
    expect(short[0]).toMatchObject({ field: "length" });
    expect(short[0]!.message).toContain("below the minimum 4d");
    const double = lagScrewKind.problems!(LagScrew.parse({ id: "l", kind: "lag-screw", standard: "NDS-2018", size: "1/2", length: 6 * IN, shear: "double" }), us(1.5, 5.5));
    expect(double[0]).toMatchObject({ field: "shear" });
  });
});

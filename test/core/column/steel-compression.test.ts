import fc from "fast-check";
import { describe, expect, test } from "vitest";
import { aiscFlexuralBuckling, en1993FlexuralBuckling, EN1993_IMPERFECTION, type BucklingCurve } from "../../../core/column/steel-compression.js";
import { MPA_PER_KSI, MM_PER_IN, N_PER_KIP } from "../../../core/connector/quantity-text.js";
import { expectClose } from "../../expect-close.js";

const E_KSI = 29_000;
const E = E_KSI * MPA_PER_KSI;

describe("aiscFlexuralBuckling (AISC 360-16 §E3)", () => {
  test("a 14.4 in² column at L_c/r = 180/2.54, F_y = 50 ksi: F_e, F_cr by E3-2, P_n and both bases, worked in kips and inches [D]", () => {
    const slenderness = 180 / 2.54;
    // Closed form in the standard's own units [D]: F_e = π²E/(L_c/r)², F_y/F_e ≤ 2.25 → E3-2.
    const FeKsi = (Math.PI ** 2 * E_KSI) / slenderness ** 2;
    expect(50 / FeKsi).toBeLessThan(2.25);
    const FcrKsi = Math.exp((50 / FeKsi) * Math.log(0.658)) * 50;
    const PnKip = FcrKsi * 14.4;
    const lrfd = aiscFlexuralBuckling({ grossArea: 14.4 * MM_PER_IN ** 2, slenderness, elasticModulus: E, yieldStrength: 50 * MPA_PER_KSI, basis: "factored" });
    expect(lrfd.equation).toBe("E3-2");
    expectClose(lrfd.elasticBucklingStress / MPA_PER_KSI, FeKsi, { rel: 1e-9 }, "F_e ksi");
    expectClose(FeKsi, 56.99, { rel: 2e-4 }, "F_e hand value [D]");
    expectClose(lrfd.criticalStress / MPA_PER_KSI, FcrKsi, { rel: 1e-9 }, "F_cr ksi");
    expectClose(FcrKsi, 34.63, { rel: 2e-4 }, "F_cr hand value [D]");
    expectClose(lrfd.nominal / N_PER_KIP, PnKip, { rel: 1e-9 }, "P_n kip");
    expectClose(lrfd.available / N_PER_KIP, 0.9 * PnKip, { rel: 1e-9 }, "φ_c P_n, φ_c = 0.90 (AISC 360-16 §E1) [M]");
    const asd = aiscFlexuralBuckling({ grossArea: 14.4 * MM_PER_IN ** 2, slenderness, elasticModulus: E, yieldStrength: 50 * MPA_PER_KSI, basis: "allowable" });
    expectClose(asd.available / N_PER_KIP, PnKip / 1.67, { rel: 1e-9 }, "P_n/Ω_c, Ω_c = 1.67 (AISC 360-16 §E1) [M]");
    expect(lrfd.steps.map((s) => s.symbol)).toEqual(["L_c/r", "F_e", "4.71√(E/F_y)", "F_cr", "P_n", "φ_c P_n"]);
    expect(lrfd.steps.every((s) => s.reference?.startsWith("AISC 360-16"))).toBe(true);
  });

  // AISC Design Examples v16.0 (AISC 360-22; §E3 for members without slender elements reads as in 360-16) [V].
  test("Example E.1D: W14×90, A_g = 26.5 in², L_c/r = 360/6.14 = 58.6 → F_e = 83.3 ksi, F_n = 38.9 ksi, P_n = 1,030 kips, φ_c P_n = 927, P_n/Ω_c = 617 [V]", () => {
    const at = (basis: "factored" | "allowable") => aiscFlexuralBuckling({ grossArea: 26.5 * MM_PER_IN ** 2, slenderness: 360 / 6.14, elasticModulus: E, yieldStrength: 50 * MPA_PER_KSI, basis });
    const r = at("factored");
    expectClose(r.slenderness, 58.6, { abs: 0.05 });
    expectClose(r.elasticBucklingStress / MPA_PER_KSI, 83.3, { abs: 0.05 });
    expectClose(r.criticalStress / MPA_PER_KSI, 38.9, { abs: 0.05 });
    expectClose(r.nominal / N_PER_KIP, 1030, { abs: 5 });
    expectClose(r.available / N_PER_KIP, 927, { abs: 1 });
    expectClose(at("allowable").available / N_PER_KIP, 617, { abs: 1 });
  });

  test("Example E.1C: W14×132, L_c/r = 360/3.76 = 95.7 → φ_c F_n = 23.0 ksi (Manual Table 4-14), φ_c P_n = 892 kips [V]", () => {
    const r = aiscFlexuralBuckling({ grossArea: 38.8 * MM_PER_IN ** 2, slenderness: 360 / 3.76, elasticModulus: E, yieldStrength: 50 * MPA_PER_KSI, basis: "factored" });
    expectClose((0.9 * r.criticalStress) / MPA_PER_KSI, 23.0, { abs: 0.05 });
    expectClose(r.available / N_PER_KIP, 892, { abs: 2 });
  });

  test("Example E.1E(c): L_c/r = 180/1.17 = 154 > 113 → F_e = 12.1 ksi, F_n = 0.877 F_e = 10.6 ksi by E3-3 [V]", () => {
    const r = aiscFlexuralBuckling({ grossArea: 9.13 * MM_PER_IN ** 2, slenderness: 180 / 1.17, elasticModulus: E, yieldStrength: 50 * MPA_PER_KSI, basis: "factored" });
    expect(r.equation).toBe("E3-3");
    expectClose(r.limitSlenderness, 113, { abs: 0.5 });
    expectClose(r.elasticBucklingStress / MPA_PER_KSI, 12.1, { abs: 0.05 });
    expectClose(r.criticalStress / MPA_PER_KSI, 10.6, { abs: 0.05 });
  });

  test("a slender strut, L_c/r = 150 at F_y = 36 ksi, is past 4.71√(E/F_y) = 133.7 and takes F_cr = 0.877 F_e (E3-3) [D]", () => {
    const r = aiscFlexuralBuckling({ grossArea: 1000, slenderness: 150, elasticModulus: E, yieldStrength: 36 * MPA_PER_KSI, basis: "factored" });
    expectClose(r.limitSlenderness, 4.71 * Math.sqrt(29_000 / 36), { rel: 1e-12 });
    expectClose(r.limitSlenderness, 133.68, { rel: 1e-4 }, "4.71√(29000/36) [D]");
    expect(r.equation).toBe("E3-3");
    const FeKsi = (Math.PI ** 2 * 29_000) / 150 ** 2; // 12.72 ksi [D]
    expectClose(r.criticalStress / MPA_PER_KSI, 0.877 * FeKsi, { rel: 1e-9 });
    expectClose(0.877 * FeKsi, 11.156, { rel: 1e-4 }, "0.877 F_e [D]");
  });

  test("E3-2 and E3-3 meet at L_c/r = 4.71√(E/F_y) (F_y/F_e = 2.25 there): F_cr ≈ 0.390 F_y from either side [D]", () => {
    const Fy = 50 * MPA_PER_KSI;
    const limit = 4.71 * Math.sqrt(E / Fy);
    const below = aiscFlexuralBuckling({ grossArea: 1, slenderness: limit * (1 - 1e-9), elasticModulus: E, yieldStrength: Fy, basis: "factored" });
    const above = aiscFlexuralBuckling({ grossArea: 1, slenderness: limit * (1 + 1e-9), elasticModulus: E, yieldStrength: Fy, basis: "factored" });
    expect(below.equation).toBe("E3-2");
    expect(above.equation).toBe("E3-3");
    expectClose(below.criticalStress / Fy, 0.3903, { rel: 5e-4 }, "0.658^2.2477 [D]");
    expectClose(above.criticalStress, below.criticalStress, { rel: 5e-4 }, "continuity at the limit");
  });

  test("warns past L_c/r = 200 (§E2 user note) and refuses a zero slenderness as a broken invariant", () => {
    const r = aiscFlexuralBuckling({ grossArea: 1000, slenderness: 210, elasticModulus: E, yieldStrength: 250, basis: "allowable" });
    expect(r.warnings.join(" ")).toContain("200");
    expect(() => aiscFlexuralBuckling({ grossArea: 1000, slenderness: 0, elasticModulus: E, yieldStrength: 250, basis: "allowable" })).toThrow(/slenderness/);
  });

  test("property (fast-check, fixed seed): P_n never above A_g F_y, and never rises with the slenderness", () => {
    fc.assert(
      fc.property(fc.double({ min: 1, max: 300, noNaN: true }), fc.double({ min: 1, max: 300, noNaN: true }), fc.double({ min: 200, max: 700, noNaN: true }), (s1, s2, Fy) => {
        const at = (s: number) => aiscFlexuralBuckling({ grossArea: 5000, slenderness: s, elasticModulus: 200_000, yieldStrength: Fy, basis: "factored" }).nominal;
        expect(at(s1)).toBeLessThanOrEqual(5000 * Fy * (1 + 1e-12));
        const [short, long] = s1 <= s2 ? [s1, s2] : [s2, s1];
        expect(at(long)).toBeLessThanOrEqual(at(short) * (1 + 1e-12));
      }),
      { numRuns: 300 },
    );
  });
});

describe("en1993FlexuralBuckling (EN 1993-1-1 §6.3.1)", () => {
  // χ by the other root of Φ: 1/(Φ + √(Φ² − λ̄²)) = (Φ − √(Φ² − λ̄²))/λ̄² [D].
  const chiByOtherRoot = (lambda: number, alpha: number) => {
    const phi = 0.5 * (1 + alpha * (lambda - 0.2) + lambda * lambda);
    return Math.min(1, (phi - Math.sqrt(phi * phi - lambda * lambda)) / (lambda * lambda));
  };

  test("at λ̄ = 1.0: χ = 0.597 on curve b and 0.540 on curve c, as tabulated for Figure 6.4 [M]; all five curves by the other root [D]", () => {
    const fy = 355;
    const A = 7640;
    const Ncr = A * fy; // λ̄ = 1 exactly
    const byCurve = (curve: BucklingCurve) => en1993FlexuralBuckling({ area: A, yieldStrength: fy, elasticModulus: 210_000, slenderness: 100, criticalForce: Ncr, curve });
    expectClose(byCurve("b").reduction, 0.597, { abs: 5e-4 }, "χ curve b, λ̄ = 1 [M]");
    expectClose(byCurve("c").reduction, 0.540, { abs: 5e-4 }, "χ curve c, λ̄ = 1 [M]");
    for (const curve of Object.keys(EN1993_IMPERFECTION) as BucklingCurve[]) {
      const r = byCurve(curve);
      expectClose(r.reduction, chiByOtherRoot(1, EN1993_IMPERFECTION[curve]), { rel: 1e-12 }, `χ curve ${curve}`);
      expectClose(r.resistance, (r.reduction * A * fy) / 1.0, { rel: 1e-12 }, "N_b,Rd with γ_M1 = 1.00 [M]");
    }
    expect([EN1993_IMPERFECTION.a0, EN1993_IMPERFECTION.a, EN1993_IMPERFECTION.b, EN1993_IMPERFECTION.c, EN1993_IMPERFECTION.d]).toEqual([0.13, 0.21, 0.34, 0.49, 0.76]); // Table 6.1 [M]
  });

  test("a 3830 mm² S275 column, L_cr/i = 4000/38.3 on curve c: λ̄ = (L_cr/i)/(93.9 ε) = 1.203, N_b,Rd by hand [D]", () => {
    const r = en1993FlexuralBuckling({ area: 3830, yieldStrength: 275, elasticModulus: 210_000, slenderness: 4000 / 38.3, curve: "c" });
    // λ_1 = π√(E/f_y) = 93.9 ε with ε = √(235/f_y) (§6.3.1.3) [M]; 93.9 is π√(210000/235) rounded [D].
    const lambda1 = Math.PI * Math.sqrt(210_000 / 275);
    expectClose(r.relativeSlenderness, 4000 / 38.3 / lambda1, { rel: 1e-12 });
    expectClose(r.relativeSlenderness, 4000 / 38.3 / (93.9 * Math.sqrt(235 / 275)), { rel: 1e-3 });
    expectClose(r.relativeSlenderness, 1.203, { abs: 1e-3 }, "λ̄ [D]");
    const chi = chiByOtherRoot(r.relativeSlenderness, 0.49);
    expectClose(r.reduction, chi, { rel: 1e-12 });
    expectClose(r.resistance, (chi * 3830 * 275) / 1.0, { rel: 1e-12 });
    expect(r.steps.map((s) => s.symbol)).toEqual(["N_cr", "λ̄", "α", "Φ", "χ", "γ_M1", "N_b,Rd"]);
  });

  test("χ is capped at 1 for a stocky member (λ̄ < 0.2) [D]", () => {
    const r = en1993FlexuralBuckling({ area: 1000, yieldStrength: 355, elasticModulus: 210_000, slenderness: 10, curve: "a" });
    expect(r.relativeSlenderness).toBeLessThan(0.2);
    expect(r.reduction).toBe(1);
  });

  test("property (fast-check, fixed seed): N_b,Rd never above A f_y/γ_M1 and never rises with L_cr/i or a worse curve", () => {
    const curves = Object.keys(EN1993_IMPERFECTION) as BucklingCurve[];
    fc.assert(
      fc.property(fc.double({ min: 1, max: 300, noNaN: true }), fc.double({ min: 1, max: 300, noNaN: true }), fc.integer({ min: 0, max: 3 }), (s1, s2, k) => {
        const at = (s: number, c: BucklingCurve) => en1993FlexuralBuckling({ area: 4000, yieldStrength: 355, elasticModulus: 210_000, slenderness: s, curve: c }).resistance;
        expect(at(s1, curves[k]!)).toBeLessThanOrEqual(4000 * 355 * (1 + 1e-12));
        const [short, long] = s1 <= s2 ? [s1, s2] : [s2, s1];
        expect(at(long, curves[k]!)).toBeLessThanOrEqual(at(short, curves[k]!) * (1 + 1e-12));
        expect(at(s1, curves[k + 1]!)).toBeLessThanOrEqual(at(s1, curves[k]!) * (1 + 1e-12));
      }),
      { numRuns: 300 },
    );
  });
});

import fc from "fast-check";
import { describe, expect, test } from "vitest";
import {
  battenEfficiency,
  en1993BattenedMember,
  en1993ChordForce,
  en1993CloselySpacedLimit,
  en1993CloselySpacedMember,
  en1993LacedStiffness,
  en1993LargestBattenSpacing,
  type BattenedMemberInput,
} from "../../../core/column/steel-built-up-en1993.js";
import { expectClose } from "../../expect-close.js";

// Invented battened column: two channel chords A_ch = 3220 mm², I_ch = 1.48e6 mm⁴ (in plane), h_0 = 300 mm,
// L = 6 m, N_Ed = 1000 kN, S355, battens 10 × 200 mm in two planes at a = 600 mm.
const E = 210_000;
const column: BattenedMemberInput = {
  length: 6000,
  axialForce: 1_000_000,
  chordArea: 3220,
  chordSecondMoment: 1.48e6,
  chordDistance: 300,
  battenSpacing: 600,
  battenSecondMoment: (10 * 200 ** 3) / 12,
  battenPlanes: 2,
  elasticModulus: E,
  yieldStrength: 355,
  chordCurve: "c",
};

describe("battenEfficiency (EN 1993-1-1 Table 6.8 [M])", () => {
  test("μ = 1 up to λ = 75, 2 − λ/75 between, 0 from λ = 150", () => {
    expect(battenEfficiency(50)).toBe(1);
    expect(battenEfficiency(75)).toBe(1);
    expectClose(battenEfficiency(112.5), 0.5, { rel: 1e-12 });
    expect(battenEfficiency(150)).toBe(0);
    expect(battenEfficiency(400)).toBe(0);
  });
});

describe("en1993BattenedMember (EN 1993-1-1 §6.4.1, §6.4.3 [M])", () => {
  test("the invented column: I_eff, S_v (the 2π²EI_ch/a² limit governs), N_ch,Ed, V_Ed and the end-panel forces by hand [D]", () => {
    const r = en1993BattenedMember(column);
    // Hand working [D], from the recalled formulas:
    const I1 = 0.5 * 300 ** 2 * 3220 + 2 * 1.48e6; // 147.86e6 mm⁴
    const i0 = Math.sqrt(I1 / (2 * 3220)); // 151.5 mm
    const lambda = 6000 / i0; // 39.6 ≤ 75 → μ = 1
    expectClose(i0, 151.5, { abs: 0.05 });
    expect(lambda).toBeLessThan(75);
    const Ieff = I1; // μ = 1
    const frame = (24 * E * 1.48e6) / (600 ** 2 * (1 + (2 * 1.48e6 * 300) / (2 * ((10 * 200 ** 3) / 12) * 600)));
    const cap = (2 * Math.PI ** 2 * E * 1.48e6) / 600 ** 2;
    expect(frame).toBeGreaterThan(cap);
    const Ncr = (Math.PI ** 2 * E * Ieff) / 6000 ** 2; // 8513 kN
    const M = (1e6 * (6000 / 500)) / (1 - 1e6 / Ncr - 1e6 / cap);
    const Nch = 0.5e6 + (M * 300 * 3220) / (2 * Ieff);
    const V = (Math.PI * M) / 6000;
    expectClose(r.radius, i0, { rel: 1e-12 });
    expect(r.efficiency).toBe(1);
    expectClose(r.effectiveSecondMoment, Ieff, { rel: 1e-12 });
    expectClose(r.shearStiffness, cap, { rel: 1e-12 });
    expectClose(r.force.criticalForce, Ncr, { rel: 1e-12 });
    expectClose(Ncr / 1000, 8513, { abs: 1 }, "N_cr kN [D]");
    expectClose(r.force.moment, M, { rel: 1e-12 });
    expectClose(r.force.chordForce, Nch, { rel: 1e-12 });
    expectClose(r.force.shear, V, { rel: 1e-12 });
    expectClose(Nch / 1000, 547.6, { abs: 0.1 }, "N_ch,Ed kN [D]: 500 + 14.57 kN·m × 300 × 3220 / (2 × 147.86e6)");
    expectClose(M / 1e6, 14.57, { abs: 0.01 }, "M_Ed kN·m [D]: 1000 kN × 12 mm / 0.8238");
    expectClose(V / 1000, 7.63, { abs: 0.01 }, "V_Ed kN [D]");
    // Figure 6.11 end panel [M], also by statics [D]: V·a = T·h_0 for the battens, chords inflect mid-panel.
    expectClose(r.endPanel.battenShear, (V * 600) / (2 * 300), { rel: 1e-12 });
    expectClose(r.endPanel.chordMoment, (V * 600) / 4, { rel: 1e-12 });
    expectClose(r.endPanel.battenMoment, (V * 600) / 4, { rel: 1e-12 }, "V a/(2n) with n = 2");
    expect(r.chordUtilisation).toBeLessThan(1);
    expect(r.warnings).toEqual([]);
  });

  test("a flexible batten: S_v = 24 E I_ch / (a² (1 + 2 I_ch h_0 / (n I_b a))) below the limit [M]", () => {
    const Ib = 2e5;
    const r = en1993BattenedMember({ ...column, battenSecondMoment: Ib });
    const frame = (24 * E * 1.48e6) / (600 ** 2 * (1 + (2 * 1.48e6 * 300) / (2 * Ib * 600)));
    expectClose(r.shearStiffness, frame, { rel: 1e-12 });
  });

  test("a slender member (λ between 75 and 150) loses part of 2 I_ch: μ = 2 − λ/75 [M]", () => {
    const r = en1993BattenedMember({ ...column, chordDistance: 120, length: 9000 });
    const I1 = 0.5 * 120 ** 2 * 3220 + 2 * 1.48e6;
    const lambda = 9000 / Math.sqrt(I1 / (2 * 3220));
    expect(lambda).toBeGreaterThan(75);
    expect(lambda).toBeLessThan(150);
    expectClose(r.effectiveSecondMoment, 0.5 * 120 ** 2 * 3220 + 2 * (2 - lambda / 75) * 1.48e6, { rel: 1e-12 });
  });

  test("a load past the critical force is reported as unstable, not as a number", () => {
    const r = en1993BattenedMember({ ...column, axialForce: 9e6 });
    expect(r.force.stable).toBe(false);
    expect(r.warnings.join(" ")).toContain("cannot carry");
  });

  test("the largest batten spacing makes the chord exactly fully used; a longer one fails [D]", () => {
    const heavy = { ...column, axialForce: 1_900_000 };
    const { largest, governing } = en1993LargestBattenSpacing(heavy);
    expect(largest).not.toBeNull();
    expect(governing).toContain("chord");
    expectClose(en1993BattenedMember({ ...heavy, battenSpacing: largest! }).chordUtilisation, 1, { rel: 1e-4 });
    expect(en1993BattenedMember({ ...heavy, battenSpacing: largest! * 1.01 }).chordUtilisation).toBeGreaterThan(1);
    expect(en1993LargestBattenSpacing(column).largest!).toBeLessThan(2000);
    expect(en1993LargestBattenSpacing({ ...column, axialForce: 200_000 })).toMatchObject({ largest: 2000 }); // L/3: three panels
  });

  test("property (fast-check, fixed seed): closer battens never a higher chord utilisation; a longer member never a smaller chord force", () => {
    fc.assert(
      fc.property(
        fc.double({ min: 2000, max: 10_000, noNaN: true }),
        fc.double({ min: 100, max: 1500, noNaN: true }),
        fc.double({ min: 0.2, max: 1, noNaN: true }),
        fc.double({ min: 100_000, max: 1_500_000, noNaN: true }),
        (length, a, closer, N) => {
          const at = (L: number, s: number) => en1993BattenedMember({ ...column, length: L, battenSpacing: s, axialForce: N });
          const base = at(length, a);
          if (!base.force.stable) return;
          expect(at(length, a * closer).chordUtilisation).toBeLessThanOrEqual(base.chordUtilisation * (1 + 1e-9));
          const longer = at(length * 1.2, a);
          if (longer.force.stable) expect(longer.force.chordForce).toBeGreaterThanOrEqual(base.force.chordForce * (1 - 1e-12));
        },
      ),
      { numRuns: 300 },
    );
  });
});

describe("en1993ChordForce (EN 1993-1-1 §6.4.1 [M])", () => {
  test("a first-order moment adds to N_Ed e_0 before amplification [D]", () => {
    const p = { length: 5000, axialForce: 500_000, effectiveSecondMoment: 1e8, shearStiffness: 5e6, chordArea: 2000, chordDistance: 250, elasticModulus: E };
    const r0 = en1993ChordForce(p);
    const r1 = en1993ChordForce({ ...p, firstOrderMoment: 20e6 });
    const den = 1 - 500_000 / ((Math.PI ** 2 * E * 1e8) / 5000 ** 2) - 500_000 / 5e6;
    expectClose(r0.moment, (500_000 * 10) / den, { rel: 1e-12 });
    expectClose(r1.moment, (500_000 * 10 + 20e6) / den, { rel: 1e-12 });
  });
});

describe("closely spaced members (EN 1993-1-1 §6.4.4, Table 6.9 [M])", () => {
  test("15 i_min for chords in contact or through packing plates, 70 i_min for star-battened angles", () => {
    expect(en1993CloselySpacedLimit({ chordMinRadius: 20, kind: "in contact or through packing plates", spacing: 300 })).toMatchObject({ largest: 300, passes: true });
    expect(en1993CloselySpacedLimit({ chordMinRadius: 20, kind: "in contact or through packing plates", spacing: 301 }).passes).toBe(false);
    expect(en1993CloselySpacedLimit({ chordMinRadius: 15, kind: "star-battened angles", spacing: 1000 }).largest).toBe(1050);
  });

  test("the packing plates' shear comes from the battened-member rules, never below the integral member's own amplification", () => {
    const r = en1993CloselySpacedMember({
      ...column,
      chordDistance: 80,
      battenSpacing: 300,
      kind: "in contact or through packing plates",
      chordMinRadius: 21.4,
      integral: { area: 2 * 3220, slenderness: 6000 / Math.sqrt((0.5 * 80 ** 2 * 3220 + 2 * 1.48e6) / (2 * 3220)), curve: "c" },
    });
    expect(r.limit.passes).toBe(true);
    const Iint = 0.5 * 80 ** 2 * 3220 + 2 * 1.48e6;
    const Mint = (column.axialForce * 12) / (1 - column.axialForce / ((Math.PI ** 2 * E * Iint) / 6000 ** 2));
    expect(r.packing.force.moment).toBeGreaterThanOrEqual(Mint);
    expect(r.integral.resistance).toBeGreaterThan(0);
  });
});

describe("en1993LacedStiffness (EN 1993-1-1 §6.4.2, Figure 6.9 [M])", () => {
  test("V-lacing: n E A_d a h_0² / (2 d³); N-lacing adds the posts' term [D]", () => {
    const base = { chordArea: 3000, chordDistance: 400, diagonalArea: 500, diagonalLength: 500, panelLength: 600, planes: 2, elasticModulus: E };
    const v = en1993LacedStiffness({ ...base, lacing: "V" });
    expectClose(v.shearStiffness, (2 * E * 500 * 600 * 400 ** 2) / (2 * 500 ** 3), { rel: 1e-12 });
    expectClose(v.effectiveSecondMoment, 0.5 * 400 ** 2 * 3000, { rel: 1e-12 });
    const n = en1993LacedStiffness({ ...base, lacing: "N", postArea: 400 });
    expectClose(n.shearStiffness, (2 * E * 500 * 600 * 400 ** 2) / (500 ** 3 * (1 + (500 * 400 ** 3) / (400 * 500 ** 3))), { rel: 1e-12 });
    expect(() => en1993LacedStiffness({ ...base, lacing: "N" })).toThrow(/postArea/);
  });
});

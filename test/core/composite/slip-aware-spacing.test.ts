import { describe, expect, test } from "vitest";
import { rectangularLayer, type JointedSection } from "../../../core/composite/jointed-section.js";
import { designSlipAwareSpacing, type SlipAwareJointInput } from "../../../core/composite/slip-aware-spacing.js";
import { expectClose } from "../../expect-close.js";

// Section and demand of REFERENCES §3.4: three 20 × 100 planks nailed into an I (I = 16.20e6 mm⁴, Q = 120 000 mm³),
// L = 4 m, w = 0.25 N/mm, F = 100 N per nail: rigid s_req = F·I/(Q·V) = 27, 36, 54, 108 mm at V = 500, 375, 250, 125 N [D].
// Slip moduli: C24 E = 11 000 MPa (EN 338 [M]); nail d = 3.1, ρ_m = 420: K_u = 2/3 K_ser = 472.88 N/mm
// (EN 1995-1-1 Table 7.1 and eq. 2.1 [M], number REFERENCES §6.2 [D]).
const E = 11_000;
const plankI = (): JointedSection => ({
  bottom: rectangularLayer({ modulus: E, width: 100, depth: 20, bottomY: 0 }),
  web: rectangularLayer({ modulus: E, width: 20, depth: 100, bottomY: 20 }),
  top: rectangularLayer({ modulus: E, width: 100, depth: 20, bottomY: 120 }),
});
const zones = [[0, 500, 500], [500, 1000, 375], [1000, 1500, 250], [1500, 2000, 125]].map(([from, to, V]) => ({
  from: from!,
  to: to!,
  cases: [{ shearForce: V!, resistance: 100, combination: "ULS" }],
}));
const joint = (over: Partial<SlipAwareJointInput> = {}): SlipAwareJointInput => ({
  slipModulus: 472.88,
  shearPlanesPerRow: 1,
  zones,
  limits: { minSpacing: 10, maxSpacing: 300, module: 1 },
  ...over,
});

describe("designSlipAwareSpacing", () => {
  const design = designSlipAwareSpacing({ section: plankI(), joints: { top: joint(), bottom: joint() }, effectiveLength: 4000 });

  test("the rigid start reproduces s = F·I/(Q·V) of REFERENCES §3.4: 27, 36, 54, 108 mm [D]", () => {
    expect(design.history[0]!.spacings.top).toEqual([27, 36, 54, 108]);
    expect(design.joints.top!.zones.map((z) => z.rigidSpacing)).toEqual([27, 36, 54, 108]);
  });

  test("converges, and says in how many passes; γ only falls and spacings only grow from the rigid start", () => {
    expect(design.converged).toBe(true);
    expect(design.passes).toBe(true);
    expect(design.iterations).toBeGreaterThanOrEqual(1);
    expect(design.history).toHaveLength(design.iterations + 1);
    for (let k = 1; k < design.history.length; k++) {
      expect(design.history[k]!.gammas.top!).toBeLessThanOrEqual(design.history[k - 1]!.gammas.top!);
      design.history[k]!.spacings.top!.forEach((s, z) => expect(s).toBeGreaterThanOrEqual(design.history[k - 1]!.spacings.top![z]!));
    }
  });

  test("the chosen spacings carry themselves: γ from (B.5) at s_ef, F_i from (B.10) by hand ≤ R (EN 1995-1-1 Annex B [M], numbers [D])", () => {
    const s = design.joints.top!.zones.map((z) => z.spacing);
    const sEf = 0.75 * Math.min(...s) + 0.25 * Math.max(...s);
    const A1 = 2000;
    const gamma = 1 / (1 + (Math.PI ** 2 * E * A1 * sEf) / (472.88 * 4000 ** 2));
    expectClose(design.joints.top!.gamma, gamma, { rel: 1e-12 }, "γ at s_ef");
    const a1 = 60; // symmetric: a_2 = 0
    const EI = E * (20 * 100 ** 3 / 12 + 2 * (100 * 20 ** 3 / 12)) + 2 * gamma * E * A1 * a1 ** 2;
    expectClose(design.response.effectiveStiffness, EI, { rel: 1e-12 }, "(EI)_ef");
    design.joints.top!.zones.forEach((z, k) => {
      const F = (gamma * E * A1 * a1 * z.spacing * zones[k]!.cases[0]!.shearForce) / EI;
      expectClose(z.connectorForce, F, { rel: 1e-12 }, `F in zone ${k + 1}`);
      expect(F).toBeLessThanOrEqual(100);
      expect(z.spacing).toBeGreaterThanOrEqual(z.rigidSpacing);
    });
  });

  test("each zone takes the largest whole-millimetre spacing its demand allows, within s_max ≤ 4·s_min", () => {
    const top = design.joints.top!;
    expect(top.effectiveSpacing.withinLimit).toBe(true);
    const sMin = Math.min(...top.zones.map((z) => z.spacing));
    for (const z of top.zones) {
      const limit = Math.min(Math.floor(z.requiredSpacing + 1e-9), 4 * sMin);
      expect(z.spacing).toBe(limit);
    }
  });

  test("with the rigid connector force beside: the slip-aware spacing would be overloaded if the joint were glued-rigid", () => {
    for (const z of design.joints.top!.zones) expect(z.rigidConnectorForce).toBeGreaterThan(z.connectorForce);
    expect(design.response.rigid.effectiveStiffness).toBeGreaterThan(design.response.effectiveStiffness);
  });

  test("the governing combination is the one with the largest V/R, not the largest V", () => {
    const twoCombos = [{ from: 0, to: 2000, cases: [{ shearForce: 500, resistance: 130, combination: "wind" }, { shearForce: 400, resistance: 90, combination: "permanent" }] }];
    const d = designSlipAwareSpacing({ section: plankI(), joints: { top: joint({ zones: twoCombos }), bottom: joint({ zones: twoCombos }) }, effectiveLength: 4000 });
    expect(d.joints.top!.zones[0]!.governingCombination).toBe("permanent");
  });

  test("a demand the smallest allowed spacing cannot carry is reported, not hidden", () => {
    const heavy = [{ from: 0, to: 500, cases: [{ shearForce: 20_000, resistance: 100 }] }];
    const d = designSlipAwareSpacing({ section: plankI(), joints: { top: joint({ zones: heavy }), bottom: joint({ zones: heavy }) }, effectiveLength: 4000 });
    expect(d.passes).toBe(false);
    expect(d.joints.top!.infeasibleZones).toEqual([0]);
    expect(d.reasons.join(" ")).toMatch(/smallest allowed spacing/);
  });

  test("a zone without shear takes the largest allowed spacing, capped at 4·s_min", () => {
    const withZero = [...zones, { from: 2000, to: 2500, cases: [{ shearForce: 0, resistance: 100 }] }];
    const d = designSlipAwareSpacing({ section: plankI(), joints: { top: joint({ zones: withZero }), bottom: joint({ zones: withZero }) }, effectiveLength: 4000 });
    const s = d.joints.top!.zones.map((z) => z.spacing);
    expect(s[4]).toBe(4 * Math.min(...s));
  });
});

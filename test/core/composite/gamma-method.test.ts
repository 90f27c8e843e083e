import fc from "fast-check";
import { describe, expect, test } from "vitest";
import { effectiveLength } from "../../../core/composite/effective-length.js";
import { effectiveSpacing } from "../../../core/composite/effective-spacing.js";
import { gammaFactor, gammaMethod, jointedResponse } from "../../../core/composite/gamma-method.js";
import { rectangularLayer, type JointConnectors, type JointedSection } from "../../../core/composite/jointed-section.js";
import { firstMomentOfParts } from "../../../core/section/section-model.js";
import { expectClose } from "../../expect-close.js";
import { material, rect, sectionOf } from "../../section-builders.js";

// EN 1995-1-1:2004+A1:2008 Annex B (γ-method), equations (B.1)–(B.10), as written in ../shared/REFERENCES.md §6.6
// (formulas [M]); the worked case and its rigid / no-connection numbers are REFERENCES §6.6 [D].

const E = 11_000; // C24, E_0,mean (REFERENCES §6.6 worked case; EN 338 value [M])
const workedI = (): JointedSection => ({
  bottom: rectangularLayer({ modulus: E, width: 120, depth: 45, bottomY: 0 }),
  web: rectangularLayer({ modulus: E, width: 45, depth: 200, bottomY: 45 }),
  top: rectangularLayer({ modulus: E, width: 120, depth: 45, bottomY: 245 }),
});
// Nail d = 3.1 mm, not predrilled, ρ_m = 420: K_ser = ρ_m^1.5 d^0.8/30 = 709.32 N/mm (REFERENCES §6.2, EN 1995-1-1 Table 7.1 [M], number [D]).
const nail = (spacing: number, K = 709.32): JointConnectors => ({ slipModulus: K, shearPlanesPerRow: 1, spacing: { spacing } });
const V = 10_000; // N, support shear of w = 4 N/mm on l = 5 m
const M = 12.5e6; // N·mm, midspan moment of the same load

describe("gammaMethod on the REFERENCES §6.6 nailed I (flanges 120×45, web 45×200, C24, l = 5 m, s = 50 mm)", () => {
  const r = gammaMethod({ section: workedI(), joints: { top: nail(50), bottom: nail(50) }, effectiveLength: 5000 });

  test("rigid limit γ = 1: (EI)_ef, a_1, F_1, τ_2,max, σ_1, σ_m,1, σ_m,2 (REFERENCES §6.6 table [D])", () => {
    const g = r.rigid;
    expect(g.layers.top!.gamma).toBe(1);
    expectClose(g.layers.top!.distance, 122.5, { rel: 1e-12 }, "a_1");
    expectClose(g.effectiveStiffness, 2.132790e12, { rel: 1e-6 }, "(EI)_ef");
    expectClose(g.joints.top!.connectorForcePerShear * V, 1705.86, { rel: 1e-5 }, "F_1");
    expectClose(g.webShearStressPerShear * V, 1.01604, { rel: 1e-5 }, "τ_2,max");
    expectClose(-g.layers.top!.axialStressPerMoment * M, 7.8975, { rel: 1e-4 }, "σ_1 (compression in the top flange)");
    expectClose(g.layers.bottom!.axialStressPerMoment * M, 7.8975, { rel: 1e-4 }, "σ_3 (tension in the bottom flange)");
    expectClose(g.layers.top!.bendingStressPerMoment * M, 1.4506, { rel: 1e-4 }, "σ_m,1");
    expectClose(g.layers.web.bendingStressPerMoment * M, 6.4470, { rel: 1e-4 }, "σ_m,2");
  });

  test("no-connection limit γ = 0: (EI)_ef = ΣE_iI_i, F = 0, σ_1 = 0, τ_2,max = 1.5 × web share/(b_2h_2) (REFERENCES §6.6 table [D])", () => {
    const g = r.noConnection;
    expectClose(g.effectiveStiffness, 3.500475e11, { rel: 1e-6 }, "(EI)_ef");
    expect(g.joints.top!.connectorForcePerShear).toBe(0);
    expect(g.layers.top!.axialStressPerMoment).toBe(0);
    expectClose(g.webShearStressPerShear * V, 1.57122, { rel: 1e-5 }, "τ_2,max");
    // The web's share of V by stiffness is 9428 N (REFERENCES §6.6), τ = 1.5·V_web/(b_2h_2).
    expectClose(g.webShearStressPerShear * V, (1.5 * (V * E * 45 * 200 ** 3) / 12 / 3.500475e11) / (45 * 200), { rel: 1e-9 }, "1.5 V_web/A_web");
    expectClose(g.layers.top!.bendingStressPerMoment * M, 8.8381, { rel: 1e-4 }, "σ_m,1");
    expectClose(g.layers.web.bendingStressPerMoment * M, 39.2804, { rel: 1e-5 }, "σ_m,2");
  });

  test("slip-aware: γ_1 from (B.5) and (EI)_ef from (B.1) by hand (EN 1995-1-1 Annex B [M] formulas, numbers [D])", () => {
    // γ = 1/(1 + π²·11000·5400·50/(709.32·5000²)) = 1/(1 + 1.65300) = 0.376931
    expectClose(r.layers.top!.gamma, 0.376931, { rel: 1e-5 }, "γ_1");
    expectClose(r.layers.bottom!.gamma, 0.376931, { rel: 1e-5 }, "γ_3");
    expect(r.layers.web.gamma).toBe(1);
    // (EI)_ef = ΣEI + 2γ·E·A_1·a_1² = 3.500475e11 + 2·0.376931·5.94e7·122.5² = 1.022019e12
    expectClose(r.effectiveStiffness, 1.022019e12, { rel: 1e-5 }, "(EI)_ef");
    // F_1 = γE A a s V/(EI)_ef = 0.376931·5.94e7·122.5·50·1e4/1.022019e12 = 1341.8 N
    expectClose(r.joints.top!.connectorForcePerShear * V, 1341.8, { rel: 1e-4 }, "F_1");
    expectClose(r.deflectionFactor, 2.132790e12 / 1.022019e12, { rel: 1e-5 }, "deflection factor");
  });

  test("the slip-aware values lie between the no-connection and rigid limits", () => {
    expect(r.effectiveStiffness).toBeGreaterThan(r.noConnection.effectiveStiffness);
    expect(r.effectiveStiffness).toBeLessThan(r.rigid.effectiveStiffness);
    expect(r.joints.top!.connectorForcePerShear).toBeLessThan(r.rigid.joints.top!.connectorForcePerShear);
    expect(r.webShearStressPerShear).toBeGreaterThan(r.rigid.webShearStressPerShear);
    expect(r.webShearStressPerShear).toBeLessThan(r.noConnection.webShearStressPerShear);
  });
});

describe("gammaMethod at γ = 1 is the transformed-section VQ/I", () => {
  test("rigid T of REFERENCES §6.6 (flange 120×45 on web 45×200): (EI)_ef = E·I_T = 8.97131e11, F_1 = VQs/I = 2534.64 N ([D])", () => {
    const t: JointedSection = { web: rectangularLayer({ modulus: E, width: 45, depth: 200, bottomY: 0 }), top: rectangularLayer({ modulus: E, width: 120, depth: 45, bottomY: 200 }) };
    const g = gammaMethod({ section: t, joints: { top: nail(50) }, effectiveLength: 5000 }).rigid;
    expectClose(g.effectiveStiffness, 8.97131e11, { rel: 1e-5 });
    expectClose(g.joints.top!.connectorForcePerShear * V, 2534.64, { rel: 1e-5 });
  });

  test("any three-layer section of mixed moduli: (EI)_ef = E_ref·I and q/V = Q/I of buildSection (mechanics of materials, Gere & Goodno ch. 5 [D])", () => {
    const dims = fc.record({
      b1: fc.integer({ min: 20, max: 300 }), h1: fc.integer({ min: 10, max: 100 }), E1: fc.integer({ min: 5000, max: 210_000 }),
      b2: fc.integer({ min: 10, max: 100 }), h2: fc.integer({ min: 50, max: 500 }), E2: fc.integer({ min: 5000, max: 15_000 }),
      b3: fc.integer({ min: 20, max: 300 }), h3: fc.integer({ min: 10, max: 100 }), E3: fc.integer({ min: 5000, max: 210_000 }),
    });
    fc.assert(
      fc.property(dims, (d) => {
        const layered: JointedSection = {
          bottom: rectangularLayer({ modulus: d.E3, width: d.b3, depth: d.h3, bottomY: 0 }),
          web: rectangularLayer({ modulus: d.E2, width: d.b2, depth: d.h2, bottomY: d.h3 }),
          top: rectangularLayer({ modulus: d.E1, width: d.b1, depth: d.h1, bottomY: d.h3 + d.h2 }),
        };
        const g = jointedResponse(layered, { top: 1, bottom: 1 });
        const { section } = sectionOf(
          [rect("bf", d.b3, d.h3, 0, 0, "M3"), rect("web", d.b2, d.h2, 0, d.h3, "M2"), rect("tf", d.b1, d.h1, 0, d.h3 + d.h2, "M1")],
          [material("M2", d.E2), material("M1", d.E1), material("M3", d.E3)],
        );
        expectClose(g.effectiveStiffness, section.referenceModulus * section.secondMoment, { rel: 1e-9 }, "(EI)_ef vs E·I");
        expectClose(g.neutralAxisY, section.centroidY, { rel: 1e-9 }, "neutral axis");
        expectClose(g.joints.top!.shearFlowPerShear, firstMomentOfParts(section, new Set(["tf"])) / section.secondMoment, { rel: 1e-9 }, "q/V top");
        expectClose(g.joints.bottom!.shearFlowPerShear, -firstMomentOfParts(section, new Set(["bf"])) / section.secondMoment, { rel: 1e-9 }, "q/V bottom");
      }),
    );
  });
});

describe("gammaMethod against the standard's own expressions for touching layers", () => {
  test("a_2 (B.6), a_1, a_3, σ (B.7), σ_m (B.8), τ_2,max (B.9) and F_i (B.10) as printed, for random asymmetric sections", () => {
    const dims = fc.record({
      b1: fc.integer({ min: 30, max: 300 }), h1: fc.integer({ min: 20, max: 80 }),
      b2: fc.integer({ min: 20, max: 100 }), h2: fc.integer({ min: 100, max: 500 }),
      b3: fc.integer({ min: 30, max: 300 }), h3: fc.integer({ min: 20, max: 80 }),
      E1: fc.integer({ min: 6000, max: 16_000 }), E2: fc.integer({ min: 6000, max: 16_000 }), E3: fc.integer({ min: 6000, max: 16_000 }),
      K1: fc.integer({ min: 200, max: 5000 }), K3: fc.integer({ min: 200, max: 5000 }),
      s1: fc.integer({ min: 20, max: 300 }), s3: fc.integer({ min: 20, max: 300 }), l: fc.integer({ min: 1000, max: 12_000 }),
    });
    fc.assert(
      fc.property(dims, (d) => {
        const section: JointedSection = {
          bottom: rectangularLayer({ modulus: d.E3, width: d.b3, depth: d.h3, bottomY: 0 }),
          web: rectangularLayer({ modulus: d.E2, width: d.b2, depth: d.h2, bottomY: d.h3 }),
          top: rectangularLayer({ modulus: d.E1, width: d.b1, depth: d.h1, bottomY: d.h3 + d.h2 }),
        };
        const r = gammaMethod({ section, joints: { top: nail(d.s1, d.K1), bottom: nail(d.s3, d.K3) }, effectiveLength: d.l });
        const A1 = d.b1 * d.h1, A2 = d.b2 * d.h2, A3 = d.b3 * d.h3;
        const g1 = 1 / (1 + (Math.PI ** 2 * d.E1 * A1 * d.s1) / (d.K1 * d.l ** 2));
        const g3 = 1 / (1 + (Math.PI ** 2 * d.E3 * A3 * d.s3) / (d.K3 * d.l ** 2));
        const a2 = (g1 * d.E1 * A1 * (d.h1 + d.h2) - g3 * d.E3 * A3 * (d.h2 + d.h3)) / (2 * (g1 * d.E1 * A1 + d.E2 * A2 + g3 * d.E3 * A3));
        const a1 = (d.h1 + d.h2) / 2 - a2;
        const a3 = (d.h2 + d.h3) / 2 + a2;
        const EI = d.E1 * d.b1 * d.h1 ** 3 / 12 + d.E2 * d.b2 * d.h2 ** 3 / 12 + d.E3 * d.b3 * d.h3 ** 3 / 12
          + g1 * d.E1 * A1 * a1 ** 2 + d.E2 * A2 * a2 ** 2 + g3 * d.E3 * A3 * a3 ** 2;
        expectClose(r.layers.top!.gamma, g1, { rel: 1e-12 }, "γ_1");
        expectClose(r.layers.top!.distance, Math.abs(a1), { rel: 1e-9, abs: 1e-9 }, "a_1");
        expectClose(r.layers.bottom!.distance, Math.abs(a3), { rel: 1e-9, abs: 1e-9 }, "a_3");
        expectClose(r.layers.web.distance, Math.abs(a2), { rel: 1e-9, abs: 1e-9 }, "a_2");
        expectClose(r.effectiveStiffness, EI, { rel: 1e-12 }, "(EI)_ef");
        expectClose(-r.layers.top!.axialStressPerMoment, (g1 * d.E1 * a1) / EI, { rel: 1e-9 }, "σ_1/M");
        expectClose(r.layers.bottom!.bendingStressPerMoment, (0.5 * d.E3 * d.h3) / EI, { rel: 1e-12 }, "σ_m,3/M");
        expectClose(r.joints.top!.connectorForcePerShear, (g1 * d.E1 * A1 * a1 * d.s1) / EI, { rel: 1e-9 }, "F_1/V");
        expectClose(r.joints.bottom!.connectorForcePerShear, (g3 * d.E3 * A3 * a3 * d.s3) / EI, { rel: 1e-9 }, "F_3/V");
        const h = d.h2 / 2 + a2;
        if (h >= 0 && h <= d.h2) {
          expect(r.neutralAxisInWeb).toBe(true);
          expectClose(r.webShearStressPerShear, (g3 * d.E3 * A3 * a3 + 0.5 * d.E2 * d.b2 * h * h) / (d.b2 * EI), { rel: 1e-9 }, "τ_2,max/V");
        }
      }),
    );
  });

  test("two layers: (EI)_ef and F do not depend on which layer is taken as the web (γ_2 = 1) [D]", () => {
    const lower = rectangularLayer({ modulus: E, width: 100, depth: 50, bottomY: 0 });
    const upper = rectangularLayer({ modulus: E, width: 100, depth: 50, bottomY: 50 });
    const a = gammaMethod({ section: { web: lower, top: upper }, joints: { top: nail(60) }, effectiveLength: 3000 });
    const b = gammaMethod({ section: { web: upper, bottom: lower }, joints: { bottom: nail(60) }, effectiveLength: 3000 });
    expectClose(a.effectiveStiffness, b.effectiveStiffness, { rel: 1e-12 });
    expectClose(a.joints.top!.connectorForcePerShear, b.joints.bottom!.connectorForcePerShear, { rel: 1e-12 });
  });

  test("γ → 1 as K → ∞ and γ → 0 as K → 0 reach the rigid and unconnected responses", () => {
    const stiff = gammaMethod({ section: workedI(), joints: { top: nail(50, 1e15), bottom: nail(50, 1e15) }, effectiveLength: 5000 });
    const loose = gammaMethod({ section: workedI(), joints: { top: nail(50, 1e-9), bottom: nail(50, 1e-9) }, effectiveLength: 5000 });
    expectClose(stiff.effectiveStiffness, stiff.rigid.effectiveStiffness, { rel: 1e-9 });
    expectClose(stiff.joints.top!.connectorForcePerShear, stiff.rigid.joints.top!.connectorForcePerShear, { rel: 1e-9 });
    expectClose(loose.effectiveStiffness, loose.noConnection.effectiveStiffness, { rel: 1e-9 });
    expect(loose.joints.top!.connectorForcePerShear).toBeLessThan(1e-9);
  });

  test("a box whose two webs are nailed to the sides of the flanges: webs lumped (b_2 = Σb), flanges placed by their centroids", () => {
    // Webs 2 × 15 × 300 beside flanges 90 × 45 top and bottom: at γ = 1 the E·I of the box by the parallel-axis theorem [D].
    const section: JointedSection = {
      web: rectangularLayer({ modulus: 9000, width: 30, depth: 300, bottomY: 0 }),
      top: rectangularLayer({ modulus: 11_000, width: 90, depth: 45, bottomY: 255 }),
      bottom: rectangularLayer({ modulus: 11_000, width: 90, depth: 45, bottomY: 0 }),
    };
    const twoNails: JointConnectors = { slipModulus: 709.32, shearPlanesPerRow: 2, spacing: { spacing: 75 } };
    const r = gammaMethod({ section, joints: { top: twoNails, bottom: twoNails }, effectiveLength: 4800 });
    const EI = 9000 * 30 * 300 ** 3 / 12 + 2 * 11_000 * (90 * 45 ** 3 / 12 + 90 * 45 * 127.5 ** 2);
    expectClose(r.rigid.effectiveStiffness, EI, { rel: 1e-12 });
    // Both planes' nails add per unit length (Annex B, B.1.3 [M]): γ as for one row of 2K at s.
    expectClose(r.layers.top!.gamma, 1 / (1 + (Math.PI ** 2 * 11_000 * 90 * 45 * 75) / (2 * 709.32 * 4800 ** 2)), { rel: 1e-12 });
    // F per nail = q·s/2.
    expectClose(r.joints.top!.connectorForcePerShear, (r.joints.top!.shearFlowPerShear * 75) / 2, { rel: 1e-12 });
  });
});

describe("effectiveSpacing and effectiveLength", () => {
  test("s_ef = 0.75 s_min + 0.25 s_max with s_max ≤ 4 s_min (EN 1995-1-1 Annex B B.1.2: 4·s_min [V] via Porteous & Kermani ch. 8; s_ef [M])", () => {
    expectClose(effectiveSpacing(50, 200).effectiveSpacing, 87.5, { rel: 1e-12 });
    expect(effectiveSpacing(50, 200).withinLimit).toBe(true);
    expect(effectiveSpacing(50, 201).withinLimit).toBe(false);
    expect(() => effectiveSpacing(100, 50)).toThrow(RangeError);
  });

  test("l = span, 0.8 × span continuous, 2 × cantilever length (EN 1995-1-1 Annex B B.1.2 [M])", () => {
    expect(effectiveLength(5000, "simple").effectiveLength).toBe(5000);
    expect(effectiveLength(5000, "continuous").effectiveLength).toBe(4000);
    expect(effectiveLength(1500, "cantilever").effectiveLength).toBe(3000);
  });

  test("a varying spacing enters γ as s_ef and F_i at s_min", () => {
    const r = gammaMethod({ section: workedI(), joints: { top: { slipModulus: 709.32, shearPlanesPerRow: 1, spacing: { minSpacing: 40, maxSpacing: 160 } }, bottom: nail(70) }, effectiveLength: 5000 });
    expectClose(r.spacings.top!.spacing, 70, { rel: 1e-12 });
    expectClose(r.layers.top!.gamma, r.layers.bottom!.gamma, { rel: 1e-12 }, "same s_ef = s gives the same γ");
    expect(r.joints.top!.forceSpacing).toBe(40);
    expectClose(r.joints.top!.connectorForcePerShear / r.joints.bottom!.connectorForcePerShear, 40 / 70, { rel: 1e-12 });
  });

  test("gammaFactor is (B.5)", () => {
    expectClose(gammaFactor({ modulus: 11_000, area: 5400, spacing: 50, rowSlipModulus: 709.32, effectiveLength: 5000 }), 1 / 2.653004, { rel: 1e-6 });
  });
});

// ---------------------------------------------------------------------------------------------------
// Independent check: Newmark's partial-interaction theory.
// N. M. Newmark, C. P. Siess, I. M. Viest, "Tests and analysis of composite beams with incomplete
// interaction", Proc. Society for Experimental Stress Analysis 9(1), 1951 [M] for the theory: two parts
// with equal curvature, joined by a continuous connection of slip stiffness k = n·K/s per unit length.
// Written for parts that transmit axial forces ±N at lever z and slip at lever r:
//   M = EI_0·κ + N·z,   slip' = c·N − r·κ,   N' = k·slip,
// so slip'' = α²·slip − (r/EI_0)·V with α² = k·D, D = c + r·z/EI_0.
// Two layers: c = 1/EA_1 + 1/EA_2, r = z = distance between centroids.
// Symmetric I (web carries no axial force): c = 1/EA_flange, r = a_1, z = 2·a_1.
// Simply supported, ends free to slip (N = 0 ⇒ slip' = 0 at both ends); solved here in closed form [D]:
//   uniform load w:   q_max (at the support) = q_rigid·(1 − tanh u/u), u = αL/2, q_rigid = V·r/(EI_0·D)
//                     δ_mid = 5wL⁴/(384·EI_rigid) + C_0·[L²/8 − (1 − sech u)/α²], C_0 = z·r·w/(EI_0²·D·α²),
//                     EI_rigid = EI_0·D/c
//   sinusoidal load:  q/V = r/(EI_0·c + r·z + EI_0·π²/(k·L²)) everywhere, which is what (B.5) is built on.
// The closed form is computed a second time by finite differences below.
interface Interaction { EI0: number; c: number; r: number; z: number; k: number }

function newmarkUniformLoad(p: Interaction, w: number, L: number) {
  const D = p.c + (p.r * p.z) / p.EI0;
  const alpha = Math.sqrt(p.k * D);
  const u = (alpha * L) / 2;
  const qRigid = ((w * L) / 2) * p.r / (p.EI0 * D);
  const C0 = (p.z * p.r * w) / (p.EI0 ** 2 * D * alpha ** 2);
  const midspanSlipRate = ((p.r * w) / (p.EI0 * alpha ** 2)) * (1 / Math.cosh(u) - 1);
  return {
    supportShearFlow: qRigid * (1 - Math.tanh(u) / u),
    midspanDeflection: (5 * w * L ** 4) / (384 * (p.EI0 * D) / p.c) + C0 * (L ** 2 / 8 - (1 - 1 / Math.cosh(u)) / alpha ** 2),
    midspanAxialForce: (midspanSlipRate + (p.r * w * L ** 2) / 8 / p.EI0) / D,
  };
}

/** The same boundary-value problem by central differences (n intervals), then κ integrated for δ. */
function newmarkByFiniteDifferences(p: Interaction, w: number, L: number, n = 4000) {
  const D = p.c + (p.r * p.z) / p.EI0;
  const a2 = p.k * D;
  const h = L / n;
  const lo = new Array<number>(n + 1).fill(1 / h ** 2);
  const up = new Array<number>(n + 1).fill(1 / h ** 2);
  const di = new Array<number>(n + 1).fill(-2 / h ** 2 - a2);
  const rhs = Array.from({ length: n + 1 }, (_, i) => -(p.r / p.EI0) * w * (L / 2 - i * h));
  up[0] = 2 / h ** 2; // slip' = 0 at the ends, by a mirrored ghost node
  lo[n] = 2 / h ** 2;
  for (let i = 1; i <= n; i++) {
    const m = lo[i]! / di[i - 1]!;
    di[i]! -= m * up[i - 1]!;
    rhs[i]! -= m * rhs[i - 1]!;
  }
  const slip = new Array<number>(n + 1).fill(0);
  slip[n] = rhs[n]! / di[n]!;
  for (let i = n - 1; i >= 0; i--) slip[i] = (rhs[i]! - up[i]! * slip[i + 1]!) / di[i]!;
  let N = 0;
  let deflection = 0;
  let prev = 0;
  for (let i = 0; i <= n / 2; i++) {
    const x = i * h;
    if (i > 0) N += (p.k * (slip[i]! + slip[i - 1]!) * h) / 2;
    const kappa = ((w * x * (L - x)) / 2 - p.z * N) / p.EI0;
    if (i > 0) deflection += ((prev * (x - h) + kappa * x) * h) / 2; // δ_mid = ∫₀^{L/2} κ·x dx
    prev = kappa;
  }
  return { supportShearFlow: p.k * slip[0]!, midspanDeflection: deflection };
}

describe("gammaMethod against Newmark's partial interaction (simply supported, uniform load)", () => {
  const w = 4; // N/mm
  const L = 5000;
  const EA1 = E * 120 * 45;
  const EI0 = 3.500475e11;
  const cases = [
    {
      what: "symmetric nailed I of REFERENCES §6.6, s = 50 mm",
      section: workedI(),
      joints: { top: nail(50), bottom: nail(50) },
      interaction: { EI0, c: 1 / EA1, r: 122.5, z: 245, k: 709.32 / 50 },
    },
    {
      what: "nailed T (flange 120×45 on web 45×200), s = 50 mm",
      section: { web: rectangularLayer({ modulus: E, width: 45, depth: 200, bottomY: 0 }), top: rectangularLayer({ modulus: E, width: 120, depth: 45, bottomY: 200 }) },
      joints: { top: nail(50) },
      interaction: { EI0: E * (120 * 45 ** 3 + 45 * 200 ** 3) / 12, c: 1 / EA1 + 1 / (E * 45 * 200), r: 122.5, z: 122.5, k: 709.32 / 50 },
    },
    {
      what: "symmetric I, s = 150 mm (little composite action, γ ≈ 0.17)",
      section: workedI(),
      joints: { top: nail(150), bottom: nail(150) },
      interaction: { EI0, c: 1 / EA1, r: 122.5, z: 245, k: 709.32 / 150 },
    },
  ];

  test.each(cases)("the closed form written here agrees with its finite-difference solution: $what [D]", ({ interaction }) => {
    const exact = newmarkUniformLoad(interaction, w, L);
    const fd = newmarkByFiniteDifferences(interaction, w, L);
    expectClose(fd.supportShearFlow, exact.supportShearFlow, { rel: 1e-4 }, "q at the support");
    expectClose(fd.midspanDeflection, exact.midspanDeflection, { rel: 1e-4 }, "δ at midspan");
  });

  // The γ-method is exact for a sinusoidal load (next test); for a uniform load Annex B's sine-shaped slip
  // is an approximation. What this comparison shows, and what the assertions hold it to:
  //   midspan deflection 5wL⁴/(384 (EI)_ef): within 1 % of Newmark (0.1–0.5 % here; the γ-method is slightly stiffer);
  //   midspan flange axial force γEAa·M/(EI)_ef: within 3 % (about 2 % low here);
  //   connector force at the support (B.10): never below Newmark's, and at most 25 % above it (11–21 % here),
  //   because (B.10) takes q/V from the sinusoidal solution everywhere, while under a uniform load the exact
  //   q/V at the support is lower: q_rigid·(1 − tanh u/u) against q_rigid/(1 + π²/(4u²)).
  // That the γ-method's deflection under a uniform load is within a few per cent of the exact solution is
  // stated in the literature on interlayer slip (e.g. U. A. Girhammar, "A simplified analysis method for
  // composite beams with interlayer slip", 2009) [M]: that figure was not seen, so the bands asserted here
  // are the ones this comparison shows, with a margin.
  test.each(cases)("deflection within 1 %, flange force within 3 %, support connector force conservative by ≤ 25 %: $what", ({ section, joints, interaction }) => {
    const exact = newmarkUniformLoad(interaction, w, L);
    const r = gammaMethod({ section, joints, effectiveLength: L });
    const s = "spacing" in joints.top.spacing ? joints.top.spacing.spacing : NaN;
    const deflection = (5 * w * L ** 4) / (384 * r.effectiveStiffness);
    expectClose(deflection, exact.midspanDeflection, { rel: 0.01 }, "δ_mid");
    const flangeForce = -r.layers.top!.axialStressPerMoment * ((w * L ** 2) / 8) * 120 * 45;
    expectClose(flangeForce, exact.midspanAxialForce, { rel: 0.03 }, "N_1 at midspan");
    const force = r.joints.top!.connectorForcePerShear * ((w * L) / 2);
    const exactForce = exact.supportShearFlow * s;
    expect(force).toBeGreaterThanOrEqual(exactForce);
    expect(force).toBeLessThanOrEqual(1.25 * exactForce);
  });

  test("sinusoidal load: the γ-method reproduces Newmark's q/V and the effective stiffness exactly [D]", () => {
    for (const { section, joints, interaction: p } of cases) {
      const r = gammaMethod({ section, joints, effectiveLength: L });
      expectClose(r.joints.top!.shearFlowPerShear, p.r / (p.EI0 * p.c + p.r * p.z + (p.EI0 * Math.PI ** 2) / (p.k * L ** 2)), { rel: 1e-12 }, "q/V");
      // M = M_0 sin(πx/L): slip = A cos(πx/L) with A = (r/EI_0)(M_0 π/L)/(α² + π²/L²); N and κ follow.
      const D = p.c + (p.r * p.z) / p.EI0;
      const M0 = 1e6;
      const A = ((p.r / p.EI0) * (M0 * Math.PI) / L) / (p.k * D + Math.PI ** 2 / L ** 2);
      const N0 = ((-A * Math.PI) / L + (p.r * M0) / p.EI0) / D;
      const kappa0 = (M0 - p.z * N0) / p.EI0;
      expectClose(r.effectiveStiffness, M0 / kappa0, { rel: 1e-12 }, "(EI)_ef");
    }
  });
});

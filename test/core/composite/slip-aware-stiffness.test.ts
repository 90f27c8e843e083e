import { describe, expect, test } from "vitest";
import { gammaMethod } from "../../../core/composite/gamma-method.js";
import { rectangularLayer, type JointSet, type JointedSection } from "../../../core/composite/jointed-section.js";
import { slipAwareStiffness } from "../../../core/composite/slip-aware-stiffness.js";
import { expectClose } from "../../expect-close.js";

// REFERENCES §6.6 nailed I with K_ser = 709.32 N/mm at s = 50 mm, l = 5 m; long-term rules of EN 1995-1-1 §2.3.2.2 [M]:
// E_fin = E/(1 + ψ2 k_def), K_ser,fin = K_ser/(1 + ψ2 k_def,c), k_def,c = 2 k_def for members of the same creep
// behaviour (also Porteous & Kermani, Structural Timber Design to Eurocode 5, ch. 8). k_def = 0.6 in service
// class 1 (EN 1995-1-1 Table 3.2; REFERENCES §6.2 [M] for solid timber); ψ2 = 0.3 for domestic floors (EN 1990 Table A1.1 [M]).
const E = 11_000;
const section = (): JointedSection => ({
  bottom: rectangularLayer({ modulus: E, width: 120, depth: 45, bottomY: 0 }),
  web: rectangularLayer({ modulus: E, width: 45, depth: 200, bottomY: 45 }),
  top: rectangularLayer({ modulus: E, width: 120, depth: 45, bottomY: 245 }),
});
const joints: JointSet = {
  top: { slipModulus: 709.32, shearPlanesPerRow: 1, spacing: { spacing: 50 } },
  bottom: { slipModulus: 709.32, shearPlanesPerRow: 1, spacing: { spacing: 50 } },
};

describe("slipAwareStiffness", () => {
  test("instantaneous (EI)_ef with K_ser beside the rigid and unconnected limits (REFERENCES §6.6 [D])", () => {
    const s = slipAwareStiffness({ section: section(), joints, effectiveLength: 5000 });
    expectClose(s.rigid, 2.132790e12, { rel: 1e-6 });
    expectClose(s.noConnection, 3.500475e11, { rel: 1e-6 });
    expectClose(s.instantaneous, 1.022019e12, { rel: 1e-5 });
    expect(s.final).toBeNull();
    expectClose(s.deflectionFactor, s.rigid / s.instantaneous, { rel: 1e-12 });
  });

  test("ψ2 = 0.3, k_def = 0.6: E_fin = E/1.18, K_fin = K/1.36 (k_def,c = 2 k_def), γ_fin by hand from (B.5) [D]", () => {
    const s = slipAwareStiffness({ section: section(), joints, effectiveLength: 5000, longTerm: { psi2: 0.3, deformationFactors: { web: 0.6, top: 0.6, bottom: 0.6 } } });
    expectClose(s.jointDeformationFactors.top!, 1.2, { rel: 1e-12 });
    // π²·E·A·s/(K·l²) = 1.65300 at t = 0; the final ratio is 1.65300 × 1.36/1.18 = 1.90515, γ_fin = 1/2.90515 = 0.344216.
    expectClose(s.finalResponse!.layers.top!.gamma, 0.344216, { rel: 1e-5 }, "γ_fin");
    const EIfin = (3.500475e11 + 2 * 0.344216 * 5.94e7 * 122.5 ** 2) / 1.18;
    expectClose(s.final!, EIfin, { rel: 1e-5 }, "(EI)_ef,fin");
  });

  test("with the joint's k_def equal to the members' (user override), (EI)_ef,fin = (EI)_ef/(1 + ψ2 k_def) exactly: γ is unchanged [D]", () => {
    const s = slipAwareStiffness({
      section: section(),
      joints,
      effectiveLength: 5000,
      longTerm: { psi2: 1, deformationFactors: { web: 0.8, top: 0.8, bottom: 0.8 }, jointDeformationFactors: { top: 0.8, bottom: 0.8 } },
    });
    expectClose(s.final!, s.instantaneous / 1.8, { rel: 1e-12 });
  });

  test("ψ2 = 0 leaves the stiffness at its instantaneous value", () => {
    const s = slipAwareStiffness({ section: section(), joints, effectiveLength: 5000, longTerm: { psi2: 0, deformationFactors: { web: 0.6, top: 0.6, bottom: 0.6 } } });
    expectClose(s.final!, s.instantaneous, { rel: 1e-12 });
  });

  test("members of different creep: k_def,c = 2√(k_def,1·k_def,2) (EN 1995-1-1 eq. 2.13 [M]) and the final result is the γ-method on the reduced values", () => {
    const s = slipAwareStiffness({ section: section(), joints, effectiveLength: 5000, longTerm: { psi2: 0.3, deformationFactors: { web: 2.25, top: 0.6, bottom: 0.6 } } });
    expectClose(s.jointDeformationFactors.top!, 2 * Math.sqrt(0.6 * 2.25), { rel: 1e-12 });
    const reduced = section();
    reduced.web.modulus = E / (1 + 0.3 * 2.25);
    reduced.top!.modulus = E / 1.18;
    reduced.bottom!.modulus = E / 1.18;
    const kFin = 709.32 / (1 + 0.3 * 2 * Math.sqrt(0.6 * 2.25));
    const direct = gammaMethod({
      section: reduced,
      joints: { top: { ...joints.top!, slipModulus: kFin }, bottom: { ...joints.bottom!, slipModulus: kFin } },
      effectiveLength: 5000,
    });
    expectClose(s.final!, direct.effectiveStiffness, { rel: 1e-12 });
  });
});

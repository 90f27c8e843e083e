import { describe, expect, test } from "vitest";
import { analyseMember } from "../../../core/beam/analyse-beam.js";
import { evaluate, momentAt } from "../../../core/beam/member-actions.js";
import { expectClose } from "../../expect-close.js";
import { asEntered, coreBeam } from "./beam-test-kit.js";

// A member whose E·I steps: EI₁ over the outer stretches [0, a] and [L − a, L], EI₂ over the middle.
// Midspan deflection under a central load P by the unit-load (virtual work) method, integrating
// M·m/EI stretch by stretch with M = P·x/2 and m = x/2 (x < L/2) (e.g. Hibbeler, Structural Analysis,
// ch. 9, "deflections by energy methods"): δ = P/6 · [a³/EI₁ + ((L/2)³ − a³)/EI₂]  [D].
const L = 6000;
const a = 1500;
const P = 20_000;
const EI1 = 2e12;
const EI2 = 5e12;
const steps = [
  { x0: 0, x1: a, value: EI1 },
  { x0: a, x1: L - a, value: EI2 },
  { x0: L - a, x1: L, value: EI1 },
];

describe("members whose section changes along them", () => {
  test("midspan deflection of a simply supported stepped beam under a central load matches the virtual-work closed form", () => {
    const beam = coreBeam([L], undefined, [{ type: "point", category: "dead", P, at: L / 2 }]);
    const analysis = analyseMember({ beam, combinations: [asEntered(["dead"])], selfWeight: 0, flexuralRigidity: EI2, rigidity: steps, serviceLoads: true });
    const expected = (P / 6) * (a ** 3 / EI1 + ((L / 2) ** 3 - a ** 3) / EI2);
    expectClose(-evaluate(analysis.results[0]!.curve, L / 2, "v"), expected, { rel: 1e-9 });
    // With one E·I throughout it is PL³/(48EI).
    const uniform = analyseMember({ beam, combinations: [asEntered(["dead"])], selfWeight: 0, flexuralRigidity: EI1, rigidity: steps.map((s) => ({ ...s, value: EI1 })), serviceLoads: true });
    expectClose(-evaluate(uniform.results[0]!.curve, L / 2, "v"), (P * L ** 3) / (48 * EI1), { rel: 1e-9 });
  });

  test("a propped cantilever stepped along its length: the prop's reaction by compatibility with the same virtual-work integrals", () => {
    // Fixed at 0, roller at L, UDL w. Release the prop: δ_w(L) + R·δ_1(L) = 0, each by ∫ M·m/EI with m = (L − x).
    const w = 5;
    const beam = coreBeam([L], ["fixed", "roller"], [{ type: "uniform", category: "dead", w }]);
    const analysis = analyseMember({ beam, combinations: [asEntered(["dead"])], selfWeight: 0, flexuralRigidity: EI2, rigidity: steps, serviceLoads: true });
    const ei = (x: number) => (x < a || x > L - a ? EI1 : EI2);
    const n = 60_000;
    let dw = 0;
    let d1 = 0;
    for (let i = 0; i < n; i++) {
      const x = ((i + 0.5) * L) / n;
      const m = L - x; // unit upward force at the tip, as a hogging moment below
      const Mw = -(w * (L - x) ** 2) / 2;
      dw += (Mw * -m) / ei(x);
      d1 += (m * m) / ei(x);
    }
    const R = dw / d1;
    const prop = analysis.results[0]!.reactions.find((r) => Math.abs(r.x - L) < 1e-6)!;
    expectClose(prop.R, R, { rel: 1e-6 }, "prop reaction (midpoint rule on 60 000 strips)");
    // Uniform E·I: the prop takes 3wL/8 (propped cantilever closed form).
    expect(Math.abs(R - (3 * w * L) / 8) / R).toBeGreaterThan(1e-3);
    expectClose(momentAt(analysis.results[0]!.actions, L, "left"), 0, { abs: 1e-3 });
  });
});

import fc from "fast-check";
import { describe, expect, test } from "vitest";
import { Nail, nailKind } from "../../../core/connector/nail.js";
import { TimberBolt, timberBoltKind } from "../../../core/connector/timber-bolt.js";
import { johansenSteelSingle, johansenTimberDouble, johansenTimberSingle } from "../../../core/connector/timber/ec5-johansen.js";
import { ndsWoodBearing } from "../../../core/connector/timber/nds-dowel-bearing.js";
import { ndsYieldLimit } from "../../../core/connector/timber/nds-yield-limit.js";
import { context, ec5Timber, IN, member, wood } from "./contexts.js";

// Physical claims the yield models must keep for any input (no published numbers here):
// the governing mode is the least of the modes, and the resistance never rises when a member gets
// thinner or its wood lighter.
const RUNS = { numRuns: 400 };
const notAbove = (lower: number, upper: number) => lower <= upper * (1 + 1e-9) + 1e-9;
/** A value and a second one no larger. */
const pair = (min: number, max: number) => fc.tuple(fc.double({ min, max, noNaN: true }), fc.double({ min: 0.05, max: 1, noNaN: true })).map(([a, f]) => [a, Math.max(min, a * f)] as const);

describe("NDS yield limit equations (property-based)", () => {
  const input = fc.record({
    D: fc.double({ min: 0.09, max: 1, noNaN: true }),
    Fyb: fc.double({ min: 40_000, max: 100_000, noNaN: true }),
    ls: pair(0.25, 6),
    lm: pair(0.25, 8),
    Gs: pair(0.3, 0.75),
    Gm: pair(0.3, 0.75),
    theta: fc.double({ min: 0, max: 90, noNaN: true }),
    shear: fc.constantFrom("single" as const, "double" as const),
  });
  const z = (p: { D: number; Fyb: number; theta: number; shear: "single" | "double" }, ls: number, lm: number, Gs: number, Gm: number) =>
    ndsYieldLimit({ diameterIn: p.D, bendingYieldPsi: p.Fyb, sideLengthIn: ls, mainLengthIn: lm, sideBearingPsi: ndsWoodBearing(Gs, p.D, p.theta).value, mainBearingPsi: ndsWoodBearing(Gm, p.D, p.theta).value, shear: p.shear, maxAngleDeg: p.theta });

  test("the governing mode is the least of the modes, and Z is its value", () => {
    fc.assert(
      fc.property(input, (p) => {
        const r = z(p, p.ls[0], p.lm[0], p.Gs[0], p.Gm[0]);
        expect(r.governing.zLb).toBe(Math.min(...r.modes.map((m) => m.zLb)));
        expect(r.modes.every((m) => Number.isFinite(m.zLb) && m.zLb > 0)).toBe(true);
      }),
      RUNS,
    );
  });

  test("Z never rises when the side or main member gets thinner, or either wood lighter", () => {
    fc.assert(
      fc.property(input, (p) => {
        const Z = z(p, p.ls[0], p.lm[0], p.Gs[0], p.Gm[0]).governing.zLb;
        expect(notAbove(z(p, p.ls[1], p.lm[0], p.Gs[0], p.Gm[0]).governing.zLb, Z)).toBe(true);
        expect(notAbove(z(p, p.ls[0], p.lm[1], p.Gs[0], p.Gm[0]).governing.zLb, Z)).toBe(true);
        expect(notAbove(z(p, p.ls[0], p.lm[0], p.Gs[1], p.Gm[0]).governing.zLb, Z)).toBe(true);
        expect(notAbove(z(p, p.ls[0], p.lm[0], p.Gs[0], p.Gm[1]).governing.zLb, Z)).toBe(true);
      }),
      RUNS,
    );
  });
});

describe("EN 1995-1-1 Johansen equations (property-based)", () => {
  const input = fc.record({
    d: fc.double({ min: 2, max: 24, noNaN: true }),
    fu: fc.double({ min: 360, max: 1000, noNaN: true }),
    t1: pair(5, 200),
    t2: pair(5, 200),
    rho1: pair(250, 700),
    rho2: pair(250, 700),
    axial: fc.double({ min: 0, max: 20_000, noNaN: true }),
    cap: fc.constantFrom(0, 0.15, 0.25, 0.5, 1),
    double: fc.boolean(),
  });
  const fv = (p: { d: number; fu: number; axial: number; cap: number; double: boolean }, t1: number, t2: number, rho1: number, rho2: number) => {
    const fh = (rho: number) => 0.082 * (1 - 0.01 * p.d) * rho;
    const args = { fh1: fh(rho1), fh2: fh(rho2), t1, t2, d: p.d, My: 0.3 * p.fu * p.d ** 2.6, rope: { axialCapacity: p.axial, cap: p.cap } };
    return p.double ? johansenTimberDouble(args) : johansenTimberSingle(args);
  };

  test("the governing mode is the least of the modes, and no rope share exceeds its cap", () => {
    fc.assert(
      fc.property(input, (p) => {
        const r = fv(p, p.t1[0], p.t2[0], p.rho1[0], p.rho2[0]);
        expect(r.value).toBe(Math.min(...r.modes.map((m) => m.value)));
        for (const m of r.modes) expect(m.rope).toBeLessThanOrEqual(p.cap * m.johansen + 1e-9);
      }),
      RUNS,
    );
  });

  test("F_v,Rk never rises when either member gets thinner or lighter", () => {
    fc.assert(
      fc.property(input, (p) => {
        const F = fv(p, p.t1[0], p.t2[0], p.rho1[0], p.rho2[0]).value;
        expect(notAbove(fv(p, p.t1[1], p.t2[0], p.rho1[0], p.rho2[0]).value, F)).toBe(true);
        expect(notAbove(fv(p, p.t1[0], p.t2[1], p.rho1[0], p.rho2[0]).value, F)).toBe(true);
        expect(notAbove(fv(p, p.t1[0], p.t2[0], p.rho1[1], p.rho2[0]).value, F)).toBe(true);
        expect(notAbove(fv(p, p.t1[0], p.t2[0], p.rho1[0], p.rho2[1]).value, F)).toBe(true);
      }),
      RUNS,
    );
  });

  test("steel-to-timber in single shear never rises when the timber gets thinner or lighter, and thin ≤ thick plate", () => {
    fc.assert(
      fc.property(fc.record({ d: fc.double({ min: 4, max: 24, noNaN: true }), t: pair(10, 200), rho: pair(250, 700), plate: fc.double({ min: 1, max: 30, noNaN: true }) }), (p) => {
        const at = (t: number, rho: number, plate = p.plate) => johansenSteelSingle({ fh: 0.082 * (1 - 0.01 * p.d) * rho, t, d: p.d, My: 0.3 * 400 * p.d ** 2.6, rope: { axialCapacity: 0, cap: 0.25 }, plateThickness: plate }).value;
        const F = at(p.t[0], p.rho[0]);
        expect(notAbove(at(p.t[1], p.rho[0]), F)).toBe(true);
        expect(notAbove(at(p.t[0], p.rho[1]), F)).toBe(true);
        expect(notAbove(at(p.t[0], p.rho[0], 0.5 * p.d), at(p.t[0], p.rho[0], p.d))).toBe(true);
      }),
      RUNS,
    );
  });
});

describe("connector kinds end to end (property-based)", () => {
  test("a nail's resistance never rises when the point-side member gets thinner or either wood lighter (NDS and EN 1995-1-1)", () => {
    fc.assert(
      fc.property(
        fc.record({
          standard: fc.constantFrom("NDS-2018" as const, "EN1995-1-1" as const),
          size: fc.constantFrom("8d common", "10d common", "16d common", "20d common", "16d sinker", "16d box"),
          side: fc.double({ min: 0.5, max: 1.5, noNaN: true }),
          main: pair(0.5, 6),
          G: pair(0.35, 0.7),
          Gm: pair(0.35, 0.7),
        }),
        (p) => {
          const nail = Nail.parse({ id: "n", kind: "nail", standard: p.standard, size: p.size, predrilled: true });
          const at = (main: number, Gs: number, Gm: number) => {
            const m = (G: number) => (p.standard === "NDS-2018" ? wood(G) : ec5Timber(G * 800, G * 950));
            return nailKind.resistance(nail, context(member("side", m(Gs), p.side * IN), member("main", m(Gm), main * IN), { basis: p.standard === "NDS-2018" ? "allowable" : "factored" })).value;
          };
          const R = at(p.main[0], p.G[0], p.Gm[0]);
          expect(notAbove(at(p.main[1], p.G[0], p.Gm[0]), R)).toBe(true);
          expect(notAbove(at(p.main[0], p.G[1], p.Gm[0]), R)).toBe(true);
          expect(notAbove(at(p.main[0], p.G[0], p.Gm[1]), R)).toBe(true);
        },
      ),
      RUNS,
    );
  });

  test("a bolt's resistance never rises when either member gets thinner, and its governing mode is the least mode", () => {
    fc.assert(
      fc.property(
        fc.record({ standard: fc.constantFrom("NDS-2018" as const, "EN1995-1-1" as const), size: fc.constantFrom("1/2", "5/8", "3/4", "M12", "M16", "M20"), side: pair(1, 6), main: pair(1, 8), shear: fc.constantFrom("single" as const, "double" as const), angle: fc.double({ min: 0, max: 90, noNaN: true }) }),
        (p) => {
          const bolt = TimberBolt.parse({ id: "b", kind: "timber-bolt", standard: p.standard, size: p.size, shear: p.shear, mainAngleToGrainDeg: p.angle, ...(p.standard === "EN1995-1-1" ? { grade: "4.6" } : {}) });
          const m = p.standard === "NDS-2018" ? wood(0.5) : ec5Timber(380, 450);
          const at = (side: number, main: number) => timberBoltKind.resistance(bolt, context(member("side", m, side * IN), member("main", m, main * IN), { basis: p.standard === "NDS-2018" ? "allowable" : "factored" }));
          const r = at(p.side[0], p.main[0]);
          expect(r.value).toBeCloseTo(Math.min(...r.modes!.map((x) => x.value)), 9);
          expect(notAbove(at(p.side[1], p.main[0]).value, r.value)).toBe(true);
          expect(notAbove(at(p.side[0], p.main[1]).value, r.value)).toBe(true);
        },
      ),
      RUNS,
    );
  });
});

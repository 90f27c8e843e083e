import fc from "fast-check";
import { describe, expect, test } from "vitest";
import { simpleSpanReactions } from "../../../core/beam/analyse-beam.js";
import {
  deflectionCurve,
  evaluate,
  maxAbsShear,
  maxDeflection,
  memberActions,
  momentAt,
  momentExtremes,
  shearAt,
  type LoadSet,
} from "../../../core/beam/member-actions.js";
import { expectClose } from "../../expect-close.js";

// Closed forms: any structural-analysis text, e.g. AISC Manual Table 3-23 beam diagrams (from memory);
// numbers of REFERENCES §4, flag [D]. Units N, mm: 1 kN/m = 1 N/mm, 1 kN·m = 1e6 N·mm.
const simplySupported = (L: number, loads: LoadSet) => {
  const reactions = simpleSpanReactions(loads, 0, L);
  return { reactions, actions: memberActions(L, loads, reactions) };
};

describe("memberActions on a simply supported span", () => {
  test("UDL w = 10 kN/m on 6 m: R = wL/2, V(L/4), M_max = wL²/8, M(L/4) (REFERENCES §4.1 [D])", () => {
    const { reactions, actions } = simplySupported(6000, { points: [], moments: [], lines: [{ x0: 0, x1: 6000, w0: 10, w1: 10 }] });
    expectClose(reactions[0]!.R, 30_000, { rel: 1e-12 });
    expectClose(reactions[1]!.R, 30_000, { rel: 1e-12 });
    expectClose(shearAt(actions, 1500), 15_000, { rel: 1e-12 });
    expectClose(momentExtremes(actions).max.value, 45e6, { rel: 1e-12 });
    expectClose(momentExtremes(actions).max.x, 3000, { rel: 1e-9 });
    expectClose(momentAt(actions, 1500), 33.75e6, { rel: 1e-12 });
  });

  test("central point load P = 20 kN on 6 m: V = ±P/2 with the jump kept on both sides, M_max = PL/4 (REFERENCES §4.2 [D])", () => {
    const { actions } = simplySupported(6000, { points: [{ x: 3000, P: 20_000 }], moments: [], lines: [] });
    expectClose(shearAt(actions, 3000, "left"), 10_000, { rel: 1e-12 });
    expectClose(shearAt(actions, 3000, "right"), -10_000, { rel: 1e-12 });
    expectClose(maxAbsShear(actions, 3000, 3000).value, 10_000, { rel: 1e-12 }, "both sides of the jump at a point");
    expectClose(momentAt(actions, 3000), 30e6, { rel: 1e-12 });
    expectClose(momentAt(actions, 1500), 15e6, { rel: 1e-12 });
  });

  test("shear is zero outside the member and at the outer sides of its ends", () => {
    const { actions } = simplySupported(6000, { points: [], moments: [], lines: [{ x0: 0, x1: 6000, w0: 10, w1: 10 }] });
    expect(shearAt(actions, 0, "left")).toBe(0);
    expect(shearAt(actions, 6000, "right")).toBe(0);
    expectClose(shearAt(actions, 6000, "left"), -30_000, { rel: 1e-12 });
  });

  test("a partial trapezoidal load against a hand calculation of reactions and moment", () => {
    // w from 2 N/mm at x = 1000 to 6 N/mm at x = 3000 on L = 5000.
    // Resultant W = 2000·(2 + 6)/2 = 8000 N at x̄ = 1000 + 2000·(2 + 2·6)/(3·(2 + 6)) = 2166.67.
    // R_B = W·x̄/L = 3466.67 N, R_A = 4533.33 N; M(1000) = R_A·1000 = 4.5333e6 N·mm.
    const { reactions, actions } = simplySupported(5000, { points: [], moments: [], lines: [{ x0: 1000, x1: 3000, w0: 2, w1: 6 }] });
    expectClose(reactions[0]!.R, 4533.333, { rel: 1e-6 });
    expectClose(reactions[1]!.R, 3466.667, { rel: 1e-6 });
    expectClose(momentAt(actions, 1000), 4.533333e6, { rel: 1e-6 });
  });

  test("deflection at midspan: 5wL⁴/(384EI) for a UDL and PL³/(48EI) for a central load (closed forms, AISC Manual Table 3-23 cases 1 and 7, from memory; [D])", () => {
    const EI = 11_000 * 200e6;
    const udl = simplySupported(6000, { points: [], moments: [], lines: [{ x0: 0, x1: 6000, w0: 4, w1: 4 }] });
    const curve = deflectionCurve(udl.actions, EI, [{ x: 0, fixed: false }, { x: 6000, fixed: false }]);
    expectClose(-evaluate(curve, 3000, "v"), (5 * 4 * 6000 ** 4) / (384 * EI), { rel: 1e-9 });
    expectClose(maxDeflection(curve).value, (5 * 4 * 6000 ** 4) / (384 * EI), { rel: 1e-9 });
    expectClose(evaluate(curve, 0, "theta"), -(4 * 6000 ** 3) / (24 * EI), { rel: 1e-9 }, "end rotation wL³/(24EI)");
    const point = simplySupported(6000, { points: [{ x: 3000, P: 10_000 }], moments: [], lines: [] });
    const c2 = deflectionCurve(point.actions, EI, [{ x: 0, fixed: false }, { x: 6000, fixed: false }]);
    expectClose(maxDeflection(c2).value, (10_000 * 6000 ** 3) / (48 * EI), { rel: 1e-9 });
  });

  test("cantilever from a fixed support: V and M at the root and tip deflection wL⁴/(8EI) (REFERENCES §4.3 [D])", () => {
    const L = 3000;
    const w = 5;
    const loads: LoadSet = { points: [], moments: [], lines: [{ x0: 0, x1: L, w0: w, w1: w }] };
    // Fixed at x = 0: reaction wL up and a hogging moment −wL²/2 (counter-clockwise on the member).
    const actions = memberActions(L, loads, [{ x: 0, R: w * L, M: -(w * L * L) / 2 }]);
    expectClose(shearAt(actions, 0), 15_000, { rel: 1e-12 });
    expectClose(momentAt(actions, 0), -22.5e6, { rel: 1e-12 });
    expectClose(momentAt(actions, L, "left"), 0, { abs: 1e-6 });
    const EI = 1e12;
    const curve = deflectionCurve(actions, EI, [{ x: 0, fixed: true }]);
    expectClose(-evaluate(curve, L, "v"), (w * L ** 4) / (8 * EI), { rel: 1e-9 });
  });
});

describe("memberActions on random simply supported beams (property-based)", () => {
  const beam = fc.record({
    L: fc.double({ min: 500, max: 20_000, noNaN: true }),
    points: fc.array(fc.record({ t: fc.double({ min: 0, max: 1, noNaN: true }), P: fc.double({ min: -5e4, max: 5e4, noNaN: true }) }), { maxLength: 5 }),
    lines: fc.array(
      fc.record({ a: fc.double({ min: 0, max: 1, noNaN: true }), b: fc.double({ min: 0, max: 1, noNaN: true }), w0: fc.double({ min: -20, max: 20, noNaN: true }), w1: fc.double({ min: -20, max: 20, noNaN: true }) }),
      { maxLength: 4 },
    ),
  });
  type RandomBeam = typeof beam extends fc.Arbitrary<infer T> ? T : never;
  const build = (b: RandomBeam) => {
    const loads: LoadSet = {
      points: b.points.map((p) => ({ x: p.t * b.L, P: p.P })),
      moments: [],
      lines: b.lines.filter((l) => Math.abs(l.a - l.b) > 1e-3).map((l) => ({ x0: Math.min(l.a, l.b) * b.L, x1: Math.max(l.a, l.b) * b.L, w0: l.w0, w1: l.w1 })),
    };
    return { loads, ...simplySupported(b.L, loads) };
  };

  test("reactions balance the loads and M returns to zero at the far support", () => {
    fc.assert(
      fc.property(beam, (b) => {
        const { loads, reactions, actions } = build(b);
        const total = loads.points.reduce((s, p) => s + p.P, 0) + loads.lines.reduce((s, l) => s + ((l.x1 - l.x0) * (l.w0 + l.w1)) / 2, 0);
        const scale = Math.max(1, Math.abs(total), ...loads.points.map((p) => Math.abs(p.P)), ...loads.lines.map((l) => (Math.abs(l.w0) + Math.abs(l.w1)) * b.L));
        expectClose(reactions[0]!.R + reactions[1]!.R, total, { abs: 1e-9 * scale }, "ΣR = ΣP");
        expectClose(momentAt(actions, b.L, "left"), 0, { abs: 1e-9 * scale * b.L }, "M(L)");
      }),
      { numRuns: 200 },
    );
  });

  test("V is the derivative of M between breakpoints (central finite difference)", () => {
    fc.assert(
      fc.property(beam, fc.double({ min: 0.01, max: 0.99, noNaN: true }), (b, t) => {
        const { actions } = build(b);
        const x = t * b.L;
        const h = 1e-4 * b.L;
        if (actions.breaks.some((k) => Math.abs(k - x) < 2 * h)) return;
        const dM = (momentAt(actions, x + h) - momentAt(actions, x - h)) / (2 * h);
        const scale = Math.max(1, ...actions.pieces.map((p) => Math.abs(p.v[0])));
        expectClose(dM, shearAt(actions, x), { abs: 1e-5 * scale }, "dM/dx");
      }),
      { numRuns: 200 },
    );
  });

  test("Maxwell–Betti: the deflection at b from a unit load at a equals that at a from a unit load at b", () => {
    fc.assert(
      fc.property(fc.double({ min: 1000, max: 10_000, noNaN: true }), fc.double({ min: 0.05, max: 0.95, noNaN: true }), fc.double({ min: 0.05, max: 0.95, noNaN: true }), (L, ta, tb) => {
        const EI = 1e12;
        const deflectionAt = (load: number, at: number) => {
          const { actions } = simplySupported(L, { points: [{ x: load, P: 1 }], moments: [], lines: [] });
          return evaluate(deflectionCurve(actions, EI, [{ x: 0, fixed: false }, { x: L, fixed: false }]), at, "v");
        };
        const a = ta * L;
        const b = tb * L;
        expectClose(deflectionAt(a, b), deflectionAt(b, a), { rel: 1e-9, abs: 1e-18 }, "δ_ba = δ_ab");
      }),
      { numRuns: 100 },
    );
  });

  test("an independent fine finite-difference model agrees with the exact moment and deflection", () => {
    // Independent check: integrate the loads numerically on a fine grid (trapezoid rule) for V and M,
    // then solve EI·v'' = M with v(0) = v(L) = 0 by the central-difference tridiagonal system.
    fc.assert(
      fc.property(beam, (b) => {
        const { loads, reactions, actions } = build(b);
        const n = 2000;
        const h = b.L / n;
        const xs = Array.from({ length: n + 1 }, (_, i) => i * h);
        const load = (x: number) => loads.lines.reduce((s, l) => (x >= l.x0 && x <= l.x1 ? s + l.w0 + ((l.w1 - l.w0) * (x - l.x0)) / (l.x1 - l.x0) : s), 0);
        const momentByStatics = (x: number) => {
          let m = reactions[0]!.R * x;
          for (const p of loads.points) if (p.x < x) m -= p.P * (x - p.x);
          // ∫₀ˣ w(ξ)(x − ξ) dξ by a fine trapezoid rule.
          const k = 2000;
          let s = 0;
          for (let i = 0; i <= k; i++) {
            const xi = (x * i) / k;
            s += (i === 0 || i === k ? 0.5 : 1) * load(xi) * (x - xi);
          }
          return m - (s * x) / k;
        };
        // Tolerance: the trapezoid rule's error on a load that starts or stops between its nodes, of the
        // order of the intensity × one step × the lever arm, however short the loaded length.
        const loadScale = (loads.points.reduce((s, p) => s + Math.abs(p.P), 0) + loads.lines.reduce((s, l) => s + (Math.abs(l.w0) + Math.abs(l.w1)) * (l.x1 - l.x0), 0)) * b.L;
        const stepError = Math.max(0, ...loads.lines.map((l) => Math.abs(l.w0) + Math.abs(l.w1))) * (b.L / 2000) * b.L;
        for (const x of [0.17, 0.5, 0.83].map((t) => t * b.L)) {
          expectClose(momentByStatics(x), momentAt(actions, x), { abs: 1e-3 * loadScale + stepError + 1e-9 }, `M(${x.toFixed(1)})`);
        }
        const EI = 1e12;
        const m = xs.map((x) => momentAt(actions, x) / EI);
        // Thomas algorithm for v[i−1] − 2v[i] + v[i+1] = h²·m[i], v[0] = v[n] = 0.
        const c = new Array<number>(n).fill(0);
        const d = new Array<number>(n).fill(0);
        for (let i = 1; i < n; i++) {
          const denom = -2 - (i > 1 ? c[i - 1]! : 0);
          c[i] = 1 / denom;
          d[i] = (h * h * m[i]! - (i > 1 ? d[i - 1]! : 0)) / denom;
        }
        const v = new Array<number>(n + 1).fill(0);
        for (let i = n - 1; i >= 1; i--) v[i] = d[i]! - c[i]! * v[i + 1]!;
        const curve = deflectionCurve(actions, EI, [{ x: 0, fixed: false }, { x: b.L, fixed: false }]);
        const vScale = Math.max(1e-30, ...xs.map((x) => Math.abs(evaluate(curve, x, "v"))));
        for (const i of [n / 4, n / 2, (3 * n) / 4]) expectClose(v[i]!, evaluate(curve, xs[i]!, "v"), { abs: 2e-3 * vScale }, `v(${xs[i]})`);
      }),
      { numRuns: 40 },
    );
  });
});

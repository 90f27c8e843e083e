import fc from "fast-check";
import { describe, test } from "vitest";
import { analyseMember } from "../../../core/beam/analyse-beam.js";
import { beamModelOf, instability, type SupportCondition } from "../../../core/beam/beam-model.js";
import { valuesAtStations } from "../../../core/beam/beam-result.js";
import { deflectionCurve, evaluate, memberActions, shearAt, type LoadSet } from "../../../core/beam/member-actions.js";
import { stationsFor } from "../../../core/beam/stations.js";
import { supportReactions } from "../../../core/beam/support-reactions.js";
import type { Load } from "../../../core/schema/beam.js";
import { expectClose } from "../../expect-close.js";
import { coreBeam } from "./beam-test-kit.js";

// Random members: 1–5 spans on any stable mix of pinned, roller, fixed and free ends, with point
// loads, partial trapezoidal line loads and couples anywhere on the member. Units N, mm. Load sizes
// are whole newtons (tenths of N/mm) so that no load is a subnormal number.
const conditions: SupportCondition[] = ["pinned", "roller", "fixed", "free"];
const unit = fc.double({ min: 0, max: 1, noNaN: true });
const member = fc
  .record({
    spans: fc.array(fc.double({ min: 800, max: 6000, noNaN: true }), { minLength: 1, maxLength: 5 }),
    ends: fc.array(fc.constantFrom(...conditions), { minLength: 6, maxLength: 6 }),
    points: fc.array(fc.record({ t: unit, P: fc.integer({ min: -30_000, max: 30_000 }) }), { maxLength: 4 }),
    lines: fc.array(fc.record({ a: unit, b: unit, w0: fc.integer({ min: -150, max: 150 }).map((w) => w / 10), w1: fc.integer({ min: -150, max: 150 }).map((w) => w / 10) }), { maxLength: 3 }),
    couples: fc.array(fc.record({ t: unit, M: fc.integer({ min: -20_000, max: 20_000 }).map((m) => m * 1000) }), { maxLength: 2 }),
  })
  .map((m) => ({ ...m, ends: m.ends.slice(0, m.spans.length + 1) }))
  .filter((m) => instability(m.ends) === null);
type Member = typeof member extends fc.Arbitrary<infer T> ? T : never;

function build(m: Member) {
  const model = beamModelOf(m.spans, m.ends);
  const L = model.length;
  const loads: LoadSet = {
    points: m.points.map((p) => ({ x: p.t * L, P: p.P })),
    moments: m.couples.map((c) => ({ x: c.t * L, M: c.M })),
    lines: m.lines.filter((l) => Math.abs(l.a - l.b) > 1e-3).map((l) => ({ x0: Math.min(l.a, l.b) * L, x1: Math.max(l.a, l.b) * L, w0: l.w0, w1: l.w1 })),
  };
  const reactions = supportReactions(model, loads);
  const actions = memberActions(L, loads, reactions);
  const curve = deflectionCurve(actions, EI, model.supports.map((s) => ({ x: s.x, fixed: s.type === "fixed" })));
  return { model, L, loads, reactions, actions, curve };
}

const EI = 2e12;
const forceScale = (loads: LoadSet, L: number) =>
  Math.max(1, ...loads.points.map((p) => Math.abs(p.P)), ...loads.lines.map((l) => (Math.abs(l.w0) + Math.abs(l.w1)) * L), ...loads.moments.map((c) => Math.abs(c.M) / L));

describe("analyseMember on random continuous members (property-based)", () => {
  test("the reactions balance the loads: ΣF = 0 and ΣM about the left end = 0", () => {
    fc.assert(
      fc.property(member, (m) => {
        const { L, loads, reactions } = build(m);
        const scale = forceScale(loads, L);
        let force = 0;
        let moment = 0; // counter-clockwise about x = 0
        for (const r of reactions) {
          force += r.R;
          moment += r.R * r.x - r.M;
        }
        for (const p of loads.points) {
          force -= p.P;
          moment -= p.P * p.x;
        }
        for (const c of loads.moments) moment -= c.M;
        for (const w of loads.lines) {
          const len = w.x1 - w.x0;
          force -= (len * (w.w0 + w.w1)) / 2;
          moment -= (len * (w.w0 * (2 * w.x0 + w.x1) + w.w1 * (w.x0 + 2 * w.x1))) / 6;
        }
        expectClose(force, 0, { abs: 1e-9 * scale * 10 }, "ΣF");
        expectClose(moment, 0, { abs: 1e-9 * scale * L * 10 }, "ΣM");
      }),
      { numRuns: 300 },
    );
  });

  test("compatibility: zero deflection at every support and zero rotation at every fixed support", () => {
    fc.assert(
      fc.property(member, (m) => {
        const { model, curve, L, loads } = build(m);
        const vScale = Math.max((1e-3 * forceScale(loads, L) * L ** 3) / EI, ...Array.from({ length: 101 }, (_, i) => Math.abs(evaluate(curve, (i * L) / 100, "v"))));
        for (const s of model.supports) {
          expectClose(evaluate(curve, s.x, "v"), 0, { abs: 1e-6 * vScale }, `v at the support at ${s.x.toFixed(1)}`);
          if (s.type === "fixed") expectClose(evaluate(curve, s.x, "theta"), 0, { abs: (1e-6 * vScale) / L }, `θ at the fixed support at ${s.x.toFixed(1)}`);
        }
      }),
      { numRuns: 300 },
    );
  });

  test("an independent direct-integration model (Macaulay brackets, unknown reactions, compatibility at the supports) gives the same reactions and deflections", () => {
    fc.assert(
      fc.property(member, (m) => {
        const { model, loads, reactions, curve, L } = build(m);
        const other = macaulayModel(model.supports, loads, L);
        const scale = forceScale(loads, L);
        reactions.forEach((r, i) => {
          expectClose(r.R, other.reactions[i]!.R, { abs: 1e-6 * scale }, `R at ${r.x.toFixed(1)}`);
          expectClose(r.M, other.reactions[i]!.M, { abs: 1e-6 * scale * L }, `M at ${r.x.toFixed(1)}`);
        });
        const vScale = Math.max((1e-3 * scale * L ** 3) / EI, ...[0.1, 0.3, 0.5, 0.7, 0.9].map((t) => Math.abs(other.deflection(t * L)) / EI));
        for (const t of [0.13, 0.37, 0.61, 0.89]) expectClose(evaluate(curve, t * L, "v"), other.deflection(t * L) / EI, { abs: 1e-6 * vScale }, `v(${(t * L).toFixed(1)})`);
      }),
      { numRuns: 200 },
    );
  });

  test("Maxwell–Betti: δ at b from a unit force at a equals δ at a from a unit force at b, and θ at b from a unit force at a equals δ at a from a unit clockwise couple at b", () => {
    fc.assert(
      fc.property(member, unit, unit, (m, ta, tb) => {
        const model = beamModelOf(m.spans, m.ends);
        const L = model.length;
        const response = (loads: LoadSet) => {
          const actions = memberActions(L, loads, supportReactions(model, loads));
          return deflectionCurve(actions, EI, model.supports.map((s) => ({ x: s.x, fixed: s.type === "fixed" })));
        };
        const a = ta * L;
        const b = tb * L;
        const atA = response({ points: [{ x: a, P: 1 }], lines: [], moments: [] });
        const atB = response({ points: [{ x: b, P: 1 }], lines: [], moments: [] });
        const coupleAtB = response({ points: [], lines: [], moments: [{ x: b, M: 1 }] });
        const scale = L ** 3 / EI;
        expectClose(evaluate(atA, b, "v"), evaluate(atB, a, "v"), { abs: 1e-9 * scale }, "δ_ba = δ_ab");
        expectClose(evaluate(atA, b, "theta"), evaluate(coupleAtB, a, "v"), { abs: (1e-9 * scale) / L }, "θ_ba = δ_a(couple at b)");
      }),
      { numRuns: 200 },
    );
  });

  test("V is the derivative of M: the slope of M between neighbouring stations equals the mean of V over them (Simpson's rule, exact for the quadratic V)", () => {
    fc.assert(
      fc.property(member, (m) => {
        const { L, actions, curve, loads } = build(m);
        const stations = stationsFor(L, actions.breaks, 400);
        const { shear, moment } = valuesAtStations(actions, curve, stations);
        const scale = forceScale(loads, L);
        for (let i = 0; i + 1 < stations.length; i++) {
          const a = stations[i]!;
          const b = stations[i + 1]!;
          if (!(b.x > a.x) || a.side === "left") continue; // a jump between two stations at one x, or a piece ends at a
          const h = b.x - a.x;
          if (actions.breaks.some((k) => k > a.x && k < b.x)) continue;
          const mean = (shear[i]! + 4 * shearAt(actions, (a.x + b.x) / 2) + shear[i + 1]!) / 6;
          expectClose((moment[i + 1]! - moment[i]!) / h, mean, { abs: 1e-7 * scale * (L / h) }, `dM/dx on [${a.x.toFixed(1)}, ${b.x.toFixed(1)}]`);
        }
      }),
      { numRuns: 150 },
    );
  });
});

describe("live-load patterns on random continuous members (property-based)", () => {
  // Continuous spans, sometimes an overhang at either end, dead and live loads anywhere.
  const continuous = fc.record({
    spans: fc.array(fc.double({ min: 1000, max: 6000, noNaN: true }), { minLength: 2, maxLength: 5 }),
    left: fc.constantFrom<SupportCondition>("pinned", "fixed", "free"),
    right: fc.constantFrom<SupportCondition>("roller", "fixed", "free"),
    loads: fc.array(
      fc.oneof(
        fc.record({ kind: fc.constant("line" as const), a: unit, b: unit, w0: fc.integer({ min: -50, max: 150 }).map((w) => w / 10), w1: fc.integer({ min: -50, max: 150 }).map((w) => w / 10), live: fc.boolean() }),
        fc.record({ kind: fc.constant("point" as const), a: unit, P: fc.integer({ min: -5000, max: 20_000 }), live: fc.boolean() }),
      ),
      { minLength: 1, maxLength: 6 },
    ),
  });
  type Continuous = typeof continuous extends fc.Arbitrary<infer T> ? T : never;
  const jobLoads = (c: Continuous, L: number): Load[] =>
    c.loads.flatMap((l): Load[] => {
      const category = l.live ? "live" : "dead";
      if (l.kind === "point") return [{ type: "point", category, label: "", face: "top", P: l.P, at: l.a * L }];
      if (Math.abs(l.a - l.b) < 1e-3) return [];
      return [{ type: "linear", category, label: "", face: "top", wStart: l.w0, wEnd: l.w1, from: Math.min(l.a, l.b) * L, to: Math.max(l.a, l.b) * L }];
    });
  const factors = { dead: 1.2, live: 1.6 };

  test("the patterns chosen give the same envelope of V, M and the reactions as all 2ⁿ arrangements, and of deflection for the service cases", () => {
    fc.assert(
      fc.property(continuous, (c) => {
        const ends: SupportCondition[] = [c.left, ...c.spans.slice(1).map((): SupportCondition => "roller"), c.right];
        if (ends[0] === "free" && ends[ends.length - 1] === "free" && c.spans.length < 3) return;
        const model = beamModelOf(c.spans, ends);
        if (model.supports.length < 2 && !model.supports.some((s) => s.type === "fixed")) return;
        const loads = jobLoads(c, model.length);
        if (!loads.some((l) => (l.type === "point" ? l.P : l.type === "linear" ? Math.abs(l.wStart) + Math.abs(l.wEnd) : 1) !== 0)) return;
        const beam = coreBeam(c.spans, ends, loads);
        const combination = { id: "C", name: "1.2D + 1.6L", factors, duration: "medium" as const, categories: ["dead", "live"] };
        const chosen = analyseMember({ beam, combinations: [combination], selfWeight: 0, flexuralRigidity: EI, serviceLoads: true });
        const breaks = [...new Set(chosen.results.flatMap((r) => r.actions.breaks))];
        const stations = stationsFor(model.length, breaks, 300);
        const envelope = (entries: typeof chosen.results) => {
          const v = entries.map((e) => valuesAtStations(e.actions, e.curve, stations));
          return {
            vMax: stations.map((_, j) => Math.max(...v.map((s) => s.shear[j]!))),
            vMin: stations.map((_, j) => Math.min(...v.map((s) => s.shear[j]!))),
            mMax: stations.map((_, j) => Math.max(...v.map((s) => s.moment[j]!))),
            mMin: stations.map((_, j) => Math.min(...v.map((s) => s.moment[j]!))),
            dMax: stations.map((_, j) => Math.max(...v.map((s) => s.deflection[j]!))),
            dMin: stations.map((_, j) => Math.min(...v.map((s) => s.deflection[j]!))),
          };
        };
        // Brute force: every subset of the regions, each analysed as one unpatterned member.
        const regions = model.regions;
        const every: typeof chosen.results = [];
        let unloaded = false;
        const everyService: typeof chosen.results = [];
        for (let mask = 0; mask < 1 << regions.length; mask++) {
          const on = regions.filter((_, i) => mask & (1 << i));
          const clipped = loads.flatMap((l): Load[] => {
            if (l.category === "dead") return [l];
            if (l.type === "point") return on.some((r) => l.at >= r.x0 && (l.at < r.x1 || (r.x1 === model.length && l.at <= r.x1))) ? [l] : [];
            if (l.type !== "linear") return [];
            return on.flatMap((r): Load[] => {
              const a = Math.max(l.from!, r.x0);
              const b = Math.min(l.to!, r.x1);
              if (!(b > a)) return [];
              const at = (x: number) => l.wStart + ((l.wEnd - l.wStart) * (x - l.from!)) / (l.to! - l.from!);
              return [{ ...l, from: a, to: b, wStart: at(a), wEnd: at(b) }];
            });
          });
          const one = analyseMember({ beam: coreBeam(c.spans, ends, clipped, { patternedCategories: [] }), combinations: [combination], selfWeight: 0, flexuralRigidity: EI, serviceLoads: true });
          every.push(...one.results);
          everyService.push(...one.service!.total);
          // No load at all in this arrangement: no service case, and zero deflection.
          if (one.service!.total.length === 0) unloaded = true;
        }
        const a = envelope(chosen.results);
        const b = envelope(every);
        const aS = envelope(chosen.service!.total);
        const bS = envelope(everyService);
        if (unloaded) {
          bS.dMax = bS.dMax.map((d) => Math.max(d, 0));
          bS.dMin = bS.dMin.map((d) => Math.min(d, 0));
        }
        const scale = Math.max(1, ...b.vMax.map(Math.abs), ...b.vMin.map(Math.abs));
        const mScale = Math.max(1, ...b.mMax.map(Math.abs), ...b.mMin.map(Math.abs));
        const loadScale = loads.reduce((t, l) => t + (l.type === "point" ? Math.abs(l.P) : l.type === "linear" ? (Math.abs(l.wStart) + Math.abs(l.wEnd)) * model.length : 0), 0);
        const dScale = Math.max((1e-3 * loadScale * model.length ** 3) / EI, ...bS.dMax.map(Math.abs), ...bS.dMin.map(Math.abs));
        model.supports.forEach((s, k) => {
          const rScale = Math.max(1, ...every.map((e) => Math.abs(e.reactions[k]!.R)));
          for (const f of [Math.max, Math.min]) {
            expectClose(f(...chosen.results.map((e) => e.reactions[k]!.R)), f(...every.map((e) => e.reactions[k]!.R)), { abs: 1e-9 * rScale }, `reaction at ${s.x.toFixed(1)}`);
          }
        });
        stations.forEach((s, j) => {
          const where = `${s.x.toFixed(1)} (${s.side})`;
          // Sums of superposed cases against direct analyses: agreement to 1e-8 of the largest value (rounding only).
          expectClose(a.vMax[j]!, b.vMax[j]!, { abs: 1e-8 * scale }, `max V at ${where}`);
          expectClose(a.vMin[j]!, b.vMin[j]!, { abs: 1e-8 * scale }, `min V at ${where}`);
          expectClose(a.mMax[j]!, b.mMax[j]!, { abs: 1e-8 * mScale }, `max M at ${where}`);
          expectClose(a.mMin[j]!, b.mMin[j]!, { abs: 1e-8 * mScale }, `min M at ${where}`);
          expectClose(aS.dMax[j]!, bS.dMax[j]!, { abs: 1e-8 * dScale }, `max deflection at ${where}`);
          expectClose(aS.dMin[j]!, bS.dMin[j]!, { abs: 1e-8 * dScale }, `min deflection at ${where}`);
        });
      }),
      { numRuns: 40 },
    );
  });
});

/**
 * Reactions and EI·v(x) by direct integration, written apart from the stiffness method: M(x) from
 * the left end with Macaulay brackets in the unknown reactions, integrated twice with two unknown
 * constants; the equations are equilibrium beyond the right end (V = 0, M = 0), v = 0 at every
 * support and θ = 0 at every fixed one. Lengths in m inside, to keep the system well scaled.
 */
function macaulayModel(supports: { x: number; type: string }[], loads: LoadSet, lengthMm: number) {
  const k = 1000;
  const L = lengthMm / k;
  const mac = (x: number, a: number, n: number) => (x < a ? 0 : n === 0 ? 1 : (x - a) ** n);
  const fact = [1, 1, 2, 6, 24];
  // Gauss–Legendre, 5 points: exact for the degree-4 integrands of a linear load.
  const g = [
    [-0.906179845938664, 0.236926885056189],
    [-0.538469310105683, 0.478628670499366],
    [0, 0.568888888888889],
    [0.538469310105683, 0.478628670499366],
    [0.906179845938664, 0.236926885056189],
  ];
  /** The loads' part of M (n = 0), EI·θ (n = 1) and EI·v (n = 2) at x: −Σ P⟨x−a⟩^(n+1)/(n+1)! + Σ C⟨x−a⟩^n/n! − ∫ w⟨x−ξ⟩^(n+1)/(n+1)! dξ. */
  const loadPart = (x: number, n: number) => {
    let s = 0;
    for (const p of loads.points) s -= (p.P * mac(x, p.x / k, n + 1)) / fact[n + 1]!;
    for (const c of loads.moments) s += ((c.M / k) * mac(x, c.x / k, n)) / fact[n]!;
    for (const w of loads.lines) {
      const x0 = w.x0 / k;
      const x1 = Math.min(w.x1 / k, x);
      if (!(x1 > x0)) continue;
      const half = (x1 - x0) / 2;
      for (const [t, wt] of g) {
        const xi = x0 + half * (t! + 1);
        const intensity = (w.w0 + ((w.w1 - w.w0) * (xi * k - w.x0)) / (w.x1 - w.x0)) * k;
        s -= (wt! * half * intensity * (x - xi) ** (n + 1)) / fact[n + 1]!;
      }
    }
    return s;
  };
  const fixed = supports.filter((s) => s.type === "fixed");
  const nR = supports.length;
  const n = nR + fixed.length + 2;
  const rows: number[][] = [];
  const rhs: number[] = [];
  const beyond = L * (1 + 1e-9) + 1e-9;
  // V beyond the right end: ΣR − ΣP − ∫w = 0, the n = −1 form written out.
  rows.push([...supports.map(() => 1), ...fixed.map(() => 0), 0, 0]);
  rhs.push(loads.points.reduce((s, p) => s + p.P, 0) + loads.lines.reduce((s, w) => s + ((w.x1 - w.x0) * (w.w0 + w.w1)) / 2, 0));
  rows.push([...supports.map((s) => mac(beyond, s.x / k, 1)), ...fixed.map(() => 1), 0, 0]);
  rhs.push(-loadPart(beyond, 0));
  for (const s of supports) {
    const x = s.x / k;
    rows.push([...supports.map((r) => mac(x, r.x / k, 3) / 6), ...fixed.map((f) => mac(x, f.x / k, 2) / 2), 1, x]);
    rhs.push(-loadPart(x, 2));
  }
  for (const f of fixed) {
    const x = f.x / k;
    rows.push([...supports.map((r) => mac(x, r.x / k, 2) / 2), ...fixed.map((q) => mac(x, q.x / k, 1)), 0, 1]);
    rhs.push(-loadPart(x, 1));
  }
  const u = gauss(rows, rhs, n);
  const R = u.slice(0, nR);
  const Mf = u.slice(nR, nR + fixed.length);
  const [c0, c1] = u.slice(nR + fixed.length);
  return {
    reactions: supports.map((s, i) => ({ x: s.x, R: R[i]!, M: s.type === "fixed" ? Mf[fixed.indexOf(s)]! * k : 0 })),
    /** EI·v at x (mm), in N·mm³. */
    deflection: (xMm: number) => {
      const x = xMm / k;
      let s = c0! + c1! * x + loadPart(x, 2);
      supports.forEach((r, i) => (s += (R[i]! * mac(x, r.x / k, 3)) / 6));
      fixed.forEach((f, i) => (s += (Mf[i]! * mac(x, f.x / k, 2)) / 2));
      return s * k ** 3;
    },
  };
}

function gauss(A: number[][], b: number[], n: number): number[] {
  const M = A.map((row, i) => [...row, b[i]!]);
  for (let c = 0; c < n; c++) {
    let p = c;
    for (let r = c + 1; r < n; r++) if (Math.abs(M[r]![c]!) > Math.abs(M[p]![c]!)) p = r;
    [M[c], M[p]] = [M[p]!, M[c]!];
    for (let r = 0; r < n; r++) {
      if (r === c) continue;
      const f = M[r]![c]! / M[c]![c]!;
      for (let j = c; j <= n; j++) M[r]![j]! -= f * M[c]![j]!;
    }
  }
  return M.map((row, i) => row[n]! / row[i]!);
}

import { describe, expect, test } from "vitest";
import { beamModelOf } from "../../../core/beam/beam-model.js";
import { coupleEndForces, lineLoadEndForces, pointLoadEndForces } from "../../../core/beam/fixed-end-actions.js";
import { deflectionExtremes, evaluate, maxAbsShear, momentAt, momentExtremes, shearAt } from "../../../core/beam/member-actions.js";
import { supportReactions } from "../../../core/beam/support-reactions.js";
import { expectClose } from "../../expect-close.js";
import { analyse, asEntered, coreBeam } from "./beam-test-kit.js";

// Units N, mm: 1 kN/m = 1 N/mm, 1 kN = 1000 N, 1 kN·m = 1e6 N·mm.
// Closed forms: any structural-analysis text, e.g. AISC Manual Table 3-23 beam diagrams [M]; the
// numbers below are worked from those formulas [D] unless REFERENCES §4 is named.
const EI = 1e12;
const only = (beam: ReturnType<typeof analyse>) => beam.results[0]!;

describe("fixed-end actions of one element", () => {
  test("a UDL on a fixed-fixed element gives end moments wL²/12 and end shears wL/2 (closed form [D])", () => {
    const f = lineLoadEndForces(0, 6000, 10, 10, 6000);
    expectClose(f.F1, 30_000, { rel: 1e-12 });
    expectClose(f.M1, (10 * 6000 ** 2) / 12, { rel: 1e-12 });
    expectClose(f.M2, -(10 * 6000 ** 2) / 12, { rel: 1e-12 });
  });

  test("a triangular load rising to w gives wL²/30 and wL²/20 at the ends (closed form [D])", () => {
    const f = lineLoadEndForces(0, 6000, 0, 10, 6000);
    expectClose(f.M1, (10 * 6000 ** 2) / 30, { rel: 1e-12 });
    expectClose(f.M2, -(10 * 6000 ** 2) / 20, { rel: 1e-12 });
    expectClose(f.F1 + f.F2, 30_000, { rel: 1e-12 });
  });

  test("a central point load gives PL/8 at each end; a couple at midspan gives C/4 at each end and ±3C/(2L) shears (closed forms [D])", () => {
    const p = pointLoadEndForces(20_000, 3000, 6000);
    expectClose(p.M1, (20_000 * 6000) / 8, { rel: 1e-12 });
    expectClose(p.M2, -(20_000 * 6000) / 8, { rel: 1e-12 });
    const c = coupleEndForces(1e6, 3000, 6000);
    expectClose(c.M1, -1e6 / 4, { rel: 1e-12 });
    expectClose(c.M2, -1e6 / 4, { rel: 1e-12 });
    expectClose(c.F2, (3 * 1e6) / (2 * 6000), { rel: 1e-12 });
  });
});

describe("analyseMember against closed forms", () => {
  test("simply supported UDL w = 10 kN/m on 6 m: R = 30 kN, V(L/4) = 15 kN, M_max = 45 kN·m, M(L/4) = 33.75 kN·m (REFERENCES §4.1 [D])", () => {
    const r = only(analyse(coreBeam([6000], undefined, [{ type: "uniform", category: "dead", w: 10 }])));
    expectClose(r.reactions[0]!.R, 30_000, { rel: 1e-12 });
    expectClose(r.reactions[1]!.R, 30_000, { rel: 1e-12 });
    expectClose(shearAt(r.actions, 1500), 15_000, { rel: 1e-12 });
    expectClose(momentExtremes(r.actions).max.value, 45e6, { rel: 1e-12 });
    expectClose(momentAt(r.actions, 1500), 33.75e6, { rel: 1e-12 });
  });

  test("simply supported central point load P = 20 kN on 6 m: R = 10 kN, V = ±10 kN, M_max = 30 kN·m, M(L/4) = 15 kN·m (REFERENCES §4.2 [D])", () => {
    const r = only(analyse(coreBeam([6000], undefined, [{ type: "point", category: "live", P: 20_000, at: 3000 }])));
    expectClose(r.reactions[0]!.R, 10_000, { rel: 1e-12 });
    expectClose(shearAt(r.actions, 3000, "left"), 10_000, { rel: 1e-12 });
    expectClose(shearAt(r.actions, 3000, "right"), -10_000, { rel: 1e-12 });
    expectClose(momentAt(r.actions, 3000), 30e6, { rel: 1e-12 });
    expectClose(momentAt(r.actions, 1500), 15e6, { rel: 1e-12 });
  });

  test("cantilever of 3 m fixed at the left: UDL 5 kN/m gives V = 15 kN, M = −22.5 kN·m at the root; a 10 kN tip load gives 10 kN and −30 kN·m (REFERENCES §4.3 [D])", () => {
    const udl = only(analyse(coreBeam([3000], ["fixed", "free"], [{ type: "uniform", category: "dead", w: 5 }])));
    expectClose(shearAt(udl.actions, 0), 15_000, { rel: 1e-12 });
    expectClose(momentAt(udl.actions, 0), -22.5e6, { rel: 1e-12 });
    expectClose(-evaluate(udl.curve, 3000, "v"), (5 * 3000 ** 4) / (8 * EI), { rel: 1e-9 }, "tip deflection wL⁴/(8EI) [D]");
    const tip = only(analyse(coreBeam([3000], ["fixed", "free"], [{ type: "point", category: "dead", P: 10_000, at: 3000 }])));
    expectClose(shearAt(tip.actions, 0), 10_000, { rel: 1e-12 });
    expectClose(momentAt(tip.actions, 0), -30e6, { rel: 1e-12 });
    expectClose(-evaluate(tip.curve, 3000, "v"), (10_000 * 3000 ** 3) / (3 * EI), { rel: 1e-9 }, "tip deflection PL³/(3EI) [D]");
  });

  test("a cantilever fixed at the right end mirrors the one fixed at the left", () => {
    const r = only(analyse(coreBeam([3000], ["free", "fixed"], [{ type: "point", category: "dead", P: 10_000, at: 0 }])));
    expectClose(r.reactions[0]!.R, 10_000, { rel: 1e-12 });
    expectClose(momentAt(r.actions, 3000, "left"), -30e6, { rel: 1e-12 });
    expectClose(-evaluate(r.curve, 0, "v"), (10_000 * 3000 ** 3) / (3 * EI), { rel: 1e-9 });
  });

  test("two equal spans of 5 m, UDL 12 kN/m: reactions 22.5/75/22.5 kN, V = 37.5 kN each side of the middle support, M = −37.5 kN·m over it, +21.094 kN·m at 1.875 m, inflection at 3.75 m (REFERENCES §4.5 [D])", () => {
    const r = only(analyse(coreBeam([5000, 5000], undefined, [{ type: "uniform", category: "dead", w: 12 }])));
    expectClose(r.reactions[0]!.R, 22_500, { rel: 1e-9 });
    expectClose(r.reactions[1]!.R, 75_000, { rel: 1e-9 });
    expectClose(r.reactions[2]!.R, 22_500, { rel: 1e-9 });
    expectClose(shearAt(r.actions, 5000, "left"), -37_500, { rel: 1e-9 });
    expectClose(shearAt(r.actions, 5000, "right"), 37_500, { rel: 1e-9 });
    expectClose(shearAt(r.actions, 0), 22_500, { rel: 1e-9 });
    expectClose(momentAt(r.actions, 5000), -37.5e6, { rel: 1e-9 });
    const { max } = momentExtremes(r.actions, 0, 5000);
    expectClose(max.value, 21.09375e6, { rel: 1e-9 });
    expectClose(max.x, 1875, { rel: 1e-9 });
    expectClose(momentAt(r.actions, 3750), 0, { abs: 1e-3 });
  });

  test("propped cantilever (fixed at A, roller at B), UDL: R_A = 5wL/8, R_B = 3wL/8, M_A = −wL²/8, +9wL²/128 at 3L/8 from B, δ_max = 0.005416·wL⁴/EI at 0.5785L from A (closed form, e.g. AISC Table 3-23 case 12 [M]; numbers [D])", () => {
    const w = 10;
    const L = 6000;
    const r = only(analyse(coreBeam([L], ["fixed", "roller"], [{ type: "uniform", category: "dead", w }])));
    expectClose(r.reactions[0]!.R, (5 * w * L) / 8, { rel: 1e-9 });
    expectClose(r.reactions[1]!.R, (3 * w * L) / 8, { rel: 1e-9 });
    expectClose(momentAt(r.actions, 0), -(w * L * L) / 8, { rel: 1e-9 });
    const { max } = momentExtremes(r.actions);
    expectClose(max.value, (9 * w * L * L) / 128, { rel: 1e-9 });
    expectClose(max.x, (5 * L) / 8, { rel: 1e-9 });
    // v(x) = w·x²(3L² − 5Lx + 2x²)/(48EI) from the fixed end; its maximum at ξ = (15 − √33)/16.
    const xi = (15 - Math.sqrt(33)) / 16;
    const down = deflectionExtremes(r.curve).down;
    expectClose(down.value, (w * L ** 4 * xi * xi * (3 - 5 * xi + 2 * xi * xi)) / (48 * EI), { rel: 1e-9 });
    expectClose(down.value, 0.0054161 * w * L ** 4 / EI, { rel: 1e-4 });
    expectClose(down.x, xi * L, { rel: 1e-6 });
  });

  test("fixed-fixed, UDL: −wL²/12 at the ends, +wL²/24 at midspan, δ = wL⁴/(384EI); central load: ∓PL/8, δ = PL³/(192EI) (closed forms [D])", () => {
    const L = 6000;
    const udl = only(analyse(coreBeam([L], ["fixed", "fixed"], [{ type: "uniform", category: "dead", w: 10 }])));
    expectClose(momentAt(udl.actions, 0), -(10 * L * L) / 12, { rel: 1e-9 });
    expectClose(momentAt(udl.actions, L, "left"), -(10 * L * L) / 12, { rel: 1e-9 });
    expectClose(momentAt(udl.actions, L / 2), (10 * L * L) / 24, { rel: 1e-9 });
    expectClose(-evaluate(udl.curve, L / 2, "v"), (10 * L ** 4) / (384 * EI), { rel: 1e-9 });
    const p = only(analyse(coreBeam([L], ["fixed", "fixed"], [{ type: "point", category: "dead", P: 20_000, at: L / 2 }])));
    expectClose(momentAt(p.actions, 0), -(20_000 * L) / 8, { rel: 1e-9 });
    expectClose(momentAt(p.actions, L / 2), (20_000 * L) / 8, { rel: 1e-9 });
    expectClose(-evaluate(p.curve, L / 2, "v"), (20_000 * L ** 3) / (192 * EI), { rel: 1e-9 });
  });

  test("three equal spans, UDL on all: reactions 0.4/1.1/1.1/0.4 wL, −0.1wL² over the inner supports, +0.08wL² at 0.4L, +0.025wL² mid centre span, V 0.6wL and 0.5wL at the inner supports (three-moment equation [D]; tabulated coefficients e.g. AISC Table 3-23 [M])", () => {
    const w = 10;
    const L = 4000;
    const r = only(analyse(coreBeam([L, L, L], undefined, [{ type: "uniform", category: "dead", w }])));
    [0.4, 1.1, 1.1, 0.4].forEach((k, i) => expectClose(r.reactions[i]!.R, k * w * L, { rel: 1e-9 }, `R${i}`));
    expectClose(momentAt(r.actions, L), -0.1 * w * L * L, { rel: 1e-9 });
    expectClose(momentAt(r.actions, 2 * L), -0.1 * w * L * L, { rel: 1e-9 });
    const end = momentExtremes(r.actions, 0, L).max;
    expectClose(end.value, 0.08 * w * L * L, { rel: 1e-9 });
    expectClose(end.x, 0.4 * L, { rel: 1e-9 });
    expectClose(momentAt(r.actions, 1.5 * L), 0.025 * w * L * L, { rel: 1e-9 });
    expectClose(shearAt(r.actions, L, "left"), -0.6 * w * L, { rel: 1e-9 });
    expectClose(shearAt(r.actions, L, "right"), 0.5 * w * L, { rel: 1e-9 });
  });

  test("span with an overhang, tip load P: R_A = −Pa/L, R_B = P(1 + a/L), M_B = −Pa, tip deflection Pa²(L + a)/(3EI) (closed form, e.g. AISC Table 3-23 case 26 [M]; numbers [D])", () => {
    const L = 4000;
    const a = 1200;
    const P = 5000;
    const r = only(analyse(coreBeam([L, a], ["pinned", "roller", "free"], [{ type: "point", category: "dead", P, at: L + a }])));
    expectClose(r.reactions[0]!.R, (-P * a) / L, { rel: 1e-9 });
    expectClose(r.reactions[1]!.R, P * (1 + a / L), { rel: 1e-9 });
    expectClose(momentAt(r.actions, L), -P * a, { rel: 1e-9 });
    expectClose(-evaluate(r.curve, L + a, "v"), (P * a * a * (L + a)) / (3 * EI), { rel: 1e-9 });
  });

  test("a clockwise couple C at the middle of a simple span: R = ∓C/L and the moment jumps by C (statics [D])", () => {
    const r = only(analyse(coreBeam([6000], undefined, [{ type: "moment", category: "dead", M: 12e6, at: 3000 }])));
    expectClose(r.reactions[0]!.R, -12e6 / 6000, { rel: 1e-12 });
    expectClose(momentAt(r.actions, 3000, "left"), -6e6, { rel: 1e-9 });
    expectClose(momentAt(r.actions, 3000, "right"), 6e6, { rel: 1e-9 });
  });

  test("a triangular load rising to w over a simple span: R = wL/6 and wL/3, M_max = wL²/(9√3) at L/√3 (closed form, e.g. AISC Table 3-23 case 2 [M]; numbers [D])", () => {
    const w = 9;
    const L = 6000;
    const r = only(analyse(coreBeam([L], undefined, [{ type: "linear", category: "dead", wStart: 0, wEnd: w }])));
    expectClose(r.reactions[0]!.R, (w * L) / 6, { rel: 1e-12 });
    expectClose(r.reactions[1]!.R, (w * L) / 3, { rel: 1e-12 });
    const { max } = momentExtremes(r.actions);
    expectClose(max.value, (w * L * L) / (9 * Math.sqrt(3)), { rel: 1e-9 });
    expectClose(max.x, L / Math.sqrt(3), { rel: 1e-9 });
  });

  test("an interior free end is only a node: two segments between two pins behave as one simple span", () => {
    const r = only(analyse(coreBeam([2000, 4000], ["pinned", "free", "roller"], [{ type: "uniform", category: "dead", w: 10 }])));
    expectClose(r.reactions[0]!.R, 30_000, { rel: 1e-9 });
    expectClose(momentExtremes(r.actions).max.value, 45e6, { rel: 1e-9 });
  });
});

describe("live-load patterns against closed forms", () => {
  const live = (spans: number[], w: number) => analyse(coreBeam(spans, undefined, [{ type: "uniform", category: "live", w }]), [asEntered(["live"])]);

  test("two spans, live w on either or both: +49/512·wL² with one span loaded, −wL²/8 over the support with both, uplift wL/16 at the far end (three-moment equation [D])", () => {
    const w = 10;
    const L = 5000;
    const beam = live([L, L], w);
    const sagging = Math.max(...beam.results.map((r) => momentExtremes(r.actions).max.value));
    const hogging = Math.min(...beam.results.map((r) => momentExtremes(r.actions).min.value));
    expectClose(sagging, (49 / 512) * w * L * L, { rel: 1e-9 });
    expectClose(hogging, -(w * L * L) / 8, { rel: 1e-9 });
    const uplift = Math.min(...beam.results.map((r) => r.reactions[2]!.R));
    expectClose(uplift, -(w * L) / 16, { rel: 1e-9 });
    expect(beam.results.map((r) => r.combination.id)).toContain("U/P1-2");
    expect(beam.results.find((r) => r.combination.id === "U/P1")!.combination).toMatchObject({ base: "U", pattern: [1], name: "as entered, live on span 1" });
  });

  test("three spans: 0.10125wL² in an end span (spans 1, 3 loaded), 0.075wL² mid centre span (centre only), −7/60·wL² and V = 37/60·wL at an inner support (spans 1, 2) (three-moment equation [D])", () => {
    const w = 10;
    const L = 4000;
    const beam = live([L, L, L], w);
    const maxOver = (a: number, b: number) => Math.max(...beam.results.map((r) => momentExtremes(r.actions, a, b).max.value));
    expectClose(maxOver(0, L), 0.10125 * w * L * L, { rel: 1e-9 });
    expectClose(maxOver(L, 2 * L), 0.075 * w * L * L, { rel: 1e-9 });
    expectClose(Math.min(...beam.results.map((r) => momentAt(r.actions, L))), (-7 / 60) * w * L * L, { rel: 1e-9 });
    expectClose(Math.max(...beam.results.map((r) => maxAbsShear(r.actions, L, L).value)), (37 / 60) * w * L, { rel: 1e-9 });
  });

  test("a single simple span is never patterned", () => {
    const beam = live([5000], 10);
    expect(beam.results.map((r) => r.combination.id)).toEqual(["U"]);
    expect(beam.patterned).toEqual([]);
  });

  test("an overhang is a region of its own: live on the overhang alone lifts the far end of the back span", () => {
    const beam = analyse(coreBeam([4000, 1500], ["pinned", "roller", "free"], [{ type: "uniform", category: "live", w: 10 }]), [asEntered(["live"])]);
    expect(beam.regions.map((r) => r.label)).toEqual(["span 1", "span 2 (right overhang)"]);
    const onOverhang = beam.results.find((r) => r.combination.id === "U/P2")!;
    // R_A = −w·a²/(2L) for a load w on an overhang a of a span L (statics [D]).
    expectClose(onOverhang.reactions[0]!.R, -(10 * 1500 ** 2) / (2 * 4000), { rel: 1e-9 });
  });
});

describe("supportReactions", () => {
  test("gives the fixed-end moment of a fixed support as member-actions' clockwise moment", () => {
    const model = beamModelOf([3000], ["fixed", "free"]);
    const [root] = supportReactions(model, { points: [{ x: 3000, P: 10_000 }], lines: [], moments: [] });
    expectClose(root!.R, 10_000, { rel: 1e-12 });
    expectClose(root!.M, -30e6, { rel: 1e-12 });
  });
});

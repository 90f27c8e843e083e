import fc from "fast-check";
import { afterAll, describe, expect, test } from "vitest";
import { prepareJob } from "../../../core/check-job.js";
import { designMember } from "../../../core/design-member.js";
import type { JobInput } from "../../../core/schema/job.js";
import { expectClose } from "../../expect-close.js";

// Flitch beams whose plate stops short of the member's ends, through designMember. Shares by E·I [D]: plies with one
// curvature carry M_j = E_j I_j κ, so share_j = E_j I_j / Σ E I (Gere & Goodno, Mechanics of Materials, ch. 6); where a
// ply stops, its shear s_j·V there (its end reaction) passes back to the plies that continue [D]. Closed forms below are
// the test's own; nothing is taken from core for an expected value.

const run = (job: JobInput) => {
  const p = prepareJob(job);
  if (!p.ok) throw new Error(JSON.stringify(p.issues));
  return designMember(p.core);
};

interface Flitch {
  t: number;
  d: number;
  Et: number;
  tp: number;
  dp: number;
  Ep: number;
  Ef: number;
  span: number;
  /** The plate's extent, m; timber packing pieces of the plate's size fill the rest. */
  pa: number;
  pb: number;
  w: number;
  densities?: { timber: number; steel: number };
  loads?: JobInput["beam"]["loads"];
}

/** Timber, plate (packing beyond its ends), timber; bolts through the plate named as one joint in double shear, rated R = 5000 N. */
function flitch(g: Flitch): JobInput {
  const packing = (id: string, from: number, to: number) => ({ id, material: "F", shape: { type: "rectangle" as const, b: g.tp, h: g.dp }, place: { on: "a", side: "right" as const }, extent: { from, to } });
  return {
    format: "stitchplan-job",
    version: 1,
    units: "si",
    basis: "allowable",
    project: { name: "flitch ends" },
    member: { mark: "FE" },
    materials: [
      { id: "T", name: "timber", E: g.Et, density: g.densities?.timber ?? 0 },
      { id: "F", name: "packing", E: g.Ef, density: g.densities?.timber ?? 0 },
      { id: "S", name: "steel", family: "steel", E: g.Ep, density: g.densities?.steel ?? 0 },
    ],
    parts: [
      { id: "a", material: "T", shape: { type: "rectangle", b: g.t, h: g.d }, x: 0, y: 0 },
      { id: "plate", material: "S", shape: { type: "rectangle", b: g.tp, h: g.dp }, place: { on: "a", side: "right" }, extent: { from: g.pa, to: g.pb } },
      packing("f1", 0, g.pa),
      packing("f2", g.pb, g.span),
      { id: "b", material: "T", shape: { type: "rectangle", b: g.t, h: g.d }, place: { on: "plate", side: "right" } },
    ],
    connectors: [{ id: "R", kind: "rated", label: "rated (invented)", resistance: 5000, minSpacing: 50, maxSpacing: 600, endDistance: 50 }],
    fastening: { default: { connector: "R", rows: 1 }, joints: [{ held: ["plate"], connector: "R", rows: 1 }] },
    beam: { spans: [g.span], loads: g.loads ?? [{ type: "uniform", category: "dead", w: g.w }], selfWeight: g.densities !== undefined },
    spacing: { module: 5, minZoneLength: 200, maxZonesPerSpan: 5, symmetric: false },
  };
}

const base: Flitch = { t: 38, d: 286, Et: 11_000, tp: 12, dp: 279, Ep: 200_000, Ef: 11_000, span: 4, pa: 0.5, pb: 3.5, w: 5 };

describe("a plate shorter than the member: its end reaction and end moment go back through the bolts within d/2 of its ends", () => {
  test("2 × 38 × 286 timber, 12 × 279 plate over 0.5–3.5 m of a 4 m span, 5 N/mm on top: along the plate each line passes s_p/2·q; at its ends s_p·V/2 over d/2 and the couple s_p·M/2 at the bolt group's centre [D]", () => {
    const result = run(flitch(base));
    const EIt = 11_000 * ((38 * 286 ** 3) / 12);
    const EIp = 200_000 * ((12 * 279 ** 3) / 12);
    const sp = EIp / (EIp + 2 * EIt);
    expectClose(sp, 0.72716, { rel: 1e-4 }, "s_p = 4.3435e12 / (4.3435e12 + 2 · 8.1488e11) [D]");
    const s = result.schedules.find((x) => x.joint === "plate")!;
    expect(s.lineCount).toBe(2);
    const stations = result.beam.stations;
    const flowAt = (x: number) => s.shearFlow[stations.findIndex((y) => Math.abs(y - x) < 1e-6)]!;
    // Midspan: each line passes s_p/2 · 5 N/mm.
    expectClose(flowAt(2000), (sp / 2) * 5, { rel: 1e-9 }, "per-line transfer at midspan, N/mm");
    // At the plate's left end V = R − q·0.5 m = 10 000 − 2500 = 7500 N, handed back evenly over h = d/2 = 143 mm; the plate's
    // share of the moment at the bolt group's centre, x_c = 571.5 mm: M = 10 000 · 571.5 − 5 · 571.5²/2 = 4 898 469 N·mm,
    // taken by the elastic method, e = 12·C·|x − x_c|/h³, at most 6·C/h² at the group's ends [D]. Half of each on each line.
    const V = 5 * 2000 - 5 * 500;
    const h = 143;
    const M = 10_000 * 571.5 - (5 * 571.5 ** 2) / 2;
    expectClose(M, 4_898_469.4, { rel: 1e-8 }, "M(x_c)");
    expectClose(Math.max(...s.shearFlow), (sp / 2) * (5 + V / h + (6 * M) / h ** 2), { rel: 1e-9 }, "per-line transfer at the plate's end, N/mm");
    // The rows within d/2 of the left end carry at least the force s_p·V/2 = 2727 N on each line (5000 N per row and line).
    const near = s.positions.filter((x) => x >= 500 - 1e-6 && x <= 643 + 1e-6).length;
    expect(near * 5000).toBeGreaterThanOrEqual(((sp * V) / 2) * (1 - 1e-9));
    expect(result.multiPly!.stretches!.map((x) => x.plies.map((p) => p.part))).toEqual([["a", "f1", "b"], ["a", "plate", "b"], ["a", "f2", "b"]]);
    expectClose(result.multiPly!.stretches![1]!.plies[1]!.share, sp, { rel: 1e-12 });
    expect(result.terminations).toEqual([]);
    expect(result.assumptions.some((a) => a.includes("a ply that stops hands its share of the shear"))).toBe(true);
    expect(result.assumptions.some((a) => a.includes("the couple by the elastic method for a bolt group"))).toBe(true);
  });

  test("property (fast-check, fixed seed): over the plate the bolts pass in its share of the load, s_p·∫q, and hand back its end reactions, s_p·(|V(a)| + |V(b)|), and its end couples, 3·s_p·|M(x_c)|/h at each end, self-weight included [D]", () => {
    fc.assert(
      fc.property(
        fc.record({
          t: fc.double({ min: 30, max: 80, noNaN: true }),
          d: fc.double({ min: 180, max: 400, noNaN: true }),
          Et: fc.double({ min: 7000, max: 14_000, noNaN: true }),
          Ef: fc.double({ min: 7000, max: 14_000, noNaN: true }),
          tp: fc.double({ min: 6, max: 25, noNaN: true }),
          ratio: fc.double({ min: 0.5, max: 0.97, noNaN: true }),
          Ep: fc.double({ min: 190_000, max: 210_000, noNaN: true }),
          w: fc.double({ min: 0.5, max: 20, noNaN: true }),
          // On a 0.25 m grid: the plate's ends and a partial load's ends on stations, so that the integral is exact.
          quarters: fc.integer({ min: 10, max: 24 }),
          left: fc.integer({ min: 1, max: 4 }),
          right: fc.integer({ min: 1, max: 4 }),
          partial: fc.option(fc.record({ from: fc.integer({ min: 0, max: 8 }), len: fc.integer({ min: 1, max: 8 }), w: fc.double({ min: 0.5, max: 10, noNaN: true }) }), { nil: undefined }),
          densities: fc.option(fc.record({ timber: fc.double({ min: 300, max: 700, noNaN: true }), steel: fc.double({ min: 7000, max: 8000, noNaN: true }) }), { nil: undefined }),
        }),
        (g) => {
          const span = g.quarters / 4;
          const [pa, pb] = [g.left / 4, span - g.right / 4];
          const dp = g.d * g.ratio;
          const loads: JobInput["beam"]["loads"] = [{ type: "uniform", category: "dead", w: g.w }];
          const [qa, qb] = g.partial ? [g.partial.from / 4, Math.min(span, (g.partial.from + g.partial.len) / 4)] : [0, 0];
          if (g.partial && qb > qa) loads.push({ type: "uniform", category: "dead", w: g.partial.w, from: qa, to: qb });
          const result = run(flitch({ ...g, dp, span, pa, pb, densities: g.densities, loads }));
          // Closed form, mm and N: q(x) on top, self-weight ρ g A per ply; shares by E·I over the plate's stretch.
          const L = span * 1000;
          const [A, B, QA, QB] = [pa * 1000, pb * 1000, qa * 1000, qb * 1000];
          const pw = g.partial && qb > qa ? g.partial.w : 0;
          const g0 = 9.80665e-9;
          const wt = (g.densities?.timber ?? 0) * g0 * g.t * g.d;
          const wf = (g.densities?.timber ?? 0) * g0 * g.tp * dp;
          const wp = (g.densities?.steel ?? 0) * g0 * g.tp * dp;
          const EIt = g.Et * ((g.t * g.d ** 3) / 12);
          const EIp = g.Ep * ((g.tp * dp ** 3) / 12);
          const sp = EIp / (EIp + 2 * EIt);
          // ∫ of the load on top over [x0, x1], and the member's weight per length at x (packing outside the plate).
          const topOver = (x0: number, x1: number) => g.w * (x1 - x0) + pw * Math.max(0, Math.min(x1, QB) - Math.max(x0, QA));
          const weightOver = (x0: number, x1: number) => 2 * wt * (x1 - x0) + wp * Math.max(0, Math.min(x1, B) - Math.max(x0, A)) + wf * ((x1 - x0) - Math.max(0, Math.min(x1, B) - Math.max(x0, A)));
          const total = topOver(0, L) + weightOver(0, L);
          // Simple span: R_left from moments about the right support (each load's resultant at its centroid).
          const moment = g.w * L * (L / 2) + pw * (QB - QA) * ((QA + QB) / 2) + 2 * wt * L * (L / 2) + wp * (B - A) * ((A + B) / 2) + wf * (A * (A / 2) + (L - B) * ((L + B) / 2));
          const Rright = moment / L;
          const Rleft = total - Rright;
          const V = (x: number) => Rleft - topOver(0, x) - weightOver(0, x);
          // M(x) = R·x − Σ (load left of x) × (its lever to x): each uniform piece by its resultant.
          const lever = (w: number, s0: number, s1: number, x: number) => { const e = Math.min(s1, x); return e > s0 ? w * (e - s0) * (x - (s0 + e) / 2) : 0; };
          const M = (x: number) => Rleft * x - lever(g.w, 0, L, x) - lever(pw, QA, QB, x) - lever(2 * wt, 0, L, x) - lever(wp, A, B, x) - lever(wf, 0, A, x) - lever(wf, B, L, x);
          // The brief's invariant, signed: what the plate takes in over its length, s_p·∫(q + w) − ∫w_p, plus its own weight,
          // equals what its ends hand back, s_p·(V(a) − V(b)) [D, statics].
          const inbound = sp * (topOver(A, B) + weightOver(A, B)) - wp * (B - A);
          expectClose(inbound + wp * (B - A), sp * (V(A) - V(B)), { rel: 1e-9 }, "plate's share in = its end reactions out");
          // A bolt through timber, plate, timber is designed for each load's transfer on its own, with no relief between them:
          // the load on top s_p·∫q, the self-weight |s_p·w − w_p| over the plate, and each end's reaction s_p·|V|.
          // The couple e = 12·C·|x − x_c|/h³ on each of the two lines, C = s_p·M(x_c)/2, integrates to 3·C/h per line [D].
          const h = g.d / 2;
          const couples = (3 * sp * (Math.abs(M(A + h / 2)) + Math.abs(M(B - h / 2)))) / h;
          const expected = sp * topOver(A, B) + Math.abs(sp * (2 * wt + wp) - wp) * (B - A) + sp * (Math.abs(V(A)) + Math.abs(V(B))) + couples;
          const s = result.schedules.find((x) => x.joint === "plate")!;
          expect(result.beam.combinations).toHaveLength(1);
          expectClose(s.efficiency.demandIntegral * 5000, expected, { rel: 1e-6 }, "force passed across the plate's interfaces");
        },
      ),
      { numRuns: 25 },
    );
  });
});

describe("a hanger on one timber ply of a flitch beam", () => {
  test("P = 10 kN hung on the left ply at midspan passes on by E·I: across the plate's lines the most either passes, (1 − s_a)·P, over d = 286 mm [D, rule CP]; the result names the ply it was applied on", () => {
    const result = run(flitch({ ...base, pa: 0.5, pb: 3.5, loads: [{ type: "point", category: "dead", P: 10, at: 2, face: "left" }] }));
    const EIt = 11_000 * ((38 * 286 ** 3) / 12);
    const EIp = 200_000 * ((12 * 279 ** 3) / 12);
    const sa = EIt / (EIp + 2 * EIt);
    expectClose(sa, 0.13642, { rel: 1e-4 }, "s_a = 8.1488e11 / 5.9733e12 [D]");
    // T₁ = P − s_a·P (ply a keeps its share), T₂ = T₁ − s_p·P = s_b·P; a bolt through all three takes the larger on each line.
    const s = result.schedules.find((x) => x.joint === "plate")!;
    const at = result.beam.stations.findIndex((x) => Math.abs(x - 2000) < 1e-6);
    expectClose(s.shearFlow[at]!, ((1 - sa) * 10_000) / 286, { rel: 1e-9 }, "per-line transfer under the hanger, N/mm");
    expect(result.multiPly!.loads).toEqual([{ load: 0, face: "left", plies: ["a"] }]);
  });

  test("a load on top of a flitch whose plate is shallower bears on the timber plies only, and the result says so", () => {
    const result = run(flitch(base));
    expect(result.multiPly!.loads).toEqual([{ load: 0, face: "top", plies: ["a", "b"] }]);
  });
});

describe("bearing of the plies at the supports", () => {
  /** Two 2x12 DF-L No. 1 plies (F_c⊥ = 625 psi, NDS Supplement Table 4A [M]) with a 1/2 × 11 in plate centred between them. */
  function flitchUs(spans: number[], extra: { bearingLength?: number; compressionPerp?: number | null } = {}): JobInput {
    return {
      format: "stitchplan-job",
      version: 1,
      units: "us",
      basis: "allowable",
      project: { name: "Flitch bearing" },
      member: { mark: "FB" },
      materials: [
        { id: "DF", name: "DF-L No. 1", family: "sawn-timber", E: 1_700_000, density: 0, specificGravity: 0.5, strength: { bending: 1000, shear: 180, ...(extra.compressionPerp === null ? {} : { compressionPerp: extra.compressionPerp ?? 625 }) } },
        { id: "PL", name: "A36 plate", family: "steel", E: 29_000_000, density: 0, yieldStrength: 36_000, tensileStrength: 58_000, strength: { bending: 21_600, shear: 12_900 } },
      ],
      parts: [
        { id: "left", material: "DF", shape: { type: "lumber", nominal: "2x12", orientation: "edge" }, x: 0, y: 0 },
        { id: "plate", material: "PL", shape: { type: "rectangle", b: 0.5, h: 11 }, place: { on: "left", side: "right" } },
        { id: "right", material: "DF", shape: { type: "lumber", nominal: "2x12", orientation: "edge" }, place: { on: "plate", side: "right" } },
      ],
      connectors: [{ id: "B", kind: "timber-bolt", standard: "NDS-2018", shear: "double", size: "3/4" }],
      fastening: { default: { connector: "B", rows: 1 }, joints: [{ held: ["plate"], connector: "B", rows: 1 }] },
      beam: { spans, loads: [{ type: "uniform", category: "dead", w: 600 }], selfWeight: false, ...(extra.bearingLength ? { bearingLength: extra.bearingLength } : {}) },
      combinations: { set: "unfactored" },
      spacing: { module: 1, minZoneLength: 24, maxZonesPerSpan: 3, symmetric: true },
    };
  }
  const psi = 0.0068947572932; // MPa per psi

  test("14 ft span, 600 plf: R = 4200 lb; the plate does not reach the bottom, so each 2x12 bears 2100 lb on 1.5 × 3 in (the default ℓ_b): f_c⊥ = 466.7 psi ≤ 625 psi, C_b = 1.0 at the member's end (NDS-2018 §3.10.2, §3.10.4 [M]) [D]", () => {
    const result = run(flitchUs([14]));
    const c = result.checks.find((x) => x.id === "bearing-ply-left")!;
    expectClose(c.demand, (2100 / (1.5 * 3)) * psi, { rel: 1e-9 }, "f_c⊥, MPa");
    expectClose(c.capacity, 625 * psi, { rel: 1e-9 }, "F′_c⊥ = F_c⊥, MPa");
    expect(c.reference).toContain("§3.10.2");
    expect(result.checks.some((x) => x.id === "bearing-ply-plate")).toBe(false);
    expect(result.assumptions.some((a) => a.startsWith("Plate plate does not reach the bottom") && a.includes("through the connectors"))).toBe(true);
    expect(result.assumptions.some((a) => a.includes("bears over 3 in") && a.includes("none given"))).toBe(true);
    expect(result.notChecked.some((n) => n.startsWith("Bearing at the supports"))).toBe(false);
    expect(result.notChecked.some((n) => n.includes("bearing of each ply at the supports"))).toBe(false);
  });

  test("a 1.5 in bearing doubles the stress to 933 psi > 625 psi: the check fails [D]", () => {
    const result = run(flitchUs([14], { bearingLength: 1.5 }));
    const c = result.checks.find((x) => x.id === "bearing-ply-right")!;
    expectClose(c.utilisation, 2100 / (1.5 * 1.5) / 625, { rel: 1e-9 }, "utilisation");
    expect(c.passes).toBe(false);
    expect(result.status.passes).toBe(false);
  });

  test("two 7 ft spans: the middle support takes 1.25·w·L = 5250 lb [D]; each ply 2625 lb on 1.5 × 3 in = 583.3 psi against 625 · C_b, C_b = (3 + 0.375)/3 = 1.125 (NDS-2018 §3.10.4 [M])", () => {
    const result = run(flitchUs([7, 7]));
    const c = result.checks.find((x) => x.id === "bearing-ply-left")!;
    expectClose(c.demand, (2625 / 4.5) * psi, { rel: 1e-6 }, "f_c⊥ at the middle support, MPa");
    expectClose(c.capacity, 625 * 1.125 * psi, { rel: 1e-9 }, "F_c⊥·C_b, MPa");
    expectClose(c.at!, 7 * 12 * 25.4, { rel: 1e-9 });
  });

  test("without F_c⊥ the bearing is listed as not checked", () => {
    const result = run(flitchUs([14], { compressionPerp: null }));
    expect(result.checks.some((x) => x.id.startsWith("bearing-ply"))).toBe(false);
    expect(result.notChecked.some((n) => n.startsWith("Bearing perpendicular to grain at the supports of left"))).toBe(true);
  });

  test("EN 1995-1-1 §6.1.5: C24 75 × 300 either side of a 12 × 280 plate, 5.4 m, EN-2a 10.8 N/mm: each ply 14 580 N on 75 × (90 + 30) mm (ℓ = 90 mm given) = 1.62 MPa, k_c,90 = 1.0 [M] [D]", () => {
    const job: JobInput = {
      format: "stitchplan-job",
      version: 1,
      units: "si",
      basis: "factored",
      project: { name: "EC5 bearing" },
      member: { mark: "FB-E" },
      materials: [
        // f_c,90,d = k_mod·f_c,90,k/γ_M = 0.8 · 2.5/1.3 = 1.538 MPa (EN 338 C24 [M], Table 3.1, Table 2.3 [M]).
        { id: "C24", name: "C24", family: "sawn-timber", E: 11_000, density: 0, characteristicDensity: 350, strength: { bending: 14.7, shear: 1.65, compressionPerp: (0.8 * 2.5) / 1.3 } },
        { id: "S", name: "S235", family: "steel", E: 210_000, density: 0, yieldStrength: 235, strength: { bending: 235, shear: 135 } },
      ],
      parts: [
        { id: "left", material: "C24", shape: { type: "rectangle", b: 75, h: 300 }, x: 0, y: 0 },
        { id: "plate", material: "S", shape: { type: "rectangle", b: 12, h: 280 }, place: { on: "left", side: "right" } },
        { id: "right", material: "C24", shape: { type: "rectangle", b: 75, h: 300 }, place: { on: "plate", side: "right" } },
      ],
      connectors: [{ id: "M16", kind: "timber-bolt", standard: "EN1995-1-1", shear: "double", size: "M16", grade: "8.8", serviceClass: 1 }],
      fastening: { default: { connector: "M16", rows: 2 }, joints: [{ held: ["plate"], connector: "M16", rows: 2 }] },
      beam: { spans: [5.4], loads: [{ type: "uniform", category: "dead", w: 3 }, { type: "uniform", category: "live", w: 4.5 }], selfWeight: false, bearingLength: 90 },
      combinations: { set: "en1990-6.10" },
      spacing: { module: 25, minZoneLength: 600, maxZonesPerSpan: 3, symmetric: true },
    };
    const result = run(job);
    const c = result.checks.find((x) => x.id === "bearing-ply-left")!;
    expectClose(c.demand, (10.8 * 2700) / 2 / (75 * 120), { rel: 1e-9 }, "σ_c,90, MPa");
    expectClose(c.capacity, (0.8 * 2.5) / 1.3, { rel: 1e-9 });
    expect(c.combination).toBe("EN-2a");
    expect(c.passes).toBe(false);
    expect(c.reference).toContain("§6.1.5");
  });
});

describe("properties through designMember (fast-check, fixed seed)", () => {
  const sized = fc.record({
    t: fc.double({ min: 35, max: 75, noNaN: true }),
    d: fc.double({ min: 200, max: 360, noNaN: true }),
    tp: fc.double({ min: 6, max: 20, noNaN: true }),
    ratio: fc.double({ min: 0.6, max: 1.2, noNaN: true }),
    w: fc.double({ min: 0.5, max: 8, noNaN: true }),
    quarters: fc.integer({ min: 12, max: 24 }),
    left: fc.integer({ min: 1, max: 3 }),
    right: fc.integer({ min: 1, max: 3 }),
  });
  const build = (g: { t: number; d: number; tp: number; ratio: number; w: number; quarters: number; left: number; right: number }, loads: JobInput["beam"]["loads"]) => {
    const span = g.quarters / 4;
    const job = flitch({ ...base, t: g.t, d: g.d, tp: g.tp, dp: g.d * g.ratio, span, pa: g.left / 4, pb: span - g.right / 4, loads });
    job.combinations = { set: "asce7-22-allowable" };
    // A strong rated connector, two per row, so that most schedules are feasible and their counts compare.
    job.connectors = [{ id: "R", kind: "rated", label: "rated (invented)", resistance: 20_000, minSpacing: 50, maxSpacing: 600, endDistance: 50 }];
    job.fastening = { default: { connector: "R", rows: 2 }, joints: [{ held: ["plate"], connector: "R", rows: 2 }] };
    return job;
  };
  // Many generated members must be designable (a quarter at least), or the properties below say nothing.
  const feasible: boolean[] = [];
  afterAll(() => expect(feasible.filter(Boolean).length).toBeGreaterThanOrEqual(feasible.length / 4));
  const counts = (r: ReturnType<typeof designMember>) => new Map(r.schedules.filter((s) => !s.infeasible).map((s) => [s.joint, s.count]));

  test("adding a live load on any ply (on top, or hung on either face; point or uniform, anywhere) never reduces the connectors of any interface", () => {
    fc.assert(
      fc.property(
        sized,
        fc.record({ face: fc.constantFrom("top", "left", "right"), point: fc.boolean(), at: fc.double({ min: 0.05, max: 0.95, noNaN: true }), size: fc.double({ min: 0.5, max: 10, noNaN: true }), len: fc.double({ min: 0.1, max: 1, noNaN: true }) }),
        (g, add) => {
          const dead: JobInput["beam"]["loads"] = [{ type: "uniform", category: "dead", w: g.w }];
          const span = g.quarters / 4;
          const extra: JobInput["beam"]["loads"][number] = add.point
            ? { type: "point", category: "live", P: add.size, at: add.at * span, face: add.face }
            : { type: "uniform", category: "live", w: add.size, from: add.at * span * (1 - add.len), to: Math.min(span, add.at * span * (1 - add.len) + add.len * span), face: add.face };
          const before = counts(run(build(g, dead)));
          feasible.push(before.has("plate"));
          const after = run(build(g, [...dead, extra]));
          for (const s of after.schedules) {
            if (s.infeasible || !before.has(s.joint)) continue;
            expect(s.count, `joint ${s.joint}`).toBeGreaterThanOrEqual(before.get(s.joint)!);
          }
        },
      ),
      { numRuns: 20 },
    );
  });

  test("shortening the plate (its ends in the outer third of the span) never reduces the connectors within d/2 of its ends", () => {
    fc.assert(
      fc.property(sized, fc.constantFrom("left", "right"), (g, end) => {
        const span = g.quarters / 4;
        fc.pre((g.left + 1) / 4 <= span / 3 && (g.right + 1) / 4 <= span / 3);
        const shorter = { ...g, [end]: g[end] + 1 };
        const near = (r: ReturnType<typeof designMember>, at: number, inward: number) => {
          const s = r.schedules.find((x) => x.joint === "plate")!;
          return s.infeasible ? Infinity : s.positions.filter((x) => (x - at) * inward >= -1e-6 && (x - at) * inward <= g.d / 2 + 1e-6).length;
        };
        const loads: JobInput["beam"]["loads"] = [{ type: "uniform", category: "dead", w: g.w }, { type: "uniform", category: "live", w: 2 * g.w }];
        const [a, b] = [run(build(g, loads)), run(build(shorter, loads))];
        feasible.push(!a.schedules.find((x) => x.joint === "plate")!.infeasible);
        const [at, atShorter, inward] = end === "left" ? [g.left * 250, shorter.left * 250, 1] : [(g.quarters - g.right) * 250, (g.quarters - shorter.right) * 250, -1];
        expect(near(b, atShorter, inward)).toBeGreaterThanOrEqual(near(a, at, inward));
      }),
      { numRuns: 20 },
    );
  });
});

import fc from "fast-check";
import { describe, expect, test } from "vitest";
import { prepareJob } from "../../../core/check-job.js";
import { designMember } from "../../../core/design-member.js";
import { arrivalFractions, interfaceTransfer } from "../../../core/multi-ply/ply-shares.js";
import type { JobInput } from "../../../core/schema/job.js";
import { expectClose } from "../../expect-close.js";

// Flitch beams: side-by-side plies of different materials and depths, through designMember.
// Shares by E·I [D]: plies with one curvature carry M_j = E_j I_j κ, so share_j = E_j I_j / Σ E I
// (any mechanics-of-materials text on composite beams, e.g. Gere & Goodno ch. 6).
// 2x12 dressed 1.5 × 11.25 in (PS 20 [V], REFERENCES §10); A36 plate E = 29 000 ksi, F_u = 58 ksi (ASTM A36 [M]).

const run = (job: JobInput) => {
  const p = prepareJob(job);
  if (!p.ok) throw new Error(JSON.stringify(p.issues));
  return designMember(p.core);
};

/** Two 2x12 DF-L plies with a 1/2 × 11 in plate centred between them, 3/4 in bolts in double shear through all three. */
function flitchUs(loads: JobInput["beam"]["loads"], opts: { namedJoint?: boolean } = {}): JobInput {
  return {
    format: "stitchplan-job",
    version: 1,
    units: "us",
    basis: "allowable",
    project: { name: "Flitch test" },
    member: { mark: "FH-T" },
    materials: [
      { id: "DF", name: "DF-L No. 1", family: "sawn-timber", E: 1_700_000, density: 0, specificGravity: 0.5, strength: { bending: 1000, shear: 180 } },
      { id: "PL", name: "A36 plate", family: "steel", E: 29_000_000, density: 0, yieldStrength: 36_000, tensileStrength: 58_000, strength: { bending: 21_600, shear: 12_900 } },
    ],
    parts: [
      { id: "left", material: "DF", shape: { type: "lumber", nominal: "2x12", orientation: "edge" }, x: 0, y: 0 },
      { id: "plate", material: "PL", shape: { type: "rectangle", b: 0.5, h: 11 }, place: { on: "left", side: "right" } },
      { id: "right", material: "DF", shape: { type: "lumber", nominal: "2x12", orientation: "edge" }, place: { on: "plate", side: "right" } },
    ],
    connectors: [{ id: "B", kind: "timber-bolt", standard: "NDS-2018", shear: "double", size: "3/4" }],
    fastening: { default: { connector: "B", rows: 1 }, joints: opts.namedJoint === false ? [] : [{ held: ["plate"], connector: "B", rows: 1 }] },
    beam: { spans: [14], loads, selfWeight: false },
    combinations: { set: "asce7-22-allowable" },
    spacing: { module: 1, minZoneLength: 24, maxZonesPerSpan: 3, symmetric: true },
  };
}

// Hand values of the flitch [D]: I_timber = 1.5 · 11.25³/12 = 177.979 in⁴, I_plate = 0.5 · 11³/12 = 55.458 in⁴.
const EIt = 1.7e6 * ((1.5 * 11.25 ** 3) / 12);
const EIp = 29e6 * ((0.5 * 11 ** 3) / 12);
const plateShare = EIp / (EIp + 2 * EIt); // 1.60829e9 / 2.21342e9 = 0.72661

describe("flitch beam: two 2x12 plies and a 1/2 × 11 in plate, 3/4 in bolts, 14 ft span, load on top", () => {
  test("the plate's share is E_p I_p / Σ E I = 0.7266; the top load bears on the timber only; each line passes s_p/2 of it [D]", () => {
    expectClose(plateShare, 0.72661, { rel: 1e-4 }, "share of the plate [D]");
    const result = run(flitchUs([{ type: "uniform", category: "dead", w: 600 }]));
    const plies = result.multiPly!.plies;
    expectClose(plies.find((p) => p.part === "plate")!.share, plateShare, { rel: 1e-9 });
    expectClose(plies.find((p) => p.part === "left")!.share, EIt / (EIp + 2 * EIt), { rel: 1e-9 });
    expect(plies.map((p) => p.bearsTopLoad)).toEqual([true, false, true]);
    const s = result.schedules.find((x) => x.joint === "plate")!;
    expect(result.joints.find((j) => j.id === "plate")!.demand).toBe("side-load");
    expect(s.lineCount).toBe(2);
    // 600 plf = 50 lb/in; each timber ply takes 1/2 of it on top and keeps (1 − s_p)/2: it passes s_p/2 · 50 lb/in to the plate.
    const toNmm = 4.4482216152605 / 25.4;
    const mid = result.beam.stations.findIndex((x) => x > 2000 && x < 2200);
    expectClose(s.shearFlow[mid]!, (plateShare / 2) * 50 * toNmm, { rel: 1e-9 }, "per-line transfer along the span, N/mm");
    // The plate does not reach the supports: its share of each reaction, s_p · R = s_p · 600 · 7 lb, goes back to the timber
    // through the bolts within d/2 = 5.625 in of the end (the concentrated-load rule [CP]), on top of the load passed in there.
    const reactionLb = 600 * 7;
    expectClose(Math.max(...s.shearFlow), (plateShare / 2) * (50 + reactionLb / 5.625) * toNmm, { rel: 1e-9 }, "per-line transfer next to a support, N/mm");
    expect(result.warnings.some((w) => w.includes("spacing limits only"))).toBe(false);
  });

  test("the bolts' resistance takes the load perpendicular to the grain by itself, with the plate's F_e = 1.5 F_u (NDS-2018 Table 12.3.1A double shear, §12.3.3) [D]", () => {
    const result = run(flitchUs([{ type: "uniform", category: "dead", w: 200 }, { type: "uniform", category: "live", w: 400 }]));
    const s = result.schedules.find((x) => x.joint === "plate")!;
    // Yield limit equations written out (NDS-2018 Table 12.3.1A, double shear [M]); D = 0.75 in, ℓ_s = 1.5 in (each 2x12),
    // ℓ_m = 0.5 in (plate), F_yb = 45 000 psi (bolts [M]), θ = 90° in the timber: K_θ = 1 + 0.25 · 90/90 = 1.25,
    // R_d = 4 K_θ = 5 (modes I), 3.2 K_θ = 4 (modes III, IV) (Table 12.3.1B [M]).
    const D = 0.75, ls = 1.5, lm = 0.5, Fyb = 45_000;
    const Fes = (6100 * 0.5 ** 1.45) / Math.sqrt(D); // F_e⊥ = 6100 G^1.45/√D = 2578 psi (§12.3.3 [M])
    const Fem = 1.5 * 58_000; // steel plate t ≥ 1/4 in: 1.5 F_u = 87 000 psi (§12.3.3 [M])
    const Re = Fem / Fes;
    const k3 = -1 + Math.sqrt((2 * (1 + Re)) / Re + (2 * Fyb * (2 + Re) * D ** 2) / (3 * Fem * ls ** 2));
    const Zim = (D * lm * Fem) / 5;
    const Zis = (2 * D * ls * Fes) / 5;
    const Ziiis = (2 * k3 * D * ls * Fem) / ((2 + Re) * 4);
    const Ziv = ((2 * D ** 2) / 4) * Math.sqrt((2 * Fem * Fyb) / (3 * (1 + Re)));
    const Z = Math.min(Zim, Zis, Ziiis, Ziv);
    expectClose(Fes, 2578.1, { rel: 1e-4 }, "F_e⊥ [D]");
    expectClose(Z, Zis, { rel: 0 }, "mode Is governs");
    expectClose(Z, 1160.1, { rel: 1e-4 }, "Z = 2 D ℓ_s F_es / R_d = 1160 lb [D]");
    // Per contact line: Z/2; C_D = 0.9 for dead only (ASD-1), 1.0 for D + L (NDS-2018 §2.3.2 [M]).
    const lbToN = 4.4482216152605;
    const byCombination = new Map(s.resistance.map((r) => [r.combination, r.value]));
    expect(result.beam.combinations.find((c) => c.id === "ASD-1")!.categories).toEqual(["dead"]);
    expectClose(byCombination.get("ASD-1")!, (Z / 2) * 0.9 * lbToN, { rel: 1e-6 }, "ASD-1 per line");
    expectClose(byCombination.get("ASD-2")!, (Z / 2) * 1.0 * lbToN, { rel: 1e-6 }, "ASD-2 per line");
    expect(s.resistance[0]!.steps.some((st) => st.symbol === "θ" && st.value === 90)).toBe(true);
    // Load perpendicular to grain: an NDS row is aligned with the load (§11.3.6.1), so rows stand across the depth and follow
    // one another along the member, (5ℓ/D + 10)/8 · D apart for 2 < ℓ/D < 6 (NDS-2018 Table 12.5.1D [M]). ℓ/D is the smaller of
    // the length in the wood main member and the total length in the wood side members (its footnote [M]): the plate does not
    // count, so ℓ = 2 × 1.5 = 3 in, ℓ/D = 4, spacing (20 + 10)/8 = 3.75D = 2.81 in [D]. (Taking the plate's 0.5 in gave 2.5D.)
    expectClose(s.limits.minSpacing, 3.75 * D * 25.4, { rel: 1e-9 }, "3.75D");
  });

  test("bending and shear of each ply on its own share: the plate's shear is 1.5 · s_p · V/(t_p d_p) [D]", () => {
    const result = run(flitchUs([{ type: "uniform", category: "dead", w: 600 }]));
    const V = (600 * 14) / 2; // lb, simple span
    const M = (600 * 14 ** 2) / 8 * 12; // lb·in
    const plate = result.checks.find((c) => c.id === "shear-ply-plate")!;
    expectClose(plate.demand, ((1.5 * plateShare * V) / (0.5 * 11)) * 0.0068947572932, { rel: 1e-6 }, "τ_plate, MPa");
    const timber = result.checks.find((c) => c.id === "shear-ply-left")!;
    expectClose(timber.demand, ((1.5 * (EIt / (EIp + 2 * EIt)) * V) / (1.5 * 11.25)) * 0.0068947572932, { rel: 1e-6 }, "τ_timber, MPa");
    const plateBending = result.checks.find((c) => c.id === "bending-ply-plate")!;
    expectClose(plateBending.demand, ((plateShare * M * 5.5) / ((0.5 * 11 ** 3) / 12)) * 0.0068947572932, { rel: 1e-6 }, "σ_plate = s_p M c/I_p, MPa");
    expect(result.assumptions.some((a) => a.includes("held laterally by the bolts"))).toBe(true);
  });
});

describe("invariant: the force passed across the interfaces over the span equals the share the plies that do not bear take from those that do", () => {
  test("property (fast-check, fixed seed): Σ over interfaces of ∫ transfer dx = ∫ |s_p·q − q_on plate| dx, reactions and self-weight included, for any timber and plate sizes, single or double shear [D]", () => {
    fc.assert(
      fc.property(
        fc.record({
          t: fc.double({ min: 30, max: 80, noNaN: true }),
          d: fc.double({ min: 180, max: 400, noNaN: true }),
          Et: fc.double({ min: 7000, max: 14_000, noNaN: true }),
          tp: fc.double({ min: 6, max: 25, noNaN: true }),
          depthRatio: fc.oneof(fc.double({ min: 0.5, max: 0.97, noNaN: true }), fc.double({ min: 1.03, max: 1.3, noNaN: true })),
          Ep: fc.double({ min: 190_000, max: 210_000, noNaN: true }),
          w: fc.double({ min: 0.5, max: 20, noNaN: true }),
          // Partial loads on a 0.25 m grid, so that their ends fall on the analysis stations (the integral below is then exact).
          partial: fc.option(fc.record({ from: fc.integer({ min: 0, max: 6 }).map((k) => k / 4), len: fc.integer({ min: 2, max: 8 }).map((k) => k / 4), w: fc.double({ min: 0.5, max: 10, noNaN: true }) }), { nil: undefined }),
          span: fc.double({ min: 2.5, max: 6, noNaN: true }),
          named: fc.boolean(),
          densities: fc.option(fc.record({ timber: fc.double({ min: 300, max: 700, noNaN: true }), steel: fc.double({ min: 7000, max: 8000, noNaN: true }) }), { nil: undefined }),
        }),
        (g) => {
          const dp = g.d * g.depthRatio;
          const loads: JobInput["beam"]["loads"] = [{ type: "uniform", category: "dead", w: g.w }];
          if (g.partial) loads.push({ type: "uniform", category: "dead", w: g.partial.w, from: g.partial.from, to: Math.min(g.span, g.partial.from + g.partial.len) });
          const job: JobInput = {
            format: "stitchplan-job",
            version: 1,
            units: "si",
            basis: "allowable",
            project: { name: "invariant" },
            member: { mark: "P" },
            materials: [
              { id: "T", name: "timber", E: g.Et, density: g.densities?.timber ?? 0 },
              { id: "S", name: "steel", family: "steel", E: g.Ep, density: g.densities?.steel ?? 0 },
            ],
            parts: [
              { id: "a", material: "T", shape: { type: "rectangle", b: g.t, h: g.d }, x: 0, y: 0 },
              { id: "plate", material: "S", shape: { type: "rectangle", b: g.tp, h: dp }, place: { on: "a", side: "right" } },
              { id: "b", material: "T", shape: { type: "rectangle", b: g.t, h: g.d }, place: { on: "plate", side: "right" } },
            ],
            connectors: [{ id: "R", kind: "rated", label: "rated (invented)", resistance: 5000, minSpacing: 50, maxSpacing: 600, endDistance: 50 }],
            fastening: { default: { connector: "R", rows: 1 }, joints: g.named ? [{ held: ["plate"], connector: "R", rows: 1 }] : [] },
            beam: { spans: [g.span], loads, selfWeight: g.densities !== undefined },
            spacing: { module: 5, minZoneLength: 200, maxZonesPerSpan: 5, symmetric: false },
          };
          const result = run(job);
          // Self-weight, N/mm (ρ g A): each ply's own weight arrives on it.
          const g0 = 9.80665e-9;
          const wt = (g.densities?.timber ?? 0) * g0 * g.t * g.d;
          const wp = (g.densities?.steel ?? 0) * g0 * g.tp * dp;
          // Closed form in the core's units (MPa, mm): shares by E·I; the plate bears a load on top only when it is the deeper.
          const EIt = g.Et * ((g.t * g.d ** 3) / 12);
          const EIp = g.Ep * ((g.tp * dp ** 3) / 12);
          const sp = EIp / (EIp + 2 * EIt);
          const ap = g.depthRatio > 1 ? 1 : 0;
          const L = g.span * 1000;
          const W = g.w * L + (g.partial ? g.partial.w * (Math.min(g.span, g.partial.from + g.partial.len) - g.partial.from) * 1000 : 0);
          const wsw = 2 * wt + wp;
          const [pa, pb] = g.partial ? [g.partial.from * 1000, Math.min(g.span, g.partial.from + g.partial.len) * 1000] : [0, 0];
          const q = (x: number) => g.w + (g.partial && x > pa && x < pb ? g.partial.w : 0);
          // Support reactions by statics (simple span), and each spread over the d/2 of the member next to its support.
          const Wall = W + wsw * L;
          const Rright = (((g.w + wsw) * L * L) / 2 + (g.partial ? g.partial.w * (pb - pa) * ((pa + pb) / 2) : 0)) / L;
          const Rleft = Wall - Rright;
          const half = Math.max(g.d, dp) / 2;
          // What the plate takes in per unit length (positive) or hands out: its share of everything on the member less what
          // arrives on it; a support's reaction arrives on the plies that reach the bottom (the plate, when it is the deeper).
          const bp = ap;
          const P = (x: number) => sp * (q(x) + wsw) - ap * q(x) - wp + (bp - sp) * ((x < half ? Rleft : 0) + (x > L - half ? Rright : 0)) / half;
          const cuts = [...new Set([0, L, pa, pb, half, L - half])].filter((c) => c >= 0 && c <= L).sort((a, b) => a - b);
          let exact = 0;
          for (let i = 0; i + 1 < cuts.length; i++) exact += Math.abs(P((cuts[i]! + cuts[i + 1]!) / 2)) * (cuts[i + 1]! - cuts[i]!);
          // A bolt through timber, plate, timber (named joint) is designed for each load's transfer without relief between them.
          const expected = g.named ? Math.abs(sp - ap) * W + Math.abs(sp * wsw - wp) * L + Math.abs(bp - sp) * (Rleft + Rright) : exact;
          expect(expected).toBeGreaterThanOrEqual(exact * (1 - 1e-12));
          // Σ over the lines of ∫ transfer dx, from the schedules' own integral of the demand (∫ q/R dx · lines, R = 5000 N, one combination).
          expect(result.beam.combinations).toHaveLength(1);
          const passed = result.schedules.reduce((sum, sch) => sum + sch.efficiency.demandIntegral * 5000, 0);
          expectClose(passed, expected, { rel: 1e-6 }, "force passed across the interfaces");
          expect(result.multiPly!.plies.find((p) => p.part === "plate")!.bearsTopLoad).toBe(ap === 1);
        },
      ),
      { numRuns: 30 },
    );
  });
});

describe("EN 1995-1-1: timber, steel plate, timber with bolts in double shear (the plate the central member)", () => {
  // Two C24 75 × 300 (ρ_k = 350 kg/m³, EN 338 [M]) either side of a 12 × 280 mm plate, M16 bolts of class 8.8 (f_u,k = 800 MPa, EN ISO 898-1 [M]).
  const job = (): JobInput => ({
    format: "stitchplan-job",
    version: 1,
    units: "si",
    basis: "factored",
    project: { name: "EC5 flitch test" },
    member: { mark: "FB-T" },
    materials: [
      { id: "C24", name: "C24", family: "sawn-timber", E: 11_000, density: 0, characteristicDensity: 350, meanDensity: 420, strength: { bending: 14.7, shear: 1.65 } },
      { id: "S", name: "S235", family: "steel", E: 210_000, density: 0, yieldStrength: 235, strength: { bending: 235, shear: 135 } },
    ],
    parts: [
      { id: "left", material: "C24", shape: { type: "rectangle", b: 75, h: 300 }, x: 0, y: 0 },
      { id: "plate", material: "S", shape: { type: "rectangle", b: 12, h: 280 }, place: { on: "left", side: "right" } },
      { id: "right", material: "C24", shape: { type: "rectangle", b: 75, h: 300 }, place: { on: "plate", side: "right" } },
    ],
    connectors: [{ id: "M16", kind: "timber-bolt", standard: "EN1995-1-1", shear: "double", size: "M16", grade: "8.8", serviceClass: 1 }],
    // Bolts in pairs: one per row cannot hand the plate's reaction back within d/2 = 150 mm of a support, the first at a₃,t = 112 mm.
    fastening: { default: { connector: "M16", rows: 2 }, joints: [{ held: ["plate"], connector: "M16", rows: 2 }] },
    beam: { spans: [5.4], loads: [{ type: "uniform", category: "dead", w: 3 }, { type: "uniform", category: "live", w: 4.5 }], selfWeight: false },
    combinations: { set: "en1990-6.10" },
    spacing: { module: 25, minZoneLength: 600, maxZonesPerSpan: 3, symmetric: true },
  });

  test("F_v,Rk by eq. (8.11) with f_h,90,k, θ = 90° taken by itself; F_v,Rd = k_mod F_v,Rk/γ_M per shear plane [D]", () => {
    const result = run(job());
    const s = result.schedules.find((x) => x.joint === "plate")!;
    const d = 16, t1 = 75, rhoK = 350, fu = 800;
    const fh0 = 0.082 * (1 - 0.01 * d) * rhoK; // eq. (8.32): 24.11 MPa [M]
    const k90 = 1.35 + 0.015 * d; // eq. (8.33), softwood: 1.59 [M]
    const fh90 = fh0 / (k90 * 1 + 0); // eq. (8.31) at α = 90°: 15.16 MPa [D]
    const My = 0.3 * fu * d ** 2.6; // eq. (8.30): 324 300 N·mm [M]
    const f = fh90 * t1 * d; // eq. (8.11f) [M]
    const g = fh90 * t1 * d * (Math.sqrt(2 + (4 * My) / (fh90 * d * t1 ** 2)) - 1); // eq. (8.11g), no rope effect (no F_ax,Rk given) [M]
    const h = 2.3 * Math.sqrt(My * fh90 * d); // eq. (8.11h) [M]
    const Rk = Math.min(f, g, h);
    expectClose(fh90, 15.162, { rel: 1e-4 }, "f_h,90,k");
    expectClose(Rk, g, { rel: 0 }, "mode g governs");
    expectClose(Rk, 13_058, { rel: 1e-3 }, "F_v,Rk = 13.06 kN per shear plane [D]");
    // k_mod = 0.6 permanent, 0.8 medium-term, service class 1 (Table 3.1 [M]); γ_M = 1.3 (Table 2.3 [M]).
    const byCombination = new Map(s.resistance.map((r) => [r.combination, r.value]));
    expectClose(byCombination.get("EN-1a")!, (0.6 * Rk) / 1.3, { rel: 1e-6 }, "EN-1a (1.35G)");
    expectClose(byCombination.get("EN-2a")!, (0.8 * Rk) / 1.3, { rel: 1e-6 }, "EN-2a (1.35G + 1.5Q)");
    expect(s.resistance[0]!.reference).toContain("eq. (8.11)");
    // Distances for a force across the member, grain along it, α = 90° (EN 1995-1-1 Table 8.4, bolts [M]): along the member
    // a₁ = (4 + |cos α|)d = 64 mm; from the member ends a₃,t = max(7d, 80) = 112 mm; from the loaded edge
    // a₄,t = max((2 + 2 sin α)d, 3d) = 64 mm; between rows a₂ = 4d = 64 mm.
    expectClose(s.limits.minSpacing, 64, { rel: 1e-9 }, "a₁");
    expectClose(s.limits.endDistance, 112, { rel: 1e-9 }, "a₃,t");
    expectClose(s.limits.edgeDistance!, 64, { rel: 1e-9 }, "a₄,t");
    expectClose(s.limits.rowSpacing!, 64, { rel: 1e-9 }, "a₂");
    // The transfer each line passes: s_p/2 of the factored top load, EN-2a: (1.35 · 3 + 1.5 · 4.5) N/mm [D].
    const EIt = 11_000 * ((75 * 300 ** 3) / 12);
    const EIp = 210_000 * ((12 * 280 ** 3) / 12);
    const sp = EIp / (EIp + 2 * EIt);
    expectClose(sp, 0.55392, { rel: 1e-4 }, "plate share [D]");
    const mid = result.beam.stations.findIndex((x) => x > 2000 && x < 2500);
    expectClose(s.shearFlow[mid]!, (sp / 2) * (1.35 * 3 + 1.5 * 4.5), { rel: 1e-9 }, "per-line transfer along the span, N/mm");
    // Next to a support: the plate's share of the reaction, R = 10.8 N/mm · 2700 mm, handed back over d/2 = 150 mm [CP].
    expectClose(Math.max(...s.shearFlow), (sp / 2) * (1.35 * 3 + 1.5 * 4.5) * (1 + 2700 / 150), { rel: 1e-9 }, "per-line transfer next to a support, N/mm");
    expect(result.status.passes).toBe(true);
  });

  test("the connector's angles as entered do not change the transfer across plies: 0° (the default) and 90° give the same resistance", () => {
    const a = run(job());
    const j = job();
    (j.connectors[0] as Record<string, unknown>).sideAngleToGrainDeg = 90;
    (j.connectors[0] as Record<string, unknown>).mainAngleToGrainDeg = 90;
    const b = run(j);
    expect(a.schedules[0]!.resistance.map((r) => r.value)).toEqual(b.schedules[0]!.resistance.map((r) => r.value));
  });
});

describe("plies of different depths", () => {
  test("a load on top bears on the plies that reach the top, by thickness [CP]; the shallower plate gets none and takes its share through the interfaces [D]", () => {
    const plies = [
      { modulus: 11_000, thickness: 38, depth: 286 },
      { modulus: 200_000, thickness: 12, depth: 279, bearsOnTop: false },
      { modulus: 11_000, thickness: 38, depth: 286 },
    ];
    expect(arrivalFractions(plies, "top")).toEqual([0.5, 0, 0.5]);
    const t = interfaceTransfer(plies, [{ face: "top", magnitude: 1 }]);
    const sp = (200_000 * 12 * 279 ** 3) / (200_000 * 12 * 279 ** 3 + 2 * 11_000 * 38 * 286 ** 3);
    expectClose(t.interfaces[0]!.force, sp / 2, { rel: 1e-12 }, "T_1 = s_p/2");
    expectClose(t.interfaces[1]!.force, -sp / 2, { rel: 1e-12 }, "T_2 = −s_p/2");
  });

  test("a plate flush with the top of the timber (mid-depths not at one level) shares by E·I about its own axis (no composite action between plies): a load on top bears on all three by thickness; each line passes |1.5/3.5 − s_t|·q; the deflection is that of Σ E·I [D]", () => {
    const job = flitchUs([{ type: "uniform", category: "dead", w: 600 }]);
    // Explicit positions, in: timber 0–11.25 deep either side, the 11 in plate from 0.25 to 11.25 (flush with the top).
    job.parts = [
      { ...job.parts[0]!, x: 0, y: 0 },
      { id: "plate", material: "PL", shape: { type: "rectangle", b: 0.5, h: 11 }, x: 1.5, y: 0.25 },
      { id: "right", material: "DF", shape: { type: "lumber", nominal: "2x12", orientation: "edge" }, x: 2, y: 0 },
    ] as JobInput["parts"];
    const result = run(job);
    expect(result.multiPly).not.toBeNull();
    expectClose(result.multiPly!.plies.find((p) => p.part === "plate")!.share, plateShare, { rel: 1e-9 });
    expect(result.multiPly!.plies.map((p) => p.bearsTopLoad)).toEqual([true, true, true]);
    const s = result.schedules.find((x) => x.joint === "plate")!;
    const toNmm = 4.4482216152605 / 25.4;
    const st = (1 - plateShare) / 2;
    const mid = result.beam.stations.findIndex((x) => x > 2000 && x < 2200);
    expectClose(s.shearFlow[mid]!, (1.5 / 3.5 - st) * 50 * toNmm, { rel: 1e-9 }, "per-line transfer along the span, N/mm");
    // Deflection of a simple span, 5wL⁴/(384 Σ E I), w = 50 lb/in, L = 168 in: 0.2343 in [D].
    const delta = (5 * 50 * 168 ** 4) / (384 * (EIp + 2 * EIt));
    expectClose(delta, 0.23431, { rel: 1e-4 }, "δ, in");
    expectClose(result.checks.find((c) => c.id === "deflection-total")!.demand, delta * 25.4, { rel: 1e-6 }, "δ, mm");
    expect(result.status.failures.some((f) => f.startsWith("Contact line"))).toBe(false);
    expect(result.assumptions.some((a) => a.includes("no composite action between the plies"))).toBe(true);
  });
});

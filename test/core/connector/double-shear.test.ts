import { describe, expect, test } from "vitest";
import { expectClose } from "../../expect-close.js";
import { KIP, LBF } from "./contexts.js";
import { coreSchedule, design, designed, flipped, threeLayerJob, type Layer } from "./double-shear-jobs.js";

// In double shear the central (main) member is the part between the two contact lines, whatever the
// thicknesses and the head side. Each expected value is worked here from the standard's equations,
// not from core/, for a three-layer stack whose core is held by the connector.

const timberUs = (G: number, t: number, b = 5.5): Layer => ({ material: { family: "sawn-timber", E: 1_600_000, density: 35, specificGravity: G }, thickness: t, width: b });
const steelUs = (t: number, b = 8): Layer => ({ material: { family: "steel", E: 29_000_000, density: 490, yieldStrength: 36_000, tensileStrength: 58_000 }, thickness: t, width: b });
const timberSi = (rhoK: number, t: number, b = 200): Layer => ({ material: { family: "sawn-timber", E: 11_000, density: 420, characteristicDensity: rhoK, meanDensity: rhoK * 1.2 }, thickness: t, width: b });
const steelSi = (t: number, fu = 430, b = 200): Layer => ({ material: { family: "steel", E: 210_000, density: 7850, yieldStrength: 275, tensileStrength: fu }, thickness: t, width: b });
const perLine = (r: ReturnType<typeof designed>) => coreSchedule(r).resistance[0]!.value;

describe("NDS-2018 bolt in double shear: the core between two outer plies is the main member (Table 12.3.1A, double shear)", () => {
  // 3/4 in bolt, F_yb = 45 000 psi [M]; load parallel to grain, K_θ = 1; F_e∥ = 11 200 G (NDS Table 12.3.3 footnote [M]).
  // Double-shear modes (NDS-2018 Table 12.3.1A [M]): Im = D ℓm Fem/4; Is = 2 D ℓs Fes/4;
  // IIIs = 2 k3 D ℓs Fem/((2 + Re) 3.2), k3 = −1 + √(2(1 + Re)/Re + 2 Fyb (2 + Re) D²/(3 Fem ℓs²)); IV = 2 D²/3.2 √(2 Fem Fyb/(3(1 + Re))).
  const D = 0.75;
  const Fyb = 45_000;
  const doubleShearZ = (lm: number, Gm: number, ls: number, Gs: number) => {
    const Fem = 11_200 * Gm;
    const Fes = 11_200 * Gs;
    const Re = Fem / Fes;
    const k3 = -1 + Math.sqrt((2 * (1 + Re)) / Re + (2 * Fyb * (2 + Re) * D * D) / (3 * Fem * ls * ls));
    const modes = { Im: (D * lm * Fem) / 4, Is: (2 * D * ls * Fes) / 4, IIIs: (2 * k3 * D * ls * Fem) / ((2 + Re) * 3.2), IV: ((2 * D * D) / 3.2) * Math.sqrt((2 * Fem * Fyb) / (3 * (1 + Re))) };
    return { modes, Z: Math.min(...Object.values(modes)) };
  };
  const job = (headSide: "auto" | "held" | "other") =>
    threeLayerJob({ units: "us", basis: "allowable", bottom: timberUs(0.55, 3.5), core: timberUs(0.42, 1.5), top: timberUs(0.55, 3.5), connector: { kind: "timber-bolt", standard: "NDS-2018", size: "3/4", shear: "double" }, headSide });

  test("1.5 in G 0.42 core between 3.5 in G 0.55 plies: Z = 1,323 lb (mode Im), 661.5 lb per contact line at C_D = 1.0 [D]; the program gave 2,289 lb before", () => {
    const { modes, Z } = doubleShearZ(1.5, 0.42, 3.5, 0.55);
    expectClose(Z, 1323, { rel: 1e-3 });
    expect(Z).toBe(modes.Im);
    for (const headSide of ["auto", "held", "other"] as const) {
      const r = designed(job(headSide));
      expectClose(perLine(r) / LBF, Z / 2, { rel: 1e-6 });
      expect(coreSchedule(r).resistance[0]!.governing).toMatch(/^mode Im/);
    }
  });

  test("a grid of 72 double-shear joints (3 sizes, 3 cores, 2 core woods, equal and unequal outer plies) all agree with the double-shear modes, the weaker outer ply governing [D]", () => {
    // The same modes for any D (R_d by Table 12.3.1B at θ = 0 [M]: 4 for I, 3.2 for III and IV, D ≥ 1/4 in).
    const zOf = (d: number, lm: number, Gm: number, ls: number, Gs: number) => {
      const Fem = 11_200 * Gm;
      const Fes = 11_200 * Gs;
      const Re = Fem / Fes;
      const k3 = -1 + Math.sqrt((2 * (1 + Re)) / Re + (2 * Fyb * (2 + Re) * d * d) / (3 * Fem * ls * ls));
      return Math.min((d * lm * Fem) / 4, (2 * d * ls * Fes) / 4, (2 * k3 * d * ls * Fem) / ((2 + Re) * 3.2), ((2 * d * d) / 3.2) * Math.sqrt((2 * Fem * Fyb) / (3 * (1 + Re))));
    };
    const plies = [[1.5, 0.42], [3.5, 0.55]] as const;
    let joints = 0;
    for (const [size, d] of [["1/2", 0.5], ["3/4", 0.75], ["1", 1]] as const) {
      for (const tc of [1.5, 3.5, 5.5]) {
        for (const Gc of [0.42, 0.55]) {
          for (const bottom of plies) {
            for (const top of plies) {
              const r = designed(threeLayerJob({ units: "us", basis: "allowable", bottom: timberUs(bottom[1], bottom[0]), core: timberUs(Gc, tc), top: timberUs(top[1], top[0]), connector: { kind: "timber-bolt", standard: "NDS-2018", size, shear: "double" } }));
              const expected = Math.min(zOf(d, tc, Gc, bottom[0], bottom[1]), zOf(d, tc, Gc, top[0], top[1])) / 2;
              expectClose(perLine(r) / LBF, expected, { rel: 1e-6 }, `${size} in, core ${tc} in G ${Gc}, plies ${bottom.join(" in G ")} / ${top.join(" in G ")}`);
              joints++;
            }
          }
        }
      }
    }
    expect(joints).toBe(72);
  });

  test("the working names the central member and both outer members", () => {
    const steps = coreSchedule(designed(job("auto"))).resistance[0]!.steps;
    expect(steps[0]!.description).toContain('central member "core"');
    expect(steps[0]!.description).toContain('outer members "bottom" and "top"');
    expect(steps.find((s) => s.symbol === "ℓ_m")!.description).toContain('central (main) member "core"');
  });

  test("unequal outer plies are each checked and the weaker governs: a 1.5 in G 0.42 bottom ply and a 3.5 in G 0.55 top ply on a 3.5 in G 0.55 core [D]", () => {
    const r = designed(threeLayerJob({ units: "us", basis: "allowable", bottom: timberUs(0.42, 1.5), core: timberUs(0.55, 3.5), top: timberUs(0.55, 3.5), connector: { kind: "timber-bolt", standard: "NDS-2018", size: "3/4", shear: "double" } }));
    const weak = doubleShearZ(3.5, 0.55, 1.5, 0.42).Z;
    const strong = doubleShearZ(3.5, 0.55, 3.5, 0.55).Z;
    expect(weak).toBeLessThan(strong);
    expectClose(perLine(r) / LBF, weak / 2, { rel: 1e-6 });
    expect(coreSchedule(r).resistance[0]!.governing).toContain('outer member "bottom"');
    expect(coreSchedule(r).resistance[0]!.steps.at(-1)!.description).toContain('the weaker governs: outer "bottom"');
  });
});

describe("EN 1995-1-1 bolts in double shear: the central member by the geometry (eq. 8.7, 8.11)", () => {
  // M16 bolt, property class 4.6: f_u,k = 400 MPa [V Table 3.1 of EN 1993-1-8]; M_y,Rk = 0.3 f_u,k d^2.6 (eq. 8.30 [M]);
  // f_h,0,k = 0.082 (1 − 0.01 d) ρ_k (eq. 8.32 [M]); k_mod = 0.8 for solid timber, service class 1, medium-term (live) (Table 3.1 [M]); γ_M = 1.3 (Table 2.3 [M]).
  // No withdrawal capacity is given, so no rope effect.
  const d = 16;
  const My = 0.3 * 400 * d ** 2.6;
  const fh = (rhoK: number) => 0.082 * (1 - 0.01 * d) * rhoK;
  const rd = (F: number) => (0.8 * F) / 1.3;

  test("a 10 mm steel central plate between two 60 mm C24 members takes eq. (8.11), modes f, g, h: 8,128 N per shear plane design [D]", () => {
    const t1 = 60;
    const f = fh(350) * t1 * d;
    const g = f * (Math.sqrt(2 + (4 * My) / (fh(350) * d * t1 * t1)) - 1);
    const h = 2.3 * Math.sqrt(My * fh(350) * d);
    const expected = rd(Math.min(f, g, h));
    const r = designed(threeLayerJob({ units: "si", basis: "factored", bottom: timberSi(350, 60), core: steelSi(10), top: timberSi(350, 60), connector: { kind: "timber-bolt", standard: "EN1995-1-1", size: "M16", grade: "4.6", shear: "double" } }));
    const s = coreSchedule(r).resistance[0]!;
    expectClose(s.value, expected, { rel: 1e-6 });
    expectClose(s.value, 8128, { rel: 1e-3 });
    expect(s.reference).toContain("eq. (8.11)");
  });

  test("a 38 mm ρ_k 420 core between two 75 mm ρ_k 310 members takes eq. (8.7) with the core as member 2 [D]", () => {
    const t1 = 75;
    const t2 = 38;
    const fh1 = fh(310);
    const fh2 = fh(420);
    const b = fh2 / fh1;
    const modes = [fh1 * t1 * d, 0.5 * fh2 * t2 * d, 1.05 * ((fh1 * t1 * d) / (2 + b)) * (Math.sqrt(2 * b * (1 + b) + (4 * b * (2 + b) * My) / (fh1 * d * t1 * t1)) - b), 1.15 * Math.sqrt((2 * b) / (1 + b)) * Math.sqrt(2 * My * fh1 * d)];
    const expected = rd(Math.min(...modes));
    for (const headSide of ["auto", "held", "other"] as const) {
      const r = designed(threeLayerJob({ units: "si", basis: "factored", bottom: timberSi(310, 75), core: timberSi(420, 38), top: timberSi(310, 75), connector: { kind: "timber-bolt", standard: "EN1995-1-1", size: "M16", grade: "4.6", shear: "double" }, headSide }));
      expectClose(perLine(r), expected, { rel: 1e-6 });
      expect(coreSchedule(r).resistance[0]!.governing).toMatch(/^mode h/);
    }
  });

  test("steel outer plates on a timber core take eq. (8.12)/(8.13); one steel and one timber outer member is refused at shear", () => {
    const plates = designed(threeLayerJob({ units: "si", basis: "factored", bottom: steelSi(8), core: timberSi(350, 90), top: steelSi(8), connector: { kind: "timber-bolt", standard: "EN1995-1-1", size: "M16", grade: "4.6", shear: "double" } }));
    expect(coreSchedule(plates).resistance[0]!.reference).toContain("eq. (8.12), (8.13)");
    const mixed = design(threeLayerJob({ units: "si", basis: "factored", bottom: steelSi(8), core: timberSi(350, 90), top: timberSi(350, 60), connector: { kind: "timber-bolt", standard: "EN1995-1-1", size: "M16", grade: "4.6", shear: "double" } }));
    expect(mixed.ok).toBe(false);
    if (!mixed.ok) expect(mixed.issues).toEqual([expect.objectContaining({ path: "connectors[0].shear", message: expect.stringContaining("one outer part is steel and the other timber") })]);
  });
});

describe("steel bolts in double shear: bearing and tear-out of the central plate on its own thickness", () => {
  test("AISC 360-16: 3/4 in Group A bolt, 1/4 in central plate between two 1/2 in plates, F_u = 58 ksi, LRFD: tear-out at the end bolt of the central plate, 7.748 kips, 3.874 kips per line [D]", () => {
    // J3.10 eq. (J3-6c) [M]: R_n = 1.2 l_c t F_u, φ = 0.75; l_c = L_e − d_h/2 with L_e = 1 in (Table J3.4 [M]) and d_h = 13/16 in (Table J3.3 [M]).
    const lc = 1 - 13 / 16 / 2;
    const tearOut = 0.75 * 1.2 * lc * 0.25 * 58;
    const bearing = 0.75 * 2.4 * 0.75 * 0.25 * 58;
    const shear = 0.75 * 54 * Math.PI * 0.375 ** 2 * 2;
    expectClose(tearOut, 7.748, { rel: 1e-3 });
    const expected = Math.min(tearOut, bearing, shear);
    for (const headSide of ["auto", "held", "other"] as const) {
      const r = designed(threeLayerJob({ units: "us", basis: "factored", bottom: steelUs(0.5), core: steelUs(0.25), top: steelUs(0.5), connector: { kind: "steel-bolt", standard: "AISC-360-16", size: "3/4", grade: "A", shear: "double" }, headSide, load: 2000, span: 10 }));
      const s = coreSchedule(r).resistance[0]!;
      expectClose(s.value / KIP, expected / 2, { rel: 1e-6 });
      expect(s.governing).toBe('tear-out at the end bolt of central ply "core"');
    }
  });

  test("EN 1993-1-8: M20 8.8, 8 mm central plate between two 12 mm plates, f_u = 430 MPa: bearing on the central plate at the end bolt, 36.55 kN, 18.27 kN per line [D]", () => {
    // Table 3.4 [V]: F_b,Rd = k1 α_b f_u d t/γ_M2, e1 = e2 = 1.2 d0, d0 = 22 mm (Table 3.3 minima [V]); k1 = min(2.8 e2/d0 − 1.7, 2.5); α_b = min(e1/3d0, f_ub/f_u, 1); γ_M2 = 1.25 [V].
    const d0 = 22;
    const e = 1.2 * d0;
    const k1 = Math.min((2.8 * e) / d0 - 1.7, 2.5);
    const alphaB = Math.min(e / (3 * d0), 800 / 430, 1);
    const bearing = (k1 * alphaB * 430 * 20 * 8) / 1.25;
    expectClose(bearing, 36_547, { rel: 1e-4 });
    const r = designed(threeLayerJob({ units: "si", basis: "factored", bottom: steelSi(12), core: steelSi(8), top: steelSi(12), connector: { kind: "steel-bolt", standard: "EN1993-1-8", size: "M20", grade: "8.8", shear: "double" }, load: 30, span: 3 }));
    const s = coreSchedule(r).resistance[0]!;
    expectClose(s.value, bearing / 2, { rel: 1e-6 });
    expect(s.governing).toBe('bearing on central ply "core", end bolt');
  });

  test("unequal outer plates are each checked at their own thickness: a 1/8 in bottom plate governs bearing over a 1/2 in top plate [D]", () => {
    // Bearing of an outer ply carries half the bolt force: R_n = 2.4 d t F_u/(1/2) (J3-6a [M]); tear-out 1.2 l_c t F_u/(1/2).
    const r = designed(threeLayerJob({ units: "us", basis: "factored", bottom: steelUs(0.125), core: steelUs(0.75), top: steelUs(0.5), connector: { kind: "steel-bolt", standard: "AISC-360-16", size: "3/4", grade: "A", shear: "double" }, load: 2000, span: 10 }));
    const s = coreSchedule(r).resistance[0]!;
    const lc = 1 - 13 / 16 / 2;
    expectClose(s.value / KIP, (0.75 * 1.2 * lc * 0.125 * 58) / 0.5 / 2, { rel: 1e-6 });
    expect(s.governing).toBe('tear-out at the end bolt of outer ply "bottom"');
  });
});

describe("nails in double shear: the far outer member by its own thickness", () => {
  // EN 1995-1-1 eq. (8.7) with t1 the lesser of the head-side thickness and the point-side penetration (§8.3.1.1 [M]).
  const nail = { kind: "nail", standard: "EN1995-1-1", diameter: 3.1, length: 90, shear: "double" };

  test("3.1 × 90 mm nail through 22 + 38 + 22 mm (ρ_k 350): penetration 30 mm into the far member, past it, so t1 = 22 mm, its own thickness [D]", () => {
    const r = designed(threeLayerJob({ units: "si", basis: "factored", bottom: timberSi(350, 22), core: timberSi(350, 38), top: timberSi(350, 22), connector: nail }));
    const s = coreSchedule(r);
    expect(s.limits.penetration!.provided).toBeCloseTo(90 - 22 - 38, 9);
    // f_h,k = 0.082 ρ_k d^−0.3 (eq. 8.15, not predrilled [M]); M_y,Rk = 0.3 f_u d^2.6 with f_u = 600 MPa (eq. 8.14 [M]); β = 1.
    const d = 3.1;
    const f = 0.082 * 350 * d ** -0.3;
    const My = 0.3 * 600 * d ** 2.6;
    const t1 = 22;
    const modes = [f * t1 * d, 0.5 * f * 38 * d, 1.05 * ((f * t1 * d) / 3) * (Math.sqrt(4 + (12 * My) / (f * d * t1 * t1)) - 1), 1.15 * Math.sqrt(2 * My * f * d)];
    expectClose(s.resistance[0]!.value, (0.8 * Math.min(...modes)) / 1.3, { rel: 1e-6 });
    expect(r.warnings.join(" ")).toMatch(/nail point passes through part "(top|bottom)" \(penetration 30 mm\)/);
  });

  test("a nail too short for the far outer member is refused once, at its length, naming that member; no part is said to be 0 mm thick", () => {
    const short = design(threeLayerJob({ units: "si", basis: "factored", bottom: timberSi(350, 22), core: timberSi(350, 60), top: timberSi(350, 22), connector: { ...nail, length: 75 } }));
    expect(short.ok).toBe(false);
    if (short.ok) return;
    expect(short.issues.map((i) => i.path)).toEqual(["connectors[0].length"]);
    expect(short.issues[0]!.message).toMatch(/does not reach the far outer part "(top|bottom)"/);
    expect(short.issues.some((i) => /\b0 mm thick/.test(i.message))).toBe(false);
  });
});

describe("a double-shear connector where the joint is not two contact lines on the faces of one part is refused", () => {
  test("a flange held on two webs (two lines at one level) is refused at the connector's shear field", () => {
    const job = threeLayerJob({ units: "si", basis: "factored", bottom: timberSi(350, 45), core: timberSi(350, 45), top: timberSi(350, 45), connector: { kind: "timber-bolt", standard: "EN1995-1-1", size: "M12", grade: "4.6", shear: "double" } });
    const j = job as unknown as { parts: { id: string; shape: { b: number; h: number }; x: number; y: number }[]; fastening: { joints: { held: string[] }[] } };
    // Two webs side by side under one flange: the flange's joint has two lines at one level.
    (j as unknown as { parts: unknown[] }).parts = [
      { ...j.parts[0]!, id: "bottom", shape: { type: "rectangle", b: 45, h: 200 }, x: 0, y: 0 },
      { ...j.parts[2]!, id: "top", shape: { type: "rectangle", b: 45, h: 200 }, x: 155, y: 0 },
      { ...j.parts[1]!, id: "core", shape: { type: "rectangle", b: 200, h: 45 }, x: 0, y: 200 },
    ];
    const d = design(job);
    expect(d.ok).toBe(false);
    if (!d.ok) expect(d.issues).toEqual([expect.objectContaining({ path: "connectors[0].shear", message: expect.stringContaining("not on opposite faces") })]);
  });

  test("a two-part member (one contact line) is refused for a bolt in double shear, at the connector's shear field", () => {
    const job = threeLayerJob({ units: "si", basis: "factored", bottom: timberSi(350, 45), core: timberSi(350, 45), top: timberSi(350, 45), connector: { kind: "timber-bolt", standard: "EN1995-1-1", size: "M12", grade: "4.6", shear: "double" } });
    const j = job as unknown as { parts: unknown[]; materials: unknown[]; fastening: { joints: unknown[] } };
    j.parts = j.parts.slice(0, 2);
    j.fastening.joints = [];
    const d = design(job);
    expect(d.ok).toBe(false);
    if (!d.ok) expect(d.issues).toEqual([expect.objectContaining({ path: "connectors[0].shear", message: expect.stringContaining("has 1") })]);
  });

  test("holding the two outer parts instead of the core gives the same central member and the same resistance", () => {
    const job = threeLayerJob({ units: "us", basis: "allowable", bottom: timberUs(0.55, 3.5), core: timberUs(0.42, 1.5), top: timberUs(0.55, 3.5), connector: { kind: "timber-bolt", standard: "NDS-2018", size: "3/4", shear: "double" } });
    const outers = structuredClone(job) as unknown as { fastening: { joints: { held: string[] }[] } };
    outers.fastening.joints[0]!.held = ["bottom", "top"];
    const r = designed(outers as unknown as typeof job).schedules.find((s) => s.joint === "bottom+top")!;
    expect(r.resistance[0]!.value).toBe(perLine(designed(job)));
    expect(r.resistance[0]!.steps[0]!.description).toContain('central member "core"');
  });

  test("the outer parts swapped (the stack upside down) give the same resistance", () => {
    const job = threeLayerJob({ units: "us", basis: "allowable", bottom: timberUs(0.42, 1.5), core: timberUs(0.55, 3.5), top: timberUs(0.5, 2.5), connector: { kind: "timber-bolt", standard: "NDS-2018", size: "5/8", shear: "double" } });
    expect(perLine(designed(flipped(job)))).toBe(perLine(designed(job)));
  });
});


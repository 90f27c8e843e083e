import { readFileSync } from "node:fs";
import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { prepareJob } from "../../../core/check-job.js";
import { ec5BucklingFactor, ec5ImperfectionShear } from "../../../core/column/ec5-mechanically-jointed.js";
import { designMember } from "../../../core/design-member.js";
import type { JobInput } from "../../../core/schema/job.js";
import { nailedEc5Column } from "./ec5-column-job.js";

const LBF = 4.4482216152605;
const IN = 25.4;
const PSI = LBF / IN ** 2;
const example = (name: string): JobInput => JSON.parse(readFileSync(new URL(`../../../fixtures/examples/${name}`, import.meta.url), "utf8"));
const design = (job: JobInput) => {
  const p = prepareJob(job);
  if (!p.ok) throw new Error(JSON.stringify(p.issues));
  return designMember(p.core);
};
/** NDS-2018 eq. 3.7-1 times K_f (eq. 15.3-1) [M], written out here. */
const cp = (FcE: number, Fc: number, c: number, Kf: number) => {
  const a = FcE / Fc;
  return Kf * ((1 + a) / (2 * c) - Math.sqrt(((1 + a) / (2 * c)) ** 2 - a / c));
};

describe("NDS-2018 §15.3 nailed laminations: three-ply 2x6 stud pack", () => {
  const r = design(example("stud-pack-wind.us.json"));
  const col = r.column!;
  it("applies, with K_f = 0.6 across the joints and 1 along them", () => {
    expect(col.applies).toBe(true);
    expect(col.axes.find((a) => a.axis === "y")!.factor).toBe(0.6); // NDS-2018 §15.3.2 [M]
    expect(col.axes.find((a) => a.axis === "x")!.factor).toBe(1);
  });
  it("capacity under D + 0.7S by hand: F_c*·C_P·A with C_P from eq. 3.7-1", () => {
    // 9 ft pinned, d2 = 3 × 1.5 = 4.5 in, l_e/d = 108/4.5 = 24 [D]; E_min 510,000 psi (the example's value).
    const FcE = (0.822 * 510_000) / 24 ** 2; // NDS-2018 §3.7.1 [M]
    const FcStar = 1150 * 1.1 * 1.15; // F_c·C_F·C_D, snow C_D = 1.15 (NDS-2018 Table 2.3.2 [M])
    const CP = cp(FcE, FcStar, 0.8, 0.6); // c = 0.8 sawn [M]
    // About x: l_e/d = 108/5.5, K_f = 1; the lesser C_P governs.
    const CPx = cp((0.822 * 510_000) / (108 / 5.5) ** 2, FcStar, 0.8, 1);
    const capacityLbf = FcStar * Math.min(CP, CPx) * 3 * 1.5 * 5.5;
    const asd3 = col.combinations.find((c) => c.combination === "ASD-3")!;
    expect(asd3.capacity / LBF).toBeCloseTo(capacityLbf, 3);
    expect(CP).toBeLessThan(CPx);
  });
  it("Euler load of the built-up section about y: π²·E_min·I/l_e² [D]", () => {
    const I = (5.5 * 4.5 ** 3) / 12;
    expect(col.axes.find((a) => a.axis === "y")!.euler / LBF).toBeCloseTo((Math.PI ** 2 * 510_000 * I) / 108 ** 2, 2);
  });
  it("nailing by §15.3.3 [M]: 6·t greatest spacing, 15D end distance, two rows on a 5.5 in face", () => {
    const D = 0.148; // 10d common, ASTM F1667 [M]
    for (const s of r.schedules) {
      expect(s.limits.maxSpacing / IN).toBeCloseTo(6 * 1.5, 6);
      expect(s.limits.minSpacing / IN).toBeCloseTo(20 * D, 6);
      expect(s.limits.endDistance / IN).toBeGreaterThanOrEqual(15 * D - 1e-9);
      expect(s.limits.sources.some((x) => x.includes("§15.3.3"))).toBe(true);
      expect(s.zones.every((z) => z.spacing <= 9 * IN + 1e-6)).toBe(true);
    }
    expect(col.joints.every((j) => j.rowsRequired === 2)).toBe(true); // 5.5 in > 3·1.5 in
  });
  it("checks wind and axial load together by eq. 3.9-3 [M]", () => {
    expect(r.checks.some((c) => c.id === "column-interaction")).toBe(true);
    expect(col.joints[0]!.governs).toMatch(/prescriptive|shear flow/);
  });
});

describe("NDS-2018 §15.3 bolted laminations: four-ply 2x6 post", () => {
  const r = design(example("girder-truss-post.us.json"));
  it("K_f = 0.75 across the joints; capacity by hand", () => {
    const col = r.column!;
    expect(col.axes.find((a) => a.axis === "y")!.factor).toBe(0.75); // NDS-2018 §15.3.2 [M]
    // 8 ft pinned: about y l_e/d = 96/6 = 16, about x 96/5.5 [D]; E_min 580,000 psi; F_c = 1350·1.1.
    const FcStar = 1350 * 1.1 * 1.15;
    const CP = Math.min(cp((0.822 * 580_000) / 16 ** 2, FcStar, 0.8, 0.75), cp((0.822 * 580_000) / (96 / 5.5) ** 2, FcStar, 0.8, 1));
    expect(col.combinations.find((c) => c.combination === "ASD-3")!.capacity / LBF).toBeCloseTo(FcStar * CP * 4 * 1.5 * 5.5, 3);
    expect(r.status.passes).toBe(true);
  });
  it("six laminations fall outside §15.3 and the result says so", () => {
    const job = example("girder-truss-post.us.json");
    job.parts.push({ ...job.parts[1]!, id: "ply-5", place: { on: "ply-4", side: "right" } } as never, { ...job.parts[1]!, id: "ply-6", place: { on: "ply-5", side: "right" } } as never);
    const out = design(job);
    expect(out.column!.applies).toBe(false);
    expect(out.column!.reason).toMatch(/two to five laminations/);
    expect(out.status.passes).toBe(false);
  });
});

describe("EN 1995-1-1 Annex C, k_c and eq. (C.5) [M]", () => {
  it("k_c at λ_rel = 1.0, β_c = 0.2 [D from eq. 6.27–6.29]", () => {
    const k = 0.5 * (1 + 0.2 * 0.7 + 1);
    expect(ec5BucklingFactor(1, 0.2)).toBeCloseTo(1 / (k + Math.sqrt(k * k - 1)), 12);
    expect(ec5BucklingFactor(0.25, 0.2)).toBe(1);
  });
  it("the connector shear for the imperfection in each slenderness range", () => {
    expect(ec5ImperfectionShear(120_000, 0.8, 20)).toBeCloseTo(120_000 / (120 * 0.8), 9); // λ_ef < 30
    expect(ec5ImperfectionShear(120_000, 0.8, 45)).toBeCloseTo((120_000 * 45) / (3600 * 0.8), 9); // 30 ≤ λ_ef < 60
    expect(ec5ImperfectionShear(120_000, 0.8, 80)).toBeCloseTo(120_000 / (60 * 0.8), 9); // λ_ef ≥ 60
  });
});

describe("built-up columns through designMember (properties)", () => {
  const base = example("stud-pack-wind.us.json");
  const count = (r: ReturnType<typeof design>) => r.schedules.reduce((s, x) => s + x.count, 0);
  const worst = (r: ReturnType<typeof design>) => Math.max(...r.column!.checks.map((c) => c.utilisation));
  it("more axial load never fewer connectors and never a lower utilisation", () => {
    fc.assert(
      fc.property(fc.integer({ min: 0, max: 6000 }), fc.integer({ min: 1, max: 6000 }), (P, extra) => {
        const a = structuredClone(base);
        a.compression!.loads[1]!.P = P;
        const b = structuredClone(base);
        b.compression!.loads[1]!.P = P + extra;
        const [ra, rb] = [design(a), design(b)];
        return count(rb) >= count(ra) && worst(rb) >= worst(ra) - 1e-12;
      }),
      { numRuns: 12 },
    );
  });
  it("a longer column never carries more", () => {
    fc.assert(
      fc.property(fc.integer({ min: 4, max: 14 }), fc.integer({ min: 1, max: 6 }), (h, more) => {
        const a = structuredClone(base);
        a.beam.spans = [h];
        const b = structuredClone(base);
        b.beam.spans = [h + more];
        const cap = (r: ReturnType<typeof design>) => Math.min(...r.column!.combinations.map((c) => c.capacity));
        return cap(design(b)) <= cap(design(a)) * (1 + 1e-12);
      }),
      { numRuns: 10 },
    );
  });
  it("swapping the laminations' order changes nothing", () => {
    const swapped = structuredClone(base);
    swapped.parts = [
      { ...swapped.parts[2]!, x: 0, y: 0, place: undefined } as never,
      { ...swapped.parts[1]!, place: { on: "ply-3", side: "right" } } as never,
      { ...swapped.parts[0]!, x: undefined, y: undefined, place: { on: "ply-2", side: "right" } } as never,
    ];
    const [a, b] = [design(base).column!, design(swapped).column!];
    expect(b.combinations.map((c) => c.capacity)).toEqual(a.combinations.map((c) => c.capacity));
    expect(b.combinations.map((c) => c.interaction)).toEqual(a.combinations.map((c) => c.interaction));
  });
});

describe("EN 1995-1-1 Annex C through designMember: nailed three-ply C24 column", () => {
  const r = design(nailedEc5Column());
  const col = r.column!;
  const value = (symbol: string) => col.steps.find((s) => s.symbol === symbol)!.value;
  it("λ_ef from the γ of Annex B (B.1) with l = l_ef, by hand [D]", () => {
    expect(col.applies).toBe(true);
    const gamma = value("γ (top)");
    // Plies 45 × 145 mm side by side: about y each ply's own I = 145·45³/12, the outer plies at a = 45 mm (B.1).
    const E = 11_000;
    const A = 45 * 145;
    const EIef = E * (3 * ((145 * 45 ** 3) / 12) + 2 * gamma * A * 45 ** 2);
    expect(value("(EI)_ef") / EIef).toBeCloseTo(1, 9);
    const lambdaEf = 3000 * Math.sqrt((3 * A) / (EIef / E)); // (C.1), (C.2)
    expect(value("λ_ef")).toBeCloseTo(lambdaEf, 6);
    // k_c from λ_rel = (λ/π)·√(f_c,0,k/E_0,05), β_c = 0.2 (6.21–6.29) [M]
    const lrel = (lambdaEf / Math.PI) * Math.sqrt(21 / 7_400);
    const k = 0.5 * (1 + 0.2 * (lrel - 0.3) + lrel ** 2);
    const kc = 1 / (k + Math.sqrt(k * k - lrel ** 2));
    expect(col.axes.find((a) => a.axis === "y")!.stability).toBeCloseTo(kc, 9);
    // V_d for λ_ef ≥ 60: F_c,d/(60·k_c) (C.5); F_c,d = 1.35·8 + 1.5·10 kN (EN 1990 eq. 6.10 [M])
    expect(value("V_d")).toBeCloseTo((1.35 * 8000 + 1.5 * 10_000) / (60 * kc), 6);
  });
  it("the schedules carry the buckling shear within the spacing taken in γ", () => {
    expect(r.status.passes).toBe(true);
    for (const s of r.schedules) {
      expect(s.limits.sources.some((x) => x.includes("spacing in γ"))).toBe(true);
      expect(s.zones.every((z) => z.spacing <= s.limits.maxSpacing + 1e-9)).toBe(true);
    }
    const flow = col.joints[0]!.bucklingFlow!;
    expect(flow).toBeGreaterThan(0);
  });
  it("more axial load never fewer connectors", () => {
    const count = (x: ReturnType<typeof design>) => x.schedules.reduce((s, k) => s + k.count, 0);
    fc.assert(
      fc.property(fc.integer({ min: 1, max: 10 }), fc.integer({ min: 1, max: 5 }), (snow, more) => count(design(nailedEc5Column({ dead: 8, snow: snow + more }))) >= count(design(nailedEc5Column({ dead: 8, snow })))),
      { numRuns: 8 },
    );
  });
});

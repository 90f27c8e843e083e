import { readFileSync } from "node:fs";
import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { prepareJob } from "../../../core/check-job.js";
import { spacedEta, spacedSlenderness } from "../../../core/column/ec5-spaced.js";
import { designMember } from "../../../core/design-member.js";
import type { JobInput } from "../../../core/schema/job.js";

const gallery = (): JobInput => JSON.parse(readFileSync(new URL("../../../fixtures/examples/gallery-spaced-post.si.json", import.meta.url), "utf8"));
const design = (job: JobInput) => {
  const p = prepareJob(job);
  if (!p.ok) throw new Error(JSON.stringify(p.issues));
  return designMember(p.core);
};
const spacedJob = (change: { height?: number; packSpacing?: number; packLength?: number; gap?: number }) => {
  const job = gallery() as JobInput & { compression: { spaced: { packSpacing: number; packLength: number } } };
  if (change.height !== undefined) job.beam.spans = [change.height];
  if (change.packSpacing !== undefined) job.compression.spaced.packSpacing = change.packSpacing;
  if (change.packLength !== undefined) job.compression.spaced.packLength = change.packLength;
  if (change.gap !== undefined) (job.parts[1]!.shape as { b: number }).b = change.gap;
  return job;
};
/** k_c of EN 1995-1-1 eq. (6.25)–(6.29) [M], written out here. */
const kcByHand = (lambdaRel: number, betaC: number) => {
  if (lambdaRel <= 0.3) return 1;
  const k = 0.5 * (1 + betaC * (lambdaRel - 0.3) + lambdaRel ** 2);
  return 1 / (k + Math.sqrt(k ** 2 - lambdaRel ** 2));
};

describe("EN 1995-1-1 Annex C.3 spaced column: the gallery post (two C24 shafts 60 × 160, nailed packs)", () => {
  const r = design(gallery());
  const col = r.column!;
  // Closed form [D]: shafts 60 wide (across the gap) × 160 deep, centres 120 apart (gap a = 60).
  const A = 2 * 60 * 160;
  const Iy = 2 * ((160 * 60 ** 3) / 12 + 60 * 160 * 60 ** 2);
  const lambda = 3000 * Math.sqrt(A / Iy);
  const lambda1 = (Math.sqrt(12) * 600) / 60; // C.3.2, λ_1 = √12·l_1/h [M]
  const eta = 4.5; // Table C.1, nailed packs, medium-term (imposed load) [M]
  const lambdaEf = Math.sqrt(lambda ** 2 + ((eta * 2) / 2) * lambda1 ** 2); // eq. (C.12) [M]
  const lambdaRel = (lambdaEf / Math.PI) * Math.sqrt(21 / 7400); // eq. (6.21) [M], f_c,0,k 21, E_0,05 7,400 (C24, EN 338 [M])
  const kc = kcByHand(lambdaRel, 0.2); // β_c 0.2 solid timber, eq. (6.29) [M]
  const N = 1.35 * 12_000 + 1.5 * 18_000; // EN 1990 eq. (6.10), γ_G 1.35, γ_Q 1.5 [M]
  const fcd = (0.8 * 21) / 1.3; // k_mod 0.8 medium-term service class 1 (Table 3.1) [M], γ_M 1.3 (Table 2.3) [M]
  const Vd = N / (60 * kc); // eq. (C.5), λ_ef ≥ 60 [M]
  const Td = (Vd * 600) / 120; // eq. (C.13), l_1 600, a_1 120 [M]

  it("applies, its conditions met", () => {
    expect(col.rule).toBe("en1995-c3-spaced");
    expect(col.applies, col.reason ?? "").toBe(true);
    expect(col.conditions.every((c) => c.met)).toBe(true);
  });
  it("λ, λ_1 and λ_ef by eq. (C.12) by hand", () => {
    const step = (s: string) => col.steps.find((x) => x.symbol === s)!.value;
    expect(lambda).toBeCloseTo(48.04, 2); // [D]
    expect(step("λ")).toBeCloseTo(lambda, 9);
    expect(step("λ_1")).toBeCloseTo(34.64, 2); // [D]
    expect(step("λ_ef")).toBeCloseTo(lambdaEf, 9);
    expect(lambdaEf).toBeCloseTo(87.79, 2); // [D]
    expect(col.axes.find((a) => a.axis === "y")!.slenderness).toBeCloseTo(lambdaEf, 9);
  });
  it("k_c from λ_ef by eq. (6.25)–(6.29) and the capacity k_c·f_c,0,d·A_tot", () => {
    expect(col.axes.find((a) => a.axis === "y")!.stability).toBeCloseTo(kc, 9);
    expect(kc).toBeCloseTo(0.3843, 4); // [D]
    const axial = col.checks.find((c) => c.id === "column-axial")!;
    expect(axial.demand).toBeCloseTo(N, 6);
    expect(axial.capacity).toBeCloseTo(kc * fcd * A, 3);
    expect(axial.passes).toBe(true);
  });
  it("T_d = V_d·l_1/a_1 (eq. C.13) on each pack, spread over l_2 − s_max of the pack", () => {
    const j = col.joints.find((x) => x.joint === "pack")!;
    expect(j.bucklingShear).toBeCloseTo(Td, 6);
    expect(Td).toBeCloseTo(9368, 0); // [D]
    // s_max = l_2/(⌈4/3⌉ + 1) = 120: at least 4 nails per shear plane in each pack (C.3.1 [M]) [D].
    expect(j.bucklingFlow).toBeCloseTo(Td / (360 - 120), 9);
    const s = r.schedules.find((x) => x.joint === "pack")!;
    expect(Math.max(...s.zones.map((z) => z.spacing))).toBeLessThanOrEqual(120);
    expect(s.passes).toBe(true);
  });
  it("η of Table C.1 [M] and λ_1 taken as at least 30 (C.3.2 [M])", () => {
    expect(spacedEta("packs", "glued", "permanent")).toBe(1);
    expect(spacedEta("packs", "nailed", "long")).toBe(4);
    expect(spacedEta("packs", "nailed", "short")).toBe(4.5);
    expect(spacedEta("packs", "bolted", "permanent")).toBe(3.5);
    expect(spacedEta("packs", "bolted", "medium")).toBe(7);
    expect(spacedEta("gussets", "glued", "long")).toBe(3);
    expect(spacedEta("gussets", "nailed", "instantaneous")).toBe(7);
    expect(spacedEta("gussets", "bolted", "short")).toBeNull();
    expect(spacedSlenderness(40, 20, 4, 2)).toBeCloseTo(Math.sqrt(40 ** 2 + 4 * 30 ** 2), 12);
  });
  it("outside C.3.1 [M]: λ_1 above 60, a gap over 3h, a pack shorter than 1.5a", () => {
    expect(design(spacedJob({ packSpacing: 1.0, height: 3.2 })).column!.applies).toBe(true); // λ_1 = 57.7
    const long = design(spacedJob({ packSpacing: 1.1, height: 3.6 })).column!; // λ_1 = 63.5
    expect(long.applies).toBe(false);
    expect(long.reason).toContain("λ_1");
    expect(design(spacedJob({ gap: 190 })).column!.reason).toContain("3·h");
    expect(design(spacedJob({ packLength: 80 })).column!.reason).toContain("1.5·a");
  });
});

describe("spaced column through designMember: properties", () => {
  const capacities = (job: JobInput) => {
    const col = design(job).column!;
    expect(col.applies, col.reason ?? "").toBe(true);
    return col.combinations.map((c) => c.capacity);
  };
  it("a longer column never has a higher capacity", () => {
    fc.assert(
      fc.property(fc.integer({ min: 180, max: 400 }), fc.integer({ min: 1, max: 60 }), (cm, more) => {
        const short = capacities(spacedJob({ height: cm / 100 }));
        const long = capacities(spacedJob({ height: (cm + more) / 100 }));
        return long.every((c, i) => c <= short[i]! * (1 + 1e-12));
      }),
      { numRuns: 8 },
    );
  });
  it("a larger pack spacing never gives a higher capacity", () => {
    fc.assert(
      fc.property(fc.integer({ min: 25, max: 95 }), fc.integer({ min: 1, max: 8 }), (cm, more) => {
        const close = capacities(spacedJob({ packSpacing: cm / 100, packLength: 200 }));
        const wide = capacities(spacedJob({ packSpacing: (cm + more) / 100, packLength: 200 }));
        return wide.every((c, i) => c <= close[i]! * (1 + 1e-12));
      }),
      { numRuns: 8 },
    );
  });
});

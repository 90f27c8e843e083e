import fc from "fast-check";
import { describe, expect, test } from "vitest";
import { prepareJob } from "../../../core/check-job.js";
import { FilletWeld, filletWeldKind } from "../../../core/connector/fillet-weld.js";
import { designMember } from "../../../core/design-member.js";
import type { JobInput } from "../../../core/schema/job.js";
import { expectClose } from "../../expect-close.js";
import "../../fast-check-setup.js";
import { weldedGirder } from "./connector-jobs.js";
import { context, IN, KIP, KSI, member, steel } from "./contexts.js";

// AISC 360-16 §J2.4: the strength of a welded joint is the lower of the base metal, R_n = F_nBM A_BM
// (eq. J2-2; Table J2.5 for fillets in shear: "base metal governed by J4"; §J4.2(b) shear rupture
// 0.60 F_u A_nv, φ 0.75, Ω 2.00) and the weld metal, R_n = F_nw A_we = 0.60 F_EXX × w/√2 (eq. J2-3,
// φ 0.75, Ω 2.00) [M]. A_BM is the fusion face, the leg w per unit length (the reading stated in the
// kind's assumptions). Numbers below are worked by hand from those equations [D].
const KIP_PER_IN = KIP / IN;
const plates = (fuA: number, fuB: number) => context(member("web", steel(fuA * KSI), 20 * IN, 0.5 * IN), member("flange", steel(fuB * KSI), 0.75 * IN, 12 * IN), { basis: "factored", units: "us" });
const aisc = (legIn: number, electrode: string) => FilletWeld.parse({ id: "w", kind: "fillet-weld", standard: "AISC-360-16", leg: legIn * IN, electrode });

describe("fillet welds: the base metal at the fusion face (AISC 360-16 §J2.4, §J4.2)", () => {
  test("an overmatched E110 1/4 in fillet on F_u = 58 ksi plates: base metal 0.75 × 0.6 × 58 × 0.25 = 6.525 kip/in governs, not the weld metal's 0.75 × 0.6 × 110 × 0.25/√2 = 8.750 kip/in [D]", () => {
    const r = filletWeldKind.resistancePerLength(aisc(1 / 4, "E110"), plates(58, 58));
    expectClose(r.value / KIP_PER_IN, 6.525, { rel: 1e-9 });
    expect(r.governing).toMatch(/base metal .* fusion face/);
    const weldMetal = r.modes!.find((m) => m.mode === "weld metal")!;
    expectClose(weldMetal.value / KIP_PER_IN, (0.75 * 0.6 * 110 * 0.25) / Math.SQRT2, { rel: 1e-9 });
    expectClose(weldMetal.value / KIP_PER_IN, 8.7504, { rel: 1e-4 });
  });
  test("ASD: the same joint gives 0.6 × 58 × 0.25/2.00 = 4.350 kip/in [D]", () => {
    const r = filletWeldKind.resistancePerLength(aisc(1 / 4, "E110"), { ...plates(58, 58), basis: "allowable" });
    expectClose(r.value / KIP_PER_IN, 4.35, { rel: 1e-9 });
  });
  test("matching E70 on F_u = 58 ksi: the weld metal, 5.5685 kip/in, still governs (base metal 6.525) [D]", () => {
    const r = filletWeldKind.resistancePerLength(aisc(1 / 4, "E70"), plates(58, 58));
    expectClose(r.value / KIP_PER_IN, 5.5685, { rel: 1e-4 });
    expect(r.governing).toMatch(/weld metal/);
  });
  test("the part with the lower F_u governs: E90 3/8 in, plates of 58 and 65 ksi → 0.75 × 0.6 × 58 × 0.375 = 9.7875 kip/in on the 58 ksi part [D]", () => {
    const r = filletWeldKind.resistancePerLength(aisc(3 / 8, "E90"), plates(65, 58));
    expectClose(r.value / KIP_PER_IN, 9.7875, { rel: 1e-9 });
    expect(r.governing).toContain('"flange"');
  });
  test("a steel part without F_u is refused with the material's field named (AISC needs it for the base metal)", () => {
    const ctx = context(member("web", { ...steel(400), tensileStrength: undefined }, 20 * IN, 0.5 * IN), member("flange", steel(400), 0.75 * IN, 12 * IN), { basis: "factored", units: "us" });
    const problems = filletWeldKind.problems!(aisc(1 / 4, "E70"), ctx);
    expect(problems).toEqual([expect.objectContaining({ on: "material", member: 0, field: "tensileStrength" })]);
  });
});

describe("property: through designMember, no AISC fillet weld is stronger than the base metal at its fusion face", () => {
  const electrodes = ["E60", "E70", "E80", "E90", "E100", "E110"] as const;
  test("per fillet: value ≤ 0.75 × 0.60 F_u,min × w and ≤ 0.75 × 0.60 F_EXX × w/√2, and equal to the smaller", () => {
    fc.assert(
      fc.property(fc.constantFrom(...electrodes), fc.integer({ min: 3, max: 6 }), fc.integer({ min: 380, max: 620 }), fc.integer({ min: 380, max: 620 }), (electrode, sixteenths, fuWeb, fuFlange) => {
        const w = (sixteenths / 16) * IN;
        const job = weldedGirder({ kind: "fillet-weld", standard: "AISC-360-16", leg: w, electrode });
        job.materials = [
          { id: "F", name: "flange steel", family: "steel", E: 200_000, density: 7850, yieldStrength: 250, tensileStrength: fuFlange },
          { id: "B", name: "web steel", family: "steel", E: 200_000, density: 7850, yieldStrength: 250, tensileStrength: fuWeb },
        ] as JobInput["materials"];
        job.parts = job.parts.map((p) => ({ ...p, material: p.id === "web" ? "B" : "F" }));
        const prepared = prepareJob(job);
        if (!prepared.ok) throw new Error(JSON.stringify(prepared.issues));
        const weld = designMember(prepared.core).welds[0]!;
        const fexx = Number(electrode.slice(1)) * KSI;
        const base = 0.75 * 0.6 * Math.min(fuWeb, fuFlange) * w;
        const metal = (0.75 * 0.6 * fexx * w) / Math.SQRT2;
        for (const r of weld.resistance) expectClose(r.value, Math.min(base, metal), { rel: 1e-9 });
      }),
      { numRuns: 40 },
    );
  });
});

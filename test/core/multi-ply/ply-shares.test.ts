import fc from "fast-check";
import { describe, expect, test } from "vitest";
import { readFileSync } from "node:fs";
import { prepareJob } from "../../../core/check-job.js";
import { designMember } from "../../../core/design-member.js";
import { convertJob } from "../../../core/units/convert-job.js";
import { interfaceTransfer, plyShares, type Ply } from "../../../core/multi-ply/ply-shares.js";
import { expectClose } from "../../expect-close.js";

// Hand calculations [D]: plies bending together share the load in proportion to E_j·I_j (equal curvature,
// any mechanics-of-materials text, e.g. Gere & Goodno ch. 6 on composite beams); a load arriving on one
// ply is passed across interface k by the plies beyond it: T_k = P·Σ_{j>k} share_j (statics of each ply).
// Ply sizes: 2x12 = 38 × 286 mm (REFERENCES §10, PS 20 metric equivalent [V]).
const lumber = (n: number): Ply[] => Array.from({ length: n }, () => ({ modulus: 11_000, thickness: 38, depth: 286 }));

describe("plyShares and interfaceTransfer, equal plies", () => {
  test("three equal plies loaded on the left face: shares 1/3 each, interfaces pass 2/3 and 1/3 of the load [D]", () => {
    expect(plyShares(lumber(3)).map((s) => Math.round(s * 1e12) / 1e12)).toEqual([1 / 3, 1 / 3, 1 / 3].map((s) => Math.round(s * 1e12) / 1e12));
    const t = interfaceTransfer(lumber(3), [{ face: "left", magnitude: 6 }]);
    expectClose(t.interfaces[0]!.force, 4, { rel: 1e-12 }, "T_1 = 2/3 · 6 N/mm");
    expectClose(t.interfaces[1]!.force, 2, { rel: 1e-12 }, "T_2 = 1/3 · 6 N/mm");
  });

  test("the same load on the right face passes the same amounts leftward [D]", () => {
    const t = interfaceTransfer(lumber(3), [{ face: "right", magnitude: 6 }]);
    expectClose(t.interfaces[0]!.force, -2, { rel: 1e-12 });
    expectClose(t.interfaces[1]!.force, -4, { rel: 1e-12 });
  });

  test("four equal plies on the left face: 3/4, 1/2, 1/4 of the load; from both faces equally: 1/2, 0, −1/2 of one face's load [D]", () => {
    const one = interfaceTransfer(lumber(4), [{ face: "left", magnitude: 1000 }]).interfaces.map((i) => i.force);
    [750, 500, 250].forEach((v, k) => expectClose(one[k]!, v, { rel: 1e-12 }, `T_${k + 1}`));
    const both = interfaceTransfer(lumber(4), [{ face: "left", magnitude: 1000 }, { face: "right", magnitude: 1000 }]).interfaces.map((i) => i.force);
    expectClose(both[0]!, 500, { rel: 1e-12 });
    expectClose(both[1]!, 0, { abs: 1e-9 });
    expectClose(both[2]!, -500, { rel: 1e-12 });
  });

  test("a load bearing on top of equal plies needs no transfer [D]", () => {
    for (const i of interfaceTransfer(lumber(3), [{ face: "top", magnitude: 10 }]).interfaces) expectClose(i.force, 0, { abs: 1e-12 });
  });
});

describe("plyShares with a steel flitch plate", () => {
  // Two 45 × 240 timbers (E = 11 000 MPa, C24 [M]) either side of a 10 × 240 steel plate (E = 210 000 MPa, EN 1993-1-1 §3.2.6 [M]).
  // EI_steel/EI_timber = (210 000·10)/(11 000·45) = 140/33, so the shares are 33/206, 140/206, 33/206 [D].
  const flitch: Ply[] = [
    { name: "timber", modulus: 11_000, thickness: 45, depth: 240 },
    { name: "plate", modulus: 210_000, thickness: 10, depth: 240 },
    { name: "timber", modulus: 11_000, thickness: 45, depth: 240 },
  ];

  test("shares 33/206, 140/206, 33/206; a left-face load passes 173/206 then 33/206 of itself [D]", () => {
    const s = plyShares(flitch);
    expectClose(s[0]!, 33 / 206, { rel: 1e-12 });
    expectClose(s[1]!, 140 / 206, { rel: 1e-12 });
    const t = interfaceTransfer(flitch, [{ face: "left", magnitude: 20_000 }]).interfaces;
    expectClose(t[0]!.force, (173 / 206) * 20_000, { rel: 1e-12 }, "T_1 = 16 796 N");
    expectClose(t[1]!.force, (33 / 206) * 20_000, { rel: 1e-12 }, "T_2 = 3204 N");
  });

  test("bearing on top (shared by ply thickness [CP]): each timber passes 0.45 − 33/206 = 0.28981 of the load into the plate [D]", () => {
    const t = interfaceTransfer(flitch, [{ face: "top", magnitude: 1 }]).interfaces;
    expectClose(t[0]!.force, 0.45 - 33 / 206, { rel: 1e-12 });
    expectClose(t[1]!.force, -(0.45 - 33 / 206), { rel: 1e-12 });
  });

  test("a plate shallower than the timbers counts by its own I = t·d³/12", () => {
    const shallow = [flitch[0]!, { ...flitch[1]!, depth: 200 }, flitch[2]!];
    const ei = [11_000 * 45 * 240 ** 3 / 12, 210_000 * 10 * 200 ** 3 / 12];
    expectClose(plyShares(shallow)[1]!, ei[1]! / (2 * ei[0]! + ei[1]!), { rel: 1e-12 });
  });
});

describe("interfaceTransfer invariants", () => {
  test("the plies carry all the load; one left-face load passes P·Σ_{j>k} share_j across interface k [D]", () => {
    const ply = fc.record({ modulus: fc.integer({ min: 5000, max: 210_000 }), thickness: fc.integer({ min: 5, max: 90 }), depth: fc.integer({ min: 150, max: 400 }) });
    fc.assert(
      fc.property(fc.array(ply, { minLength: 2, maxLength: 6 }), fc.integer({ min: 1, max: 50_000 }), fc.integer({ min: 0, max: 50_000 }), (plies, left, top) => {
        const t = interfaceTransfer(plies, [{ face: "left", magnitude: left }, { face: "top", magnitude: top }]);
        expectClose(t.plyLoads.reduce((a, b) => a + b, 0), left + top, { rel: 1e-12 });
        const alone = interfaceTransfer(plies, [{ face: "left", magnitude: left }]);
        const shares = plyShares(plies);
        alone.interfaces.forEach((i, k) => expectClose(i.force, left * shares.slice(k + 1).reduce((a, b) => a + b, 0), { rel: 1e-9, abs: 1e-9 }));
      }),
    );
  });

  test("equal plies under a load on top or at the bottom pass exactly nothing, not a rounding residue [D]", () => {
    // Each ply's load arrives in proportion to its share, so T_k = Σ (arriving_j − share_j·ΣP) = 0 exactly;
    // the sums in floating point left about 1e-17 of the load, designed as a demand.
    const ply = fc.record({ modulus: fc.integer({ min: 5000, max: 210_000 }), thickness: fc.double({ min: 5, max: 90, noNaN: true }), depth: fc.double({ min: 89, max: 400, noNaN: true }) });
    fc.assert(
      fc.property(ply, fc.integer({ min: 2, max: 8 }), fc.double({ min: 1e-3, max: 1e5, noNaN: true }), fc.constantFrom("top" as const, "bottom" as const), (p, n, magnitude, face) => {
        for (const i of interfaceTransfer(Array.from({ length: n }, () => ({ ...p })), [{ face, magnitude }]).interfaces) expect(i.force).toBe(0);
      }),
    );
  });
});

describe("a stud pack of equal plies under wind on the member, designed (fixtures/examples/stud-pack-wind.us)", () => {
  test("its nails carry no demand at any load, in either unit system: no required spacing, utilisation exactly 0 [D]", () => {
    const example = JSON.parse(readFileSync(new URL("../../../fixtures/examples/stud-pack-wind.us.json", import.meta.url), "utf8"));
    const designed = (job: unknown) => {
      const prepared = prepareJob(job);
      if (!prepared.ok) throw new Error(JSON.stringify(prepared.issues));
      return { job: prepared.job, result: designMember(prepared.core) };
    };
    fc.assert(
      fc.property(fc.double({ min: 1, max: 2000, noNaN: true }), (w) => {
        const job = structuredClone(example);
        job.beam.loads[0].w = w;
        const us = designed(job);
        // The same member converted to SI (the rounding test is relative, so no unit may bring the residue back).
        for (const { result } of [us, designed(convertJob(us.job, "si"))]) {
          expect(result.schedules.length).toBeGreaterThan(0);
          for (const s of result.schedules) {
            expect(s.requiredSpacing.every((r) => r === null)).toBe(true);
            expect(s.perCombination.every((c) => c.maxUtilisation === 0)).toBe(true);
          }
        }
      }),
      { numRuns: 20 },
    );
  });
});

import { readFileSync } from "node:fs";
import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { prepareJob } from "../../../core/check-job.js";
import { designMember } from "../../../core/design-member.js";
import type { JobInput } from "../../../core/schema/job.js";
import { expectClose } from "../../expect-close.js";

const IN = 25.4;
const KIP = 4448.2216152605;
const example = (): JobInput => JSON.parse(readFileSync(new URL("../../../fixtures/examples/double-angle-strut.us.json", import.meta.url), "utf8"));
const design = (job: JobInput) => {
  const p = prepareJob(job);
  if (!p.ok) throw new Error(JSON.stringify(p.issues));
  return designMember(p.core);
};
const check = (r: ReturnType<typeof design>, id: string) => r.column!.checks.find((c) => c.id === id)!;
const stepValue = (r: ReturnType<typeof design>, symbol: string) => r.column!.steps.find((s) => s.symbol === symbol)!.value;

/**
 * One L4×3½×⅜ (long leg vertical, the back) as two rectangles, in inches [D]: the back 0.375 × 4, the
 * outstanding leg 3.125 × 0.375 at the bottom; the pair at one level, the packing left out.
 */
const angle = (() => {
  const A1 = 0.375 * 4;
  const A2 = 3.125 * 0.375;
  const A = A1 + A2;
  const ybar = (A1 * 2 + A2 * 0.1875) / A;
  const xbar = (A1 * 0.1875 + A2 * (0.375 + 3.125 / 2)) / A;
  const Ix = (0.375 * 4 ** 3) / 12 + A1 * (2 - ybar) ** 2 + (3.125 * 0.375 ** 3) / 12 + A2 * (0.1875 - ybar) ** 2;
  const Iy = (4 * 0.375 ** 3) / 12 + A1 * (0.1875 - xbar) ** 2 + (0.375 * 3.125 ** 3) / 12 + A2 * (0.375 + 3.125 / 2 - xbar) ** 2;
  const Ixy = A1 * (0.1875 - xbar) * (2 - ybar) + A2 * (0.375 + 3.125 / 2 - xbar) * (0.1875 - ybar);
  const Iz = (Ix + Iy) / 2 - Math.sqrt(((Ix - Iy) / 2) ** 2 + Ixy ** 2);
  return { A, Ix, rz: Math.sqrt(Iz / A) };
})();
const pair = { A: 2 * angle.A, Ix: 2 * angle.Ix, rx: Math.sqrt(angle.Ix / angle.A) };
/** AISC 360-16 eq. E3-4, E3-2 (inelastic, L_c/r ≤ 4.71√(E/F_y)), in ksi [D]. */
const Fcr = (slenderness: number) => {
  const Fe = (Math.PI ** 2 * 29_000) / slenderness ** 2;
  return 0.658 ** (50 / Fe) * 50;
};

describe("AISC 360-16 §E6 through designMember: double angles back to back with stitch bolts", () => {
  it("the example (Design Example E.5's strut: 2L4×3½×⅜ LLBB, ¾ in apart, 8 ft, F_y = 50 ksi) designs, passes and takes aisc-e6", () => {
    const r = design(example());
    expect(r.column!.rule).toBe("aisc-e6");
    expect(r.column!.applies).toBe(true);
    expect(r.status.passes).toBe(true);
    expect(r.column!.joints[0]!.notes.join(" ")).toContain("no force on the intermediate connectors");
  });

  it("x-x flexural buckling governs: φ_c P_n by hand from the closed-form section [D], and 157 kips in Example E.5 [V] (within 1 %, fillets left out)", () => {
    const r = design(example());
    const c = check(r, "column-axial");
    const phiPn = 0.9 * Fcr(96 / pair.rx) * pair.A; // kips [D]
    expectClose(c.capacity / KIP, phiPn, { rel: 1e-9 }, "φ_c F_cr A_g [D]");
    expectClose(c.capacity / KIP, 157, { rel: 0.01 }, "Example E.5 φ_c P_n [V]");
    expect(c.title).toContain("flexural buckling about x");
    // P_u = 1.2·20 + 1.6·60 = 120 kips plus 1.2 × the self-weight of the angles and packing over 8 ft (ASCE 7-22 §2.3.1 [V]).
    expect(c.demand / KIP).toBeGreaterThan(120);
    expect(c.demand / KIP).toBeLessThan(120.5);
  });

  it("a_max = 0.75 r_i (L_c/r)_max with r_i = r_z of one angle [D]; 41.4 in in Example E.5 [V] (r_z 0.719 there, 0.727 without fillets)", () => {
    const r = design(example());
    const aMax = 0.75 * angle.rz * (96 / pair.rx); // in [D]
    expectClose(stepValue(r, "a_max") / IN, aMax, { rel: 1e-9 }, "[D]");
    expectClose(stepValue(r, "a_max") / IN, 41.4, { rel: 0.015 }, "[V]");
    expectClose(stepValue(r, "r_i") / IN, angle.rz, { rel: 1e-9 });
    // The bolts' own §J3.5 limit, 24t = 9 in for the ⅜ in legs, is closer still and governs the schedule.
    const s = r.schedules[0]!;
    expectClose(s.limits.maxSpacing / IN, 9, { rel: 1e-9 }, "AISC 360-16 §J3.5(a): 24 × 0.375 [V]");
    expect(Math.max(...s.zones.map((z) => z.spacing)) / IN).toBeLessThanOrEqual(9 + 1e-9);
  });

  it("a short strut: the ¾ rule falls below the bolts' 9 in and becomes the schedule's greatest spacing [D]", () => {
    const job = example();
    job.beam.spans = [1.5];
    const r = design(job);
    const aMax = 0.75 * angle.rz * (18 / pair.rx); // in, (L_c/r)_max about x [D]
    expect(aMax).toBeLessThan(9);
    expectClose(r.schedules[0]!.limits.maxSpacing / IN, aMax, { rel: 1e-9 });
    expect(r.schedules[0]!.limits.sources.join(" ")).toContain("§E6.2(a)");
    expect(Math.max(...r.schedules[0]!.zones.map((z) => z.spacing)) / IN).toBeLessThanOrEqual(aMax);
  });

  it("bending with compression: AISC H1-1a with M_c = 0.9 F_y Z_x and B_1 = 1/(1 − P/P_e1), by hand [D]", () => {
    const job = example();
    job.beam.selfWeight = false;
    job.compression!.loads = [{ category: "dead", label: "", P: 40_000 }];
    job.beam.loads = [{ type: "uniform", category: "dead", label: "purlin load", w: 300 }] as never;
    const r = design(job);
    // Dead only: ASCE 7-22 1.4D governs [V]. P = 56 kips, M = 1.4 × 0.3 × 8²/8 = 3.36 kip·ft.
    const P = 1.4 * 40;
    const M = ((1.4 * 0.3 * 8 ** 2) / 8) * 12; // kip·in
    // Z_x: plastic neutral axis 0.4375 in up (2.625 in² of the legs below 0.375 in, then 0.75 in wide) [D].
    const yp = 0.375 + (pair.A / 2 - 7 * 0.375) / 0.75;
    const Z = 7 * 0.375 * (yp - 0.1875) + (0.75 * (yp - 0.375) ** 2) / 2 + (0.75 * (4 - yp) ** 2) / 2;
    const Mc = 0.9 * 50 * Z;
    const Pc = 0.9 * Fcr(96 / pair.rx) * pair.A;
    const Pe1 = (Math.PI ** 2 * 29_000 * pair.Ix) / 96 ** 2;
    const B1 = 1 / (1 - P / Pe1);
    expect(P / Pc).toBeGreaterThanOrEqual(0.2);
    const h1 = P / Pc + (8 / 9) * ((B1 * M) / Mc); // eq. H1-1a [M]
    const c = check(r, "column-interaction");
    // The moment is the largest at the analysis stations (core/column/column-rules.ts), within 1e-4 of wL²/8.
    expectClose(c.demand, h1, { rel: 1e-4 }, "H1-1a [D]");
    expectClose(stepValue(r, "Z_x") / IN ** 3, Z, { rel: 1e-9 });
  });

  it("auto picks aisc-e6 for steel parts with AISC bolts; an unknown packing part is refused with its field", () => {
    const job = example();
    job.compression!.rule = "auto";
    expect(design(job).column!.rule).toBe("aisc-e6");
    const bad = example();
    bad.compression!.packing = ["gusset"];
    const p = prepareJob(bad);
    expect(p.ok).toBe(false);
    if (!p.ok) expect(p.issues.some((i) => i.path === "compression.packing[0]")).toBe(true);
  });

  it("slender legs (b/t > 0.45√(E/F_y), AISC 360-16 Table B4.1a case 3 [M]) put the strut outside the rule, with the reason", () => {
    const job = example();
    for (const p of job.parts) if (p.shape.type === "angle") Object.assign(p.shape, { d: 5, b: 3, t: 0.25 });
    (job.parts[1]!.shape as { h: number }).h = 5;
    const col = design(job).column!;
    expect(col.applies).toBe(false);
    expect(col.reason).toContain("slender");
  });
});

describe("AISC 360-16 §E6 through designMember (properties)", () => {
  const count = (r: ReturnType<typeof design>) => r.schedules.reduce((s, x) => s + x.count, 0);
  const capacity = (r: ReturnType<typeof design>) => check(r, "column-axial").capacity;
  it("a longer strut never has a higher capacity", () => {
    fc.assert(
      fc.property(fc.integer({ min: 2, max: 16 }), fc.integer({ min: 1, max: 8 }), (h, more) => {
        const a = example();
        a.beam.spans = [h];
        const b = example();
        b.beam.spans = [h + more];
        return capacity(design(b)) <= capacity(design(a)) * (1 + 1e-12);
      }),
      { numRuns: 10 },
    );
  });
  it("more axial load never fewer connectors (snug-tight bolts, braced about x at mid-height, so the modified slenderness about y governs)", () => {
    const strut = (live: number) => {
      const j = example();
      j.beam.spans = [12];
      (j.connectors[0] as { slipCritical: string }).slipCritical = "no";
      j.compression!.x = { ends: "pinned-pinned", bracedAt: [6] };
      j.compression!.loads[1]!.P = live;
      return j;
    };
    fc.assert(
      fc.property(fc.integer({ min: 10, max: 140 }), fc.integer({ min: 1, max: 60 }), (live, extra) => count(design(strut((live + extra) * 1000))) >= count(design(strut(live * 1000)))),
      { numRuns: 10 },
    );
  });
});

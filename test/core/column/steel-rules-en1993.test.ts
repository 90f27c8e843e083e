import { readFileSync } from "node:fs";
import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { prepareJob } from "../../../core/check-job.js";
import { designMember } from "../../../core/design-member.js";
import type { JobInput } from "../../../core/schema/job.js";
import { expectClose } from "../../expect-close.js";

const example = (): JobInput => JSON.parse(readFileSync(new URL("../../../fixtures/examples/bracing-double-channel.si.json", import.meta.url), "utf8"));
const design = (job: JobInput) => {
  const p = prepareJob(job);
  if (!p.ok) throw new Error(JSON.stringify(p.issues));
  return designMember(p.core);
};
const check = (r: ReturnType<typeof design>, id: string) => r.column!.checks.find((c) => c.id === id)!;
const stepValue = (r: ReturnType<typeof design>, symbol: string) => r.column!.steps.find((s) => s.symbol === symbol)!.value;

const E = 210_000;
const fy = 235;
/**
 * One UPN 100 as the program models a channel (root fillets left out, flanges of mean thickness): the
 * web 6 × 100 and two flanges (50 − 6) × 8.5, in mm [D]; the pair back to back, webs 10 mm apart.
 */
const channel = (() => {
  const d = 100, bf = 50, tf = 8.5, tw = 6;
  const Aw = d * tw;
  const Af = (bf - tw) * tf;
  const A = Aw + 2 * Af;
  const xw = tw / 2;
  const xf = tw + (bf - tw) / 2;
  const xbar = (Aw * xw + 2 * Af * xf) / A; // from the back of the web
  const Iy = (d * tw ** 3) / 12 + Aw * (xw - xbar) ** 2 + 2 * ((tf * (bf - tw) ** 3) / 12 + Af * (xf - xbar) ** 2);
  const Ix = (tw * d ** 3) / 12 + 2 * (((bf - tw) * tf ** 3) / 12 + Af * (d / 2 - tf / 2) ** 2);
  return { A, xbar, Ix, Iy, iMin: Math.sqrt(Math.min(Ix, Iy) / A) };
})();
const gap = 10;
const pair = {
  A: 2 * channel.A,
  Ix: 2 * channel.Ix,
  Iy: 2 * (channel.Iy + channel.A * (gap / 2 + channel.xbar) ** 2),
  h0: gap + 2 * channel.xbar,
};
/** χ of EN 1993-1-1 eq. (6.49) with α of Table 6.1 [M], written out here; λ̄ = (L_cr/i)/(π√(E/f_y)) (6.50) [M]. */
const chi = (slenderness: number, alpha: number) => {
  const lambda = slenderness / (Math.PI * Math.sqrt(E / fy));
  const phi = 0.5 * (1 + alpha * (lambda - 0.2) + lambda ** 2);
  return Math.min(1, 1 / (phi + Math.sqrt(phi * phi - lambda * lambda)));
};

describe("EN 1993-1-1 §6.4.4 through designMember: two channels back to back with packing plates", () => {
  it("the example (VB-4) designs, passes and takes en1993-6.4; auto picks it for EN 1993-1-8 bolts on steel", () => {
    const r = design(example());
    expect(r.column!.rule).toBe("en1993-6.4");
    expect(r.column!.applies).toBe(true);
    expect(r.status.passes).toBe(true);
    const job = example();
    job.compression!.rule = "auto";
    expect(design(job).column!.rule).toBe("en1993-6.4");
  });

  it("i_min of one channel and the Table 6.9 limit 15 i_min [M] by closed form [D]; it becomes the schedule's greatest spacing or less", () => {
    const r = design(example());
    expectClose(stepValue(r, "i_min"), channel.iMin, { rel: 1e-9 }, "i_min = √(I_z/A) of one channel [D]");
    expectClose(stepValue(r, "a_max"), 15 * channel.iMin, { rel: 1e-9 }, "EN 1993-1-1 Table 6.9: 15 i_min [M]");
    // UPN 100: i_z = 1.47 cm in the section tables [M]; the program's square-edged channel gives 15.7 mm (no root fillets, mean flange).
    expectClose(channel.iMin, 14.7, { rel: 0.08 }, "UPN 100 i_z [M]");
    const s = r.schedules[0]!;
    expect(s.limits.maxSpacing).toBeLessThanOrEqual(15 * channel.iMin * (1 + 1e-9));
    expect(Math.max(...s.zones.map((z) => z.spacing))).toBeLessThanOrEqual(stepValue(r, "a") * (1 + 1e-9));
  });

  it("N_b,Rd = χ A f_y/γ_M1 of the integral member, curve c (U-sections, Table 6.2 [M]), γ_M1 = 1.0 [M]; about x at 2.5 m governs over y braced at 1.25 m [D]", () => {
    const r = design(example());
    const ix = Math.sqrt(pair.Ix / pair.A);
    const iy = Math.sqrt(pair.Iy / pair.A);
    const lambdaX = 2500 / ix / (Math.PI * Math.sqrt(E / fy));
    expectClose(stepValue(r, "λ̄ (x)"), lambdaX, { rel: 1e-9 }, "λ̄ about x [D]");
    expectClose(lambdaX, 0.679, { rel: 1e-3 }, "λ̄ about x [D]");
    const NbRdX = chi(2500 / ix, 0.49) * pair.A * fy;
    const NbRdY = chi(1250 / iy, 0.49) * pair.A * fy;
    expect(NbRdX).toBeLessThan(NbRdY);
    const c = check(r, "column-axial");
    expectClose(c.capacity, NbRdX, { rel: 1e-9 }, "N_b,Rd [D]");
    expectClose(c.capacity / 1000, 467.2, { rel: 1e-3 }, "N_b,Rd, kN [D]");
    expectClose(stepValue(r, "χ (x)"), 0.7375, { rel: 1e-3 }, "χ, curve c at λ̄ = 0.679 [D]; 0.74 read from EN 1993-1-1 Figure 6.4 [M]");
    // N_Ed of EN-2a: 1.35 × 60 + 1.5 × 110 = 246 kN plus 1.35 × the self-weight (EN 1990 eq. 6.10, Table A1.2(B) [M]).
    expect(c.demand / 1000).toBeGreaterThan(246);
    expect(c.demand / 1000).toBeLessThan(247.5);
  });

  it("the packing plates' shear V_Ed = π M_Ed/L with e_0 = L/500 and the battened stiffness (§6.4.1, §6.4.3, §6.4.4(2) [M]) by closed form [D], as a flow V_Ed/h_0", () => {
    const r = design(example());
    const N = check(r, "column-axial").demand;
    const a = stepValue(r, "a");
    const L = 1250; // about y (the axis that shears the bolts), braced at mid-height
    const Ich = channel.Iy;
    const Ieff = 0.5 * pair.h0 ** 2 * channel.A + 2 * Ich; // μ = 1: λ = L/i_0 ≤ 75 (Table 6.8 [M])
    expectClose(Ieff, pair.Iy, { rel: 1e-12 }, "I_eff = I_y of the pair for μ = 1 [D]");
    const Ib = (100 * (2 * 30) ** 3) / 12; // the plate 100 deep, taken 2e_1 = 2 × 30 mm long (the bolts' given end distance)
    const Sv = Math.min((24 * E * Ich) / (a * a * (1 + (2 * Ich * pair.h0) / (Ib * a))), (2 * Math.PI ** 2 * E * Ich) / (a * a));
    const Ncr = (Math.PI ** 2 * E * Ieff) / L ** 2;
    const M = (N * (L / 500)) / (1 - N / Ncr - N / Sv);
    const V = (Math.PI * M) / L;
    const j = r.column!.joints[0]!;
    expectClose(j.bucklingShear!, V, { rel: 1e-9 }, "V_Ed [D]");
    expectClose(j.bucklingFlow!, V / pair.h0, { rel: 1e-9 }, "q = V_Ed/h_0 [D]");
    // The schedule meets it: the buckling shear is among the joint's combinations (the joint is balanced, Q = 0, so nothing else loads it).
    const s = r.schedules[0]!;
    const buckling = s.perCombination.filter((p) => p.combination.includes("buckling shear"));
    expect(buckling.length).toBe(3);
    expect(Math.max(...buckling.map((p) => p.maxUtilisation))).toBeGreaterThan(0);
  });

  it("basis allowable is refused at basis", () => {
    const job = example();
    job.basis = "allowable";
    job.combinations = { set: "asce7-22-allowable" } as JobInput["combinations"];
    const p = prepareJob(job);
    expect(p.ok).toBe(false);
    if (!p.ok) expect(p.issues.some((i) => i.path === "basis" && i.message.includes("factored"))).toBe(true);
  });

  it("two angles back to back take curve b (L-sections, Table 6.2 [M]); slender legs, (b + h)/2t > 11.5ε (Table 5.2 [M]), are outside the rule", () => {
    const angles = (t: number): JobInput => {
      const j = JSON.parse(readFileSync(new URL("../../../fixtures/examples/double-angle-strut.us.json", import.meta.url), "utf8")) as JobInput;
      j.connectors[0] = { id: "B34", kind: "steel-bolt", standard: "EN1993-1-8", size: "M20", grade: "8.8", shear: "double" } as JobInput["connectors"][number];
      for (const p of j.parts) if (p.shape.type === "angle") p.shape.t = t;
      j.compression!.rule = "auto";
      return j;
    };
    const thick = design(angles(0.5)).column!;
    expect(thick.rule).toBe("en1993-6.4");
    expect(thick.applies).toBe(true);
    expect(thick.steps.find((x) => x.symbol === "curve")!.value).toBe(0.34); // α of curve b, Table 6.1 [M]
    // L4×3½×⅜ at F_y = 50 ksi: (4 + 3.5)/(2 × 0.375) = 10.0 > 11.5 √(235/344.7) = 9.50 [D]
    const thin = design(angles(0.375)).column!;
    expect(thin.applies).toBe(false);
    expect(thin.reason).toContain("class 4");
  });

  it("two unequal channels are outside the rule, with the reason", () => {
    const job = example();
    (job.parts[2]!.shape as { tf: number }).tf = 7;
    const col = design(job).column!;
    expect(col.applies).toBe(false);
    expect(col.reason).toContain("two equal angles or two equal channels");
  });
});

describe("EN 1993-1-1 §6.4.4 through designMember (properties)", () => {
  const count = (r: ReturnType<typeof design>) => r.schedules.reduce((s, x) => s + x.count, 0);
  const capacity = (r: ReturnType<typeof design>) => check(r, "column-axial").capacity;
  it("a longer member never has a higher capacity", () => {
    fc.assert(
      fc.property(fc.integer({ min: 5, max: 60 }), fc.integer({ min: 1, max: 20 }), (h, more) => {
        const a = example();
        a.beam.spans = [h / 10];
        a.compression!.y = { ends: "pinned-pinned", bracedAt: [] };
        const b = example();
        b.beam.spans = [(h + more) / 10];
        b.compression!.y = { ends: "pinned-pinned", bracedAt: [] };
        return capacity(design(b)) <= capacity(design(a)) * (1 + 1e-12);
      }),
      { numRuns: 10 },
    );
  });
  it("more axial load never fewer connectors (M12 4.6 bolts over 4 m unbraced, so the packing shear sets the spacing, up to beyond N_cr)", () => {
    const post = (wind: number) => {
      const j = example();
      j.beam.spans = [4];
      j.compression!.y = { ends: "pinned-pinned", bracedAt: [] };
      Object.assign(j.connectors[0]!, { size: "M12", grade: "4.6" });
      j.compression!.loads[1]!.P = wind;
      return j;
    };
    fc.assert(
      fc.property(fc.integer({ min: 5, max: 200 }), fc.integer({ min: 1, max: 60 }), (wind, extra) => count(design(post(wind + extra))) >= count(design(post(wind)))),
      { numRuns: 12 },
    );
    // The property has teeth: at 120 kN the packing shear needs the bolts closer than at 10 kN.
    expect(count(design(post(120)))).toBeGreaterThan(count(design(post(10))));
  });
});

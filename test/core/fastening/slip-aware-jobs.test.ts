import { describe, expect, test } from "vitest";
import { prepareJob } from "../../../core/check-job.js";
import { designMember } from "../../../core/design-member.js";
import type { JobInput } from "../../../core/schema/job.js";
import { expectClose } from "../../expect-close.js";
import { clone, plankIJob } from "../../job-builders.js";

// Moved from the stand-alone slip-aware spacing module onto whole members. Section and demand of
// REFERENCES §3.4: three 20 × 100 planks nailed into an I (I = 16.20e6 mm⁴, Q = 120 000 mm³), L = 4 m,
// w = 0.25 N/mm, F = 100 N per nail: rigid s_req = F·I/(Q·V) = 27 mm at V = 500 N [D]. Slip moduli: C24
// E = 11 000 MPa (EN 338 [M]); nail d = 3.1, ρ_m = 420: K_ser = 709.32 N/mm, K_u = 2/3 K_ser = 472.88 N/mm
// (EN 1995-1-1 Table 7.1 and eq. 2.1 [M], REFERENCES §6.2 [D]). γ by Annex B (B.5), F_i by (B.10) [M].
const E = 11_000;
function plankI(model: "rigid" | "slip-aware", w = 0.25): JobInput {
  const job = clone(plankIJob());
  job.basis = "factored";
  job.materials = [{ id: "W", name: "C24", E, density: 0 }];
  job.connectors = [{ id: "N", kind: "rated", label: "3.1 mm nail", resistance: 100, minSpacing: 10, maxSpacing: 300, slipModulus: 709.32, ultimateSlipModulus: 472.88 } as JobInput["connectors"][number]];
  job.beam = { ...job.beam, loads: [{ type: "uniform", category: "dead", w }] };
  job.compositeAction = { model };
  return job;
}

const run = (job: JobInput) => {
  const p = prepareJob(job);
  if (!p.ok) throw new Error(JSON.stringify(p.issues));
  return designMember(p.core);
};

describe("slip-aware spacing design of the plank I (EN 1995-1-1 Annex B), whole member", () => {
  test("the rigid design needs s = F·I/(Q·V) = 100 × 16.2e6/(120 000 × 500) = 27 mm at the support (REFERENCES §3.4 [D])", () => {
    const result = run(plankI("rigid"));
    for (const s of result.schedules) expectClose(s.requiredSpacing[0]!, 27, { rel: 1e-9 });
  });

  const slip = run(plankI("slip-aware"));
  const rigid = run(plankI("rigid"));
  test("converges, and the slip-aware schedules need no more connectors than the rigid ones", () => {
    const c = slip.composite!;
    expect(c.applies).toBe(true);
    expect(c.converged).toBe(true);
    expect(c.iterations).toBeGreaterThanOrEqual(1);
    for (const s of slip.schedules) expect(s.count).toBeLessThanOrEqual(rigid.schedules.find((r) => r.joint === s.joint)!.count);
    expect(slip.status.passes).toBe(true);
  });

  test("the chosen spacings carry themselves: γ from (B.5) at s_ef = 0.75 s_min + 0.25 s_max, (EI)_ef and F = γ·E·A·a·s·V/(EI)_ef ≤ 100 N in every zone, by hand [D]", () => {
    const c = slip.composite!;
    const A1 = 2000;
    const a1 = 60; // symmetric: a_2 = 0
    for (const j of c.joints) {
      const s = slip.schedules.find((x) => x.joint === j.joint)!;
      const spacings = s.zones.map((z) => z.spacing);
      const sEf = 0.75 * Math.min(...spacings) + 0.25 * Math.max(...spacings);
      expectClose(j.spacing, sEf, { rel: 1e-9 }, "s_ef");
      expect(Math.max(...spacings)).toBeLessThanOrEqual(4 * Math.min(...spacings) + 1e-9);
      const gamma = 1 / (1 + (Math.PI ** 2 * E * A1 * sEf) / (472.88 * 4000 ** 2));
      expectClose(j.gammaUltimate, gamma, { rel: 1e-9 }, "γ at s_ef with K_u");
      const EI = E * ((20 * 100 ** 3) / 12 + 2 * ((100 * 20 ** 3) / 12)) + 2 * gamma * E * A1 * a1 ** 2;
      expectClose(c.stiffness!.ultimate, EI, { rel: 1e-9 }, "(EI)_ef");
      expectClose(j.flowFactorSlip, (gamma * E * A1 * a1) / EI, { rel: 1e-9 }, "q/V with slip");
      for (const z of s.zones) {
        // The largest V = w(L/2 − x) over the zone widened by half a spacing each side (within the member).
        const [lo, hi] = [Math.max(0, z.from - z.spacing / 2), Math.min(4000, z.to + z.spacing / 2)];
        const V = 0.25 * Math.max(Math.abs(2000 - lo), Math.abs(2000 - hi));
        const F = (gamma * E * A1 * a1 * z.spacing * V) / EI;
        expect(F).toBeLessThanOrEqual(100 * (1 + 1e-9));
        // The rigid force at the same spacing, Q·s·V/I, is larger: the glued-rigid reading would overload these nails.
        expect((120_000 * z.spacing * V) / 16.2e6).toBeGreaterThan(F);
      }
    }
    expect(c.stiffness!.rigid).toBeGreaterThan(c.stiffness!.ultimate);
  });

  test("a demand the smallest allowed spacing cannot carry is reported, not hidden: w = 10 N/mm needs 27/40 = 0.675 mm < 10 mm at the support", () => {
    const heavy = run(plankI("slip-aware", 10));
    expect(heavy.status.passes).toBe(false);
    expect(heavy.schedules.some((s) => s.infeasible !== null)).toBe(true);
  });
});

import { describe, expect, test } from "vitest";
import { prepareJob } from "../../../core/check-job.js";
import { designMember } from "../../../core/design-member.js";
import type { JobInput } from "../../../core/schema/job.js";
import { expectClose } from "../../expect-close.js";
import { nailedIJob } from "../../job-builders.js";

// The member: REFERENCES §6.6 worked case (symmetric nailed I), see nailedIJob.

const run = (job: JobInput) => {
  const p = prepareJob(job);
  if (!p.ok) throw new Error(JSON.stringify(p.issues));
  return designMember(p.core);
};

describe("composite action (EN 1995-1-1 Annex B)", () => {
  test("the rigid and no-connection limits of the worked case: (EI) = 2.132790e12 and 3.500475e11 N·mm² (REFERENCES §6.6 [D])", () => {
    const c = run(nailedIJob("rigid")).composite!;
    expect(c.applies).toBe(true);
    expectClose(c.stiffness!.rigid, 2.13279e12, { rel: 1e-6 });
    expectClose(c.stiffness!.noConnection, 3.500475e11, { rel: 1e-6 });
    // The rigid q/V equals Q/I of the transformed section: Q = 120·45·122.5, I = 193.890e6 mm⁴.
    for (const j of c.joints) expectClose(j.flowFactorRigid, (120 * 45 * 122.5) / 193.89e6, { rel: 1e-5 });
  });

  test("at s = 50 mm with K_ser: γ = 1/(1 + π²·E·A·s/(K·l²)) = 0.376931 and (EI)_ef = 1.022019e12 (Annex B (B.5), (B.1) [M]; numbers [D])", () => {
    const c = run(nailedIJob("rigid")).composite!;
    const gamma = 1 / (1 + (Math.PI ** 2 * 11_000 * 120 * 45 * 50) / (709.32 * 5000 ** 2));
    expectClose(gamma, 0.376931, { rel: 1e-5 });
    for (const j of c.joints) expectClose(j.gammaServiceability, gamma, { rel: 1e-9 });
    expectClose(c.stiffness!.serviceability, 1.022019e12, { rel: 1e-5 });
    expectClose(c.deflectionFactor!, 2.13279e12 / 1.022019e12, { rel: 1e-5 });
  });

  test("slip-aware check mode: the nail force at s = 50 mm is γ·E·A·a·s·V/(EI)_ef with K_u, below the rigid 1705.86 N", () => {
    const result = run(nailedIJob("slip-aware"));
    const c = result.composite!;
    const j = c.joints[0]!;
    // F₁ = (q/V)·s·V at the support, V = 10 kN.
    const force = j.flowFactorSlip * 50 * 10_000;
    expect(force).toBeLessThan(1705.86);
    expectClose(j.flowFactorRigid * 50 * 10_000, 1705.86, { rel: 1e-5 }, "rigid F₁ (REFERENCES §6.6 [D])");
    // The schedule's worst row uses the slip-aware flow: tributary 50 mm × q_slip at the support ÷ R.
    const s = result.schedules.find((x) => x.joint === j.joint)!;
    expect(s.verification.maxUtilisation).toBeLessThan((1705.86 / 2000) * 1.001);
    // Deflection checks use the slip-aware stiffness.
    expect(result.checks.some((x) => x.title.includes("slip-aware"))).toBe(false);
  });

  test("slip-aware design converges, needs no more connectors than the rigid design, and keeps s_max ≤ 4·s_min", () => {
    const result = run(nailedIJob("slip-aware", "design"));
    const c = result.composite!;
    expect(c.converged).toBe(true);
    expect(c.iterations).toBeGreaterThanOrEqual(1);
    for (const j of c.joints) {
      expect(j.slipAwareCount!).toBeLessThanOrEqual(j.rigidCount!);
      expect(j.maxSpacing).toBeLessThanOrEqual(4 * j.minSpacing + 1e-9);
      expect(j.withinFourTimes).toBe(true);
    }
    expect(result.schedules.every((s) => s.passes)).toBe(true);
    expect(result.checks.some((x) => x.id === "slip-web-shear")).toBe(true);
  });

  test("slip-aware on a section the γ-method does not cover is refused, with the reason", () => {
    const job = nailedIJob("slip-aware");
    job.parts = [
      { id: "a", material: "C24", shape: { type: "rectangle", b: 45, h: 200 }, x: 0, y: 0 },
      { id: "b", material: "C24", shape: { type: "rectangle", b: 45, h: 200 }, place: { on: "a", side: "right" } },
    ];
    const p = prepareJob(job);
    expect(p.ok).toBe(false);
    if (!p.ok) expect(p.issues[0]).toMatchObject({ path: "compositeAction.model" });
  });

  // A glue line does not slip: γ = 1 reproduces VQ/I (REFERENCES §6.6, the rigid limit [D]).
  const gluedI = (model: "rigid" | "slip-aware"): JobInput => ({
    ...nailedIJob(model, "design"),
    connectors: [{ id: "G", kind: "glue", label: "structural adhesive", shearStrength: 3 }],
    fastening: { default: { connector: "G", rows: 1 } },
  });

  test("a member glued at every flange joint on the rigid model has nothing to compare: no composite block", () => {
    const result = run(gluedI("rigid"));
    expect(result.bondLines.length).toBe(2);
    expect(result.composite).toBeNull();
  });

  test("asked for slip-aware, a member glued at every flange joint gets γ = 1 and the rigid stiffness, and says why", () => {
    const result = run(gluedI("slip-aware"));
    const c = result.composite!;
    expect(c.applies).toBe(true);
    expectClose(c.stiffness!.serviceability, 2.13279e12, { rel: 1e-6 });
    expectClose(c.stiffness!.ultimate, c.stiffness!.rigid, { rel: 1e-12 });
    for (const j of c.joints) {
      expect(j.serviceabilitySlip).toBeNull();
      expectClose(j.gammaUltimate, 1, { rel: 1e-12 });
      expectClose(j.flowFactorSlip, j.flowFactorRigid, { rel: 1e-9 });
    }
    expect(result.assumptions.join(" ")).toContain("a glue line does not slip (γ = 1)");
  });
});

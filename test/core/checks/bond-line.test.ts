import { describe, expect, test } from "vitest";
import { prepareJob } from "../../../core/check-job.js";
import { designMember } from "../../../core/design-member.js";
import type { JobInput } from "../../../core/schema/job.js";
import { expectClose } from "../../expect-close.js";

// REFERENCES §8 Case 8.1 [D]: two glued boards 100 × 50 mm (Case 1.8), V = 8 kN, τ_d = 1.5V/(b·h) = 1.200 MPa;
// f_v,d for C24 = k_mod·f_v,k/γ_M = 0.8 × 4.0/1.3 = 2.4615 MPa (EN 338 f_v,k [M], EN 1995-1-1 Tables 3.1 [V] and 2.3 [M]).
function gluedBoards(shearStrength: number, glueStrength = 10): JobInput {
  return {
    format: "stitchplan-job",
    version: 1,
    units: "si",
    basis: "factored",
    project: { name: "Bond line test" },
    member: { mark: "G-1" },
    materials: [{ id: "C24", name: "C24", E: 11_000, density: 0, strength: { shear: shearStrength } }],
    parts: [
      { id: "lower", material: "C24", shape: { type: "rectangle", b: 100, h: 50 }, x: 0, y: 0 },
      { id: "upper", material: "C24", shape: { type: "rectangle", b: 100, h: 50 }, place: { on: "lower", side: "top" } },
    ],
    connectors: [{ id: "G", kind: "glue", label: "adhesive", shearStrength: glueStrength }],
    fastening: { default: { connector: "G" } },
    // A central 16 kN load on 2 m gives V = ±8 kN.
    beam: { spans: [2], loads: [{ type: "point", P: 16, at: 1 }], selfWeight: false },
  };
}

const run = (job: JobInput) => {
  const p = prepareJob(job);
  if (!p.ok) throw new Error(JSON.stringify(p.issues));
  return designMember(p.core);
};

describe("bond-line check", () => {
  test("two glued boards at V = 8 kN: τ = q/t = 1.5V/A = 1.200 MPa against f_v,d = 2.4615 MPa (REFERENCES §8 Case 8.1 [D])", () => {
    const result = run(gluedBoards(2.4615));
    const bond = result.bondLines[0]!;
    expectClose(bond.maxStress, 1.2, { rel: 1e-9 }, "τ");
    expectClose(bond.strength[0]!.value, 2.4615, { rel: 1e-12 });
    expectClose(bond.utilisation, 1.2 / 2.4615, { rel: 1e-9 });
    expect(bond.passes).toBe(true);
    expect(bond.strength[0]!.governing).toMatch(/adherend/);
  });

  test("the adhesive's own limit governs when it is the lower, and a bond line over its strength fails the member", () => {
    const weak = run(gluedBoards(2.4615, 1.0));
    expect(weak.bondLines[0]!.strength[0]!.governing).toBe("bond line (value given)");
    expectClose(weak.bondLines[0]!.utilisation, 1.2, { rel: 1e-9 });
    expect(weak.bondLines[0]!.passes).toBe(false);
    expect(weak.status.passes).toBe(false);
    expect(weak.status.failures.join(" ")).toMatch(/Bond line upper/);
  });

  test("the stress profile along the span follows |V|: 1.2 MPa on both sides of the central load", () => {
    const result = run(gluedBoards(2.4615));
    const i = result.beam.stations.findIndex((x) => x === 1000);
    expectClose(result.bondLines[0]!.stress[i]!, 1.2, { rel: 1e-9 });
    expectClose(result.bondLines[0]!.stress[i + 1]!, 1.2, { rel: 1e-9 });
  });
});

import { describe, expect, test } from "vitest";
import { grades, materialFromGrade } from "../../../core/materials/grades.js";
import { Material } from "../../../core/schema/job.js";
import { expectClose } from "../../expect-close.js";

const grade = (id: string) => grades.find((g) => g.id === id)!;

describe("grades", () => {
  test("every grade names its source with a flag and makes a valid job material on each basis", () => {
    for (const g of grades) {
      expect(g.source).toMatch(/\[(V|M|CP)\]/);
      for (const basis of ["allowable", "factored"] as const) expect(Material.safeParse(materialFromGrade(g, basis)).success).toBe(true);
    }
  });

  test("EN 14080:2013 homogeneous glulam: f_v,g,k = 3.5 MPa, E and ρ_k by class (REFERENCES §8 [V])", () => {
    expect([grade("GL24h").E, grade("GL28h").E, grade("GL32h").E]).toEqual([11_500, 12_600, 14_200]);
    expect([grade("GL24h").characteristicDensity, grade("GL28h").characteristicDensity, grade("GL32h").characteristicDensity]).toEqual([385, 425, 440]);
    // f_v,d = k_mod·f_v,k/γ_M = 0.8 × 3.5/1.25 = 2.24 MPa (REFERENCES Case 8.1 [D]), then × k_cr = 0.67 [M].
    expectClose(grade("GL24h").strengths.factored!.shear, 2.24 * 0.67, { rel: 1e-12 });
  });

  test("C24 on the factored basis: f_m,d = 0.8 × 24/1.3 and f_v,d = 0.8 × 4.0/1.3 × 0.67 (REFERENCES §8 Case 8.1 [D] on [M] inputs)", () => {
    const c24 = materialFromGrade(grade("C24"), "factored");
    expectClose(c24.strength.bending!, 14.769, { rel: 1e-4 });
    expectClose(c24.strength.shear!, 2.4615 * 0.67, { rel: 1e-4 });
    expect(c24.characteristicDensity).toBe(350);
  });

  test("NDS grades carry G for dowel bearing (DF-L 0.50, Hem-Fir 0.43, SPF 0.42, SP 0.55; REFERENCES §5.1 [M]) and allowable values only", () => {
    expect(["DFL-2", "HF-2", "SPF-2", "SP-2"].map((id) => grade(id).specificGravity)).toEqual([0.5, 0.43, 0.42, 0.55]);
    expectClose(materialFromGrade(grade("DFL-2"), "allowable").strength.shear! / 0.006894757293168361, 180, { rel: 1e-12 }, "F_v = 180 psi");
    expect(materialFromGrade(grade("DFL-2"), "factored").strength).toEqual({});
    expect(materialFromGrade(grade("DFL-2"), "factored").source).toMatch(/no factored strengths/);
  });
});

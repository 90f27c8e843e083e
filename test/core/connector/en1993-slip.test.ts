import { describe, expect, test } from "vitest";
import { SteelBolt, steelBoltKind } from "../../../core/connector/steel-bolt.js";
import { expectClose } from "../../expect-close.js";
import { context, member, steel } from "./contexts.js";

// EN 1993-1-8:2005 §3.9.1 [M]: F_s,Rd = k_s n μ F_p,C/γ_M3 (eq. 3.6), F_p,C = 0.7 f_ub A_s (eq. 3.7);
// k_s = 1.0 in normal holes (Table 3.6); μ = 0.5, 0.4, 0.3, 0.2 for surface classes A–D (Table 3.7);
// γ_M3 = 1.25 at the ultimate limit state (category C), γ_M3,ser = 1.1 at serviceability (category B)
// (Table 2.1, recommended values). A_s of M20 = 245 mm² (ISO 898-1 [V]); f_ub of 8.8 = 800 MPa (Table 3.1 [V]).
const en = (fields: Record<string, unknown>) => SteelBolt.parse({ id: "b", kind: "steel-bolt", standard: "EN1993-1-8", size: "M20", grade: "8.8", ...fields });
const thick = context(member("a", steel(430, 275), 30, 300), member("b", steel(430, 275), 30, 300), { basis: "factored" });

describe("EN 1993-1-8 slip-resistant bolts, categories B and C", () => {
  test("M20 8.8, category C, class A surface, one friction plane: F_p,C = 0.7 × 800 × 245 = 137.2 kN, F_s,Rd = 0.5 × 137.2/1.25 = 54.88 kN, and it governs [D]", () => {
    const r = steelBoltKind.resistance(en({ category: "C", frictionSurface: "A" }), thick);
    expectClose(r.value, (1.0 * 1 * 0.5 * 0.7 * 800 * 245) / 1.25, { rel: 1e-12 });
    expectClose(r.value / 1000, 54.88, { rel: 1e-9 });
    expect(r.governing).toMatch(/slip, category C/);
    expect(r.reference).toContain("category C");
  });
  test("category B, class B surface: F_s,Rd,ser = 0.4 × 137.2/1.1 = 49.891 kN [D], with the warning that the factored flow is checked against it", () => {
    const r = steelBoltKind.resistance(en({ category: "B", frictionSurface: "B" }), thick);
    expectClose(r.value / 1000, (0.4 * 137.2) / 1.1, { rel: 1e-9 });
    expectClose(r.value / 1000, 49.891, { rel: 1e-4 });
    expect(r.warnings!.join(" ")).toMatch(/category B/);
  });
  test("double shear, class D: two friction planes, 2 × 0.2 × 137.2/1.25 = 43.904 kN per bolt, 21.952 kN per contact line [D]", () => {
    const r = steelBoltKind.resistance(en({ category: "C", frictionSurface: "D", shear: "double" }), thick);
    expectClose(r.value / 1000, (2 * 0.2 * 137.2) / 1.25 / 2, { rel: 1e-9 });
  });
  test("bearing still bounds a slip-resistant bolt: in 8 mm plates the end bolt's bearing (2.8·1.2 − 1.7)·0.4·430·20·8/1.25 = 36.55 kN governs [D]", () => {
    const thin = context(member("a", steel(430, 275), 8, 300), member("b", steel(430, 275), 8, 300), { basis: "factored" });
    const r = steelBoltKind.resistance(en({ category: "C", frictionSurface: "A" }), thin);
    expectClose(r.value, ((2.8 * 1.2 - 1.7) * 0.4 * 430 * 20 * 8) / 1.25, { rel: 1e-9 });
  });
  test("the schema: a category needs a friction surface, only 8.8 and 10.9 may be preloaded (§3.1.2(2)), and AISC bolts refuse the EN fields", () => {
    const paths = (x: Record<string, unknown>) => {
      const r = SteelBolt.safeParse({ id: "b", kind: "steel-bolt", standard: "EN1993-1-8", size: "M20", grade: "8.8", ...x });
      return r.success ? [] : r.error.issues.map((i) => i.path.join("."));
    };
    expect(paths({ category: "C" })).toEqual(["frictionSurface"]);
    expect(paths({ frictionSurface: "A" })).toEqual(["frictionSurface"]);
    expect(paths({ category: "B", frictionSurface: "A", grade: "4.6" })).toEqual(["grade"]);
    const aisc = SteelBolt.safeParse({ id: "b", kind: "steel-bolt", standard: "AISC-360-16", size: "3/4", grade: "A", category: "C" });
    expect(aisc.success).toBe(false);
    expect(aisc.error!.issues.map((i) => i.path.join("."))).toEqual(["category"]);
  });
});

import { describe, expect, test } from "vitest";
import { Nail, nailKind } from "../../../core/connector/nail.js";
import { TimberBolt, timberBoltKind } from "../../../core/connector/timber-bolt.js";
import { ec5BoltEmbedment, ec5K90, ec5NailEmbedment, ec5YieldMoment } from "../../../core/connector/timber/ec5-embedment.js";
import { ec5DurationOf, ec5Kmod, ec5SlipModulus, jointMeanDensity } from "../../../core/connector/timber/ec5-factors.js";
import { johansenSteelSingle, johansenTimberSingle } from "../../../core/connector/timber/ec5-johansen.js";
import { ec5Spacing } from "../../../core/connector/timber/timber-spacing.js";
import { expectClose } from "../../expect-close.js";
import { context, ec5Timber, member, steel } from "./contexts.js";

// Source: EN 1995-1-1:2004+A1:2008 via /work/shared/REFERENCES.md §6. Formulas mostly [M] (see "Least-sure values" 5);
// k_mod [V] (LVL Handbook Europe 2025 Table 4.2); M_y formulas [V] (Porteous & Kermani Table 10.5); spacing tables [V].

describe("k_mod (EN 1995-1-1 Table 3.1) [V] and duration classes", () => {
  test("solid timber, service classes 1 and 2: 0.60, 0.70, 0.80, 0.90, 1.10; class 3: 0.50, 0.55, 0.65, 0.70, 0.90", () => {
    const order = ["permanent", "long", "medium", "short", "instantaneous"] as const;
    expect(order.map((d) => ec5Kmod("solid", 1, d))).toEqual([0.6, 0.7, 0.8, 0.9, 1.1]);
    expect(order.map((d) => ec5Kmod("solid", 2, d))).toEqual([0.6, 0.7, 0.8, 0.9, 1.1]);
    expect(order.map((d) => ec5Kmod("solid", 3, d))).toEqual([0.5, 0.55, 0.65, 0.7, 0.9]);
  });
  test("OSB/3 in class 2: 0.30, 0.40, 0.55, 0.70, 0.90 [M]; OSB/2 has no class-2 value", () => {
    expect(["permanent", "long", "medium", "short", "instantaneous"].map((d) => ec5Kmod("osb3", 2, d as "medium"))).toEqual([0.3, 0.4, 0.55, 0.7, 0.9]);
    expect(ec5Kmod("osb2", 2, "medium")).toBeNull();
  });
  test("a combination takes the duration of its shortest-duration load (§3.1.3(2)) [V]", () => {
    expect(ec5DurationOf("unspecified", ["dead", "live"]).duration).toBe("medium");
    expect(ec5DurationOf("unspecified", ["dead"]).duration).toBe("permanent");
    expect(ec5DurationOf("unspecified", ["dead", "live", "snow"]).duration).toBe("short");
    expect(ec5DurationOf("instantaneous", ["dead"]).duration).toBe("instantaneous");
  });
});

describe("embedment strength and yield moment (REFERENCES §6.3)", () => {
  test("nail d = 3.1, ρ_k = 350: f_h,k = 20.4396 MPa, predrilled 27.8103 MPa [D] (eq. 8.15, 8.16 [M])", () => {
    expectClose(ec5NailEmbedment({ wood: "softwood", characteristicDensity: 350, diameter: 3.1, predrilled: false, thickness: 38 }).value, 20.4396, { rel: 1e-4 });
    expectClose(ec5NailEmbedment({ wood: "softwood", characteristicDensity: 350, diameter: 3.1, predrilled: true, thickness: 38 }).value, 27.8103, { rel: 1e-4 });
  });
  test("round nail d = 3.1, f_u = 600: M_y,Rk = 3410.5 N·mm [D] (eq. 8.14 [V])", () => {
    expectClose(ec5YieldMoment("round", 600, 3.1).value, 3410.5, { rel: 1e-4 });
  });
  test("bolt M12, ρ_k = 350: f_h,0,k = 25.2560, k_90 = 1.530, f_h,90,k = 16.5072, f_h,45,k = 19.9652 MPa [D] (eq. 8.31–8.33 [M])", () => {
    const at = (angleDeg: number) => ec5BoltEmbedment({ wood: "softwood", characteristicDensity: 350, diameter: 12, angleDeg, thickness: 100 }).value;
    expectClose(at(0), 25.256, { rel: 1e-4 });
    expectClose(ec5K90("softwood", 12), 1.53, { rel: 1e-9 });
    expectClose(at(90), 16.5072, { rel: 1e-4 });
    expectClose(at(45), 19.9652, { rel: 1e-4 });
  });
  test("bolt M12 yield moment: grade 4.6 76 745.4 N·mm, grade 8.8 153 490.8 N·mm [D] (eq. 8.30 [V])", () => {
    expectClose(ec5YieldMoment("round", 400, 12).value, 76_745.4, { rel: 1e-4 });
    expectClose(ec5YieldMoment("round", 800, 12).value, 153_490.8, { rel: 1e-4 });
  });
});

describe("Johansen equations, case 6.4a: nail d = 3.1, β = 1, t₁ = 38, t₂ = 40 mm, no rope effect (REFERENCES §6.4)", () => {
  // Equations (8.6) [M]; values [D].
  const fh = 0.082 * 350 * 3.1 ** -0.3;
  const My = 0.3 * 600 * 3.1 ** 2.6;
  const j = johansenTimberSingle({ fh1: fh, fh2: fh, t1: 38, t2: 40, d: 3.1, My, rope: { axialCapacity: 0, cap: 0.15 } });
  const expected: Record<string, number> = { a: 2407.8, b: 2534.5, c: 1024.2, d: 934.5, e: 974.5, f: 756.0 };

  test.each(Object.entries(expected))("mode %s = %s N", (mode, value) => {
    expectClose(j.modes.find((m) => m.mode === mode)!.value, value, { abs: 0.1 });
  });
  test("mode f governs", () => expect(j.governing.mode).toBe("f"));

  test("the rope effect adds F_ax,Rk/4 capped at 15 % of the Johansen part for round nails (§8.2.2(2) [M])", () => {
    const small = johansenTimberSingle({ fh1: fh, fh2: fh, t1: 38, t2: 40, d: 3.1, My, rope: { axialCapacity: 200, cap: 0.15 } });
    expectClose(small.modes.find((m) => m.mode === "f")!.value, 756.0 + 50, { abs: 0.1 });
    const large = johansenTimberSingle({ fh1: fh, fh2: fh, t1: 38, t2: 40, d: 3.1, My, rope: { axialCapacity: 10_000, cap: 0.15 } });
    expectClose(large.modes.find((m) => m.mode === "f")!.value, 756.0 * 1.15, { abs: 0.15 });
    expect(large.modes.find((m) => m.mode === "a")!.rope).toBe(0);
  });

  test("a steel plate between thin (≤ 0.5d) and thick (≥ d) is interpolated linearly (§8.2.3(1))", () => {
    const p = { fh: 25.256, t: 80, d: 12, My: 76_745.4, rope: { axialCapacity: 0, cap: 0.25 } };
    const thin = johansenSteelSingle({ ...p, plateThickness: 6 }).value;
    const thick = johansenSteelSingle({ ...p, plateThickness: 12 }).value;
    expectClose(johansenSteelSingle({ ...p, plateThickness: 9 }).value, (thin + thick) / 2, { rel: 1e-12 });
    expect(thick).toBeGreaterThan(thin);
  });
});

describe("nailKind by EN 1995-1-1: F_v,Rd = k_mod F_v,Rk/γ_M (REFERENCES §6.4, case 6.4a)", () => {
  const c24 = ec5Timber(350, 420);
  const nail = Nail.parse({ id: "n", kind: "nail", standard: "EN1995-1-1", diameter: 3.1, length: 78 });
  const at = (duration: "medium" | "short" | "instantaneous") => nailKind.resistance(nail, context(member("a", c24, 38, 100), member("b", c24, 40, 100), { basis: "factored", duration }));

  test("γ_M = 1.3: k_mod 0.8 → 465.2 N, 0.9 → 523.4 N, 1.1 → 639.7 N [D] (γ_M [M], k_mod [V])", () => {
    expectClose(at("medium").value, 465.2, { abs: 0.1 });
    expectClose(at("short").value, 523.4, { abs: 0.1 });
    expectClose(at("instantaneous").value, 639.7, { abs: 0.1 });
    expect(at("medium").governing).toBe("mode f");
  });

  test("the result carries K_ser = 709.32 N/mm and K_u = 472.88 N/mm for the nail, ρ_m = 420 (Table 7.1, eq. 2.1 [M]; numbers [D])", () => {
    const slip = at("medium").slip!;
    expectClose(slip.serviceability, 709.32, { rel: 1e-4 });
    expectClose(slip.ultimate, 472.88, { rel: 1e-4 });
  });

  test("a 3.1 × 60 mm smooth nail through a 38 mm side member penetrates 22 mm, below 8d = 24.8 mm, and is refused [V] (least pointside penetration, Porteous & Kermani)", () => {
    const short = Nail.parse({ id: "n", kind: "nail", standard: "EN1995-1-1", diameter: 3.1, length: 60 });
    const problems = nailKind.problems!(short, context(member("a", c24, 38, 100), member("b", c24, 40, 100), { basis: "factored" }));
    expect(problems.map((p) => p.on === "connector" && p.field)).toContain("length");
    expect(problems[0]!.message).toContain("below the minimum 8d");
  });
});

describe("slip moduli (REFERENCES §6.2)", () => {
  test("bolt or dowel d = 12, ρ_m = 420: K_ser = 4490.8, K_u = 2993.9 N/mm [D] (formula [M])", () => {
    const k = ec5SlipModulus({ meanDensity: 420, diameter: 12, nailNotPredrilled: false, steelToTimber: false });
    expectClose(k.serviceability, 4490.8, { rel: 1e-4 });
    expectClose(k.ultimate, 2993.9, { rel: 1e-4 });
  });
  test("mixed densities √(420·460) = 439.55 kg/m³ [D] (eq. 7.1 [M])", () => expectClose(jointMeanDensity(420, 460), 439.55, { rel: 1e-4 }));
  test("a bolt in C24 reports slip moduli in the kind's result; steel-to-timber doubles them", () => {
    const bolt = TimberBolt.parse({ id: "b", kind: "timber-bolt", standard: "EN1995-1-1", size: "M12", grade: "4.6" });
    const c24 = ec5Timber(350, 420);
    const wood = timberBoltKind.resistance(bolt, context(member("a", c24, 45, 100), member("b", c24, 45, 100), { basis: "factored" })).slip!;
    expectClose(wood.serviceability, 4490.8, { rel: 1e-4 });
    const plate = timberBoltKind.resistance(bolt, context(member("p", steel(430), 8, 100), member("b", c24, 45, 100), { basis: "factored" })).slip!;
    expectClose(plate.serviceability, 2 * 4490.8, { rel: 1e-4 });
  });
});

describe("ec5Spacing(): minimum spacings and distances (REFERENCES §6.5, tables [V], numbers [D])", () => {
  const nail = (d: number, angleDeg: number) => ec5Spacing({ family: "nail", d, angleDeg, characteristicDensity: 350, predrilled: false, placement: "timber", steelToTimber: false }).table;
  const bolt = (d: number, angleDeg: number) => ec5Spacing({ family: "bolt", d, angleDeg, characteristicDensity: 350, predrilled: true, placement: "timber", steelToTimber: false }).table;

  test("nail d = 3.1, α = 0, not predrilled: a₁ 31.0, a₂ 15.5, a₃,t 46.5, a₃,c 31.0, a₄,t 15.5, a₄,c 15.5 mm", () => {
    const t = nail(3.1, 0);
    [t.a1, t.a2, t.a3t, t.a3c, t.a4t, t.a4c].forEach((v, i) => expectClose(v, [31, 15.5, 46.5, 31, 15.5, 15.5][i]!, { rel: 1e-9 }));
  });
  test("nail d = 3.1, α = 90°: a₁ 15.5, a₂ 15.5, a₃,t 31.0, a₄,t 21.7 mm", () => {
    const t = nail(3.1, 90);
    [t.a1, t.a2, t.a3t, t.a4t].forEach((v, i) => expectClose(v, [15.5, 15.5, 31, 21.7][i]!, { rel: 1e-9 }));
  });
  test("nail d = 6: a₁ = 72 mm at α = 0, a₄,t = 60 mm at α = 90°", () => {
    expectClose(nail(6, 0).a1, 72, { rel: 1e-9 });
    expectClose(nail(6, 90).a4t, 60, { rel: 1e-9 });
  });
  test("bolt d = 12: α = 0 gives a₁ 60, a₂ 48, a₃,t 84, a₄,t 36, a₄,c 36; a₃,c 48 at α = 180°, 84 at α = 90°; α = 90° gives a₁ 48, a₄,t 48 mm", () => {
    const t = bolt(12, 0);
    [t.a1, t.a2, t.a3t, t.a4t, t.a4c, bolt(12, 180).a3c].forEach((v, i) => expectClose(v, [60, 48, 84, 36, 36, 48][i]!, { rel: 1e-9 }));
    const p = bolt(12, 90);
    [p.a1, p.a3c, p.a4t].forEach((v, i) => expectClose(v, [48, 84, 48][i]!, { rel: 1e-9 }));
  });
  test("bolt d = 20, α = 0: a₁ 100, a₃,t 140 mm", () => {
    const t = bolt(20, 0);
    expectClose(t.a1, 100, { rel: 1e-9 });
    expectClose(t.a3t, 140, { rel: 1e-9 });
  });
  test("the nail kind's detailing feeds a₁ as the least spacing along the line and a₃,t as the end distance", () => {
    const c24 = ec5Timber(350, 420);
    const limits = nailKind.detailing(Nail.parse({ id: "n", kind: "nail", standard: "EN1995-1-1", diameter: 3.1, length: 78 }), context(member("a", c24, 38, 100), member("b", c24, 40, 100), { basis: "factored" }));
    expectClose(limits.minSpacing, 31, { rel: 1e-9 });
    expectClose(limits.endDistance, 46.5, { rel: 1e-9 });
    expectClose(limits.rowSpacing!, 15.5, { rel: 1e-9 });
    expectClose(limits.edgeDistance!, 15.5, { rel: 1e-9 });
    expect(limits.penetration).toEqual({ required: 8 * 3.1, provided: 40 });
  });
});

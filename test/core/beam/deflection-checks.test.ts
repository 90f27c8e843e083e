import { describe, expect, test } from "vitest";
import { analyseMember } from "../../../core/beam/analyse-beam.js";
import { deflectionChecks } from "../../../core/beam/deflection-checks.js";
import { expectClose } from "../../expect-close.js";
import { asEntered, coreBeam } from "./beam-test-kit.js";

const EI = 1e12;
const mm = (x: number) => `${x / 1000} m`;
const run = (beam: ReturnType<typeof coreBeam>, serviceLoads = true) =>
  deflectionChecks(analyseMember({ beam, combinations: [asEntered(["dead", "live", "snow"])], selfWeight: 0, flexuralRigidity: EI, serviceLoads }), beam.deflectionLimits, mm);

describe("deflectionChecks", () => {
  test("a 2 m cantilever: tip deflection wL⁴/(8EI) [D] against twice its length over the ratio ([CP]), total and live apart", () => {
    const beam = coreBeam([2000], ["fixed", "free"], [
      { type: "uniform", category: "dead", w: 1 },
      { type: "uniform", category: "live", w: 2 },
    ]);
    const { checks } = run(beam);
    const byId = Object.fromEntries(checks.map((c) => [c.id, c]));
    expect(Object.keys(byId)).toEqual(["deflection-total", "deflection-live"]);
    expectClose(byId["deflection-total"]!.demand, (3 * 2000 ** 4) / (8 * EI), { rel: 1e-9 });
    expectClose(byId["deflection-total"]!.capacity, (2 * 2000) / 240, { rel: 1e-12 });
    expectClose(byId["deflection-live"]!.demand, (2 * 2000 ** 4) / (8 * EI), { rel: 1e-9 });
    expectClose(byId["deflection-live"]!.capacity, (2 * 2000) / 360, { rel: 1e-12 });
    expect(byId["deflection-live"]!.title).toMatch(/limit 2 × 2 m\/360/);
    expect(byId["deflection-total"]!.at).toBe(2000);
  });

  test("two equal spans, live on one: the patterned live case gives the one-span-loaded deflection, ≈ 0.0092·wL⁴/EI (closed form by superposing the end moment wL²/16 [D]; coefficient e.g. AISC Table 3-23 case 30 [M])", () => {
    const w = 4;
    const L = 5000;
    const beam = coreBeam([L, L], undefined, [{ type: "uniform", category: "live", w }]);
    const { checks } = run(beam);
    const live1 = checks.find((c) => c.id === "deflection-live-1")!;
    // Span 1 loaded, simply supported deflection less that of the hogging end moment M = wL²/16:
    // v(ξ)·EI/(wL⁴) = ξ(1 − 2ξ² + ξ³)/24 − ξ(1 − ξ²)/96, largest on a fine grid, refined by golden section.
    const f = (xi: number) => (xi * (1 - 2 * xi * xi + xi ** 3)) / 24 - (xi * (1 - xi * xi)) / 96;
    let lo = 0.3;
    let hi = 0.6;
    for (let i = 0; i < 200; i++) {
      const a = hi - (hi - lo) / 1.618033988749895;
      const b = lo + (hi - lo) / 1.618033988749895;
      if (f(a) > f(b)) hi = b;
      else lo = a;
    }
    const coefficient = f((lo + hi) / 2);
    expectClose(coefficient, 0.0092, { rel: 2e-2 });
    expectClose(live1.demand, (coefficient * w * L ** 4) / EI, { rel: 1e-9 });
    expectClose(live1.at!, ((lo + hi) / 2) * L, { rel: 1e-6 });
    expect(live1.combination).toBe("SLS-live/P1");
    expectClose(live1.capacity, L / 360, { rel: 1e-12 });
  });

  test("an overhang is measured on twice its length; spans between supports on their own", () => {
    const beam = coreBeam([4000, 1000], ["pinned", "roller", "free"], [{ type: "uniform", category: "dead", w: 2 }]);
    const { checks } = run(beam);
    expect(checks.map((c) => [c.id, c.capacity])).toEqual([
      ["deflection-total-1", 4000 / 240],
      ["deflection-total-2", (2 * 1000) / 240],
    ]);
  });

  test("the live limit applies to the categories it lists, together", () => {
    const beam = coreBeam([3000], undefined, [{ type: "uniform", category: "live", w: 1 }, { type: "uniform", category: "snow", w: 1 }], { deflectionLimits: { liveCategories: ["live", "snow"] } });
    const live = run(beam).checks.find((c) => c.id === "deflection-live")!;
    expectClose(live.demand, (5 * 2 * 3000 ** 4) / (384 * EI), { rel: 1e-9 }, "5wL⁴/(384EI) [D]");
  });

  test("loads entered factored (unfactored set on the factored basis) get no deflection check, and say so", () => {
    const beam = coreBeam([3000], undefined, [{ type: "uniform", category: "live", w: 1 }]);
    const { checks, notChecked } = run(beam, false);
    expect(checks).toEqual([]);
    expect(notChecked[0]).toMatch(/entered factored/);
  });

  test("no live-type load: the live check is listed as not checked", () => {
    const beam = coreBeam([3000], undefined, [{ type: "uniform", category: "dead", w: 1 }]);
    const { checks, notChecked } = run(beam);
    expect(checks.map((c) => c.id)).toEqual(["deflection-total"]);
    expect(notChecked).toContain("Deflection under live alone: the job has no such loads.");
  });
});

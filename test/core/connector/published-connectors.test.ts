import { describe, expect, test } from "vitest";
import { prepareJob } from "../../../core/check-job.js";
import { designMember } from "../../../core/design-member.js";
import type { JobInput } from "../../../core/schema/job.js";
import { boltedPlates, nailedTimberI, weldedGirder } from "./connector-jobs.js";
import { expectClose } from "../../expect-close.js";
import { IN, LBF } from "./contexts.js";

function design(job: JobInput) {
  const prepared = prepareJob(job);
  if (!prepared.ok) throw new Error(JSON.stringify(prepared.issues));
  return designMember(prepared.core);
}

function issuesOf(job: JobInput) {
  const prepared = prepareJob(job);
  if (prepared.ok) throw new Error("expected the job to be refused");
  return prepared.issues;
}

describe("a nailed timber I with 16d commons by the NDS, through the pipeline", () => {
  const result = design(nailedTimberI({ kind: "nail", standard: "NDS-2018", size: "16d common" }));

  test("each joint's resistance per connector is Z′ = 141 lb × C_D 1.0 (dead + live) [V] with mode IV governing and its working", () => {
    expect(result.schedules).toHaveLength(2);
    for (const s of result.schedules) {
      expect(s.connectorLabel).toBe("16d common nail (0.162 × 3.5 in), NDS-2018");
      const r = s.resistance[0]!;
      expectClose(r.value / LBF, 141, { abs: 0.5 });
      expect(r.governing).toBe("mode IV");
      expect(r.modes).toHaveLength(6);
      expect(r.steps.find((x) => x.symbol === "C_D")!.value).toBe(1);
      expect(r.reference).toContain("NDS-2018 Table 12.3.1A");
    }
  });

  test("the limits carry spacing 15D, edge 2.5D and the penetration 2 in against 6D [CP]/[M]", () => {
    const limits = result.schedules[0]!.limits;
    expectClose(limits.minSpacing / IN, 15 * 0.162, { rel: 1e-9 });
    expectClose(limits.edgeDistance! / IN, 2.5 * 0.162, { rel: 1e-9 });
    expectClose(limits.penetration!.provided / IN, 2, { rel: 1e-9 });
    expectClose(limits.penetration!.required / IN, 6 * 0.162, { rel: 1e-9 });
    expect(limits.sources.some((s) => s.includes("[CP]"))).toBe(true);
    expect(result.standards.some((s) => s.includes("NDS-2018"))).toBe(true);
  });

  test("the schedule passes and is verified row by row", () => {
    expect(result.schedules.every((s) => s.passes)).toBe(true);
  });
});

describe("the EC5 nail case 6.4a in a job", () => {
  test("3.1 × 75 mm nails in C24 on a factored basis: 465.2 N for dead + live (k_mod 0.8, γ_M 1.3) [D], with K_ser", () => {
    const job = nailedTimberI({ kind: "nail", standard: "EN1995-1-1", diameter: 3.1, length: 75, serviceClass: 1 }, {
      units: "si",
      basis: "factored",
      materials: [{ id: "DFL", name: "C24", family: "sawn-timber", E: 11_000, density: 420, characteristicDensity: 350, meanDensity: 420, strength: { bending: 14.8, shear: 2.46 } }],
      parts: [
        { id: "bottom", material: "DFL", shape: { type: "rectangle", b: 140, h: 38 }, x: 0, y: 0 },
        { id: "web", material: "DFL", shape: { type: "rectangle", b: 38, h: 235 }, x: 51, y: 38 },
        { id: "top", material: "DFL", shape: { type: "rectangle", b: 140, h: 38 }, x: 0, y: 273 },
      ],
      beam: { spans: [3.6], loads: [{ type: "uniform", category: "dead", w: 0.6 }, { type: "uniform", category: "live", w: 0.75 }], selfWeight: false },
      spacing: { module: 5, minZoneLength: 300, maxZonesPerSpan: 5, symmetric: true },
    } as Partial<JobInput>);
    const result = design(job);
    const r = result.schedules[0]!.resistance[0]!;
    // t₁ = 38, t₂ = 75 − 38 = 37 mm: mode f is independent of t, so 465.2 N as case 6.4a.
    expectClose(r.value, 465.2, { abs: 0.1 });
    expect(r.governing).toBe("mode f");
    expectClose(r.slip!.serviceability, 709.32, { rel: 1e-4 });
    expectClose(result.schedules[0]!.limits.minSpacing, 31, { rel: 1e-9 });
  });
});

describe("a welded plate girder (REFERENCES Case 1.3): the weld is checked continuous against q per line", () => {
  test("a5 fillets both sides, EN 1993-1-8, S275: q = 752.63 N/mm [D] against 2 × 1168.3 N/mm, utilisation 0.3221 [D]", () => {
    const result = design(weldedGirder({ kind: "fillet-weld", standard: "EN1993-1-8", throat: 5 }));
    expect(result.welds).toHaveLength(2);
    const w = result.welds[0]!;
    expectClose(w.maxShearFlow, 752.63, { rel: 1e-4 });
    expectClose(w.resistance[0]!.value, 1168.3, { rel: 1e-4 });
    expectClose(w.utilisation, 752.63 / (2 * 1168.3), { rel: 1e-4 });
    expect(w.passes).toBe(true);
    expect(result.joints.every((j) => j.mechanism === "weld")).toBe(true);
    expect(w.limits.minSize).toBeCloseTo(3 * Math.SQRT2, 9);
  });

  test("a 3/16 in E70 fillet (AISC, LRFD) gives 4.1764 kip/in per fillet [D]", () => {
    const result = design(weldedGirder({ kind: "fillet-weld", standard: "AISC-360-16", leg: 0.1875 * IN, electrode: "E70" }));
    expectClose(result.welds[0]!.resistance[0]!.value / (1000 * LBF / IN), 4.1764, { rel: 1e-4 });
  });

  test("a weld too big for the 10 mm web is refused at its field", () => {
    const issues = issuesOf(weldedGirder({ kind: "fillet-weld", standard: "EN1993-1-8", throat: 8 }));
    expect(issues[0]!.path).toBe("connectors[0].throat");
    expect(issues[0]!.message).toContain("larger than the thinner part allows");
  });
});

describe("bolted plates", () => {
  test("3/4 in Group A bolts (AISC, LRFD): shear 17.9 kips [V] governs over the end bolt's tear-out in the 3/4 in cover, 23.25 kips [D]", () => {
    const result = design(boltedPlates({ kind: "steel-bolt", standard: "AISC-360-16", size: "3/4", grade: "A" }, "us"));
    const r = result.schedules[0]!.resistance[0]!;
    expectClose(r.value / (1000 * LBF), 17.9, { abs: 0.1 });
    expect(r.governing).toBe("bolt shear");
    expectClose(r.modes!.find((m) => m.mode === `tear-out at the end bolt of "cover"`)!.value / (1000 * LBF), 0.75 * 1.2 * (1 - 0.8125 / 2) * 0.75 * 58, { rel: 1e-9 });
    const limits = result.schedules[0]!.limits;
    expectClose(limits.maxSpacing / IN, 12, { rel: 1e-9 }); // 24t = 18 in > 12 in (§J3.5)
    expectClose(limits.edgeDistance! / IN, 1, { rel: 1e-9 });
  });

  test("M20 8.8 (EN 1993-1-8): 94.1 kN in shear [V]", () => {
    const result = design(boltedPlates({ kind: "steel-bolt", standard: "EN1993-1-8", size: "M20", grade: "8.8", endDistance: 50, minSpacing: 70 }, "si"));
    const r = result.schedules[0]!.resistance[0]!;
    expectClose(r.modes!.find((m) => m.mode === "bolt shear")!.value / 1000, 94.1, { abs: 0.05 });
  });
});

describe("bad input is refused with the field path", () => {
  test("a 6d common nail (2 in) through a 1-1/2 in flange penetrates 1/2 in, below 6D = 0.678 in", () => {
    const issues = issuesOf(nailedTimberI({ kind: "nail", standard: "NDS-2018", size: "6d common" }));
    expect(issues[0]!.path).toBe("connectors[0].size");
    expect(issues[0]!.message).toContain("below the minimum 6d");
    expect(issues[0]!.message).toContain("0.678 in");
  });
  test("a material without the specific gravity the NDS needs", () => {
    const job = nailedTimberI({ kind: "nail", standard: "NDS-2018", size: "16d common" });
    delete (job.materials[0] as { specificGravity?: number }).specificGravity;
    expect(issuesOf(job)[0]!.path).toBe("materials[0].specificGravity");
  });
  test("an EC5 connector in an allowable-basis job", () => {
    expect(issuesOf(nailedTimberI({ kind: "nail", standard: "EN1995-1-1", diameter: 0.131, length: 3.5 }))[0]!.path).toBe("connectors[0].standard");
  });
  test("a 1 in bolt through a 3/4 in wide strap is larger than the part", () => {
    const job = boltedPlates({ kind: "steel-bolt", standard: "AISC-360-16", size: "1", grade: "A" }, "us", 1);
    job.parts[1] = { id: "cover", material: "A36", shape: { type: "rectangle", b: 0.75, h: 0.75 }, x: 1, y: 1 } as JobInput["parts"][number];
    const issues = issuesOf(job);
    expect(issues[0]!.path).toBe("connectors[0].size");
    expect(issues[0]!.message).toContain("larger than part \"cover\"");
  });
  test("two rows of 3/4 in bolts that do not fit across a 3 in cover plate: the rows are refused", () => {
    const job = boltedPlates({ kind: "steel-bolt", standard: "AISC-360-16", size: "3/4", grade: "A" }, "us", 2);
    job.parts[1] = { id: "cover", material: "A36", shape: { type: "rectangle", b: 3, h: 0.75 }, x: 1, y: 1 } as JobInput["parts"][number];
    expect(issuesOf(job)[0]!.path).toBe("fastening.default.rows");
  });
  test("an unknown grade", () => {
    const issues = issuesOf(boltedPlates({ kind: "steel-bolt", standard: "EN1993-1-8", size: "M20", grade: "12.9" }, "si"));
    expect(issues[0]!.path).toBe("connectors[0].grade");
  });
  test("an unknown nail size", () => {
    expect(issuesOf(nailedTimberI({ kind: "nail", standard: "NDS-2018", size: "17d common" }))[0]!.path).toBe("connectors[0].size");
  });
});

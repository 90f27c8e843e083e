import { describe, expect, test } from "vitest";
import { prepareJob } from "../../../core/check-job.js";
import { designMember } from "../../../core/design-member.js";
import type { JobInput } from "../../../core/schema/job.js";

// EN 1995-1-1 connectors under wind: the k_mod used and the load-duration class printed must be the same,
// and the job chooses the class for wind (Table 2.2 [M] lists short-term or instantaneous; national annexes
// differ). k_mod for solid timber in service class 1 (Table 3.1 [M]): permanent 0.6, short-term 0.9,
// instantaneous 1.1.

function windJob(windDuration?: "short" | "instantaneous"): JobInput {
  return {
    format: "stitchplan-job",
    version: 1,
    units: "si",
    basis: "factored",
    project: { name: "Wind duration" },
    member: { mark: "W-1" },
    materials: [{ id: "C24", name: "C24", family: "sawn-timber", E: 11_000, density: 420, characteristicDensity: 350, meanDensity: 420, strength: { bending: 24, shear: 4 } }],
    parts: [
      { id: "web", material: "C24", shape: { type: "rectangle", b: 45, h: 200 }, x: 37.5, y: 0 },
      { id: "top", material: "C24", shape: { type: "rectangle", b: 120, h: 45 }, place: { on: "web", side: "top" } },
    ],
    connectors: [{ id: "N", kind: "nail", standard: "EN1995-1-1", diameter: 3.1, length: 90 }],
    fastening: { default: { connector: "N", rows: 1 } },
    beam: { spans: [4], loads: [{ type: "uniform", category: "dead", w: 1 }, { type: "uniform", category: "wind", w: 1.5 }], selfWeight: false, ...(windDuration ? { windDuration } : {}) },
    combinations: { set: "en1990-6.10" },
  } as JobInput;
}

function kmodUnderWind(job: JobInput) {
  const p = prepareJob(job);
  if (!p.ok) throw new Error(JSON.stringify(p.issues));
  const result = designMember(p.core);
  const windCombination = result.beam.combinations.find((c) => c.categories.includes("wind"))!;
  const line = result.schedules[0]!.resistance.find((r) => r.combination === windCombination.id)!;
  const kmod = line.steps.find((s) => s.symbol === "k_mod")!;
  return { duration: windCombination.duration, kmod, assumptions: result.assumptions };
}

describe("EN 1995-1-1 k_mod under wind follows the job's class for wind, and the worksheet says the same", () => {
  test("by default wind is short-term: k_mod = 0.9, and the assumptions say short-term", () => {
    const r = kmodUnderWind(windJob());
    expect(r.duration).toBe("short");
    expect(r.kmod.value).toBe(0.9); // Table 3.1, solid timber, service class 1, short-term [M]
    expect(r.kmod.description).toContain("short-term");
    expect(r.assumptions.some((a) => a.includes("wind short-term"))).toBe(true);
    expect(r.assumptions.some((a) => a.includes("wind instantaneous"))).toBe(false);
  });

  test("beam.windDuration = instantaneous: k_mod = 1.1, and the assumptions say instantaneous", () => {
    const r = kmodUnderWind(windJob("instantaneous"));
    expect(r.duration).toBe("instantaneous");
    expect(r.kmod.value).toBe(1.1); // Table 3.1, solid timber, service class 1, instantaneous [M]
    expect(r.kmod.description).toContain("instantaneous");
    expect(r.assumptions.some((a) => a.includes("wind instantaneous"))).toBe(true);
    expect(r.assumptions.some((a) => a.includes("wind short-term"))).toBe(false);
  });

  test("an unknown class for wind is refused at its field", () => {
    const p = prepareJob({ ...windJob(), beam: { ...windJob().beam, windDuration: "medium" } } as unknown as JobInput);
    expect(p.ok).toBe(false);
    if (!p.ok) expect(p.issues.some((i) => i.path === "beam.windDuration")).toBe(true);
  });
});

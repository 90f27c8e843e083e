import { describe, expect, test } from "vitest";
import { prepareJob } from "../../../core/check-job.js";
import { designMember } from "../../../core/design-member.js";
import type { PathItem, TextItem } from "../../../core/draw/drawing.js";
import { governingShear, shearStressProfile, shearStressValues } from "../../../core/draw/shear-stress-profile.js";
import type { JobInput } from "../../../core/schema/job.js";
import { DesignResult } from "../../../core/schema/result.js";
import { toDisplayUnits } from "../../../core/units/convert.js";
import { unitLabels, type UnitSystem } from "../../../core/units/quantity.js";
import { plankIJob } from "../../job-builders.js";

/** Two 50 × 100 mm planks stacked: one 50 × 200 mm rectangle, 4 m simple span, 2 kN/m. */
function stackedPlanks(units: UnitSystem): DesignResult {
  const job: JobInput = {
    ...plankIJob(),
    parts: [
      { id: "bottom", material: "W", shape: { type: "rectangle", b: 50, h: 100 }, x: 0, y: 0 },
      { id: "top", material: "W", shape: { type: "rectangle", b: 50, h: 100 }, x: 0, y: 100 },
    ],
    beam: { spans: [4], loads: [{ type: "uniform", category: "dead", w: 2 }], selfWeight: false },
  };
  const prepared = prepareJob(job);
  if (!prepared.ok) throw new Error(JSON.stringify(prepared.issues));
  return { ...toDisplayUnits(DesignResult, designMember(prepared.core), units), units, unitLabels: unitLabels(units) };
}

describe("shearStressProfile", () => {
  test("governingShear(result) is the support reaction of a simple span, wL/2", () => {
    const at = governingShear(stackedPlanks("si"))!;
    expect(at.shear).toBeCloseTo(4, 9); // [D] 2 kN/m × 4 m / 2
  });

  test("shearStressValues(result, V) peaks at 1.5·V/A at mid-depth of a rectangle, in MPa and in psi", () => {
    for (const units of ["si", "us"] as const) {
      const result = stackedPlanks(units);
      const at = governingShear(result)!;
      const values = shearStressValues(result, at.shear);
      const peak = Math.max(...values.map((v) => v.stress));
      const expectedMpa = (1.5 * 4000) / (50 * 200); // [D] τ = 1.5 V/A for a rectangle: 0.6 MPa
      const expected = units === "si" ? expectedMpa : expectedMpa / 0.006894757293168361;
      expect(peak).toBeCloseTo(expected, 6);
    }
  });

  test("the drawing marks the peak with its unit, the neutral axis and the joint level", () => {
    const drawing = shearStressProfile(stackedPlanks("si"), { width: 220, height: 300 })!;
    const peak = drawing.items.find((i): i is TextItem => i.type === "text" && i.role === "stress-peak")!;
    expect(peak.text).toBe("0.6 MPa");
    const paths = drawing.items.filter((i): i is PathItem => i.type === "path");
    expect(paths.some((p) => p.role === "neutral-axis")).toBe(true);
    expect(paths.some((p) => p.role === "joint-level top")).toBe(true);
  });
});

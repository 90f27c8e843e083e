import { readFileSync } from "node:fs";
import { join } from "node:path";
import fc from "fast-check";
import { describe, expect, test } from "vitest";
import { prepareJob } from "../../../core/check-job.js";
import { designMember } from "../../../core/design-member.js";
import type { JobInput } from "../../../core/schema/job.js";

const EXAMPLES = join(import.meta.dirname, "../../../fixtures/examples");
const example = (file: string) => JSON.parse(readFileSync(join(EXAMPLES, file), "utf8")) as JobInput;

const run = (job: JobInput) => {
  const p = prepareJob(job);
  if (!p.ok) throw new Error(JSON.stringify(p.issues));
  return designMember(p.core);
};

// The beam analysis neglects shear deformation (stiffness method on E·I); a plywood or OSB web's
// shear modulus is small against its E [CP], so its share of the deflection must at least be named.
const panelWebLines = (notChecked: string[]) => notChecked.filter((n) => n.startsWith("Shear deformation of the panel webs"));

describe("shear deformation of panel webs is listed as not checked", () => {
  test("the box beam with plywood webs names both webs once", () => {
    const lines = panelWebLines(run(example("workshop-box-beam.si.json")).notChecked);
    expect(lines).toHaveLength(1);
    expect(lines[0]).toContain("Left web");
    expect(lines[0]).toContain("Right web");
    expect(lines[0]).toContain("short, deep members");
  });

  test("a sawn-only member has no such line", () => {
    expect(panelWebLines(run(example("mezzanine-edge-beam.si.json")).notChecked)).toHaveLength(0);
    expect(panelWebLines(run(example("loft-beam-16d.us.json")).notChecked)).toHaveLength(0);
  });

  test("property: a box beam lists it exactly when its webs are of a panel material", () => {
    const base = example("workshop-box-beam.si.json");
    fc.assert(
      fc.property(
        fc.constantFrom("panel", "sawn-timber", "engineered-wood", "other"),
        fc.integer({ min: 9, max: 25 }),
        fc.integer({ min: 200, max: 600 }),
        (family, t, depth) => {
          const job = structuredClone(base) as unknown as { materials: { id: string; family?: string }[]; parts: Record<string, unknown>[] };
          job.materials.find((m) => m.id === "PLY")!.family = family;
          job.parts = job.parts.map((p) => {
            if (p.material !== "PLY") return { ...p, x: t, ...(p.id === "top" ? { y: depth - 70 } : {}) };
            return { ...p, shape: { type: "rectangle", b: t, h: depth }, ...(p.id === "web-right" ? { x: t + 95 } : {}) };
          });
          const lines = panelWebLines(run(job as unknown as JobInput).notChecked);
          expect(lines).toHaveLength(family === "panel" ? 1 : 0);
        },
      ),
      { seed: 19, numRuns: 25 },
    );
  });
});

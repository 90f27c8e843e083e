import fc from "fast-check";
import { describe, expect, test } from "vitest";
import { prepareJob } from "../../../core/check-job.js";
import { designMember } from "../../../core/design-member.js";
import type { JobInput } from "../../../core/schema/job.js";
import "../../fast-check-setup.js";

// AISC 360-16 §F13.3 [M]: "partial-length cover plates shall be extended beyond the theoretical cutoff
// point and the extended portion shall be attached to the beam by high-strength bolts in a slip-critical
// connection or fillet welding". A bearing-type bolt there fails with that reason, whatever its count.
// The program applies the same rule to EN 1993-1-8 bolts: category B or C (§3.9) meets it.

/** A W18x50 (REFERENCES §2.2 [V], fillets ignored) with an 8 × 1/2 in bottom plate over the middle half of 26 ft (demo loads). */
function usCoverPlate(bolt: Record<string, unknown>): JobInput {
  return {
    format: "stitchplan-job",
    version: 1,
    units: "us",
    basis: "allowable",
    project: { name: "Cover plate attachment" },
    member: { mark: "CP-1" },
    materials: [{ id: "S", name: "steel", family: "steel", E: 29_000_000, density: 0, yieldStrength: 50_000, tensileStrength: 65_000, strength: { bending: 30_000 } }],
    parts: [
      { id: "plate", material: "S", shape: { type: "rectangle", b: 8, h: 0.5 }, x: -0.2525, y: 0, extent: { from: 6.5, to: 19.5 } },
      { id: "beam", material: "S", shape: { type: "i-section", d: 17.99, tw: 0.355, bf: 7.495, tf: 0.57 }, x: 0, y: 0.5 },
    ],
    connectors: [{ id: "B", kind: "steel-bolt", standard: "AISC-360-16", size: "3/4", grade: "A", ...bolt } as JobInput["connectors"][number]],
    fastening: { default: { connector: "B", rows: 2 } },
    beam: { spans: [26], loads: [{ type: "uniform", w: 3000 }], selfWeight: false },
    spacing: { module: 0.5, minZoneLength: 12, maxZonesPerSpan: 5, symmetric: true },
  };
}

/** A welded-plate I in S355 with a 220 × 15 bottom plate from 1.5 to 6.5 m of 8 m, factored (demo loads). */
function siCoverPlate(bolt: Record<string, unknown>, w = 50): JobInput {
  return {
    format: "stitchplan-job",
    version: 1,
    units: "si",
    basis: "factored",
    project: { name: "Cover plate attachment" },
    member: { mark: "CP-2" },
    materials: [{ id: "S355", name: "S355", family: "steel", E: 210_000, density: 0, yieldStrength: 355, tensileStrength: 510, strength: { bending: 355 } }],
    parts: [
      { id: "plate", material: "S355", shape: { type: "rectangle", b: 220, h: 15 }, x: -10, y: 0, extent: { from: 1.5, to: 6.5 } },
      { id: "beam", material: "S355", shape: { type: "i-section", d: 400, tw: 8.6, bf: 180, tf: 13.5 }, x: 0, y: 15 },
    ],
    connectors: [{ id: "B", kind: "steel-bolt", standard: "EN1993-1-8", size: "M20", grade: "8.8", ...bolt } as JobInput["connectors"][number]],
    fastening: { default: { connector: "B", rows: 2 } },
    beam: { spans: [8], loads: [{ type: "uniform", w }], selfWeight: false },
    spacing: { module: 5, minZoneLength: 300, maxZonesPerSpan: 5, symmetric: true },
  };
}

const run = (job: JobInput) => {
  const p = prepareJob(job);
  if (!p.ok) throw new Error(JSON.stringify(p.issues));
  return designMember(p.core);
};

describe("AISC 360-16 §F13.3: the extension of a partial-length cover plate is attached by slip-critical bolts or welds", () => {
  test("bearing-type AISC bolts: both ends fail with the §F13.3 reason, and the failure is in the verdict", () => {
    const r = run(usCoverPlate({}));
    const needed = r.terminations.filter((t) => t.cutoff !== null);
    expect(needed.length).toBe(2);
    for (const t of needed) {
      expect(t.passes).toBe(false);
      expect(t.note).toMatch(/§F13\.3.*slip-critical/);
    }
    expect(r.status.failures.join(" ")).toMatch(/slip-critical bolts or fillet welds/);
  });
  test("slip-critical Class A bolts: the ends are designed to develop the plate's force and pass", () => {
    const r = run(usCoverPlate({ slipCritical: "class-A" }));
    const needed = r.terminations.filter((t) => t.cutoff !== null);
    expect(needed.length).toBe(2);
    expect(needed.every((t) => t.passes)).toBe(true);
    expect(needed.every((t) => t.reference.includes("slip-critical"))).toBe(true);
  });
  test("EN 1993-1-8: a category A (bearing) M20 fails the rule; category C with a class A surface meets it", () => {
    const bearing = run(siCoverPlate({})).terminations.filter((t) => t.cutoff !== null);
    expect(bearing.length).toBe(2);
    expect(bearing.every((t) => !t.passes && /category to "B" or "C"/.test(t.note))).toBe(true);
    const slip = run(siCoverPlate({ category: "C", frictionSurface: "A" })).terminations.filter((t) => t.cutoff !== null);
    expect(slip.length).toBe(2);
    expect(slip.every((t) => t.passes)).toBe(true);
  });
});

describe("property: through designMember, no bearing-type steel bolt ever passes a cover plate's end that must develop a force", () => {
  test("over loads, standards and bolt options", () => {
    fc.assert(
      fc.property(
        fc.boolean(),
        fc.constantFrom("no", "class-A", "class-B"),
        fc.constantFrom("A", "B", "C"),
        fc.integer({ min: 30, max: 90 }),
        (us, slipCritical, category, w) => {
          const job = us
            ? usCoverPlate({ slipCritical })
            : siCoverPlate(category === "A" ? {} : { category, frictionSurface: "A" }, w);
          const slipResistant = us ? slipCritical !== "no" : category !== "A";
          for (const t of run(job).terminations) {
            if (t.cutoff !== null && t.force > 0 && t.passes) expect(slipResistant).toBe(true);
          }
        },
      ),
      { numRuns: 24 },
    );
  });
});

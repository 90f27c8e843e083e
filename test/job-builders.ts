import type { JobInput } from "../core/schema/job.js";

/** A small valid SI job: a timber I of three 20 × 100 planks on a 4 m simple span (REFERENCES §3.4). */
export function plankIJob(): JobInput {
  return {
    format: "stitchplan-job",
    version: 1,
    units: "si",
    basis: "allowable",
    project: { name: "Test project" },
    member: { mark: "T-1" },
    materials: [{ id: "W", name: "Timber", E: 10_000, density: 0 }],
    parts: [
      { id: "bottom", material: "W", shape: { type: "rectangle", b: 100, h: 20 }, x: 0, y: 0 },
      { id: "web", material: "W", shape: { type: "rectangle", b: 20, h: 100 }, x: 40, y: 20 },
      { id: "top", material: "W", shape: { type: "rectangle", b: 100, h: 20 }, x: 0, y: 120 },
    ],
    connectors: [{ id: "N", kind: "rated", label: "nail rated 100 N", resistance: 100, minSpacing: 10, maxSpacing: 600 }],
    fastening: { default: { connector: "N", rows: 1 } },
    beam: { spans: [4], loads: [{ type: "uniform", category: "dead", w: 0.25 }], selfWeight: false },
    spacing: { module: 1, minZoneLength: 100, maxZonesPerSpan: 5, symmetric: true },
  };
}

/**
 * A 100 × 400 core with 20 × 240 plates on its upper sides and a 140 × 40 cap over all three (issue 16 §1):
 * the plates touch the core by a vertical face and the cap by a horizontal one.
 */
export function platedCoreJob(): JobInput {
  return {
    format: "stitchplan-job",
    version: 1,
    units: "si",
    basis: "allowable",
    project: { name: "Plated core" },
    member: { mark: "PC-1" },
    materials: [{ id: "W", name: "Timber", E: 10_000, density: 0 }],
    parts: [
      { id: "core", material: "W", shape: { type: "rectangle", b: 100, h: 400 }, x: 20, y: 0 },
      { id: "left", material: "W", shape: { type: "rectangle", b: 20, h: 240 }, x: 0, y: 160 },
      { id: "right", material: "W", shape: { type: "rectangle", b: 20, h: 240 }, x: 120, y: 160 },
      { id: "cap", material: "W", shape: { type: "rectangle", b: 140, h: 40 }, x: 0, y: 400 },
    ],
    connectors: [{ id: "N", kind: "rated", label: "rated nail", resistance: 1000, minSpacing: 20, maxSpacing: 600 }],
    fastening: { default: { connector: "N", rows: 1 } },
    beam: { spans: [4], loads: [{ type: "uniform", category: "dead", w: 10 }], selfWeight: false },
    spacing: { module: 1, minZoneLength: 100, maxZonesPerSpan: 5, symmetric: true },
  };
}

/**
 * REFERENCES §6.6 worked case, a symmetric nailed I: flanges 120 × 45, web 45 × 200, all E = 11 000 MPa,
 * span 5000 mm, nails with K_ser = 709.32 N/mm (d = 3.1, ρ_m = 420, not predrilled; EN 1995-1-1 Table 7.1 [M]),
 * w = 4 N/mm (V = 10 kN, M = 12.5 kN·m). Values [D]. In check mode one nail per flange joint per row at s = 50 mm.
 */
export function nailedIJob(model: "rigid" | "slip-aware", mode: "design" | "check" = "check"): JobInput {
  return {
    format: "stitchplan-job",
    version: 1,
    units: "si",
    basis: "factored",
    mode,
    project: { name: "γ-method test" },
    member: { mark: "I-1" },
    materials: [{ id: "C24", name: "C24", E: 11_000, density: 0, strength: { bending: 14.77, shear: 2.46 } }],
    parts: [
      { id: "bottom", material: "C24", shape: { type: "rectangle", b: 120, h: 45 }, x: 0, y: 0 },
      { id: "web", material: "C24", shape: { type: "rectangle", b: 45, h: 200 }, place: { on: "bottom", side: "top" } },
      { id: "top", material: "C24", shape: { type: "rectangle", b: 120, h: 45 }, place: { on: "web", side: "top" } },
    ],
    connectors: [{ id: "N", kind: "rated", label: "3.1 mm nail", resistance: 2000, minSpacing: 31, maxSpacing: 300, slipModulus: 709.32, ultimateSlipModulus: 472.88 }],
    fastening: { default: { connector: "N", rows: 1, ...(mode === "check" ? { provided: { type: "zones" as const, zones: [{ from: 0, to: 5, spacing: 50 }] } } : {}) } },
    beam: { spans: [5], loads: [{ type: "uniform", w: 4 }], selfWeight: false },
    spacing: { module: 1, minZoneLength: 300, maxZonesPerSpan: 5, symmetric: true },
    compositeAction: { model },
  };
}

export const clone = <T>(x: T): T => structuredClone(x);

/**
 * Invented heavy but valid jobs for the service's limits and fairness (not engineering values): the box
 * beam of the opening example on six 3.2 m spans with 200 point and uniform loads in four patterned categories.
 */
export function manyLoadsJob(): JobInput {
  const categories = ["dead", "live", "snow", "roof-live", "wind"] as const;
  const job = workshopBoxBeam();
  job.beam = {
    spans: Array(6).fill(3.2),
    loads: Array.from({ length: 200 }, (_, i) =>
      i % 5 === 0
        ? { type: "uniform" as const, category: categories[i % 5]!, w: 0.2 + (i % 7) * 0.05 }
        : { type: "point" as const, category: categories[i % 5]!, P: 0.2 + (i % 11) * 0.05, at: Number(((i * 0.0931) % 19.1).toFixed(3)) },
    ),
    patternedCategories: ["live", "snow", "roof-live", "wind"],
  };
  job.combinations = { set: "asce7-22-allowable" };
  return job;
}

/** Twelve 2 m spans with nine patterned categories (the built-in four and five of the job's own). Invented. */
export function twelveSpansPatternedJob(): JobInput {
  const job = workshopBoxBeam();
  const own = ["storage", "plant", "crowd", "fitout", "ice"].map((id, i) => ({ id, actsAs: (["live", "live", "live", "dead", "snow"] as const)[i]! }));
  const patterned = ["live", "roof-live", "snow", "wind", ...own.map((c) => c.id)];
  job.beam = {
    spans: Array(12).fill(2),
    loads: [{ type: "uniform", category: "dead", w: 0.8 }, ...patterned.map((category, i) => ({ type: "uniform" as const, category, w: 0.3 + 0.05 * i }))],
    categories: own,
    patternedCategories: patterned,
  };
  job.combinations = { set: "asce7-22-allowable" };
  return job;
}

/** The opening example's nailed plywood box beam (fixtures/examples/workshop-box-beam.si.json), as a builder. */
function workshopBoxBeam(): JobInput {
  return {
    format: "stitchplan-job",
    version: 1,
    units: "si",
    basis: "allowable",
    project: { name: "Invented heavy job" },
    member: { mark: "H-1" },
    materials: [
      { id: "C24", name: "Sawn softwood C24", family: "sawn-timber", E: 11_000, density: 420, strength: { bending: 9.5, shear: 1.6 } },
      { id: "PLY", name: "Structural plywood 18 mm", family: "panel", E: 7000, density: 500, strength: { shear: 2.0 } },
    ],
    parts: [
      { id: "web-left", material: "PLY", shape: { type: "rectangle", b: 18, h: 400 }, x: 0, y: 0 },
      { id: "bottom", material: "C24", shape: { type: "rectangle", b: 95, h: 70 }, x: 18, y: 0 },
      { id: "top", material: "C24", shape: { type: "rectangle", b: 95, h: 70 }, x: 18, y: 330 },
      { id: "web-right", material: "PLY", shape: { type: "rectangle", b: 18, h: 400 }, x: 113, y: 0 },
    ],
    connectors: [{ id: "N1", kind: "rated", label: "3.1 × 65 mm ring-shank nail", resistance: 330, minSpacing: 35, maxSpacing: 150, endDistance: 30 }],
    fastening: { default: { connector: "N1", rows: 2 } },
    beam: { spans: [4.8], loads: [] },
    spacing: { module: 5, minZoneLength: 300, maxZonesPerSpan: 5, symmetric: true },
  };
}

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

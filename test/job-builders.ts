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

export const clone = <T>(x: T): T => structuredClone(x);

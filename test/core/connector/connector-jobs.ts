import type { JobInput } from "../../../core/schema/job.js";

/** Timber I of REFERENCES Case 1.4 (2x6 flanges flat, 2x10 web), DF-L (G = 0.50), 12 ft span. */
export function nailedTimberI(connector: Record<string, unknown>, extra: Partial<JobInput> = {}): JobInput {
  return {
    format: "stitchplan-job",
    version: 1,
    units: "us",
    basis: "allowable",
    project: { name: "Connector test" },
    member: { mark: "B-1" },
    materials: [{ id: "DFL", name: "Douglas fir-larch No. 2", family: "sawn-timber", E: 1_600_000, density: 34, specificGravity: 0.5, strength: { bending: 900, shear: 180 } }],
    parts: [
      { id: "bottom", material: "DFL", shape: { type: "rectangle", b: 5.5, h: 1.5 }, x: 0, y: 0 },
      { id: "web", material: "DFL", shape: { type: "rectangle", b: 1.5, h: 9.25 }, x: 2, y: 1.5 },
      { id: "top", material: "DFL", shape: { type: "rectangle", b: 5.5, h: 1.5 }, x: 0, y: 10.75 },
    ],
    connectors: [{ id: "N", ...connector } as JobInput["connectors"][number]],
    fastening: { default: { connector: "N", rows: 1 } },
    beam: { spans: [12], loads: [{ type: "uniform", category: "dead", w: 30 }, { type: "uniform", category: "live", w: 40 }], selfWeight: false },
    spacing: { module: 0.25, minZoneLength: 24, maxZonesPerSpan: 5, symmetric: true },
    ...extra,
  } as JobInput;
}

/** Plate girder of REFERENCES Case 1.3 (flanges 300 × 20, web 10 × 560 mm), S275, a 1000 kN point load at midspan of 6 m: V = 500 kN. */
export function weldedGirder(connector: Record<string, unknown>, fillets = 2): JobInput {
  return {
    format: "stitchplan-job",
    version: 1,
    units: "si",
    basis: "factored",
    project: { name: "Connector test" },
    member: { mark: "G-1" },
    materials: [{ id: "S275", name: "S275", family: "steel", E: 210_000, density: 7850, yieldStrength: 275, tensileStrength: 430 }],
    parts: [
      { id: "bottom", material: "S275", shape: { type: "rectangle", b: 300, h: 20 }, x: 0, y: 0 },
      { id: "web", material: "S275", shape: { type: "rectangle", b: 10, h: 560 }, x: 145, y: 20 },
      { id: "top", material: "S275", shape: { type: "rectangle", b: 300, h: 20 }, x: 0, y: 580 },
    ],
    connectors: [{ id: "W", ...connector } as JobInput["connectors"][number]],
    fastening: { default: { connector: "W", rows: fillets } },
    beam: { spans: [6], loads: [{ type: "point", category: "dead", P: 1000, at: 3 }], selfWeight: false },
  } as JobInput;
}

/** Two steel plates bolted face to face: a 3/4 in (or 20 mm) cover plate on a thicker plate. */
export function boltedPlates(connector: Record<string, unknown>, units: "us" | "si", rows = 2): JobInput {
  const us = units === "us";
  return {
    format: "stitchplan-job",
    version: 1,
    units,
    basis: "factored",
    project: { name: "Connector test" },
    member: { mark: "P-1" },
    materials: [us ? { id: "A36", name: "A36", family: "steel", E: 29_000_000, density: 490, yieldStrength: 36_000, tensileStrength: 58_000 } : { id: "S275", name: "S275", family: "steel", E: 210_000, density: 7850, yieldStrength: 275, tensileStrength: 430 }],
    parts: us
      ? [
          { id: "plate", material: "A36", shape: { type: "rectangle", b: 10, h: 1 }, x: 0, y: 0 },
          { id: "cover", material: "A36", shape: { type: "rectangle", b: 8, h: 0.75 }, x: 1, y: 1 },
        ]
      : [
          { id: "plate", material: "S275", shape: { type: "rectangle", b: 250, h: 25 }, x: 0, y: 0 },
          { id: "cover", material: "S275", shape: { type: "rectangle", b: 200, h: 20 }, x: 25, y: 25 },
        ],
    connectors: [{ id: "B", ...connector } as JobInput["connectors"][number]],
    fastening: { default: { connector: "B", rows } },
    beam: { spans: [us ? 10 : 3], loads: [{ type: "uniform", category: "dead", w: us ? 2000 : 30 }], selfWeight: false },
    spacing: us ? { module: 0.25, maxZonesPerSpan: 5, symmetric: true } : { module: 5, maxZonesPerSpan: 5, symmetric: true },
  } as JobInput;
}

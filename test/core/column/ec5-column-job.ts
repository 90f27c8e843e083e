import type { JobInput } from "../../../core/schema/job.js";

/** A nailed three-ply C24 column, 45 × 145 mm plies side by side, 3 m, EN 1995-1-1 (invented for the tests). */
export function nailedEc5Column(P = { dead: 8, snow: 10 }, height = 3): JobInput {
  const ply = (i: number) => ({
    id: `p${i}`,
    material: "C24",
    shape: { type: "rectangle" as const, b: 45, h: 145 },
    ...(i === 1 ? { x: 0, y: 0 } : { place: { on: `p${i - 1}`, side: "right" as const } }),
  });
  return {
    format: "stitchplan-job",
    version: 1,
    units: "si",
    basis: "factored",
    project: { name: "Column tests" },
    member: { mark: "C-1" },
    materials: [{ id: "C24", name: "C24", family: "sawn-timber", E: 11_000, Emin: 7_400, density: 420, characteristicDensity: 350, meanDensity: 420, strength: { bending: 14.8, shear: 2.4, compression: 21 } }],
    parts: [ply(1), ply(2), ply(3)],
    connectors: [{ id: "N", kind: "nail", standard: "EN1995-1-1", diameter: 3.1, length: 90, sideAngleToGrainDeg: 90, mainAngleToGrainDeg: 90 } as JobInput["connectors"][number]],
    fastening: { default: { connector: "N", rows: 2 } },
    beam: { spans: [height], loads: [], selfWeight: false },
    combinations: { set: "en1990-6.10" },
    compression: { loads: [{ category: "dead", P: P.dead }, { category: "snow", P: P.snow }] },
  } as JobInput;
}

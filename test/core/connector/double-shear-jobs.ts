import { prepareJob } from "../../../core/check-job.js";
import { designMember } from "../../../core/design-member.js";
import type { JobInput } from "../../../core/schema/job.js";
import type { DesignResult } from "../../../core/schema/result.js";

/** One layer of a three-layer stack: its material fields (job units) and thickness and width (job units). */
export interface Layer {
  material: Record<string, unknown>;
  thickness: number;
  width: number;
}

/**
 * A member of three layers stacked flat, bottom, core and top, centred on one another, with the core
 * named as the held group: its joint has two horizontal contact lines, one on each face of the core, so
 * a connector in double shear crosses bottom, core and top. Invented for the tests.
 */
export function threeLayerJob(p: { units: "us" | "si"; basis: "allowable" | "factored"; bottom: Layer; core: Layer; top: Layer; connector: Record<string, unknown>; headSide?: "auto" | "held" | "other"; load?: number; span?: number }): JobInput {
  const layers = [
    ["bottom", p.bottom],
    ["core", p.core],
    ["top", p.top],
  ] as const;
  const widest = Math.max(...layers.map(([, l]) => l.width));
  let y = 0;
  const parts = layers.map(([id, l]) => {
    const part = { id, material: `m-${id}`, shape: { type: "rectangle", b: l.width, h: l.thickness }, x: (widest - l.width) / 2, y };
    y += l.thickness;
    return part;
  });
  const us = p.units === "us";
  return {
    format: "stitchplan-job",
    version: 1,
    units: p.units,
    basis: p.basis,
    project: { name: "Double-shear test" },
    member: { mark: "D-1" },
    materials: layers.map(([id, l]) => ({ name: `material of ${id}`, ...l.material, id: `m-${id}` })),
    parts,
    connectors: [{ id: "C", ...p.connector }],
    fastening: { default: { connector: "C", rows: 1 }, joints: [{ held: ["core"], connector: "C", rows: 1, headSide: p.headSide ?? "auto" }] },
    beam: { spans: [p.span ?? (us ? 12 : 4)], loads: [{ type: "uniform", category: "live", w: p.load ?? (us ? 200 : 3) }], selfWeight: false },
    spacing: us ? { module: 0.25, maxZonesPerSpan: 5, symmetric: true } : { module: 5, maxZonesPerSpan: 5, symmetric: true },
  } as unknown as JobInput;
}

/** The same stack upside down: the two outer layers trade places (and so the contact lines their roles). */
export function flipped(job: JobInput): JobInput {
  const j = structuredClone(job) as unknown as { parts: { id: string; shape: { h: number }; y: number }[]; materials: { id: string }[] };
  const depth = Math.max(...j.parts.map((p) => p.y + p.shape.h));
  for (const part of j.parts) part.y = depth - part.y - part.shape.h;
  return j as unknown as JobInput;
}

export type Designed = { ok: true; result: DesignResult } | { ok: false; issues: { path: string; message: string }[] };

export function design(job: JobInput): Designed {
  const p = prepareJob(job);
  return p.ok ? { ok: true, result: designMember(p.core) } : { ok: false, issues: p.issues };
}

/** The design of a job that must be valid; fails the test with the issues otherwise. */
export function designed(job: JobInput): DesignResult {
  const d = design(job);
  if (!d.ok) throw new Error(`job refused: ${JSON.stringify(d.issues)}`);
  return d.result;
}

/** The core's schedule (the double-shear joint). */
export const coreSchedule = (r: DesignResult) => r.schedules.find((s) => s.joint === "core")!;

import type { SectionStretch } from "../beam/analyse-beam.js";
import type { JobDocument } from "../schema/job.js";
import type { PositionedPart } from "./rectangles.js";
import { buildSection, positioned } from "./section-model.js";

export interface PartStretch {
  x0: number;
  x1: number;
  /** Ids of the parts present over the stretch. */
  parts: string[];
}

/** Where each part runs along the member, mm: its extent, or the whole length. */
export function partExtent(part: JobDocument["parts"][number], length: number): { from: number; to: number } {
  return { from: part.extent?.from ?? 0, to: part.extent?.to ?? length };
}

/** The stretches of the member between the points where a part starts or stops, with the parts present on each. */
export function partStretches(job: JobDocument, length: number): PartStretch[] {
  const tol = 1e-9 * length;
  const ends = [0, length];
  for (const p of job.parts) {
    const e = partExtent(p, length);
    ends.push(e.from, e.to);
  }
  const cuts = ends.filter((x) => x >= -tol && x <= length + tol).sort((a, b) => a - b);
  const stations = cuts.filter((x, i) => i === 0 || x - cuts[i - 1]! > tol);
  const out: PartStretch[] = [];
  for (let i = 0; i < stations.length - 1; i++) {
    const x0 = stations[i]!;
    const x1 = stations[i + 1]!;
    const mid = (x0 + x1) / 2;
    out.push({ x0, x1, parts: job.parts.filter((p) => { const e = partExtent(p, length); return e.from <= mid && mid <= e.to; }).map((p) => p.id) });
  }
  return out;
}

/** Each stretch's transformed section, all about the modulus of the job's first part, so that their E·I compare. */
export function sectionStretches(job: JobDocument, length: number): (SectionStretch & { parts: string[] })[] {
  const materials = new Map(job.materials.map((m) => [m.id, m]));
  const eRef = materials.get(job.parts[0]!.material)!.E;
  const all = positioned(job.parts);
  return partStretches(job, length).map((s) => {
    const present: PositionedPart[] = all.filter((p) => s.parts.includes(p.id));
    return { ...s, section: buildSection(present, job.materials, eRef) };
  });
}

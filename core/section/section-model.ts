import type { Material, SectionPart } from "../schema/job.js";
import { boundingBox, partRectangles, rectArea, type PositionedPart, type Rect } from "./rectangles.js";

export interface PlacedPart {
  id: string;
  name: string;
  material: Material;
  rects: Rect[];
  /** Modular ratio n = E/E_ref. */
  n: number;
  area: number;
}

/** A transformed section: every area scaled by its modular ratio to the reference modulus. mm, MPa. */
export interface SectionModel {
  parts: PlacedPart[];
  referenceModulus: number;
  /** Real (untransformed) area, mm². */
  area: number;
  /** Transformed area, mm². */
  transformedArea: number;
  /** Height of the elastic neutral axis above the section's bottom, measured in the job's coordinates, mm. */
  centroidY: number;
  /** Second moment of the transformed area about the neutral axis, mm⁴. */
  secondMoment: number;
  bounds: Rect;
}

/** The parts with their positions; prepareJob resolves every placement, so a missing one is a broken invariant. */
export function positioned(parts: SectionPart[]): PositionedPart[] {
  return parts.map((p) => {
    if (p.x === undefined || p.y === undefined) throw new Error(`part "${p.id}" has no resolved position`);
    return p as PositionedPart;
  });
}

/** Builds the transformed section. The reference modulus defaults to the first part's material. */
export function buildSection(parts: PositionedPart[], materials: Material[], referenceModulus?: number): SectionModel {
  const byId = new Map(materials.map((m) => [m.id, m]));
  const eRef = referenceModulus ?? byId.get(parts[0]!.material)!.E;
  const placed: PlacedPart[] = parts.map((p) => {
    const material = byId.get(p.material)!;
    const rects = partRectangles(p);
    return { id: p.id, name: p.name, material, rects, n: material.E / eRef, area: rects.reduce((s, r) => s + rectArea(r), 0) };
  });
  let a = 0;
  let ay = 0;
  for (const p of placed) for (const r of p.rects) {
    const ai = p.n * rectArea(r);
    a += ai;
    ay += ai * (r.y0 + r.y1) / 2;
  }
  const yc = ay / a;
  let i = 0;
  for (const p of placed) for (const r of p.rects) {
    const b = r.x1 - r.x0;
    const h = r.y1 - r.y0;
    const d = (r.y0 + r.y1) / 2 - yc;
    i += p.n * (b * h ** 3 / 12 + b * h * d * d);
  }
  return {
    parts: placed,
    referenceModulus: eRef,
    area: placed.reduce((s, p) => s + p.area, 0),
    transformedArea: a,
    centroidY: yc,
    secondMoment: i,
    bounds: boundingBox(placed.flatMap((p) => p.rects)),
  };
}

/** First moment of the transformed area of the given parts about the neutral axis, mm³ (positive above). */
export function firstMomentOfParts(section: SectionModel, partIds: ReadonlySet<string>): number {
  let q = 0;
  for (const p of section.parts) {
    if (!partIds.has(p.id)) continue;
    for (const r of p.rects) q += p.n * rectArea(r) * ((r.y0 + r.y1) / 2 - section.centroidY);
  }
  return q;
}

/** First moment about the neutral axis of the transformed area above the level y, mm³. */
export function firstMomentAbove(section: SectionModel, y: number): number {
  let q = 0;
  for (const p of section.parts) for (const r of p.rects) {
    const lo = Math.max(r.y0, y);
    if (r.y1 <= lo) continue;
    q += p.n * (r.x1 - r.x0) * (r.y1 - lo) * ((lo + r.y1) / 2 - section.centroidY);
  }
  return q;
}

/** Real width of material cut by a horizontal line at y, mm. At a level shared by two parts, the narrower contact governs the cut. */
export function widthAt(section: SectionModel, y: number, side: "below" | "above" | "at" = "at", tol = 0): number {
  let w = 0;
  for (const p of section.parts) for (const r of p.rects) {
    // A rectangle edge within `tol` of y counts as at y: below takes the parts ending there, above those starting there.
    const inside = side === "below" ? r.y0 < y - tol && y <= r.y1 + tol : side === "above" ? r.y0 <= y + tol && y < r.y1 - tol : r.y0 < y && y < r.y1;
    if (inside) w += r.x1 - r.x0;
  }
  return w;
}

/** Largest distance from the neutral axis to a fibre of each part, mm. */
export function extremeFibre(section: SectionModel, part: PlacedPart): { top: number; bottom: number } {
  return {
    top: Math.max(...part.rects.map((r) => r.y1)) - section.centroidY,
    bottom: section.centroidY - Math.min(...part.rects.map((r) => r.y0)),
  };
}

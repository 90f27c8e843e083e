import { fallsShort } from "../units/limits.js";
import type { ColumnJob, Laminations } from "./column-rules.js";
import { laminationsOf, sameFaces } from "./column-rules.js";

const timberFamilies = new Set(["sawn-timber", "glulam", "engineered-wood"]);

export interface Condition {
  condition: string;
  met: boolean;
  clause: string;
}

/** The laminations and the conditions every timber built-up rule shares: timber, face to face, full length. */
export function timberLaminations(c: ColumnJob, clause: string): { laminations: Laminations | null; conditions: Condition[] } {
  const found = laminationsOf(c.section);
  const laminations = "reason" in found ? null : found;
  const parts = c.section.parts;
  const fullLength = c.job.parts.every((p) => !p.extent || ((p.extent.from ?? 0) <= 0 && (p.extent.to === undefined || !fallsShort(p.extent.to, c.height))));
  return {
    laminations,
    conditions: [
      { condition: "every lamination is timber (sawn, glulam or engineered wood)", met: parts.every((p) => timberFamilies.has(p.material.family)), clause },
      { condition: laminations ? "the laminations lie face to face, stacked across one axis" : `the laminations lie face to face, stacked across one axis (${"reason" in found ? found.reason : ""})`, met: laminations !== null, clause },
      { condition: "every lamination runs the full length of the column", met: fullLength, clause },
      { condition: "every lamination has the same depth, flush on both edges", met: laminations !== null && sameFaces(laminations), clause },
      { condition: "every lamination has its compression strength (materials[].strength.compression)", met: parts.every((p) => p.material.strength.compression !== undefined), clause: "job" },
    ],
  };
}

/** Second moments of the laminations about the two axes, each about its own centroid (unjointed) and of the whole section as one piece. mm⁴. */
export function solidSecondMoment(l: Laminations, axis: "x" | "y"): { own: number; whole: number } {
  let own = 0;
  let a = 0;
  let as = 0;
  const spans = l.parts.map((p) => {
    const r = p.rects[0]!;
    // About x the lever is along y; about y, along x.
    const [lo, hi, w] = axis === "x" ? [r.y0, r.y1, r.x1 - r.x0] : [r.x0, r.x1, r.y1 - r.y0];
    return { lo, hi, w, n: p.n };
  });
  for (const s of spans) {
    own += (s.n * s.w * (s.hi - s.lo) ** 3) / 12;
    a += s.n * s.w * (s.hi - s.lo);
    as += s.n * s.w * (s.hi - s.lo) * ((s.hi + s.lo) / 2);
  }
  const c = as / a;
  let whole = 0;
  for (const s of spans) whole += (s.n * s.w * (s.hi - s.lo) ** 3) / 12 + s.n * s.w * (s.hi - s.lo) * ((s.hi + s.lo) / 2 - c) ** 2;
  return { own, whole };
}

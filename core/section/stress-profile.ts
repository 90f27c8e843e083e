import { firstMomentAbove, widthAt, type SectionModel } from "./section-model.js";

export interface ProfilePoint {
  y: number;
  /** |Q| of the area above y about the neutral axis, mm³. */
  firstMoment: number;
  /** Real width cut at y, mm. */
  width: number;
  /** Q/(I·t), 1/mm²: τ per newton of shear. */
  factor: number;
  /** Which side of a level the width was taken on. */
  side: "below" | "above" | "at";
}

/**
 * Shear stress per unit shear, τ(y)/V = Q(y)/(I·t(y)), over the depth. Levels where the width
 * changes appear twice (width below, then above) so the jump is drawn and checked on both sides.
 */
export function stressProfile(section: SectionModel, samples = 40): ProfilePoint[] {
  const { y0, y1 } = section.bounds;
  const edges = section.parts.flatMap((p) => p.rects.flatMap((r) => [r.y0, r.y1]));
  const tol = 1e-9 * (y1 - y0);
  // A level within the tolerance of a part's edge is that edge, so the width on each side is the same
  // whether a sample falls a rounding error above or below it (a job and its unit-converted twin alike).
  const atEdge = (y: number) => edges.find((e) => Math.abs(e - y) <= tol) ?? y;
  const levels = [...edges, section.centroidY, ...Array.from({ length: samples + 1 }, (_, i) => y0 + ((y1 - y0) * i) / samples)]
    .map(atEdge)
    .sort((a, b) => a - b)
    .filter((y, i, all) => i === 0 || y - all[i - 1]! > tol);
  const edgeSet = edges.filter((y) => y > y0 && y < y1);
  const out: ProfilePoint[] = [];
  const push = (y: number, side: ProfilePoint["side"]) => {
    const q = Math.abs(firstMomentAbove(section, y));
    const width = widthAt(section, y, side, tol);
    out.push({ y, firstMoment: q, width, factor: width > 0 ? q / (section.secondMoment * width) : 0, side });
  };
  for (const y of levels) {
    if (y <= y0 || y >= y1) {
      push(y, y <= y0 ? "above" : "below");
      continue;
    }
    const isEdge = edgeSet.some((e) => Math.abs(e - y) <= tol);
    if (isEdge) {
      push(y, "below");
      push(y, "above");
    } else push(y, "at");
  }
  return out;
}

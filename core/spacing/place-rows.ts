import type { PlannedZone } from "./zoning.js";

/**
 * Positions of the connector rows along the member, mm from the left end: the first row at the end
 * distance, the rest at each zone's spacing measured from the start of the zone, the last row at the
 * end distance from the right end. A mirrored plan repeats the left rows in mirror image.
 */
export function placeRows(zones: PlannedZone[], length: number, endDistance: number, mirrored: boolean): number[] {
  const e = endDistance;
  const eps = 1e-9 * length;
  if (length <= 2 * e + eps) return [length / 2];
  const stepThrough = (start: number, stop: number, s: number, out: number[]) => {
    for (let x = start, k = 0; x < stop - eps; x = start + ++k * s) out.push(x);
  };
  if (!mirrored) {
    const out: number[] = [];
    zones.forEach((z, i) => stepThrough(i === 0 ? e : z.from, i === zones.length - 1 ? length - e : z.to, z.spacing, out));
    out.push(length - e);
    return out;
  }
  const centre = zones.findIndex((z) => z.from <= length / 2 + eps && z.to >= length / 2 - eps);
  const left: number[] = [];
  for (let i = 0; i < centre; i++) stepThrough(i === 0 ? e : zones[i]!.from, zones[i]!.to, zones[i]!.spacing, left);
  const c = zones[centre]!;
  const start = centre === 0 ? e : c.from;
  const middle: number[] = [];
  stepThrough(start, length - start, c.spacing, middle);
  middle.push(length - start);
  const right = left.map((x) => length - x).reverse();
  return [...left, ...middle, ...right];
}

/**
 * The far side of a staggered intermittent weld: a segment at each end, as on the near side, and one
 * midway between each two near-side segments. (The ends get a segment on both sides, so the far side
 * never reaches half a pitch further than the near side for the flow it carries.)
 */
export function staggeredSide(near: number[]): number[] {
  if (near.length < 2) return [...near];
  return [near[0]!, ...near.slice(1).map((x, i) => (near[i]! + x) / 2), near[near.length - 1]!];
}

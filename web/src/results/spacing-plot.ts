import type { Schedule } from "../../../core/schema/result.js";

export interface SpacingPlot {
  x: number[];
  /** Required spacing, capped at the largest allowed spacing (it runs to infinity where q is zero). */
  required: number[];
  /** Zone spacing as steps: value i holds from x[i] to x[i + 1]. */
  provided: (number | null)[];
  cap: number;
}

/**
 * Required and provided spacing on one set of abscissae: the beam stations plus every zone boundary,
 * so the steps change exactly where the zones do. Required spacing at an added boundary is
 * interpolated between its neighbouring stations, for plotting only.
 */
export function spacingPlot(stations: number[], schedule: Schedule): SpacingPlot {
  const cap = schedule.limits.maxSpacing;
  const points = stations.map((x, i) => ({ x, required: schedule.requiredSpacing[i] ?? null }));
  const tolerance = 1e-9 * Math.max(1, Math.abs(stations[stations.length - 1] ?? 1));
  for (const b of schedule.zones.flatMap((z) => [z.from, z.to])) {
    if (points.some((p) => Math.abs(p.x - b) <= tolerance)) continue;
    const after = points.findIndex((p) => p.x > b);
    if (after <= 0) continue;
    const left = points[after - 1]!;
    const right = points[after]!;
    const t = (b - left.x) / (right.x - left.x);
    const required = left.required !== null && right.required !== null ? left.required + t * (right.required - left.required) : (left.required ?? right.required);
    points.splice(after, 0, { x: b, required });
  }
  const zoneAt = (x: number) => schedule.zones.find((z, k) => x >= z.from - tolerance && (x < z.to - tolerance || (k === schedule.zones.length - 1 && x <= z.to + tolerance)));
  return {
    x: points.map((p) => p.x),
    required: points.map((p) => (p.required === null ? cap : Math.min(p.required, cap))),
    provided: points.map((p, i) => zoneAt((p.x + (points[i + 1]?.x ?? p.x)) / 2)?.spacing ?? null),
    cap,
  };
}

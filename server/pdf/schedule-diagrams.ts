import { lineDiagram, type Drawing } from "../../core/index.js";
import { DIAGRAM_HEIGHT } from "./figure.js";
import type { QuantityText } from "./quantity-text.js";
import type { Schedule } from "./worksheet-context.js";

/** Shear flow per joint line along the member (envelope over the combinations). */
export function shearFlowDiagram(s: Schedule, stations: number[], text: QuantityText, width: number): Drawing {
  return lineDiagram({
    title: "",
    xUnit: text.unit("span"),
    yUnit: text.unit("shearFlow"),
    x: stations,
    series: [{ label: "q per line", values: s.shearFlow, fill: true }],
    width,
    height: DIAGRAM_HEIGHT,
    role: `shear-flow ${s.joint}`,
  });
}

/**
 * Required spacing against the zones provided, on one x axis: the zone boundaries are added to the
 * beam stations so each provided step changes exactly at its boundary.
 */
export function spacingDiagram(s: Schedule, stations: number[], text: QuantityText, width: number): Drawing {
  const boundaries = s.zones.flatMap((z) => [z.from, z.to]).filter((b) => !stations.some((x) => Math.abs(x - b) < 1e-9));
  const merged = [...stations.map((x, i) => ({ x, required: s.requiredSpacing[i] ?? null })), ...[...new Set(boundaries)].map((x) => ({ x, required: interpolate(stations, s.requiredSpacing, x) }))].sort(
    (a, b) => a.x - b.x,
  );
  const x = merged.map((m) => m.x);
  const provided = x.map((xi, i) => {
    const next = x[i + 1] ?? xi;
    const mid = (xi + next) / 2;
    return s.zones.find((z) => mid >= z.from - 1e-9 && mid <= z.to + 1e-9)?.spacing ?? null;
  });
  const yMax = Math.max(s.limits.maxSpacing, ...s.zones.map((z) => z.spacing)) * 1.5;
  return lineDiagram({
    title: "",
    xUnit: text.unit("span"),
    yUnit: text.unit("length"),
    x,
    series: [
      { label: "required", values: merged.map((m) => m.required), colour: "#b4531a" },
      { label: "provided zones", values: provided, steps: true, colour: "#1f5f99" },
      { label: "min spacing", values: x.map(() => s.limits.minSpacing), colour: "#8a96a3", dash: [4, 3] },
    ],
    width,
    height: DIAGRAM_HEIGHT,
    yMax,
    role: `spacing ${s.joint}`,
  });
}

function interpolate(xs: number[], values: (number | null)[], x: number): number | null {
  const i = xs.findIndex((xi) => xi > x);
  if (i <= 0) return null;
  const a = values[i - 1];
  const b = values[i];
  if (a === null || a === undefined || b === null || b === undefined) return null;
  const x0 = xs[i - 1]!;
  const x1 = xs[i]!;
  return a + ((b - a) * (x - x0)) / (x1 - x0 || 1);
}

import { lineDiagram, type Drawing } from "../../core/index.js";
import { DIAGRAM_HEIGHT } from "./figure.js";
import { ink } from "./sheet.js";
import { weldedShare, type WeldJoint } from "./weld-zones.js";
import type { WorksheetContext } from "./worksheet-context.js";

/**
 * Shear flow per line against what each zone's weld carries per line with the least resistance over
 * the combinations (fillets × R × L_s/p), on one x axis: the zone boundaries are added to the beam
 * stations so each step changes exactly at its boundary.
 */
export function weldDiagram(c: WorksheetContext, w: WeldJoint): Drawing {
  const { result, text, sheet } = c;
  const stations = result.beam.stations;
  const least = Math.min(...w.resistance.map((r) => r.value)) * w.fillets;
  const boundaries = [...new Set(w.zones.flatMap((z) => [z.from, z.to]))].filter((b) => !stations.some((x) => Math.abs(x - b) < 1e-9));
  const points = [
    ...stations.map((x, i) => ({ x, q: w.shearFlow[i] ?? null })),
    ...boundaries.map((x) => ({ x, q: interpolate(stations, w.shearFlow, x) })),
  ].sort((a, b) => a.x - b.x);
  const x = points.map((p) => p.x);
  const carried = x.map((xi, i) => {
    const mid = (xi + (x[i + 1] ?? xi)) / 2;
    const zone = w.zones.find((z) => mid >= z.from - 1e-9 && mid <= z.to + 1e-9);
    return zone ? least * weldedShare(zone) : null;
  });
  return lineDiagram({
    title: "",
    xUnit: text.unit("span"),
    yUnit: text.unit("shearFlow"),
    x,
    series: [
      { label: "q per line", values: points.map((p) => p.q), fill: true, colour: w.passes ? "#1f5f99" : ink.fail },
      { label: "weld carries per line (least R)", values: carried, steps: true, colour: "#2e7d4f", dash: [4, 2] },
    ],
    width: sheet.width,
    height: DIAGRAM_HEIGHT,
    role: `weld ${w.joint}`,
  });
}

function interpolate(xs: number[], values: number[], x: number): number | null {
  const i = xs.findIndex((xi) => xi > x);
  if (i <= 0) return null;
  const a = values[i - 1];
  const b = values[i];
  if (a === undefined || b === undefined) return null;
  const x0 = xs[i - 1]!;
  const x1 = xs[i]!;
  return a + ((b - a) * (x - x0)) / (x1 - x0 || 1);
}

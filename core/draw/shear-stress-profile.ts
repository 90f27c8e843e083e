import type { DesignResult } from "../schema/result.js";
import { formatNumber } from "../units/format.js";
import { fromCore, toCore, type UnitSystem } from "../units/quantity.js";
import { lineTo, moveTo, palette, polyline, type Drawing, type DrawItem } from "./drawing.js";

export interface GoverningShear {
  /** Index of the station in `beam.stations`. */
  station: number;
  x: number;
  /** |V| there, in the result's force unit. */
  shear: number;
  combination: string;
}

/** The station of the largest |V| over every combination, and the combination that gives it. */
export function governingShear(result: Pick<DesignResult, "beam">): GoverningShear | null {
  const { envelope, stations } = result.beam;
  let best: GoverningShear | null = null;
  stations.forEach((x, i) => {
    const v = Math.max(Math.abs(envelope.shearMax[i] ?? 0), Math.abs(envelope.shearMin[i] ?? 0));
    if (!best || v > best.shear) best = { station: i, x, shear: v, combination: envelope.governingShear[i] ?? "" };
  });
  return best;
}

/**
 * τ(y) = V·Q(y)/(I·t(y)) over the depth: the section's stress profile (τ per unit shear force) times the
 * given |V|, in the result's stress unit. Where t changes at a level (a web meeting a flange) the
 * profile holds both values, so the step shows.
 */
export function shearStressValues(result: Pick<DesignResult, "section" | "units">, shear: number): { y: number; stress: number }[] {
  const units: UnitSystem = result.units;
  const shearCore = toCore(shear, "force", units);
  return result.section.stressProfile.map((p) => ({ y: p.y, stress: fromCore(toCore(p.factor, "perArea", units) * shearCore, "stress", units) }));
}

export interface StressProfileOptions {
  width: number;
  height: number;
  /** |V| and where; the governing station when absent. */
  at?: GoverningShear;
  /** Drawing y of the section's top and bottom, to line the profile up with a section drawn beside it. */
  frame?: { top: number; bottom: number };
}

/**
 * The shear stress over the depth at one station, drawn beside the section: depth upward, τ to the
 * right, the neutral axis and every horizontal joint level marked. Numbers are in the result's units.
 */
export function shearStressProfile(result: Pick<DesignResult, "section" | "units" | "unitLabels" | "beam" | "joints">, options: StressProfileOptions): Drawing | null {
  const at = options.at ?? governingShear(result);
  if (!at || result.section.stressProfile.length < 2) return null;
  const values = shearStressValues(result, at.shear);
  const stressUnit = result.unitLabels.stress ?? "";
  const { y0, y1 } = result.section.bounds;
  const margin = { left: 16, right: 20, top: 22, bottom: 30 };
  const frame = options.frame ?? { top: margin.top, bottom: options.height - margin.bottom };
  const w = options.width - margin.left - margin.right;
  const peak = values.reduce((a, b) => (b.stress > a.stress ? b : a), values[0]!);
  const top = peak.stress > 0 ? peak.stress * 1.15 : 1;
  const X = (tau: number) => margin.left + (tau / top) * w;
  const Y = (y: number) => frame.top + (1 - (y - y0) / (y1 - y0 || 1)) * (frame.bottom - frame.top);
  const items: DrawItem[] = [];
  items.push({ type: "text", x: margin.left, y: 12, text: `τ at x = ${formatNumber(at.x)} ${result.unitLabels.span ?? ""}`, size: 10, anchor: "start", bold: true, fill: palette.ink });
  items.push({
    type: "text",
    x: margin.left,
    y: options.height - 6,
    text: `|V| = ${formatNumber(at.shear)} ${result.unitLabels.force ?? ""} (${at.combination})`,
    size: 9,
    anchor: "start",
    fill: palette.faint,
  });
  items.push({ type: "path", d: `${moveTo(X(0), Y(y0))}${lineTo(X(0), Y(y1))}`, stroke: palette.ink, strokeWidth: 1, role: "depth-axis" });
  items.push({ type: "path", d: `${moveTo(X(0), Y(y0))}${lineTo(X(top), Y(y0))}`, stroke: palette.grid, strokeWidth: 0.75 });

  for (const joint of result.joints) {
    for (const line of joint.lines.filter((l) => l.orientation === "horizontal")) {
      items.push({ type: "path", d: `${moveTo(X(0), Y(line.level))}${lineTo(X(top), Y(line.level))}`, stroke: palette.joint, strokeWidth: 1, dash: [2, 2], role: `joint-level ${joint.id}` });
    }
  }
  const na = Y(result.section.centroidY);
  items.push({ type: "path", d: `${moveTo(X(0) - 4, na)}${lineTo(X(top), na)}`, stroke: palette.neutral, strokeWidth: 1, dash: [6, 3], role: "neutral-axis" });

  const points = values.map((v) => [X(v.stress), Y(v.y)] as [number, number]);
  const first = values[0]!;
  const last = values[values.length - 1]!;
  items.push({ type: "path", d: `${polyline(points)}${lineTo(X(0), Y(last.y))}${lineTo(X(0), Y(first.y))}Z`, fill: palette.joint, opacity: 0.14 });
  items.push({ type: "path", d: polyline(points), stroke: palette.joint, strokeWidth: 1.6, role: "stress-profile" });
  // The peak's value sits inside the curve, just above the level where it occurs.
  items.push({ type: "text", x: X(peak.stress) - 5, y: Y(peak.y) - 6, text: `${formatNumber(peak.stress)} ${stressUnit}`, size: 9.5, anchor: "end", bold: true, fill: palette.joint, role: "stress-peak" });
  items.push({ type: "text", x: X(top), y: Y(y0) + 13, text: `τ (${stressUnit})`, size: 9, anchor: "end", fill: palette.faint });
  return { width: options.width, height: options.height, items, title: `Shear stress over the depth at x = ${formatNumber(at.x)} ${result.unitLabels.span ?? ""}, largest ${formatNumber(peak.stress)} ${stressUnit}` };
}

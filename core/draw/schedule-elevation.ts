import type { DesignResult, Schedule } from "../schema/result.js";
import { formatNumber } from "../units/format.js";
import { lineTo, moveTo, palette, rectPath, type Drawing, type DrawItem } from "./drawing.js";

export interface ScheduleElevationOptions {
  width: number;
  height: number;
}

/**
 * One joint's schedule as the builder sees it along the member: the zones as bands with their
 * spacing, a tick at every row of connectors, the zone boundaries and the supports.
 * Input numbers are in the result's units.
 */
export function scheduleElevation(result: Pick<DesignResult, "beam" | "unitLabels">, schedule: Schedule, options: ScheduleElevationOptions): Drawing {
  const margin = { left: 14, right: 14, top: 30, bottom: 34 };
  const w = options.width - margin.left - margin.right;
  const length = result.beam.length;
  const X = (x: number) => margin.left + (length > 0 ? (x / length) * w : 0);
  const stripTop = margin.top;
  const stripHeight = Math.max(14, options.height - margin.top - margin.bottom);
  const spacingUnit = result.unitLabels.length ?? "";
  const spanUnit = result.unitLabels.span ?? "";
  const items: DrawItem[] = [];
  items.push({ type: "text", x: margin.left, y: 13, text: `Joint ${schedule.joint}: ${schedule.count} × ${schedule.connectorLabel}, spacing in ${spacingUnit}`, size: 10.5, anchor: "start", bold: true, fill: palette.ink });

  schedule.zones.forEach((zone, k) => {
    const x0 = X(zone.from);
    const x1 = X(zone.to);
    items.push({ type: "path", d: rectPath(x0, stripTop, x1 - x0, stripHeight), fill: zone.passes ? (k % 2 ? palette.material[1] : palette.material[0]) : palette.fail, opacity: zone.passes ? 1 : 0.22, role: `zone ${k + 1}${zone.passes ? "" : " fails"}` });
    const label = `${formatNumber(zone.spacing)}${zone.rows > 1 ? ` ×${zone.rows}` : ""}`;
    if (x1 - x0 > label.length * 6 + 4) {
      items.push({ type: "text", x: (x0 + x1) / 2, y: stripTop - 5, text: label, size: 9.5, anchor: "middle", fill: zone.passes ? palette.ink : palette.fail, bold: !zone.passes });
    }
  });

  const ticks = schedule.positions.map((x) => `${moveTo(X(x), stripTop + 3)}${lineTo(X(x), stripTop + stripHeight - 3)}`).join("");
  if (ticks) items.push({ type: "path", d: ticks, stroke: palette.joint, strokeWidth: 1, role: "connector-rows" });
  items.push({ type: "path", d: rectPath(X(0), stripTop, X(length) - X(0), stripHeight), stroke: palette.ink, strokeWidth: 1.2 });

  const boundaries = [...new Set(schedule.zones.flatMap((z) => [z.from, z.to]))].sort((a, b) => a - b);
  let lastLabelX = -Infinity;
  for (const b of boundaries) {
    const x = X(b);
    items.push({ type: "path", d: `${moveTo(x, stripTop + stripHeight)}${lineTo(x, stripTop + stripHeight + 6)}`, stroke: palette.faint, strokeWidth: 0.75 });
    if (x - lastLabelX < 26 && b !== length) continue;
    items.push({ type: "text", x, y: stripTop + stripHeight + 17, text: formatNumber(b), size: 9, anchor: b === 0 ? "start" : b === length ? "end" : "middle", fill: palette.faint });
    lastLabelX = x;
  }
  for (const support of result.beam.supports) {
    const x = X(support.x);
    const y = stripTop + stripHeight;
    items.push({ type: "path", d: `${moveTo(x, y)}${lineTo(x - 5, y + 8)}${lineTo(x + 5, y + 8)}Z`, fill: palette.ink, role: "support" });
  }
  items.push({ type: "text", x: X(length), y: stripTop + stripHeight + 29, text: `x (${spanUnit})`, size: 9, anchor: "end", fill: palette.faint });
  return { width: options.width, height: options.height, items, title: `Connector schedule along the member, joint ${schedule.joint}` };
}

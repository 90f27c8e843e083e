import { scheduleElevation } from "../../../core/draw/schedule-elevation.js";
import type { DesignResult, Schedule } from "../../../core/schema/result.js";
import { formatNumber, formatRatio } from "../../../core/units/format.js";
import { el } from "../dom.js";
import { spacingDiagram } from "./diagrams.js";
import { figure } from "./figure.js";
import { header, range, shown, table, utilisation } from "./quantities.js";

/** One joint's schedule: the zones a builder follows, how economical they are, and the row-by-row check. */
export function scheduleBlock(result: DesignResult, schedule: Schedule, width: number): HTMLElement {
  const u = result.unitLabels;
  const e = schedule.efficiency;
  const v = schedule.verification;
  const zones = table(
    `Schedule, joint ${schedule.joint}`,
    ["Zone", header("From – to", u.span), header("Spacing", u.length), "Per row", "Count", header("Required", u.length), "Utilisation"],
    schedule.zones.map((z, k) => ({
      className: z.passes ? "" : "fails",
      cells: [String(k + 1), range(result, z.from, z.to).replace(` ${u.span ?? ""}`, ""), formatNumber(z.spacing), String(z.rows), String(z.count), z.requiredSpacing === null ? "any" : formatNumber(z.requiredSpacing), utilisation(z.utilisation, z.passes)],
    })),
    { className: "schedule", numeric: [2, 3, 4, 5] },
  );
  const resistance = resistanceText(result, schedule);
  const l = schedule.limits;
  const limits = [
    `minimum ${shown(result, l.minSpacing, "length")}`,
    `maximum ${shown(result, l.maxSpacing, "length")}`,
    `end distance ${shown(result, l.endDistance, "length")}`,
    l.module !== null ? `module ${shown(result, l.module, "length")}` : null,
    l.preferred ? `preferred ${l.preferred.map((p) => formatNumber(p)).join(", ")} ${u.length ?? ""}` : null,
    `shortest zone ${shown(result, l.minZoneLength, "length")}`,
  ].filter(Boolean);
  const fails = !schedule.passes;
  return el("article", { className: `schedule-block${fails ? " fails" : ""}`, attrs: { "aria-label": `Schedule for joint ${schedule.joint}` } }, [
    el("h3", {}, [
      `Joint ${schedule.joint}: ${schedule.connectorLabel}, ${schedule.rows} per row on ${schedule.lineCount} line${schedule.lineCount === 1 ? "" : "s"}`,
      el("span", { className: `verdict ${fails ? "fails" : "passes"}`, text: fails ? "fails" : "passes" }),
    ]),
    figure(scheduleElevation(result, schedule, { width, height: 92 }), "diagram elevation"),
    zones,
    el("dl", { className: "figures" }, [
      ...term("Connectors", `${schedule.count} in all (every line of the joint)`),
      ...term("Lower bound", `${formatNumber(e.lowerBound, 4)} (∫ of demand over resistance along the member: no schedule can use fewer)`),
      ...term("Count ÷ lower bound", e.countOverLowerBound === null ? "—" : formatRatio(e.countOverLowerBound)),
      ...term(
        "One uniform spacing",
        e.uniformSpacing === null || e.uniformCount === null ? "none within the limits carries the load" : `${shown(result, e.uniformSpacing, "length")} throughout, ${e.uniformCount} connectors (${e.uniformOverCount === null ? "—" : formatRatio(e.uniformOverCount)} × this schedule)`,
      ),
      ...term("Resistance per connector", resistance),
      ...term("Limits", limits.join(", ")),
    ]),
    el("p", { className: `verification${v.passes ? "" : " fails"}` }, [
      el("strong", { text: v.passes ? "Row check passes: " : "Row check fails: " }),
      `largest utilisation ${formatRatio(v.maxUtilisation)} at x = ${shown(result, v.at, "span")} (${v.combination}). Method: ${v.method}.`,
    ]),
    spacingDiagram(result, schedule, width),
  ]);
}

const term = (name: string, value: string) => [el("dt", { text: name }), el("dd", { text: value })];

/** Resistance per connector, once for every group of combinations that share the same value and reason. */
function resistanceText(result: DesignResult, schedule: Schedule): string {
  const groups = new Map<string, string[]>();
  for (const r of schedule.resistance) {
    const text = `${shown(result, r.value, "connectorForce")} (${r.governing}; ${r.reference})`;
    groups.set(text, [...(groups.get(text) ?? []), r.combination]);
  }
  const all = schedule.resistance.length;
  return [...groups]
    .map(([text, ids]) => (groups.size === 1 ? `${text}${all > 1 ? `, every combination` : `, ${ids[0]}`}` : `${text} for ${ids.join(", ")}`))
    .join("; ");
}

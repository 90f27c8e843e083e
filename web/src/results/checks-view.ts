import { palette } from "../../../core/draw/drawing.js";
import { lineDiagram } from "../../../core/draw/line-diagram.js";
import type { DesignResult } from "../../../core/schema/result.js";
import { formatNumber } from "../../../core/units/format.js";
import { el } from "../dom.js";
import { figure } from "./figure.js";
import { header, shown, table, utilisation } from "./quantities.js";

/** Member checks: demand against capacity, each with its utilisation. */
export function memberChecks(result: DesignResult, labelsOf: (check: DesignResult["checks"][number]) => Record<string, string> = () => result.unitLabels): HTMLElement {
  return table(
    "Member checks",
    ["Check", "Demand", "Capacity", "Utilisation", "Where"],
    result.checks.map((c) => ({
      className: c.passes ? "" : "fails",
      cells: [
        el("span", {}, [c.title, el("span", { className: "sub", text: c.reference })]),
        c.quantity === "ratio" ? formatNumber(c.demand) : shown({ unitLabels: labelsOf(c) }, c.demand, c.quantity),
        c.quantity === "ratio" ? formatNumber(c.capacity) : shown({ unitLabels: labelsOf(c) }, c.capacity, c.quantity),
        utilisation(c.utilisation, c.passes),
        el("span", {}, [c.at === null ? "" : `x = ${shown(result, c.at, "span")}`, el("span", { className: "sub", text: c.combination })]),
      ],
    })),
    { className: "checks", numeric: [1, 2], captionHidden: true },
  );
}

/** Glue lines: the largest bond-line stress against the strength, and τ along the member. */
export function bondLines(result: DesignResult, width: number): HTMLElement[] {
  if (result.bondLines.length === 0) return [];
  const u = result.unitLabels;
  const rows = table(
    "Bond lines",
    ["Joint", "Bond line", header("Width t", u.length), header("τ max", u.stress), header("Strength", u.stress), "Utilisation", "Where"],
    result.bondLines.map((b) => {
      const strength = Math.min(...b.strength.map((s) => s.value));
      const governing = b.strength.find((s) => s.value === strength);
      return {
        className: b.passes ? "" : "fails",
        cells: [
          b.joint,
          b.connectorLabel,
          formatNumber(b.width),
          formatNumber(b.maxStress),
          `${formatNumber(strength)}${governing ? ` (${governing.governing})` : ""}`,
          utilisation(b.utilisation, b.passes),
          el("span", {}, [`x = ${shown(result, b.at, "span")}`, el("span", { className: "sub", text: b.combination })]),
        ],
      };
    }),
    { className: "bond-lines", numeric: [2, 3], captionHidden: true },
  );
  const plots = result.bondLines.map((b) =>
    figure(
      lineDiagram({
        title: `Bond-line stress τ, joint ${b.joint}`,
        xUnit: u.span ?? "",
        yUnit: u.stress ?? "",
        x: result.beam.stations,
        width,
        height: 180,
        role: `bond-line ${b.joint}`,
        series: [
          { label: "τ", values: b.stress },
          { label: "lowest strength", values: result.beam.stations.map(() => Math.min(...b.strength.map((s) => s.value))), colour: palette.fail, dash: [4, 3] },
        ],
      }),
    ),
  );
  return [rows, ...plots];
}

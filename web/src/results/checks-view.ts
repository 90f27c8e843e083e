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

/** A member under axial compression: each axis's K_e, l_e/d (or λ) and C_P (or k_c), and each combination's interaction. */
export function columnTables(result: DesignResult): HTMLElement[] {
  const col = result.column;
  if (!col) return [];
  const title = `Built-up column: ${col.title}${col.standard ? `, ${col.standard}` : ""}`;
  if (!col.applies) return [el("p", { className: "hint fails", text: `${title}. Not designed as a column: ${col.reason ?? ""}` })];
  const nds = col.rule === "nds-15.3";
  const en1993 = col.rule === "en1993-6.4";
  const steel = col.rule === "aisc-e6" || en1993;
  const axes = table(
    title,
    ["Buckling about", "K_e", "l_e", nds ? "l_e/d" : en1993 ? "L_cr/i" : steel ? "L_c/r" : "λ", nds ? "K_f" : "", nds ? "C_P" : en1993 ? "χ" : steel ? "F_cr/F_y" : "k_c", "π²EI/l_e²"],
    col.axes.map((a) => ({
      cells: [`${a.axis} axis${a.jointed ? " (across the joints)" : ""}`, formatNumber(a.K), shown(result, a.effectiveLength, "span"), formatNumber(a.slenderness, 4), nds ? formatNumber(a.factor) : "", formatNumber(a.stability, 3), shown(result, a.euler, "force")],
    })),
    { className: "column-axes", numeric: [1, 2, 3, 4, 5, 6] },
  );
  const combos = table(
    "Axial load by combination",
    ["Combination", "Axial P", "Moment", nds ? "F_c*" : en1993 ? "f_y/γ_M1" : steel ? (result.basis === "factored" ? "φ_c F_y" : "F_y/Ω_c") : "f_c,0,d", "Capacity", "Interaction"],
    col.combinations.map((k) => ({
      cells: [k.combination === col.governing ? `${k.combination} (governs)` : k.combination, shown(result, k.axial, "force"), shown(result, k.moment, "moment"), shown(result, k.strength, "stress"), shown(result, k.capacity, "force"), k.interaction === null ? "—" : formatNumber(k.interaction, 3)],
    })),
    { className: "column-combinations", numeric: [1, 2, 3, 4, 5] },
  );
  return [axes, combos, ...col.joints.map((j) => el("p", { className: "hint", text: `Joint ${j.joint}: ${j.governs}.` }))];
}

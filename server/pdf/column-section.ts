import { formatNumber, formatRatio } from "../../core/index.js";
import { ink } from "./sheet.js";
import { table } from "./table.js";
import type { WorksheetContext } from "./worksheet-context.js";

/** A member under axial compression: the built-up column rule, each axis's slenderness and stability factor, and each combination's interaction. */
export function columnSection(c: WorksheetContext): void {
  const { sheet, result, text } = c;
  const col = result.column;
  if (!col) return;
  sheet.heading(`Built-up column: ${col.title}${col.standard ? `, ${col.standard}` : ""}`, 1, 90);
  if (!col.applies) {
    sheet.paragraph(`Not designed as a column: ${col.reason ?? ""}`, { font: "bold", colour: ink.fail });
    return;
  }
  const nds = col.rule === "nds-15.3";
  const en1993 = col.rule === "en1993-6.4";
  const steel = col.rule === "aisc-e6" || en1993;
  table(
    sheet,
    [
      { header: "Buckling about", weight: 1.2 },
      { header: "K_e", weight: 0.5, align: "right" },
      { header: "l_e", weight: 0.8, align: "right" },
      { header: nds ? "l_e/d" : en1993 ? "L_cr/i" : steel ? "L_c/r" : "λ", weight: 0.6, align: "right" },
      { header: nds ? "K_f" : "", weight: 0.5, align: "right" },
      { header: nds ? "C_P" : en1993 ? "χ" : steel ? "F_cr/F_y" : "k_c", weight: 0.6, align: "right" },
      { header: "π²EI/l_e²", weight: 0.9, align: "right" },
    ],
    col.axes.map((a) => [
      { text: `${a.axis} axis`, note: steel ? (a.jointed ? "shears the connectors" : "does not shear them") : a.jointed ? "across the laminations' joints" : "along them" },
      formatNumber(a.K),
      text.of(a.effectiveLength, "span"),
      formatNumber(Number(a.slenderness.toPrecision(4))),
      nds ? formatNumber(a.factor) : "",
      formatRatio(a.stability),
      text.of(a.euler, "force"),
    ]),
  );
  table(
    sheet,
    [
      { header: "Combination", weight: 1.2 },
      { header: "Axial P", weight: 0.9, align: "right" },
      { header: "Moment", weight: 0.9, align: "right" },
      { header: nds ? "F_c*" : en1993 ? "f_y/γ_M1" : steel ? (result.basis === "factored" ? "φ_c F_y" : "F_y/Ω_c") : "f_c,0,d", weight: 0.8, align: "right" },
      { header: "Capacity", weight: 0.9, align: "right" },
      { header: "Interaction", weight: 0.8, align: "right" },
    ],
    col.combinations.map((k) => [
      { text: k.combination, bold: k.combination === col.governing },
      text.of(k.axial, "force"),
      text.of(k.moment, "moment"),
      text.of(k.strength, "stress"),
      text.of(k.capacity, "force"),
      k.interaction === null ? "—" : formatRatio(k.interaction),
    ]),
  );
  if (steel) for (const n of new Set([...col.notes, ...col.joints.flatMap((j) => j.notes)])) sheet.note(n);
  for (const j of col.joints) sheet.note(`Joint ${j.joint}: ${j.governs}${j.rowsRequired !== null ? `; ${j.rowsRequired} row(s) required, ${j.rowsProvided} given` : ""}.`);
}

import { formatRatio, lineDiagram } from "../../core/index.js";
import { DIAGRAM_HEIGHT, figure, figureHeight } from "./figure.js";
import { ink } from "./sheet.js";
import { table } from "./table.js";
import { workingTables } from "./working-table.js";
import { byOutcome, combinationName, combinationsCell, type BondLine, type WorksheetContext } from "./worksheet-context.js";

/** A glued joint: bond-line shear stress τ = q/t along the member against the bond-line strength. */
export function bondLineSection(c: WorksheetContext, b: BondLine): void {
  const { sheet, result, text } = c;
  const caption = `Bond-line shear stress τ = q/t along joint ${b.joint}, against the strength`;
  sheet.heading(`Bond line — joint ${b.joint}`, 1, 60 + figureHeight(sheet, caption));
  const governing = b.strength.find((s) => s.combination === b.combination) ?? b.strength[0];
  sheet.paragraph(`${b.connectorLabel}, contact width t = ${text.of(b.width, "length")}. The bond line carries the whole shear flow q over t: τ = q/t = V·Q/(I·t).`, { size: 9 });
  if (governing) {
    const statement = `τ max = ${text.of(b.maxStress, "stress")} ${b.passes ? "≤" : ">"} f = ${text.of(governing.value, "stress")} (${governing.governing}) at x = ${text.of(b.at, "span")}, ${combinationName(result, b.combination)}: utilisation ${formatRatio(b.utilisation)} — ${b.passes ? "passes" : "FAILS"}`;
    sheet.paragraph(statement, { font: "bold", size: 9.5, colour: b.passes ? ink.pass : ink.fail });
  }
  if (!b.passes) sheet.paragraph("The bond line is overstressed: this glued joint does not carry the shear flow. Do not build from it as printed.", { font: "bold", colour: ink.fail });

  const lowest = Math.min(...b.strength.map((s) => s.value));
  figure(
    sheet,
    caption,
    lineDiagram({
      title: "",
      xUnit: text.unit("span"),
      yUnit: text.unit("stress"),
      x: result.beam.stations,
      series: [
        { label: "τ (largest over combinations)", values: b.stress, fill: true, colour: b.passes ? "#1f5f99" : ink.fail },
        { label: "strength (lowest)", values: result.beam.stations.map(() => lowest), colour: "#8a96a3", dash: [4, 3] },
      ],
      width: sheet.width,
      height: DIAGRAM_HEIGHT,
      role: `bond-line ${b.joint}`,
    }),
  );

  sheet.heading("Bond-line strength per combination", 2, 40);
  table(
    sheet,
    [
      { header: "Combinations", weight: 1.5 },
      { header: "Strength f", weight: 0.9, align: "right" },
      { header: "Governing", weight: 2 },
      { header: "Reference", weight: 2.2 },
    ],
    byOutcome(b.strength, (s) => [s.value, s.governing, s.reference]).map(({ combinations, entry: s }) => [
      combinationsCell(result, combinations),
      { text: text.of(s.value, "stress"), bold: true },
      s.governing,
      s.reference,
    ]),
  );
  workingTables(c, "f", b.strength);
}

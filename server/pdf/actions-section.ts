import { lineDiagram } from "../../core/index.js";
import { DIAGRAM_HEIGHT, figure, figureHeight } from "./figure.js";
import { table } from "./table.js";
import type { WorksheetContext } from "./worksheet-context.js";

/** Shear and bending moment along the member for each load combination, with reactions and extremes. */
export function actionsSection(c: WorksheetContext): void {
  const { sheet, result, text } = c;
  const beam = result.beam;
  sheet.heading("Shear and bending moment", 1, figureHeight(sheet, "V"));
  const common = { xUnit: text.unit("span"), x: beam.stations, width: sheet.width, height: DIAGRAM_HEIGHT };
  figure(
    sheet,
    "Shear force V per combination",
    lineDiagram({
      ...common,
      title: "",
      yUnit: text.unit("force"),
      series: beam.perCombination.map((p) => ({ label: p.combination, values: p.shear, fill: beam.perCombination.length === 1 })),
      role: "shear",
    }),
  );
  figure(
    sheet,
    "Bending moment M per combination (sagging plotted down)",
    lineDiagram({
      ...common,
      title: "",
      yUnit: text.unit("moment"),
      series: beam.perCombination.map((p) => ({ label: p.combination, values: p.moment, fill: beam.perCombination.length === 1 })),
      invert: true,
      role: "moment",
    }),
  );

  sheet.heading("Extremes and reactions", 2, 50);
  table(
    sheet,
    [
      { header: "Combination", weight: 1.4 },
      { header: "max |V|", weight: 1.3, align: "right" },
      { header: "max M", weight: 1.3, align: "right" },
      { header: "min M", weight: 1.3, align: "right" },
      { header: "max deflection", weight: 1.3, align: "right" },
      { header: "Reactions", weight: 2 },
    ],
    beam.perCombination.map((p) => [
      { text: p.combination, bold: true },
      { text: text.of(p.maxShear.value, "force"), note: `at ${text.of(p.maxShear.x, "span")}` },
      { text: text.of(p.maxMoment.value, "moment"), note: `at ${text.of(p.maxMoment.x, "span")}` },
      { text: text.of(p.minMoment.value, "moment"), note: `at ${text.of(p.minMoment.x, "span")}` },
      { text: text.of(p.maxDeflection.value, "deflection"), note: `at ${text.of(p.maxDeflection.x, "span")}` },
      p.reactions.map((r) => `${text.of(r.force, "force")} at ${text.of(r.x, "span")}${r.moment !== 0 ? `, ${text.of(r.moment, "moment")}` : ""}`).join("; "),
    ]),
  );
}

import { lineDiagram } from "../../core/index.js";
import { DIAGRAM_HEIGHT, figure, figureHeight } from "./figure.js";
import { table } from "./table.js";
import { combinationsSummary, inFull, type WorksheetContext } from "./worksheet-context.js";

const MAX_CURVES = 6;

/** Shear and bending moment along the member for each load combination, with reactions and extremes. */
export function actionsSection(c: WorksheetContext): void {
  const { sheet, result, text } = c;
  const beam = result.beam;
  sheet.heading("Shear and bending moment", 1, figureHeight(sheet, "V"));
  const common = { xUnit: text.unit("span"), x: beam.stations, width: sheet.width, height: DIAGRAM_HEIGHT, title: "" };
  const count = beam.perCombination.length;
  // Past a handful of curves (patterned live load gives many) the legend cannot name them: draw the envelope.
  const asEnvelope = count > MAX_CURVES;
  const scope = asEnvelope ? `envelope of the ${count} combinations` : count === 1 ? `combination ${beam.perCombination[0]!.combination}` : "per combination";
  figure(
    sheet,
    `Shear force V, ${scope}`,
    lineDiagram({
      ...common,
      yUnit: text.unit("force"),
      series: asEnvelope
        ? [
            { label: "max", values: beam.envelope.shearMax, fill: true },
            { label: "min", values: beam.envelope.shearMin, fill: true },
          ]
        : beam.perCombination.map((p) => ({ label: p.combination, values: p.shear, fill: count === 1 })),
      role: "shear",
    }),
  );
  figure(
    sheet,
    `Bending moment M, ${scope} (sagging plotted down)`,
    lineDiagram({
      ...common,
      yUnit: text.unit("moment"),
      series: asEnvelope
        ? [
            { label: "max", values: beam.envelope.momentMax, fill: true },
            { label: "min", values: beam.envelope.momentMin, fill: true },
          ]
        : beam.perCombination.map((p) => ({ label: p.combination, values: p.moment, fill: count === 1 })),
      invert: true,
      role: "moment",
    }),
  );

  sheet.heading("Extremes and reactions", 2, 50);
  const printed = inFull(result, beam.perCombination, (p) => p.combination);
  if (printed.rest.length > 0) {
    sheet.paragraph(
      `Listed: the ${printed.shown.length} combinations that give the largest shear, moments, deflection or a support's largest or least reaction, or govern a result on this worksheet. The other ${printed.rest.length} (${combinationsSummary(result, printed.rest.map((p) => p.combination))}) lie within these extremes and are listed in the result file.`,
      { size: 8.5 },
    );
  }
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
    printed.shown.map((p) => {
      // A moment that is zero but for rounding (the free end of a simple span) prints as 0, not 3.5×10⁻¹⁰.
      const scale = Math.max(Math.abs(p.maxMoment.value), Math.abs(p.minMoment.value));
      const moment = (v: number) => text.of(Math.abs(v) < 1e-9 * scale ? 0 : v, "moment");
      const forceScale = Math.max(...p.reactions.map((r) => Math.abs(r.force)), Math.abs(p.maxShear.value));
      const momentScale = Math.max(scale, ...p.reactions.map((r) => Math.abs(r.moment)));
      return [
      { text: p.combination, bold: true },
      { text: text.of(p.maxShear.value, "force"), note: `at ${text.of(p.maxShear.x, "span")}` },
      { text: moment(p.maxMoment.value), note: `at ${text.of(p.maxMoment.x, "span")}` },
      { text: moment(p.minMoment.value), note: `at ${text.of(p.minMoment.x, "span")}` },
      { text: text.of(p.maxDeflection.value, "deflection"), note: `at ${text.of(p.maxDeflection.x, "span")}` },
      p.reactions
        .map((r) => {
          const force = Math.abs(r.force) < 1e-9 * forceScale ? 0 : r.force;
          const fixedEnd = Math.abs(r.moment) >= 1e-9 * momentScale && r.moment !== 0;
          return `${text.of(force, "force")} at ${text.of(r.x, "span")}${fixedEnd ? `, ${text.of(r.moment, "moment")}` : ""}`;
        })
        .join("; "),
      ];
    }),
  );
}

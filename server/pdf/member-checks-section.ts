import { formatRatio } from "../../core/index.js";
import type { QuantityText } from "./quantity-text.js";
import { ink } from "./sheet.js";
import { table } from "./table.js";
import type { WorksheetContext } from "./worksheet-context.js";

/** Stresses and deflection of the member: demand against capacity, each with its utilisation. */
export function memberChecksSection(c: WorksheetContext, textOf: (check: WorksheetContext["result"]["checks"][number]) => QuantityText = () => c.text): void {
  const { sheet, result, text } = c;
  sheet.heading("Member checks", 1, 60);
  if (result.checks.length === 0) {
    sheet.paragraph("No member check could be run: see “Not checked”.", { colour: ink.faint });
    return;
  }
  table(
    sheet,
    [
      { header: "Check", weight: 3 },
      { header: "Demand", weight: 1, align: "right" },
      { header: "", weight: 0.25, align: "center" },
      { header: "Capacity", weight: 1, align: "right" },
      { header: "Utilisation", weight: 0.8, align: "right" },
      { header: "Where, combination", weight: 1.3 },
      { header: "Result", weight: 0.7 },
    ],
    result.checks.map((k) => [
      { text: k.title, note: k.reference },
      textOf(k).of(k.demand, k.quantity),
      k.passes ? "≤" : ">",
      textOf(k).of(k.capacity, k.quantity),
      formatRatio(k.utilisation),
      `${k.at === null ? "" : `x = ${text.of(k.at, "span")}, `}${k.combination}`,
      k.passes ? { text: "passes", colour: ink.pass } : { text: "FAILS", bold: true, colour: ink.fail },
    ]),
    { rowColour: (i) => (result.checks[i] && !result.checks[i]!.passes ? ink.fail : undefined) },
  );
}

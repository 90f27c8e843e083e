import { formatRatio } from "../../core/index.js";
import { ink } from "./sheet.js";
import { table } from "./table.js";
import { partNames, type WorksheetContext } from "./worksheet-context.js";

/**
 * Ends of parts that stop short of the member's ends (cover plates): the force the part carries at
 * the theoretical cut-off and the connectors between the cut-off and the part's end that develop it.
 */
export function terminationsSection(c: WorksheetContext): void {
  const { sheet, result, text } = c;
  const ends = result.terminations ?? [];
  if (ends.length === 0) return;
  sheet.heading("Ends of parts that stop short", 1, 90);
  sheet.paragraph(
    "Where a part stops before the member's ends, the connectors between its theoretical cut-off (where the section without it carries the moment) and its end must develop the force the part carries there, F = M·Q_p/I of the full section.",
    { size: 8.5, colour: ink.faint },
  );
  const failing = ends.filter((e) => !e.passes);
  if (failing.length > 0) sheet.paragraph(`${failing.length} part end${failing.length === 1 ? " does" : "s do"} not develop the part's force: do not build as printed.`, { font: "bold", colour: ink.fail });
  table(
    sheet,
    [
      { header: "Part, end", weight: 1.2 },
      { header: "Ends at", weight: 0.8, align: "right" },
      { header: "Cut-off", weight: 0.8, align: "right" },
      { header: "Force F", weight: 0.9, align: "right" },
      { header: "Length beyond the cut-off: provided / least", weight: 1.3, align: "right" },
      { header: "Connectors there", weight: 1.8 },
      { header: "Utilisation", weight: 0.8, align: "right" },
      { header: "Result", weight: 0.7 },
    ],
    ends.map((e) => [
      { text: `${partNames(result, [e.part])}, ${e.end} end`, bold: true, note: `joint ${e.joint}` },
      text.of(e.at, "span"),
      e.cutoff === null ? { text: "none", note: "the section without the part carries the moment everywhere along it" } : text.of(e.cutoff, "span"),
      text.of(e.force, "force"),
      `${text.of(e.available, "span")} / ${e.required === null ? "—" : text.of(e.required, "span")}`,
      { text: e.connectors, note: `carry ${text.of(e.capacity, "force")}${e.note ? `; ${e.note}` : ""}` },
      e.utilisation === null ? "— (none there)" : formatRatio(e.utilisation),
      e.passes ? { text: "passes", colour: ink.pass } : { text: "FAILS", bold: true, colour: ink.fail },
    ]),
    { rowColour: (i) => (ends[i] && !ends[i]!.passes ? ink.fail : undefined) },
  );
  const references = [...new Set(ends.map((e) => e.reference))];
  sheet.list(references.map((r) => `Method: ${r}`), { size: 8, colour: ink.faint });
}

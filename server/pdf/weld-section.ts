import { formatRatio, lineDiagram } from "../../core/index.js";
import { DIAGRAM_HEIGHT, figure, figureHeight } from "./figure.js";
import { ink } from "./sheet.js";
import { keyValueTable, table } from "./table.js";
import { workingTables } from "./working-table.js";
import { byOutcome, combinationName, combinationsCell, type WorksheetContext } from "./worksheet-context.js";

/** A welded joint as the result reports it (fields read here only). */
export interface WeldJoint {
  joint: string;
  connectorLabel: string;
  fillets: number;
  lineCount: number;
  pattern: string;
  segmentLength: number | null;
  pitch: number | null;
  resistance: { combination: string; value: number; governing: string; reference: string; steps: { symbol: string; description: string; value: number; quantity: string }[]; modes?: { mode: string; value: number }[]; warnings?: string[] }[];
  limits: { size: number; minSize: number; maxSize: number; minSegmentLength: number; maxPitch: number | null; maxGap: number | null; sources: string[] };
  maxShearFlow: number;
  at: number;
  combination: string;
  utilisation: number;
  passes: boolean;
  shearFlow: number[];
}

/** The welds of the result; results from before welds existed have none. */
export const weldsOf = (c: WorksheetContext): WeldJoint[] => (c.result as { welds?: WeldJoint[] }).welds ?? [];

/** Share of each line that is welded: segment ÷ pitch for an intermittent weld. */
const weldedFraction = (w: WeldJoint) => (w.pattern === "intermittent" && w.segmentLength !== null && w.pitch !== null ? w.segmentLength / w.pitch : 1);

/** A welded joint: the shear flow per line against fillets × resistance per length × welded fraction. */
export function weldSection(c: WorksheetContext, w: WeldJoint): void {
  const { sheet, result, text } = c;
  const caption = `Shear flow q per joint line along joint ${w.joint}, against the weld's resistance per line`;
  sheet.heading(`Weld — joint ${w.joint}`, 1, 70 + figureHeight(sheet, caption));
  const layout =
    w.pattern === "intermittent" && w.segmentLength !== null && w.pitch !== null
      ? `intermittent, ${text.of(w.segmentLength, "length")} segments at ${text.of(w.pitch, "length")} pitch`
      : "continuous";
  sheet.paragraph(`${w.connectorLabel}: ${w.fillets} fillet${w.fillets === 1 ? "" : "s"} on each of ${w.lineCount} joint line${w.lineCount === 1 ? "" : "s"}, ${layout}.`, { size: 9 });

  const governing = w.resistance.find((r) => r.combination === w.combination) ?? w.resistance[0];
  if (governing) {
    const capacity = w.fillets * governing.value * weldedFraction(w);
    sheet.paragraph(
      `q max = ${text.of(w.maxShearFlow, "shearFlow")} ${w.passes ? "≤" : ">"} ${w.fillets} × ${text.of(governing.value, "shearFlow")}${weldedFraction(w) < 1 ? ` × ${formatRatio(weldedFraction(w))}` : ""} = ${text.of(capacity, "shearFlow")} per line at x = ${text.of(w.at, "span")}, ${combinationName(result, w.combination)}: utilisation ${formatRatio(w.utilisation)} — ${w.passes ? "passes" : "FAILS"}`,
      { font: "bold", size: 9.5, colour: w.passes ? ink.pass : ink.fail },
    );
  }
  if (!w.passes) sheet.paragraph("The weld does not carry the shear flow. Do not build from it as printed.", { font: "bold", colour: ink.fail });

  const least = Math.min(...w.resistance.map((r) => r.value)) * w.fillets * weldedFraction(w);
  figure(
    sheet,
    caption,
    lineDiagram({
      title: "",
      xUnit: text.unit("span"),
      yUnit: text.unit("shearFlow"),
      x: result.beam.stations,
      series: [
        { label: "q per line", values: w.shearFlow, fill: true, colour: w.passes ? "#1f5f99" : ink.fail },
        { label: "resistance per line (least)", values: result.beam.stations.map(() => least), colour: "#8a96a3", dash: [4, 3] },
      ],
      width: sheet.width,
      height: DIAGRAM_HEIGHT,
      role: `weld ${w.joint}`,
    }),
  );

  sheet.heading("Weld resistance per unit length, one fillet", 2, 40);
  table(
    sheet,
    [
      { header: "Combinations", weight: 1.4 },
      { header: "R per length", weight: 1, align: "right" },
      { header: "Governing", weight: 2.6 },
      { header: "Reference", weight: 2 },
    ],
    byOutcome(w.resistance, (r) => [r.value, r.governing, r.reference, r.modes]).map(({ combinations, entry: r }) => [
      combinationsCell(result, combinations),
      { text: text.of(r.value, "shearFlow"), bold: true },
      { text: r.governing, note: r.modes && r.modes.length > 1 ? `modes: ${r.modes.map((m) => `${m.mode} ${text.of(m.value, "shearFlow")}`).join("; ")}` : undefined },
      r.reference,
    ]),
  );
  workingTables(c, "R per length", w.resistance);
  const confirm = [...new Set(w.resistance.flatMap((r) => r.warnings ?? []))];
  if (confirm.length > 0) {
    sheet.paragraph("For the reviewer to confirm:", { font: "bold", size: 8.5 }, 2);
    sheet.list(confirm, { size: 8.5 });
  }

  sheet.heading("Weld limits used", 2, 40);
  const l = w.limits;
  keyValueTable(
    sheet,
    [
      ["Size provided", text.of(l.size, "length")],
      ["Least size", { text: text.of(l.minSize, "length"), colour: l.size < l.minSize ? ink.fail : undefined }],
      ["Largest size", { text: text.of(l.maxSize, "length"), colour: l.size > l.maxSize ? ink.fail : undefined }],
      ["Least segment length (intermittent)", text.of(l.minSegmentLength, "length")],
      ["Largest pitch (intermittent)", l.maxPitch === null ? "—" : text.of(l.maxPitch, "length")],
      ["Largest clear gap (intermittent)", l.maxGap === null ? "—" : text.of(l.maxGap, "length")],
      ["Sources", l.sources.join("; ")],
    ],
    { keyWeight: 1.2 },
  );
}

import { formatRatio } from "../../core/index.js";
import { figure, figureHeight } from "./figure.js";
import { ink } from "./sheet.js";
import { keyValueTable, table } from "./table.js";
import { weldDiagram } from "./weld-diagram.js";
import { weldedShare, weldZoneText, zoneAt, type WeldJoint } from "./weld-zones.js";
import { workingTables } from "./working-table.js";
import { byOutcome, combinationName, combinationsCell, type WorksheetContext } from "./worksheet-context.js";

/** The welds of the result. */
export const weldsOf = (c: WorksheetContext): WeldJoint[] => c.result.welds ?? [];

/** A welded joint: the shear flow per line against fillets × resistance per length × welded share, zone by zone. */
export function weldSection(c: WorksheetContext, w: WeldJoint): void {
  const { sheet, result, text } = c;
  const check = w.mode === "check";
  const caption = `Shear flow q per joint line along joint ${w.joint}, against what the weld of each zone carries per line`;
  const given = check ? "This is the weld given in the job, checked here zone by zone; it was not designed by this worksheet." : "";
  sheet.heading(check ? `Given weld, checked — joint ${w.joint}` : `Weld — joint ${w.joint}`, 1, 90 + figureHeight(sheet, caption));
  if (given) sheet.paragraph(given, { size: 9, font: "bold" });
  const sides = w.fillets === 2 ? "one fillet each side of the joint line" : `${w.fillets} fillet${w.fillets === 1 ? "" : "s"} per joint line`;
  const arrangement = w.zones.some((z) => z.pattern === "intermittent") && w.fillets > 1 ? `; intermittent segments ${w.arrangement === "staggered" ? "staggered from one side to the other, with one at each end on both sides" : "opposite each other (chain)"}` : "";
  sheet.paragraph(
    `${w.connectorLabel}: ${sides}, on ${w.lineCount === 1 ? "its 1 joint line" : `each of its ${w.lineCount} joint lines`}${arrangement}. ${
      w.pattern === "intermittent"
        ? `Each segment of length L_s carries the shear flow over its pitch p: q·p ≤ ${w.fillets} × R × L_s per line, so a zone of segments carries ${w.fillets} × R × L_s/p per unit length.${check ? " The zones given set each pitch; the connector's own pitch is not used." : " Zones of pitch are laid out for the least weld; the connector's own pitch is the largest allowed."}`
        : "A continuous weld carries the shear flow per line up to the fillets × R."
    }`,
    { size: 9 },
  );

  const governing = w.resistance.find((r) => r.combination === w.combination) ?? w.resistance[0];
  const zone = zoneAt(w, w.at);
  if (governing && zone) {
    const capacity = w.fillets * governing.value * weldedShare(zone);
    const share = weldedShare(zone) < 1 ? ` × ${formatRatio(weldedShare(zone))}` : "";
    const where = `at x = ${text.of(w.at, "span")} (zone ${w.zones.indexOf(zone) + 1}, ${weldZoneText(c, zone)}), ${combinationName(result, w.combination)}`;
    sheet.paragraph(
      `Largest utilisation ${formatRatio(w.utilisation)} ${w.passes ? "≤" : ">"} 1.00 ${where}; the weld there carries ${w.fillets} × ${text.of(governing.value, "shearFlow")}${share} = ${text.of(capacity, "shearFlow")} per line, against q max = ${text.of(w.maxShearFlow, "shearFlow")} on the member — ${w.passes ? "passes" : "FAILS"}`,
      { font: "bold", size: 9.5, colour: w.passes ? ink.pass : ink.fail },
    );
  }
  if (!w.passes) sheet.paragraph(`${check ? "The given weld" : "The weld"} does not carry the shear flow. Do not build from it as printed.`, { font: "bold", colour: ink.fail });
  if (w.sizeNote) sheet.paragraph(w.sizeNote, { font: "bold", size: 9, colour: w.sizeNeeded !== null ? ink.fail : ink.text });

  figure(sheet, caption, weldDiagram(c, w));

  sheet.heading(check ? "Weld zones given" : "Weld zones", 2, 50);
  table(
    sheet,
    [
      { header: "Zone", weight: 0.5, align: "right" },
      { header: "From – to", weight: 1.4 },
      { header: "Weld", weight: 1.3 },
      { header: "Welded share L_s/p", weight: 0.9, align: "right" },
      { header: "Utilisation", weight: 0.9, align: "right" },
      { header: "Result", weight: 1.4 },
    ],
    w.zones.map((z, i) => [
      String(i + 1),
      c.text.range(z.from, z.to),
      { text: weldZoneText(c, z), bold: true },
      formatRatio(weldedShare(z)),
      formatRatio(z.utilisation),
      z.passes
        ? { text: "passes", colour: ink.pass }
        : { text: "FAILS", bold: true, colour: ink.fail, note: z.failingCombinations.length > 0 ? `under ${z.failingCombinations.length > 12 ? `${z.failingCombinations.slice(0, 12).join(", ")} and ${z.failingCombinations.length - 12} more combinations` : z.failingCombinations.map((k) => combinationName(result, k)).join(", ")}` : undefined },
    ]),
    { rowColour: (i) => (w.zones[i] && !w.zones[i]!.passes ? ink.fail : undefined) },
  );
  keyValueTable(
    sheet,
    [
      ["Weld deposited, all fillets on all lines", text.of(w.weldLength, "span")],
      ["Fillets per joint line × joint lines", `${w.fillets} × ${w.lineCount}`],
      ["Intermittent segments on the two sides", w.fillets > 1 && w.zones.some((z) => z.pattern === "intermittent") ? (w.arrangement === "staggered" ? "staggered" : "chain (opposite each other)") : "—"],
      ["Leg size a continuous weld would need", w.sizeNeeded === null ? "— (the size given is enough for a continuous weld)" : { text: text.of(w.sizeNeeded, "length"), colour: ink.fail, bold: true }],
    ],
    { keyWeight: 1.3 },
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
  const segments = w.zones.flatMap((z) => (z.segmentLength !== null ? [z.segmentLength] : []));
  const pitches = w.zones.flatMap((z) => (z.pitch !== null ? [z.pitch] : []));
  keyValueTable(
    sheet,
    [
      ["Size provided (leg)", text.of(l.size, "length")],
      ["Least size", { text: text.of(l.minSize, "length"), colour: l.size < l.minSize ? ink.fail : undefined }],
      ["Largest size", { text: text.of(l.maxSize, "length"), colour: l.size > l.maxSize ? ink.fail : undefined }],
      ["Least segment length (intermittent)", { text: text.of(l.minSegmentLength, "length"), colour: segments.some((s) => s < l.minSegmentLength - 1e-9) ? ink.fail : undefined }],
      ["Largest pitch (intermittent)", l.maxPitch === null ? "—" : { text: text.of(l.maxPitch, "length"), colour: pitches.some((p) => p > l.maxPitch! + 1e-9) ? ink.fail : undefined }],
      [
        "Largest clear gap (intermittent)",
        l.maxGap === null ? "—" : { text: text.of(l.maxGap, "length"), colour: w.zones.some((z) => z.pitch !== null && z.segmentLength !== null && z.pitch - z.segmentLength > l.maxGap! + 1e-9) ? ink.fail : undefined },
      ],
      ["Sources", l.sources.join("; ")],
    ],
    { keyWeight: 1.2 },
  );
}

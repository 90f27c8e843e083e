import { formatRatio } from "../../core/index.js";
import { ink } from "./sheet.js";
import { table } from "./table.js";
import { weldsOf } from "./weld-section.js";
import { weldZoneText } from "./weld-zones.js";
import { combinationName, type Schedule, type WorksheetContext } from "./worksheet-context.js";

/** What an infeasible schedule lacks, where, and the ways out the result lists. */
export function infeasibleStatement(c: WorksheetContext, s: Schedule, name = `Joint ${s.joint}`): string[] {
  const inf = s.infeasible;
  if (!inf) return [];
  const where = inf.where.map((w) => c.text.range(w.from, w.to)).join(" and ");
  return [
    inf.reason
      ? `${name}: no spacing within the limits carries the shear flow over ${where}. ${inf.reason}`
      : `${name}: no spacing within the limits carries the shear flow over ${where}. The smallest required spacing is ${c.text.of(inf.smallestRequired, "length")}, below the minimum spacing of ${c.text.of(inf.minSpacing, "length")}.`,
    ...inf.options.map((o) => `Option: ${o}`),
  ];
}

/** The verdict at the top of page 1: green when everything passes, otherwise every failure in red. */
export function statusSection(c: WorksheetContext): void {
  const { sheet, result } = c;
  sheet.heading("Status", 1, 40);
  if (result.mode === "check")
    sheet.paragraph("CHECK OF GIVEN SCHEDULES: this worksheet checks the connector schedules and welds given in the job, row by row; it does not design them.", { font: "bold", size: 9.5 });
  if (result.status.passes) {
    sheet.paragraph(`PASSES — ${result.status.summary}`, { font: "bold", size: 10, colour: ink.pass });
    sheet.paragraph("Passing here means: under the loads, combinations and values entered, and within what this worksheet checks. See “Not checked” before relying on it.", { size: 8.5, colour: ink.faint });
  } else {
    sheet.paragraph(`DOES NOT PASS — ${result.status.summary} Do not build from the schedules in this worksheet until every item below is resolved.`, {
      font: "bold",
      size: 10,
      colour: ink.fail,
    });
    sheet.list(result.status.failures, { font: "bold", size: 9, colour: ink.fail });
    for (const s of result.schedules.filter((k) => k.infeasible)) sheet.list(infeasibleStatement(c, s), { size: 8.5, colour: ink.fail, indent: 10 });
  }
  if (result.warnings.length > 0) {
    sheet.paragraph("Warnings", { font: "bold", size: 9, colour: ink.fail }, 2);
    sheet.list(result.warnings, { size: 8.5, colour: ink.fail });
  } else {
    sheet.paragraph("Warnings: none.", { size: 8.5, colour: ink.faint });
  }
}

/** One line per joint: what to build (or why not), for the reader who wants the answer first. */
export function glanceSection(c: WorksheetContext): void {
  const { sheet, result, text } = c;
  if (result.joints.length === 0) return;
  sheet.heading("Schedule at a glance", 1, 50);
  const rows = result.joints.map((j) => {
    const s = result.schedules.find((k) => k.joint === j.id);
    const b = result.bondLines.find((k) => k.joint === j.id);
    if (s) {
      const zones = s.zones.map((z) => `${text.range(z.from, z.to)} @ ${text.of(z.spacing, "length")}`).join("\n");
      return [
        { text: j.id, bold: true },
        `${s.connectorLabel}, ${s.rows} per row on ${s.lineCount} line${s.lineCount === 1 ? "" : "s"}`,
        zones || "—",
        String(s.count),
        s.passes ? { text: `passes (${formatRatio(s.verification.maxUtilisation)})`, colour: ink.pass } : { text: s.infeasible ? "INFEASIBLE" : `FAILS (${formatRatio(s.verification.maxUtilisation)})`, colour: ink.fail, bold: true },
      ];
    }
    if (b) {
      return [
        { text: j.id, bold: true },
        `${b.connectorLabel} (bond line, t = ${text.of(b.width, "length")})`,
        `continuous; τ max ${text.of(b.maxStress, "stress")} under ${combinationName(result, b.combination)}`,
        "—",
        b.passes ? { text: `passes (${formatRatio(b.utilisation)})`, colour: ink.pass } : { text: `FAILS (${formatRatio(b.utilisation)})`, colour: ink.fail, bold: true },
      ];
    }
    const w = weldsOf(c).find((k) => k.joint === j.id);
    if (w) {
      const zones = w.zones.map((z) => `${text.range(z.from, z.to)}: ${weldZoneText(c, z)}`).join("\n");
      return [
        { text: j.id, bold: true },
        `${w.connectorLabel}, ${w.fillets} fillet${w.fillets === 1 ? "" : "s"} per line on ${w.lineCount} line${w.lineCount === 1 ? "" : "s"}`,
        zones || "—",
        { text: text.of(w.weldLength, "span"), note: "of weld" },
        w.passes ? { text: `passes (${formatRatio(w.utilisation)})`, colour: ink.pass } : { text: `FAILS (${formatRatio(w.utilisation)})`, colour: ink.fail, bold: true },
      ];
    }
    return [{ text: j.id, bold: true }, j.connectorLabel, "no schedule in the result", "—", { text: "NOT DESIGNED", colour: ink.fail, bold: true }];
  });
  table(
    sheet,
    [
      { header: "Joint", weight: 0.9 },
      { header: "Connector", weight: 2.8 },
      { header: result.mode === "check" ? "Zones given, from the left end" : "Zones from the left end", weight: 2.9 },
      { header: "Count", weight: 0.6, align: "right" },
      { header: "Result", weight: 1.3 },
    ],
    rows,
    {
      rowColour: (i) => {
        const id = result.joints[i]?.id;
        const failing = [...result.schedules, ...result.bondLines, ...weldsOf(c)].some((k) => k.joint === id && !k.passes);
        return failing ? ink.fail : undefined;
      },
    },
  );
}

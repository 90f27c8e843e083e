import { formatRatio } from "../../core/index.js";
import { figure, figureHeight } from "./figure.js";
import { numberText } from "./quantity-text.js";
import { shearFlowDiagram, spacingDiagram } from "./schedule-diagrams.js";
import { ink } from "./sheet.js";
import { infeasibleStatement } from "./status-section.js";
import { keyValueTable, table, type Cell } from "./table.js";
import { workingTables } from "./working-table.js";
import { byOutcome, COMBINATIONS_IN_FULL, combinationName, combinationsCell, partNames, type Schedule, type WorksheetContext } from "./worksheet-context.js";

/**
 * Schedules that are the same in every number apart from the joint's name (the top and bottom joints
 * of a symmetric box beam), grouped so each is printed once for all the joints it applies to.
 */
export function identicalSchedules(schedules: Schedule[]): Schedule[][] {
  const groups = new Map<string, Schedule[]>();
  for (const s of schedules) {
    // Nine figures: the same schedule computed along two cuts can differ in the last bits.
    const key = JSON.stringify({ ...s, joint: "" }, (_k, v: unknown) => (typeof v === "number" ? Number(v.toPrecision(9)) : v));
    groups.set(key, [...(groups.get(key) ?? []), s]);
  }
  return [...groups.values()];
}

/** A joint's connector schedule (or several joints' identical one): demand, the zones to build, and what the zones rest on. */
export function scheduleSection(c: WorksheetContext, group: Schedule[]): void {
  const { sheet, result, text } = c;
  const s = group[0]!;
  const ids = group.map((k) => k.joint);
  const name = ids.length === 1 ? `joint ${s.joint}` : `joints ${ids.slice(0, -1).join(", ")} and ${ids[ids.length - 1]}`;
  const holding = group
    .map((k) => result.joints.find((j) => j.id === k.joint))
    .map((j) => (j ? `${ids.length > 1 ? `${j.id}: ` : ""}holding ${partNames(result, j.held)}` : ""))
    .filter(Boolean)
    .join("; ");
  const sharing = result.joints.find((j) => j.id === s.joint)?.sharing ?? "";
  const intro = [
    `${s.connectorLabel}: ${s.rows} connector${s.rows === 1 ? "" : "s"} per row on each of ${s.lineCount} joint line${s.lineCount === 1 ? "" : "s"}${holding ? `, ${holding}` : ""}. ${sharing}`,
    ids.length > 1 ? `These joints have the same shear flow, connector, limits and zones, so their schedule is printed once: build it on each of them (${ids.join(", ")}). Counts are per joint.` : "",
  ]
    .filter(Boolean)
    .join(" ");
  const check = s.mode === "check";
  const sideLoad = result.joints.find((j) => j.id === s.joint)?.demand === "side-load";
  const flowCaption = sideLoad
    ? `Force passed across the interface per unit length and joint line, ${name} (envelope of the combinations)`
    : `Shear flow q per joint line, ${name} (envelope of the combinations)`;
  const spacingCaption = `Spacing along ${name}: required by q, and the zones ${check ? "given" : "provided"}`;
  const given = check ? "This is the schedule given in the job, checked row by row here; it was not designed by this worksheet." : "";
  // The heading, the verdict and both diagrams read as one block: start a page rather than split them.
  sheet.heading(
    check ? `Given schedule, checked — ${name}` : `Connector schedule — ${name}`,
    1,
    sheet.textHeight(intro) + (given ? sheet.textHeight(given) : 0) + 40 + figureHeight(sheet, flowCaption) + figureHeight(sheet, spacingCaption),
  );
  if (given) sheet.paragraph(given, { size: 9, font: "bold" });
  sheet.paragraph(intro, { size: 9 });
  scheduleVerdict(c, s, ids.length === 1 ? `Joint ${s.joint}` : `Joints ${ids.join(", ")}`);

  figure(sheet, flowCaption, shearFlowDiagram(s, result.beam.stations, text, sheet.width));
  figure(sheet, spacingCaption, spacingDiagram(s, result.beam.stations, text, sheet.width));

  sheet.heading(check ? "Zones given" : "Zones", 2, 50);
  if (s.zones.some((z) => !z.passes)) sheet.paragraph("Red rows do not carry the shear flow at the spacing shown.", { font: "bold", size: 8.5, colour: ink.fail }, 2);
  table(
    sheet,
    [
      { header: "Zone", weight: 0.5, align: "right" },
      { header: "From – to", weight: 1.35 },
      { header: "Spacing", weight: 1, align: "right" },
      { header: "Per row", weight: 0.7, align: "right" },
      { header: "Count", weight: 0.7, align: "right" },
      { header: "Smallest required", weight: 1.2, align: "right" },
      { header: "Utilisation", weight: 0.9, align: "right" },
      { header: "Combination", weight: 1.05 },
      { header: "Result", weight: 0.8 },
    ],
    [
      ...s.zones.map((z, i) => [
        String(i + 1),
        text.range(z.from, z.to),
        { text: text.of(z.spacing, "length"), bold: true, ...(z.note ? { note: `note ${i + 1}` } : {}) },
        String(z.rows),
        String(z.count),
        z.requiredSpacing === null ? "—" : text.of(z.requiredSpacing, "length"),
        formatRatio(z.utilisation),
        z.governingCombination,
        z.passes ? { text: "passes", colour: ink.pass } : { text: "FAILS", bold: true, colour: ink.fail, note: failingUnder(z) },
      ]),
      ["", { text: ids.length > 1 ? "Total, all lines, per joint" : "Total, all lines", bold: true }, "", "", { text: String(s.count), bold: true }, "", "", "", ""],
    ],
    { rowColour: (i) => (s.zones[i] && !s.zones[i]!.passes ? ink.fail : undefined) },
  );

  const notes = s.zones.map((z, i) => (z.note ? `Zone ${i + 1}: ${z.note}` : null)).filter((n): n is string => n !== null);
  if (notes.length > 0) sheet.list(notes, { size: 8 });

  if (s.detailingProblems.length > 0) {
    sheet.heading(check ? "Detailing problems of the given schedule" : "Detailing problems", 2, 30);
    sheet.list(s.detailingProblems, { font: "bold", size: 8.5, colour: ink.fail });
  }
  if (check || !s.passes) worstRowPerCombination(c, s);

  sheet.heading("Resistance per connector", 2, 50);
  table(
    sheet,
    [
      { header: "Combinations", weight: 1.6 },
      { header: "R", weight: 0.8, align: "right" },
      { header: "Governing mode", weight: 2.6 },
      { header: "Reference", weight: 2.2 },
    ],
    byOutcome(s.resistance, (r) => [r.value, r.governing, r.reference, (r as ResistanceDetail).modes, (r as ResistanceDetail).slip]).map(({ combinations, entry }) => {
      const r = entry as typeof entry & ResistanceDetail;
      const slip = r.slip ? `slip modulus K_ser ${text.of(r.slip.serviceability, "slipModulus")}, K_u ${text.of(r.slip.ultimate, "slipModulus")} (${r.slip.reference})` : "";
      return [
        combinationsCell(result, combinations),
        { text: text.of(r.value, "connectorForce"), bold: true },
        { text: r.governing, note: r.modes && r.modes.length > 1 ? `modes: ${r.modes.map((m) => `${m.mode} ${text.of(m.value, "connectorForce")}`).join("; ")}` : undefined },
        { text: r.reference, note: slip || undefined },
      ];
    }),
  );
  workingTables(c, "R", s.resistance);
  const confirm = [...new Set(s.resistance.flatMap((r) => (r as ResistanceDetail).warnings ?? []))];
  if (confirm.length > 0) {
    sheet.paragraph("For the reviewer to confirm:", { font: "bold", size: 8.5 }, 2);
    sheet.list(confirm, { size: 8.5 });
  }

  sheet.heading("Limits used", 2, 50);
  const l = s.limits as typeof s.limits & AcrossLimits;
  const across: [string, string | Cell][] = [];
  if (l.edgeDistance != null) across.push(["Least edge distance across the line", text.of(l.edgeDistance, "length")]);
  if (l.rowSpacing != null) across.push(["Least spacing within a row, across the line", text.of(l.rowSpacing, "length")]);
  if (l.penetration != null)
    across.push([
      "Penetration into the point-side part: provided / least",
      { text: `${text.of(l.penetration.provided, "length")} / ${text.of(l.penetration.required, "length")}`, colour: l.penetration.provided < l.penetration.required ? ink.fail : undefined },
    ]);
  keyValueTable(
    sheet,
    [
      ...across,
      ["Minimum spacing", text.of(l.minSpacing, "length")],
      ["Maximum spacing", text.of(l.maxSpacing, "length")],
      ["End distance (first and last row from the member ends)", text.of(l.endDistance, "length")],
      ["Spacing module", l.module === null ? "none" : text.of(l.module, "length")],
      ["Preferred spacings", l.preferred ? l.preferred.map((v) => text.of(v, "length")).join(", ") : "none"],
      ["Shortest zone", text.of(l.minZoneLength, "length")],
      ["Sources", l.sources.join("; ")],
    ],
    { keyWeight: 1.2 },
  );

  sheet.heading("Efficiency and row verification", 2, 50);
  const e = s.efficiency;
  const v = s.verification;
  keyValueTable(
    sheet,
    [
      ["Connectors in this schedule, all lines", String(s.count)],
      ["Fewest connectors any schedule within the maximum spacing can have", numberText(e.lowerBound)],
      ["Demand integral ∫ max(q/R) dx, all lines (no spacing limit)", numberText(e.demandIntegral)],
      ["Count ÷ lower bound", e.countOverLowerBound === null ? "—" : numberText(e.countOverLowerBound, 3)],
      ["One uniform spacing over the whole member", e.uniformSpacing === null ? "none within the limits" : `${text.of(e.uniformSpacing, "length")}, ${e.uniformCount ?? "—"} connectors`],
      ["Uniform count ÷ this count", e.uniformOverCount === null ? "—" : numberText(e.uniformOverCount, 3)],
      [
        "Row verification: largest utilisation",
        {
          text: `${formatRatio(v.maxUtilisation)} ${v.passes ? "≤" : ">"} 1.00 at x = ${text.of(v.at, "span")}, ${combinationName(result, v.combination)} — ${v.passes ? "passes" : "FAILS"}`,
          colour: v.passes ? ink.pass : ink.fail,
          bold: !v.passes,
          note: `Method: ${v.method}`,
        },
      ],
    ],
    { keyWeight: 1.3 },
  );
}

/** The worst row of the schedule under each combination on its own, worst first. */
function worstRowPerCombination(c: WorksheetContext, s: Schedule): void {
  const { sheet, result, text } = c;
  if (s.perCombination.length === 0) return;
  sheet.heading("Worst row under each combination", 2, 50);
  const sorted = [...s.perCombination].sort((a, b) => b.maxUtilisation - a.maxUtilisation);
  const rows = sorted.slice(0, COMBINATIONS_IN_FULL);
  const rest = sorted.slice(COMBINATIONS_IN_FULL);
  if (rest.length > 0) {
    sheet.paragraph(
      `The ${rows.length} worst of ${sorted.length} combinations; under the other ${rest.length} the worst row's utilisation is at most ${formatRatio(rest[0]!.maxUtilisation)} (${rest.some((r) => r.maxUtilisation > 1 + 1e-9) ? "some FAIL: see the result file" : "all pass"}).`,
      { size: 8.5, font: rest.some((r) => r.maxUtilisation > 1 + 1e-9) ? "bold" : "body" },
    );
  }
  table(
    sheet,
    [
      { header: "Combination", weight: 2.2 },
      { header: "Largest row utilisation", weight: 1.1, align: "right" },
      { header: "At x", weight: 1, align: "right" },
      { header: "Result", weight: 0.9 },
    ],
    rows.map((r) => {
      const passes = r.maxUtilisation <= 1 + 1e-9;
      return [
        combinationsCell(result, [r.combination]),
        { text: formatRatio(r.maxUtilisation), bold: !passes },
        text.of(r.at, "span"),
        passes ? { text: "passes", colour: ink.pass } : { text: "FAILS", bold: true, colour: ink.fail },
      ];
    }),
    { rowColour: (i) => (rows[i] && rows[i]!.maxUtilisation > 1 + 1e-9 ? ink.fail : undefined) },
  );
}

function scheduleVerdict(c: WorksheetContext, s: Schedule, name: string): void {
  const { sheet } = c;
  const check = s.mode === "check";
  if (s.passes) {
    sheet.paragraph(`${check ? "The given schedule passes" : "Schedule passes"}: largest row utilisation ${formatRatio(s.verification.maxUtilisation)} ≤ 1.00.`, { font: "bold", colour: ink.pass });
    return;
  }
  const lines = [
    check
      ? "THE GIVEN SCHEDULE DOES NOT PASS. Do not build from it as printed: the zones below are the ones given, shown for review only."
      : `THIS SCHEDULE DOES NOT CARRY THE SHEAR FLOW. Do not build from it as printed: the zones below are the closest the limits allow, shown for review only.`,
    ...infeasibleStatement(c, s, name),
  ];
  if (!s.infeasible && !s.verification.passes) lines.push(`A row is over-utilised: ${formatRatio(s.verification.maxUtilisation)} > 1.00 at x = ${c.text.of(s.verification.at, "span")}, ${combinationName(c.result, s.verification.combination)}.`);
  for (const problem of s.detailingProblems) lines.push(`Detailing: ${problem}`);
  const height = lines.reduce((h, t, i) => h + sheet.textHeight(t, { font: i === 0 ? "bold" : "body", size: 8.5, width: sheet.width - 16 }) + 3, 8);
  sheet.ensure(height);
  sheet.doc.save().rect(sheet.left, sheet.y, sheet.width, height).lineWidth(1.2).strokeColor(ink.fail).stroke().restore();
  sheet.doc.save().rect(sheet.left, sheet.y, 4, height).fill(ink.fail).restore();
  let y = sheet.y + 4;
  lines.forEach((t, i) => {
    sheet.textAt(t, sheet.left + 10, y, { font: i === 0 ? "bold" : "body", size: 8.5, width: sheet.width - 16, colour: ink.fail });
    y += sheet.textHeight(t, { font: i === 0 ? "bold" : "body", size: 8.5, width: sheet.width - 16 }) + 3;
  });
  sheet.y += height + 6;
}

/** The combinations a failing zone fails under, when the result names them. */
function failingUnder(zone: Schedule["zones"][number]): string | undefined {
  const ids = (zone as { failingCombinations?: string[] }).failingCombinations;
  if (!ids || ids.length === 0) return undefined;
  return ids.length > 12 ? `under ${ids.slice(0, 12).join(", ")} and ${ids.length - 12} more combinations` : `under ${ids.join(", ")}`;
}

/** Detail some connector kinds add to a resistance (all modes evaluated, slip moduli, conditions to confirm). */
interface ResistanceDetail {
  modes?: { mode: string; value: number }[];
  slip?: { serviceability: number; ultimate: number; reference: string } | null;
  warnings?: string[];
}

/** Limits across the line that dowel-type connectors add. */
interface AcrossLimits {
  edgeDistance?: number | null;
  rowSpacing?: number | null;
  penetration?: { required: number; provided: number } | null;
}

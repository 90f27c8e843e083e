import { builderDimensions, type BuilderDimensions } from "../../core/draw/builder-dimensions.js";
import { fieldElevation } from "../../core/draw/field-elevation.js";
import { fieldLayout, type FieldJoint } from "../../core/draw/field-layout.js";
import { jointNames, zoneCallOut } from "../../core/draw/joint-strip.js";
import { drawnAcross, rowAcrossDrawing, rowAcrossLines, rowAcrossOf } from "../../core/draw/row-across.js";
import { sectionSketch } from "../../core/draw/section-sketch.js";
import { paintDrawing } from "./paint-drawing.js";
import { ink, type TextStyle } from "./sheet.js";
import { table, type Cell, type Column, type Row } from "./table.js";
import type { WorksheetContext } from "./worksheet-context.js";

export const FIELD_SHEET_BAND = "FOR REVIEW — NOT FOR CONSTRUCTION UNTIL SEALED";
export const FIELD_SHEET_HEADING = "FIELD SHEET · CONNECTOR LAYOUT FOR THE BUILDER";

const SKETCH = { width: 190, height: 112 };
/** Past this many zones a joint's table is set in two columns side by side. */
const ONE_COLUMN_ZONES = 6;

/**
 * The builder's page: the member in elevation with every joint's zones, spacings, rows and end
 * distances, a section naming the joints, and the zones as a table. Starts a page of its own and
 * returns the indices of its pages among the buffered pages (one, unless the member has many
 * joints or zones), for the title block.
 */
export function fieldSheet(c: WorksheetContext): number[] {
  const { sheet, job, result } = c;
  if (!sheet.atTop) sheet.newPage();
  const page = sheet.doc.bufferedPageRange().count - 1;
  const dims = builderDimensions(result.units);
  const electrodeOf = (id: string) => {
    const k = job.connectors.find((k) => k.id === id) as { kind: string; standard?: string; electrode?: string } | undefined;
    return k?.kind === "fillet-weld" && k.standard === "AISC-360-16" ? (k.electrode ?? "E70") : undefined;
  };
  const joints = fieldLayout(result, { electrodeOf });

  band(c);
  // Every further page of the field sheet starts with the band too, whatever spills onto it.
  sheet.pageStart = () => band(c);
  try {
    fieldSheetBody(c, joints, dims);
  } finally {
    sheet.pageStart = null;
  }
  const last = sheet.doc.bufferedPageRange().count - 1;
  return Array.from({ length: last - page + 1 }, (_, i) => page + i);
}

function fieldSheetBody(c: WorksheetContext, joints: FieldJoint[], dims: BuilderDimensions): void {
  const { sheet, job, result } = c;
  if (!result.status.passes) failureBox(c);
  introWithSketch(c, joints, dims);

  const elevation = fieldElevation(
    {
      dims,
      length: result.beam.length,
      spans: result.beam.spans,
      supports: result.beam.supports,
      pointLoads: job.beam.loads.flatMap((l) => (l.type === "point" ? [{ at: l.at, label: l.label }] : [])),
      partRuns: partRuns(c),
      joints,
    },
    { width: sheet.width },
  );
  sheet.ensure(elevation.height);
  paintDrawing(sheet.doc, elevation, sheet.left, sheet.y);
  sheet.y += elevation.height + 8;

  const laidOut = new Set(joints.flatMap((j) => j.joints));
  const unbuildable = result.schedules.filter((s) => s.rowFit && !s.rowFit.fits);
  for (const s of unbuildable) {
    sheet.paragraph(`Joint ${s.joint} cannot be built as designed: ${s.detailingProblems.join("; ")} Nothing is drawn for it. Do not build that joint from this sheet.`, { font: "bold", colour: ink.fail });
  }
  const missing = result.joints.filter((j) => !laidOut.has(j.id) && !unbuildable.some((s) => s.joint === j.id));
  if (missing.length > 0)
    sheet.paragraph(`No layout in the result for ${missing.map((j) => `joint ${j.id}`).join(", ")}: nothing is drawn for ${missing.length === 1 ? "it" : "them"}. Do not build ${missing.length === 1 ? "that joint" : "those joints"} from this sheet.`, {
      font: "bold",
      colour: ink.fail,
    });
  acrossTheContact(c, joints, dims);
  zonesTable(c, joints, dims);
}

/** The review band across the top of a field sheet page; drawn at the top of the page, never moved to another. */
function band(c: WorksheetContext): void {
  const { sheet } = c;
  const height = 34;
  sheet.doc.save().rect(sheet.left, sheet.y, sheet.width, height).fill(ink.text).restore();
  sheet.textAt(FIELD_SHEET_BAND, sheet.left, sheet.y + 5, { font: "bold", size: 13, width: sheet.width, align: "center", colour: "#ffffff" });
  sheet.textAt("Build only from a copy reviewed and sealed by the engineer of record. Local codes and the engineer of record govern.", sheet.left, sheet.y + 21, {
    size: 7.5,
    width: sheet.width,
    align: "center",
    colour: "#ffffff",
  });
  sheet.y += height + 6;
}

function failureBox(c: WorksheetContext): void {
  const { sheet, result } = c;
  const lines = ["DOES NOT PASS — DO NOT BUILD FROM THIS SHEET. What is drawn in red fails:", ...result.status.failures];
  const style = (i: number): TextStyle & { width: number } => ({ font: i === 0 ? "bold" : "body", size: 8.5, width: sheet.width - 16 });
  const height = lines.reduce((h, t, i) => h + sheet.textHeight(t, style(i)) + 2, 8);
  sheet.ensure(height + 6);
  sheet.doc.save().rect(sheet.left, sheet.y, sheet.width, height).lineWidth(1.4).strokeColor(ink.fail).stroke().restore();
  sheet.doc.save().rect(sheet.left, sheet.y, 4, height).fill(ink.fail).restore();
  let y = sheet.y + 4;
  lines.forEach((t, i) => {
    sheet.textAt(t, sheet.left + 10, y, { ...style(i), colour: ink.fail });
    y += sheet.textHeight(t, style(i)) + 2;
  });
  sheet.y += height + 6;
}

/** How to read the sheet, beside the section that names the joints. */
function introWithSketch(c: WorksheetContext, joints: FieldJoint[], dims: BuilderDimensions): void {
  const { sheet, result } = c;
  const hasRows = joints.some((j) => j.kind === "connectors" && j.positions.length > 0);
  const hasSegments = joints.some((j) => j.kind === "weld" && j.positions.length > 0);
  const hasStaggered = joints.some((j) => j.kind === "weld" && j.positions.length > 0 && j.arrangement === "staggered" && j.across > 1);
  const lines: [string, TextStyle["font"]][] = [
    [
      result.mode === "check"
        ? "GIVEN SCHEDULE, AS CHECKED: the layout below is the one given in the job and checked by this worksheet, not designed by it."
        : "The layout below is the one this worksheet designs.",
      "bold",
    ],
    [
      `Measure every position from END A, the left end as drawn, and mark END A on the member before laying out. ${
        dims.system === "si"
          ? "All dimensions are in millimetres."
          : `Positions are in feet and inches${hasRows || hasSegments ? `, ${[hasRows ? "spacings" : "", hasSegments ? "segments and pitches" : ""].filter(Boolean).join(", ")} in inches` : ""}.`
      }`,
      "body",
    ],
    ...(hasRows
      ? ([["Rows as drawn: the first and last at the end distance; in each zone the rows go at its spacing from its first row, or back from its last, and the row at its other end where the table gives it; “from both”: from the first and back from the last toward the middle of the zone, with a row in the middle where the gap left is more than the spacing. No two rows are closer than the connector's minimum spacing.", "body"]] as [string, "body"][])
      : []),
    ...(hasSegments
      ? ([
          [
            `Weld segments as drawn: one at each end of the member, the rest at each zone's pitch, centre to centre, or closer where two zones meet.${
              hasStaggered ? " Staggered: the far side also has one at each end, and the rest midway between the near side's, one more segment than the near side in all." : ""
            }`,
            "body",
          ],
        ] as [string, "body"][])
      : []),
    // Where the result gives no layout across the contact, the engineer of record sets it.
    withoutLayoutAcross(c, joints).length > 0
      ? ["The engineer of record sets where rows sit across the contact and approves any change of connector, size, spacing, end or edge distance.", "body"]
      : ["Any change of connector, size, spacing, end or edge distance needs the engineer of record's approval.", "body"],
  ];
  const width = sheet.width - SKETCH.width - 12;
  const style = (font: TextStyle["font"]): TextStyle & { width: number } => ({ size: 8.5, width, font });
  const textHeight = lines.reduce((h, [t, f]) => h + sheet.textHeight(t, style(f)) + 3, 0);
  const height = Math.max(textHeight, SKETCH.height);
  sheet.ensure(height + 6);
  let y = sheet.y;
  for (const [t, f] of lines) {
    sheet.textAt(t, sheet.left, y, style(f));
    y += sheet.textHeight(t, style(f)) + 3;
  }
  const x = sheet.frame.right - SKETCH.width;
  sheet.doc.save().rect(x, sheet.y, SKETCH.width, SKETCH.height).lineWidth(0.5).strokeColor(ink.light).stroke().restore();
  paintDrawing(sheet.doc, sectionSketch(result, SKETCH), x, sheet.y);
  sheet.y += height + 6;
}

/** A staggered row across the contact, drawn small: three to a line. */
const ACROSS = { height: 84, caption: 11, perLine: 3, gutter: 10 };

/** Joints laid out with connectors whose result gives no layout across the contact (the intro says what to do). */
const withoutLayoutAcross = (c: WorksheetContext, joints: FieldJoint[]) =>
  joints.filter((j) => j.kind === "connectors" && !c.result.schedules.find((s) => s.joint === j.joints[0])?.layoutAcross);

/**
 * Staggered rows across the contact, drawn small and dimensioned from the named edge, three to a line,
 * each under the names of its joints; joints drawn alike are drawn once. The words (offsets, stagger,
 * face) are on each joint's own line above (jointMakeUp), so a row in line needs no drawing.
 */
function acrossTheContact(c: WorksheetContext, joints: FieldJoint[], dims: BuilderDimensions): void {
  const { sheet, result } = c;
  const drawn = new Map<string, string[]>();
  for (const j of joints.filter((k) => k.kind === "connectors")) {
    for (const a of j.acrossLayouts) {
      if (!drawnAcross(a.layout)) continue;
      const s = result.schedules.find((k) => k.joint === a.joint);
      if (!s) continue;
      const key = JSON.stringify(rowAcrossLines(rowAcrossOf([], s), dims));
      drawn.set(key, [...(drawn.get(key) ?? []), a.joint]);
    }
  }
  if (drawn.size === 0) return;
  const width = (sheet.width - (ACROSS.perLine - 1) * ACROSS.gutter) / ACROSS.perLine;
  const groups = [...drawn.values()];
  for (let i = 0; i < groups.length; i += ACROSS.perLine) {
    sheet.ensure(ACROSS.caption + ACROSS.height + 4);
    groups.slice(i, i + ACROSS.perLine).forEach((ids, n) => {
      const x = sheet.left + n * (width + ACROSS.gutter);
      const drawing = rowAcrossDrawing(rowAcrossOf(ids, result.schedules.find((k) => k.joint === ids[0])!), dims, { width, height: ACROSS.height });
      sheet.textAt(`${jointNames(ids)} across the contact`, x, sheet.y, { font: "bold", size: 7.5, width });
      if (drawing) paintDrawing(sheet.doc, drawing, x, sheet.y + ACROSS.caption);
    });
    sheet.y += ACROSS.caption + ACROSS.height + 4;
  }
}

/** The zones of every joint as numbers to lay out from, under the drawing; two columns when there are many. */
function zonesTable(c: WorksheetContext, joints: FieldJoint[], dims: BuilderDimensions): void {
  const { sheet, result } = c;
  for (const j of joints.filter((k) => k.kind === "bond-line")) {
    sheet.heading(`Bond line — ${jointNames(j.joints)}`, 2, 20);
    sheet.paragraph(`${j.connectorLabel}: glued over the whole contact width${j.bondWidth !== null ? ` of ${dims.length(j.bondWidth)}` : ""} and ${j.run ? `from ${dims.position(j.run.from)} to ${dims.position(j.run.to)} from END A` : `the whole length of ${dims.run(result.beam.length)}`}, with the adhesive and curing the engineer of record specifies.`, {
      size: 8.5,
      colour: j.passes ? ink.text : ink.fail,
      font: j.passes ? "body" : "bold",
    });
  }
  const laidOut = joints.filter((k) => k.kind !== "bond-line");
  if (laidOut.length === 0) return;
  // A failing zone is printed in red with FAILS after its spacing; the worksheet names the combinations.
  const fails = laidOut.some((j) => !j.passes);
  const welds = laidOut.some((j) => j.kind === "weld");
  const connectors = laidOut.some((j) => j.kind === "connectors");
  const named = laidOut.length > 1;
  const rows: Row[] = laidOut.flatMap((j) =>
    j.zones.map((z, i) => {
      const bad = !z.passes;
      const cell = (text: string, bold = false): Cell => ({ text, bold: bold || bad, colour: bad ? ink.fail : undefined });
      return [
        ...(named ? [i === 0 ? { text: j.joints.join(", "), bold: true, colour: j.passes ? undefined : ink.fail } : ""] : []),
        cell(String(i + 1)),
        cell(dims.position(z.from)),
        cell(dims.position(z.to)),
        ...(connectors
          ? [
              cell(z.firstRow === null ? "—" : dims.position(z.firstRow)),
              cell(z.lastRow === null ? "—" : dims.position(z.lastRow)),
              cell(z.setOut === "from-first" ? "from first" : z.setOut === "from-last" ? "back from last" : z.setOut === "from-both" ? "from both" : z.setOut === "listed" ? "listed below" : "—"),
            ]
          : []),
        cell(bad ? `${zoneCallOut(j, z, dims)} — FAILS` : zoneCallOut(j, z, dims), true),
        cell(j.kind === "weld" && z.spacing === null ? "—" : String(z.rows)),
        ...(connectors ? [cell(z.connectors === null ? "—" : String(z.connectors))] : []),
      ];
    }),
  );
  const columns: Column[] = [
    ...(named ? [{ header: "Joint", weight: 1 }] : []),
    { header: "Zone", weight: 0.62, align: "right" },
    { header: "From END A", weight: 0.95, align: "right" },
    { header: "To", weight: 0.85, align: "right" },
    // Rows go at the spacing from the first row; the last is where it is given (the two set-outs meet there).
    ...(connectors
      ? [
          { header: "First row", weight: 0.85, align: "right" as const },
          { header: "Last row", weight: 0.85, align: "right" as const },
          { header: "Set out", weight: 0.95 },
        ]
      : []),
    { header: welds ? (connectors ? "Spacing, or segment @ pitch" : "Segment @ pitch") : "Spacing", weight: (welds ? 1.5 : 1.1) + (fails ? 0.6 : 0) },
    { header: welds ? (connectors ? "Rows or segments" : laidOut.some((j) => j.kind === "weld" && j.arrangement === "staggered" && j.across > 1) ? "Segments, near side" : "Segments each side") : "Rows", weight: welds ? 0.9 : 0.6, align: "right" },
    ...(connectors ? [{ header: "Count", weight: 0.75, align: "right" as const }] : []),
  ];
  sheet.heading(`Zones of ${named ? "every joint" : jointNames(laidOut[0]!.joints).toLowerCase()}: positions from END A in ${dims.positionUnit}${connectors ? ", counts on all lines" : ""}`, 2, 60);
  // Connector zones carry their first and last rows: too wide to print in two columns.
  const twoColumns = rows.length > ONE_COLUMN_ZONES && !named && !connectors;
  if (!twoColumns) {
    table(sheet, columns, rows, { size: 8.5 });
    listedRows(c, laidOut, dims);
    return;
  }
  const half = Math.ceil(rows.length / 2);
  const gutter = 12;
  const width = (sheet.width - gutter) / 2;
  // Room for the taller half first, so both columns start on this page: a two-line header and rows of one line.
  sheet.ensure(26 + half * 14);
  const top = sheet.y;
  const right = rows.slice(half);
  table(sheet, columns, rows.slice(0, half), { size: 8, width });
  const leftBottom = sheet.y;
  sheet.y = top;
  table(sheet, columns, right, { size: 8, width, indent: width + gutter });
  sheet.y = Math.max(leftBottom, sheet.y);
  listedRows(c, laidOut, dims);
}

/** Every row of a zone whose rows are not one run at its spacing (the rows set out from the two ends meet in it). */
function listedRows(c: WorksheetContext, joints: FieldJoint[], dims: BuilderDimensions): void {
  const lines = joints.flatMap((j) =>
    j.kind !== "connectors"
      ? []
      : j.zones.flatMap((z, i) =>
          z.setOut === "listed"
            ? [`${joints.length > 1 ? `${jointNames(j.joints)}, zone` : "Zone"} ${i + 1}, every row from END A: ${j.positions.filter((x) => x >= z.from - 1e-9 && x <= z.to + 1e-9 && x >= z.firstRow! - 1e-9 && x <= z.lastRow! + 1e-9).map((x) => dims.position(x)).join(", ")}.`]
            : [],
        ),
  );
  if (lines.length > 0) c.sheet.list(lines, { size: 8 });
}

/** Parts present over only some stretches of the member (a cover plate), with the face they are on. */
function partRuns(c: WorksheetContext): { label: string; from: number; to: number; side: "top" | "bottom" }[] {
  const { result } = c;
  const stretches = result.stretches ?? [];
  if (stretches.length === 0) return [];
  return result.section.parts.flatMap((p) => {
    const on = stretches.filter((s) => s.parts.includes(p.id));
    if (on.length === stretches.length || on.length === 0) return [];
    const middle = p.rects.reduce((sum, r) => sum + (r.y0 + r.y1) / 2, 0) / Math.max(1, p.rects.length);
    return [{ label: p.name || p.id, from: Math.min(...on.map((s) => s.from)), to: Math.max(...on.map((s) => s.to)), side: middle < result.section.centroidY ? ("bottom" as const) : ("top" as const) }];
  });
}

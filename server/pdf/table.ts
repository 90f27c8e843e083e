import { ink, type FontName, type Sheet } from "./sheet.js";

export interface Column {
  header: string;
  /** Share of the table width. */
  weight: number;
  align?: "left" | "right" | "center";
}

export interface Cell {
  text: string;
  /** A second, smaller line under the text (a reference, a note). */
  note?: string;
  colour?: string;
  bold?: boolean;
}

export type Row = (string | Cell)[];

export interface TableOptions {
  size?: number;
  /** Width of the table; the body width when absent. */
  width?: number;
  indent?: number;
  /** Colour for a whole row, e.g. red for a failing zone. */
  rowColour?: (index: number) => string | undefined;
}

const PAD_X = 3;
const PAD_Y = 2.5;

/**
 * A table that never splits a row across pages and repeats its header on each page it runs onto.
 * Numeric columns are right-aligned so their digits line up.
 */
export function table(sheet: Sheet, columns: Column[], rows: Row[], options: TableOptions = {}): void {
  const size = options.size ?? 8.5;
  const noteSize = size - 1;
  const width = options.width ?? sheet.width - (options.indent ?? 0);
  const x0 = sheet.left + (options.indent ?? 0);
  const total = columns.reduce((s, c) => s + c.weight, 0);
  const widths = columns.map((c) => (c.weight / total) * width);
  const lefts = widths.map((_, i) => x0 + widths.slice(0, i).reduce((s, w) => s + w, 0));
  const doc = sheet.doc;

  const measure = (cell: Cell, font: FontName, col: number) => {
    const w = widths[col]! - 2 * PAD_X;
    doc.font(font).fontSize(size);
    let h = doc.heightOfString(cell.text || " ", { width: w, lineGap: 0.5 });
    if (cell.note) h += doc.font("cond").fontSize(noteSize).heightOfString(cell.note, { width: w, lineGap: 0.5 });
    return h + 2 * PAD_Y;
  };
  const asCell = (c: string | Cell): Cell => (typeof c === "string" ? { text: c } : c);
  const header: Cell[] = columns.map((c) => ({ text: c.header, bold: true }));
  const headerHeight = Math.max(...header.map((c, i) => measure(c, "cond-bold", i)));

  const drawRow = (cells: Cell[], height: number, style: { band?: string; colour?: string; isHeader?: boolean }) => {
    if (style.band) doc.save().rect(x0, sheet.y, width, height).fill(style.band).restore();
    cells.forEach((cell, i) => {
      const font: FontName = cell.bold || style.isHeader ? "cond-bold" : "cond";
      const align = columns[i]!.align ?? "left";
      const w = widths[i]! - 2 * PAD_X;
      const colour = cell.colour ?? style.colour ?? ink.text;
      sheet.textAt(cell.text, lefts[i]! + PAD_X, sheet.y + PAD_Y, { font, size, width: w, align, colour, lineGap: 0.5 });
      if (cell.note) {
        doc.font(font).fontSize(size);
        const main = doc.heightOfString(cell.text || " ", { width: w, lineGap: 0.5 });
        sheet.textAt(cell.note, lefts[i]! + PAD_X, sheet.y + PAD_Y + main, { font: "cond", size: noteSize, width: w, align, colour: cell.colour ?? ink.faint, lineGap: 0.5 });
      }
    });
    const rule = style.isHeader ? ink.text : ink.light;
    doc.save().moveTo(x0, sheet.y + height).lineTo(x0 + width, sheet.y + height).lineWidth(style.isHeader ? 0.8 : 0.5).strokeColor(rule).stroke().restore();
    sheet.y += height;
  };

  const drawHeader = () => drawRow(header, headerHeight, { band: ink.band, isHeader: true });
  const first = rows[0] ? rows[0].map(asCell) : [];
  const firstHeight = first.length ? Math.max(...first.map((c, i) => measure(c, c.bold ? "cond-bold" : "cond", i))) : 0;
  sheet.ensure(headerHeight + firstHeight);
  drawHeader();
  const rowHeight = (cells: Cell[]) => Math.max(...cells.map((c, i) => measure(c, c.bold ? "cond-bold" : "cond", i)));
  const fullPage = sheet.frame.bottom - sheet.frame.top - headerHeight;

  /** The part of a cell that fits in `room`, and the rest for the next page. */
  const splitCell = (cell: Cell, col: number, room: number): [Cell, Cell] => {
    const font: FontName = cell.bold ? "cond-bold" : "cond";
    if (measure(cell, font, col) <= room) return [cell, { ...cell, text: "", note: undefined }];
    const bare = { ...cell, note: undefined };
    if (cell.note && measure(bare, font, col) <= room) {
      // The text fits and the note runs on: split the note too, or a note taller than a page would never end.
      if (!cell.text) {
        const [head, rest] = splitWords(cell.note, (note) => measure({ ...bare, text: "", note }, font, col) <= room);
        return [{ ...bare, text: "", note: head || undefined }, { ...cell, text: "", note: rest || undefined }];
      }
      return [bare, { ...cell, text: "" }];
    }
    const [head, rest] = splitWords(cell.text, (text) => measure({ ...bare, text }, font, col) <= room);
    return [{ ...bare, text: head }, { ...cell, text: rest }];
  };

  rows.forEach((row, index) => {
    const style = { colour: options.rowColour?.(index), band: index % 2 === 1 ? "#f7f9fa" : undefined };
    let cells = row.map(asCell);
    // No last row alone on a page (a total, the end of a list): the one before it goes over with it.
    if (index === rows.length - 2 && rows.length >= 3) {
      const pair = rowHeight(cells) + rowHeight(rows[index + 1]!.map(asCell));
      if (pair > sheet.room && pair <= fullPage) {
        sheet.newPage();
        drawHeader();
      }
    }
    // A row taller than a whole page is the only thing ever split: it runs on, cell by cell, under a repeated header.
    for (;;) {
      const height = rowHeight(cells);
      if (height <= sheet.room) {
        drawRow(cells, height, style);
        return;
      }
      if (height <= fullPage || sheet.room < 60) {
        sheet.newPage();
        drawHeader();
        if (height <= fullPage) {
          drawRow(cells, height, style);
          return;
        }
      }
      const parts = cells.map((c, i) => splitCell(c, i, sheet.room));
      const heads = parts.map(([head]) => head);
      drawRow(heads, rowHeight(heads), style);
      cells = parts.map(([, rest]) => rest);
      if (cells.every((c) => !c.text && !c.note)) return;
      sheet.newPage();
      drawHeader();
    }
  });
  sheet.y += 6;
}

/** The most words of `text` that `fits` (at least one, so that every split makes progress), and the rest. */
function splitWords(text: string, fits: (head: string) => boolean): [string, string] {
  const tokens = text.split(/(\s+)/);
  let lo = 1;
  let hi = tokens.length;
  while (lo < hi) {
    const mid = Math.ceil((lo + hi) / 2);
    if (fits(tokens.slice(0, mid).join(""))) lo = mid;
    else hi = mid - 1;
  }
  return [tokens.slice(0, lo).join("").trimEnd(), tokens.slice(lo).join("").trimStart()];
}

/** A two-column list of labelled values, e.g. section properties. */
export function keyValueTable(sheet: Sheet, rows: [string, string | Cell][], options: TableOptions & { keyWeight?: number } = {}): void {
  table(
    sheet,
    [
      { header: "Item", weight: options.keyWeight ?? 1.4 },
      { header: "Value", weight: 1 },
    ],
    rows.map(([k, v]) => [k, v]),
    options,
  );
}

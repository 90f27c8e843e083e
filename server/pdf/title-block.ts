import { ink, type PageFrame } from "./sheet.js";

export interface TitleBlockFacts {
  projectName: string;
  projectNumber: string;
  engineer: string;
  mark: string;
  description: string;
  revision: string;
  date: string;
  printed: string;
  program: string;
  fingerprint: string;
  /** The line over the title block: what the sheet is. */
  heading: string;
  /** A different heading for some pages, by their index among the buffered pages (the field sheet). */
  pageHeadings?: Map<number, string>;
}

export const REVIEW_NOTICE =
  "For review by a licensed engineer. Not for construction until reviewed and sealed by the engineer of record. Local codes and the engineer of record govern.";

/** Writes the title block and the footer on every buffered page; call once the body is complete. */
export function stampPages(doc: PDFKit.PDFDocument, frame: PageFrame, facts: TitleBlockFacts): void {
  const range = doc.bufferedPageRange();
  for (let i = range.start; i < range.start + range.count; i++) {
    doc.switchToPage(i);
    // Header and footer sit outside the body margins; without this pdfkit would start a new page.
    const margins = { ...doc.page.margins };
    doc.page.margins = { top: 0, bottom: 0, left: 0, right: 0 };
    titleBlock(doc, frame, facts, `Page ${i - range.start + 1} of ${range.count}`, facts.pageHeadings?.get(i - range.start) ?? facts.heading);
    footer(doc, frame, facts);
    doc.page.margins = margins;
  }
}

interface BlockCell {
  label: string;
  value: string;
  weight: number;
  bold?: boolean;
}

function titleBlock(doc: PDFKit.PDFDocument, frame: PageFrame, facts: TitleBlockFacts, page: string, heading: string): void {
  const x0 = frame.left;
  const width = frame.right - frame.left;
  let y = 26;
  doc.font("bold").fontSize(8).fillColor(ink.rule).text(heading, x0, y, { width: width * 0.7, lineBreak: false });
  doc.font("body").fontSize(7).fillColor(ink.faint).text(facts.program, x0 + width * 0.7, y + 1, { width: width * 0.3, align: "right", lineBreak: false });
  y += 12;
  const rowHeight = 25;
  const rows: BlockCell[][] = [
    [
      { label: "PROJECT", value: facts.projectName, weight: 5, bold: true },
      { label: "PROJECT NO.", value: facts.projectNumber || "—", weight: 1.6 },
      { label: "ENGINEER", value: facts.engineer || "—", weight: 2.2 },
    ],
    [
      { label: "MEMBER", value: [facts.mark, facts.description].filter(Boolean).join(" — "), weight: 5, bold: true },
      { label: "REV.", value: facts.revision || "—", weight: 0.7 },
      { label: "DATE", value: facts.date, weight: 1.2 },
      { label: "SHEET", value: page, weight: 1.9, bold: true },
    ],
  ];
  for (const row of rows) {
    const total = row.reduce((s, c) => s + c.weight, 0);
    let x = x0;
    for (const cell of row) {
      const w = (cell.weight / total) * width;
      doc.save().rect(x, y, w, rowHeight).lineWidth(0.7).strokeColor(ink.text).stroke().restore();
      doc.font("body").fontSize(5.8).fillColor(ink.faint).text(cell.label, x + 3, y + 2.5, { width: w - 6, lineBreak: false });
      doc.font(cell.bold ? "bold" : "body").fontSize(8.5).fillColor(ink.text).text(cell.value, x + 3, y + 11.5, { width: w - 6, height: 11, ellipsis: true, lineBreak: true });
      x += w;
    }
    y += rowHeight;
  }
  doc.save().rect(x0, y + 3, width, 2).fill(ink.rule).restore();
}

function footer(doc: PDFKit.PDFDocument, frame: PageFrame, facts: TitleBlockFacts): void {
  const x0 = frame.left;
  const width = frame.right - frame.left;
  let y = frame.bottom + 14;
  doc.save().moveTo(x0, y).lineTo(frame.right, y).lineWidth(0.7).strokeColor(ink.rule).stroke().restore();
  y += 4;
  doc.font("bold").fontSize(7.5).fillColor(ink.text);
  const noticeHeight = doc.heightOfString(REVIEW_NOTICE, { width });
  doc.text(REVIEW_NOTICE, x0, y, { width, height: noticeHeight + 2 });
  y += noticeHeight + 3;
  const label = "Input fingerprint, SHA-256: ";
  doc.font("body").fontSize(7).fillColor(ink.faint).text(label, x0, y, { lineBreak: false });
  const labelWidth = doc.widthOfString(label);
  doc.font("mono").fontSize(7).fillColor(ink.text).text(facts.fingerprint || "not set", x0 + labelWidth, y, { lineBreak: false });
  doc.font("body").fontSize(7).fillColor(ink.faint).text(`printed ${facts.printed}`, x0, y, { width, align: "right", lineBreak: false });
}

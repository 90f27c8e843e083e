import type { Drawing, DrawItem } from "../../core/index.js";

/**
 * Paints a core drawing onto the PDF page with its top-left corner at (x, y), 1 drawing unit = 1 pt
 * times `scale`. Geometry comes from the drawing as it is; only paint is applied here.
 */
export function paintDrawing(doc: PDFKit.PDFDocument, drawing: Drawing, x: number, y: number, scale = 1): void {
  doc.save();
  doc.translate(x, y);
  if (scale !== 1) doc.scale(scale);
  for (const item of drawing.items) {
    doc.save();
    if (item.type === "path") paintPath(doc, item);
    else paintText(doc, item);
    doc.restore();
  }
  doc.restore();
}

function paintPath(doc: PDFKit.PDFDocument, item: Extract<DrawItem, { type: "path" }>): void {
  if (item.opacity !== undefined) doc.opacity(item.opacity);
  doc.lineWidth(item.strokeWidth ?? 1);
  if (item.dash && item.dash.length > 0) doc.dash(item.dash[0]!, { space: item.dash[1] ?? item.dash[0]! });
  doc.path(item.d);
  if (item.fill && item.stroke) doc.fillAndStroke(item.fill, item.stroke);
  else if (item.fill) doc.fill(item.fill);
  else if (item.stroke) doc.stroke(item.stroke);
}

function paintText(doc: PDFKit.PDFDocument, item: Extract<DrawItem, { type: "text" }>): void {
  if (!item.text) return;
  doc.font(item.bold ? "bold" : "body").fontSize(item.size).fillColor(item.fill ?? "#22303c");
  const width = doc.widthOfString(item.text);
  const left = item.anchor === "middle" ? item.x - width / 2 : item.anchor === "end" ? item.x - width : item.x;
  // The drawing gives the baseline, as SVG does.
  doc.text(item.text, left, item.y, { lineBreak: false, baseline: "alphabetic" });
}

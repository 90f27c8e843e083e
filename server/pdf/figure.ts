import type { Drawing } from "../../core/index.js";
import { paintDrawing } from "./paint-drawing.js";
import type { Sheet } from "./sheet.js";

export const DIAGRAM_HEIGHT = 150;
const CAPTION_SIZE = 9.5;

/** Height a figure takes with its caption. */
export function figureHeight(sheet: Sheet, caption: string, height = DIAGRAM_HEIGHT): number {
  return sheet.textHeight(caption, { font: "bold", size: CAPTION_SIZE }) + height + 8;
}

/**
 * Places a drawing with its caption above it, both on one page. The caption is set here rather than
 * in the drawing so a long title never runs into the drawing's legend.
 */
export function figure(sheet: Sheet, caption: string, drawing: Drawing, after = 6): void {
  const captionHeight = sheet.textHeight(caption, { font: "bold", size: CAPTION_SIZE });
  sheet.ensure(captionHeight + drawing.height + 2);
  sheet.textAt(caption, sheet.left, sheet.y, { font: "bold", size: CAPTION_SIZE, width: sheet.width });
  sheet.y += captionHeight - 4;
  paintDrawing(sheet.doc, drawing, sheet.left + (sheet.width - drawing.width) / 2, sheet.y);
  sheet.y += drawing.height + after;
}

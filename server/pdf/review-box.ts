import { ink } from "./sheet.js";
import type { Sheet } from "./sheet.js";

const BOX_HEIGHT = 138;

/** The blank box the engineer of record fills in and seals; the worksheet prints nothing in it. */
export function reviewBox(sheet: Sheet): void {
  sheet.ensure(BOX_HEIGHT + 8);
  const doc = sheet.doc;
  const x0 = sheet.left;
  const y0 = sheet.y;
  const width = sheet.width;
  const sealSize = BOX_HEIGHT - 16;
  const sealX = sheet.frame.right - sealSize - 8;
  doc.save().rect(x0, y0, width, BOX_HEIGHT).lineWidth(1.2).strokeColor(ink.text).stroke().restore();
  doc.save().rect(x0, y0, width, 16).fill(ink.band).restore();
  doc.save().moveTo(x0, y0 + 16).lineTo(x0 + width, y0 + 16).lineWidth(0.7).strokeColor(ink.text).stroke().restore();
  sheet.textAt("REVIEW AND SEAL — ENGINEER OF RECORD", x0 + 6, y0 + 4, { font: "bold", size: 8.5, width: width - 12 });

  const textWidth = sealX - x0 - 18;
  sheet.textAt(
    "This worksheet is for review by a licensed engineer. It is not for construction until it has been reviewed and sealed by the engineer of record. Local codes and the engineer of record govern over anything printed here.",
    x0 + 6,
    y0 + 21,
    { font: "bold", size: 8, width: textWidth },
  );
  const fields = ["Reviewed by", "Licence / registration no.", "Date reviewed", "Signature"];
  let y = y0 + 60;
  for (const field of fields) {
    sheet.textAt(field, x0 + 6, y, { size: 7.5, width: 110, colour: ink.faint });
    doc.save().moveTo(x0 + 118, y + 9).lineTo(x0 + textWidth, y + 9).lineWidth(0.5).strokeColor(ink.faint).stroke().restore();
    y += 15;
  }
  const boxes = ["Reviewed, no exceptions", "Reviewed, revise as noted", "Rejected, resubmit"];
  let bx = x0 + 6;
  for (const label of boxes) {
    doc.save().rect(bx, y + 1, 7, 7).lineWidth(0.6).strokeColor(ink.text).stroke().restore();
    sheet.textAt(label, bx + 10, y, { size: 7, width: 110 });
    bx += (textWidth - 6) / 3;
  }

  doc.save().rect(sealX, y0 + 24, sealSize, sealSize - 10).lineWidth(0.6).dash(3, { space: 2 }).strokeColor(ink.faint).stroke().restore();
  sheet.textAt("Seal of the engineer of record", sealX, y0 + 24 + sealSize - 24, { size: 6.5, width: sealSize, align: "center", colour: ink.faint });
  sheet.y = y0 + BOX_HEIGHT + 8;
}

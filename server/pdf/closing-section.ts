import { ink } from "./sheet.js";
import type { WorksheetContext } from "./worksheet-context.js";

/** What the worksheet does not cover, and the basis it stands on. */
export function closingSection(c: WorksheetContext): void {
  const { sheet, result } = c;
  sheet.heading("Not checked", 1, 40);
  sheet.paragraph("The following are outside this worksheet. They are not passed by it; the engineer of record checks them separately.", { size: 8.5, colour: ink.faint });
  sheet.list(result.notChecked, { size: 8.5 });

  sheet.heading("Standards and editions used", 1, 40);
  sheet.list(result.standards, { size: 8.5 });

  sheet.heading("Assumptions", 1, 40);
  sheet.list(result.assumptions, { size: 8.5 });

}

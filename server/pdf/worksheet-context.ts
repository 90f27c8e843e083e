import type { DesignResult, JobDocument } from "../../core/index.js";
import type { QuantityText } from "./quantity-text.js";
import type { Sheet } from "./sheet.js";

/** What every part of the worksheet reads from: the page cursor, the job as entered and its result. */
export interface WorksheetContext {
  sheet: Sheet;
  job: JobDocument;
  result: DesignResult;
  text: QuantityText;
}

export type Schedule = DesignResult["schedules"][number];
export type Joint = DesignResult["joints"][number];
export type BondLine = DesignResult["bondLines"][number];

/** Name of a combination as printed: "U (Loads as entered)". */
export function combinationName(result: DesignResult, id: string): string {
  const c = result.beam.combinations.find((k) => k.id === id);
  return c && c.name !== c.id ? `${c.id} (${c.name})` : id;
}

/** Names of the parts a joint holds, as entered. */
export function partNames(result: DesignResult, ids: string[]): string {
  return ids.map((id) => result.section.parts.find((p) => p.id === id)?.name || id).join(", ");
}

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

/**
 * Entries per combination gathered where they agree (same value, mode and reference), so a
 * resistance that does not change between fifteen combinations is printed once.
 */
export function byOutcome<T extends { combination: string }>(entries: T[], key: (entry: T) => unknown): { combinations: string[]; entry: T }[] {
  const groups = new Map<string, { combinations: string[]; entry: T }>();
  for (const entry of entries) {
    const k = JSON.stringify(key(entry));
    const group = groups.get(k) ?? { combinations: [], entry };
    group.combinations.push(entry.combination);
    groups.set(k, group);
  }
  return [...groups.values()];
}

/** The combination cell of a grouped row: the ids, and the name when there is only one. */
export function combinationsCell(result: DesignResult, ids: string[]): { text: string; note?: string } {
  if (ids.length === 1) return { text: ids[0]!, note: result.beam.combinations.find((k) => k.id === ids[0])?.name };
  return { text: ids.join(", ") };
}

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
  if (ids.length > 1 && ids.length === result.beam.combinations.length) return { text: `every combination (${ids.length})` };
  if (ids.length > 12) return { text: `${ids.length} combinations: ${combinationsSummary(result, ids)}` };
  return { text: ids.join(", ") };
}

/** Up to this many combinations every table lists them all; past it, those that govern in full and the rest summed up. */
export const COMBINATIONS_IN_FULL = 40;

/**
 * The combinations that govern something the worksheet states: a zone, a row verification, a bond line,
 * a weld, a member check, or an extreme of the shear, moment, deflection or a reaction.
 */
export function governingCombinations(result: DesignResult): Set<string> {
  const ids = new Set<string>();
  const add = (id: string | null | undefined) => {
    if (id) ids.add(id);
  };
  for (const s of result.schedules) {
    add(s.verification.combination);
    for (const z of s.zones) add(z.governingCombination);
    add([...s.perCombination].sort((a, b) => b.maxUtilisation - a.maxUtilisation)[0]?.combination);
  }
  for (const b of result.bondLines) add(b.combination);
  for (const w of result.welds ?? []) add(w.combination);
  for (const k of result.checks) add(k.combination);
  const per = result.beam.perCombination;
  const extreme = (value: (p: (typeof per)[number]) => number) => add(per.reduce<(typeof per)[number] | undefined>((best, p) => (!best || value(p) > value(best) ? p : best), undefined)?.combination);
  extreme((p) => Math.abs(p.maxShear.value));
  extreme((p) => p.maxMoment.value);
  extreme((p) => -p.minMoment.value);
  extreme((p) => Math.abs(p.maxDeflection.value));
  const supports = per[0]?.reactions.length ?? 0;
  for (let i = 0; i < supports; i++) {
    extreme((p) => p.reactions[i]?.force ?? -Infinity);
    extreme((p) => -(p.reactions[i]?.force ?? Infinity));
  }
  return ids;
}

/** The entries to print in full (all of them up to COMBINATIONS_IN_FULL, else those that govern) and the rest. */
export function inFull<T>(result: DesignResult, entries: T[], id: (entry: T) => string): { shown: T[]; rest: T[] } {
  if (entries.length <= COMBINATIONS_IN_FULL) return { shown: entries, rest: [] };
  const governing = governingCombinations(result);
  return { shown: entries.filter((e) => governing.has(id(e))), rest: entries.filter((e) => !governing.has(id(e))) };
}

/** Combination ids in a few words: the patterns of one combination counted together ("ASD-2: 63 patterns"). */
export function combinationsSummary(result: DesignResult, ids: string[]): string {
  const byBase = new Map<string, number>();
  const service = ((result.beam as { service?: { combination: { id: string; base?: string } }[] }).service ?? []).map((c) => c.combination);
  const bases = new Map<string, string | undefined>([...service, ...result.beam.combinations].map((k) => [k.id, (k as { base?: string }).base]));
  for (const id of ids) {
    const base = bases.get(id) ?? id;
    byBase.set(base, (byBase.get(base) ?? 0) + 1);
  }
  const parts = [...byBase].map(([base, n]) => (n === 1 && ids.includes(base) ? base : `${base} (${n} pattern${n === 1 ? "" : "s"})`));
  return parts.length > 24 ? `${parts.slice(0, 24).join(", ")} and ${parts.length - 24} more` : parts.join(", ");
}

import type { QuantityText } from "./quantity-text.js";
import { table } from "./table.js";
import type { WorksheetContext } from "./worksheet-context.js";

export interface WorkingStepLike {
  symbol: string;
  description: string;
  value: number;
  quantity: string;
  reference?: string;
}

const MAX_NAMED = 6;

/**
 * The working behind a resistance or strength, one line per step. Combinations often differ in a
 * step or two (a load-duration factor): those steps are printed per combination, the rest once.
 */
export function workingTables(c: WorksheetContext, what: string, entries: { combination: string; steps: WorkingStepLike[] }[]): void {
  const { sheet, text } = c;
  const groups = new Map<string, { combinations: string[]; steps: WorkingStepLike[] }>();
  for (const e of entries) {
    if (e.steps.length === 0) continue;
    const key = JSON.stringify(e.steps);
    const group = groups.get(key) ?? { combinations: [], steps: e.steps };
    group.combinations.push(e.combination);
    groups.set(key, group);
  }
  const all = [...groups.values()];
  if (all.length === 0) return;
  const columns = [
    { header: "Symbol", weight: 0.8 },
    { header: "Value", weight: 1, align: "right" as const },
    { header: "What it is", weight: 3.2 },
    { header: "Reference", weight: 1.8 },
  ];
  const row = (step: WorkingStepLike) => [{ text: step.symbol, bold: true }, text.of(step.value, step.quantity), step.description, step.reference ?? ""];

  if (all.length === 1) {
    const every = all[0]!.combinations.length > 1 && all[0]!.combinations.length === entries.length;
    sheet.heading(`Working for ${what}: ${every ? "the same under every combination" : named(all[0]!.combinations)}`, 2, 40);
    table(sheet, columns, all[0]!.steps.map(row));
    return;
  }
  const keyOf = (step: WorkingStepLike) => JSON.stringify(step);
  const common = all[0]!.steps.filter((step) => all.every((g) => g.steps.some((t) => keyOf(t) === keyOf(step))));
  const commonKeys = new Set(common.map(keyOf));
  if (common.length > 0) {
    sheet.heading(`Working for ${what}, the same under every combination`, 2, 40);
    table(sheet, columns, common.map(row));
  }
  sheet.heading(`Working for ${what} that differs between combinations`, 2, 40);
  table(
    sheet,
    [{ header: "Combinations", weight: 1.4 }, ...columns],
    all.flatMap((g) => g.steps.filter((step) => !commonKeys.has(keyOf(step))).map((step, i) => [i === 0 ? { text: g.combinations.join(", "), bold: true } : "", ...row(step)])),
  );
}

const named = (combinations: string[]) =>
  `combination${combinations.length === 1 ? "" : "s"} ${combinations.length > MAX_NAMED ? `${combinations.slice(0, MAX_NAMED).join(", ")} and ${combinations.length - MAX_NAMED} more` : combinations.join(", ")}`;

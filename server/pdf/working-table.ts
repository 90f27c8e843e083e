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
 * The working behind a resistance or strength, one line per step. Combinations whose working is
 * the same step for step share one table, so fifteen combinations do not print fifteen copies.
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
  for (const { combinations, steps } of groups.values()) {
    const named = combinations.length > MAX_NAMED ? `${combinations.slice(0, MAX_NAMED).join(", ")} and ${combinations.length - MAX_NAMED} more` : combinations.join(", ");
    sheet.heading(`Working for ${what}: combination${combinations.length === 1 ? "" : "s"} ${named}`, 2, 40);
    table(
      sheet,
      [
        { header: "Symbol", weight: 0.8 },
        { header: "Value", weight: 1, align: "right" },
        { header: "What it is", weight: 3.2 },
        { header: "Reference", weight: 1.8 },
      ],
      steps.map((step) => [{ text: step.symbol, bold: true }, stepValue(step, text), step.description, step.reference ?? ""]),
    );
  }
}

const stepValue = (step: WorkingStepLike, text: QuantityText) => text.of(step.value, step.quantity);

import type { Schedule } from "../schema/result.js";
import type { ContactLine } from "../section/contacts.js";
import { inJobUnits } from "../units/format.js";
import type { UnitSystem } from "../units/quantity.js";

export type RowFit = NonNullable<Schedule["rowFit"]>;

/**
 * Whether the connectors of one row fit side by side across each contact line of a joint: two edge
 * distances and (n − 1) spacings across, within the longest unbroken stretch of touching faces (the
 * edge distance is to the edge of each joined part, and no part's face reaches past the contact on both
 * sides). The narrowest line governs. Null when the connector states neither distance.
 */
export function rowFit(limits: Pick<Schedule["limits"], "edgeDistance" | "rowSpacing">, rows: number, lines: ContactLine[]): RowFit | null {
  const edge = limits.edgeDistance ?? null;
  const across = rows > 1 ? (limits.rowSpacing ?? null) : null;
  if (lines.length === 0 || (edge === null && across === null)) return null;
  const needed = 2 * (edge ?? 0) + (rows - 1) * (across ?? 0);
  const narrowest = lines.reduce((a, b) => (b.widest < a.widest ? b : a));
  return { needed, available: narrowest.widest, between: [narrowest.a, narrowest.b], fits: needed <= narrowest.widest * (1 + 1e-9) };
}

/** The sentence a schedule whose rows do not fit carries among its detailing problems. */
export function rowFitProblem(fit: RowFit, limits: Pick<Schedule["limits"], "edgeDistance" | "rowSpacing">, rows: number, connectorLabel: string, units: UnitSystem): string {
  const len = (mm: number) => inJobUnits(mm, "length", units);
  const what = `${rows} per row side by side (${connectorLabel}) need`;
  const edge = limits.edgeDistance ?? 0;
  const across = limits.rowSpacing ?? 0;
  // How many would fit: two edge distances and a spacing across between each pair.
  const fitting = edge * 2 > fit.available * (1 + 1e-9) ? 0 : across > 0 ? Math.floor((fit.available * (1 + 1e-9) - 2 * edge) / across) + 1 : 1;
  const advice =
    fitting >= 1 && fitting < rows
      ? `At most ${fitting} per row ${fitting === 1 ? "fits" : "fit"} across it.`
      : `No row of this connector fits across it: use a smaller connector, or make the contact at least ${len(fit.needed)} wide.`;
  return `${rows === 1 ? `One per row (${connectorLabel}) needs` : what} ${len(fit.needed)} across the contact between "${fit.between[0]}" and "${fit.between[1]}" (edge distances${rows > 1 ? " and the spacing across" : ""}), which is only ${len(fit.available)} wide: the row cannot be built. ${advice}`;
}

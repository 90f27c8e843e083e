import type { Schedule } from "../schema/result.js";
import type { ContactLine } from "../section/contacts.js";
import { inJobUnits } from "../units/format.js";
import type { UnitSystem } from "../units/quantity.js";

export type RowFit = NonNullable<Schedule["rowFit"]>;
type FitLimits = Pick<Schedule["limits"], "edgeDistance" | "rowSpacing" | "unloadedEdgeDistance" | "loadedEdges">;

/**
 * The least distances to the two edges of the contact across the line, mm: the edge distance at both,
 * or, where the connector gives a smaller one for an unloaded edge (a force across the grain), that one
 * at an edge the connectors do not push the wood toward. Which edges are loaded comes with the limits;
 * where it is not told, both are taken as loaded.
 */
export function edgeDistances(limits: FitLimits): { high: number; low: number } | null {
  const edge = limits.edgeDistance ?? null;
  if (edge === null) return null;
  const unloaded = limits.unloadedEdgeDistance ?? null;
  if (unloaded === null || limits.loadedEdges === undefined) return { high: edge, low: edge };
  const at = (e: "top" | "bottom") => (limits.loadedEdges!.includes(e) ? edge : Math.min(edge, unloaded));
  return { high: at("top"), low: at("bottom") };
}

/**
 * Whether the connectors of one row fit side by side across each contact line of a joint: two edge
 * distances and (n − 1) spacings across, within the longest unbroken stretch of touching faces (the
 * edge distance is to the edge of each joined part, and no part's face reaches past the contact on both
 * sides). The narrowest line governs. Null when the connector states neither distance.
 */
export function rowFit(limits: FitLimits, rows: number, lines: ContactLine[]): RowFit | null {
  const edges = edgeDistances(limits);
  const across = rows > 1 ? (limits.rowSpacing ?? null) : null;
  if (lines.length === 0 || (edges === null && across === null)) return null;
  const needed = (edges ? edges.high + edges.low : 0) + (rows - 1) * (across ?? 0);
  const narrowest = lines.reduce((a, b) => (b.widest < a.widest ? b : a));
  return { needed, available: narrowest.widest, between: [narrowest.a, narrowest.b], fits: needed <= narrowest.widest * (1 + 1e-9) };
}

/** The sentence a schedule whose rows do not fit carries among its detailing problems. */
export function rowFitProblem(fit: RowFit, limits: FitLimits, rows: number, connectorLabel: string, units: UnitSystem): string {
  const len = (mm: number) => inJobUnits(mm, "length", units);
  const what = `${rows} per row side by side (${connectorLabel}) need`;
  const edges = edgeDistances(limits);
  const edgeSum = edges ? edges.high + edges.low : 0;
  const across = limits.rowSpacing ?? 0;
  // How many would fit: two edge distances and a spacing across between each pair.
  const fitting = edgeSum > fit.available * (1 + 1e-9) ? 0 : across > 0 ? Math.floor((fit.available * (1 + 1e-9) - edgeSum) / across) + 1 : 1;
  const advice =
    fitting >= 1 && fitting < rows
      ? `At most ${fitting} per row ${fitting === 1 ? "fits" : "fit"} across it.`
      : `No row of this connector fits across it: use a smaller connector, or make the contact at least ${len(fit.needed)} wide.`;
  const split = edges && edges.high !== edges.low ? `: ${len(edges.high)} to the top edge, ${len(edges.low)} to the bottom edge` : "";
  return `${rows === 1 ? `One per row (${connectorLabel}) needs` : what} ${len(fit.needed)} across the contact between "${fit.between[0]}" and "${fit.between[1]}" (edge distances${split}${rows > 1 ? `${split ? ";" : ""} and the spacing across` : ""}), which is only ${len(fit.available)} wide: the row cannot be built. ${advice}`;
}

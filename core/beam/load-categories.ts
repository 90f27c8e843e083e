import type { DurationClass } from "../connector/connector-kind.js";
import { loadCategories, loadDurations, type Beam, type LoadCategory } from "../schema/beam.js";

/** What the combinations need to know of a load category. */
export interface CategoryInfo {
  id: string;
  /** Symbol in a combination's name: D, L, Lr, S, W, or the id of a category of the job's own. */
  symbol: string;
  /** The built-in category whose factors it takes. */
  actsAs: LoadCategory;
  duration: Exclude<DurationClass, "unspecified">;
  /** EN 1990 Table A1.1 ψ0 used when the category accompanies a leading variable action. */
  psi0: number;
}

/**
 * Load-duration class by category, EN 1995-1-1 §2.3.1.2 and Table 2.2 (from memory [M]): self-weight
 * permanent; imposed floor load medium-term; roof live load (maintenance, construction) short-term
 * [CP]; snow short-term (Table 2.2 allows medium-term where snow lies longer, a national choice [CP]);
 * wind short-term unless the job's `beam.windDuration` says instantaneous (Table 2.2 lists both; national
 * annexes differ, and short-term is the lower k_mod).
 */
export const builtInDuration: Record<LoadCategory, CategoryInfo["duration"]> = {
  dead: "permanent",
  live: "medium",
  "roof-live": "short",
  snow: "short",
  wind: "short",
};

/** The load-duration class the job gives wind: `beam.windDuration`, short-term when absent. */
export const windDurationOf = (beam: Pick<Beam, "windDuration">): CategoryInfo["duration"] => beam.windDuration ?? builtInDuration.wind;

/**
 * ψ0 by category, EN 1990:2002 Table A1.1 recommended values (from memory [M]): imposed loads of
 * categories A–D 0.7; roofs (category H) 0; snow at sites up to 1000 m above sea level outside
 * Finland, Iceland, Norway and Sweden 0.5; wind 0.6. National annexes may differ; a job can replace them.
 */
export const builtInPsi0: Record<LoadCategory, number> = { dead: 1, live: 0.7, "roof-live": 0, snow: 0.5, wind: 0.6 };

const symbols: Record<LoadCategory, string> = { dead: "D", live: "L", "roof-live": "Lr", snow: "S", wind: "W" };

/** Every category the job may use: the built-in ones and its own, by id. */
export function categoriesOf(beam: Pick<Beam, "categories" | "windDuration">, psi0: Record<string, number> = {}): Map<string, CategoryInfo> {
  const out = new Map<string, CategoryInfo>();
  const durationOf = (c: LoadCategory) => (c === "wind" ? windDurationOf(beam) : builtInDuration[c]);
  for (const c of loadCategories) out.set(c, { id: c, symbol: symbols[c], actsAs: c, duration: durationOf(c), psi0: psi0[c] ?? builtInPsi0[c] });
  for (const c of beam.categories) {
    out.set(c.id, { id: c.id, symbol: c.id, actsAs: c.actsAs, duration: c.duration ?? durationOf(c.actsAs), psi0: psi0[c.id] ?? c.psi0 ?? builtInPsi0[c.actsAs] });
  }
  return out;
}

/** Categories with at least one non-zero load, and dead load when self-weight is on and non-zero. */
export function presentCategories(beam: Pick<Beam, "loads">, selfWeight: number): Set<string> {
  const present = new Set<string>();
  if (selfWeight !== 0) present.add("dead");
  for (const l of beam.loads) {
    const size = l.type === "uniform" ? l.w : l.type === "linear" ? Math.abs(l.wStart) + Math.abs(l.wEnd) : l.type === "point" ? l.P : l.M;
    if (size !== 0) present.add(l.category);
  }
  return present;
}

/** The shortest of the durations (EN 1995-1-1 §3.1.3(2): the shortest-duration action present decides). */
export function shortestDuration(durations: Iterable<CategoryInfo["duration"]>): DurationClass {
  let worst = -1;
  for (const d of durations) worst = Math.max(worst, loadDurations.indexOf(d));
  return worst < 0 ? "unspecified" : loadDurations[worst]!;
}

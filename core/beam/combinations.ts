import type { CombinationSettings, Beam, LoadCategory } from "../schema/beam.js";
import type { JobDocument } from "../schema/job.js";
import type { Combination } from "../schema/result.js";
import { categoriesOf, presentCategories, shortestDuration, type CategoryInfo } from "./load-categories.js";

type Factors = Partial<Record<LoadCategory, number>>;

/** One combination of a standard, written with the built-in categories. */
export interface CombinationTemplate {
  id: string;
  factors: Factors;
}

/**
 * ASCE/SEI 7-22 §2.3.1, basic combinations for strength design, with the alternatives written out
 * (R, rain, and the seismic combinations 6 and 7 have no category here and are left out). Factors from
 * memory [M]; the snow factors 1.0S (principal) and 0.3S (companion) follow from 7-22's strength-level
 * snow loads. The permitted 0.5L in combinations 3 and 4 is not taken (1.0L is used).
 */
export const asce7StrengthCombinations: CombinationTemplate[] = [
  { id: "LRFD-1", factors: { dead: 1.4 } },
  { id: "LRFD-2a", factors: { dead: 1.2, live: 1.6, "roof-live": 0.5 } },
  { id: "LRFD-2b", factors: { dead: 1.2, live: 1.6, snow: 0.3 } },
  { id: "LRFD-3a", factors: { dead: 1.2, "roof-live": 1.6, live: 1.0 } },
  { id: "LRFD-3b", factors: { dead: 1.2, "roof-live": 1.6, wind: 0.5 } },
  { id: "LRFD-3c", factors: { dead: 1.2, snow: 1.0, live: 1.0 } },
  { id: "LRFD-3d", factors: { dead: 1.2, snow: 1.0, wind: 0.5 } },
  { id: "LRFD-4a", factors: { dead: 1.2, wind: 1.0, live: 1.0, "roof-live": 0.5 } },
  { id: "LRFD-4b", factors: { dead: 1.2, wind: 1.0, live: 1.0, snow: 0.3 } },
  { id: "LRFD-5", factors: { dead: 0.9, wind: 1.0 } },
];

/**
 * ASCE/SEI 7-22 §2.4.1, basic combinations for allowable stress design, alternatives written out
 * (no R, no seismic 8 and 9). The 0.7S of combinations 3, 4 and 6 for 7-22's strength-level snow:
 * [V] as excerpted in a trade-magazine article on the 7-22 snow provisions; the rest [M].
 */
export const asce7AllowableCombinations: CombinationTemplate[] = [
  { id: "ASD-1", factors: { dead: 1 } },
  { id: "ASD-2", factors: { dead: 1, live: 1 } },
  { id: "ASD-3a", factors: { dead: 1, "roof-live": 1 } },
  { id: "ASD-3b", factors: { dead: 1, snow: 0.7 } },
  { id: "ASD-4a", factors: { dead: 1, live: 0.75, "roof-live": 0.75 } },
  { id: "ASD-4b", factors: { dead: 1, live: 0.75, snow: 0.75 * 0.7 } },
  { id: "ASD-5", factors: { dead: 1, wind: 0.6 } },
  { id: "ASD-6a", factors: { dead: 1, live: 0.75, wind: 0.75 * 0.6, "roof-live": 0.75 } },
  { id: "ASD-6b", factors: { dead: 1, live: 0.75, wind: 0.75 * 0.6, snow: 0.75 * 0.7 } },
  { id: "ASD-7", factors: { dead: 0.6, wind: 0.6 } },
];

/**
 * EN 1990:2002 eq. (6.10) with the recommended partial factors of Table A1.2(B) (from memory [M]):
 * γG = 1.35 (unfavourable) or 1.0 (favourable) on all permanent actions together, γQ = 1.5 on the
 * leading variable action and 1.5·ψ0 on each accompanying one.
 */
export const EN1990_FACTORS = { gammaGsup: 1.35, gammaGinf: 1.0, gammaQ: 1.5 } as const;

export interface CombinationSetResult {
  combinations: Combination[];
  /** Combinations of the standard left out because they cannot govern, with the reason. */
  omitted: { id: string; name: string; reason: string }[];
  /** Sentences for the result's assumptions. */
  notes: string[];
}

/** The load combinations of the job's set. */
export function combinationsOf(job: JobDocument): Combination[] {
  return combinationSet(job.beam, job.combinations, job.beam.selfWeight ? 1 : 0).combinations;
}

/**
 * The combinations of a set for the categories present in the beam: factors of absent categories are
 * dropped, repeats removed, and (for the built-in sets) a combination is omitted when its factors lie
 * on the segment between two others (its actions then lie between theirs at every point) or are a
 * fraction of another's (its actions are that fraction of the other's, never larger in size). Factors
 * are never negative, so the others carry no category it lacks and their load-duration class is no
 * shorter: it can govern no connector, no stress and neither extreme of an envelope.
 * `selfWeight` is any non-zero number when self-weight is on.
 */
export function combinationSet(beam: Beam, settings: CombinationSettings, selfWeight: number): CombinationSetResult {
  const info = categoriesOf(beam, settings.psi0);
  const present = [...info.values()].filter((c) => presentCategories(beam, selfWeight).has(c.id));
  const notes: string[] = [];
  let raw: { id: string; factors: Record<string, number>; duration?: Combination["duration"] | undefined }[];
  switch (settings.set) {
    case "unfactored":
      raw = [{ id: "U", factors: Object.fromEntries(present.map((c) => [c.id, 1])) }];
      break;
    case "asce7-22-strength":
      raw = fromTemplates(asce7StrengthCombinations, present);
      notes.push("Load combinations: ASCE/SEI 7-22 §2.3.1 basic combinations for strength design (rain, seismic and the other loads without a category here are not included; 1.0L is kept in combinations 3 and 4).");
      break;
    case "asce7-22-allowable":
      raw = fromTemplates(asce7AllowableCombinations, present);
      notes.push("Load combinations: ASCE/SEI 7-22 §2.4.1 basic combinations for allowable stress design (rain, seismic and the other loads without a category here are not included).");
      break;
    case "en1990-6.10":
      raw = en1990(present);
      notes.push(
        `Load combinations: EN 1990 eq. (6.10), γG = 1.35 or 1.0 on all permanent loads together, γQ = 1.5 on the leading variable load, 1.5·ψ0 on the others; ψ0 used: ${present
          .filter((c) => c.actsAs !== "dead")
          .map((c) => `${c.symbol} ${c.psi0}`)
          .join(", ") || "none (no variable loads)"} (EN 1990 Table A1.1 recommended values unless the job sets them). Roof imposed load is not combined with snow or wind (EN 1991-1-1 §3.3.2(1)).`,
      );
      break;
    case "custom":
      raw = (settings.custom ?? []).map((c) => ({ id: c.id, factors: Object.fromEntries(present.filter((p) => (c.factors[p.id] ?? 0) !== 0).map((p) => [p.id, c.factors[p.id]!])), duration: c.duration }));
      break;
  }
  const named = (settings.custom ?? []).reduce((m, c) => m.set(c.id, c.name), new Map<string, string>());
  const combinations: Combination[] = [];
  const seen = new Map<string, string>();
  const omitted: CombinationSetResult["omitted"] = [];
  for (const r of raw) {
    const factors = Object.fromEntries(present.filter((c) => (r.factors[c.id] ?? 0) !== 0).map((c) => [c.id, r.factors[c.id]!]));
    const name = settings.set === "unfactored" ? "Loads as entered" : named.get(r.id) || nameOf(factors, info, settings.set === "en1990-6.10");
    const key = present.map((c) => factors[c.id] ?? 0).join("|");
    if (Object.keys(factors).length === 0 && settings.set !== "custom") continue;
    const same = seen.get(key);
    if (same !== undefined && settings.set !== "custom") {
      omitted.push({ id: r.id, name, reason: `the same as ${same} with the loads present` });
      continue;
    }
    seen.set(key, r.id);
    const categories = Object.keys(factors);
    combinations.push({ id: r.id, name, factors, duration: r.duration ?? shortestDuration(categories.map((c) => info.get(c)!.duration)), categories });
  }
  const kept = settings.set === "custom" || settings.set === "unfactored" ? combinations : pruneInterior(combinations, present, omitted);
  if (kept.length === 0) kept.push({ id: "U", name: "No loads", factors: {}, duration: "unspecified", categories: [] });
  const ids = relabelling(kept);
  const rename = (text: string) => text.replace(/\b(?:LRFD|ASD)-\d+[a-z]\b/g, (id) => ids.get(id) ?? id);
  return {
    combinations: kept.map((c) => ({ ...c, id: ids.get(c.id) ?? c.id })),
    omitted: omitted.map((o) => ({ ...o, reason: rename(o.reason) })),
    notes,
  };
}

function fromTemplates(templates: CombinationTemplate[], present: CategoryInfo[]) {
  return templates.map((t) => ({ id: t.id, factors: Object.fromEntries(present.map((c) => [c.id, t.factors[c.actsAs] ?? 0])) }));
}

function en1990(present: CategoryInfo[]) {
  const { gammaGsup, gammaGinf, gammaQ } = EN1990_FACTORS;
  const permanent = present.filter((c) => c.actsAs === "dead");
  const variable = present.filter((c) => c.actsAs !== "dead");
  const out: { id: string; factors: Record<string, number> }[] = [];
  const withG = (g: number, rest: Record<string, number>) => ({ ...Object.fromEntries(permanent.map((c) => [c.id, g])), ...rest });
  out.push({ id: "EN-1a", factors: withG(gammaGsup, {}) }, { id: "EN-1b", factors: withG(gammaGinf, {}) });
  variable.forEach((lead, k) => {
    const others = variable.filter((c) => c !== lead && !(lead.actsAs === "roof-live" && (c.actsAs === "snow" || c.actsAs === "wind")));
    const q = { [lead.id]: gammaQ, ...Object.fromEntries(others.map((c) => [c.id, round(gammaQ * c.psi0)])) };
    out.push({ id: `EN-${k + 2}a`, factors: withG(gammaGsup, q) }, { id: `EN-${k + 2}b`, factors: withG(gammaGinf, q) });
  });
  return out;
}

/** Drops combinations on the segment between two others or between one and zero (see `combinationSet`). */
function pruneInterior(list: Combination[], present: CategoryInfo[], omitted: CombinationSetResult["omitted"]): Combination[] {
  const vec = (c: Combination) => present.map((p) => c.factors[p.id] ?? 0);
  const vectors = list.map(vec);
  const zero = present.map(() => 0);
  const candidates = [{ id: "no load", v: zero }, ...list.map((c, i) => ({ id: c.id, v: vectors[i]! }))];
  const keep: Combination[] = [];
  list.forEach((c, i) => {
    const a = vectors[i]!;
    for (let p = 0; p < candidates.length; p++) {
      for (let q = p + 1; q < candidates.length; q++) {
        const b1 = candidates[p]!;
        const b2 = candidates[q]!;
        if (b1.id === c.id || b2.id === c.id) continue;
        const t = onSegment(a, b1.v, b2.v);
        if (t === null) continue;
        omitted.push({
          id: c.id,
          name: c.name,
          reason: b1.id === "no load" ? `a fraction (${round(t)}) of ${b2.id}` : `between ${b1.id} and ${b2.id}`,
        });
        return;
      }
    }
    keep.push(c);
  });
  return keep;
}

/** t ∈ [0, 1] with a = (1 − t)·b1 + t·b2, or null. */
function onSegment(a: number[], b1: number[], b2: number[]): number | null {
  let k = -1;
  let largest = 0;
  for (let i = 0; i < a.length; i++) {
    const d = Math.abs(b2[i]! - b1[i]!);
    if (d > largest) {
      largest = d;
      k = i;
    }
  }
  if (k < 0) return null;
  const t = (a[k]! - b1[k]!) / (b2[k]! - b1[k]!);
  if (t < -1e-12 || t > 1 + 1e-12) return null;
  for (let i = 0; i < a.length; i++) if (Math.abs((1 - t) * b1[i]! + t * b2[i]! - a[i]!) > 1e-9 * Math.max(1, Math.abs(a[i]!))) return null;
  return t;
}

/** "LRFD-2a" becomes "LRFD-2" when no other alternative of combination 2 is left. */
function relabelling(list: Combination[]): Map<string, string> {
  const stem = (id: string) => id.replace(/^((?:LRFD|ASD)-\d+)[a-z]$/, "$1");
  const count = new Map<string, number>();
  for (const c of list) count.set(stem(c.id), (count.get(stem(c.id)) ?? 0) + 1);
  return new Map(list.filter((c) => count.get(stem(c.id)) === 1 && stem(c.id) !== c.id).map((c) => [c.id, stem(c.id)]));
}

function nameOf(factors: Record<string, number>, info: Map<string, CategoryInfo>, eurocode: boolean): string {
  const terms = Object.entries(factors).map(([id, f]) => {
    const c = info.get(id)!;
    const symbol = eurocode && c.id === "dead" ? "G" : c.symbol;
    return f === 1 ? symbol : `${round(f)}${symbol}`;
  });
  return terms.join(" + ") || "no load";
}

const round = (x: number) => Number(x.toPrecision(4));

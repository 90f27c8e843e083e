import type { CombinationSettings, Beam, LoadCategory } from "../schema/beam.js";
import type { Combination } from "../schema/result.js";
import { ndsLoadDurationFactor, ndsTimeEffectFactor } from "../connector/timber/nds-adjustment.js";
import { beamModelOf } from "./beam-model.js";
import { categoriesOf, presentCategories, shortestDuration, type CategoryInfo } from "./load-categories.js";

type Factors = Partial<Record<LoadCategory, number>>;

/** One combination of a standard, written with the built-in categories. */
export interface CombinationTemplate {
  id: string;
  factors: Factors;
  /** The principal load of the form (the 1.6 load of ASCE/SEI 7 §2.3.1 combinations 2 and 3, 1.0W of 4 and 5): NDS LRFD λ follows it. */
  principal?: LoadCategory;
}

/**
 * ASCE/SEI 7-22 §2.3.1, basic combinations for strength design, with the alternatives written out
 * (R, rain, and the seismic combinations 6 and 7 have no category here and are left out). Factors from
 * memory [M]; the snow factors 1.0S (principal) and 0.3S (companion) follow from 7-22's strength-level
 * snow loads. The permitted 0.5L in combinations 3 and 4 is not taken (1.0L is used).
 */
export const asce7StrengthCombinations: CombinationTemplate[] = [
  { id: "LRFD-1", factors: { dead: 1.4 } },
  { id: "LRFD-2a", factors: { dead: 1.2, live: 1.6, "roof-live": 0.5 }, principal: "live" },
  { id: "LRFD-2b", factors: { dead: 1.2, live: 1.6, snow: 0.3 }, principal: "live" },
  { id: "LRFD-3a", factors: { dead: 1.2, "roof-live": 1.6, live: 1.0 }, principal: "roof-live" },
  { id: "LRFD-3b", factors: { dead: 1.2, "roof-live": 1.6, wind: 0.5 }, principal: "roof-live" },
  { id: "LRFD-3c", factors: { dead: 1.2, snow: 1.0, live: 1.0 }, principal: "snow" },
  { id: "LRFD-3d", factors: { dead: 1.2, snow: 1.0, wind: 0.5 }, principal: "snow" },
  { id: "LRFD-4a", factors: { dead: 1.2, wind: 1.0, live: 1.0, "roof-live": 0.5 }, principal: "wind" },
  { id: "LRFD-4b", factors: { dead: 1.2, wind: 1.0, live: 1.0, snow: 0.3 }, principal: "wind" },
  { id: "LRFD-5", factors: { dead: 0.9, wind: 1.0 }, principal: "wind" },
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

/**
 * The combinations of a set for the categories present in the beam. A timber connector's resistance
 * follows the shortest-duration load of the combination (NDS C_D and λ, EN 1995 k_mod), and a variable
 * load may be absent (ASCE/SEI 7-22 §2.3.1, §2.4.1: the effects of one or more loads not acting are
 * investigated [M]; EN 1990 Table A1.2(B): a favourable variable action takes γ = 0 [M]); so each built-in
 * combination comes with every selection of its variable loads left out, each at its own duration.
 * Factors of absent categories are dropped and repeats removed. Then a combination is omitted when it
 * cannot govern: its factors lie on the segment between two others' (its actions then lie between
 * theirs at every point, whatever their signs) or are a fraction of another's, and each of those others
 * holds no category it lacks (so no shorter duration: C_D and k_mod no higher) and has no higher λ, in any
 * live-load pattern. `selfWeight` is any non-zero number when self-weight is on; `alsoPresent`, categories
 * loading the member other than through the beam loads (a column's axial loads).
 */
export function combinationSet(beam: Beam, settings: CombinationSettings, selfWeight: number, alsoPresent: readonly string[] = []): CombinationSetResult {
  const info = categoriesOf(beam, settings.psi0);
  const loaded = presentCategories(beam, selfWeight);
  for (const c of alsoPresent) loaded.add(c);
  const present = [...info.values()].filter((c) => loaded.has(c.id));
  const notes: string[] = [];
  let raw: Raw[];
  switch (settings.set) {
    case "unfactored":
      raw = [{ id: "U", factors: Object.fromEntries(present.map((c) => [c.id, 1])) }];
      notes.push("Load combinations: the loads as entered, factor 1, all together and with every selection of the variable categories left out (dead load alone included), each at the load duration of its own shortest-duration load.");
      break;
    case "asce7-22-strength":
      raw = fromTemplates(asce7StrengthCombinations, present);
      notes.push("Load combinations: ASCE/SEI 7-22 §2.3.1 basic combinations for strength design, each also with its variable loads left out in every selection (rain, seismic and the other loads without a category here are not included; 1.0L is kept in combinations 3 and 4).");
      break;
    case "asce7-22-allowable":
      raw = fromTemplates(asce7AllowableCombinations, present);
      notes.push("Load combinations: ASCE/SEI 7-22 §2.4.1 basic combinations for allowable stress design, each also with its variable loads left out in every selection (rain, seismic and the other loads without a category here are not included).");
      break;
    case "en1990-6.10":
      raw = en1990(present);
      notes.push(
        `Load combinations: EN 1990 eq. (6.10), γG = 1.35 or 1.0 on all permanent loads together, γQ = 1.5 on the leading variable load, 1.5·ψ0 on the others, each accompanying load also left out in every selection; ψ0 used: ${present
          .filter((c) => c.actsAs !== "dead")
          .map((c) => `${c.symbol} ${c.psi0}`)
          .join(", ") || "none (no variable loads)"} (EN 1990 Table A1.1 recommended values unless the job sets them). Roof imposed load is not combined with snow or wind (EN 1991-1-1 §3.3.2(1)).`,
      );
      break;
    case "custom":
      raw = (settings.custom ?? []).map((c) => ({ id: c.id, factors: Object.fromEntries(present.filter((p) => (c.factors[p.id] ?? 0) !== 0).map((p) => [p.id, c.factors[p.id]!])), duration: c.duration }));
      break;
  }
  const builtIn = settings.set !== "custom";
  // Categories placed span by span: a selection that only leaves such a load off is one of the patterns.
  const patternedHere = beamModelOf(beam.spans, beam.supports).regions.length > 1 ? new Set(beam.patternedCategories.filter((c) => info.has(c))) : new Set<string>();
  if (builtIn) raw = withSelections(raw, present, patternedHere, info);
  const named = (settings.custom ?? []).reduce((m, c) => m.set(c.id, c.name), new Map<string, string>());
  const combinations: Combination[] = [];
  const seen = new Map<string, number>();
  const omitted: CombinationSetResult["omitted"] = [];
  for (const r of raw) {
    const factors: Record<string, number> = {};
    for (const c of present) if ((r.factors[c.id] ?? 0) !== 0) factors[c.id] = r.factors[c.id]!;
    const categories = Object.keys(factors);
    if (categories.length === 0 && builtIn) continue;
    const key = present.map((c) => factors[c.id] ?? 0).join("|");
    const principal = (r.principal ?? []).filter((p) => categories.includes(p));
    const timeEffect = formTimeEffect(principal, categories, info);
    // The same loads in the same form are one combination (in two forms, λ, both stay); a selection that
    // repeats another is not a combination of the standard left out, so it is not listed.
    const same = seen.get(`${key}|${principal.join(",")}|${timeEffect.value}`);
    if (same !== undefined && builtIn) {
      if (!r.id.includes(" without ")) omitted.push({ id: r.id, name: combinations[same]!.name, reason: `the same as ${combinations[same]!.id} with the loads present` });
      continue;
    }
    const name =
      settings.set === "unfactored"
        ? r.id === "U" ? "Loads as entered" : `${nameOf(factors, info, false)}, as entered`
        : named.get(r.id) || nameOf(factors, info, settings.set === "en1990-6.10");
    const combination: Combination = {
      id: r.id,
      name,
      factors,
      duration: r.duration ?? shortestDuration(categories.map((c) => info.get(c)!.duration)),
      categories,
      ...(principal.length > 0 ? { principal } : {}),
      timeEffect,
    };
    seen.set(`${key}|${principal.join(",")}|${timeEffect.value}`, combinations.length);
    combinations.push(combination);
  }
  const patterned = new Set(beam.patternedCategories);
  const kept = builtIn ? pruneInterior(combinations, present, patterned, info, omitted) : combinations;
  if (kept.length === 0) kept.push({ id: "U", name: "No loads", factors: {}, duration: "unspecified", categories: [] });
  const rename = renaming(kept);
  return {
    combinations: kept.map((c) => ({ ...c, id: rename(c.id) })),
    omitted: omitted.map((o) => ({ ...o, id: rename(o.id), reason: rename(o.reason) })),
    notes,
  };
}

interface Raw {
  id: string;
  factors: Record<string, number>;
  duration?: Combination["duration"] | undefined;
  /** Ids of the categories that take the principal load's role in the form. */
  principal?: string[];
}

/** A load that is there whenever the member is: a dead-type category of permanent duration. */
const permanentLoad = (c: CategoryInfo) => c.actsAs === "dead" && c.duration === "permanent";

/**
 * λ of a combination's form (NDS-2018 Table N3 [M]): that of its principal load where it is present
 * (the least, where several categories share that role), else the least any variable load present
 * would take as principal, 0.6 with permanent loads alone.
 */
export function formTimeEffect(principal: string[], categories: string[], info: Map<string, CategoryInfo>): { value: number; reason: string } {
  const form = (id: string) => {
    const c = info.get(id)!;
    return { symbol: c.symbol, actsAs: c.actsAs, duration: c.duration };
  };
  const known = categories.filter((c) => info.has(c));
  const variables = known.filter((c) => !permanentLoad(info.get(c)!)).map(form);
  const principals = principal.filter((p) => known.includes(p)).map(form);
  const options = principals.length > 0 ? principals.map((p) => ndsTimeEffectFactor({ principal: p, variables })) : [ndsTimeEffectFactor({ principal: null, variables })];
  const least = options.reduce((a, b) => (b.value < a.value ? b : a));
  return { value: least.value, reason: least.load };
}

/**
 * λ of one live-load pattern of a combination, `loaded` the categories it loads: the combination's while a
 * principal load is loaded; else the lower of the combination's and the loaded loads' own (never above the
 * combination's, so that the patterns chosen by their actions also give the largest q/R).
 */
export function patternTimeEffect(base: Combination, loaded: string[], info: Map<string, CategoryInfo>): Combination["timeEffect"] {
  if (!base.timeEffect) return undefined;
  if ((base.principal ?? []).some((p) => loaded.includes(p))) return base.timeEffect;
  const own = formTimeEffect([], loaded, info);
  return own.value < base.timeEffect.value ? own : base.timeEffect;
}

/**
 * Each combination, then the same with every selection of its variable loads left out (fewest left out
 * first). A selection is not written out where leaving off one of its loads, X, changes no resistance
 * factor (duration class, C_D, λ) and X is the only patterned category of the combination that holds it:
 * that combination's live-load patterns then include X on no span, at the same resistance, and every
 * other arrangement the patterns choose gives larger actions there.
 */
function withSelections(list: Raw[], present: CategoryInfo[], patterned: Set<string>, info: Map<string, CategoryInfo>): Raw[] {
  const out: Raw[] = [];
  const known = new Map<string, string>();
  const factorsOf = (categories: string[], principal: string[]) => {
    const key = JSON.stringify([categories, principal]);
    let made = known.get(key);
    if (made === undefined) {
      made = `${shortestDuration(categories.map((c) => info.get(c)!.duration))}|${ndsLoadDurationFactor(categories, shortestDuration(categories.map((c) => info.get(c)!.duration))).value}|${formTimeEffect(principal, categories, info).value}`;
      known.set(key, made);
    }
    return made;
  };
  for (const r of list) {
    const variable = present.filter((c) => !permanentLoad(c) && (r.factors[c.id] ?? 0) !== 0);
    const all = present.filter((c) => (r.factors[c.id] ?? 0) !== 0).map((c) => c.id);
    const principal = r.principal ?? [];
    const masks = Array.from({ length: 1 << variable.length }, (_, m) => m).sort((a, b) => bits(a) - bits(b) || a - b);
    for (const m of masks) {
      const dropped = variable.filter((_, i) => m & (1 << i));
      const left = all.filter((c) => !dropped.some((d) => d.id === c));
      const inPatterns = dropped.some((x) => {
        if (!patterned.has(x.id) || principal.includes(x.id)) return false;
        const withX = [...left, x.id];
        return withX.every((c) => c === x.id || !patterned.has(c)) && factorsOf(withX, principal) === factorsOf(left, principal);
      });
      if (inPatterns) continue;
      // Built without the dropped keys rather than deleting them (an object with deleted keys turns slow to read).
      const factors: Record<string, number> = {};
      for (const [c, f] of Object.entries(r.factors)) if (!dropped.some((d) => d.id === c)) factors[c] = f;
      out.push({ ...r, id: dropped.length === 0 ? r.id : `${r.id} without ${dropped.map((d) => d.symbol).join(", ")}`, factors });
    }
  }
  return out;
}

const bits = (m: number) => {
  let n = 0;
  for (let x = m; x; x &= x - 1) n++;
  return n;
};

function fromTemplates(templates: CombinationTemplate[], present: CategoryInfo[]): Raw[] {
  return templates.map((t) => ({
    id: t.id,
    factors: Object.fromEntries(present.map((c) => [c.id, t.factors[c.actsAs] ?? 0])),
    ...(t.principal ? { principal: present.filter((c) => c.actsAs === t.principal).map((c) => c.id) } : {}),
  }));
}

function en1990(present: CategoryInfo[]): Raw[] {
  const { gammaGsup, gammaGinf, gammaQ } = EN1990_FACTORS;
  const permanent = present.filter((c) => c.actsAs === "dead");
  const variable = present.filter((c) => c.actsAs !== "dead");
  const out: Raw[] = [];
  const withG = (g: number, rest: Record<string, number>) => ({ ...Object.fromEntries(permanent.map((c) => [c.id, g])), ...rest });
  out.push({ id: "EN-1a", factors: withG(gammaGsup, {}) }, { id: "EN-1b", factors: withG(gammaGinf, {}) });
  variable.forEach((lead, k) => {
    const others = variable.filter((c) => c !== lead && !(lead.actsAs === "roof-live" && (c.actsAs === "snow" || c.actsAs === "wind")));
    const q = { [lead.id]: gammaQ, ...Object.fromEntries(others.map((c) => [c.id, round(gammaQ * c.psi0)])) };
    out.push({ id: `EN-${k + 2}a`, factors: withG(gammaGsup, q) }, { id: `EN-${k + 2}b`, factors: withG(gammaGinf, q) });
  });
  return out;
}

/**
 * Drops combinations on the segment between two others or between one and zero (see `combinationSet`),
 * where each of the two holds only categories the dropped one holds and has no higher λ than the least
 * λ any live-load pattern of the dropped one can take.
 */
function pruneInterior(list: Combination[], present: CategoryInfo[], patterned: Set<string>, info: Map<string, CategoryInfo>, omitted: CombinationSetResult["omitted"]): Combination[] {
  const vec = (c: Combination) => present.map((p) => c.factors[p.id] ?? 0);
  const lambda = (c: Combination) => c.timeEffect?.value ?? 0;
  // The least λ of any pattern: a pattern that leaves every principal load off takes the loads' own λ.
  const leastLambda = (c: Combination) => {
    const principal = c.principal ?? [];
    if (principal.length === 0 || !principal.every((p) => patterned.has(p))) return lambda(c);
    const rest = c.categories.filter((k) => !principal.includes(k));
    return Math.min(lambda(c), formTimeEffect([], rest, info).value);
  };
  const bit = new Map(present.map((p, i) => [p.id, 2 ** i]));
  const maskOf = (c: Combination) => c.categories.reduce((m, k) => m + (bit.get(k) ?? 0), 0);
  const entries = list.map((c) => ({ id: c.id, c: c as Combination | null, v: vec(c), cats: maskOf(c), high: lambda(c), low: leastLambda(c) }));
  const zero = { id: "no load", c: null, v: present.map(() => 0), cats: 0, high: 0, low: 0 };
  // Integer weights for a numeric key of a direction (a collision only costs a missed omission).
  const weights = present.map((_, i) => 1 + 1_000_003 * i);
  const keep: Combination[] = [];
  for (const a of entries) {
    // a lies between b1 and b2 when b1 − a and b2 − a point in opposite directions: find such pairs by
    // the direction's key, then confirm exactly. Each b holds only categories a holds, and no higher λ.
    const byDirection = new Map<number, (typeof entries)[number]>();
    let reason: string | null = null;
    for (const b of [zero, ...entries]) {
      if (b === a || (b.cats & a.cats) !== b.cats || b.high > a.low + 1e-12) continue;
      let size = 0;
      for (let i = 0; i < b.v.length; i++) size += (b.v[i]! - a.v[i]!) ** 2;
      size = Math.sqrt(size);
      if (!(size > 0)) continue;
      let key = 0;
      for (let i = 0; i < b.v.length; i++) key += Math.round(((b.v[i]! - a.v[i]!) * 1e6) / size) * weights[i]!;
      const other = byDirection.get(-key);
      const t = other ? onSegment(a.v, other.v, b.v) : null;
      if (other && t !== null) {
        reason = other === zero ? `a fraction (${round(t)}) of ${b.id}` : `between ${other.id} and ${b.id}`;
        break;
      }
      byDirection.set(key, b);
    }
    if (reason === null) keep.push(a.c!);
    else omitted.push({ id: a.id, name: a.c!.name, reason });
  }
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

/** "LRFD-2a" becomes "LRFD-2" (in every id and text) when no other alternative of combination 2 is left. */
function renaming(list: Combination[]): (text: string) => string {
  const letters = new Map<string, Set<string>>();
  for (const c of list) {
    const m = /^((?:LRFD|ASD)-\d+)([a-z])\b/.exec(c.id);
    if (m) letters.set(m[1]!, (letters.get(m[1]!) ?? new Set()).add(m[2]!));
  }
  return (text) => text.replace(/\b((?:LRFD|ASD)-\d+)([a-z])\b/g, (id, stem: string, letter: string) => (letters.get(stem)?.size === 1 && letters.get(stem)!.has(letter) ? stem : id));
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

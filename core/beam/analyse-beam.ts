import { GRAVITY } from "../units/quantity.js";
import type { Beam } from "../schema/beam.js";
import type { JobDocument } from "../schema/job.js";
import type { Combination } from "../schema/result.js";
import type { SectionModel } from "../section/section-model.js";
import { beamModelOf, type LoadRegion, type Support, type SupportCondition } from "./beam-model.js";
import { governingPatterns, regionsIn } from "./live-load-patterns.js";
import { patternTimeEffect } from "./combinations.js";
import { categoriesOf, presentCategories, shortestDuration } from "./load-categories.js";
import {
  deflectionCurve,
  emptyLoads,
  memberActions,
  type DeflectionCurve,
  type LoadSet,
  type MemberActions,
  type Reaction,
} from "./member-actions.js";
import type { RigidityStep } from "./rigidity.js";
import { supportReactions } from "./support-reactions.js";

export type { Support } from "./beam-model.js";

export interface CombinationActions {
  combination: Combination;
  loads: LoadSet;
  reactions: Reaction[];
  actions: MemberActions;
  curve: DeflectionCurve;
  /**
   * Piece k of `curve` (θ in out[0..4], v in out[5..10]) as combining the load cases gives it, without
   * building the whole curve: for a reader that wants the curve at a few points of every combination.
   */
  curvePiece?(k: number, out: Float64Array): void;
}

export interface BeamAnalysis {
  length: number;
  spans: number[];
  /** The supports, left to right (free ends are not supports). */
  supports: Support[];
  /** Condition at each span end. */
  ends: SupportCondition[];
  /** Spans between supports and overhangs: the regions live load is patterned over and deflection is measured on. */
  regions: LoadRegion[];
  /** Self-weight as a dead line load, N/mm (0 when switched off). */
  selfWeight: number;
  flexuralRigidity: number;
  /** One entry per combination and live-load pattern. */
  results: CombinationActions[];
  /** Service-level cases for the deflection checks (loads as entered, factor 1), or null when the loads were entered factored. */
  service: { total: CombinationActions[]; live: CombinationActions[]; liveCategories: string[] } | null;
  /** The patterned categories actually placed span by span. */
  patterned: string[];
}

/** Self-weight of the parts, N/mm: Σ ρ·g·A with ρ in kg/m³ and A in mm². */
export function selfWeightOf(section: SectionModel): number {
  return section.parts.reduce((s, p) => s + p.material.density * GRAVITY * p.area * 1e-9, 0);
}

/** A stretch of the member and the section it has there. */
export interface SectionStretch {
  x0: number;
  x1: number;
  section: SectionModel;
}

/**
 * The member of a job (core units) under each combination, with live-load patterns. A member whose
 * section changes along it (parts that start and stop) gives one stretch per section: its E·I steps
 * and its self-weight follows the parts present.
 */
export function analyseBeam(job: JobDocument, stretches: SectionStretch[], combinations: Combination[], alsoPresent: readonly string[] = []): BeamAnalysis {
  const stepped = stretches.length > 1;
  return analyseMember({
    beam: job.beam,
    combinations,
    selfWeight: job.beam.selfWeight ? Math.max(...stretches.map((s) => selfWeightOf(s.section))) : 0,
    selfWeightSteps: stepped && job.beam.selfWeight ? stretches.map((s) => ({ x0: s.x0, x1: s.x1, value: selfWeightOf(s.section) })) : null,
    flexuralRigidity: Math.max(...stretches.map((s) => s.section.referenceModulus * s.section.secondMoment)),
    rigidity: stepped ? stretches.map((s) => ({ x0: s.x0, x1: s.x1, value: s.section.referenceModulus * s.section.secondMoment })) : null,
    serviceLoads: !(job.basis === "factored" && job.combinations.set === "unfactored"),
    alsoPresent,
  });
}

export interface MemberInput {
  /** The job's beam in core units (mm, N, N/mm, N·mm). */
  beam: Beam;
  combinations: Combination[];
  /** N/mm, dead load over the whole member (the largest, where it changes along the member). */
  selfWeight: number;
  /** Self-weight stretch by stretch where the section changes along the member, N/mm; replaces `selfWeight` as a load. */
  selfWeightSteps?: RigidityStep[] | null;
  /** E·I, N·mm² (the largest, where it changes along the member). */
  flexuralRigidity: number;
  /** E·I stretch by stretch where the section changes along the member, N·mm². */
  rigidity?: RigidityStep[] | null;
  /** Whether the loads as entered are service (nominal) loads, so deflection can be checked. */
  serviceLoads: boolean;
  /** Categories that load the member other than through the beam loads (a column's axial loads): a combination keeps them for its duration, C_D and λ. */
  alsoPresent?: readonly string[];
}

/**
 * Reactions by the stiffness method for each load category (and each region of a patterned
 * category), combined by superposition; exact V, M and deflection for every combination and every
 * governing live-load pattern.
 */
export function analyseMember(input: MemberInput): BeamAnalysis {
  const { beam, selfWeight, flexuralRigidity: EI } = input;
  const model = beamModelOf(beam.spans, beam.supports);
  const { length, regions } = model;
  const info = categoriesOf(beam);
  const present = presentCategories(beam, selfWeight);
  const inCombination = new Set([...present, ...(input.alsoPresent ?? [])]);
  const byCategory = loadsByCategory(beam, input.selfWeightSteps ?? (selfWeight !== 0 ? [{ x0: 0, x1: length, value: selfWeight }] : []), length);
  const rigidity = input.rigidity ?? null;
  const patterned = regions.length > 1 ? beam.patternedCategories.filter((c) => present.has(c)) : [];
  const supportsForCurve = model.supports.map((s) => ({ x: s.x, fixed: s.type === "fixed" }));

  // Every case is integrated on the same breaks, so that combinations are sums of pieces.
  const everything = emptyLoads();
  for (const set of byCategory.values()) {
    everything.points.push(...set.points);
    everything.moments.push(...set.moments);
    everything.lines.push(...set.lines);
  }
  const grid = memberActions(length, everything, model.supports.map((s) => ({ x: s.x, R: 0, M: 0 })), (rigidity ?? []).map((r) => r.x0)).breaks;

  const solved = (loads: LoadSet): LoadCase => {
    const reactions = supportReactions(model, loads, rigidity);
    const actions = memberActions(length, loads, reactions, grid);
    if (actions.pieces.length !== grid.length - 1) throw new Error("a load case does not share the member's breaks");
    return { loads, reactions, actions, curve: deflectionCurve(actions, rigidity ?? EI, supportsForCurve) };
  };
  const whole = new Map<string, LoadCase>();
  const perRegion = new Map<string, (LoadCase | null)[]>();
  for (const [category, loads] of byCategory) {
    if (patterned.includes(category)) {
      perRegion.set(category, regions.map((r) => {
        const inside = clip(loads, r, length);
        return hasLoads(inside) ? solved(inside) : null;
      }));
    }
    else whole.set(category, solved(loads));
  }

  const on: Superposition = { length, grid, supports: model.supports };
  const entry = (combination: Combination, terms: Term[]): CombinationActions => new Superposed(combination, terms, on);
  const regionTerms = (factors: Record<string, number>) =>
    regions.map((_, r) => {
      const terms = patterned.flatMap((c) => {
        const k = perRegion.get(c)?.[r];
        return k && (factors[c] ?? 0) !== 0 ? [{ c: k, f: factors[c]! }] : [];
      });
      return terms.length > 0 ? terms : null;
    });

  const patternCache = new Map<string, number[]>();
  const expand = (base: Combination, what: "actions" | "deflection"): CombinationActions[] => {
    const fixedTerms = Object.entries(base.factors).flatMap(([c, f]) => (whole.has(c) && f !== 0 ? [{ c: whole.get(c)!, f }] : []));
    const inPattern = patterned.filter((c) => (base.factors[c] ?? 0) !== 0);
    if (inPattern.length === 0) {
      const categories = base.categories.filter((c) => inCombination.has(c));
      return [entry({ ...base, categories, duration: customDuration(base) ?? durationOf(categories) }, fixedTerms)];
    }
    // The sets depend only on the ratios of the patterned categories' factors.
    const lead = base.factors[inPattern[0]!]!;
    const key = `${what}|${inPattern.map((c) => `${c}:${base.factors[c]! / lead}`).join("|")}`;
    let masks = patternCache.get(key);
    if (!masks) {
      const parts = regionTerms(base.factors);
      masks =
        what === "actions"
          ? governingPatterns(parts.map((t) => (t ? combinedActions(t, on) : null)), "actions", parts.map((t) => (t ? superpose(t, model.supports, false).reactions.map((r) => r.R) : null)))
          : governingPatterns(parts.map((t) => (t ? combinedCurve(t, on) : null)), "deflection");
      patternCache.set(key, masks);
    }
    const custom = customDuration(base);
    const loadsText = inPattern.map((c) => c.replace("-", " ")).join(" and ");
    // Per patterned category, the regions it has loads on.
    const loadedOn = new Map(inPattern.map((c) => [c, (perRegion.get(c) ?? []).reduce((m, k, r) => (k ? m | (1 << r) : m), 0)]));
    return masks.map((mask) => {
      const loadedRegions = regionsIn(mask, regions.length);
      const terms = [...fixedTerms];
      for (const r of loadedRegions) for (const c of inPattern) {
        const k = perRegion.get(c)?.[r];
        if (k) terms.push({ c: k, f: base.factors[c]! });
      }
      const categories = base.categories.filter((c) => inCombination.has(c) && (!loadedOn.has(c) || (loadedOn.get(c)! & mask) !== 0));
      const spansText = loadedRegions.length === 0 ? "on no span" : `on ${placesText(loadedRegions.map((r) => regions[r]!.label))}`;
      const combination: Combination = {
        ...base,
        id: `${base.id}/P${loadedRegions.length === 0 ? "0" : loadedRegions.map((r) => regions[r]!.spans[0]).join("-")}`,
        name: `${base.name}, ${loadsText} ${spansText}`,
        categories,
        duration: custom ?? durationOf(categories),
        ...(base.timeEffect ? { timeEffect: patternTimeEffect(base, categories, info)! } : {}),
        base: base.id,
        pattern: loadedRegions.map((r) => regions[r]!.spans[0]!),
      };
      return entry(combination, terms);
    });
  };
  // A custom combination may fix its duration; any other takes the shortest of its categories present.
  const durationOf = (categories: string[]) => shortestDuration(categories.flatMap((c) => (info.has(c) ? [info.get(c)!.duration] : [])));
  const customDuration = (base: Combination) => {
    const computed = durationOf(base.categories);
    return base.duration !== computed ? base.duration : null;
  };

  const results = input.combinations.flatMap((c) => expand(c, "actions"));

  let service: BeamAnalysis["service"] = null;
  if (input.serviceLoads) {
    const all = [...present];
    const live = beam.deflectionLimits.liveCategories.filter((c) => present.has(c));
    const serviceCombination = (id: string, name: string, categories: string[]): Combination => ({
      id,
      name,
      factors: Object.fromEntries(categories.map((c) => [c, 1])),
      duration: durationOf(categories),
      categories,
    });
    const symbols = (cs: string[]) => cs.map((c) => info.get(c)!.symbol).join(" + ");
    service = {
      total: all.length > 0 ? expand(serviceCombination("SLS-total", `Service, all loads: ${symbols(all)}`, all), "deflection") : [],
      live: live.length > 0 ? expand(serviceCombination("SLS-live", `Service, ${symbols(live)} alone`, live), "deflection") : [],
      liveCategories: live,
    };
  }

  return {
    length,
    spans: model.spans,
    supports: model.supports,
    ends: model.ends,
    regions,
    selfWeight,
    flexuralRigidity: EI,
    results,
    service,
    patterned,
  };
}

interface LoadCase {
  loads: LoadSet;
  reactions: Reaction[];
  actions: MemberActions;
  curve: DeflectionCurve;
  /** The curve's pieces in one array, 11 numbers a piece (θ then v), for summing combinations piece by piece. */
  flatCurve?: Float64Array;
  /** The actions' pieces in one array, 7 numbers a piece (V then M). */
  flatActions?: Float64Array;
}

function flatActionsOf(c: LoadCase): Float64Array {
  if (c.flatActions) return c.flatActions;
  const pieces = c.actions.pieces;
  const flat = new Float64Array(7 * pieces.length);
  pieces.forEach((p, k) => {
    flat.set(p.v, 7 * k);
    flat.set(p.m, 7 * k + 3);
  });
  return (c.flatActions = flat);
}

function flatCurveOf(c: LoadCase): Float64Array {
  if (c.flatCurve) return c.flatCurve;
  const pieces = c.curve.pieces;
  const flat = new Float64Array(11 * pieces.length);
  pieces.forEach((p, k) => {
    for (let i = 0; i < 5; i++) flat[11 * k + i] = p.theta[i]!;
    for (let i = 0; i < 6; i++) flat[11 * k + 5 + i] = p.v[i]!;
  });
  return (c.flatCurve = flat);
}
type Term = { c: LoadCase; f: number };
/** What every combination of one member is superposed on: its breaks and supports. */
interface Superposition {
  length: number;
  grid: number[];
  supports: Support[];
}

/** Σ f·actions of the load cases, piece by piece (as `combineActions`, without its list of terms). */
function combinedActions(terms: Term[], on: Superposition): MemberActions {
  const { grid } = on;
  const pieces: MemberActions["pieces"] = [];
  for (let k = 0; k < grid.length - 1; k++) {
    let v0 = 0, v1 = 0, v2 = 0, m0 = 0, m1 = 0, m2 = 0, m3 = 0;
    for (let t = 0; t < terms.length; t++) {
      const { c, f } = terms[t]!;
      const p = flatActionsOf(c);
      const at = 7 * k;
      v0 += f * p[at]!;
      v1 += f * p[at + 1]!;
      v2 += f * p[at + 2]!;
      m0 += f * p[at + 3]!;
      m1 += f * p[at + 4]!;
      m2 += f * p[at + 5]!;
      m3 += f * p[at + 6]!;
    }
    pieces.push({ x0: grid[k]!, x1: grid[k + 1]!, v: [v0, v1, v2], m: [m0, m1, m2, m3] });
  }
  return { length: on.length, pieces, breaks: grid };
}

/** Piece k of Σ f·curve into out (θ in 0..4, v in 5..10): the curves' constants are linear in the loads too. */
function combinedCurvePiece(terms: Term[], k: number, out: Float64Array): void {
  out.fill(0);
  for (let t = 0; t < terms.length; t++) {
    const { c, f } = terms[t]!;
    const flat = flatCurveOf(c);
    const at = 11 * k;
    for (let i = 0; i < 11; i++) out[i]! += f * flat[at + i]!;
  }
}

function combinedCurve(terms: Term[], on: Superposition): DeflectionCurve {
  const { grid } = on;
  const pieces: DeflectionCurve["pieces"] = [];
  const c = new Float64Array(11);
  for (let k = 0; k < grid.length - 1; k++) {
    combinedCurvePiece(terms, k, c);
    pieces.push({ x0: grid[k]!, x1: grid[k + 1]!, theta: [c[0]!, c[1]!, c[2]!, c[3]!, c[4]!], v: [c[5]!, c[6]!, c[7]!, c[8]!, c[9]!, c[10]!] });
  }
  return { pieces };
}

/**
 * One combination (or pattern) as the sum of its load cases: the reactions at once, the actions, curve
 * and loads when first read (a service case is read for its curve only, a strength case for its actions).
 */
class Superposed implements CombinationActions {
  readonly reactions: Reaction[];
  private made: { actions?: MemberActions; curve?: DeflectionCurve; loads?: LoadSet } = {};
  constructor(
    readonly combination: Combination,
    private readonly terms: Term[],
    private readonly on: Superposition,
  ) {
    this.reactions = superpose(terms, on.supports, false).reactions;
  }
  get actions(): MemberActions {
    return (this.made.actions ??= combinedActions(this.terms, this.on));
  }
  get curve(): DeflectionCurve {
    return (this.made.curve ??= combinedCurve(this.terms, this.on));
  }
  get loads(): LoadSet {
    return (this.made.loads ??= superpose(this.terms, this.on.supports).loads);
  }
  curvePiece(k: number, out: Float64Array): void {
    combinedCurvePiece(this.terms, k, out);
  }
}

/** "spans 1 and 3", "span 2 and span 3 (right overhang)". */
function placesText(labels: string[]): string {
  const plain = labels.every((l) => /^span \d+$/.test(l));
  const items = plain && labels.length > 1 ? labels.map((l) => l.slice(5)) : labels;
  const list = items.length > 1 ? `${items.slice(0, -1).join(", ")} and ${items[items.length - 1]}` : items[0]!;
  return plain && labels.length > 1 ? `spans ${list}` : list;
}

/** The job's loads by category as core load sets, self-weight with dead load. */
function loadsByCategory(beam: Beam, selfWeight: RigidityStep[], length: number): Map<string, LoadSet> {
  const out = new Map<string, LoadSet>();
  const of = (category: string) => {
    let set = out.get(category);
    if (!set) out.set(category, (set = emptyLoads()));
    return set;
  };
  for (const w of selfWeight) if (w.value !== 0) of("dead").lines.push({ x0: w.x0, x1: w.x1, w0: w.value, w1: w.value });
  // Positions are accepted up to a relative 1e-9 past the end (a unit conversion's rounding): they act at the end.
  const on = (x: number) => Math.min(x, length);
  for (const l of beam.loads) {
    const set = of(l.category);
    if (l.type === "point") set.points.push({ x: on(l.at), P: l.P });
    else if (l.type === "moment") set.moments.push({ x: on(l.at), M: l.M });
    else {
      const [w0, w1] = l.type === "uniform" ? [l.w, l.w] : [l.wStart, l.wEnd];
      set.lines.push({ x0: on(l.from ?? 0), x1: on(l.to ?? length), w0, w1 });
    }
  }
  return out;
}

/** The part of a load set on one region; a point or couple on a boundary belongs to the region on its right. */
function clip(loads: LoadSet, region: LoadRegion, length: number): LoadSet {
  const inside = (x: number) => x >= region.x0 && (x < region.x1 || (region.x1 === length && x <= length));
  return {
    points: loads.points.filter((p) => inside(p.x)),
    moments: loads.moments.filter((m) => inside(m.x)),
    lines: loads.lines.flatMap((w) => {
      const a = Math.max(w.x0, region.x0);
      const b = Math.min(w.x1, region.x1);
      if (!(b > a)) return [];
      const at = (x: number) => w.w0 + ((w.w1 - w.w0) * (x - w.x0)) / (w.x1 - w.x0);
      return [{ x0: a, x1: b, w0: at(a), w1: at(b) }];
    }),
  };
}

const hasLoads = (l: LoadSet) => l.points.some((p) => p.P !== 0) || l.moments.some((m) => m.M !== 0) || l.lines.some((w) => w.w0 !== 0 || w.w1 !== 0);

/** Σ f·(loads, reactions) of load cases on the same supports. */
function superpose(terms: { c: { loads: LoadSet; reactions: Reaction[] }; f: number }[], supports: Support[], withLoads = true): { loads: LoadSet; reactions: Reaction[] } {
  const loads = emptyLoads();
  const reactions: Reaction[] = supports.map((s) => ({ x: s.x, R: 0, M: 0 }));
  for (const { c, f } of terms) {
    if (withLoads) for (const p of c.loads.points) loads.points.push({ x: p.x, P: f * p.P });
    if (withLoads) for (const m of c.loads.moments) loads.moments.push({ x: m.x, M: f * m.M });
    if (withLoads) for (const w of c.loads.lines) loads.lines.push({ x0: w.x0, x1: w.x1, w0: f * w.w0, w1: f * w.w1 });
    c.reactions.forEach((r, i) => {
      reactions[i]!.R += f * r.R;
      reactions[i]!.M += f * r.M;
    });
  }
  return { loads, reactions };
}

/** Reactions of a member on two supports that stop vertical movement, by statics. */
export function simpleSpanReactions(loads: LoadSet, xa: number, xb: number): Reaction[] {
  const l = xb - xa;
  let total = 0;
  let momentAboutB = 0; // Σ F·(xb − x) of the loads, less applied clockwise moments
  for (const p of loads.points) {
    total += p.P;
    momentAboutB += p.P * (xb - p.x);
  }
  for (const w of loads.lines) {
    const len = w.x1 - w.x0;
    const force = (len * (w.w0 + w.w1)) / 2;
    const firstMoment = (len * (w.w0 * (2 * w.x0 + w.x1) + w.w1 * (w.x0 + 2 * w.x1))) / 6;
    total += force;
    momentAboutB += force * xb - firstMoment;
  }
  for (const m of loads.moments) momentAboutB -= m.M;
  const ra = momentAboutB / l;
  return [
    { x: xa, R: ra, M: 0 },
    { x: xb, R: total - ra, M: 0 },
  ];
}

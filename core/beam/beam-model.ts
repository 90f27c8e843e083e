/**
 * The member as a line of spans: the position of every span end, what holds each end, and the
 * regions a live load is patterned over (the spans between supports and the overhangs beyond the
 * end supports). Units: mm.
 */
export const supportConditions = ["pinned", "roller", "fixed", "free"] as const;
export type SupportCondition = (typeof supportConditions)[number];

export interface Support {
  x: number;
  type: Exclude<SupportCondition, "free">;
}

export interface LoadRegion {
  x0: number;
  x1: number;
  /** A span between two supports, or an overhang (a cantilever) beyond the last support on one side. */
  kind: "span" | "overhang";
  /** The job's span numbers (1-based) this region covers. */
  spans: number[];
  /** "span 2", "spans 2–3", "span 4 (right overhang)", "span 1 (cantilever)". */
  label: string;
}

export interface BeamModel {
  length: number;
  spans: number[];
  /** Positions of the span ends, 0 … length. */
  nodes: number[];
  /** Condition at each span end. */
  ends: SupportCondition[];
  supports: Support[];
  regions: LoadRegion[];
}

/** A simply supported member when the job names no supports: pinned at the left end, rollers at every other span end. */
export function defaultEnds(spanCount: number): SupportCondition[] {
  return Array.from({ length: spanCount + 1 }, (_, i) => (i === 0 ? "pinned" : "roller"));
}

/**
 * Why the supports cannot hold the member against transverse load, or null when they can. With no
 * internal hinges a straight member is stable when one support is fixed or two stop vertical movement.
 */
export function instability(ends: readonly SupportCondition[]): string | null {
  const vertical = ends.filter((e) => e !== "free").length;
  if (vertical === 0) return "has no supports: every end is free, so the member would fall away";
  if (vertical === 1 && !ends.includes("fixed")) {
    return "is a mechanism: one pinned or roller support lets the member rotate about it; add a second support or make one fixed";
  }
  return null;
}

export function beamModelOf(spans: readonly number[], ends: readonly SupportCondition[] | undefined): BeamModel {
  const conditions = ends ?? defaultEnds(spans.length);
  const nodes = [0];
  for (const l of spans) nodes.push(nodes[nodes.length - 1]! + l);
  const length = nodes[nodes.length - 1]!;
  const supports: Support[] = [];
  conditions.forEach((type, i) => {
    if (type !== "free") supports.push({ x: nodes[i]!, type });
  });
  return { length, spans: [...spans], nodes, ends: [...conditions], supports, regions: regionsOf(nodes, conditions) };
}

function regionsOf(nodes: number[], ends: readonly SupportCondition[]): LoadRegion[] {
  const held = ends.flatMap((e, i) => (e === "free" ? [] : [i]));
  const cuts = [...new Set([0, ...held, nodes.length - 1])].sort((a, b) => a - b);
  const regions: LoadRegion[] = [];
  for (let k = 0; k < cuts.length - 1; k++) {
    const i = cuts[k]!;
    const j = cuts[k + 1]!;
    const spans = Array.from({ length: j - i }, (_, n) => i + n + 1);
    const overhang = ends[i] === "free" || ends[j] === "free";
    const name = spans.length === 1 ? `span ${spans[0]}` : `spans ${spans[0]}–${spans[spans.length - 1]}`;
    const which = held.length === 1 ? "cantilever" : ends[i] === "free" ? "left overhang" : "right overhang";
    regions.push({ x0: nodes[i]!, x1: nodes[j]!, kind: overhang ? "overhang" : "span", spans, label: overhang ? `${name} (${which})` : name });
  }
  return regions;
}

import { GRAVITY } from "../units/quantity.js";
import type { JobDocument } from "../schema/job.js";
import type { Combination } from "../schema/result.js";
import type { SectionModel } from "../section/section-model.js";
import {
  deflectionCurve,
  emptyLoads,
  memberActions,
  type DeflectionCurve,
  type LoadSet,
  type MemberActions,
  type Reaction,
} from "./member-actions.js";

export interface Support {
  x: number;
  type: "pinned" | "roller" | "fixed";
}

export interface CombinationActions {
  combination: Combination;
  loads: LoadSet;
  reactions: Reaction[];
  actions: MemberActions;
  curve: DeflectionCurve;
}

export interface BeamAnalysis {
  length: number;
  spans: number[];
  supports: Support[];
  /** Self-weight as a dead line load, N/mm (0 when switched off). */
  selfWeight: number;
  flexuralRigidity: number;
  results: CombinationActions[];
}

/** Self-weight of the parts, N/mm: Σ ρ·g·A with ρ in kg/m³ and A in mm². */
export function selfWeightOf(section: SectionModel): number {
  return section.parts.reduce((s, p) => s + p.material.density * GRAVITY * p.area * 1e-9, 0);
}

/** Loads of the job scaled by a combination's factors, self-weight included as dead load. */
export function factoredLoads(job: JobDocument, combination: Combination, selfWeight: number, length: number): LoadSet {
  const set = emptyLoads();
  const factor = (category: string) => combination.factors[category] ?? 0;
  if (selfWeight > 0 && factor("dead") !== 0) set.lines.push({ x0: 0, x1: length, w0: factor("dead") * selfWeight, w1: factor("dead") * selfWeight });
  for (const load of job.beam.loads) {
    const f = factor(load.category);
    if (f === 0) continue;
    if (load.type === "point") set.points.push({ x: load.at, P: f * load.P });
    else set.lines.push({ x0: load.from ?? 0, x1: load.to ?? length, w0: f * load.w, w1: f * load.w });
  }
  return set;
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

export function analyseBeam(job: JobDocument, section: SectionModel, combinations: Combination[]): BeamAnalysis {
  const spans = job.beam.spans;
  const length = spans.reduce((s, l) => s + l, 0);
  const supports: Support[] = [
    { x: 0, type: "pinned" },
    { x: length, type: "roller" },
  ];
  const selfWeight = job.beam.selfWeight ? selfWeightOf(section) : 0;
  const flexuralRigidity = section.referenceModulus * section.secondMoment;
  const results = combinations.map((combination) => {
    const loads = factoredLoads(job, combination, selfWeight, length);
    const reactions = simpleSpanReactions(loads, 0, length);
    const actions = memberActions(length, loads, reactions);
    const curve = deflectionCurve(actions, flexuralRigidity, supports.map((s) => ({ x: s.x, fixed: s.type === "fixed" })));
    return { combination, loads, reactions, actions, curve };
  });
  return { length, spans, supports, selfWeight, flexuralRigidity, results };
}

import type { BeamAnalysis } from "../beam/analyse-beam.js";
import { momentAt, shearAt } from "../beam/member-actions.js";
import type { Station } from "../beam/stations.js";
import type { Connector } from "../connector/registry.js";
import { columnEnds, type BucklingAxis, type Compression } from "../schema/column.js";
import type { JobDocument } from "../schema/job.js";
import type { ColumnResult, Combination, MemberCheck, WorkingLine } from "../schema/result.js";
import type { JointPlane } from "../section/joints.js";
import type { SectionModel } from "../section/section-model.js";
import { allowedSpacings } from "../spacing/allowed-spacings.js";
import { spacingPractice } from "../spacing/spacing-defaults.js";

export type Axis = "x" | "y";

/** How one axis is held: K_e, the longest unbraced length and l_e = K_e·l_u. mm. */
export interface ColumnAxis {
  axis: Axis;
  K: number;
  /** How K was chosen, in words. */
  basis: string;
  unbraced: number;
  effectiveLength: number;
}

/** The axial and lateral actions of one combination (or live-load pattern), core units. */
export interface ColumnActions {
  combination: Combination;
  /** Axial compression, N (factored as the combination says). */
  axial: number;
  /** Largest |M| of the lateral loads and the eccentric axial loads together, N·mm, about the section's x axis, and where. */
  moment: number;
  momentAt: number;
  /** Largest |V| of the lateral loads, N. */
  shear: number;
}

/** A joint of the column and what a rule needs of its connectors. */
export interface ColumnJoint {
  id: string;
  connector: Connector;
  rows: number;
  lines: JointPlane["lines"];
  /** The joint's lateral-load schedule before the column's rules: largest spacing and resistance per row per combination, N. */
  spacing: number | null;
  resistance: number[];
  /** K_u and K_ser per shear plane where the connector gives them, N/mm. */
  slip: { serviceability: number; ultimate: number } | null;
}

/** Everything a built-up column rule reads: the prepared job, its section and its actions per combination. */
export interface ColumnJob {
  job: JobDocument;
  compression: Compression;
  section: SectionModel;
  height: number;
  axes: Record<Axis, ColumnAxis>;
  actions: ColumnActions[];
  joints: ColumnJoint[];
}

/** Limits a rule sets on a joint's schedule (they tighten the connector's own), mm. */
export interface ColumnSpacingLimits {
  minSpacing?: number;
  maxSpacing?: number;
  endDistance?: number;
  edgeDistance?: number;
  rowSpacing?: number;
  /** The edge distance and row spacing are the rule's own for this joint, in place of the connector's. */
  acrossReplaces?: boolean;
  sources: string[];
}

/** What a rule asks of one joint's connectors. */
export interface ColumnJointDemand {
  joint: string;
  limits: ColumnSpacingLimits | null;
  /** Connector rows across the face the rule requires, and why; null where it sets none. */
  rowsRequired: { rows: number; reason: string } | null;
  /** The shear the column's imperfection puts on the connectors, per combination (same order as the actions), as a flow on each contact line, N/mm. */
  bucklingFlow: number[] | null;
  /** The buckling shear itself per combination, N. */
  bucklingShear: number[] | null;
  /** Detailing the joint's connectors break under the rule (they fail the joint's schedule). */
  problems?: string[];
  /** Whether the lateral load's shear flow adds to the buckling shear at this joint (both about one axis). */
  addsToLateral: boolean;
  notes: string[];
}

/** The column part of a result, before the joints' final schedules are known. */
export type ColumnDesign = Omit<ColumnResult, "joints"> & { joints: ColumnJointDemand[] };

/**
 * A built-up column rule. Timber: NDS-2018 §15.3 (nds-built-up.ts) and EN 1995-1-1 Annex C
 * (ec5-mechanically-jointed.ts); a steel rule (AISC 360-16 §E6, EN 1993-1-1 §6.4) plugs in the same way.
 */
export interface ColumnRule {
  id: Compression["rule"];
  title: string;
  standard: string;
  /**
   * The rule's stiffness rests on the joints' spacing (the γ-method): the pipeline then tries greatest
   * spacings from the joints' largest down and keeps the first under which the column's checks pass, as a
   * cap on the schedule, so the spacing built never exceeds the one in γ.
   */
  spacingInStiffness?: boolean;
  /** Whether "auto" picks this rule for the job (materials, connectors, basis). */
  suits: (c: ColumnJob) => boolean;
  design: (c: ColumnJob) => ColumnDesign;
}

/** A rule's design with nothing worked out yet: what every rule fills, or returns as it is with the reason it does not apply. */
export function designStart(rule: Pick<ColumnRule, "id" | "title" | "standard">, c: ColumnJob, conditions: ColumnDesign["conditions"], notes: string[] = []): Omit<ColumnDesign, "applies" | "reason"> {
  return { rule: rule.id, title: rule.title, standard: rule.standard, conditions, height: c.height, axes: [], combinations: [], governing: "", checks: [], joints: [], steps: [], notes };
}

/**
 * The closest spacing a joint's schedule can build, mm: the connectors' least pitch (`leastPitch`, by the rule's
 * standard) and the job's least spacing, rounded up to an allowed spacing of the job's module or preferred list.
 */
export function closestBuildable(c: ColumnJob, aMax: number, leastPitch: (connector: Connector) => number): number {
  const least = Math.max(c.job.spacing.minimum ?? 0, ...c.joints.map((j) => leastPitch(j.connector)));
  const module = c.job.spacing.preferred ? null : (c.job.spacing.module ?? spacingPractice(c.job).module);
  const allowed = allowedSpacings({ module, preferred: c.job.spacing.preferred ?? null, min: least, max: 2 * Math.max(least, aMax) + (module ?? 0) });
  return allowed[0] ?? Math.max(least, aMax);
}

/** K_e and the longest unbraced length about one axis: with brace points every segment is taken at K ≥ 1 [CP]. */
export function columnAxis(axis: Axis, spec: BucklingAxis, height: number): ColumnAxis {
  const ends = spec.ends ?? "pinned-pinned";
  const K0 = spec.K ?? columnEnds[ends];
  const points = [0, ...spec.bracedAt.filter((x) => x > 0 && x < height).sort((a, b) => a - b), height];
  let unbraced = 0;
  for (let i = 1; i < points.length; i++) unbraced = Math.max(unbraced, points[i]! - points[i - 1]!);
  const braced = points.length > 2;
  const K = braced ? Math.max(1, K0) : K0;
  const basis = `${spec.K !== undefined ? "K_e as given" : `K_e for ${ends} ends (NDS-2018 Table G1, recommended design value [M])`}${braced ? `; braced at ${points.length - 2} point(s), each segment taken at K_e ≥ 1 [CP]` : ""}`;
  return { axis, K, basis, unbraced, effectiveLength: K * unbraced };
}

/** Axial force and lateral actions of every combination; the eccentric loads' moment P·e is largest at the top and nil at the base. */
export function columnActions(compression: Compression, beam: BeamAnalysis, stations: Station[], selfWeight: number, combinations: Combination[]): ColumnActions[] {
  const L = beam.length;
  // The analysis keeps only the categories its own loads have; the set's combination also holds the axial ones (duration, C_D, λ).
  const whole = new Map(combinations.map((c) => [c.id, c]));
  return beam.results.map((r) => {
    const set = whole.get(r.combination.base ?? r.combination.id);
    const combination = set ? { ...r.combination, categories: set.categories, duration: set.duration, ...(set.timeEffect ? { timeEffect: r.combination.timeEffect && r.combination.timeEffect.value < set.timeEffect.value ? r.combination.timeEffect : set.timeEffect } : {}) } : r.combination;
    const f = (c: string) => r.combination.factors[c] ?? 0;
    const axial = compression.loads.reduce((s, l) => s + f(l.category) * l.P, 0) + f("dead") * selfWeight;
    const eccentric = compression.loads.reduce((s, l) => s + f(l.category) * l.P * (l.eccentricity ?? 0), 0);
    let moment = 0;
    let at = 0;
    let shear = 0;
    for (const s of stations) {
      const m = Math.abs(momentAt(r.actions, s.x, s.side) + (eccentric * s.x) / L);
      if (m > moment) [moment, at] = [m, s.x];
      shear = Math.max(shear, Math.abs(shearAt(r.actions, s.x, s.side)));
    }
    return { combination, axial, moment, momentAt: at, shear };
  });
}

/** The laminations of a built-up column: rectangles stacked across one axis, face to face. */
export interface Laminations {
  /** The parts in stacking order. */
  parts: SectionModel["parts"];
  /** The axis whose buckling crosses the laminations' joints (y when they stand side by side). */
  jointedAxis: Axis;
  /** Each lamination's thickness across the stack, and its depth along the contact faces, mm. */
  thicknesses: number[];
  depths: number[];
  /** Whole thickness of the stack, mm. */
  total: number;
}

/** The section as laminations, or why it is not one. */
export function laminationsOf(section: SectionModel): Laminations | { reason: string } {
  const parts = section.parts;
  if (parts.some((p) => p.rects.length !== 1)) return { reason: "a part is not a plain rectangle" };
  const r = (p: (typeof parts)[number]) => p.rects[0]!;
  for (const axis of ["y", "x"] as const) {
    // Side by side (jointed axis y): stacked along x; one above another (jointed axis x): stacked along y.
    const along = axis === "y" ? (p: typeof parts[number]) => [r(p).x0, r(p).x1] : (p: typeof parts[number]) => [r(p).y0, r(p).y1];
    const sorted = [...parts].sort((a, b) => along(a)[0]! - along(b)[0]!);
    const touching = sorted.every((p, i) => i === 0 || Math.abs(along(p)[0]! - along(sorted[i - 1]!)[1]!) <= 1e-6 * (1 + Math.abs(along(p)[0]!)));
    if (!touching) continue;
    const across = (p: typeof parts[number]) => (axis === "y" ? [r(p).y0, r(p).y1] : [r(p).x0, r(p).x1]);
    const thicknesses = sorted.map((p) => along(p)[1]! - along(p)[0]!);
    const depths = sorted.map((p) => across(p)[1]! - across(p)[0]!);
    return { parts: sorted, jointedAxis: axis, thicknesses, depths, total: thicknesses.reduce((s, t) => s + t, 0) };
  }
  return { reason: "the parts are not laminations stacked face to face across one axis" };
}

/** Whether every lamination has the same faces: same depth and the same edges across the stack. */
export function sameFaces(l: Laminations): boolean {
  const edge = (p: Laminations["parts"][number]) => (l.jointedAxis === "y" ? [p.rects[0]!.y0, p.rects[0]!.y1] : [p.rects[0]!.x0, p.rects[0]!.x1]);
  const [a0, a1] = edge(l.parts[0]!);
  return l.parts.every((p) => Math.abs(edge(p)[0]! - a0!) <= 1e-6 * (1 + Math.abs(a0!)) && Math.abs(edge(p)[1]! - a1!) <= 1e-6 * (1 + Math.abs(a1!)));
}

/** A column check in the shape of the member checks. */
export function columnCheck(id: string, title: string, demand: number, capacity: number, quantity: MemberCheck["quantity"], combination: string, at: number | null, reference: string): MemberCheck {
  // Finite however small the capacity: a result holds no infinities (core/finite-verdict.ts); still a failure.
  const ratio = capacity > 0 ? demand / capacity : demand > 0 ? 1e12 : 0;
  const utilisation = Number.isFinite(ratio) ? Math.min(ratio, 1e12) : 1e12;
  if (!Number.isFinite(demand)) demand = 1e12 * Math.max(capacity, 1);
  return { id, title, demand, capacity, utilisation, passes: utilisation <= 1 + 1e-9, combination, at, reference, quantity } as MemberCheck;
}

export const step = (symbol: string, description: string, value: number, quantity: WorkingLine["quantity"], reference?: string): WorkingLine =>
  ({ symbol, description, value, quantity, ...(reference ? { reference } : {}) }) as WorkingLine;

/** An interaction ratio kept finite (a result holds no infinities): a huge one still fails. */
export const finiteInteraction = (x: number | null) => ({ interaction: x === null ? null : Number.isFinite(x) ? Math.min(x, 1e12) : 1e12 });

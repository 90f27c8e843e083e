import type { BeamAnalysis, SectionStretch } from "../beam/analyse-beam.js";
import type { MemberActions, Piece } from "../beam/member-actions.js";
import type { Station } from "../beam/stations.js";
import type { JobDocument } from "../schema/job.js";
import type { BondLineResult, Schedule, WeldResult } from "../schema/result.js";
import { findContacts } from "../section/contacts.js";
import { fastenedJointsOf, type FastenedJoint } from "../section/fastened-joints.js";
import type { UncoveredContact } from "../section/joints.js";
import type { SectionModel } from "../section/section-model.js";

/** A joint of the member and where it runs: stretch by stretch its Q/I, when the section changes along the member. */
export interface MemberJoint extends FastenedJoint {
  /** The section of the first stretch the joint is in (its parts and contact lines). */
  section: SectionModel;
  /** Where the joint runs, mm; null for the whole member. */
  extent: { from: number; to: number } | null;
  stretches: { from: number; to: number; firstMoment: number; flowFactor: number; stressFactor: number }[];
}

/**
 * The joints of a member of one section, or, where parts start and stop along it, the joints of
 * every stretch merged by the parts they hold. A joint that appears over separate runs of the member
 * is split into one joint per run, named by where it runs.
 */
export function memberJoints(job: JobDocument, stretches: (SectionStretch & { parts: string[] })[], length: number): MemberJoint[] {
  return memberJointsOf(job, stretches, length).joints;
}

/** The member's joints, and the contact lines no joint fastens as it must, stretch by stretch (where along the member: from, to). */
export function memberJointsOf(
  job: JobDocument,
  stretches: (SectionStretch & { parts: string[] })[],
  length: number,
): { joints: MemberJoint[]; uncovered: (UncoveredContact & { from: number; to: number })[] } {
  const found = new Map<string, MemberJoint[]>();
  const uncovered: (UncoveredContact & { from: number; to: number })[] = [];
  for (const s of stretches) {
    const fastened = fastenedJointsOf(job, s.section, findContacts(s.section));
    uncovered.push(...fastened.uncovered.map((u) => ({ ...u, from: s.x0, to: s.x1 })));
    for (const fj of fastened.joints) {
      const I = s.section.secondMoment;
      const piece = { from: s.x0, to: s.x1, firstMoment: fj.joint.firstMoment, flowFactor: fj.joint.firstMoment / I, stressFactor: fj.joint.firstMoment / (I * fj.joint.contactWidth) };
      const runs = found.get(fj.joint.id) ?? [];
      const last = runs[runs.length - 1];
      if (last && Math.abs(last.stretches[last.stretches.length - 1]!.to - s.x0) <= 1e-9 * length) last.stretches.push(piece);
      else runs.push({ ...fj, section: s.section, extent: null, stretches: [piece] });
      found.set(fj.joint.id, runs);
    }
  }
  const out: MemberJoint[] = [];
  for (const runs of found.values()) {
    for (const run of runs) {
      const from = run.stretches[0]!.from;
      const to = run.stretches[run.stretches.length - 1]!.to;
      const whole = from <= 1e-9 * length && to >= length * (1 - 1e-9);
      const id = runs.length > 1 ? `${run.joint.id} (${Number((from / 1000).toPrecision(4))}–${Number((to / 1000).toPrecision(4))} m)` : run.joint.id;
      out.push({ ...run, joint: { ...run.joint, id }, extent: whole ? null : { from, to } });
    }
  }
  return { joints: out, uncovered };
}

/** The flow a joint's connectors answer to, per combination: V(x)·Q/I(x) over the joint's run, in the run's own coordinate from 0. */
export function jointDemand(beam: BeamAnalysis, joint: MemberJoint): MemberActions[] {
  const a = joint.extent?.from ?? 0;
  const b = joint.extent?.to ?? beam.length;
  const factorAt = (x: number) => joint.stretches.find((s) => x >= s.from && x <= s.to)?.flowFactor ?? 0;
  return beam.results.map(({ actions }) => {
    const pieces: Piece[] = actions.pieces
      .filter((p) => p.x0 >= a - 1e-9 && p.x1 <= b + 1e-9)
      .map((p) => {
        const k = factorAt((p.x0 + p.x1) / 2);
        return { x0: p.x0 - a, x1: p.x1 - a, v: [p.v[0] * k, p.v[1] * k, p.v[2] * k], m: [0, 0, 0, 0] };
      });
    return { length: b - a, pieces, breaks: [...new Set([0, ...pieces.map((p) => p.x1)])] };
  });
}

/** The beam and stations seen from a joint that runs over [a, b] only: coordinates from a, and the stations inside. */
export function localView(beam: BeamAnalysis, stations: Station[], extent: { from: number; to: number }): { beam: BeamAnalysis; stations: Station[] } {
  const { from: a, to: b } = extent;
  return {
    beam: { ...beam, length: b - a, spans: [b - a] },
    stations: stations.map((s) => ({ x: Math.min(Math.max(s.x - a, 0), b - a), side: s.side })),
  };
}

/** A joint's results moved back from its run's coordinates to the member's, with nothing shown outside the run. */
export function globalise<T extends Schedule | WeldResult | BondLineResult>(result: T, stations: Station[], extent: { from: number; to: number }): T {
  const a = extent.from;
  const outside = (i: number) => stations[i]!.x < extent.from - 1e-9 || stations[i]!.x > extent.to + 1e-9;
  const moved = { ...result, at: "at" in result ? result.at + a : undefined } as T & Record<string, unknown>;
  if ("zones" in result) moved.zones = (result.zones as { from: number; to: number }[]).map((z) => ({ ...z, from: z.from + a, to: z.to + a }));
  if ("positions" in result) moved.positions = result.positions.map((x) => x + a);
  if ("verification" in result) moved.verification = { ...result.verification, at: result.verification.at + a };
  if ("perCombination" in result) moved.perCombination = result.perCombination.map((c) => ({ ...c, at: c.at + a }));
  if ("infeasible" in result && result.infeasible) moved.infeasible = { ...result.infeasible, where: result.infeasible.where.map((w) => ({ from: w.from + a, to: w.to + a })) };
  if ("shearFlow" in result) moved.shearFlow = result.shearFlow.map((v, i) => (outside(i) ? 0 : v));
  if ("requiredSpacing" in result) moved.requiredSpacing = result.requiredSpacing.map((v, i) => (outside(i) ? null : v));
  if ("stress" in result) moved.stress = result.stress.map((v, i) => (outside(i) ? 0 : v));
  if (!("at" in result)) delete moved.at;
  return moved;
}

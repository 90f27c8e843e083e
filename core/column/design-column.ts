import type { BeamAnalysis } from "../beam/analyse-beam.js";
import { combineActions, memberActions, type MemberActions } from "../beam/member-actions.js";
import type { Station } from "../beam/stations.js";
import { demandActionsOf, type JointInput } from "../fastening/discrete-schedule.js";
import type { JobDocument } from "../schema/job.js";
import type { ColumnResult, Combination, Schedule } from "../schema/result.js";
import type { SectionModel } from "../section/section-model.js";
import { allowedSpacings } from "../spacing/allowed-spacings.js";
import { inJobUnits } from "../units/format.js";
import { columnActions, columnAxis, type ColumnJob, type ColumnJoint, type ColumnRule } from "./column-rules.js";
import { ec5MechanicallyJointed } from "./ec5-mechanically-jointed.js";
import { ec5Spaced } from "./ec5-spaced.js";
import { ndsBuiltUp } from "./nds-built-up.js";
import { aiscE6 } from "./steel-rules.js";
import { en1993Closely } from "./steel-rules-en1993.js";

/** The built-up column rules, in the order "auto" tries them. A steel rule (§E6, §6.4) is added here. */
export const columnRules: ColumnRule[] = [ndsBuiltUp, ec5Spaced, ec5MechanicallyJointed, aiscE6, en1993Closely];

interface PreparedJoint {
  joint: { id: string; lines: ColumnJoint["lines"] };
  input: JointInput;
}
type Run = { schedule?: Schedule };
type Override = Partial<Pick<JointInput, "extraDemand" | "columnLimits" | "flowFactor" | "demandActions">>;

/**
 * The member as a built-up column: the rule's checks, and each joint designed again with the rule's
 * limits and the buckling shear. `rerun` designs a joint with an override; `runs` holds the joints'
 * schedules and is updated in place.
 */
export function designColumn(p: {
  job: JobDocument;
  section: SectionModel;
  beam: BeamAnalysis;
  stations: Station[];
  axialSelfWeight: number;
  /** The combination set with the axial loads' categories. */
  combinations: Combination[];
  prepared: PreparedJoint[];
  runs: Map<string, Run>;
  rerun: (id: string, override: Override) => Run;
}): ColumnResult {
  const compression = p.job.compression!;
  const height = p.beam.length;
  const joints: ColumnJoint[] = p.prepared.flatMap(({ joint, input }) => {
    const s = p.runs.get(joint.id)?.schedule;
    if (!s) return [];
    return [{ id: joint.id, connector: input.connector, rows: input.fastening.rows, lines: joint.lines, spacing: s.zones.length > 0 ? Math.max(...s.zones.map((z) => z.spacing)) : null, resistance: s.resistance.map((r) => r.value), slip: s.resistance[0]?.slip ?? null }];
  });
  const c: ColumnJob = {
    job: p.job,
    compression,
    section: p.section,
    height,
    axes: { x: columnAxis("x", compression.x, height), y: columnAxis("y", compression.y, height) },
    actions: columnActions(compression, p.beam, p.stations, p.axialSelfWeight, p.combinations),
    joints,
  };
  const named = compression.rule === "auto" ? columnRules.find((r) => r.suits(c)) : columnRules.find((r) => r.id === compression.rule);
  if (!named) {
    const reason =
      compression.rule === "auto"
        ? "no built-up column rule here covers this section and its connectors: NDS-2018 §15.3 takes NDS nails or bolts, EN 1995-1-1 Annex C takes EN 1995-1-1 connectors with slip moduli."
        : `the rule "${compression.rule}" is not available in this version.`;
    return { rule: compression.rule, title: "Built-up column", standard: "", applies: false, reason, conditions: [], height, axes: [], combinations: [], governing: "", checks: [], joints: [], steps: [], notes: [] };
  }
  const design = named.spacingInStiffness ? designWithCap(named, c, p.runs) : named.design(c);
  const resultJoints: ColumnResult["joints"] = [];
  for (const demand of design.joints) {
    const prepared = p.prepared.find((x) => x.joint.id === demand.joint)!;
    const before = p.runs.get(demand.joint)!.schedule!;
    // A joint balanced about the neutral axis (Q = 0, flowFactor 0) takes no lateral flow, but it still carries the buckling
    // shear: its demand then stands as a force per length with flowFactor = lines (the side-by-side plies' form).
    const balanced = !!demand.bucklingFlow && demand.bucklingFlow.some((f) => f > 0) && !(prepared.input.flowFactor > 0);
    const share = prepared.input.joint.lines.length / Math.max(1, prepared.input.joint.crossed.length);
    const nil = memberActions(height, { points: [], lines: [], moments: [] }, []);
    const asFlow: Override = balanced ? { flowFactor: prepared.input.joint.lines.length / share, demandActions: p.beam.results.map(() => nil) } : {};
    const input = balanced ? { ...prepared.input, ...asFlow, flowFactor: prepared.input.joint.lines.length } : prepared.input;
    const extraDemand = demand.bucklingFlow ? bucklingDemand(input, before, demand.bucklingFlow, demand.addsToLateral, height) : undefined;
    // The rule's distances across the face stand for the connector's only where nothing passes across the plies
    // (no face load): a connector loaded across the grain keeps its own loaded-edge distances.
    // Rounding noise of equal plies' shares is not a load: over the whole column less than a millionth of one connector.
    const leastResistance = Math.min(...before.resistance.map((r) => r.value));
    const loadedAcross = before.shearFlow.some((q) => q * height > 1e-6 * leastResistance);
    const limits = demand.limits && loadedAcross && demand.limits.acrossReplaces ? { ...demand.limits, acrossReplaces: false } : demand.limits;
    const run = p.rerun(demand.joint, { ...asFlow, ...(limits ? { columnLimits: limits } : {}), ...(extraDemand ? { extraDemand } : {}) });
    let schedule = run.schedule!;
    const rowsProvided = schedule.rows;
    if (demand.rowsRequired && rowsProvided < demand.rowsRequired.rows) {
      schedule = { ...schedule, passes: false, detailingProblems: [...schedule.detailingProblems, `${rowsProvided} row(s) of connectors across the lamination, but ${demand.rowsRequired.reason}: set the fastening's rows to ${demand.rowsRequired.rows}`] };
    }
    if (demand.problems && demand.problems.length > 0) schedule = { ...schedule, passes: false, detailingProblems: [...schedule.detailingProblems, ...demand.problems] };
    p.runs.set(demand.joint, { ...run, schedule });
    resultJoints.push({
      joint: demand.joint,
      rowsRequired: demand.rowsRequired?.rows ?? null,
      rowsProvided,
      bucklingShear: demand.bucklingShear ? Math.max(...demand.bucklingShear) : null,
      bucklingFlow: demand.bucklingFlow ? Math.max(...demand.bucklingFlow) : null,
      governs: governing(schedule, demand.bucklingFlow !== null, p.job.beam.loads.length > 0, named.spacingInStiffness ? "taken in γ for the column's (EI)_ef" : `that ${named.standard} allows (prescriptive)`),
      notes: demand.notes,
      sources: demand.limits?.sources ?? [],
    });
  }
  return { ...design, joints: resultJoints };
}

/**
 * The buckling shear as more demand on a joint's rows, one entry per combination: a constant flow along
 * the column; where the lateral load shears the same joint, added to its shear either way round.
 */
function bucklingDemand(input: JointInput, s: Schedule, flows: number[], addsToLateral: boolean, height: number) {
  const lines = input.joint.lines.length;
  const lateral = demandActionsOf(input);
  return flows.flatMap((flow, i) => {
    if (!(flow > 0) || !(input.flowFactor > 0)) return [];
    const V = (flow * lines) / input.flowFactor;
    const constant = memberActions(height, { points: [{ x: 0, P: -V }, { x: height, P: V }], lines: [], moments: [] }, []);
    const resistance = s.resistance[i]!.value;
    const id = `${s.resistance[i]!.combination} buckling shear`;
    if (!addsToLateral) return [{ id, actions: constant, resistance }];
    const both = (sign: number): MemberActions => combineActions([{ actions: lateral[i]!, f: 1 }, { actions: constant, f: sign }], height, [...new Set([...lateral[i]!.breaks, ...constant.breaks])].sort((a, b) => a - b));
    return [{ id: `${id} + lateral`, actions: both(1), resistance }, { id: `${id} − lateral`, actions: both(-1), resistance }];
  });
}

/** What set a joint's spacing: the rule's greatest spacing everywhere, or the shear flow somewhere. */
function governing(s: Schedule, buckling: boolean, lateral: boolean, greatest: string): string {
  const allowed = allowedSpacings({ module: s.limits.module, preferred: s.limits.preferred, min: s.limits.minSpacing, max: s.limits.maxSpacing });
  const largest = allowed.length > 0 ? Math.max(...allowed) : s.limits.maxSpacing;
  const closer = s.zones.filter((z) => z.spacing < largest * (1 - 1e-9));
  if (closer.length === 0) return `the greatest spacing ${greatest} governs along the whole column`;
  const flow = buckling && lateral ? "the shear flow of the lateral load and the buckling shear" : buckling ? "the buckling shear" : "the shear flow of the lateral load";
  return `${flow} governs in ${closer.length} of ${s.zones.length} zone(s), closer than the greatest spacing ${greatest}`;
}

/**
 * A rule whose stiffness rests on the spacing: the greatest spacing tried from each joint's largest
 * (its lateral-load schedule) down the allowed spacings; the first under which every column check passes
 * is kept (the least where none does) and becomes a cap on the joint's schedule.
 */
function designWithCap(rule: ColumnRule, c: ColumnJob, runs: Map<string, Run>): ReturnType<ColumnRule["design"]> {
  const first = c.joints[0] ? runs.get(c.joints[0].id)?.schedule : undefined;
  if (!first || c.joints.some((j) => j.spacing === null)) return rule.design(c);
  const top = Math.max(...c.joints.map((j) => j.spacing!));
  const l = first.limits;
  const caps = allowedSpacings({ module: l.module, preferred: l.preferred, min: l.minSpacing, max: top }).filter((s) => s <= top * (1 + 1e-9)).sort((a, b) => b - a);
  if (caps.length === 0) return rule.design(c);
  const at = (cap: number) => rule.design({ ...c, joints: c.joints.map((j) => ({ ...j, spacing: Math.min(j.spacing!, cap) })) });
  let chosen = caps[caps.length - 1]!;
  let design = at(chosen);
  for (const cap of caps) {
    const d = at(cap);
    if (d.applies && d.checks.every((k) => k.passes)) {
      [chosen, design] = [cap, d];
      break;
    }
  }
  const source = `greatest spacing ${inJobUnits(chosen, "length", c.job.units)}: the spacing in γ of the column's (EI)_ef (EN 1995-1-1 Annex B, C.2.1 [M])`;
  return { ...design, joints: design.joints.map((j) => ({ ...j, limits: { ...(j.limits ?? { sources: [] }), maxSpacing: Math.min(j.limits?.maxSpacing ?? Infinity, chosen), sources: [...(j.limits?.sources ?? []), source] } })) };
}

import type { BeamAnalysis } from "../beam/analyse-beam.js";
import { maxAbsShear, shearAt, type MemberActions } from "../beam/member-actions.js";
import type { Station } from "../beam/stations.js";
import { governingLimits, type ConnectorContext, type ConnectorResistance, type DiscreteConnectorKind } from "../connector/connector-kind.js";
import type { Connector } from "../connector/registry.js";
import type { Fastening, JobDocument } from "../schema/job.js";
import type { Schedule } from "../schema/result.js";
import type { JointPlane } from "../section/joints.js";
import { checkSchedule } from "../spacing/check-schedule.js";
import { demandCurve, designSchedule } from "../spacing/design-schedule.js";
import { spacingPractice } from "../spacing/spacing-defaults.js";
import { inJobUnits } from "../units/format.js";
import { toCore } from "../units/quantity.js";

export interface JointInput {
  job: JobDocument;
  beam: BeamAnalysis;
  stations: Station[];
  joint: JointPlane;
  connector: Connector;
  fastening: Fastening;
  /** Per combination, one context per contact line. */
  contexts: ConnectorContext[][];
  /** Q/I, 1/mm. */
  flowFactor: number;
  /** Q/(I·t), 1/mm². */
  stressFactor: number;
  /**
   * Per combination, what the connectors must carry along the member in place of V (the force per
   * length passed across a ply interface); flowFactor then 1. Absent: the shear force V.
   */
  demandActions?: MemberActions[];
  /** A largest spacing set from outside the connector's rules (the s_max ≤ 4·s_min rule of slip-aware design), mm. */
  maxSpacingCap?: number;
  /** More demand the rows must meet besides the flow, as if further combinations (a part's force to develop at its end). */
  extraDemand?: { id: string; actions: MemberActions; resistance: number }[];
}

const VERIFICATION_METHOD =
  "each row: tributary length (halfway to its neighbours or to the member end) × the largest shear flow over that length ÷ (connectors per row × R)";

const leastOf = <T extends { value: number }>(values: T[]) => values.reduce((a, b) => (b.value < a.value ? b : a));

/** The actions the connectors of a joint answer to, per combination: V, or the demand given in its place. */
export function demandActionsOf(input: Pick<JointInput, "beam" | "demandActions">): MemberActions[] {
  return input.demandActions ?? input.beam.results.map((r) => r.actions);
}

/** Envelope of the flow on one contact line at the beam stations, N/mm. */
export function lineFlow(actions: MemberActions[], stations: Station[], flowFactor: number, lines: number): number[] {
  return stations.map((s) => (Math.max(...actions.map((a) => Math.abs(shearAt(a, s.x, s.side)))) * flowFactor) / lines);
}

/**
 * The schedule of a joint fastened by connectors placed one by one: designed (zones chosen for the
 * fewest connectors) or, in check mode, the provided schedule checked row by row.
 */
export function discreteSchedule(input: JointInput, kind: DiscreteConnectorKind<Connector>): { schedule: Schedule; warnings: string[]; mirrored: boolean } {
  const { job, beam, stations, joint, connector, fastening, contexts, flowFactor, stressFactor } = input;
  const rows = fastening.rows;
  const lineCount = joint.lines.length;
  const resistances: ConnectorResistance[] = contexts.map((lines) => leastOf(lines.map((c) => kind.resistance(connector, c))));
  const warnings = [...new Set(resistances.flatMap((r) => r.warnings ?? []))];
  const limits = governingLimits(contexts[0]!.map((c) => kind.detailing(connector, c)));
  const defaults = spacingPractice(job);
  const minSpacing = Math.max(limits.minSpacing, job.spacing.minimum ?? 0);
  const maxSpacing = Math.max(minSpacing, Math.min(limits.maxSpacing ?? defaults.maxSpacing, job.spacing.maximum ?? Infinity, input.maxSpacingCap ?? Infinity));
  const module = job.spacing.preferred ? null : job.spacing.module ?? defaults.module;
  const minZoneLength = job.spacing.minZoneLength ?? defaults.minZoneLength;
  const sources = [...limits.sources];
  if (input.maxSpacingCap !== undefined && input.maxSpacingCap < (limits.maxSpacing ?? Infinity)) sources.push(`maximum spacing ${inJobUnits(input.maxSpacingCap, "length", job.units)}: at most 4 × the smallest, for the effective spacing of EN 1995-1-1 Annex B`);
  if (limits.maxSpacing === null && job.spacing.maximum === undefined) sources.push(`maximum spacing ${inJobUnits(defaults.maxSpacing, "length", job.units)} (common practice; the connector sets none)`);
  const actions = demandActionsOf(input);
  const problem = {
    length: beam.length,
    combinations: [...beam.results.map((r, i) => ({ id: r.combination.id, actions: actions[i]!, resistance: resistances[i]!.value })), ...(input.extraDemand ?? [])],
    flowFactor,
    lines: lineCount,
    rows,
  };
  const label = kind.describe(connector);
  const len = (mm: number) => inJobUnits(mm, "length", job.units);
  const common = {
    joint: joint.id,
    connector: connector.id,
    connectorLabel: label,
    rows,
    lineCount,
    resistance: resistances.map((r, i) => ({
      combination: beam.results[i]!.combination.id,
      value: r.value,
      governing: r.governing,
      reference: r.reference,
      steps: r.steps,
      modes: r.modes ?? [],
      slip: r.slip ?? null,
      warnings: r.warnings ?? [],
    })),
    limits: {
      minSpacing,
      maxSpacing,
      endDistance: limits.endDistance,
      module,
      preferred: job.spacing.preferred ?? null,
      minZoneLength,
      edgeDistance: limits.edgeDistance ?? null,
      rowSpacing: limits.rowSpacing ?? null,
      penetration: limits.penetration ?? null,
      sources,
    },
    shearFlow: lineFlow(actions, stations, flowFactor, lineCount),
  };

  if (job.mode === "check" && fastening.provided) {
    const demand = demandCurve(problem);
    const provided = fastening.provided;
    const check = checkSchedule({
      demand,
      rows,
      lines: lineCount,
      endDistance: limits.endDistance,
      provided: provided.type === "zones" ? { zones: provided.zones } : { positions: provided.positions },
    });
    const worst = check.rowChecks.reduce((w, r) => (r.utilisation > w.utilisation ? r : w));
    const detailing = check.zones.flatMap((z) => [
      ...(z.spacing < minSpacing * (1 - 1e-9) ? [`zone ${len(z.from)}–${len(z.to)}: spacing ${len(z.spacing)} is below the minimum ${len(minSpacing)}`] : []),
      ...(z.spacing > maxSpacing * (1 + 1e-9) ? [`zone ${len(z.from)}–${len(z.to)}: spacing ${len(z.spacing)} is above the maximum ${len(maxSpacing)}`] : []),
    ]);
    const passes = worst.utilisation <= 1 + 1e-9 && detailing.length === 0;
    return {
      mirrored: false,
      warnings,
      schedule: {
        ...common,
        mode: "check",
        zones: check.zones,
        positions: check.positions,
        count: check.positions.length * rows * lineCount,
        efficiency: efficiencyOf(demand.integral(1 / maxSpacing) * rows * lineCount, demand.integral() * rows * lineCount, check.positions.length * rows * lineCount, null),
        verification: { maxUtilisation: worst.utilisation, at: worst.x, combination: worst.combination, passes: worst.utilisation <= 1 + 1e-9, method: VERIFICATION_METHOD },
        perCombination: check.perCombination,
        detailingProblems: detailing,
        passes,
        infeasible: null,
        requiredSpacing: requiredAt(stations, demand),
      },
    };
  }

  const settings = {
    minSpacing,
    maxSpacing,
    module,
    preferred: job.spacing.preferred ?? null,
    endDistance: limits.endDistance,
    minZoneLength,
    maxZones: job.spacing.maxZonesPerSpan * beam.spans.length,
    symmetric: job.spacing.symmetric,
    system: defaults.system,
  };
  const design = designedAlike(beam, actions, problem, settings, () => designSchedule({ ...problem, ...settings }));
  const worst = design.rowChecks.reduce((w, r) => (r.utilisation > w.utilisation ? r : w));
  const tooShort = beam.length < 2 * limits.endDistance * (1 - 1e-9);
  const peakShear = Math.max(...actions.map((a) => maxAbsShear(a, 0, beam.length).value));
  const options = design.infeasible
    ? [
        `${design.infeasible.connectorsPerRowNeeded} connectors per row at the minimum spacing of ${len(design.spacings[0]!)}.`,
        `A connector with at least ${design.infeasible.resistanceFactorNeeded.toFixed(2)} × the resistance of ${label} at the same spacing.`,
        ...largerSizeOption(kind, connector, contexts, resistances, design.infeasible.resistanceFactorNeeded, design.spacings[0]!, job.units),
        ...(limits.endDistance > design.spacings[0]! / 2 ? [`A shorter end distance than ${len(limits.endDistance)}, or an extra row near each end: the end row carries the flow from the member end to halfway to the next row.`] : []),
        `A glued joint: the bond-line stress would peak at ${inJobUnits(peakShear * stressFactor, "stress", job.units)} (τ = q/t over t = ${len(joint.contactWidth)}).`,
      ]
    : [];
  return {
    mirrored: design.mirrored,
    warnings,
    schedule: {
      ...common,
      mode: "design",
      zones: design.zones,
      positions: design.positions,
      count: design.count,
      efficiency: efficiencyOf(design.lowerBound, design.demandIntegral, design.count, design.uniform),
      verification: { maxUtilisation: worst.utilisation, at: worst.x, combination: worst.combination, passes: worst.utilisation <= 1 + 1e-9, method: VERIFICATION_METHOD },
      perCombination: design.perCombination,
      detailingProblems: [],
      passes: !design.infeasible && !tooShort && worst.utilisation <= 1 + 1e-9,
      infeasible: design.infeasible
        ? { where: design.infeasible.where, smallestRequired: design.infeasible.smallestRequired, minSpacing: design.spacings[0]!, options }
        : tooShort
          ? {
              where: [{ from: 0, to: beam.length }],
              smallestRequired: design.spacings[0]!,
              minSpacing: design.spacings[0]!,
              options: [`The joint is ${len(beam.length)} long, shorter than twice the end distance of ${len(limits.endDistance)}: no row keeps its end distance from both ends. Use a connector with a smaller end distance, or glue the joint.`],
            }
          : null,
      requiredSpacing: requiredAt(stations, design.demand),
    },
  };
}

/**
 * Joints that see the same actions, flow, resistances and limits (the top and bottom flanges of a
 * symmetric I or box) get the same schedule: design it once per member analysis.
 */
const designs = new WeakMap<BeamAnalysis, Map<string, ReturnType<typeof designSchedule>>>();
function designedAlike(
  beam: BeamAnalysis,
  actions: MemberActions[],
  problem: { flowFactor: number; lines: number; rows: number; combinations: { id: string; resistance: number }[] },
  settings: object,
  design: () => ReturnType<typeof designSchedule>,
): ReturnType<typeof designSchedule> {
  // Only the member's own actions are shared between joints; a demand given in their place is not cached.
  if (actions.some((a, i) => a !== beam.results[i]?.actions) || problem.combinations.length !== beam.results.length) return design();
  const key = JSON.stringify([problem.flowFactor, problem.lines, problem.rows, problem.combinations.map((c) => c.resistance), settings]);
  let cache = designs.get(beam);
  if (!cache) designs.set(beam, (cache = new Map()));
  const found = cache.get(key);
  if (found) return found;
  const made = design();
  cache.set(key, made);
  return made;
}

/**
 * The first larger trade size of the connector that carries the shortfall: no placement problem, and at
 * its own smallest spacing a capacity per unit length (R/s) at least the factor needed times this one's
 * at the smallest spacing allowed now, in every combination; or a sentence saying none of its sizes does.
 */
function largerSizeOption(
  kind: DiscreteConnectorKind<Connector>,
  connector: Connector,
  contexts: ConnectorContext[][],
  resistances: ConnectorResistance[],
  factorNeeded: number,
  smallestSpacing: number,
  units: JobDocument["units"],
): string[] {
  const candidates = kind.largerSizes?.(connector) ?? [];
  if (candidates.length === 0) return [];
  for (const candidate of candidates) {
    if (contexts[0]!.some((c) => (kind.problems?.(candidate, c) ?? []).length > 0)) continue;
    const r = contexts.map((lines) => Math.min(...lines.map((c) => kind.resistance(candidate, c).value)));
    const spacing = Math.max(governingLimits(contexts[0]!.map((c) => kind.detailing(candidate, c))).minSpacing, smallestSpacing);
    if (r.every((value, i) => value / spacing >= (factorNeeded * resistances[i]!.value) / smallestSpacing * (1 - 1e-9))) {
      return [`The next larger size that carries it: ${kind.describe(candidate)}, ${inJobUnits(Math.min(...r), "connectorForce", units)} per connector, at ${inJobUnits(spacing, "length", units)} or closer.`];
    }
  }
  return [`No larger size of this connector, up to ${kind.describe(candidates[candidates.length - 1]!)}, carries it at its own smallest spacing.`];
}

function requiredAt(stations: Station[], demand: ReturnType<typeof demandCurve>): (number | null)[] {
  return stations.map((s) => {
    const d = demand.at(s.x, s.side).value;
    return d > 0 ? 1 / d : null;
  });
}

function efficiencyOf(lowerBound: number, demandIntegral: number, count: number, uniform: { spacing: number; count: number } | null): Schedule["efficiency"] {
  return {
    lowerBound,
    demandIntegral,
    uniformSpacing: uniform?.spacing ?? null,
    uniformCount: uniform?.count ?? null,
    countOverLowerBound: lowerBound > 0 ? count / lowerBound : null,
    uniformOverCount: uniform ? uniform.count / count : null,
  };
}

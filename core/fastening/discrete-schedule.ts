import type { BeamAnalysis } from "../beam/analyse-beam.js";
import { maxAbsShear, shearAt, type MemberActions } from "../beam/member-actions.js";
import type { Station } from "../beam/stations.js";
import type { ColumnSpacingLimits } from "../column/column-rules.js";
import { governingLimits, type ConnectorContext, type ConnectorResistance, type DetailingLimits, type DiscreteConnectorKind } from "../connector/connector-kind.js";
import type { Connector } from "../connector/registry.js";
import type { Fastening, JobDocument } from "../schema/job.js";
import type { Schedule } from "../schema/result.js";
import type { JointPlane } from "../section/joints.js";
import type { LoadedEdge } from "./loaded-edges.js";
import type { ConcentratedBand } from "./side-load-transfer.js";
import { memoisedByLoading } from "./connector-context.js";
import { rowFit } from "./row-fit.js";
import { allowedSpacings } from "../spacing/allowed-spacings.js";
import { checkSchedule } from "../spacing/check-schedule.js";
import { verifyBands, type BandUtilisation } from "../spacing/verify-rows.js";
import { absShearsAtStations } from "../spacing/demand.js";
import { demandCurve, designSchedule, type ZoneReason } from "../spacing/design-schedule.js";
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
  /** For a force across the grain (side-by-side plies): the edges the connectors push the timber toward, and why. */
  loadedEdges?: { edges: LoadedEdge[]; note: string };
  /** Limits a built-up column rule sets on the joint (core/column/column-rules.ts): they tighten the connector's own. */
  columnLimits?: ColumnSpacingLimits;
  /** Between side-by-side plies: where a concentrated force is handed across within d/2, which the rows within must carry. */
  concentratedBands?: ConcentratedBand[];
}

/** The connector's limits tightened by a column rule's: larger minima, a smaller maximum, the rule's clauses added. */
export function withColumnLimits(limits: DetailingLimits, column: ColumnSpacingLimits | undefined): DetailingLimits {
  if (!column) return limits;
  const larger = (a: number | null | undefined, b: number | undefined) => (b === undefined ? a : Math.max(a ?? 0, b));
  return {
    ...limits,
    minSpacing: Math.max(limits.minSpacing, column.minSpacing ?? 0),
    maxSpacing: column.maxSpacing === undefined ? limits.maxSpacing : Math.min(limits.maxSpacing ?? Infinity, column.maxSpacing),
    endDistance: Math.max(limits.endDistance, column.endDistance ?? 0),
    // The rule's distances across the face stand for the connector's where it says so (NDS-2018 §15.3.3, §15.3.4 for laminated columns).
    edgeDistance: (column.acrossReplaces ? column.edgeDistance ?? limits.edgeDistance : larger(limits.edgeDistance, column.edgeDistance)) ?? null,
    rowSpacing: (column.acrossReplaces ? column.rowSpacing ?? limits.rowSpacing : larger(limits.rowSpacing, column.rowSpacing)) ?? null,
    sources: [...limits.sources, ...column.sources],
  };
}

const VERIFICATION_METHOD =
  "each row: tributary length (halfway to its neighbours or to the member end) × the largest shear flow over that length ÷ (connectors per row × R); and no two rows closer than the minimum spacing";

const leastOf = <T extends { value: number }>(values: T[]) => values.reduce((a, b) => (b.value < a.value ? b : a));

/** The actions the connectors of a joint answer to, per combination: V, or the demand given in its place. */
export function demandActionsOf(input: Pick<JointInput, "beam" | "demandActions">): MemberActions[] {
  return input.demandActions ?? input.beam.results.map((r) => r.actions);
}

/** Envelope of the flow on one contact line at the beam stations, N/mm. */
export function lineFlow(actions: MemberActions[], stations: Station[], flowFactor: number, lines: number): number[] {
  const shears = absShearsAtStations(actions, stations);
  if (!shears) return stations.map((s) => (Math.max(...actions.map((a) => Math.abs(shearAt(a, s.x, s.side)))) * flowFactor) / lines);
  return stations.map((_, j) => {
    let largest = -Infinity;
    for (const v of shears) largest = Math.max(largest, v[j]!);
    return (largest * flowFactor) / lines;
  });
}

/**
 * The schedule of a joint fastened by connectors placed one by one: designed (zones chosen for the
 * fewest connectors) or, in check mode, the provided schedule checked row by row.
 */
export function discreteSchedule(input: JointInput, kind: DiscreteConnectorKind<Connector>): { schedule: Schedule; warnings: string[]; mirrored: boolean } {
  const { job, beam, stations, joint, connector, fastening, contexts, flowFactor, stressFactor } = input;
  const rows = fastening.rows;
  const lineCount = joint.lines.length;
  const resistances: ConnectorResistance[] = memoisedByLoading(contexts, (c) => kind.resistance(connector, c)).map(leastOf);
  const warnings = [...new Set(resistances.flatMap((r) => r.warnings ?? []))];
  const limits = withColumnLimits(governingLimits(contexts[0]!.map((c) => kind.detailing(connector, c))), input.columnLimits);
  const defaults = spacingPractice(job);
  const minSpacing = Math.max(limits.minSpacing, job.spacing.minimum ?? 0);
  const maxSpacing = Math.max(minSpacing, Math.min(limits.maxSpacing ?? defaults.maxSpacing, job.spacing.maximum ?? Infinity, input.maxSpacingCap ?? Infinity));
  const module = job.spacing.preferred ? null : job.spacing.module ?? defaults.module;
  const minZoneLength = job.spacing.minZoneLength ?? defaults.minZoneLength;
  const sources = [...limits.sources];
  const unloadedEdgeDistance = limits.unloadedEdgeDistance ?? null;
  if (unloadedEdgeDistance !== null && input.loadedEdges) sources.push(input.loadedEdges.note);
  if (input.maxSpacingCap !== undefined && input.maxSpacingCap < (limits.maxSpacing ?? Infinity)) sources.push(`maximum spacing ${inJobUnits(input.maxSpacingCap, "length", job.units)}: at most 4 × the smallest, for the effective spacing of EN 1995-1-1 Annex B`);
  if (limits.maxSpacing === null && job.spacing.maximum === undefined) sources.push(`maximum spacing ${inJobUnits(defaults.maxSpacing, "length", job.units)} (common practice; the connector sets none)`);
  const actions = demandActionsOf(input);
  const problem = {
    length: beam.length,
    combinations: [...beam.results.map((r, i) => ({ id: r.combination.id, actions: actions[i]!, resistance: resistances[i]!.value })), ...(input.extraDemand ?? [])],
    flowFactor,
    lines: lineCount,
    rows,
    ...(input.concentratedBands && input.concentratedBands.length > 0 ? { bands: input.concentratedBands } : {}),
  };
  const label = kind.describe(connector);
  const len = (mm: number) => inJobUnits(mm, "length", job.units);
  const force = (n: number) => inJobUnits(n, "connectorForce", job.units);
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
      ...(unloadedEdgeDistance !== null ? { unloadedEdgeDistance, ...(input.loadedEdges ? { loadedEdges: input.loadedEdges.edges } : {}) } : {}),
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
      // A given zone below the minimum keeps its rows as given (it fails as a detailing problem).
      minGap: Math.min(minSpacing, ...(provided.type === "zones" ? provided.zones.map((z) => z.spacing) : [])),
      provided: provided.type === "zones" ? { zones: provided.zones } : { positions: provided.positions },
    });
    const worst = check.rowChecks.reduce((w, r) => (r.utilisation > w.utilisation ? r : w));
    // The rows within each band must carry its force, as in a design; a zone over a band that falls short fails with the band's note.
    const shortBands = verifyBands(check.positions, problem.bands ?? [], problem.combinations, rows).filter((b) => b.utilisation > 1 + 1e-9);
    const checkedZones = check.zones.map((z, i) => {
      const over = shortBands.filter((b) => z.to > b.from && z.from < b.to && (i === check.zones.length - 1 || b.from < z.to));
      if (over.length === 0) return z;
      return {
        ...z,
        passes: false,
        failingCombinations: [...new Set([...z.failingCombinations, ...over.map((b) => b.combination)])],
        note: [z.note, ...over.map((b) => bandNote(problem.bands![b.band]!, b, rows, len, force))].filter(Boolean).join(" "),
      };
    });
    const detailing = checkedZones.flatMap((z) => [
      ...(z.spacing < minSpacing * (1 - 1e-9) ? [`zone ${len(z.from)}–${len(z.to)}: spacing ${len(z.spacing)} is below the minimum ${len(minSpacing)}`] : []),
      ...(z.spacing > maxSpacing * (1 + 1e-9) ? [`zone ${len(z.from)}–${len(z.to)}: spacing ${len(z.spacing)} is above the maximum ${len(maxSpacing)}`] : []),
    ]);
    detailing.push(...shortGaps(check.positions, minSpacing, limits.sources, len));
    const passes = worst.utilisation <= 1 + 1e-9 && detailing.length === 0 && shortBands.length === 0;
    return {
      mirrored: false,
      warnings,
      schedule: {
        ...common,
        mode: "check",
        zones: checkedZones,
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
  const gapProblems = shortGaps(design.positions, minSpacing, limits.sources, len);
  const reason = design.infeasible ? infeasibleReason(design.infeasible, limits.endDistance, design.spacings[0]!, len, problem.bands ?? [], rows, force) : undefined;
  const remedies = design.infeasible ? designedRemedies(input, kind, problem, settings, resistances) : null;
  const options = remedies
    ? [
        ...remedies.text,
        `Not designed here: a glued joint would see a bond-line stress up to ${inJobUnits(peakShear * stressFactor, "stress", job.units)} (τ = q/t over t = ${len(joint.contactWidth)}); design it as a glue line.`,
      ]
    : [];
  const zones = design.zones.map((z, i) => {
    const note = zoneNote(design.zoneReasons[i] ?? null, len, problem.bands ?? []);
    return note ? { ...z, note } : z;
  });
  return {
    mirrored: design.mirrored,
    warnings,
    schedule: {
      ...common,
      mode: "design",
      zones,
      positions: design.positions,
      count: design.count,
      efficiency: efficiencyOf(design.lowerBound, design.demandIntegral, design.count, design.uniform),
      verification: { maxUtilisation: worst.utilisation, at: worst.x, combination: worst.combination, passes: worst.utilisation <= 1 + 1e-9, method: VERIFICATION_METHOD },
      perCombination: design.perCombination,
      detailingProblems: gapProblems,
      passes: !design.infeasible && !tooShort && worst.utilisation <= 1 + 1e-9 && gapProblems.length === 0,
      infeasible: design.infeasible
        ? {
            where: design.infeasible.where,
            smallestRequired: design.infeasible.smallestRequired,
            minSpacing: design.spacings[0]!,
            ...(reason ? { reason } : {}),
            options,
            remedies: remedies!.designed,
          }
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

type ScheduleSettings = Omit<Parameters<typeof designSchedule>[0], "length" | "combinations" | "flowFactor" | "lines" | "rows">;
type Remedy = NonNullable<NonNullable<Schedule["infeasible"]>["remedies"]>[number];

/** At most this many more connectors per row are tried as a remedy. */
const MORE_PER_ROW = 6;

/**
 * Remedies for a joint no schedule carries, each designed again with the change before it is offered:
 * more connectors per row (the fewest that pass, with their row fitting across the contact), the next
 * larger trade size that passes, and the least factor on the resistance that passes. Each comes with the
 * utilisation its design reaches; where none of a kind passes, a sentence says so.
 */
function designedRemedies(
  input: JointInput,
  kind: DiscreteConnectorKind<Connector>,
  problem: { length: number; combinations: { id: string; actions: MemberActions; resistance: number }[]; flowFactor: number; lines: number; rows: number },
  settings: ScheduleSettings,
  resistances: ConnectorResistance[],
): { text: string[]; designed: Remedy[] } {
  const { job, joint, connector, contexts, beam } = input;
  const units = job.units;
  const len = (mm: number) => inJobUnits(mm, "length", units);
  const label = kind.describe(connector);
  const combos = beam.results.length;
  const leastNow = Math.min(...resistances.map((r) => r.value));
  const attempt = (c: Connector, rows: number, factor: number) => {
    const lines = contexts.map((ls) => ls.map((ctx) => ({ ...ctx, rows })));
    if (lines[0]!.some((ctx) => (kind.problems?.(c, ctx) ?? []).length > 0)) return null;
    const limits = withColumnLimits(governingLimits(lines[0]!.map((ctx) => kind.detailing(c, ctx))), input.columnLimits);
    if (rowFit({ ...limits, ...(input.loadedEdges ? { loadedEdges: input.loadedEdges.edges } : {}) }, rows, joint.lines)?.fits === false) return null;
    if (beam.length < 2 * limits.endDistance * (1 - 1e-9)) return null;
    const r = memoisedByLoading(lines, (ctx) => kind.resistance(c, ctx).value).map((ls) => Math.min(...ls) * factor);
    const scale = Math.min(...r) / leastNow;
    const combinations = problem.combinations.map((k, i) => ({ ...k, resistance: i < combos ? r[i]! : k.resistance * scale }));
    const minSpacing = Math.max(limits.minSpacing, job.spacing.minimum ?? 0);
    const maxSpacing = Math.max(minSpacing, Math.min(limits.maxSpacing ?? settings.maxSpacing, job.spacing.maximum ?? Infinity, input.maxSpacingCap ?? Infinity));
    // A larger size whose least spacing leaves no allowed spacing up to the maximum cannot be placed (the job would be refused).
    if (allowedSpacings({ module: settings.module, preferred: settings.preferred, min: minSpacing, max: maxSpacing }).length === 0) return null;
    const d = designSchedule({ ...problem, combinations, rows, ...settings, minSpacing, maxSpacing, endDistance: limits.endDistance });
    const utilisation = Math.max(...d.rowChecks.map((x) => x.utilisation));
    const shortGap = d.positions.some((x, k) => k > 0 && x - d.positions[k - 1]! < minSpacing * (1 - 1e-9));
    return { passes: !d.infeasible && utilisation <= 1 + 1e-9 && !shortGap, utilisation, count: d.count, resistance: Math.min(...r), spacing: d.spacings[0]! };
  };
  const text: string[] = [];
  const designed: Remedy[] = [];
  // Never shown rounded up to 1.00: a passing design reads below it.
  const shown = (u: number) => (u.toFixed(2) === "1.00" && u <= 1 + 1e-9 ? (Math.floor(u * 1000) / 1000).toFixed(3) : u.toFixed(2));

  let perRow: { rows: number; result: NonNullable<ReturnType<typeof attempt>> } | null = null;
  let triedRows = problem.rows;
  for (let n = problem.rows + 1; n <= problem.rows + MORE_PER_ROW; n++) {
    const r = attempt(connector, n, 1);
    if (!r) break; // the row no longer fits across the contact, or another placement problem
    triedRows = n;
    if (r.passes) {
      perRow = { rows: n, result: r };
      break;
    }
  }
  if (perRow) {
    text.push(`${perRow.rows} connectors per row (now ${problem.rows}): designed again, the schedule passes with utilisation ${shown(perRow.result.utilisation)} and ${perRow.result.count} connectors.`);
    designed.push({ change: "rows", rows: perRow.rows, utilisation: perRow.result.utilisation, count: perRow.result.count });
  } else {
    text.push(
      triedRows > problem.rows
        ? `More connectors per row does not pass: up to ${triedRows} per row (as many as fit across the contact, at most ${problem.rows + MORE_PER_ROW}) a row still fails.`
        : `More connectors per row is not possible: ${problem.rows + 1} per row do not fit across the contact (edge distances and spacing across the line) or cannot be placed.`,
    );
  }

  const sizes = kind.largerSizes?.(connector) ?? [];
  if (sizes.length > 0) {
    let found = false;
    for (const candidate of sizes) {
      const r = attempt(candidate, problem.rows, 1);
      if (!r?.passes) continue;
      const size = (candidate as { size?: unknown }).size;
      text.push(`The next larger size that passes: ${kind.describe(candidate)}, ${inJobUnits(r.resistance, "connectorForce", units)} per connector; designed again, utilisation ${shown(r.utilisation)} with ${r.count} connectors (its minimum spacing ${len(r.spacing)}).`);
      designed.push({ change: "size", ...(typeof size === "string" ? { size } : {}), utilisation: r.utilisation, count: r.count });
      found = true;
      break;
    }
    if (!found) text.push(`No larger size of this connector, up to ${kind.describe(sizes[sizes.length - 1]!)}, passes with ${problem.rows} per row.`);
  }

  // The least factor on R that passes, to two decimals, found by bisection on designs.
  const at = (f: number) => attempt(connector, problem.rows, f);
  let hi = 2;
  let high = at(hi);
  while (high && !high.passes && hi < 64) high = at((hi *= 2));
  if (high?.passes) {
    let lo = 1;
    while (hi - lo > 0.005) {
      const mid = (lo + hi) / 2;
      if (at(mid)?.passes) hi = mid;
      else lo = mid;
    }
    const factor = Math.ceil(hi * 100 - 1e-9) / 100;
    const r = at(factor);
    if (r?.passes) {
      text.push(`A connector with at least ${factor.toFixed(2)} × the resistance of ${label} and the same detailing limits: designed again, utilisation ${shown(r.utilisation)} with ${r.count} connectors.`);
      designed.push({ change: "resistance", resistanceFactor: factor, utilisation: r.utilisation, count: r.count });
    }
  } else text.push(`No stronger connector with the same detailing limits passes (up to ${hi} × the resistance of ${label}).`);
  return { text, designed };
}

/** Gaps between rows shorter than the minimum spacing, as detailing problems. */
function shortGaps(positions: number[], minSpacing: number, sources: string[], len: (mm: number) => string): string[] {
  const short = positions.map((x, k) => ({ a: positions[k - 1], b: x })).filter((g): g is { a: number; b: number } => g.a !== undefined && g.b - g.a < minSpacing * (1 - 1e-6));
  if (short.length === 0) return [];
  const shown = short.slice(0, 3).map((g) => `${len(g.b - g.a)} between the rows at ${len(g.a)} and ${len(g.b)}`);
  const source = sources.find((t) => /spacing/i.test(t));
  return [
    `${short.length} gap${short.length === 1 ? "" : "s"} between rows shorter than the minimum spacing of ${len(minSpacing)}${source ? ` (${source})` : ""}: ${shown.join("; ")}${short.length > 3 ? "; …" : ""}`,
  ];
}

/** What hands a band's force across, and the rule: the connectors within half the member depth of it ([CP]). */
function bandRule(band: ConcentratedBand, len: (mm: number) => string): string {
  const source = band.source;
  if (source.kind === "overlapping") {
    return `the concentrated forces at ${source.at.map(len).join(", ")}, whose bands overlap, are passed together by the connectors within half the member depth of them (common practice)`;
  }
  const at = len(source.at);
  const what =
    source.kind === "load"
      ? `the concentrated load at ${at} is passed`
      : source.kind === "support"
        ? `the share of the reaction at the support at ${at} is handed to the plies that bear there`
        : `where ${source.ply ? `ply ${source.ply}` : "a ply"} starts or stops at ${at} its share is handed across`;
  return `${what} by the connectors within half the member depth of it (common practice)`;
}

/** A band whose rows within fall short, in words. */
function bandNote(band: ConcentratedBand, check: BandUtilisation, rows: number, len: (mm: number) => string, force: (n: number) => string): string {
  return `Within the band ${len(band.origin + band.from)}–${len(band.origin + band.to)} ${bandRule(band, len)}: ${check.rows} row${check.rows === 1 ? "" : "s"} of ${rows} stand within it and carry ${force(check.carried)} against the ${force(check.force)} passed there under ${check.combination}.`;
}

/** The sentence beside a zone that is closer than the shear flow along it needs. */
function zoneNote(reason: ZoneReason | null, len: (mm: number) => string, bands: readonly ConcentratedBand[]): string | undefined {
  if (!reason) return undefined;
  if (reason.kind === "band") {
    const band = bands[reason.band]!;
    const within = `${len(band.origin + band.from)}–${len(band.origin + band.to)}`;
    if (reason.restart) return `Its rows restart at the edge of the band ${within}: ${bandRule(band, len)}, and the rows within it must carry that force themselves, without credit for rows outside it.`;
    return `Closer than the ${len(reason.flowSpacing)} the shear flow along it allows: ${bandRule(band, len)}, so the rows within ${len(band.origin + band.from)}–${len(band.origin + band.to)} must carry that force themselves, without credit for rows outside it.`;
  }
  if (reason.kind === "end-row") {
    return `End row governs: the row at the end distance ${len(reason.endDistance)} carries from the member end to halfway to the next row (e + s/2), so this zone is closer than the ${len(reason.flowSpacing)} the shear flow along it allows.`;
  }
  return `Closer than the ${len(reason.flowSpacing)} the shear flow along it allows: at ${len(reason.at)}, where zones meet or the last rows are fitted to the end, a row carried more than its share until the zone was tightened.`;
}

/** What fails, where the flow alone would allow the minimum spacing. */
function infeasibleReason(inf: NonNullable<ReturnType<typeof designSchedule>["infeasible"]>, endDistance: number, minSpacing: number, len: (mm: number) => string, bands: readonly ConcentratedBand[], rows: number, force: (n: number) => string): string | undefined {
  const band = inf.band ? bandNote(bands[inf.band.band]!, inf.band, rows, len, force) : undefined;
  if (inf.cause === "band") return `At the minimum spacing of ${len(minSpacing)} too few rows stand within a band. ${band}`;
  const rowsText = rowsReason(inf, endDistance, minSpacing, len);
  return rowsText && band ? `${rowsText} ${band}` : (rowsText ?? band);
}

function rowsReason(inf: NonNullable<ReturnType<typeof designSchedule>["infeasible"]>, endDistance: number, minSpacing: number, len: (mm: number) => string): string | undefined {
  if (inf.cause === "flow" || !inf.worstRow) return undefined;
  const r = inf.worstRow;
  const tributary = r.to - r.from;
  if (r.endRow) {
    return `The shear flow alone needs ${len(inf.flowRequired)}, which the minimum spacing of ${len(minSpacing)} meets, but the end row at ${len(r.x)} carries from the member end to halfway to the next row, ${len(tributary)} (the end distance ${len(endDistance)} plus half a spacing): utilisation ${r.utilisation.toFixed(2)}.`;
  }
  return `The shear flow alone needs ${len(inf.flowRequired)}, which the minimum spacing of ${len(minSpacing)} meets, but the row at ${len(r.x)} carries ${len(tributary)} of the member: utilisation ${r.utilisation.toFixed(2)}.`;
}

function requiredAt(stations: Station[], demand: ReturnType<typeof demandCurve>): (number | null)[] {
  const values = demand.valuesAtStations(stations);
  // By index: Array.from on a typed array goes through its iterator, about ten times slower.
  const out = new Array<number | null>(values.length);
  for (let j = 0; j < values.length; j++) {
    const d = values[j]!;
    out[j] = d > 0 && Number.isFinite(1 / d) ? 1 / d : null;
  }
  return out;
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

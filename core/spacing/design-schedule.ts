import type { MemberActions } from "../beam/member-actions.js";
import { allowedSpacings } from "./allowed-spacings.js";
import { checkSchedule, type ScheduleCheck } from "./check-schedule.js";
import { DemandCurve } from "./demand.js";
import { placeRows } from "./place-rows.js";
import { verifyRows, type RowUtilisation } from "./verify-rows.js";
import { boundaryGrid, CellMaxima, planZones, roundStep, spacingWithoutEndRow, type PlannedZone } from "./zoning.js";

export interface ScheduleProblem {
  length: number;
  /** Per combination: its actions and one connector's design resistance R, N. */
  combinations: { id: string; actions: MemberActions; resistance: number }[];
  /** Q/I of the joint, 1/mm. */
  flowFactor: number;
  /** Contact lines sharing the joint's shear flow equally. */
  lines: number;
  /** Connectors per row on each line. */
  rows: number;
  minSpacing: number;
  maxSpacing: number;
  module: number | null;
  preferred: number[] | null;
  endDistance: number;
  minZoneLength: number;
  maxZones: number;
  symmetric: boolean;
  system: "si" | "us";
}

/**
 * Why a zone is closer than the flow along it needs: the end row carries from the member end to halfway
 * to the next row (e + s/2), or a row where two zones meet carried more than its zone's spacing allows
 * and the zone was tightened until every placed row passed.
 */
export type ZoneReason = { kind: "end-row"; flowSpacing: number; endDistance: number } | { kind: "row-fit"; flowSpacing: number; at: number };

export interface ScheduleDesign {
  demand: DemandCurve;
  spacings: number[];
  mirrored: boolean;
  zones: ScheduleCheck["zones"];
  /** Per zone, why it is closer than the flow along it needs, or null. */
  zoneReasons: (ZoneReason | null)[];
  positions: number[];
  rowChecks: RowUtilisation[];
  perCombination: ScheduleCheck["perCombination"];
  /** Connectors on all lines. */
  count: number;
  /** Fewest connectors any schedule within the maximum spacing can have: n·lines·∫max(d, 1/s_max) dx. */
  lowerBound: number;
  /** n·lines·∫d dx = ∫q/R dx over all lines, ignoring the maximum spacing. */
  demandIntegral: number;
  uniform: { spacing: number; count: number } | null;
  /** Where even the minimum spacing cannot carry the demand, and what would. */
  infeasible: {
    where: { from: number; to: number }[];
    smallestRequired: number;
    /** The flow itself needs less than the minimum spacing (cells), or only the placed rows fail (end rows, zone meetings). */
    cause: "flow" | "rows";
    /** The worst failing row, its tributary length and utilisation. */
    worstRow: { x: number; from: number; to: number; utilisation: number; endRow: boolean } | null;
  } | null;
}

export function demandCurve(p: Pick<ScheduleProblem, "length" | "combinations" | "flowFactor" | "lines" | "rows">): DemandCurve {
  return new DemandCurve(
    p.length,
    p.combinations.map((c) => ({ combination: c.id, actions: c.actions, k: p.flowFactor / (p.lines * p.rows * c.resistance) })),
  );
}

/** Designs the zoned schedule of one connector line and checks the placed rows. */
export function designSchedule(p: ScheduleProblem): ScheduleDesign {
  const demand = demandCurve(p);
  const spacings = allowedSpacings({ module: p.module, preferred: p.preferred, min: p.minSpacing, max: p.maxSpacing });
  if (spacings.length === 0) throw new Error("no allowed spacing between the minimum and the maximum");
  const L = p.length;
  const mirrored = p.symmetric && demand.isSymmetric();
  const end = mirrored ? L / 2 : L;
  const grid = boundaryGrid(end, roundStep(end, p.system));
  const cellMax = grid.slice(0, -1).map((a, i) => demand.maxOver(a, grid[i + 1]!).value);
  const cells = new CellMaxima(grid, cellMax);
  const query = mirrored
    ? (a: number, b: number) => (b > end ? cells.over(Math.min(a, L - b), end) : cells.over(a, b))
    : (a: number, b: number) => cells.over(a, b);
  const base = { length: L, demand: query, spacings, endDistance: p.endDistance, minZoneLength: p.minZoneLength, mirrored, grid };
  const zoning = { ...base, maxZones: p.maxZones };
  const plan = planZones(zoning);
  const perRow = p.rows * p.lines;
  const place = (zones: PlannedZone[]) => placeRows(zones, L, p.endDistance, mirrored, p.minSpacing);
  const checkOf = (zones: PlannedZone[]) => checkSchedule({ demand, rows: p.rows, lines: p.lines, endDistance: p.endDistance, provided: { zones, positions: place(zones) } });

  const minSpacing = spacings[0]!;
  const shortCells = grid.slice(0, -1).map((a, i) => ({ from: a, to: grid[i + 1]! })).filter((_c, i) => cellMax[i]! * minSpacing > 1 + 1e-9);

  // The placed rows are checked independently of how they were chosen. Where the flow can be carried but a
  // placed row fails (where two zones meet, or next to the end row), its zone steps down to the next allowed
  // spacing (its mirror image too) until every row passes.
  const planned = plan.zones.map((z) => ({ ...z }));
  const flowSpacings = planned.map((z) => z.spacing);
  let rowsNow = verifyRows(place(planned), demand);
  const tightenedAt = new Map<number, number>();
  for (let round = 0; round < 4 * planned.length + 40; round++) {
    // The worst failing row whose zone can still step down.
    const candidates = rowsNow
      .filter((r) => r.utilisation > 1 + 1e-9)
      .map((r) => ({ row: r, i: zoneIndexOf(planned, r.x) }))
      .map((c) => ({ ...c, step: indexBelow(spacings, planned[c.i]!.spacing) }))
      .filter((c) => c.step >= 0);
    if (candidates.length === 0) break;
    const { row: worst, i, step } = candidates.reduce((w, c) => (c.row.utilisation > w.row.utilisation ? c : w));
    const targets = mirrored ? [...new Set([i, planned.length - 1 - i])] : [i];
    for (const t of targets) {
      planned[t]!.spacing = spacings[step]!;
      if (!tightenedAt.has(t)) tightenedAt.set(t, worst.x);
    }
    rowsNow = verifyRows(place(planned), demand);
  }
  const { positions, rowChecks, zones, perCombination } = checkOf(planned);
  const zoneReasons: (ZoneReason | null)[] = planned.map((z, i) => {
    const tightenedHere = tightenedAt.get(i);
    if (tightenedHere !== undefined) return { kind: "row-fit", flowSpacing: flowSpacings[i]!, at: tightenedHere };
    const first = i === 0;
    const last = i === planned.length - 1;
    if (!first && !last) return null;
    // A mirrored plan's right end zone is the mirror of its left one.
    const a = mirrored && last && !first ? L - z.to : z.from;
    const b = mirrored && last && !first ? L - z.from : z.to;
    const flow = mirrored ? spacingWithoutEndRow(zoning, a, Math.min(b, end), true, planned.length === 1) : spacingWithoutEndRow(zoning, a, b, a === 0 && (first || planned.length === 1), b === L);
    return flow !== undefined && flow > z.spacing * (1 + 1e-9) ? { kind: "end-row", flowSpacing: flow, endDistance: p.endDistance } : null;
  });

  const peak = demand.maxOver(0, L);
  const uniformPlan = planZones({ ...base, maxZones: 1 });
  const uniformZone = uniformPlan.zones[0]!;
  const uniformRows = uniformZone.feasible ? place(uniformPlan.zones) : null;
  const uniform =
    uniformRows && verifyRows(uniformRows, demand).every((r) => r.utilisation <= 1 + 1e-9) ? { spacing: uniformZone.spacing, count: uniformRows.length * perRow } : null;

  const failingRows = rowChecks.filter((r) => r.utilisation > 1 + 1e-9);
  const mirroredCells = mirrored ? [...shortCells, ...shortCells.map((c) => ({ from: L - c.to, to: L - c.from })).reverse()] : shortCells;
  // The placed rows decide: a cell whose flow needs less than the minimum spacing may still be carried
  // when it lies within the end row's reach (e + s/2 < s).
  const where = failingRows.length === 0 ? [] : mergeIntervals(mirroredCells.length > 0 ? mirroredCells : failingRows.map((r) => ({ from: r.from, to: r.to })));
  const worstRow = failingRows.reduce<RowUtilisation | undefined>((w, r) => (!w || r.utilisation > w.utilisation ? r : w), undefined);
  const infeasible =
    where.length > 0
      ? {
          where,
          smallestRequired: 1 / peak.value,
          cause: mirroredCells.length > 0 ? ("flow" as const) : ("rows" as const),
          worstRow: worstRow
            ? { x: worstRow.x, from: worstRow.from, to: worstRow.to, utilisation: worstRow.utilisation, endRow: worstRow.x === positions[0] || worstRow.x === positions[positions.length - 1] }
            : null,
        }
      : null;

  return {
    demand,
    spacings,
    mirrored,
    zones,
    zoneReasons,
    positions,
    rowChecks,
    perCombination,
    count: positions.length * perRow,
    lowerBound: demand.integral(1 / spacings[spacings.length - 1]!) * perRow,
    demandIntegral: demand.integral() * perRow,
    uniform,
    infeasible,
  };
}

function zoneIndexOf(zones: { from: number; to: number }[], x: number): number {
  const i = zones.findIndex((z, k) => x >= z.from - 1e-9 && (k === zones.length - 1 ? x <= z.to + 1e-9 : x < z.to - 1e-9));
  return i >= 0 ? i : x < zones[0]!.from ? 0 : zones.length - 1;
}

/** Index of the largest allowed spacing below s, or −1. */
function indexBelow(spacings: number[], s: number): number {
  let found = -1;
  spacings.forEach((v, i) => {
    if (v < s * (1 - 1e-12)) found = i;
  });
  return found;
}

function mergeIntervals(cells: { from: number; to: number }[]): { from: number; to: number }[] {
  const out: { from: number; to: number }[] = [];
  for (const c of cells) {
    const prev = out[out.length - 1];
    if (prev && c.from <= prev.to + 1e-9 * Math.max(1, c.to)) prev.to = Math.max(prev.to, c.to);
    else out.push({ from: c.from, to: c.to });
  }
  return out;
}

import type { MemberActions } from "../beam/member-actions.js";
import { allowedSpacings } from "./allowed-spacings.js";
import { checkSchedule, type ScheduleCheck } from "./check-schedule.js";
import { DemandCurve } from "./demand.js";
import { placeRows } from "./place-rows.js";
import type { RowUtilisation } from "./verify-rows.js";
import { boundaryGrid, CellMaxima, planZones, roundStep } from "./zoning.js";

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

export interface ScheduleDesign {
  demand: DemandCurve;
  spacings: number[];
  mirrored: boolean;
  zones: ScheduleCheck["zones"];
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
  infeasible: { where: { from: number; to: number }[]; smallestRequired: number; connectorsPerRowNeeded: number; resistanceFactorNeeded: number } | null;
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
  const plan = planZones({ ...base, maxZones: p.maxZones });
  const perRow = p.rows * p.lines;
  // The placed rows are checked independently of how they were chosen.
  const check = checkSchedule({ demand, rows: p.rows, lines: p.lines, endDistance: p.endDistance, provided: { zones: plan.zones, positions: placeRows(plan.zones, L, p.endDistance, mirrored) } });
  const { positions, rowChecks, zones, perCombination } = check;

  const peak = demand.maxOver(0, L);
  const uniformPlan = planZones({ ...base, maxZones: 1 });
  const uniformZone = uniformPlan.zones[0]!;
  const uniform = uniformZone.feasible ? { spacing: uniformZone.spacing, count: placeRows(uniformPlan.zones, L, p.endDistance, mirrored).length * perRow } : null;

  const minSpacing = spacings[0]!;
  const failingRows = rowChecks.filter((r) => r.utilisation > 1 + 1e-9);
  const shortCells = grid.slice(0, -1).map((a, i) => ({ from: a, to: grid[i + 1]! })).filter((_c, i) => cellMax[i]! * minSpacing > 1 + 1e-9);
  const mirroredCells = mirrored ? [...shortCells, ...shortCells.map((c) => ({ from: L - c.to, to: L - c.from })).reverse()] : shortCells;
  const where = mergeIntervals(mirroredCells.length > 0 ? mirroredCells : failingRows.map((r) => ({ from: r.from, to: r.to })));
  const infeasible =
    where.length > 0
      ? {
          where,
          smallestRequired: 1 / peak.value,
          connectorsPerRowNeeded: Math.ceil(p.rows * minSpacing * peak.value - 1e-9),
          resistanceFactorNeeded: minSpacing * peak.value,
        }
      : null;

  return {
    demand,
    spacings,
    mirrored,
    zones,
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

function mergeIntervals(cells: { from: number; to: number }[]): { from: number; to: number }[] {
  const out: { from: number; to: number }[] = [];
  for (const c of cells) {
    const prev = out[out.length - 1];
    if (prev && c.from <= prev.to + 1e-9 * Math.max(1, c.to)) prev.to = Math.max(prev.to, c.to);
    else out.push({ from: c.from, to: c.to });
  }
  return out;
}

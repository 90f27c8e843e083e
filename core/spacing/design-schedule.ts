import type { MemberActions } from "../beam/member-actions.js";
import { allowedSpacings } from "./allowed-spacings.js";
import { checkSchedule, type ScheduleCheck } from "./check-schedule.js";
import { DemandCurve } from "./demand.js";
import { placeRows } from "./place-rows.js";
import { verifyBands, verifyRows, type BandUtilisation, type RowBand, type RowUtilisation } from "./verify-rows.js";
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
  /** Where a concentrated force is handed across, the rows within each band must carry it (not only by their tributary lengths). */
  bands?: RowBand[];
}

/**
 * Why a zone is closer than the flow along it needs: the end row carries from the member end to halfway
 * to the next row (e + s/2), or a row where two zones meet carried more than its zone's spacing allows
 * and the zone was tightened until every placed row passed.
 */
export type ZoneReason =
  | { kind: "end-row"; flowSpacing: number; endDistance: number }
  | { kind: "row-fit"; flowSpacing: number; at: number }
  | { kind: "band"; flowSpacing: number; band: number; restart: boolean };

export interface ScheduleDesign {
  demand: DemandCurve;
  spacings: number[];
  mirrored: boolean;
  zones: ScheduleCheck["zones"];
  /** Per zone, why it is closer than the flow along it needs, or null. */
  zoneReasons: (ZoneReason | null)[];
  positions: number[];
  rowChecks: RowUtilisation[];
  /** Each band of ScheduleProblem.bands checked on the placed rows. */
  bandChecks: BandUtilisation[];
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
    /** What the shear flow alone needs, 1/max d. */
    flowRequired: number;
    /** The flow itself needs less than the minimum spacing (cells), only the placed rows fail (end rows, zone meetings), or too few rows stand within a band. */
    cause: "flow" | "rows" | "band";
    /** The worst failing row, its tributary length and utilisation. */
    worstRow: { x: number; from: number; to: number; utilisation: number; endRow: boolean } | null;
    /** The worst band whose rows within fall short, at the least spacing. */
    band: BandUtilisation | null;
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
  const cellMax = grid.slice(0, -1).map((a, i) => demand.sharedMaxOver(a, grid[i + 1]!).value);
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
  // A band whose rows within fall short steps down the zone over it with the largest spacing, the same way.
  const bands = p.bands ?? [];
  const bandsOf = (positions: number[]) => verifyBands(positions, bands, p.combinations.map((c) => ({ id: c.id, resistance: c.resistance })), p.rows);
  let planned = plan.zones.map((z) => ({ ...z }));
  let flowSpacings = planned.map((z) => z.spacing);
  let placed = place(planned);
  let rowsNow = verifyRows(placed, demand);
  let bandsNow = bandsOf(placed);
  const tightenedAt = new Map<number, { at: number; band: number | null; restart?: boolean }>();
  const rounds = 4 * planned.length + 40 + (bands.length > 0 ? planned.length * spacings.length : 0);
  for (let round = 0; round < rounds; round++) {
    // The worst failing row or band whose zone can still step down.
    const candidates = [
      ...rowsNow.filter((r) => r.utilisation > 1 + 1e-9).map((r) => ({ utilisation: r.utilisation, at: r.x, band: null as number | null, i: zoneIndexOf(planned, r.x) })),
      ...bandsNow.filter((b) => b.utilisation > 1 + 1e-9).map((b) => ({ utilisation: b.utilisation, at: (b.from + b.to) / 2, band: b.band as number | null, i: widestZoneOver(planned, spacings, b) })),
    ]
      .map((c) => ({ ...c, step: indexBelow(spacings, planned[c.i]!.spacing) }))
      .filter((c) => c.step >= 0);
    if (candidates.length === 0) break;
    const worst = candidates.reduce((w, c) => (c.utilisation > w.utilisation ? c : w));
    const targets = mirrored ? [...new Set([worst.i, planned.length - 1 - worst.i])] : [worst.i];
    for (const t of targets) {
      planned[t]!.spacing = spacings[worst.step]!;
      if (!tightenedAt.has(t)) tightenedAt.set(t, { at: worst.at, band: worst.band });
    }
    placed = place(planned);
    rowsNow = verifyRows(placed, demand);
    bandsNow = bandsOf(placed);
  }
  // A band still short where its zones cannot step down: the rows' phase may leave one out that fits. The zone over
  // the band's edge is split there at the same spacing (a mirrored plan's mirror zone too), so the rows restart at the
  // edge; kept only where every row still passes and no band that passed fails.
  for (let round = 0; round < bands.length; round++) {
    const short = bandsNow.filter((b) => b.utilisation > 1 + 1e-9);
    if (short.length === 0) break;
    const band = short.reduce((w, b) => (b.utilisation > w.utilisation ? b : w));
    let kept = false;
    for (const edge of [band.from, band.to]) {
      let trial = planned.map((z, i) => ({ ...z, flow: flowSpacings[i]!, tightened: tightenedAt.get(i) }));
      const splits: number[] = [];
      for (const x of mirrored ? [edge, L - edge] : [edge]) {
        const i = trial.findIndex((z) => x > z.from + 1e-6 && x < z.to - 1e-6);
        if (i < 0) continue;
        trial = [...trial.slice(0, i), { ...trial[i]!, to: x }, { ...trial[i]!, from: x }, ...trial.slice(i + 1)];
        splits.push(x);
      }
      if (trial.length === planned.length) continue;
      // The pieces whose rows restart at the edge are those over the band (or its mirror image).
      const over = (z: { from: number; to: number }, a: number, b: number) => z.from < b - 1e-6 && z.to > a + 1e-6;
      const pieces = new Set(trial.filter((z) => (over(z, band.from, band.to) || (mirrored && over(z, L - band.to, L - band.from))) && splits.some((x) => Math.abs(z.from - x) < 1e-6 || Math.abs(z.to - x) < 1e-6)));
      for (const z of pieces) z.tightened = { at: edge, band: band.band, restart: true };
      const rows = place(trial);
      const checks = bandsOf(rows);
      const fine = verifyRows(rows, demand).every((r) => r.utilisation <= 1 + 1e-9) && checks[band.band]!.utilisation <= 1 + 1e-9 && checks.every((b, k) => b.utilisation <= 1 + 1e-9 || bandsNow[k]!.utilisation > 1 + 1e-9);
      if (!fine) continue;
      tightenedAt.clear();
      trial.forEach((z, i) => z.tightened && tightenedAt.set(i, z.tightened));
      flowSpacings = trial.map((z) => z.flow);
      planned = trial.map(({ flow: _flow, tightened: _tightened, ...z }) => z);
      bandsNow = checks;
      kept = true;
      break;
    }
    if (!kept) break;
  }
  const { positions, rowChecks, zones, perCombination } = checkOf(planned);
  const bandChecks = bandsOf(positions);
  const zoneReasons: (ZoneReason | null)[] = planned.map((z, i) => {
    const tightenedHere = tightenedAt.get(i);
    if (tightenedHere?.band != null) return { kind: "band", flowSpacing: flowSpacings[i]!, band: tightenedHere.band, restart: tightenedHere.restart === true };
    if (tightenedHere !== undefined) return { kind: "row-fit", flowSpacing: flowSpacings[i]!, at: tightenedHere.at };
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
    uniformRows && verifyRows(uniformRows, demand).every((r) => r.utilisation <= 1 + 1e-9) && bandsOf(uniformRows).every((b) => b.utilisation <= 1 + 1e-9)
      ? { spacing: uniformZone.spacing, count: uniformRows.length * perRow }
      : null;

  const failingRows = rowChecks.filter((r) => r.utilisation > 1 + 1e-9);
  const failingBands = bandChecks.filter((b) => b.utilisation > 1 + 1e-9);
  const worstBand = failingBands.reduce<BandUtilisation | null>((w, b) => (!w || b.utilisation > w.utilisation ? b : w), null);
  const mirroredCells = mirrored ? [...shortCells, ...shortCells.map((c) => ({ from: L - c.to, to: L - c.from })).reverse()] : shortCells;
  // The placed rows decide: a cell whose flow needs less than the minimum spacing may still be carried
  // when it lies within the end row's reach (e + s/2 < s).
  const rowsWhere = failingRows.length === 0 ? [] : mirroredCells.length > 0 ? mirroredCells : failingRows.map((r) => ({ from: r.from, to: r.to }));
  const where = mergeIntervals([...rowsWhere, ...failingBands.map((b) => ({ from: b.from, to: b.to }))].sort((a, b) => a.from - b.from));
  const worstRow = failingRows.reduce<RowUtilisation | undefined>((w, r) => (!w || r.utilisation > w.utilisation ? r : w), undefined);
  const infeasible =
    where.length > 0
      ? {
          where,
          smallestRequired: Math.min(1 / peak.value, ...failingBands.map((b) => spacingWithin(b, p.rows, p.combinations))),
          flowRequired: 1 / peak.value,
          cause: failingRows.length === 0 ? ("band" as const) : mirroredCells.length > 0 ? ("flow" as const) : ("rows" as const),
          worstRow: worstRow
            ? { x: worstRow.x, from: worstRow.from, to: worstRow.to, utilisation: worstRow.utilisation, endRow: worstRow.x === positions[0] || worstRow.x === positions[positions.length - 1] }
            : null,
          band: worstBand,
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
    bandChecks,
    perCombination,
    count: positions.length * perRow,
    lowerBound: demand.integral(1 / spacings[spacings.length - 1]!) * perRow,
    demandIntegral: demand.integral() * perRow,
    uniform,
    infeasible,
  };
}

/** The zone over a band that has the largest spacing still able to step down (the one over its middle when none can). */
function widestZoneOver(zones: { from: number; to: number; spacing: number }[], spacings: number[], band: { from: number; to: number }): number {
  let best = zoneIndexOf(zones, (band.from + band.to) / 2);
  zones.forEach((z, i) => {
    if (z.to > band.from && z.from < band.to && indexBelow(spacings, z.spacing) >= 0 && (indexBelow(spacings, zones[best]!.spacing) < 0 || z.spacing > zones[best]!.spacing)) best = i;
  });
  return best;
}

/** The spacing at which enough rows stand within a band: n = ⌈F/(n_row·R)⌉ rows, its edges included, need (to − from)/(n − 1). */
function spacingWithin(band: BandUtilisation, rows: number, combinations: { id: string; resistance: number }[]): number {
  const r = combinations.find((c) => c.id === band.combination)?.resistance ?? 0;
  const n = r > 0 ? Math.ceil(band.force / (rows * r) - 1e-9) : Infinity;
  return n <= 1 ? band.to - band.from : (band.to - band.from) / (n - 1);
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

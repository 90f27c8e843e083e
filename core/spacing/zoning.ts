import { indexAtMost } from "./allowed-spacings.js";

/**
 * Zoning of a connector line as an optimisation.
 *
 * The member is cut into zones at candidate boundaries; each zone gets the largest allowed spacing s
 * whose rows can carry the demand over the zone widened by s/2 at each side (so the first and last row
 * of a zone, whose tributary reaches into the next zone, are covered too), and the end rows, set at the
 * end distance e from the member ends, carry the demand over e + s/2. Dynamic programming over the
 * boundaries minimises the number of rows with at most `maxZones` zones, each at least `minZoneLength` long.
 */
export interface ZoningProblem {
  length: number;
  /** Conservative maximum of the demand (rows per mm) over [a, b]; a and b may fall outside [0, L]. */
  demand: (a: number, b: number) => number;
  spacings: number[];
  endDistance: number;
  minZoneLength: number;
  /** Zones over the whole member (a mirrored plan counts the central zone once). */
  maxZones: number;
  /** Plan the left half and mirror it about midspan. */
  mirrored: boolean;
  /** Candidate boundaries, ascending, from 0 to L (or L/2 when mirrored). */
  grid: number[];
}

export interface PlannedZone {
  from: number;
  to: number;
  spacing: number;
  feasible: boolean;
}

export interface ZonePlan {
  zones: PlannedZone[];
  /** Rows the plan needs by its own count (the placed rows are counted again afterwards). */
  rows: number;
}

const INFEASIBLE_PENALTY = 1e6; // per mm of zone that cannot meet its demand

/** Per candidate zone, kept from call to call (a design plans its joints one after another): only ever grows. */
let table: ZoneTable = { cost: new Float64Array(0), rows: new Float64Array(0), spacing: new Float64Array(0), feasible: new Uint8Array(0), index: new Int32Array(0) };

export function planZones(p: ZoningProblem): ZonePlan {
  const g = p.grid;
  const n = g.length - 1;
  const half = p.mirrored ? Math.ceil((p.maxZones + 1) / 2) : p.maxZones;
  const size = (n + 1) * (n + 1);
  if (table.cost.length < size) table = { cost: new Float64Array(size), rows: new Float64Array(size), spacing: new Float64Array(size), feasible: new Uint8Array(size), index: new Int32Array(size) };
  // Zone (i, j) from g[i] to g[j]: cost NaN until evaluated, Infinity when not allowed; its rows, spacing and
  // feasibility are read only once it is evaluated.
  const { cost, rows: rowsOf, spacing: spacingOf, feasible: feasibleOf, index: indexOf } = table;
  cost.fill(NaN, 0, size);
  // Index of the spacing found for each zone that ends before the last boundary (−1: none carries, −2: not evaluated).
  // For one start, a longer zone's demand over its reach is no smaller, so its spacing is no larger: its search starts
  // at the spacing of the nearest shorter zone evaluated (the largest spacing that carries is the same).
  indexOf.fill(-2, 0, size);
  const zoneCost = (i: number, j: number): number => {
    const key = i * (n + 1) + j;
    if (Number.isNaN(cost[key]!)) {
      let ceiling = p.spacings.length - 1;
      if (j < n) {
        for (let k = key - 1; k > i * (n + 1) + i; k--) {
          if (indexOf[k]! === -2) continue;
          ceiling = indexOf[k]!;
          break;
        }
      }
      zoneInto(table, key, p, g[i]!, g[j]!, i === 0, j === n, ceiling);
    }
    return cost[key]!;
  };
  let previous = new Float64Array(n + 1).fill(Infinity);
  previous[0] = 0;
  const parent: Int32Array[] = [];
  let bestK = -1;
  let bestTotal = Infinity;
  for (let k = 1; k <= half; k++) {
    const current = new Float64Array(n + 1).fill(Infinity);
    const from = new Int32Array(n + 1).fill(-1);
    // The last layer is only read at the member's end (or midspan).
    for (let j = k === half ? n : 1; j <= n; j++) {
      for (let i = 0; i < j; i++) {
        const before = previous[i]!;
        if (before === Infinity) continue;
        const total = before + zoneCost(i, j);
        if (total < current[j]! - 1e-9) {
          current[j] = total;
          from[j] = i;
        }
      }
    }
    parent.push(from);
    if (current[n]! < bestTotal - 1e-9) {
      bestTotal = current[n]!;
      bestK = k;
    }
    previous = current;
  }
  if (bestK < 0) throw new Error("zoning found no plan: the whole length as one zone must always be possible");
  const left: PlannedZone[] = [];
  let rows = 0;
  for (let k = bestK, j = n; k > 0; k--) {
    const i = parent[k - 1]![j]!;
    const key = i * (n + 1) + j;
    left.unshift({ from: g[i]!, to: g[j]!, spacing: spacingOf[key]!, feasible: feasibleOf[key] === 1 });
    rows += rowsOf[key]!;
    j = i;
  }
  const merged = mergeEqual(left);
  if (!p.mirrored) return { zones: merged, rows };
  rows = 2 * rows;
  const last = merged[merged.length - 1]!;
  const full = [...merged.slice(0, -1), { ...last, to: p.length - last.from }];
  for (let k = merged.length - 2; k >= 0; k--) {
    const z = merged[k]!;
    full.push({ ...z, from: p.length - z.to, to: p.length - z.from });
  }
  return { zones: full, rows };
}

function mergeEqual(zones: PlannedZone[]): PlannedZone[] {
  const out: PlannedZone[] = [];
  for (const z of zones) {
    const prev = out[out.length - 1];
    if (prev && prev.spacing === z.spacing && prev.feasible === z.feasible) prev.to = z.to;
    else out.push({ ...z });
  }
  return out;
}

/** Spacing, feasibility and row count of one candidate zone [a, b]; null when the zone is not allowed. Exported for the optimality test. */
export function evaluateZone(p: ZoningProblem, a: number, b: number, first: boolean, last: boolean) {
  const t: ZoneTable = { cost: new Float64Array(1), rows: new Float64Array(1), spacing: new Float64Array(1), feasible: new Uint8Array(1), index: new Int32Array(1) };
  zoneInto(t, 0, p, a, b, first, last, p.spacings.length - 1);
  return t.cost[0] === Infinity ? null : { cost: t.cost[0]!, rows: t.rows[0]!, spacing: t.spacing[0]!, feasible: t.feasible[0] === 1 };
}

/** Candidate zones' cost (Infinity when not allowed), rows, spacing, feasibility and spacing index (−1: none carries). */
interface ZoneTable {
  cost: Float64Array;
  rows: Float64Array;
  spacing: Float64Array;
  feasible: Uint8Array;
  index: Int32Array;
}

/** evaluateZone into entry `key` of the table, knowing that no spacing above index `ceiling` carries the zone. */
function zoneInto(t: ZoneTable, key: number, p: ZoningProblem, a: number, b: number, first: boolean, last: boolean, ceiling: number): void {
  const L = p.length;
  const e = p.endDistance;
  const fullLength = p.mirrored && last ? L - 2 * a : b - a;
  const wholeMember = first && last;
  // Lengths compare to a tolerance relative to the member (as the rows are placed): a member length, end
  // distance or shortest zone converted from the other unit system sits a rounding error off a grid length.
  const tol = 1e-9 * Math.max(L, p.minZoneLength);
  const start = first ? e : a;
  if ((!wholeMember && fullLength < p.minZoneLength - tol) || (!last && b <= start + tol)) {
    t.cost[key] = Infinity;
    return;
  }
  const index = ceiling < 0 ? -1 : zoneSpacing(p, a, b, first, last, true, ceiling);
  const s = index < 0 ? p.spacings[0]! : p.spacings[index]!;
  let rows: number;
  if (p.mirrored && last) rows = (Math.ceil((L - 2 * start - tol) / s - 1e-9) + 1) / 2;
  else if (last) rows = Math.ceil((L - e - start - tol) / s - 1e-9) + 1;
  else rows = Math.ceil((b - start - tol) / s - 1e-9);
  t.cost[key] = index < 0 ? rows + INFEASIBLE_PENALTY * (b - a) : rows;
  t.rows[key] = rows;
  t.spacing[key] = s;
  t.feasible[key] = index < 0 ? 0 : 1;
  t.index[key] = index;
}

/**
 * The spacing the flow along the zone allows, leaving out the end row's reach (e + s/2): where this is
 * larger than the zone's spacing, the end row governs the zone. Undefined when no spacing carries it.
 */
export function spacingWithoutEndRow(p: ZoningProblem, a: number, b: number, first: boolean, last: boolean): number | undefined {
  const i = zoneSpacing(p, a, b, first, last, false, p.spacings.length - 1);
  return i < 0 ? undefined : p.spacings[i];
}

/** Index of the largest spacing, at most spacings[ceiling], that carries the zone; −1 when none does. */
function zoneSpacing(p: ZoningProblem, a: number, b: number, first: boolean, last: boolean, endRow: boolean, ceiling: number): number {
  // Start from the largest spacing the zone's own demand allows; the rows' reach into the neighbours only
  // tightens as s grows, so the largest spacing that carries its demand is found by bisection.
  const peak = p.demand(a, b);
  const topIndex = Math.min(ceiling, peak > 0 ? indexAtMost(p.spacings, 1 / peak) : p.spacings.length - 1);
  if (topIndex < 0) return -1;
  // Usually the zone's own demand governs and the first candidate carries it; otherwise the answer is
  // mostly a step or two below: step down 1, 2, 4, … until a spacing carries, then bisect the bracket.
  if (zoneCarries(p, a, b, first, last, p.spacings[topIndex]!, endRow)) return topIndex;
  let failing = topIndex;
  let carrying = -1;
  for (let step = 1; ; step *= 2) {
    const i = Math.max(0, topIndex - step);
    if (zoneCarries(p, a, b, first, last, p.spacings[i]!, endRow)) {
      carrying = i;
      break;
    }
    failing = i;
    if (i === 0) return -1;
  }
  while (failing - carrying > 1) {
    const mid = (failing + carrying) >> 1;
    if (zoneCarries(p, a, b, first, last, p.spacings[mid]!, endRow)) carrying = mid;
    else failing = mid;
  }
  return carrying;
}

/** Whether rows at spacing s over [a, b] carry the demand over their reach, the end rows' included. */
function zoneCarries(p: ZoningProblem, a: number, b: number, first: boolean, last: boolean, s: number, endRow: boolean): boolean {
  const L = p.length;
  const e = p.endDistance;
  const reachLeft = first ? 0 : a - s / 2;
  const reachRight = last ? (p.mirrored ? b : L) : b + s / 2;
  // The rows' verification tolerance (utilisation ≤ 1 + 1e-9): a zone exactly at capacity is designed alike in either unit system.
  if (s * p.demand(reachLeft, reachRight) > 1 + 1e-9) return false;
  if (!endRow) return true;
  if (first && e > s / 2 && (e + s / 2) * p.demand(0, e + s / 2) > 1 + 1e-9) return false;
  if (last && !p.mirrored && e > s / 2 && (e + s / 2) * p.demand(L - e - s / 2, L) > 1 + 1e-9) return false;
  return true;
}

/** Candidate zone boundaries: multiples of a round step from the left end, and the end itself. */
export function boundaryGrid(end: number, step: number): number[] {
  const out: number[] = [];
  for (let k = 0; k * step < end - 1e-9 * end; k++) out.push(k * step);
  out.push(end);
  return out;
}

/** A round step for zone boundaries giving at most `cells` cells over `end`, mm. */
export function roundStep(end: number, system: "si" | "us", cells = 48): number {
  const steps = system === "si" ? [10, 20, 25, 50, 100, 200, 250, 500, 1000, 2000] : [0.5, 1, 2, 3, 6, 12, 24, 48, 96].map((s) => s * 25.4);
  // Relative tolerance: the same member converted to the other unit system keeps its grid.
  return steps.find((s) => end / s <= cells * (1 + 1e-9)) ?? steps[steps.length - 1]!;
}

/** Range maximum over grid cells by a sparse table; queries widen to whole cells (conservative). */
export class CellMaxima {
  private readonly table: Float64Array[];
  /** Cells per mm at the grid's first pitch: a first guess of where a point falls, corrected against the grid. */
  private readonly perMm: number;

  constructor(
    private readonly grid: number[],
    cellMax: number[],
  ) {
    let prev = Float64Array.from(cellMax);
    this.table = [prev];
    for (let w = 1; 2 * w <= cellMax.length; w *= 2) {
      const next = new Float64Array(prev.length - w);
      for (let i = 0; i < next.length; i++) next[i] = Math.max(prev[i]!, prev[i + w]!);
      this.table.push((prev = next));
    }
    const pitch = grid.length > 1 ? grid[1]! - grid[0]! : 0;
    this.perMm = pitch > 0 ? 1 / pitch : 0;
  }

  /** Max over the cells that meet [a, b], clipped to the grid. */
  over(a: number, b: number): number {
    const g = this.grid;
    const lo = Math.max(a, g[0]!);
    const hi = Math.min(b, g[g.length - 1]!);
    if (hi < lo) return 0;
    const i = Math.max(0, this.countAtMost(lo, false) - 1);
    const j = Math.min(g.length - 2, Math.max(i, this.countAtMost(hi, true) - 1));
    const level = 31 - Math.clz32(j - i + 1);
    const row = this.table[level]!;
    return Math.max(row[i]!, row[j - (1 << level) + 1]!);
  }

  /** How many grid points lie at or below x (below x when `strictly`): a binary search's answer, from a guess. */
  private countAtMost(x: number, strictly: boolean): number {
    const g = this.grid;
    let k = Math.floor((x - g[0]!) * this.perMm) + 1;
    if (!(k >= 0)) k = 0;
    else if (k > g.length) k = g.length;
    if (strictly) {
      while (k > 0 && g[k - 1]! >= x) k--;
      while (k < g.length && g[k]! < x) k++;
    } else {
      while (k > 0 && g[k - 1]! > x) k--;
      while (k < g.length && g[k]! <= x) k++;
    }
    return k;
  }
}

/**
 * Detailing of the connectors of a multi-ply member: rows across the depth within the edge distances,
 * staggering along the member, and which interfaces a face-driven fastener can reach. The distances
 * come from the connector kind (EN 1995-1-1 Tables 8.2/8.4, NDS Tables 12.5.1): in a side-loaded
 * member the top edge is the loaded edge in the ply that gives load and the bottom edge in the plies
 * that take it, so pass loaded-edge distances for both. mm.
 */

export interface RowLayout {
  /** Heights of the rows above the member's bottom edge, mm, bottom first. */
  positions: number[];
  /** Distance between adjacent rows, mm (0 for one row). */
  rowSpacing: number;
  fits: boolean;
  reasons: string[];
  /**
   * h_e for the splitting check of connections loaded perpendicular to grain (EN 1995-1-1 §8.1.4 [M]):
   * from the bottom edge to the farthest row (plies that take load) and from the top edge (the ply that gives it), mm.
   */
  effectiveDepth: { fromBottom: number; fromTop: number };
}

/**
 * Rows spread evenly between the top and bottom edge distances (one row at mid-depth), checked against
 * the edge distances and the smallest spacing between rows perpendicular to grain.
 */
export function rowsAcrossDepth(p: { depth: number; rows: number; edgeDistanceTop: number; edgeDistanceBottom: number; minRowSpacing: number }): RowLayout {
  if (!Number.isInteger(p.rows) || p.rows < 1) throw new RangeError(`rows must be a whole number ≥ 1, got ${p.rows}`);
  const reasons: string[] = [];
  const lo = p.edgeDistanceBottom;
  const hi = p.depth - p.edgeDistanceTop;
  let positions: number[];
  let rowSpacing = 0;
  if (p.rows === 1) {
    positions = [p.depth / 2];
  } else {
    rowSpacing = (hi - lo) / (p.rows - 1);
    positions = Array.from({ length: p.rows }, (_, k) => lo + k * rowSpacing);
  }
  const tol = 1e-9 * p.depth;
  if (hi < lo - tol) reasons.push(`the depth ${p.depth} mm is less than the two edge distances (${p.edgeDistanceBottom} + ${p.edgeDistanceTop} mm)`);
  if (p.rows === 1 && (positions[0]! < lo - tol || positions[0]! > hi + tol)) reasons.push("a single row at mid-depth is closer to an edge than its edge distance");
  if (p.rows > 1 && rowSpacing < p.minRowSpacing - tol) {
    reasons.push(`${p.rows} rows are ${round(rowSpacing)} mm apart, less than the ${p.minRowSpacing} mm required perpendicular to grain`);
  }
  return {
    positions,
    rowSpacing,
    fits: reasons.length === 0,
    reasons,
    effectiveDepth: { fromBottom: Math.max(...positions), fromTop: p.depth - Math.min(...positions) },
  };
}

/**
 * Offsets along the member of each row when rows are staggered: alternate rows shifted by half the
 * spacing, so that no two connectors share a grain line at the same station [CP].
 */
export function staggeredOffsets(rows: number, spacing: number): number[] {
  return Array.from({ length: rows }, (_, k) => (k % 2 === 0 ? 0 : spacing / 2));
}

export interface FastenerReach {
  /** Interface k (1-based) lies between ply k and ply k + 1. */
  interface: number;
  /** A fastener driven from the left face is anchored across this interface (point-side penetration met). */
  fromLeft: boolean;
  fromRight: boolean;
}

/**
 * Which interfaces a face-driven fastener (nail, screw) of a given length can anchor across: from
 * the left face it passes interface k when length ≥ t_1 + … + t_k + the minimum point-side
 * penetration into ply k + 1; likewise from the right. Interfaces that neither face reaches need
 * through-bolts or longer screws. mm.
 */
export function fastenerReach(p: { thicknesses: number[]; length: number; minPenetration: number }): { interfaces: FastenerReach[]; unreachable: number[] } {
  const n = p.thicknesses.length;
  const total = p.thicknesses.reduce((a, b) => a + b, 0);
  const tol = 1e-9 * total;
  const interfaces: FastenerReach[] = [];
  let left = 0;
  for (let k = 1; k < n; k++) {
    left += p.thicknesses[k - 1]!;
    const right = total - left;
    interfaces.push({
      interface: k,
      fromLeft: p.length >= left + p.minPenetration - tol,
      fromRight: p.length >= right + p.minPenetration - tol,
    });
  }
  return { interfaces, unreachable: interfaces.filter((i) => !i.fromLeft && !i.fromRight).map((i) => i.interface) };
}

const round = (x: number) => Math.round(x * 10) / 10;

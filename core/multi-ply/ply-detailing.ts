/**
 * Detailing of the connectors of a multi-ply member: which interfaces a face-driven fastener can
 * reach. (Rows across the depth are checked by the connector kinds against the part's width.) mm.
 */

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


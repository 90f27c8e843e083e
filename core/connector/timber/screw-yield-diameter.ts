/**
 * Length of the threads bearing in the member that holds them, mm: the threaded part (tip excluded)
 * lies at the point end of the penetration, so it overlaps the member's bearing length over
 * min(penetration, bearing) − max(0, penetration − threads). Threads of unknown length are taken to fill
 * the penetration and cross the shear plane.
 */
export function threadBearing(p: { penetration: number; bearingLength: number; threadLength: number | undefined }): number {
  const bearing = Math.max(0, Math.min(p.penetration, p.bearingLength));
  if (p.threadLength === undefined) return bearing;
  return Math.max(0, bearing - Math.max(0, p.penetration - p.threadLength));
}

/**
 * The diameter a screw's yield model uses. NDS-2018 §12.3.7 [M]: the root diameter D_r, except that the
 * shank diameter D may be used where the threads bearing in the member that holds them are at most a
 * quarter of that member's bearing length. EN 1995-1-1 §8.7.1: d_ef = the smooth shank diameter where the
 * smooth shank reaches at least 4d into the point-side member, else 1.1 × the root diameter. mm.
 */
export function screwYieldDiameter(p: {
  nds: boolean;
  shank: number;
  root: number;
  /** NDS: threads bearing in the member that holds them, and that member's bearing length. */
  threadBearing: number;
  bearingLength: number;
  /** EN 1995-1-1: whether the threads cross the shear plane, and the smooth shank's reach into the point-side member. */
  threadsInPlane: boolean;
  shankPenetration: number;
}): { yieldDiameter: number; note: string } {
  if (p.nds) {
    const share = p.bearingLength > 0 ? Math.round((100 * p.threadBearing) / p.bearingLength) : 100;
    return p.threadBearing <= p.bearingLength / 4 + 1e-9
      ? { yieldDiameter: p.shank, note: `shank diameter D: threads bear over ${share} % of the bearing length in the member holding them, at most ¼ (NDS-2018 §12.3.7 [M])` }
      : { yieldDiameter: p.root, note: `root diameter D_r: threads bear over ${share} % of the bearing length in the member holding them, more than ¼ (NDS-2018 §12.3.7 [M])` };
  }
  const shankOk = !p.threadsInPlane && p.shankPenetration >= 4 * p.shank;
  return shankOk
    ? { yieldDiameter: p.shank, note: "d_ef = smooth shank diameter (§8.7.1(2))" }
    : { yieldDiameter: 1.1 * p.root, note: "d_ef = 1.1 × root diameter (§8.7.1(3))" };
}

/**
 * The diameter a screw's yield model uses. NDS-2018: the root diameter D_r where threads cross the shear
 * plane, else the shank (§12.3.7 [M]). EN 1995-1-1 §8.7.1: d_ef = the smooth shank diameter where the smooth
 * shank reaches at least 4d into the point-side member, else 1.1 × the root diameter. mm.
 */
export function screwYieldDiameter(p: { nds: boolean; shank: number; root: number; threadsInPlane: boolean; shankPenetration: number }): { yieldDiameter: number; note: string } {
  if (p.nds) {
    return p.threadsInPlane
      ? { yieldDiameter: p.root, note: "root diameter D_r: threads in the shear plane" }
      : { yieldDiameter: p.shank, note: "shank diameter: the shank crosses the shear plane" };
  }
  const shankOk = !p.threadsInPlane && p.shankPenetration >= 4 * p.shank;
  return shankOk
    ? { yieldDiameter: p.shank, note: "d_ef = smooth shank diameter (§8.7.1(2))" }
    : { yieldDiameter: 1.1 * p.root, note: "d_ef = 1.1 × root diameter (§8.7.1(3))" };
}

import { foldAngle } from "./nds-yield-limit.js";
import { fallsShort } from "../../units/limits.js";

/** Dowel bearing strength of a wood member, psi (NDS-2018 §12.3.3, Table 12.3.3 footnotes). */
export interface NdsBearing {
  value: number;
  /** F_e∥ and F_e⊥ where they differ (D ≥ 1/4 in); null for small dowels, whose F_e does not depend on the angle. */
  parallel: number | null;
  perpendicular: number | null;
  formula: string;
}

/**
 * F_e of wood from its specific gravity G:
 * D < 1/4 in: F_e = 16 600 G^1.84 at any angle;
 * 1/4 ≤ D ≤ 1 in: F_e∥ = 11 200 G, F_e⊥ = 6 100 G^1.45/√D, combined at angle θ by Hankinson's formula.
 * D is the diameter in the yield model; for a threaded fastener the √D of F_e⊥ takes the nominal (shank)
 * diameter (our reading of Table 12.3.3's footnote [M]; it gives the lower F_e⊥ of the two readings).
 */
export function ndsWoodBearing(specificGravity: number, diameterIn: number, angleDeg: number, nominalDiameterIn = diameterIn): NdsBearing {
  const G = specificGravity;
  if (fallsShort(diameterIn, 0.25)) {
    return { value: 16_600 * G ** 1.84, parallel: null, perpendicular: null, formula: "F_e = 16 600 G^1.84 (D < 1/4 in)" };
  }
  const Dperp = Math.max(diameterIn, nominalDiameterIn);
  const parallel = 11_200 * G;
  const perpendicular = (6_100 * G ** 1.45) / Math.sqrt(Dperp);
  const theta = (foldAngle(angleDeg) * Math.PI) / 180;
  const value = hankinson(parallel, perpendicular, theta);
  const nominal = Dperp > diameterIn + 1e-9 ? ` with the nominal D = ${Number(Dperp.toPrecision(4))} in (Table 12.3.3 footnote, as read [M])` : "";
  return { value, parallel, perpendicular, formula: `F_e∥ = 11 200 G; F_e⊥ = 6 100 G^1.45/√D${nominal}; F_eθ by Hankinson (NDS App. J)` };
}

/** Hankinson's formula: F_θ = F∥ F⊥/(F∥ sin²θ + F⊥ cos²θ), θ in radians. */
export function hankinson(parallel: number, perpendicular: number, thetaRad: number): number {
  const s = Math.sin(thetaRad) ** 2;
  const c = Math.cos(thetaRad) ** 2;
  return (parallel * perpendicular) / (parallel * s + perpendicular * c);
}

/** F_e of a steel side or main plate: 1.5 F_u hot-rolled (t ≥ 1/4 in), 1.375 F_u cold-formed (t < 1/4 in). */
export function ndsSteelBearing(tensileStrengthPsi: number, thicknessIn: number): NdsBearing {
  const hotRolled = !fallsShort(thicknessIn, 0.25);
  return {
    value: (hotRolled ? 1.5 : 1.375) * tensileStrengthPsi,
    parallel: null,
    perpendicular: null,
    formula: hotRolled ? "F_e = 1.5 F_u (hot-rolled steel, t ≥ 1/4 in)" : "F_e = 1.375 F_u (cold-formed steel, t < 1/4 in)",
  };
}

/** Diameters the NDS nail tables' F_yb footnotes cover, in [M]. */
export const NDS_NAIL_FYB_RANGE_IN = [0.099, 0.375] as const;

/**
 * F_yb of nails, spikes and small screws by diameter, psi (the diameter bands of the NDS nail tables'
 * footnotes [M]); null outside the diameters they cover, where F_yb must be given.
 */
export function ndsNailBendingYield(diameterIn: number): number | null {
  const D = diameterIn;
  if (D < NDS_NAIL_FYB_RANGE_IN[0] - 1e-9 || D > NDS_NAIL_FYB_RANGE_IN[1] + 1e-9) return null;
  if (D <= 0.142) return 100_000;
  if (D <= 0.177) return 90_000;
  if (D <= 0.236) return 80_000;
  if (D <= 0.273) return 70_000;
  if (D <= 0.344) return 60_000;
  return 45_000;
}

/** F_yb of lag screws by shank diameter, psi: 70 ksi at 1/4 in, 60 ksi at 5/16 in, 45 ksi at 3/8 in and larger. */
export function ndsLagScrewBendingYield(diameterIn: number): number {
  if (diameterIn < 0.3125 - 1e-6) return 70_000;
  if (diameterIn < 0.375 - 1e-6) return 60_000;
  return 45_000;
}

/** F_yb of bolts and dowels, psi (the value behind the NDS bolt tables). */
export const NDS_BOLT_BENDING_YIELD_PSI = 45_000;

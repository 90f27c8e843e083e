import type { DurationClass } from "../connector-kind.js";
import { fallsShort } from "../../units/limits.js";

/**
 * NDS-2018 adjustment factors for connections (Table 11.3.1): load duration C_D (ASD only, §2.3.2
 * and §11.3.2), wet service C_M (Table 11.3.3), temperature C_t (Table 11.3.4), group action C_g
 * (§11.3.6), and the LRFD format conversion K_F, resistance factor φ_z and time effect λ.
 */

/** C_D of each load category: permanent (dead) 0.9, ten years (occupancy live) 1.0, two months (snow) 1.15, seven days (roof live, construction) 1.25, ten minutes (wind) 1.6. */
export const ndsLoadDurationByCategory: Record<string, number> = { dead: 0.9, live: 1.0, snow: 1.15, "roof-live": 1.25, wind: 1.6 };

/** C_D by duration class where no load category is known. */
const byDuration: Record<DurationClass, number> = { permanent: 0.9, long: 1.0, medium: 1.15, short: 1.25, instantaneous: 1.6, unspecified: 1.0 };

/** Connections may not take C_D above 1.6 (§11.3.2). */
export const NDS_CONNECTION_CD_CAP = 1.6;

/** C_D of a combination: that of its shortest-duration load, capped at 1.6. */
export function ndsLoadDurationFactor(categories: string[], duration: DurationClass): { value: number; load: string } {
  const known = categories.filter((c) => c in ndsLoadDurationByCategory);
  if (known.length === 0) return { value: Math.min(byDuration[duration], NDS_CONNECTION_CD_CAP), load: `duration class ${duration}` };
  const load = known.reduce((a, b) => (ndsLoadDurationByCategory[b]! > ndsLoadDurationByCategory[a]! ? b : a));
  return { value: Math.min(ndsLoadDurationByCategory[load]!, NDS_CONNECTION_CD_CAP), load };
}

/** λ of a combination (NDS Table N3): 0.6 for dead load alone, 0.8 with occupancy live, snow or roof live, 1.0 with wind. */
export function ndsTimeEffectFactor(categories: string[]): { value: number; load: string } {
  const byCategory: Record<string, number> = { dead: 0.6, live: 0.8, snow: 0.8, "roof-live": 0.8, wind: 1.0 };
  const known = categories.filter((c) => c in byCategory);
  if (known.length === 0) return { value: 0.8, load: "no load category given" };
  const load = known.reduce((a, b) => (byCategory[b]! > byCategory[a]! ? b : a));
  return { value: byCategory[load]!, load };
}

/** LRFD format conversion factor and resistance factor for connections (Table 11.3.1). */
export const NDS_KF_CONNECTIONS = 3.32;
export const NDS_PHI_CONNECTIONS = 0.65;

export const ndsMoistureConditions = ["dry", "wet", "fabricated-wet"] as const;
export type NdsMoisture = (typeof ndsMoistureConditions)[number];

/**
 * C_M for lateral loads on dowel-type fasteners: 1.0 fabricated and used dry (MC ≤ 19 %); 0.7 in
 * service above 19 %; 0.4 fabricated wet and used dry, except 1.0 for D < 1/4 in.
 */
export function ndsWetServiceFactor(moisture: NdsMoisture, diameterIn: number): number {
  if (moisture === "dry") return 1.0;
  if (moisture === "wet") return 0.7;
  return fallsShort(diameterIn, 0.25) ? 1.0 : 0.4;
}

export const ndsTemperatureRanges = ["up-to-100F", "100-125F", "125-150F"] as const;
export type NdsTemperature = (typeof ndsTemperatureRanges)[number];

/** C_t for connections: 1.0 up to 100 °F; 0.8 dry / 0.7 wet to 125 °F; 0.7 dry / 0.5 wet to 150 °F. */
export function ndsTemperatureFactor(temperature: NdsTemperature, moisture: NdsMoisture): number {
  const wet = moisture === "wet";
  if (temperature === "up-to-100F") return 1.0;
  if (temperature === "100-125F") return wet ? 0.7 : 0.8;
  return wet ? 0.5 : 0.7;
}

/** End grain factor C_eg for dowel-type fasteners loaded laterally in end grain. */
export const NDS_END_GRAIN_FACTOR = 0.67;
/** Toe-nail factor C_tn, lateral loads. */
export const NDS_TOE_NAIL_FACTOR = 0.83;

export interface NdsGroupActionInput {
  /** Fasteners in the row n. */
  fasteners: number;
  /** Spacing of fasteners in the row s, in. */
  spacingIn: number;
  diameterIn: number;
  /** E_m A_m and E_s A_s of the main and side members, lb. */
  mainStiffnessLb: number;
  sideStiffnessLb: number;
  /** Wood-to-metal connections use γ = 270 000 D^1.5, wood-to-wood 180 000 D^1.5 (lb/in). */
  woodToMetal: boolean;
}

/**
 * Group action factor C_g of NDS §11.3.6 (eq. 11.3-1):
 * C_g = m(1 − m^2n)/(n[(1 + R_EA m^n)(1 + m) − 1 + m^2n]) · (1 + R_EA)/(1 − m),
 * u = 1 + γ(s/2)(1/E_mA_m + 1/E_sA_s), m = u − √(u² − 1), R_EA the smaller stiffness ratio.
 */
export function ndsGroupActionFactor(p: NdsGroupActionInput): { value: number; gamma: number; u: number; m: number; REA: number } {
  const n = p.fasteners;
  const gamma = (p.woodToMetal ? 270_000 : 180_000) * p.diameterIn ** 1.5;
  const REA = Math.min(p.sideStiffnessLb / p.mainStiffnessLb, p.mainStiffnessLb / p.sideStiffnessLb);
  const u = 1 + gamma * (p.spacingIn / 2) * (1 / p.mainStiffnessLb + 1 / p.sideStiffnessLb);
  const m = u - Math.sqrt(u * u - 1);
  if (n <= 1 || !(m > 0 && m < 1)) return { value: 1, gamma, u, m, REA };
  const value = ((m * (1 - m ** (2 * n))) / (n * ((1 + REA * m ** n) * (1 + m) - 1 + m ** (2 * n)))) * ((1 + REA) / (1 - m));
  return { value: Math.min(value, 1), gamma, u, m, REA };
}

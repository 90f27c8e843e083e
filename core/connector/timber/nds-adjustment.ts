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

/** A load of a combination as Table N3 reads it: the built-in category it acts as and its duration class. */
export interface NdsFormLoad {
  /** How the load is named in the working: D, L, S, or the id of a category of the job's own. */
  symbol: string;
  actsAs: "dead" | "live" | "roof-live" | "snow" | "wind";
  duration: Exclude<DurationClass, "unspecified">;
}

/** λ by duration class, for a load whose category does not fix the row of Table N3 (the longer the load, the lower). */
const lambdaByDuration: Record<NdsFormLoad["duration"], number> = { permanent: 0.6, long: 0.7, medium: 0.8, short: 0.8, instantaneous: 1.0 };

/**
 * λ when `load` is the principal load of the combination (NDS-2018 Table N3, from memory [M]):
 * 1.2D + 1.6L + 0.5(Lr or S): 0.7 when L is from storage, 0.8 occupancy, 1.25 impact;
 * 1.2D + 1.6(Lr or S) + (L or 0.5W): 0.8; 1.2D + 1.0W + L + 0.5(Lr or S) and 0.9D + 1.0W: 1.0.
 * A live-type load's use is read from its duration class: permanent as dead load (0.6), long-term storage,
 * medium- and short-term occupancy, instantaneous impact. Any other load takes the lower of its row and its
 * duration class's value, so a category of the job's own declared longer than its model never gains.
 */
export function ndsPrincipalTimeEffect(load: NdsFormLoad): { value: number; load: string } {
  if (load.actsAs === "live") {
    const use = { permanent: "permanent, as dead load", long: "storage", medium: "occupancy", short: "occupancy", instantaneous: "impact" }[load.duration];
    const value = { permanent: 0.6, long: 0.7, medium: 0.8, short: 0.8, instantaneous: 1.25 }[load.duration];
    return { value, load: `${load.symbol}, live load from ${use}` };
  }
  if (load.actsAs === "dead") return { value: 0.6, load: `${load.symbol}, dead load` };
  const row = load.actsAs === "wind" ? 1.0 : 0.8;
  // Wind is a ten-minute load to the NDS whether EN 1995 classes it short-term or instantaneous (beam.windDuration
  // chooses the latter for k_mod only): only a longer class than short-term lowers its row.
  const duration = load.actsAs === "wind" && load.duration === "short" ? "instantaneous" : load.duration;
  return { value: Math.min(row, lambdaByDuration[duration]), load: load.symbol };
}

/**
 * λ of a combination (NDS-2018 Table N3 [M]) from its form: 0.6 for dead load alone (1.4D); otherwise that of
 * the principal load (the 1.6 load of ASCE/SEI 7 combinations 2 and 3, 1.0W in 4 and 5). Where the form names
 * no principal load, or it is absent from this combination (a subset, or a live-load pattern that leaves it
 * off), the least λ any variable load present would take as principal (never more than the table's row).
 */
export function ndsTimeEffectFactor(form: { principal: NdsFormLoad | null; variables: NdsFormLoad[] }): { value: number; load: string } {
  if (form.variables.length === 0) return { value: 0.6, load: "dead load alone (1.4D)" };
  if (form.principal && form.variables.some((v) => v.symbol === form.principal!.symbol)) {
    const p = ndsPrincipalTimeEffect(form.principal);
    return { value: p.value, load: `principal load ${p.load}` };
  }
  const least = form.variables.map(ndsPrincipalTimeEffect).reduce((a, b) => (b.value < a.value ? b : a));
  return { value: least.value, load: `no principal load named: the least λ of the loads present, ${least.load} as principal` };
}

/**
 * λ for a connection: the combination's, at most 1.0 (NDS Table N3 note, from memory [M]: time effect factors
 * above 1.0 do not apply to connections; so too the impact C_D, Table 2.3.2 note). A context without the
 * combination's form (a bare check) takes the least λ of the built-in categories it names.
 */
export function ndsConnectionTimeEffect(timeEffect: { value: number; reason: string } | undefined, categories: string[]): { value: number; load: string } {
  let te = timeEffect ? { value: timeEffect.value, load: timeEffect.reason } : null;
  if (!te) {
    const builtIn: Record<string, NdsFormLoad> = {
      live: { symbol: "L", actsAs: "live", duration: "medium" },
      "roof-live": { symbol: "Lr", actsAs: "roof-live", duration: "short" },
      snow: { symbol: "S", actsAs: "snow", duration: "short" },
      wind: { symbol: "W", actsAs: "wind", duration: "instantaneous" },
    };
    te = ndsTimeEffectFactor({ principal: null, variables: categories.flatMap((c) => (builtIn[c] ? [builtIn[c]!] : [])) });
  }
  return te.value > NDS_CONNECTION_LAMBDA_CAP ? { value: NDS_CONNECTION_LAMBDA_CAP, load: `${te.load}; at most 1.0 for connections` } : te;
}

/** Time effect factors above 1.0 do not apply to connections (NDS Table N3 note [M]). */
export const NDS_CONNECTION_LAMBDA_CAP = 1.0;

/** LRFD format conversion factor and resistance factor for connections (Table 11.3.1). */
export const NDS_KF_CONNECTIONS = 3.32;
export const NDS_PHI_CONNECTIONS = 0.65;

export const ndsMoistureConditions = ["dry", "wet", "fabricated-wet"] as const;
export type NdsMoisture = (typeof ndsMoistureConditions)[number];

/**
 * C_M for lateral loads on dowel-type fasteners (Table 11.3.3 and its footnote [M]): 1.0 fabricated and
 * used dry (MC ≤ 19 %); 0.7 in service above 19 %; fabricated wet and used dry 0.4, or 0.7 for D < 1/4 in,
 * and 1.0 for one fastener, a single row parallel to grain, or rows parallel to grain with a separate
 * splice plate each. D is the nominal diameter.
 */
export function ndsWetServiceFactor(moisture: NdsMoisture, diameterIn: number, layout: { singleRowParallelToGrain: boolean } = { singleRowParallelToGrain: false }): { value: number; why: string } {
  if (moisture === "dry") return { value: 1.0, why: "dry" };
  if (moisture === "wet") return { value: 0.7, why: "wet in service" };
  if (layout.singleRowParallelToGrain) return { value: 1.0, why: "fabricated wet, used dry; a single row of fasteners parallel to grain" };
  return fallsShort(diameterIn, 0.25) ? { value: 0.7, why: "fabricated wet, used dry; D < 1/4 in" } : { value: 0.4, why: "fabricated wet, used dry; more than one row, D ≥ 1/4 in" };
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
 * E_s A_s for the group action factor, lb: the side member's in single shear; in double shear the sum over
 * the two outer members (NDS §11.3.6, A_s the sum of the side members' areas [M]).
 */
export function ndsGroupSideStiffness(outerMembers: readonly { E: number; area: number }[]): number {
  return outerMembers.reduce((sum, m) => sum + m.E * m.area, 0);
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

import type { BoltGroup } from "./bolt-sizes.js";

/**
 * One bolt by ANSI/AISC 360-16 §J3, in kips and inches: shear (§J3.6, Table J3.2), bearing and
 * tear-out at the holes of each ply (§J3.10) and slip resistance (§J3.8), as LRFD design strength
 * φR_n or ASD allowable strength R_n/Ω.
 */
export const holeTypes = ["standard", "oversized", "short-slot-transverse", "short-slot-parallel", "long-slot-transverse", "long-slot-parallel"] as const;
export type HoleType = (typeof holeTypes)[number];

/** F_nv of Table J3.2, ksi. */
export function nominalShearStress(group: BoltGroup, threads: "included" | "excluded"): number {
  if (group === "A307") return 27;
  if (group === "A") return threads === "included" ? 54 : 68;
  return threads === "included" ? 68 : 84;
}

/** Slip-critical resistance factor and safety factor by hole type (§J3.8). */
export function slipFactors(hole: HoleType): { phi: number; omega: number } {
  if (hole === "standard" || hole === "short-slot-transverse") return { phi: 1.0, omega: 1.5 };
  if (hole === "oversized" || hole === "short-slot-parallel") return { phi: 0.85, omega: 1.76 };
  return { phi: 0.7, omega: 2.14 };
}

export interface AiscPly {
  name: string;
  thicknessIn: number;
  tensileStrengthKsi: number;
  /** Share of the bolt force this ply carries: 1 for the plies of a single-shear joint and the middle ply of a double-shear one, 1/2 for each outer ply. */
  share: number;
}

export interface AiscBoltInput {
  diameterIn: number;
  group: BoltGroup;
  threads: "included" | "excluded";
  shearPlanes: 1 | 2;
  plies: AiscPly[];
  /** Hole dimension along the load, in (for clear distances). */
  holeAlongLoadIn: number;
  holeType: HoleType;
  /** End distance of the end bolt and spacing of the others, along the load, in. */
  endDistanceIn: number;
  spacingIn: number;
  deformationConsidered: boolean;
  slip: { surface: "A" | "B"; pretensionKips: number; fillers: number } | null;
  basis: "allowable" | "factored";
}

export interface AiscLimitState {
  name: string;
  /** Nominal strength R_n, kips, for the whole bolt. */
  nominal: number;
  phi: number;
  omega: number;
  /** φR_n or R_n/Ω, kips. */
  available: number;
  equation: string;
}

export function aiscBolt(p: AiscBoltInput): { limitStates: AiscLimitState[]; governing: AiscLimitState; areaIn2: number; Fnv: number } {
  const lrfd = p.basis === "factored";
  const states: AiscLimitState[] = [];
  const add = (name: string, nominal: number, phi: number, omega: number, equation: string) => states.push({ name, nominal, phi, omega, available: lrfd ? phi * nominal : nominal / omega, equation });
  const Ab = (Math.PI * p.diameterIn ** 2) / 4;
  const Fnv = nominalShearStress(p.group, p.threads);
  add("bolt shear", Fnv * Ab * p.shearPlanes, 0.75, 2.0, `R_n = F_nv A_b n_s = ${Fnv} ksi × ${round(Ab)} in² × ${p.shearPlanes} (Table J3.2, eq. J3-1)`);
  const [cTear, cBear] = p.holeType === "long-slot-transverse" ? [1.0, 2.0] : p.deformationConsidered ? [1.2, 2.4] : [1.5, 3.0];
  const eq = p.holeType === "long-slot-transverse" ? "J3-6e/f" : p.deformationConsidered ? "J3-6a/c" : "J3-6b/d";
  for (const ply of p.plies) {
    const t = ply.thicknessIn;
    const Fu = ply.tensileStrengthKsi;
    const bearing = cBear * p.diameterIn * t * Fu;
    const lcEnd = p.endDistanceIn - p.holeAlongLoadIn / 2;
    const lcInner = p.spacingIn - p.holeAlongLoadIn;
    const tearEnd = cTear * lcEnd * t * Fu;
    const tearInner = cTear * lcInner * t * Fu;
    const perBolt = (x: number) => x / ply.share;
    add(`bearing at the holes of ${ply.name}`, perBolt(bearing), 0.75, 2.0, `R_n = ${cBear} d t F_u (eq. ${eq})${ply.share < 1 ? ", the ply carries half the bolt force" : ""}`);
    add(`tear-out at the end bolt of ${ply.name}`, perBolt(tearEnd), 0.75, 2.0, `R_n = ${cTear} l_c t F_u, l_c = L_e − d_h/2 = ${round(lcEnd)} in (eq. ${eq})`);
    add(`tear-out between bolts of ${ply.name}`, perBolt(tearInner), 0.75, 2.0, `R_n = ${cTear} l_c t F_u, l_c = s − d_h = ${round(lcInner)} in (eq. ${eq})`);
  }
  if (p.slip) {
    const mu = p.slip.surface === "A" ? 0.3 : 0.5;
    const hf = p.slip.fillers >= 2 ? 0.85 : 1.0;
    const f = slipFactors(p.holeType);
    add(`slip, Class ${p.slip.surface} surface`, mu * 1.13 * hf * p.slip.pretensionKips * p.shearPlanes, f.phi, f.omega, `R_n = μ D_u h_f T_b n_s = ${mu} × 1.13 × ${hf} × ${p.slip.pretensionKips} kips × ${p.shearPlanes} (eq. J3-4)`);
  }
  const governing = states.reduce((a, b) => (b.available < a.available ? b : a));
  return { limitStates: states, governing, areaIn2: Ab, Fnv };
}

const round = (x: number) => Number(x.toPrecision(4));

import { exceeds, fallsShort } from "../../units/limits.js";

/**
 * Strength of a fillet weld per unit length loaded along its axis: AISC 360-16 §J2.4 (Table J2.5) in
 * kips and inches, and EN 1993-1-8:2005 §4.5.3.3 (the simplified method) in N and mm.
 */
export const electrodes = ["E60", "E70", "E80", "E90", "E100", "E110"] as const;
export type Electrode = (typeof electrodes)[number];

/** Electrode classification strength F_EXX, ksi. */
export const electrodeStrengthKsi = (e: Electrode) => Number(e.slice(1));

export interface AiscWeldStrength {
  /** Nominal strength per length R_n = F_nw A_we, kip/in. */
  nominal: number;
  /** φR_n or R_n/Ω, kip/in. */
  available: number;
  Fnw: number;
  phi: number;
  omega: number;
}

/** R_n = 0.60 F_EXX × throat per unit length (longitudinal loading, no directional increase); φ = 0.75, Ω = 2.00. */
export function aiscFilletStrength(p: { throatIn: number; electrode: Electrode; basis: "allowable" | "factored" }): AiscWeldStrength {
  const Fnw = 0.6 * electrodeStrengthKsi(p.electrode);
  const nominal = Fnw * p.throatIn;
  const [phi, omega] = [0.75, 2.0];
  return { nominal, available: p.basis === "factored" ? phi * nominal : nominal / omega, Fnw, phi, omega };
}

/**
 * Base metal at one fusion face of an equal-leg fillet, per unit length: shear rupture on A_BM = w per
 * unit length, R_n = 0.60 F_u w (AISC 360-16 §J2.4(a) eq. J2-2, Table J2.5 "base metal governed by
 * J4", §J4.2(b) eq. J4-4), φ = 0.75, Ω = 2.00 [M]. §J2.4 names the base metal's limit states as tensile
 * and shear rupture; shear yielding of the part along the weld is its own shear check.
 */
export function aiscFusionFaceStrength(p: { legIn: number; tensileStrengthKsi: number; basis: "allowable" | "factored" }): { nominal: number; available: number; phi: number; omega: number } {
  const nominal = 0.6 * p.tensileStrengthKsi * p.legIn;
  const [phi, omega] = [0.75, 2.0];
  return { nominal, available: p.basis === "factored" ? phi * nominal : nominal / omega, phi, omega };
}

/** Least fillet size by the thinner part joined, in (AISC 360-16 Table J2.4). */
export function aiscMinimumFilletIn(thinnerIn: number): number {
  if (!exceeds(thinnerIn, 0.25)) return 1 / 8;
  if (!exceeds(thinnerIn, 0.5)) return 3 / 16;
  if (!exceeds(thinnerIn, 0.75)) return 1 / 4;
  return 5 / 16;
}

/** Largest fillet along the edge of a part of thickness t, in (AISC 360-16 §J2.2b): t below 1/4 in, t − 1/16 in otherwise. */
export const aiscMaximumEdgeFilletIn = (tIn: number) => (fallsShort(tIn, 0.25) ? tIn : tIn - 1 / 16);

/** Shortest intermittent fillet segment, in (AISC 360-16 §J2.2b): 4w and 1-1/2 in. */
export const aiscMinimumSegmentIn = (legIn: number) => Math.max(4 * legIn, 1.5);

/** Correlation factor β_w of EN 1993-1-8 Table 4.1 by the weaker part's yield strength (S235 0.8, S275 0.85, S355 0.9, S420 and S460 1.0). */
export function correlationFactor(yieldStrength: number): { betaW: number; grade: string } {
  if (!exceeds(yieldStrength, 235)) return { betaW: 0.8, grade: "S235" };
  if (!exceeds(yieldStrength, 275)) return { betaW: 0.85, grade: "S275" };
  if (!exceeds(yieldStrength, 355)) return { betaW: 0.9, grade: "S355" };
  return { betaW: 1.0, grade: "S420/S460" };
}

/** F_w,Rd = f_vw,d a, f_vw,d = (f_u/√3)/(β_w γ_M2), N/mm (EN 1993-1-8 eq. 4.3, 4.4). */
export function en1993FilletStrength(p: { throat: number; tensileStrength: number; betaW: number; gammaM2: number }): { fvwd: number; value: number } {
  const fvwd = p.tensileStrength / Math.sqrt(3) / (p.betaW * p.gammaM2);
  return { fvwd, value: fvwd * p.throat };
}

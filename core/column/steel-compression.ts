import type { WorkingStep } from "../connector/connector-kind.js";

/**
 * Flexural buckling strength of a steel column, AISC 360-16 §E3 and EN 1993-1-1 §6.3.1.
 * Core units: N, mm, MPa. Every result carries the working lines the worksheet prints.
 */

export type DesignBasis = "allowable" | "factored";

export interface AiscFlexuralBucklingInput {
  /** A_g, mm². */
  grossArea: number;
  /** L_c/r of the axis considered; for a built-up member the modified slenderness of §E6.1. */
  slenderness: number;
  /** E, MPa. */
  elasticModulus: number;
  /** F_y, MPa. */
  yieldStrength: number;
  basis: DesignBasis;
  /** Symbol printed for the slenderness: "L_c/r" or "(L_c/r)_m". */
  slendernessSymbol?: string;
}

export interface AiscFlexuralBuckling {
  slenderness: number;
  /** F_e, MPa (E3-4). */
  elasticBucklingStress: number;
  /** 4.71 √(E/F_y): the slenderness where E3-2 gives way to E3-3. */
  limitSlenderness: number;
  /** F_cr, MPa. */
  criticalStress: number;
  equation: "E3-2" | "E3-3";
  /** P_n = F_cr A_g, N. */
  nominal: number;
  /** φ_c P_n (φ_c = 0.90) or P_n/Ω_c (Ω_c = 1.67), N. */
  available: number;
  reference: string;
  steps: WorkingStep[];
  warnings: string[];
}

const AISC_PHI_C = 0.9;
const AISC_OMEGA_C = 1.67;

/** AISC 360-16 §E3: F_e = π²E/(L_c/r)², F_cr by E3-2 or E3-3, P_n = F_cr A_g (E3-1). */
export function aiscFlexuralBuckling(p: AiscFlexuralBucklingInput): AiscFlexuralBuckling {
  requirePositive({ grossArea: p.grossArea, slenderness: p.slenderness, elasticModulus: p.elasticModulus, yieldStrength: p.yieldStrength });
  const sym = p.slendernessSymbol ?? "L_c/r";
  const E = p.elasticModulus;
  const Fy = p.yieldStrength;
  const Fe = (Math.PI ** 2 * E) / p.slenderness ** 2;
  const limitSlenderness = 4.71 * Math.sqrt(E / Fy);
  // E3-2 applies when L_c/r ≤ 4.71√(E/F_y), equivalently F_y/F_e ≤ 2.25.
  const inelastic = p.slenderness <= limitSlenderness;
  const Fcr = inelastic ? 0.658 ** (Fy / Fe) * Fy : 0.877 * Fe;
  const nominal = Fcr * p.grossArea;
  const lrfd = p.basis === "factored";
  const available = lrfd ? AISC_PHI_C * nominal : nominal / AISC_OMEGA_C;
  const equation = inelastic ? "E3-2" : "E3-3";
  const steps: WorkingStep[] = [
    { symbol: sym, description: "slenderness of the axis considered", value: p.slenderness, quantity: "ratio", reference: "AISC 360-16 §E3" },
    { symbol: "F_e", description: `elastic buckling stress, π²E/(${sym})²`, value: Fe, quantity: "stress", reference: "AISC 360-16 eq. E3-4" },
    { symbol: "4.71√(E/F_y)", description: `limit between inelastic and elastic buckling: ${sym} ${inelastic ? "≤" : ">"} the limit`, value: limitSlenderness, quantity: "ratio", reference: "AISC 360-16 §E3(a)/(b)" },
    inelastic
      ? { symbol: "F_cr", description: "critical stress, 0.658^(F_y/F_e) F_y (inelastic buckling)", value: Fcr, quantity: "stress", reference: "AISC 360-16 eq. E3-2" }
      : { symbol: "F_cr", description: "critical stress, 0.877 F_e (elastic buckling)", value: Fcr, quantity: "stress", reference: "AISC 360-16 eq. E3-3" },
    { symbol: "P_n", description: "nominal compressive strength, F_cr A_g", value: nominal, quantity: "force", reference: "AISC 360-16 eq. E3-1" },
    { symbol: lrfd ? "φ_c P_n" : "P_n/Ω_c", description: lrfd ? "design strength, φ_c = 0.90" : "allowable strength, Ω_c = 1.67", value: available, quantity: "force", reference: "AISC 360-16 §E1" },
  ];
  const warnings: string[] = [];
  // User note to §E2: L_c/r preferably not over 200.
  if (p.slenderness > 200) warnings.push(`${sym} = ${p.slenderness.toFixed(1)} exceeds 200, the slenderness AISC 360-16 §E2 (user note) recommends not to exceed`);
  return {
    slenderness: p.slenderness,
    elasticBucklingStress: Fe,
    limitSlenderness,
    criticalStress: Fcr,
    equation,
    nominal,
    available,
    reference: `AISC 360-16 §E3, eq. ${equation}, ${lrfd ? "LRFD φ_c P_n" : "ASD P_n/Ω_c"}`,
    steps,
    warnings,
  };
}

/**
 * F_cr from an elastic buckling stress of any mode, AISC 360-16 §E3 (and §E4 through it): E3-2 when
 * F_y/F_e ≤ 2.25, else E3-3.
 */
export function aiscCriticalStress(elasticBucklingStress: number, yieldStrength: number): { criticalStress: number; equation: "E3-2" | "E3-3" } {
  requirePositive({ elasticBucklingStress, yieldStrength });
  const ratio = yieldStrength / elasticBucklingStress;
  return ratio <= 2.25 ? { criticalStress: 0.658 ** ratio * yieldStrength, equation: "E3-2" } : { criticalStress: 0.877 * elasticBucklingStress, equation: "E3-3" };
}

/** Buckling curves of EN 1993-1-1 Table 6.1 (imperfection factor α). */
export const EN1993_IMPERFECTION = { a0: 0.13, a: 0.21, b: 0.34, c: 0.49, d: 0.76 } as const;
export type BucklingCurve = keyof typeof EN1993_IMPERFECTION;

/** γ_M1 recommended by EN 1993-1-1 §6.1(1) NOTE 2B [M]; a National Annex may set another. */
export const EN1993_GAMMA_M1 = 1.0;

export interface En1993FlexuralBucklingInput {
  /** A, mm² (class 1, 2 or 3 cross-section). */
  area: number;
  /** f_y, MPa. */
  yieldStrength: number;
  elasticModulus: number;
  /** L_cr/i of the axis considered. Ignored for N_cr when `criticalForce` is given. */
  slenderness: number;
  /** N_cr, N; defaults to π²EA/(L_cr/i)². */
  criticalForce?: number;
  curve: BucklingCurve;
  gammaM1?: number;
}

export interface En1993FlexuralBuckling {
  criticalForce: number;
  /** λ̄ = √(A f_y / N_cr) (6.49). */
  relativeSlenderness: number;
  alpha: number;
  phi: number;
  /** χ ≤ 1 (6.49). */
  reduction: number;
  gammaM1: number;
  /** N_b,Rd = χ A f_y / γ_M1 (6.47), N. */
  resistance: number;
  reference: string;
  steps: WorkingStep[];
  warnings: string[];
}

/** EN 1993-1-1 §6.3.1.2: χ from λ̄ and the curve's α, N_b,Rd = χ A f_y / γ_M1. */
export function en1993FlexuralBuckling(p: En1993FlexuralBucklingInput): En1993FlexuralBuckling {
  requirePositive({ area: p.area, yieldStrength: p.yieldStrength, elasticModulus: p.elasticModulus, slenderness: p.slenderness });
  const gammaM1 = p.gammaM1 ?? EN1993_GAMMA_M1;
  const Ncr = p.criticalForce ?? (Math.PI ** 2 * p.elasticModulus * p.area) / p.slenderness ** 2;
  requirePositive({ criticalForce: Ncr, gammaM1 });
  const lambda = Math.sqrt((p.area * p.yieldStrength) / Ncr);
  const alpha = EN1993_IMPERFECTION[p.curve];
  const phi = 0.5 * (1 + alpha * (lambda - 0.2) + lambda ** 2);
  const reduction = Math.min(1, 1 / (phi + Math.sqrt(phi ** 2 - lambda ** 2)));
  const resistance = (reduction * p.area * p.yieldStrength) / gammaM1;
  const steps: WorkingStep[] = [
    { symbol: "N_cr", description: p.criticalForce === undefined ? "elastic critical force, π²EA/(L_cr/i)²" : "elastic critical force", value: Ncr, quantity: "force", reference: "EN 1993-1-1 §6.3.1.2" },
    { symbol: "λ̄", description: "non-dimensional slenderness, √(A f_y / N_cr)", value: lambda, quantity: "ratio", reference: "EN 1993-1-1 eq. (6.50)" },
    { symbol: "α", description: `imperfection factor, buckling curve ${p.curve}`, value: alpha, quantity: "ratio", reference: "EN 1993-1-1 Table 6.1" },
    { symbol: "Φ", description: "0.5 [1 + α(λ̄ − 0.2) + λ̄²]", value: phi, quantity: "ratio", reference: "EN 1993-1-1 eq. (6.49)" },
    { symbol: "χ", description: "reduction factor, 1/(Φ + √(Φ² − λ̄²)) ≤ 1", value: reduction, quantity: "ratio", reference: "EN 1993-1-1 eq. (6.49)" },
    { symbol: "γ_M1", description: "partial factor for member instability (recommended value)", value: gammaM1, quantity: "ratio", reference: "EN 1993-1-1 §6.1(1)" },
    { symbol: "N_b,Rd", description: "design buckling resistance, χ A f_y / γ_M1", value: resistance, quantity: "force", reference: "EN 1993-1-1 eq. (6.47)" },
  ];
  return {
    criticalForce: Ncr,
    relativeSlenderness: lambda,
    alpha,
    phi,
    reduction,
    gammaM1,
    resistance,
    reference: `EN 1993-1-1 §6.3.1, curve ${p.curve}`,
    steps,
    warnings: [],
  };
}

/** Throws on a non-positive or non-finite input: callers validate jobs first, so this is a broken invariant. */
export function requirePositive(values: Record<string, number>): void {
  for (const [name, v] of Object.entries(values)) {
    if (!(Number.isFinite(v) && v > 0)) throw new RangeError(`${name} must be a positive finite number, got ${v}`);
  }
}

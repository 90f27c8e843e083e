import type { WorkingStep } from "../connector/connector-kind.js";
import { exceeds } from "../units/limits.js";
import { en1993FlexuralBuckling, requirePositive, type BucklingCurve, type En1993FlexuralBuckling } from "./steel-compression.js";

/**
 * Uniform built-up compression members, EN 1993-1-1 §6.4 (two chords, hinged ends, laced or
 * battened, or closely spaced). Core units: N, mm, MPa, N·mm. Every formula here is recalled from
 * the standard, not seen [M]; the worksheet prints each with its clause for the reviewer to confirm.
 */

export interface ChordForceInput {
  /** L: length of the built-up member (hinged ends), mm. */
  length: number;
  /** N_Ed, N (compression positive). */
  axialForce: number;
  /** M_Ed^I: largest first-order moment at mid-length without the imperfection, N·mm. */
  firstOrderMoment?: number;
  /** I_eff, mm⁴. */
  effectiveSecondMoment: number;
  /** S_v, N. */
  shearStiffness: number;
  /** A_ch: one chord, mm². */
  chordArea: number;
  /** h_0: distance between the chords' centroids, mm. */
  chordDistance: number;
  elasticModulus: number;
}

export interface ChordForce {
  /** e_0 = L/500, mm. */
  imperfection: number;
  /** N_cr = π² E I_eff / L², N. */
  criticalForce: number;
  /** False when N_Ed reaches the amplification's pole: 1 − N_Ed/N_cr − N_Ed/S_v ≤ 0. */
  stable: boolean;
  /** M_Ed (§6.4.1(6)), N·mm; Infinity when not stable. */
  moment: number;
  /** N_ch,Ed (6.69), N. */
  chordForce: number;
  /** V_Ed = π M_Ed / L (§6.4.1(7), eq. (6.70) [M]): the shear the lacing, battens or packing plates carry, N. */
  shear: number;
  steps: WorkingStep[];
}

/** EN 1993-1-1 §6.4.1(6), (7): the chord force and the member's shear from the bow imperfection L/500. */
export function en1993ChordForce(p: ChordForceInput): ChordForce {
  requirePositive({ length: p.length, axialForce: p.axialForce, effectiveSecondMoment: p.effectiveSecondMoment, shearStiffness: p.shearStiffness, chordArea: p.chordArea, chordDistance: p.chordDistance, elasticModulus: p.elasticModulus });
  const MI = p.firstOrderMoment ?? 0;
  const e0 = p.length / 500;
  const Ncr = (Math.PI ** 2 * p.elasticModulus * p.effectiveSecondMoment) / p.length ** 2;
  const amplifier = 1 - p.axialForce / Ncr - p.axialForce / p.shearStiffness;
  const stable = amplifier > 0;
  const moment = stable ? (p.axialForce * e0 + Math.abs(MI)) / amplifier : Infinity;
  const chordForce = 0.5 * p.axialForce + (moment * p.chordDistance * p.chordArea) / (2 * p.effectiveSecondMoment);
  const shear = (Math.PI * moment) / p.length;
  const steps: WorkingStep[] = [
    { symbol: "e_0", description: "bow imperfection, L/500", value: e0, quantity: "length", reference: "EN 1993-1-1 §6.4.1(1) [M]" },
    { symbol: "N_cr", description: "effective critical force of the built-up member, π² E I_eff / L²", value: Ncr, quantity: "force", reference: "EN 1993-1-1 §6.4.1(6) [M]" },
    { symbol: "1 − N_Ed/N_cr − N_Ed/S_v", description: stable ? "amplification denominator" : "amplification denominator ≤ 0: the member buckles under N_Ed", value: amplifier, quantity: "ratio", reference: "EN 1993-1-1 §6.4.1(6) [M]" },
    { symbol: "M_Ed", description: "design moment with the imperfection, (N_Ed e_0 + M_Ed^I)/(1 − N_Ed/N_cr − N_Ed/S_v)", value: moment, quantity: "moment", reference: "EN 1993-1-1 §6.4.1(6) [M]" },
    { symbol: "N_ch,Ed", description: "design force in the more compressed chord, 0.5 N_Ed + M_Ed h_0 A_ch / (2 I_eff)", value: chordForce, quantity: "force", reference: "EN 1993-1-1 eq. (6.69) [M]" },
    { symbol: "V_Ed", description: "shear carried by the lacing, battens or packing plates, π M_Ed / L", value: shear, quantity: "force", reference: "EN 1993-1-1 §6.4.1(7), eq. (6.70) [M]" },
  ];
  return { imperfection: e0, criticalForce: Ncr, stable, moment, chordForce, shear, steps };
}

/** μ of EN 1993-1-1 Table 6.8 [M] from λ = L/i_0. */
export function battenEfficiency(slenderness: number): number {
  if (slenderness >= 150) return 0;
  if (slenderness <= 75) return 1;
  return 2 - slenderness / 75;
}

export interface BattenedMemberInput {
  length: number;
  axialForce: number;
  firstOrderMoment?: number;
  chordArea: number;
  /** I_ch: one chord, in plane (about its own axis parallel to the battens' planes), mm⁴. */
  chordSecondMoment: number;
  chordDistance: number;
  /** a: distance between battens (or packing plates), centre to centre, mm. */
  battenSpacing: number;
  /** I_b: one batten, in plane, mm⁴. */
  battenSecondMoment: number;
  /** n: planes of battens. */
  battenPlanes: number;
  elasticModulus: number;
  yieldStrength: number;
  /** Buckling curve of the chord between battens. */
  chordCurve: BucklingCurve;
  /** Chord's radius of gyration for its buckling between battens; default √(I_ch/A_ch). */
  chordRadius?: number;
  gammaM1?: number;
}

export interface BattenedMember {
  /** i_0 = √(I_1/(2 A_ch)), I_1 = 0.5 h_0² A_ch + 2 I_ch, mm. */
  radius: number;
  /** λ = L/i_0. */
  slenderness: number;
  /** μ (Table 6.8). */
  efficiency: number;
  /** I_eff = 0.5 h_0² A_ch + 2 μ I_ch (6.74), mm⁴. */
  effectiveSecondMoment: number;
  /** S_v (6.73), N. */
  shearStiffness: number;
  force: ChordForce;
  /** Chord between battens, buckling length a. */
  chordBuckling: En1993FlexuralBuckling;
  /** N_ch,Ed / N_b,Rd of the chord. */
  chordUtilisation: number;
  /** End-panel actions (Figure 6.11 [M]): chord moment V_Ed a/4, batten longitudinal shear V_Ed a/(n h_0), batten moment V_Ed a/(2n). */
  endPanel: { chordMoment: number; chordShear: number; battenShear: number; battenMoment: number };
  steps: WorkingStep[];
  warnings: string[];
  /** Checks this function leaves to others or to the reviewer; the worksheet lists them. */
  notChecked: string[];
}

/** EN 1993-1-1 §6.4.3 with §6.4.1: a battened member at a given batten spacing. */
export function en1993BattenedMember(p: BattenedMemberInput): BattenedMember {
  requirePositive({ chordSecondMoment: p.chordSecondMoment, battenSpacing: p.battenSpacing, battenSecondMoment: p.battenSecondMoment, battenPlanes: p.battenPlanes, yieldStrength: p.yieldStrength });
  const { chordArea: A, chordSecondMoment: Ich, chordDistance: h0, battenSpacing: a, elasticModulus: E } = p;
  const I1 = 0.5 * h0 ** 2 * A + 2 * Ich;
  const i0 = Math.sqrt(I1 / (2 * A));
  const lambda = p.length / i0;
  const mu = battenEfficiency(lambda);
  const Ieff = 0.5 * h0 ** 2 * A + 2 * mu * Ich;
  const svFrame = (24 * E * Ich) / (a ** 2 * (1 + (2 * Ich * h0) / (p.battenPlanes * p.battenSecondMoment * a)));
  const svLimit = (2 * Math.PI ** 2 * E * Ich) / a ** 2;
  const Sv = Math.min(svFrame, svLimit);
  const force = en1993ChordForce({ length: p.length, axialForce: p.axialForce, ...(p.firstOrderMoment !== undefined ? { firstOrderMoment: p.firstOrderMoment } : {}), effectiveSecondMoment: Ieff, shearStiffness: Sv, chordArea: A, chordDistance: h0, elasticModulus: E });
  const chordRadius = p.chordRadius ?? Math.sqrt(Ich / A);
  const chordBuckling = en1993FlexuralBuckling({ area: A, yieldStrength: p.yieldStrength, elasticModulus: E, slenderness: a / chordRadius, curve: p.chordCurve, ...(p.gammaM1 !== undefined ? { gammaM1: p.gammaM1 } : {}) });
  const chordUtilisation = force.chordForce / chordBuckling.resistance;
  const V = force.shear;
  const endPanel = { chordMoment: (V * a) / 4, chordShear: V / 2, battenShear: (V * a) / (p.battenPlanes * h0), battenMoment: (V * a) / (2 * p.battenPlanes) };
  const steps: WorkingStep[] = [
    { symbol: "I_1", description: "0.5 h_0² A_ch + 2 I_ch", value: I1, quantity: "secondMoment", reference: "EN 1993-1-1 §6.4.3.1(3) [M]" },
    { symbol: "i_0", description: "√(I_1 / (2 A_ch))", value: i0, quantity: "length", reference: "EN 1993-1-1 §6.4.3.1(3) [M]" },
    { symbol: "λ", description: "L / i_0", value: lambda, quantity: "ratio", reference: "EN 1993-1-1 Table 6.8 [M]" },
    { symbol: "μ", description: "efficiency factor: 1 for λ ≤ 75, 2 − λ/75 between, 0 for λ ≥ 150", value: mu, quantity: "ratio", reference: "EN 1993-1-1 Table 6.8 [M]" },
    { symbol: "I_eff", description: "0.5 h_0² A_ch + 2 μ I_ch", value: Ieff, quantity: "secondMoment", reference: "EN 1993-1-1 eq. (6.74) [M]" },
    { symbol: "S_v", description: `shear stiffness, 24 E I_ch / (a² (1 + 2 I_ch h_0 / (n I_b a))) ≤ 2π² E I_ch / a²${svFrame > svLimit ? " (the limit governs)" : ""}`, value: Sv, quantity: "force", reference: "EN 1993-1-1 eq. (6.73) [M]" },
    ...force.steps,
    ...chordBuckling.steps.map((s) => ({ ...s, symbol: `${s.symbol} (chord, L_ch = a)` })),
    { symbol: "N_ch,Ed / N_b,Rd", description: "chord between battens", value: chordUtilisation, quantity: "ratio", reference: "EN 1993-1-1 §6.4.1(6), §6.4.3.1 [M]" },
    { symbol: "M_ch (end panel)", description: "chord moment, V_Ed a / 4", value: endPanel.chordMoment, quantity: "moment", reference: "EN 1993-1-1 Figure 6.11 [M]" },
    { symbol: "V_b", description: "longitudinal shear in each batten (and its connection), V_Ed a / (n h_0)", value: endPanel.battenShear, quantity: "force", reference: "EN 1993-1-1 Figure 6.11 [M]" },
    { symbol: "M_b", description: "batten moment at the chord, V_Ed a / (2n)", value: endPanel.battenMoment, quantity: "moment", reference: "EN 1993-1-1 Figure 6.11 [M]" },
  ];
  const warnings: string[] = [];
  if (!force.stable) warnings.push("N_Ed reaches the built-up member's critical force with its shear stiffness (1 − N_Ed/N_cr − N_Ed/S_v ≤ 0, EN 1993-1-1 §6.4.1(6)): the member cannot carry it");
  // §6.4.1(1): at least three panels [M].
  if (p.length / a < 3 - 1e-9) warnings.push("fewer than three panels between battens: EN 1993-1-1 §6.4.1 assumes at least three equal panels");
  const notChecked = [
    "buckling about the material axis (the axis through both chords) as a solid member, EN 1993-1-1 §6.3.1",
    "the chords in the end panel under N_ch,Ed with the moment V_Ed a/4 (EN 1993-1-1 §6.4.3.1, Figure 6.11)",
    "the battens and their connections for V_b and M_b",
  ];
  return { radius: i0, slenderness: lambda, efficiency: mu, effectiveSecondMoment: Ieff, shearStiffness: Sv, force, chordBuckling, chordUtilisation, endPanel, steps, warnings, notChecked };
}

/**
 * Largest batten spacing for which the chord between battens still carries N_ch,Ed (bisection: a
 * longer spacing lowers S_v, so raises N_ch,Ed, and lengthens the chord's buckling length), and no
 * more than L/3 (three panels). Null when even a = L/100 fails.
 */
export function en1993LargestBattenSpacing(p: Omit<BattenedMemberInput, "battenSpacing">): { largest: number | null; governing: string } {
  const ok = (a: number) => {
    const r = en1993BattenedMember({ ...p, battenSpacing: a });
    return r.force.stable && !exceeds(r.chordUtilisation, 1);
  };
  const hi0 = p.length / 3;
  if (ok(hi0)) return { largest: hi0, governing: "three panels at least (EN 1993-1-1 §6.4.1 [M])" };
  let lo = p.length / 100;
  if (!ok(lo)) return { largest: null, governing: "the chord fails even with battens at L/100: a larger chord is needed" };
  let hi = hi0;
  for (let k = 0; k < 60 && hi - lo > 1e-6 * hi0; k++) {
    const mid = 0.5 * (lo + hi);
    if (ok(mid)) lo = mid;
    else hi = mid;
  }
  return { largest: lo, governing: "the chord between battens, N_ch,Ed ≤ N_b,Rd (EN 1993-1-1 §6.4.3.1 [M])" };
}

export type CloselySpacedKind = "in contact or through packing plates" | "star-battened angles";

/** Largest spacing of interconnections for closely spaced built-up members, EN 1993-1-1 §6.4.4, Table 6.9 [M]. */
export function en1993CloselySpacedLimit(p: { chordMinRadius: number; kind: CloselySpacedKind; spacing: number }): { largest: number; passes: boolean; steps: WorkingStep[] } {
  requirePositive({ chordMinRadius: p.chordMinRadius, spacing: p.spacing });
  const factor = p.kind === "star-battened angles" ? 70 : 15;
  const largest = factor * p.chordMinRadius;
  const passes = !exceeds(p.spacing, largest);
  return {
    largest,
    passes,
    steps: [
      { symbol: "i_min", description: "least radius of gyration of one chord (one angle)", value: p.chordMinRadius, quantity: "length", reference: "EN 1993-1-1 Table 6.9 [M]" },
      { symbol: "a_max", description: `largest spacing of interconnections, ${factor} i_min (${p.kind})`, value: largest, quantity: "length", reference: "EN 1993-1-1 §6.4.4(1), Table 6.9 [M]" },
      { symbol: "a", description: passes ? "spacing within the limit: the member may be checked as one integral member" : "spacing beyond the limit: design it as a battened member (§6.4.3)", value: p.spacing, quantity: "length", reference: "EN 1993-1-1 §6.4.4(1) [M]" },
    ],
  };
}

export interface CloselySpacedMemberInput extends BattenedMemberInput {
  kind: CloselySpacedKind;
  /** Least radius of gyration of one chord, mm. */
  chordMinRadius: number;
  /** The whole member as one integral member, for its flexural buckling. */
  integral: { area: number; slenderness: number; curve: BucklingCurve };
}

export interface CloselySpacedMember {
  limit: ReturnType<typeof en1993CloselySpacedLimit>;
  /** Flexural buckling of the integral member (§6.4.4(1)), valid only when the limit passes. */
  integral: En1993FlexuralBuckling;
  /** The shear and packing-plate forces from the battened-member rules, with the packing plates as battens. */
  packing: BattenedMember;
  steps: WorkingStep[];
  warnings: string[];
}

/**
 * EN 1993-1-1 §6.4.4: closely spaced members checked as one integral member when the packing plates
 * are no further apart than Table 6.9 allows; the shear the packing plates carry is taken from the
 * battened-member rules (§6.4.3) with the plates as battens [M], never from the integral member's
 * stiffness alone.
 */
export function en1993CloselySpacedMember(p: CloselySpacedMemberInput): CloselySpacedMember {
  const limit = en1993CloselySpacedLimit({ chordMinRadius: p.chordMinRadius, kind: p.kind, spacing: p.battenSpacing });
  const integral = en1993FlexuralBuckling({ area: p.integral.area, yieldStrength: p.yieldStrength, elasticModulus: p.elasticModulus, slenderness: p.integral.slenderness, curve: p.integral.curve, ...(p.gammaM1 !== undefined ? { gammaM1: p.gammaM1 } : {}) });
  const packing = en1993BattenedMember(p);
  const warnings = [...packing.warnings];
  if (!limit.passes) warnings.push("packing plates further apart than EN 1993-1-1 Table 6.9 allows: the member is not closely spaced; check it as a battened member (§6.4.3)");
  return {
    limit,
    integral,
    packing,
    steps: [...limit.steps, ...integral.steps.map((s) => ({ ...s, symbol: `${s.symbol} (integral member)` })), ...packing.steps],
    warnings,
  };
}

/**
 * Laced members, EN 1993-1-1 §6.4.2 [M]: I_eff = 0.5 h_0² A_ch and S_v of Figure 6.9 for one
 * lacing system per plane (n planes): "V" (diagonals only) n E A_d a h_0² / (2 d³); "N" (diagonals
 * and posts) n E A_d a h_0² / (d³ (1 + A_d h_0³ / (A_v d³))).
 */
export function en1993LacedStiffness(p: { chordArea: number; chordDistance: number; lacing: "V" | "N"; diagonalArea: number; postArea?: number; diagonalLength: number; panelLength: number; planes: number; elasticModulus: number }): { effectiveSecondMoment: number; shearStiffness: number; steps: WorkingStep[] } {
  requirePositive({ chordArea: p.chordArea, chordDistance: p.chordDistance, diagonalArea: p.diagonalArea, diagonalLength: p.diagonalLength, panelLength: p.panelLength, planes: p.planes, elasticModulus: p.elasticModulus });
  const { chordDistance: h0, diagonalArea: Ad, diagonalLength: d, panelLength: a, planes: n, elasticModulus: E } = p;
  const Ieff = 0.5 * h0 ** 2 * p.chordArea;
  let Sv: number;
  if (p.lacing === "V") Sv = (n * E * Ad * a * h0 ** 2) / (2 * d ** 3);
  else {
    if (p.postArea === undefined) throw new RangeError("postArea: N-lacing needs the posts' area");
    requirePositive({ postArea: p.postArea });
    Sv = (n * E * Ad * a * h0 ** 2) / (d ** 3 * (1 + (Ad * h0 ** 3) / (p.postArea * d ** 3)));
  }
  return {
    effectiveSecondMoment: Ieff,
    shearStiffness: Sv,
    steps: [
      { symbol: "I_eff", description: "laced member, 0.5 h_0² A_ch", value: Ieff, quantity: "secondMoment", reference: "EN 1993-1-1 §6.4.2.1 [M]" },
      { symbol: "S_v", description: p.lacing === "V" ? "shear stiffness, n E A_d a h_0² / (2 d³)" : "shear stiffness, n E A_d a h_0² / (d³ (1 + A_d h_0³ / (A_v d³)))", value: Sv, quantity: "force", reference: "EN 1993-1-1 Figure 6.9 [M]" },
    ],
  };
}

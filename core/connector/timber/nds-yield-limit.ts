import { exceeds, fallsShort } from "../../units/limits.js";

/**
 * NDS yield limit equations for one dowel-type fastener (ANSI/AWC NDS-2018 §12.3.1, Tables 12.3.1A
 * and 12.3.1B), in the standard's own units: inches, psi, pounds.
 */
export type NdsYieldMode = "Im" | "Is" | "II" | "IIIm" | "IIIs" | "IV";

export interface NdsYieldInput {
  /** Diameter D used in the equations (root diameter where threads are in the shear plane), in. */
  diameterIn: number;
  /** Nominal (shank) diameter of a threaded fastener, in, for the R_d of Table 12.3.1B's footnote; the diameter above when absent. */
  nominalDiameterIn?: number | undefined;
  /** Dowel bending yield strength F_yb, psi. */
  bendingYieldPsi: number;
  /** Dowel bearing length in the side member ℓs (each side member in double shear), in. */
  sideLengthIn: number;
  /** Dowel bearing length in the main member ℓm, in. */
  mainLengthIn: number;
  /** Dowel bearing strength of the side member F_es, psi. */
  sideBearingPsi: number;
  /** Dowel bearing strength of the main member F_em, psi. */
  mainBearingPsi: number;
  shear: "single" | "double";
  /** Largest angle between load and grain in any member, degrees (for K_θ). */
  maxAngleDeg: number;
}

export interface NdsYieldModeValue {
  mode: NdsYieldMode;
  /** Reference lateral design value of this mode, lb. */
  zLb: number;
  /** Reduction term R_d used. */
  rd: number;
}

export interface NdsYieldLimit {
  modes: NdsYieldModeValue[];
  governing: NdsYieldModeValue;
  Re: number;
  Rt: number;
  k1: number | null;
  k2: number | null;
  k3: number;
  Ktheta: number;
}

/** K_θ = 1 + 0.25(θ/90), θ the largest angle of load to grain, folded into 0…90° (Table 12.3.1B). */
export function kTheta(angleDeg: number): number {
  const folded = foldAngle(angleDeg);
  return 1 + 0.25 * (folded / 90);
}

/** An angle to grain folded into 0…90°: grain has no sense of direction. */
export function foldAngle(angleDeg: number): number {
  const a = ((Math.abs(angleDeg) % 180) + 180) % 180;
  return a > 90 ? 180 - a : a;
}

/**
 * Reduction term R_d of NDS Table 12.3.1B for a mode, D the diameter in the yield model. A threaded
 * fastener of nominal diameter at least 1/4 in whose root diameter is below 1/4 in takes R_d = K_D K_θ
 * (the table's footnote [M]).
 */
export function ndsReductionTerm(diameterIn: number, mode: NdsYieldMode, maxAngleDeg: number, nominalDiameterIn = diameterIn): number {
  const kt = kTheta(maxAngleDeg);
  if (fallsShort(diameterIn, 0.25)) {
    const KD = !exceeds(diameterIn, 0.17) ? 2.2 : 10 * diameterIn + 0.5;
    return !fallsShort(nominalDiameterIn, 0.25) ? KD * kt : KD;
  }
  if (mode === "Im" || mode === "Is") return 4 * kt;
  if (mode === "II") return 3.6 * kt;
  return 3.2 * kt;
}

/** Every yield mode of NDS Table 12.3.1A (single shear) or the double-shear set (no II, no IIIm); Z is the least. */
export function ndsYieldLimit(p: NdsYieldInput): NdsYieldLimit {
  const D = p.diameterIn;
  const Fyb = p.bendingYieldPsi;
  const ls = p.sideLengthIn;
  const lm = p.mainLengthIn;
  const Fes = p.sideBearingPsi;
  const Fem = p.mainBearingPsi;
  const Re = Fem / Fes;
  const Rt = lm / ls;
  const rd = (mode: NdsYieldMode) => ndsReductionTerm(D, mode, p.maxAngleDeg, p.nominalDiameterIn ?? D);
  const k3 = -1 + Math.sqrt((2 * (1 + Re)) / Re + (2 * Fyb * (2 + Re) * D * D) / (3 * Fem * ls * ls));
  const modeIV = (D * D) * Math.sqrt((2 * Fem * Fyb) / (3 * (1 + Re)));
  const modes: NdsYieldModeValue[] = [];
  const add = (mode: NdsYieldMode, numerator: number) => modes.push({ mode, zLb: numerator / rd(mode), rd: rd(mode) });
  let k1: number | null = null;
  let k2: number | null = null;
  if (p.shear === "single") {
    k1 = (Math.sqrt(Re + 2 * Re * Re * (1 + Rt + Rt * Rt) + Rt * Rt * Re ** 3) - Re * (1 + Rt)) / (1 + Re);
    k2 = -1 + Math.sqrt(2 * (1 + Re) + (2 * Fyb * (1 + 2 * Re) * D * D) / (3 * Fem * lm * lm));
    add("Im", D * lm * Fem);
    add("Is", D * ls * Fes);
    add("II", k1 * D * ls * Fes);
    add("IIIm", (k2 * D * lm * Fem) / (1 + 2 * Re));
    add("IIIs", (k3 * D * ls * Fem) / (2 + Re));
    add("IV", modeIV);
  } else {
    add("Im", D * lm * Fem);
    add("Is", 2 * D * ls * Fes);
    add("IIIs", (2 * k3 * D * ls * Fem) / (2 + Re));
    add("IV", 2 * modeIV);
  }
  const governing = modes.reduce((a, b) => (b.zLb < a.zLb ? b : a));
  return { modes, governing, Re, Rt, k1, k2, k3, Ktheta: kTheta(p.maxAngleDeg) };
}

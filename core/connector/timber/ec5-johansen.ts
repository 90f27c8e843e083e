/**
 * Johansen's equations as written in EN 1995-1-1:2004+A1:2008 §8.2.2 (timber-to-timber, eq. 8.6 and
 * 8.7) and §8.2.3 (steel-to-timber, eq. 8.9–8.13): characteristic resistance per shear plane per
 * fastener, N. Each mode with a rope-effect term adds F_ax,Rk/4, limited to a share of its Johansen
 * part (§8.2.2(2)).
 */
export interface JohansenMode {
  mode: string;
  /** Johansen part, N. */
  johansen: number;
  /** Rope-effect contribution actually added (after the cap), N. */
  rope: number;
  value: number;
  equation: string;
}

export interface JohansenResult {
  modes: JohansenMode[];
  governing: JohansenMode;
  /** For steel plates between thin and thick: the interpolated value and the two ends. */
  interpolation: { thin: JohansenMode; thick: JohansenMode; value: number; plateThickness: number } | null;
  value: number;
}

export interface RopeEffect {
  /** Characteristic withdrawal capacity F_ax,Rk, N (0 to leave the rope effect out). */
  axialCapacity: number;
  /** Largest rope contribution as a share of the Johansen part: 0.15 round nails, 0.25 square or grooved nails and bolts, 0.5 other nails, 1.0 screws, 0 dowels. */
  cap: number;
}

const withRope = (mode: string, johansen: number, rope: RopeEffect, equation: string): JohansenMode => {
  const added = Math.min(rope.axialCapacity / 4, rope.cap * johansen);
  return { mode, johansen, rope: added, value: johansen + added, equation };
};
const plain = (mode: string, johansen: number, equation: string): JohansenMode => ({ mode, johansen, rope: 0, value: johansen, equation });

const least = (modes: JohansenMode[]) => modes.reduce((a, b) => (b.value < a.value ? b : a));
const result = (modes: JohansenMode[]): JohansenResult => {
  const governing = least(modes);
  return { modes, governing, interpolation: null, value: governing.value };
};

export interface TimberPair {
  /** Embedment strengths of the head-side member 1 and the point-side member 2, MPa. */
  fh1: number;
  fh2: number;
  /** t1: head-side thickness; t2: point-side penetration or thickness (single shear) or central member thickness (double shear), mm. */
  t1: number;
  t2: number;
  d: number;
  /** M_y,Rk, N·mm. */
  My: number;
  rope: RopeEffect;
}

/** Single shear, timber or panel to timber (eq. 8.6, modes a–f). */
export function johansenTimberSingle(p: TimberPair): JohansenResult {
  const { fh1, fh2, t1, t2, d, My, rope } = p;
  const b = fh2 / fh1;
  const r = t2 / t1;
  return result([
    plain("a", fh1 * t1 * d, "f_h,1,k t₁ d"),
    plain("b", fh2 * t2 * d, "f_h,2,k t₂ d"),
    withRope("c", ((fh1 * t1 * d) / (1 + b)) * (Math.sqrt(b + 2 * b * b * (1 + r + r * r) + b ** 3 * r * r) - b * (1 + r)), rope, "f_h,1,k t₁ d/(1+β)·[√(β + 2β²(1 + t₂/t₁ + (t₂/t₁)²) + β³(t₂/t₁)²) − β(1 + t₂/t₁)] + F_ax,Rk/4"),
    withRope("d", 1.05 * ((fh1 * t1 * d) / (2 + b)) * (Math.sqrt(2 * b * (1 + b) + (4 * b * (2 + b) * My) / (fh1 * d * t1 * t1)) - b), rope, "1.05 f_h,1,k t₁ d/(2+β)·[√(2β(1+β) + 4β(2+β)M_y,Rk/(f_h,1,k d t₁²)) − β] + F_ax,Rk/4"),
    withRope("e", 1.05 * ((fh1 * t2 * d) / (1 + 2 * b)) * (Math.sqrt(2 * b * b * (1 + b) + (4 * b * (1 + 2 * b) * My) / (fh1 * d * t2 * t2)) - b), rope, "1.05 f_h,1,k t₂ d/(1+2β)·[√(2β²(1+β) + 4β(1+2β)M_y,Rk/(f_h,1,k d t₂²)) − β] + F_ax,Rk/4"),
    withRope("f", 1.15 * Math.sqrt((2 * b) / (1 + b)) * Math.sqrt(2 * My * fh1 * d), rope, "1.15 √(2β/(1+β)) √(2 M_y,Rk f_h,1,k d) + F_ax,Rk/4"),
  ]);
}

/** Double shear, timber or panel side members 1 on a central timber member 2, per shear plane (eq. 8.7, modes g–k). */
export function johansenTimberDouble(p: TimberPair): JohansenResult {
  const { fh1, fh2, t1, t2, d, My, rope } = p;
  const b = fh2 / fh1;
  return result([
    plain("g", fh1 * t1 * d, "f_h,1,k t₁ d"),
    plain("h", 0.5 * fh2 * t2 * d, "0.5 f_h,2,k t₂ d"),
    withRope("j", 1.05 * ((fh1 * t1 * d) / (2 + b)) * (Math.sqrt(2 * b * (1 + b) + (4 * b * (2 + b) * My) / (fh1 * d * t1 * t1)) - b), rope, "1.05 f_h,1,k t₁ d/(2+β)·[√(2β(1+β) + 4β(2+β)M_y,Rk/(f_h,1,k d t₁²)) − β] + F_ax,Rk/4"),
    withRope("k", 1.15 * Math.sqrt((2 * b) / (1 + b)) * Math.sqrt(2 * My * fh1 * d), rope, "1.15 √(2β/(1+β)) √(2 M_y,Rk f_h,1,k d) + F_ax,Rk/4"),
  ]);
}

export interface SteelTimber {
  /** Embedment strength of the timber member, MPa. */
  fh: number;
  /** Timber thickness or penetration (t₁ single shear and central plate; t₂ with steel side plates), mm. */
  t: number;
  d: number;
  My: number;
  rope: RopeEffect;
  /** Thickness of the steel plate, mm: thin when ≤ 0.5 d, thick when ≥ d, interpolated between (§8.2.3(1)). */
  plateThickness: number;
}

function interpolate(thin: JohansenMode[], thick: JohansenMode[], plateThickness: number, d: number): JohansenResult {
  if (plateThickness <= 0.5 * d) return result(thin);
  if (plateThickness >= d) return result(thick);
  const a = least(thin);
  const b = least(thick);
  const w = (plateThickness - 0.5 * d) / (0.5 * d);
  const value = a.value + (b.value - a.value) * w;
  const modes = [...thin, ...thick];
  return { modes, governing: { mode: `${a.mode}/${b.mode} interpolated`, johansen: value, rope: 0, value, equation: "linear interpolation between thin and thick plate by t_plate/d" }, interpolation: { thin: a, thick: b, value, plateThickness }, value };
}

/** Single shear, steel plate to timber (eq. 8.9 thin plate, modes a, b; eq. 8.10 thick plate, modes c, d, e). */
export function johansenSteelSingle(p: SteelTimber): JohansenResult {
  const { fh, t, d, My, rope } = p;
  const thin = [plain("a", 0.4 * fh * t * d, "0.4 f_h,k t₁ d"), withRope("b", 1.15 * Math.sqrt(2 * My * fh * d), rope, "1.15 √(2 M_y,Rk f_h,k d) + F_ax,Rk/4")];
  const thick = [
    plain("c", fh * t * d, "f_h,k t₁ d"),
    withRope("d", fh * t * d * (Math.sqrt(2 + (4 * My) / (fh * d * t * t)) - 1), rope, "f_h,k t₁ d [√(2 + 4M_y,Rk/(f_h,k d t₁²)) − 1] + F_ax,Rk/4"),
    withRope("e", 2.3 * Math.sqrt(My * fh * d), rope, "2.3 √(M_y,Rk f_h,k d) + F_ax,Rk/4"),
  ];
  return interpolate(thin, thick, p.plateThickness, d);
}

/** Double shear, a steel plate of any thickness as the central member, per shear plane (eq. 8.11, modes f, g, h). */
export function johansenSteelCentral(p: SteelTimber): JohansenResult {
  const { fh, t, d, My, rope } = p;
  return result([
    plain("f", fh * t * d, "f_h,1,k t₁ d"),
    withRope("g", fh * t * d * (Math.sqrt(2 + (4 * My) / (fh * d * t * t)) - 1), rope, "f_h,1,k t₁ d [√(2 + 4M_y,Rk/(f_h,1,k d t₁²)) − 1] + F_ax,Rk/4"),
    withRope("h", 2.3 * Math.sqrt(My * fh * d), rope, "2.3 √(M_y,Rk f_h,1,k d) + F_ax,Rk/4"),
  ]);
}

/** Double shear, steel side plates on a central timber member, per shear plane (eq. 8.12 thin, modes j, k; eq. 8.13 thick, modes l, m). */
export function johansenSteelSides(p: SteelTimber): JohansenResult {
  const { fh, t, d, My, rope } = p;
  const thin = [plain("j", 0.5 * fh * t * d, "0.5 f_h,2,k t₂ d"), withRope("k", 1.15 * Math.sqrt(2 * My * fh * d), rope, "1.15 √(2 M_y,Rk f_h,2,k d) + F_ax,Rk/4")];
  const thick = [plain("l", 0.5 * fh * t * d, "0.5 f_h,2,k t₂ d"), withRope("m", 2.3 * Math.sqrt(My * fh * d), rope, "2.3 √(M_y,Rk f_h,2,k d) + F_ax,Rk/4")];
  return interpolate(thin, thick, p.plateThickness, d);
}

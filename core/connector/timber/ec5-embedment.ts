/**
 * Embedment strength and yield moment of dowel-type fasteners, EN 1995-1-1:2004+A1:2008 §8.3.1 and
 * §8.5.1 (MPa and N·mm; ρ_k in kg/m³, d and t in mm).
 */
export type Ec5Wood = "softwood" | "hardwood" | "lvl" | "plywood" | "osb";

export interface Embedment {
  value: number;
  formula: string;
  reference: string;
}

/** Nails up to 8 mm (and screws up to 6 mm by their effective diameter): eq. 8.15, 8.16, 8.20, 8.22. */
export function ec5NailEmbedment(p: { wood: Ec5Wood; characteristicDensity: number; diameter: number; predrilled: boolean; thickness: number }): Embedment {
  const { characteristicDensity: rho, diameter: d } = p;
  if (p.wood === "plywood") return { value: 0.11 * rho * d ** -0.3, formula: "f_h,k = 0.11 ρ_k d^−0.3", reference: "EN 1995-1-1 eq. (8.20)" };
  if (p.wood === "osb") return { value: 65 * d ** -0.7 * p.thickness ** 0.1, formula: "f_h,k = 65 d^−0.7 t^0.1", reference: "EN 1995-1-1 eq. (8.22)" };
  if (p.predrilled) return { value: 0.082 * (1 - 0.01 * d) * rho, formula: "f_h,k = 0.082 (1 − 0.01 d) ρ_k (predrilled)", reference: "EN 1995-1-1 eq. (8.16)" };
  return { value: 0.082 * rho * d ** -0.3, formula: "f_h,k = 0.082 ρ_k d^−0.3 (not predrilled)", reference: "EN 1995-1-1 eq. (8.15)" };
}

/** k_90 of eq. 8.33: 1.35 + 0.015d softwood, 1.30 + 0.015d LVL, 0.90 + 0.015d hardwood. */
export function ec5K90(wood: Ec5Wood, d: number): number {
  if (wood === "lvl") return 1.3 + 0.015 * d;
  if (wood === "hardwood") return 0.9 + 0.015 * d;
  return 1.35 + 0.015 * d;
}

/** Bolts and dowels up to 30 mm (and nails or screws over the nail limits): eq. 8.31–8.33, 8.36, 8.37. */
export function ec5BoltEmbedment(p: { wood: Ec5Wood; characteristicDensity: number; diameter: number; angleDeg: number; thickness: number }): Embedment & { parallel: number | null; k90: number | null } {
  const { characteristicDensity: rho, diameter: d } = p;
  if (p.wood === "plywood") return { value: 0.11 * (1 - 0.01 * d) * rho, parallel: null, k90: null, formula: "f_h,k = 0.11 (1 − 0.01 d) ρ_k", reference: "EN 1995-1-1 eq. (8.36)" };
  if (p.wood === "osb") return { value: 50 * d ** -0.6 * p.thickness ** 0.2, parallel: null, k90: null, formula: "f_h,k = 50 d^−0.6 t^0.2", reference: "EN 1995-1-1 eq. (8.37)" };
  const parallel = 0.082 * (1 - 0.01 * d) * rho;
  const k90 = ec5K90(p.wood, d);
  const a = (p.angleDeg * Math.PI) / 180;
  const value = parallel / (k90 * Math.sin(a) ** 2 + Math.cos(a) ** 2);
  return { value, parallel, k90, formula: "f_h,0,k = 0.082 (1 − 0.01 d) ρ_k; f_h,α,k = f_h,0,k/(k_90 sin²α + cos²α)", reference: "EN 1995-1-1 eq. (8.31), (8.32), (8.33)" };
}

export type Ec5YieldMomentShape = "round" | "square";

/** M_y,Rk: round smooth nails, bolts, dowels and screws 0.3 f_u d^2.6 (eq. 8.14, 8.30); square or grooved nails 0.45 f_u d^2.6. */
export function ec5YieldMoment(shape: Ec5YieldMomentShape, tensileStrength: number, d: number): { value: number; formula: string } {
  const k = shape === "square" ? 0.45 : 0.3;
  return { value: k * tensileStrength * d ** 2.6, formula: `M_y,Rk = ${k} f_u d^2.6` };
}

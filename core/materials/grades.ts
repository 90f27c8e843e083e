import { Material } from "../schema/job.js";
import { rescale } from "../units/convert.js";
import { convertNumber, withoutNoise } from "../units/convert-number.js";
import { fromCore, type UnitSystem } from "../units/quantity.js";

export interface Grade {
  id: string;
  name: string;
  family: Material["family"];
  /** The unit system of the grade's source: its values are round there. */
  system: UnitSystem;
  /** Source of the stiffness, density and strength values, with its flag: [V] published and seen, [M] from memory, [CP] common practice. */
  source: string;
  /** Core units: MPa, kg/m³. */
  E: number;
  density: number;
  specificGravity?: number;
  characteristicDensity?: number;
  meanDensity?: number;
  yieldStrength?: number;
  tensileStrength?: number;
  /** Strengths on each basis, with how they were obtained; absent where the grade's standard gives none for that basis. */
  strengths: Partial<Record<"allowable" | "factored", { bending: number; shear: number; note: string }>>;
}

const PSI = 0.006894757293168361;
const KSI = 1000 * PSI;
const PCF = 16.018463373960138;

/** EN 1995-1-1 design value at k_mod = 0.8 (medium-term, service class 1–2; Table 3.1 [V]) and γ_M (Table 2.3 [M]). */
const en1995 = (fm: number, fv: number, gammaM: number, kcr: number) => ({
  bending: (0.8 * fm) / gammaM,
  shear: (0.8 * fv * kcr) / gammaM,
  note: `f_d = k_mod·f_k/γ_M with k_mod = 0.8 (medium-term, service class 1–2), γ_M = ${gammaM}; shear × k_cr = ${kcr} for the cracked width (EN 1995-1-1 §6.1.7) [M]`,
});

/** NDS reference design values as ASD allowables at C_D = 1.0; size, repetitive-member, wet-service and other factors not applied. */
const nds = (fb: number, fv: number) => ({
  bending: fb * PSI,
  shear: fv * PSI,
  note: "NDS reference design values, ASD, C_D = 1.0; size factor C_F, repetitive member C_r, wet service and temperature factors not applied [M]",
});

/** Elastic stress limits for steel, lateral-torsional and local buckling not covered (they are listed as not checked). */
const aiscSteel = (fy: number) => ({
  allowable: { bending: fy / 1.67, shear: (0.6 * fy) / 1.67, note: "F_y/Ω_b with Ω_b = 1.67 (AISC 360 F2.1 yielding); shear 0.6·F_y/Ω_v with Ω_v = 1.67 (AISC 360 G2.1) [M]" },
  factored: { bending: 0.9 * fy, shear: 0.9 * 0.6 * fy, note: "φ_b·F_y with φ_b = 0.90 (AISC 360 F2.1 yielding); shear φ_v·0.6·F_y with φ_v = 0.90 (AISC 360 G2.1) [M]" },
});
const en1993Steel = (fy: number) => ({
  factored: { bending: fy, shear: fy / Math.sqrt(3), note: "f_y/γ_M0 with γ_M0 = 1.0 (EN 1993-1-1 §6.1 recommended value); shear f_y/(√3·γ_M0) (EN 1993-1-1 eq. 6.18) [M]" },
});

/** A small library of common grades. Every value is editable once copied into a job. */
export const grades: Grade[] = [
  // EN 338:2016 strength classes [M]: f_m,k, f_v,k, E_0,mean, ρ_k, ρ_mean.
  { id: "C16", name: "Softwood C16 (EN 338)", family: "sawn-timber", system: "si", source: "EN 338:2016 Table 1 [M]", E: 8000, density: 370, characteristicDensity: 310, meanDensity: 370, strengths: { factored: en1995(16, 3.2, 1.3, 0.67) } },
  { id: "C24", name: "Softwood C24 (EN 338)", family: "sawn-timber", system: "si", source: "EN 338:2016 Table 1 [M]", E: 11000, density: 420, characteristicDensity: 350, meanDensity: 420, strengths: { factored: en1995(24, 4.0, 1.3, 0.67) } },
  { id: "C30", name: "Softwood C30 (EN 338)", family: "sawn-timber", system: "si", source: "EN 338:2016 Table 1 [M]", E: 12000, density: 460, characteristicDensity: 380, meanDensity: 460, strengths: { factored: en1995(30, 4.0, 1.3, 0.67) } },
  // EN 14080:2013 homogeneous glulam: f_m,g,k, f_v,g,k = 3.5, E_0,g,mean, ρ_g,k [V]; ρ_mean [M].
  { id: "GL24h", name: "Glulam GL24h (EN 14080)", family: "glulam", system: "si", source: "EN 14080:2013 Table 5 [V] (ρ_mean [M])", E: 11500, density: 420, characteristicDensity: 385, meanDensity: 420, strengths: { factored: en1995(24, 3.5, 1.25, 0.67) } },
  { id: "GL28h", name: "Glulam GL28h (EN 14080)", family: "glulam", system: "si", source: "EN 14080:2013 Table 5 [V] (ρ_mean [M])", E: 12600, density: 460, characteristicDensity: 425, meanDensity: 460, strengths: { factored: en1995(28, 3.5, 1.25, 0.67) } },
  { id: "GL32h", name: "Glulam GL32h (EN 14080)", family: "glulam", system: "si", source: "EN 14080:2013 Table 5 [V] (ρ_mean [M])", E: 14200, density: 490, characteristicDensity: 440, meanDensity: 490, strengths: { factored: en1995(32, 3.5, 1.25, 0.67) } },
  // NDS Supplement Table 4A, visually graded dimension lumber No. 2 [M]; G from NDS Table 12.3.3A [M].
  { id: "DFL-2", name: "Douglas fir-larch No. 2 (NDS)", family: "sawn-timber", system: "us", source: "NDS Supplement Table 4A [M]; G from NDS Table 12.3.3A [M]", E: 1_600_000 * PSI, density: 34 * PCF, specificGravity: 0.5, strengths: { allowable: nds(900, 180) } },
  { id: "HF-2", name: "Hem-Fir No. 2 (NDS)", family: "sawn-timber", system: "us", source: "NDS Supplement Table 4A [M]; G from NDS Table 12.3.3A [M]", E: 1_300_000 * PSI, density: 28 * PCF, specificGravity: 0.43, strengths: { allowable: nds(850, 150) } },
  { id: "SPF-2", name: "Spruce-pine-fir No. 2 (NDS)", family: "sawn-timber", system: "us", source: "NDS Supplement Table 4A [M]; G from NDS Table 12.3.3A [M]", E: 1_400_000 * PSI, density: 27 * PCF, specificGravity: 0.42, strengths: { allowable: nds(875, 135) } },
  { id: "SP-2", name: "Southern pine No. 2 (NDS)", family: "sawn-timber", system: "us", source: "NDS Supplement Table 4B [M]; G from NDS Table 12.3.3A [M]", E: 1_400_000 * PSI, density: 36 * PCF, specificGravity: 0.55, strengths: { allowable: nds(750, 175) } },
  // Structural steel: E = 210 000 MPa (EN 1993-1-1 §3.2.6) / 29 000 ksi (AISC 360) [M]; density 7850 kg/m³ [CP].
  { id: "S275", name: "Steel S275 (EN 10025-2)", family: "steel", system: "si", source: "EN 1993-1-1 Table 3.1, t ≤ 40 mm [M]", E: 210000, density: 7850, yieldStrength: 275, tensileStrength: 430, strengths: en1993Steel(275) },
  { id: "S355", name: "Steel S355 (EN 10025-2)", family: "steel", system: "si", source: "EN 1993-1-1 Table 3.1, t ≤ 40 mm [M]", E: 210000, density: 7850, yieldStrength: 355, tensileStrength: 510, strengths: en1993Steel(355) },
  { id: "A36", name: "Steel ASTM A36", family: "steel", system: "us", source: "ASTM A36: F_y = 36 ksi, F_u = 58 ksi [M]", E: 29000 * KSI, density: 7850, yieldStrength: 36 * KSI, tensileStrength: 58 * KSI, strengths: aiscSteel(36 * KSI) },
  { id: "A992", name: "Steel ASTM A992", family: "steel", system: "us", source: "ASTM A992: F_y = 50 ksi, F_u = 65 ksi [M]", E: 29000 * KSI, density: 7850, yieldStrength: 50 * KSI, tensileStrength: 65 * KSI, strengths: aiscSteel(50 * KSI) },
  { id: "A572-50", name: "Steel ASTM A572 Grade 50", family: "steel", system: "us", source: "ASTM A572 Gr. 50: F_y = 50 ksi, F_u = 65 ksi [M]", E: 29000 * KSI, density: 7850, yieldStrength: 50 * KSI, tensileStrength: 65 * KSI, strengths: aiscSteel(50 * KSI) },
  // Panels: typical product values; the manufacturer's declared values govern [CP].
  { id: "PLY", name: "Structural plywood (typical softwood)", family: "panel", system: "si", source: "typical declared values; use the product's [CP]", E: 7000, density: 500, characteristicDensity: 410, meanDensity: 500, strengths: {} },
  { id: "OSB3", name: "OSB/3 (typical)", family: "panel", system: "si", source: "typical declared values (EN 12369-1 order of magnitude); use the product's [CP]", E: 3500, density: 600, characteristicDensity: 550, meanDensity: 600, strengths: {} },
  { id: "LVL", name: "LVL, parallel plies (typical)", family: "engineered-wood", system: "si", source: "typical declared values; use the product's [CP]", E: 13800, density: 510, characteristicDensity: 480, meanDensity: 510, strengths: {} },
];

/** A grade as a job material (core units) on the given basis; strengths it lacks for that basis are left out. */
export function materialFromGrade(grade: Grade, basis: "allowable" | "factored", id = grade.id): Material {
  const s = grade.strengths[basis];
  const optional = Object.fromEntries(
    (["specificGravity", "characteristicDensity", "meanDensity", "yieldStrength", "tensileStrength"] as const).filter((k) => grade[k] !== undefined).map((k) => [k, grade[k]]),
  );
  return {
    id,
    name: grade.name,
    family: grade.family,
    E: grade.E,
    density: grade.density,
    strength: s ? { bending: s.bending, shear: s.shear } : {},
    source: s ? `${grade.source}; ${s.note}` : `${grade.source}; no ${basis} strengths in the library: enter them`,
    ...optional,
  };
}

/**
 * A grade as a job material in `units`: the round values of the grade's source in its own system
 * (1 600 000 psi, 11 000 MPa), and in the other system the numbers a conversion of the job takes back to them.
 */
export function gradeMaterial(grade: Grade, basis: "allowable" | "factored", units: UnitSystem): Material {
  // Values derived from the source (k_mod·f_k/γ_M) are kept to 9 significant figures, which convert back exactly.
  const own = rescale(Material, materialFromGrade(grade, basis), (v, q) => Number(withoutNoise(fromCore(v, q, grade.system)).toPrecision(9)));
  return units === grade.system ? own : rescale(Material, own, (v, q) => convertNumber(v, q, grade.system, units));
}

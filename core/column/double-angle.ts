import type { WorkingStep } from "../connector/connector-kind.js";
import { exceeds } from "../units/limits.js";
import {
  aiscBuiltUpColumn,
  aiscIntermediateConnectorSpacing,
  intermediateConnectorsFor,
  type AiscBuiltUpColumn,
  type ConnectorSpacing,
  type IntermediateConnection,
  type RuleCondition,
} from "./steel-built-up.js";
import { aiscCriticalStress, requirePositive, type DesignBasis } from "./steel-compression.js";

/**
 * Double angles back to back (a gusset or filler between the backs), AISC 360-16 §E3, §E4 and §E6.
 * Section properties by closed form from two rectangles per angle, without root fillets or toe
 * rounding (the Manual's tabulated values include them). Core units: N, mm, MPa.
 */

export interface AngleSize {
  /** Leg against the gusset (the backs), mm. */
  backLeg: number;
  /** Leg standing out from the gusset, mm. */
  outstandingLeg: number;
  thickness: number;
}

export interface AngleSection {
  area: number;
  /** Centroid from the back face (across the gusset), mm. */
  centroidFromBack: number;
  /** Centroid from the outer face of the outstanding leg (along the back leg), mm. */
  centroidFromOutstandingFace: number;
  /** About the centroidal axis parallel to the outstanding leg (x), mm⁴. */
  secondMomentX: number;
  /** About the centroidal axis parallel to the back leg (y), mm⁴. */
  secondMomentY: number;
  productMoment: number;
  /** Least principal second moment (z axis), mm⁴. */
  secondMomentZ: number;
  radiusX: number;
  radiusY: number;
  /** r_z: the least radius of gyration, mm. */
  radiusZ: number;
  /** St Venant torsion constant Σ b t³/3 along the legs' mid-lines, mm⁴. */
  torsionConstant: number;
}

/** One angle as two rectangles: the back leg (full length) and the outstanding leg less the thickness. */
export function angleSection(a: AngleSize): AngleSection {
  requirePositive({ backLeg: a.backLeg, outstandingLeg: a.outstandingLeg, thickness: a.thickness });
  const { backLeg: d, outstandingLeg: b, thickness: t } = a;
  if (!(t < Math.min(b, d))) throw new RangeError("thickness: must be less than either leg");
  // Rectangles: [width across (x), height along (y), centre x, centre y]; x from the back face, y from the outstanding leg's outer face.
  const parts: [number, number, number, number][] = [
    [t, d, t / 2, d / 2],
    [b - t, t, t + (b - t) / 2, t / 2],
  ];
  const area = parts.reduce((s, [w, h]) => s + w * h, 0);
  const xc = parts.reduce((s, [w, h, x]) => s + w * h * x, 0) / area;
  const yc = parts.reduce((s, [w, h, , y]) => s + w * h * y, 0) / area;
  let Ix = 0;
  let Iy = 0;
  let Ixy = 0;
  for (const [w, h, x, y] of parts) {
    Ix += (w * h ** 3) / 12 + w * h * (y - yc) ** 2;
    Iy += (h * w ** 3) / 12 + w * h * (x - xc) ** 2;
    Ixy += w * h * (x - xc) * (y - yc);
  }
  const Iz = (Ix + Iy) / 2 - Math.sqrt(((Ix - Iy) / 2) ** 2 + Ixy ** 2);
  return {
    area,
    centroidFromBack: xc,
    centroidFromOutstandingFace: yc,
    secondMomentX: Ix,
    secondMomentY: Iy,
    productMoment: Ixy,
    secondMomentZ: Iz,
    radiusX: Math.sqrt(Ix / area),
    radiusY: Math.sqrt(Iy / area),
    radiusZ: Math.sqrt(Iz / area),
    torsionConstant: ((b - t / 2 + (d - t / 2)) * t ** 3) / 3,
  };
}

export interface DoubleAngleSection {
  angle: AngleSection;
  /** Gap between the backs (gusset or filler thickness), mm. */
  gap: number;
  area: number;
  /** x-x: parallel to the outstanding legs; buckling about it does not shear the connectors. */
  secondMomentX: number;
  /** y-y: the axis of symmetry, in the gusset's plane; buckling about it shears the connectors. */
  secondMomentY: number;
  radiusX: number;
  radiusY: number;
  /** Shear centre from the centroid along the axis of symmetry (at the outstanding legs' mid-line), mm. */
  shearCentreOffset: number;
  /** r̄_o² = x_o² + y_o² + (I_x + I_y)/A_g (AISC 360-16 eq. E4-9), mm². */
  polarRadiusSquared: number;
  /** H = 1 − (x_o² + y_o²)/r̄_o² (E4-8). */
  flexuralConstant: number;
  torsionConstant: number;
  /** Largest width of the member for the end connections (§E6.2(b)), mm. */
  maxWidth: number;
}

export function doubleAngleSection(a: AngleSize, gap: number): DoubleAngleSection {
  if (!(Number.isFinite(gap) && gap >= 0)) throw new RangeError(`gap must be a non-negative finite number, got ${gap}`);
  const s = angleSection(a);
  const area = 2 * s.area;
  const Ix = 2 * s.secondMomentX;
  const Iy = 2 * (s.secondMomentY + s.area * (s.centroidFromBack + gap / 2) ** 2);
  const yo = s.centroidFromOutstandingFace - a.thickness / 2;
  const ro2 = yo ** 2 + (Ix + Iy) / area;
  return {
    angle: s,
    gap,
    area,
    secondMomentX: Ix,
    secondMomentY: Iy,
    radiusX: Math.sqrt(Ix / area),
    radiusY: Math.sqrt(Iy / area),
    shearCentreOffset: yo,
    polarRadiusSquared: ro2,
    flexuralConstant: 1 - yo ** 2 / ro2,
    torsionConstant: 2 * s.torsionConstant,
    maxWidth: Math.max(a.backLeg, 2 * a.outstandingLeg + gap),
  };
}

/** Ends of a column and the effective length factor K recommended in AISC 360-16 Commentary Table C-A-7.1 [M]. */
export const AISC_RECOMMENDED_K = {
  "fixed-fixed": 0.65,
  "fixed-pinned": 0.8,
  "fixed-guided": 1.2,
  "pinned-pinned": 1.0,
  "fixed-free": 2.1,
  "pinned-guided": 2.0,
} as const;
export type ColumnEnds = keyof typeof AISC_RECOMMENDED_K;

export interface DoubleAngleStrutInput {
  angle: AngleSize;
  /** Gusset or filler thickness between the backs, mm. */
  gap: number;
  /** Length between the end connections, mm. */
  length: number;
  ends: ColumnEnds;
  /** Unbraced length about x-x (in the gusset's plane) if less than the length, mm. */
  unbracedLengthX?: number;
  /** Unbraced length about y-y and for torsion if less than the length, mm. */
  unbracedLengthY?: number;
  yieldStrength: number;
  elasticModulus: number;
  /** G, MPa; AISC 360-16 takes 11,200 ksi (77,200 MPa). */
  shearModulus: number;
  basis: DesignBasis;
  connection: IntermediateConnection;
  boltDiameter?: number;
  /** Required strength on the same basis (P_u or P_a), N; more connectors are added while they raise the strength. */
  requiredStrength?: number;
}

export interface FlexuralTorsionalBuckling {
  /** F_ey with the modified slenderness, MPa. */
  flexuralY: number;
  /** F_ez = GJ/(A_g r̄_o²), C_w taken as 0 (conservative), MPa. */
  torsional: number;
  /** F_e (E4-3), MPa. */
  elasticBucklingStress: number;
  criticalStress: number;
  equation: "E3-2" | "E3-3";
  nominal: number;
  available: number;
  steps: WorkingStep[];
}

export interface DoubleAngleStrut {
  section: DoubleAngleSection;
  effectiveLengthFactor: number;
  spacingLimit: ConnectorSpacing;
  /** Intermediate connectors between the end connections and their equal spacing, mm. */
  connectors: { count: number; spacing: number; governedBy: string };
  flexural: AiscBuiltUpColumn;
  flexuralTorsional: FlexuralTorsionalBuckling;
  /** P_n: the least of flexural buckling about x-x, about y-y with (L_c/r)_m, and flexural-torsional buckling, N. */
  nominal: number;
  available: number;
  governing: string;
  /** available ≥ required, when a required strength is given. */
  passes: boolean | null;
  /** A leg wider than 0.45 √(E/F_y) t (Table B4.1a case 3): §E7 applies and this result is not valid. */
  slenderLegs: boolean;
  steps: WorkingStep[];
  warnings: string[];
  conditions: RuleCondition[];
  notChecked: string[];
}

const AISC_PHI_C = 0.9;
const AISC_OMEGA_C = 1.67;

/**
 * A double-angle strut with stitch bolts or welds: the fewest intermediate connectors that keep every
 * space within §E6.2(a) (and, given a required strength, more while they raise the strength enough),
 * and the strength at that spacing.
 */
export function aiscDoubleAngleStrut(p: DoubleAngleStrutInput): DoubleAngleStrut {
  requirePositive({ length: p.length, yieldStrength: p.yieldStrength, elasticModulus: p.elasticModulus, shearModulus: p.shearModulus });
  const section = doubleAngleSection(p.angle, p.gap);
  const K = AISC_RECOMMENDED_K[p.ends];
  const Lx = p.unbracedLengthX ?? p.length;
  const Ly = p.unbracedLengthY ?? p.length;
  requirePositive({ unbracedLengthX: Lx, unbracedLengthY: Ly });
  const Lcx = K * Lx;
  const Lcy = K * Ly;
  const ri = section.angle.radiusZ;
  const components = "angles back to back" as const;
  const spacingLimit = aiscIntermediateConnectorSpacing({ governingSlenderness: Math.max(Lcx / section.radiusX, Lcy / section.radiusY), componentRadius: ri });
  const designAt = (spacing: number) => {
    const flexural = aiscBuiltUpColumn({
      grossArea: section.area,
      elasticModulus: p.elasticModulus,
      yieldStrength: p.yieldStrength,
      basis: p.basis,
      axes: [
        { name: "x-x", effectiveLength: Lcx, radiusOfGyration: section.radiusX, shearsConnectors: false },
        { name: "y-y", effectiveLength: Lcy, radiusOfGyration: section.radiusY, shearsConnectors: true },
      ],
      componentRadius: ri,
      connection: p.connection,
      components,
      connectorSpacing: spacing,
      memberMaxWidth: section.maxWidth,
      ...(p.boltDiameter !== undefined ? { boltDiameter: p.boltDiameter } : {}),
    });
    const y = flexural.axes.find((a) => a.axis === "y-y")!;
    const flexuralTorsional = aiscFlexuralTorsional(section, y.strength.elasticBucklingStress, p);
    const modes = [
      { mode: "flexural buckling about x-x", nominal: flexural.axes.find((a) => a.axis === "x-x")!.strength.nominal },
      { mode: "flexural buckling about y-y with the modified slenderness", nominal: y.strength.nominal },
      { mode: "flexural-torsional buckling", nominal: flexuralTorsional.nominal },
    ];
    const least = modes.reduce((a, b) => (b.nominal < a.nominal ? b : a));
    const available = p.basis === "factored" ? AISC_PHI_C * least.nominal : least.nominal / AISC_OMEGA_C;
    return { flexural, flexuralTorsional, nominal: least.nominal, available, governing: least.mode };
  };

  let { count, spacing } = intermediateConnectorsFor(p.length, spacingLimit.largest);
  let governedBy = `every space within a_max = ${spacingLimit.governing.rule} (${spacingLimit.governing.reference})`;
  let design = designAt(spacing);
  const warnings: string[] = [];
  if (p.requiredStrength !== undefined) {
    requirePositive({ requiredStrength: p.requiredStrength });
    // Add connectors while the strength falls short and the next one raises it.
    for (let k = 0; k < 200 && design.available < p.requiredStrength; k++) {
      const next = designAt(p.length / (count + 2));
      if (!(next.available > design.available * (1 + 1e-9))) break;
      count += 1;
      spacing = p.length / (count + 1);
      design = next;
      governedBy = "the required strength: connectors added until the strength suffices or stops rising";
    }
    if (design.available < p.requiredStrength) warnings.push(`the strut's available strength falls short of the required strength and more connectors do not raise it (${design.governing} governs): a larger section is needed`);
  }

  const legLimit = 0.45 * Math.sqrt(p.elasticModulus / p.yieldStrength);
  const widest = Math.max(p.angle.backLeg, p.angle.outstandingLeg) / p.angle.thickness;
  const slenderLegs = exceeds(widest, legLimit);
  if (slenderLegs) warnings.push(`a leg's b/t = ${widest.toFixed(1)} exceeds 0.45√(E/F_y) = ${legLimit.toFixed(1)} (AISC 360-16 Table B4.1a case 3): the legs are slender, §E7 applies and the strength here is too high`);
  warnings.push(...design.flexural.warnings);

  const steps: WorkingStep[] = [
    { symbol: "A_g", description: "two angles, closed form without root fillets", value: section.area, quantity: "area" },
    { symbol: "r_x", description: "pair, about x-x", value: section.radiusX, quantity: "length" },
    { symbol: "r_y", description: `pair, about y-y, with the backs ${section.gap} mm apart`, value: section.radiusY, quantity: "length" },
    { symbol: "r_i = r_z", description: "one angle, least radius of gyration", value: ri, quantity: "length", reference: "AISC 360-16 §E6.1" },
    { symbol: "K", description: `effective length factor, ends ${p.ends}`, value: K, quantity: "ratio", reference: "AISC 360-16 Commentary Table C-A-7.1 [M]" },
    { symbol: "b/t", description: `widest leg against 0.45√(E/F_y) = ${legLimit.toFixed(1)}`, value: widest, quantity: "ratio", reference: "AISC 360-16 Table B4.1a case 3" },
    ...spacingLimit.steps,
    { symbol: "n", description: `intermediate connectors (${governedBy})`, value: count, quantity: "ratio", reference: "AISC 360-16 §E6.2(a)" },
    { symbol: "a", description: "equal spacing L/(n + 1)", value: spacing, quantity: "length", reference: "AISC 360-16 §E6.2(a)" },
    ...design.flexural.steps.filter((s) => !s.symbol.startsWith("a_max") && s.symbol !== "a"),
    ...design.flexuralTorsional.steps,
    { symbol: "P_n", description: `nominal strength: ${design.governing} governs`, value: design.nominal, quantity: "force", reference: "AISC 360-16 §E1" },
    { symbol: p.basis === "factored" ? "φ_c P_n" : "P_n/Ω_c", description: p.basis === "factored" ? "φ_c = 0.90" : "Ω_c = 1.67", value: design.available, quantity: "force", reference: "AISC 360-16 §E1" },
  ];
  return {
    section,
    effectiveLengthFactor: K,
    spacingLimit,
    connectors: { count, spacing, governedBy },
    flexural: design.flexural,
    flexuralTorsional: design.flexuralTorsional,
    nominal: design.nominal,
    available: design.available,
    governing: design.governing,
    passes: p.requiredStrength === undefined ? null : design.available >= p.requiredStrength,
    slenderLegs,
    steps,
    warnings,
    conditions: [
      { condition: `legs not slender: b/t ≤ 0.45√(E/F_y) = ${legLimit.toFixed(1)}`, met: !slenderLegs, clause: "AISC 360-16 Table B4.1a case 3" },
      ...design.flexural.conditions,
    ],
    notChecked: ["local buckling of slender legs (AISC 360-16 §E7): flagged, not designed", "strength of the stitch bolts or welds and of the end connections", "the gusset plate"],
  };
}

/** AISC 360-16 §E4(b) for a singly symmetric double angle (x_o = 0), C_w = 0 (conservative for double angles). */
export function aiscFlexuralTorsional(section: DoubleAngleSection, Fey: number, p: DoubleAngleStrutInput): FlexuralTorsionalBuckling {
  const Fez = (p.shearModulus * section.torsionConstant) / (section.area * section.polarRadiusSquared);
  const H = section.flexuralConstant;
  const sum = Fey + Fez;
  const Fe = (sum / (2 * H)) * (1 - Math.sqrt(1 - (4 * Fey * Fez * H) / sum ** 2));
  const { criticalStress, equation } = aiscCriticalStress(Fe, p.yieldStrength);
  const nominal = criticalStress * section.area;
  const available = p.basis === "factored" ? AISC_PHI_C * nominal : nominal / AISC_OMEGA_C;
  return {
    flexuralY: Fey,
    torsional: Fez,
    elasticBucklingStress: Fe,
    criticalStress,
    equation,
    nominal,
    available,
    steps: [
      { symbol: "J", description: "two angles, Σ b t³/3 along the legs' mid-lines", value: section.torsionConstant, quantity: "secondMoment", reference: "AISC Design Guide 9 [M]" },
      { symbol: "r̄_o", description: "polar radius of gyration about the shear centre, √(y_o² + (I_x + I_y)/A_g)", value: Math.sqrt(section.polarRadiusSquared), quantity: "length", reference: "AISC 360-16 eq. E4-9 [M]" },
      { symbol: "H", description: "1 − y_o²/r̄_o²", value: H, quantity: "ratio", reference: "AISC 360-16 eq. E4-8 [M]" },
      { symbol: "F_ez", description: "torsional buckling stress, G J/(A_g r̄_o²): the C_w term omitted for double angles (§E4 user note [M]; conservative)", value: Fez, quantity: "stress", reference: "AISC 360-16 eq. E4-7 [M]" },
      { symbol: "F_e (FT)", description: "flexural-torsional buckling stress, ((F_ey + F_ez)/2H)[1 − √(1 − 4 F_ey F_ez H/(F_ey + F_ez)²)]", value: Fe, quantity: "stress", reference: "AISC 360-16 eq. E4-3 [M]" },
      { symbol: "F_cr (FT)", description: `critical stress by ${equation === "E3-2" ? "0.658^(F_y/F_e) F_y" : "0.877 F_e"}`, value: criticalStress, quantity: "stress", reference: `AISC 360-16 eq. ${equation}` },
      { symbol: "P_n (FT)", description: "F_cr A_g", value: nominal, quantity: "force", reference: "AISC 360-16 eq. E4-1" },
    ],
  };
}

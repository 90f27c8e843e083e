/**
 * Bending stiffness of a mechanically jointed beam for deflection, instantaneous and long-term.
 *
 * Instantaneous: (EI)_ef of Annex B with K_ser (Annex B, B.1.4 and B.2 [M]).
 * Long-term: the final mean stiffness of each part and joint, EN 1995-1-1 §2.3.2.2 [M]:
 *   E_fin = E/(1 + ψ2·k_def) for each layer, K_ser,fin = K_ser/(1 + ψ2·k_def,c) for each joint, where a
 *   connection's k_def,c is twice the members' k_def when both have the same creep behaviour and
 *   2·√(k_def,1·k_def,2) when they differ (§2.3.2.2(3)–(4), eq. (2.13) [M]; the same reading is given by
 *   Porteous & Kermani, Structural Timber Design to Eurocode 5, ch. 8).
 * Pass ψ2 = 1 for a permanent action. Units: MPa, N/mm, mm, N·mm².
 */
import { gammaMethod, type GammaMethodResult } from "./gamma-method.js";
import { flangesOf, type FlangeName, type JointSet, type JointedSection } from "./jointed-section.js";

export interface LongTermInput {
  /** ψ2 of the action (1 for a permanent action). */
  psi2: number;
  /** k_def of each layer's material (EN 1995-1-1 Table 3.2; 0 for steel). */
  deformationFactors: { web: number } & Partial<Record<FlangeName, number>>;
  /** k_def of a joint where the caller knows better than the members' rule (e.g. steel-to-timber). */
  jointDeformationFactors?: Partial<Record<FlangeName, number>>;
}

export interface SlipAwareStiffness {
  /** (EI)_ef with K_ser, N·mm². */
  instantaneous: number;
  /** (EI)_ef,fin with the final moduli and slip moduli, N·mm²; null when no long-term input was given. */
  final: number | null;
  /** E·I of the glued section (γ = 1), N·mm². */
  rigid: number;
  /** Σ E_i I_i of the unconnected parts (γ = 0), N·mm². */
  noConnection: number;
  /** Deflection with slip over deflection if rigid: (EI)_rigid/(EI)_ef. */
  deflectionFactor: number;
  /** k_def,c used for each joint in the long-term stiffness. */
  jointDeformationFactors: Partial<Record<FlangeName, number>>;
  instantaneousResponse: GammaMethodResult;
  finalResponse: GammaMethodResult | null;
}

/** Joints' K must be K_ser here. */
export function slipAwareStiffness(p: { section: JointedSection; joints: JointSet; effectiveLength: number; longTerm?: LongTermInput }): SlipAwareStiffness {
  const inst = gammaMethod(p);
  const jointFactors: Partial<Record<FlangeName, number>> = {};
  let fin: GammaMethodResult | null = null;
  if (p.longTerm) {
    const { psi2, deformationFactors: kd } = p.longTerm;
    if (!(psi2 >= 0 && psi2 <= 1)) throw new RangeError(`ψ2 must lie in [0, 1], got ${psi2}`);
    const section: JointedSection = { web: { ...p.section.web, modulus: p.section.web.modulus / (1 + psi2 * kd.web) } };
    const joints: JointSet = {};
    for (const { name, layer } of flangesOf(p.section)) {
      const kFlange = kd[name];
      if (kFlange === undefined) throw new RangeError(`no k_def for the ${name} flange`);
      section[name] = { ...layer, modulus: layer.modulus / (1 + psi2 * kFlange) };
      const kJoint = p.longTerm.jointDeformationFactors?.[name] ?? 2 * Math.sqrt(kFlange * kd.web);
      jointFactors[name] = kJoint;
      const joint = p.joints[name]!;
      joints[name] = { ...joint, slipModulus: joint.slipModulus / (1 + psi2 * kJoint) };
    }
    fin = gammaMethod({ section, joints, effectiveLength: p.effectiveLength });
  }
  return {
    instantaneous: inst.effectiveStiffness,
    final: fin?.effectiveStiffness ?? null,
    rigid: inst.rigid.effectiveStiffness,
    noConnection: inst.noConnection.effectiveStiffness,
    deflectionFactor: inst.deflectionFactor,
    jointDeformationFactors: jointFactors,
    instantaneousResponse: inst,
    finalResponse: fin,
  };
}

/**
 * The γ-method for mechanically jointed beams, EN 1995-1-1:2004 Annex B (equations B.1–B.10).
 * Units: mm, MPa, N, N·mm; per-unit outputs are to be multiplied by the design M (N·mm) or V (N).
 *
 * Layers are placed by their centroids rather than by Annex B's h_i, so flanges beside the web (a box
 * with webs nailed to the flanges' sides) are covered too: the neutral axis is where Σ γ_i E_i A_i (y_i − y_NA) = 0,
 * which gives (B.6) for flanges touching the web above and below it.
 */
import { effectiveSpacing, type EffectiveSpacing } from "./effective-spacing.js";
import { flangesOf, type FlangeName, type JointConnectors, type JointSet, type JointSpacing, type JointedLayer, type JointedSection } from "./jointed-section.js";

export interface LayerResponse {
  /** γ_i (1 for the web). */
  gamma: number;
  /** a_i: distance from the layer's centroid to the neutral axis, mm. */
  distance: number;
  /** σ_i/M = γ_i E_i (y_NA − y_i)/(EI)_ef (B.7), 1/mm³: tension positive under a sagging moment. */
  axialStressPerMoment: number;
  /** σ_m,i/M = 0.5 E_i h_i/(EI)_ef (B.8), 1/mm³: the extreme-fibre bending stress about the layer's own axis. */
  bendingStressPerMoment: number;
}

export interface JointResponse {
  /** Shear flow in the joint per unit V, q/V = γ_i E_i A_i a_i/(EI)_ef, 1/mm. */
  shearFlowPerShear: number;
  /** F_i/V = γ_i E_i A_i a_i (s_i/n_i)/(EI)_ef (B.10) per connector per shear plane, at the spacing reported beside it. */
  connectorForcePerShear: number;
  /** Spacing s_i used in F_i: the constant spacing, or s_min where the spacing varies (the largest shear sits there), mm. */
  forceSpacing: number;
}

export interface JointedResponse {
  /** (EI)_ef = Σ (E_i I_i + γ_i E_i A_i a_i²) (B.1), N·mm². */
  effectiveStiffness: number;
  /** Height of the neutral axis above the section's bottom, mm. */
  neutralAxisY: number;
  layers: { web: LayerResponse } & Partial<Record<FlangeName, LayerResponse>>;
  joints: Partial<Record<FlangeName, JointResponse>>;
  /** τ_2,max/V (B.9), 1/mm²: the web's shear stress at the neutral axis, or at the web's edge nearest to it. */
  webShearStressPerShear: number;
  /** B.9 assumes the neutral axis inside the web; when it is not, the web's largest shear stress is at its edge. */
  neutralAxisInWeb: boolean;
}

export interface GammaMethodResult extends JointedResponse {
  /** l used in γ_i, mm. */
  effectiveLength: number;
  /** The spacing that entered γ_i for each joint: s, or s_ef for a varying spacing with its 4·s_min check. */
  spacings: Partial<Record<FlangeName, { spacing: number; varying: EffectiveSpacing | null }>>;
  /** The same section glued (γ = 1): reproduces q = VQ/I and E·I of the transformed section. */
  rigid: JointedResponse;
  /** The parts unconnected (γ = 0): (EI)_ef = Σ E_i I_i, no connector force. */
  noConnection: JointedResponse;
  /** (EI)_rigid/(EI)_ef: how many times the rigid assumption's deflection the slip-aware deflection is. */
  deflectionFactor: number;
  reference: string;
}

/**
 * γ_i = [1 + π² E_i A_i s_i/(K_i l²)]⁻¹ (B.5), with K_i the slip modulus of one row (n shear planes × K per plane),
 * since the connectors of both planes of a two-part flange or box web add per unit length (Annex B, B.1.3 [M]).
 * MPa, mm², mm, N/mm, mm.
 */
export function gammaFactor(p: { modulus: number; area: number; spacing: number; rowSlipModulus: number; effectiveLength: number }): number {
  return 1 / (1 + (Math.PI ** 2 * p.modulus * p.area * p.spacing) / (p.rowSlipModulus * p.effectiveLength ** 2));
}

/** Section response for given γ of the flanges (B.1, B.6–B.10); connector spacings only enter F_i. */
export function jointedResponse(
  section: JointedSection,
  gammas: Partial<Record<FlangeName, number>>,
  connectorSpacing: Partial<Record<FlangeName, { spacing: number; shearPlanesPerRow: number }>> = {},
): JointedResponse {
  const all: { name: FlangeName | "web"; layer: JointedLayer; gamma: number }[] = [
    { name: "web", layer: section.web, gamma: 1 },
    ...flangesOf(section).map(({ name, layer }) => ({ name, layer, gamma: gammaOf(gammas, name) })),
  ];
  let ea = 0;
  let eay = 0;
  for (const { layer, gamma } of all) {
    ea += gamma * layer.modulus * layer.area;
    eay += gamma * layer.modulus * layer.area * layer.centroidY;
  }
  const yNa = eay / ea;
  let ei = 0;
  for (const { layer, gamma } of all) {
    const a = layer.centroidY - yNa;
    ei += layer.modulus * layer.secondMoment + gamma * layer.modulus * layer.area * a * a;
  }
  const layers = {} as JointedResponse["layers"];
  for (const { name, layer, gamma } of all) {
    layers[name] = {
      gamma,
      distance: Math.abs(layer.centroidY - yNa),
      axialStressPerMoment: gamma === 0 ? 0 : (gamma * layer.modulus * (yNa - layer.centroidY)) / ei,
      bendingStressPerMoment: (0.5 * layer.modulus * layer.depth) / ei,
    };
  }
  const joints: JointedResponse["joints"] = {};
  for (const { name, layer } of flangesOf(section)) {
    const r = layers[name]!;
    const shearFlowPerShear = (r.gamma * layer.modulus * layer.area * r.distance) / ei;
    const c = connectorSpacing[name];
    joints[name] = {
      shearFlowPerShear,
      connectorForcePerShear: c ? (shearFlowPerShear * c.spacing) / c.shearPlanesPerRow : 0,
      forceSpacing: c?.spacing ?? 0,
    };
  }
  const web = section.web;
  const webTop = web.bottomY + web.depth;
  const cut = Math.min(Math.max(yNa, web.bottomY), webTop);
  // First moment about the neutral axis of what lies below the cut, in E-weighted area (the part of B.9 in brackets).
  let below = web.modulus * web.width * (cut - web.bottomY) * (yNa - (cut + web.bottomY) / 2);
  for (const { layer, name } of flangesOf(section)) {
    if (layer.centroidY < cut) below += gammaOf(gammas, name) * layer.modulus * layer.area * (yNa - layer.centroidY);
  }
  return {
    effectiveStiffness: ei,
    neutralAxisY: yNa,
    layers,
    joints,
    webShearStressPerShear: below / (web.width * ei),
    neutralAxisInWeb: yNa >= web.bottomY && yNa <= webTop,
  };
}

/**
 * EN 1995-1-1 Annex B for a web with one or two flanges: γ_i from each joint's slip modulus, spacing and the
 * effective length l (mm; see effectiveLength()), then (EI)_ef, a_i, stresses per unit M, τ_2,max and F_i per
 * unit V, with the rigid (γ = 1) and unconnected (γ = 0) responses beside. Use K_u for strength and K_ser
 * for deflection (Annex B, B.2 [M]).
 */
export function gammaMethod(p: { section: JointedSection; joints: JointSet; effectiveLength: number }): GammaMethodResult {
  const flanges = flangesOf(p.section);
  if (flanges.length === 0) throw new RangeError("the γ-method needs at least one flange joined to the web");
  if (!(p.effectiveLength > 0)) throw new RangeError(`the γ-method needs a positive effective length, got ${p.effectiveLength}`);
  const gammas: Partial<Record<FlangeName, number>> = {};
  const spacings: GammaMethodResult["spacings"] = {};
  const forceSpacing: Partial<Record<FlangeName, { spacing: number; shearPlanesPerRow: number }>> = {};
  for (const { name, layer } of flanges) {
    const joint = p.joints[name];
    if (!joint) throw new RangeError(`the ${name} flange has no joint connectors`);
    const { spacing, varying, smallest } = spacingForGamma(joint.spacing);
    spacings[name] = { spacing, varying };
    forceSpacing[name] = { spacing: smallest, shearPlanesPerRow: joint.shearPlanesPerRow };
    gammas[name] = gammaFactor({
      modulus: layer.modulus,
      area: layer.area,
      spacing,
      rowSlipModulus: rowSlipModulus(joint),
      effectiveLength: p.effectiveLength,
    });
  }
  for (const name of Object.keys(p.joints) as FlangeName[]) {
    if (p.joints[name] && !p.section[name]) throw new RangeError(`joint connectors given for a ${name} flange the section does not have`);
  }
  const slipAware = jointedResponse(p.section, gammas, forceSpacing);
  const rigid = jointedResponse(p.section, { top: 1, bottom: 1 }, forceSpacing);
  const noConnection = jointedResponse(p.section, { top: 0, bottom: 0 }, forceSpacing);
  return {
    ...slipAware,
    effectiveLength: p.effectiveLength,
    spacings,
    rigid,
    noConnection,
    deflectionFactor: rigid.effectiveStiffness / slipAware.effectiveStiffness,
    reference: "EN 1995-1-1:2004+A1:2008 Annex B, eqs (B.1)–(B.10)",
  };
}

/** Slip modulus of one row of a joint, N/mm. */
export function rowSlipModulus(joint: JointConnectors): number {
  if (!(joint.slipModulus > 0) || !(joint.shearPlanesPerRow > 0)) {
    throw new RangeError(`a joint needs a positive slip modulus and shear planes per row, got K = ${joint.slipModulus}, n = ${joint.shearPlanesPerRow}`);
  }
  return joint.slipModulus * joint.shearPlanesPerRow;
}

function spacingForGamma(s: JointSpacing): { spacing: number; varying: EffectiveSpacing | null; smallest: number } {
  if ("spacing" in s) {
    if (!(s.spacing > 0)) throw new RangeError(`connector spacing must be positive, got ${s.spacing}`);
    return { spacing: s.spacing, varying: null, smallest: s.spacing };
  }
  const varying = effectiveSpacing(s.minSpacing, s.maxSpacing);
  return { spacing: varying.effectiveSpacing, varying, smallest: s.minSpacing };
}

function gammaOf(gammas: Partial<Record<FlangeName, number>>, name: FlangeName): number {
  const g = gammas[name];
  if (g === undefined || !(g >= 0 && g <= 1)) throw new RangeError(`γ of the ${name} flange must lie in [0, 1], got ${g}`);
  return g;
}

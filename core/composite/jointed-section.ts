/**
 * A mechanically jointed beam in the sense of EN 1995-1-1:2004 Annex B (Figure B.1): a web (layer 2)
 * and one or two flanges (layers 1 above, 3 below) joined to it by connectors that slip.
 * Units: mm, MPa, N/mm for slip moduli.
 */

/** One layer. Several parts at the same level (the two webs of a box) form one layer with their widths summed. */
export interface JointedLayer {
  /** Mean modulus of elasticity E_i, MPa. */
  modulus: number;
  /** A_i, mm². */
  area: number;
  /** I_i about the layer's own centroid, mm⁴. */
  secondMoment: number;
  /** h_i, mm: the lever of σ_m,i = 0.5·E_i·h_i·M/(EI)_ef. */
  depth: number;
  /** b_i, mm: only the web's width is used, for τ_2,max. */
  width: number;
  /** Height of the layer's centroid above the section's bottom, mm. */
  centroidY: number;
  /** Height of the layer's bottom edge above the section's bottom, mm. */
  bottomY: number;
}

export interface JointedSection {
  /** Layer 2 of Annex B, taken with γ_2 = 1. */
  web: JointedLayer;
  /** Layer 1, above the web (or beside its upper part). */
  top?: JointedLayer;
  /** Layer 3, below the web (or beside its lower part). */
  bottom?: JointedLayer;
}

export type FlangeName = "top" | "bottom";
export const flangeNames: readonly FlangeName[] = ["top", "bottom"];

/** Connector spacing along a joint, mm: constant, or varying with the shear force between a smallest and a largest value. */
export type JointSpacing = { spacing: number } | { minSpacing: number; maxSpacing: number };

/** The connectors of one flange-to-web joint. */
export interface JointConnectors {
  /** Slip modulus per shear plane per connector, N/mm: K_ser for stiffness and deflection, K_u for strength. */
  slipModulus: number;
  /** Shear planes that cross the joint in one row: connectors per row × shear planes of each in this joint. */
  shearPlanesPerRow: number;
  spacing: JointSpacing;
}

export type JointSet = Partial<Record<FlangeName, JointConnectors>>;

/** A solid rectangular layer b × h with its bottom edge at bottomY. MPa, mm. */
export function rectangularLayer(p: { modulus: number; width: number; depth: number; bottomY: number }): JointedLayer {
  return {
    modulus: p.modulus,
    area: p.width * p.depth,
    secondMoment: (p.width * p.depth ** 3) / 12,
    depth: p.depth,
    width: p.width,
    centroidY: p.bottomY + p.depth / 2,
    bottomY: p.bottomY,
  };
}

/** The flanges present in a section, top first. */
export function flangesOf(section: JointedSection): { name: FlangeName; layer: JointedLayer }[] {
  return flangeNames.flatMap((name) => {
    const layer = section[name];
    return layer ? [{ name, layer }] : [];
  });
}

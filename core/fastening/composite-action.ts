import type { BeamAnalysis } from "../beam/analyse-beam.js";
import { effectiveLength, spanKindOf, type EffectiveLength } from "../composite/effective-length.js";
import { gammaMethod, type GammaMethodResult } from "../composite/gamma-method.js";
import type { FlangeName, JointSet, JointSpacing } from "../composite/jointed-section.js";
import type { LayeredSection } from "../composite/layers-from-section.js";
import { slipAwareStiffness } from "../composite/slip-aware-stiffness.js";
import type { ContactLine } from "../section/contacts.js";
import type { JointPlane } from "../section/joints.js";

/** A flange-to-web joint as the γ-method sees it. */
export interface FlangeJoint {
  flange: FlangeName;
  joint: string;
  /** Slip moduli per shear plane per connector, N/mm; null for a glued (rigid) joint. */
  slip: { serviceability: number; ultimate: number } | null;
  /** Connectors per row × contact lines: the shear planes one row puts across the joint. */
  shearPlanesPerRow: number;
  /** Zone spacings of the joint's schedule, mm. */
  spacings: number[];
}

export interface CompositeAnalysis {
  effectiveLength: EffectiveLength;
  ultimate: GammaMethodResult;
  serviceability: GammaMethodResult;
  /** (EI)_ef,fin for long-term deflection, when asked for. */
  final: number | null;
  /** q/V of each joint with slip (K_u), 1/mm: what replaces Q/I in the schedule. */
  flowFactors: Partial<Record<FlangeName, number>>;
  spacings: Partial<Record<FlangeName, JointSpacing>>;
}

/** A glued joint is rigid: γ = 1 to the precision that matters (K far above any connector's). */
const GLUED_SLIP = 1e15;

/** The flange joints of a layered section among the member's joints, matched by their contact lines; null when they do not match one to one. */
export function flangeJointsOf(layered: Extract<LayeredSection, { covered: true }>, joints: JointPlane[]): Partial<Record<FlangeName, JointPlane>> | null {
  const key = (l: ContactLine) => `${[l.a, l.b].sort().join("|")}|${l.orientation}|${l.level.toFixed(6)}`;
  const out: Partial<Record<FlangeName, JointPlane>> = {};
  for (const flange of ["top", "bottom"] as const) {
    const lines = layered.jointLines[flange];
    if (!lines) continue;
    const wanted = new Set(lines.map(key));
    const joint = joints.find((j) => j.lines.length === wanted.size && j.lines.every((l) => wanted.has(key(l))));
    if (!joint) return null;
    out[flange] = joint;
  }
  return out;
}

/** The effective length l of Annex B from how the member is supported: the longest span region decides. */
export function effectiveLengthOf(beam: BeamAnalysis): EffectiveLength {
  const lengths = (kind: "span" | "overhang") => beam.regions.filter((r) => r.kind === kind).map((r) => r.x1 - r.x0);
  const { kind, length } = spanKindOf(lengths("span"), lengths("overhang"), beam.ends);
  return effectiveLength(length, kind);
}

/** The spacing that enters γ: constant, or s_min and s_max of a schedule that varies (s_ef rule). */
export function jointSpacingOf(spacings: number[]): JointSpacing {
  const min = Math.min(...spacings);
  const max = Math.max(...spacings);
  return max - min <= 1e-9 * max ? { spacing: min } : { minSpacing: min, maxSpacing: max };
}

/**
 * The γ-method for the member's flange joints at their present spacings: (EI)_ef with K_u (strength)
 * and K_ser (deflection), the slip-aware shear flow per unit V of each joint, and (EI)_ef,fin when
 * ψ2 and k_def are given (EN 1995-1-1:2004+A1:2008 Annex B and §2.3.2.2).
 */
export function compositeAnalysis(p: {
  layered: Extract<LayeredSection, { covered: true }>;
  beam: BeamAnalysis;
  flanges: FlangeJoint[];
  longTerm: { psi2: number; kdef: number } | null;
}): CompositeAnalysis {
  const l = effectiveLengthOf(p.beam);
  const spacings: Partial<Record<FlangeName, JointSpacing>> = {};
  const set = (which: "serviceability" | "ultimate"): JointSet => {
    const joints: JointSet = {};
    for (const f of p.flanges) {
      spacings[f.flange] = jointSpacingOf(f.spacings);
      joints[f.flange] = { slipModulus: f.slip ? f.slip[which] : GLUED_SLIP, shearPlanesPerRow: f.shearPlanesPerRow, spacing: spacings[f.flange]! };
    }
    return joints;
  };
  const ultimate = gammaMethod({ section: p.layered.section, joints: set("ultimate"), effectiveLength: l.effectiveLength });
  const serviceability = gammaMethod({ section: p.layered.section, joints: set("serviceability"), effectiveLength: l.effectiveLength });
  let final: number | null = null;
  if (p.longTerm) {
    const kd = p.longTerm.kdef;
    const stiffness = slipAwareStiffness({
      section: p.layered.section,
      joints: set("serviceability"),
      effectiveLength: l.effectiveLength,
      longTerm: { psi2: p.longTerm.psi2, deformationFactors: { web: kd, top: kd, bottom: kd } },
    });
    final = stiffness.final;
  }
  const flowFactors: Partial<Record<FlangeName, number>> = {};
  for (const f of p.flanges) flowFactors[f.flange] = ultimate.joints[f.flange]!.shearFlowPerShear;
  return { effectiveLength: l, ultimate, serviceability, final, flowFactors, spacings };
}

/** s_max ≤ 4·s_min for the s_ef rule of Annex B: the largest spacing a joint may use given its smallest. */
export function largestSpacingForEffectiveRule(spacings: number[]): number {
  return 4 * Math.min(...spacings);
}


/**
 * Connector spacing by zones for a mechanically jointed beam designed by the γ-method
 * (EN 1995-1-1 Annex B): the spacing changes γ, γ changes the connector force, so the design
 * iterates to a spacing whose own γ gives F_i ≤ R in every zone.
 *
 * The iteration starts from the rigid spacing (γ = 1, q = VQ/I), the densest any γ can ask for.
 * Each pass takes γ from the current spacings (s_ef = 0.75 s_min + 0.25 s_max over the joint's zones)
 * and gives every zone the largest allowed spacing that carries its demand; a smaller γ lowers the
 * connector force, so the spacings only grow and stop at the first spacing that carries itself
 * (exactly, since allowed spacings are discrete). Units: N, mm, N/mm.
 */
import { allowedSpacings, largestAtMost } from "../spacing/allowed-spacings.js";
import { effectiveSpacing, type EffectiveSpacing } from "./effective-spacing.js";
import { gammaMethod, gammaFactor, jointedResponse, type GammaMethodResult } from "./gamma-method.js";
import { flangesOf, type FlangeName, type JointSet, type JointedSection } from "./jointed-section.js";

export interface SlipAwareZone {
  /** Zone extent along the member, mm. */
  from: number;
  to: number;
  /** Per load combination: the largest |V| in the zone (N) and the design resistance per connector per shear plane (N). */
  cases: { shearForce: number; resistance: number; combination?: string }[];
}

export interface SlipAwareJointInput {
  /** K_u per shear plane per connector, N/mm (strength: Annex B uses K_u at the ULS). */
  slipModulus: number;
  shearPlanesPerRow: number;
  zones: SlipAwareZone[];
  /** Detailing limits and the spacing module (or a preferred list), mm. */
  limits: { minSpacing: number; maxSpacing: number; module: number | null; preferred?: number[] | null };
}

export interface SlipAwareZoneResult {
  from: number;
  to: number;
  /** Spacing chosen with the converged γ, mm. */
  spacing: number;
  /** Spacing at which the governing connector reaches R with the converged γ (before rounding and limits), mm. */
  requiredSpacing: number;
  /** Spacing the rigid assumption (γ = 1, q = VQ/I) gives for the same zone, mm. */
  rigidSpacing: number;
  /** Largest F_i in the zone per connector per shear plane at the chosen spacing, N. */
  connectorForce: number;
  /** Same connector force if the joint were rigid at the chosen spacing, N. */
  rigidConnectorForce: number;
  /** max over combinations of F_i/R. */
  utilisation: number;
  governingCombination: string | null;
  passes: boolean;
}

export interface SlipAwareJointResult {
  zones: SlipAwareZoneResult[];
  gamma: number;
  effectiveSpacing: EffectiveSpacing;
  /** Zones whose demand the smallest allowed spacing cannot carry. */
  infeasibleZones: number[];
}

export interface SlipAwareIteration {
  iteration: number;
  gammas: Partial<Record<FlangeName, number>>;
  effectiveStiffness: number;
  spacings: Partial<Record<FlangeName, number[]>>;
}

export interface SlipAwareDesign {
  converged: boolean;
  /** Passes of the γ ↔ spacing loop after the rigid start. */
  iterations: number;
  history: SlipAwareIteration[];
  joints: Partial<Record<FlangeName, SlipAwareJointResult>>;
  /** The γ-method at the chosen spacings (K_u), with the rigid and unconnected responses beside. */
  response: GammaMethodResult;
  passes: boolean;
  reasons: string[];
}

/** Designs each flange joint's zone spacings so that F_i ≤ R with γ taken from those same spacings. l in mm. */
export function designSlipAwareSpacing(p: {
  section: JointedSection;
  joints: Partial<Record<FlangeName, SlipAwareJointInput>>;
  effectiveLength: number;
  maxIterations?: number;
}): SlipAwareDesign {
  const flanges = flangesOf(p.section);
  const maxIterations = p.maxIterations ?? 50;
  const inputs = flanges.map(({ name, layer }) => {
    const joint = p.joints[name];
    if (!joint) throw new RangeError(`the ${name} flange has no joint to design`);
    if (joint.zones.length === 0) throw new RangeError(`the ${name} joint has no zones`);
    const allowed = allowedSpacings({ module: joint.limits.module, preferred: joint.limits.preferred ?? null, min: joint.limits.minSpacing, max: joint.limits.maxSpacing });
    if (allowed.length === 0) throw new RangeError(`no allowed spacing between ${joint.limits.minSpacing} and ${joint.limits.maxSpacing} mm for the ${name} joint`);
    // d = max over combinations of |V|/R; the zone needs q/V · d · s/n ≤ 1.
    const demand = joint.zones.map((z) => Math.max(0, ...z.cases.map((c) => Math.abs(c.shearForce) / c.resistance)));
    return { name, layer, joint, allowed, demand };
  });

  const spacingsFor = (gammas: Partial<Record<FlangeName, number>>) => {
    const r = jointedResponse(p.section, gammas);
    const out: Partial<Record<FlangeName, { chosen: number[]; required: number[]; infeasible: number[] }>> = {};
    for (const { name, joint, allowed, demand } of inputs) {
      const qPerV = r.joints[name]!.shearFlowPerShear;
      const required = demand.map((d) => (d > 0 && qPerV > 0 ? joint.shearPlanesPerRow / (qPerV * d) : Infinity));
      const infeasible: number[] = [];
      let chosen = required.map((s, k) => {
        const pick = largestAtMost(allowed, s);
        if (pick === undefined) infeasible.push(k);
        return pick ?? allowed[0]!;
      });
      // Annex B's varying spacing holds for s_max ≤ 4·s_min: closing the wide zones is always safe.
      const cap = largestAtMost(allowed, 4 * Math.min(...chosen)) ?? allowed[0]!;
      chosen = chosen.map((s) => Math.min(s, cap));
      out[name] = { chosen, required, infeasible };
    }
    return { response: r, spacings: out };
  };

  const gammasFor = (spacings: Partial<Record<FlangeName, number[]>>) => {
    const g: Partial<Record<FlangeName, number>> = {};
    for (const { name, layer, joint } of inputs) {
      const s = spacings[name]!;
      g[name] = gammaFactor({
        modulus: layer.modulus,
        area: layer.area,
        spacing: effectiveSpacing(Math.min(...s), Math.max(...s)).effectiveSpacing,
        rowSlipModulus: joint.slipModulus * joint.shearPlanesPerRow,
        effectiveLength: p.effectiveLength,
      });
    }
    return g;
  };

  const rigidGammas = { top: 1, bottom: 1 };
  const rigid = spacingsFor(rigidGammas);
  const chosenOf = (s: typeof rigid.spacings) => Object.fromEntries(inputs.map(({ name }) => [name, s[name]!.chosen])) as Partial<Record<FlangeName, number[]>>;
  let current = chosenOf(rigid.spacings);
  const history: SlipAwareIteration[] = [{ iteration: 0, gammas: rigidGammas, effectiveStiffness: rigid.response.effectiveStiffness, spacings: current }];
  let converged = false;
  let iterations = 0;
  let last = rigid;
  while (iterations < maxIterations) {
    iterations++;
    const gammas = gammasFor(current);
    last = spacingsFor(gammas);
    const next = chosenOf(last.spacings);
    history.push({ iteration: iterations, gammas, effectiveStiffness: last.response.effectiveStiffness, spacings: next });
    const same = inputs.every(({ name }) => next[name]!.every((s, k) => s === current[name]![k]));
    current = next;
    if (same) {
      converged = true;
      break;
    }
  }

  const jointSet: JointSet = {};
  for (const { name, joint } of inputs) {
    const s = current[name]!;
    const lo = Math.min(...s);
    const hi = Math.max(...s);
    jointSet[name] = { slipModulus: joint.slipModulus, shearPlanesPerRow: joint.shearPlanesPerRow, spacing: lo === hi ? { spacing: lo } : { minSpacing: lo, maxSpacing: hi } };
  }
  const response = gammaMethod({ section: p.section, joints: jointSet, effectiveLength: p.effectiveLength });
  const joints: Partial<Record<FlangeName, SlipAwareJointResult>> = {};
  const reasons: string[] = [];
  let passes = converged;
  if (!converged) reasons.push(`the spacing did not settle within ${maxIterations} passes`);
  for (const { name, joint } of inputs) {
    const s = current[name]!;
    const qPerV = response.joints[name]!.shearFlowPerShear;
    const qPerVRigid = response.rigid.joints[name]!.shearFlowPerShear;
    const zones = joint.zones.map((z, k): SlipAwareZoneResult => {
      const spacing = s[k]!;
      let utilisation = 0;
      let connectorForce = 0;
      let rigidConnectorForce = 0;
      let governingCombination: string | null = null;
      for (const c of z.cases) {
        // Verified afresh from the final γ, independently of how the spacing was chosen.
        const f = (qPerV * Math.abs(c.shearForce) * spacing) / joint.shearPlanesPerRow;
        connectorForce = Math.max(connectorForce, f);
        rigidConnectorForce = Math.max(rigidConnectorForce, (qPerVRigid * Math.abs(c.shearForce) * spacing) / joint.shearPlanesPerRow);
        if (f / c.resistance > utilisation) {
          utilisation = f / c.resistance;
          governingCombination = c.combination ?? null;
        }
      }
      return {
        from: z.from,
        to: z.to,
        spacing,
        requiredSpacing: last.spacings[name]!.required[k]!,
        rigidSpacing: rigid.spacings[name]!.chosen[k]!,
        connectorForce,
        rigidConnectorForce,
        utilisation,
        governingCombination,
        passes: utilisation <= 1 + 1e-9,
      };
    });
    const infeasibleZones = last.spacings[name]!.infeasible;
    if (infeasibleZones.length > 0) reasons.push(`${name} joint: the smallest allowed spacing does not carry zone(s) ${infeasibleZones.map((k) => k + 1).join(", ")}`);
    if (zones.some((z) => !z.passes)) passes = false;
    joints[name] = {
      zones,
      gamma: response.layers[name]!.gamma,
      effectiveSpacing: effectiveSpacing(Math.min(...s), Math.max(...s)),
      infeasibleZones,
    };
  }
  if (reasons.length > 0) passes = false;
  return { converged, iterations, history, joints, response, passes, reasons };
}

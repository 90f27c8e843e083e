import type { BeamAnalysis } from "../beam/analyse-beam.js";
import { maxAbsShear, momentExtremes } from "../beam/member-actions.js";
import type { FlangeName } from "../composite/jointed-section.js";
import { layersFromSection } from "../composite/layers-from-section.js";
import type { ConnectorKind } from "../connector/connector-kind.js";
import type { Connector } from "../connector/registry.js";
import type { JobDocument } from "../schema/job.js";
import type { BondLineResult, DesignResult, MemberCheck, Schedule, WeldResult } from "../schema/result.js";
import type { JointPlane } from "../section/joints.js";
import type { SectionModel } from "../section/section-model.js";
import { inJobUnits } from "../units/format.js";
import { compositeAnalysis, flangeJointsOf, jointSpacingOf, largestSpacingForEffectiveRule, type CompositeAnalysis, type FlangeJoint } from "./composite-action.js";
import type { JointInput } from "./discrete-schedule.js";

interface Run {
  schedule?: Schedule;
  bondLine?: BondLineResult;
  weld?: WeldResult;
  warnings: string[];
  mirrored: boolean;
}

interface PreparedJoint {
  joint: JointPlane;
  kind: ConnectorKind<Connector>;
  input: JointInput;
}

/** Deflection with slip relative to the rigid section's, for the deflection checks. */
export interface StiffnessFactor {
  factor: number;
  finalFactor: number | null;
  note: string;
}

const MAX_ITERATIONS = 12;
const REFERENCE = "EN 1995-1-1:2004+A1:2008 Annex B (γ-method), eqs (B.1)–(B.10); K_ser and K_u from Table 7.1 and eq. (2.1); final stiffness by §2.3.2.2";

/**
 * Composite action of a layered timber member: the γ-method beside the rigid section. With the
 * slip-aware model the flange joints are designed again with the slip-aware shear flow until the
 * spacings stop changing (spacing changes γ, γ changes the flow); with the rigid model the slip-aware
 * figures are only reported. Members the method does not cover get a reason (or nothing, when rigid).
 */
export function compositeDesign(p: {
  job: JobDocument;
  section: SectionModel;
  beam: BeamAnalysis;
  prepared: PreparedJoint[];
  runs: Map<string, Run>;
  rerun: (joint: string, override: Partial<Pick<JointInput, "flowFactor" | "maxSpacingCap">>) => Run;
}): { result: DesignResult["composite"]; stiffness: StiffnessFactor | null; checks: MemberCheck[]; assumptions: string[] } {
  const model = p.job.compositeAction.model;
  const none = (reason: string) => ({
    result: model === "slip-aware" ? { ...empty(model), reason } : null,
    stiffness: null,
    checks: [],
    assumptions: model === "slip-aware" ? [`Slip-aware composite action was asked for but does not apply: ${reason} The rigid model (q = V·Q/I) is used.`] : [],
  });
  const layered = layersFromSection(p.section);
  if (!layered.covered) return none(`${layered.reason}.`);
  const matched = flangeJointsOf(layered, p.prepared.map((x) => x.joint));
  if (!matched) return none("the flange-to-web joints do not each form one joint of the member.");

  const flanges: (FlangeJoint & { prepared: PreparedJoint })[] = [];
  for (const flange of ["top", "bottom"] as const) {
    const joint = matched[flange];
    if (!joint) continue;
    const prepared = p.prepared.find((x) => x.joint.id === joint.id)!;
    const run = p.runs.get(joint.id)!;
    const base = { flange, joint: joint.id, prepared, shearPlanesPerRow: prepared.input.fastening.rows * joint.lines.length };
    if (run.bondLine) flanges.push({ ...base, slip: null, spacings: [1] });
    else if (run.schedule) {
      const slip = run.schedule.resistance[0]?.slip;
      if (!slip) return none(`the connector of joint ${joint.id} (${run.schedule.connectorLabel}) has no slip modulus; give it one (a rated connector's slipModulus) or use a connector whose standard gives K_ser.`);
      flanges.push({ ...base, slip: { serviceability: slip.serviceability, ultimate: slip.ultimate }, spacings: run.schedule.zones.map((z) => z.spacing) });
    } else return none(`joint ${joint.id} is welded: the γ-method is for timber connectors that slip.`);
  }

  // Glue lines do not slip (γ = 1): with every flange joint glued the two models are one and the same.
  const allGlued = flanges.every((f) => f.slip === null);
  if (allGlued && model === "rigid") return { result: null, stiffness: null, checks: [], assumptions: [] };

  const rigidCounts = new Map(flanges.map((f) => [f.joint, p.runs.get(f.joint)!.schedule?.count ?? null]));
  const longTerm = p.job.compositeAction.longTerm ?? null;
  let analysis: CompositeAnalysis = compositeAnalysis({ layered, beam: p.beam, flanges, longTerm });
  let iterations = 0;
  let converged = true;
  let keptRound: number | null = null;
  if (model === "slip-aware") {
    // Round k designs with the flow of round k − 1's spacings. γ falls as s_ef grows, so round k is safe
    // whenever its s_ef is no smaller than round k − 1's (its real flow is then no larger than the flow
    // it was designed for). The rounds stop when s_ef settles within 5 % on a safe round; if they keep
    // moving, the last safe round is kept, and failing that the rigid design.
    converged = false;
    const sEf = (spacings: number[]) => {
      const js = jointSpacingOf(spacings);
      return "spacing" in js ? js.spacing : 0.75 * js.minSpacing + 0.25 * js.maxSpacing;
    };
    const rigidRuns = new Map(flanges.map((f) => [f.joint, { run: p.runs.get(f.joint)!, spacings: f.spacings }]));
    let kept: { round: number; rounds: Map<string, { run: Run; spacings: number[] }> } | null = null;
    for (iterations = 1; iterations <= MAX_ITERATIONS; iterations++) {
      let safe = true;
      let settled = true;
      const round = new Map<string, { run: Run; spacings: number[] }>();
      for (const f of flanges) {
        if (!f.slip) continue;
        const run = p.rerun(f.joint, { flowFactor: analysis.flowFactors[f.flange]!, maxSpacingCap: largestSpacingForEffectiveRule(f.spacings) });
        const spacings = run.schedule!.zones.map((z) => z.spacing);
        const before = sEf(f.spacings);
        const after = sEf(spacings);
        if (after < before * (1 - 1e-9)) safe = false;
        if (Math.abs(after - before) > 0.05 * before) settled = false;
        round.set(f.joint, { run, spacings });
      }
      for (const f of flanges) {
        const r = round.get(f.joint);
        if (!r) continue;
        p.runs.set(f.joint, r.run);
        f.spacings = r.spacings;
      }
      if (safe) kept = { round: iterations, rounds: round };
      analysis = compositeAnalysis({ layered, beam: p.beam, flanges, longTerm });
      if (safe && settled) {
        converged = true;
        break;
      }
    }
    if (!converged) {
      const restore = kept?.rounds ?? rigidRuns;
      for (const f of flanges) {
        const r = restore.get(f.joint);
        if (!r) continue;
        p.runs.set(f.joint, r.run);
        f.spacings = r.spacings;
      }
      iterations = Math.min(iterations, MAX_ITERATIONS);
      analysis = compositeAnalysis({ layered, beam: p.beam, flanges, longTerm });
      keptRound = kept?.round ?? 0;
    }
  }

  const u = analysis.ultimate;
  const ser = analysis.serviceability;
  const result: NonNullable<DesignResult["composite"]> = {
    model,
    applies: true,
    reason: null,
    effectiveLength: analysis.effectiveLength.effectiveLength,
    effectiveLengthRule: analysis.effectiveLength.rule,
    stiffness: { rigid: u.rigid.effectiveStiffness, serviceability: ser.effectiveStiffness, ultimate: u.effectiveStiffness, final: analysis.final, noConnection: u.noConnection.effectiveStiffness },
    deflectionFactor: ser.deflectionFactor,
    finalDeflectionFactor: analysis.final ? u.rigid.effectiveStiffness / analysis.final : null,
    joints: flanges.map((f) => {
      const used = u.spacings[f.flange]!;
      return {
        joint: f.joint,
        flange: f.flange,
        serviceabilitySlip: f.slip?.serviceability ?? null,
        ultimateSlip: f.slip?.ultimate ?? null,
        shearPlanesPerRow: f.shearPlanesPerRow,
        spacing: used.spacing,
        minSpacing: Math.min(...f.spacings),
        maxSpacing: Math.max(...f.spacings),
        withinFourTimes: used.varying?.withinLimit ?? true,
        gammaUltimate: u.layers[f.flange]!.gamma,
        gammaServiceability: ser.layers[f.flange]!.gamma,
        flowFactorRigid: u.rigid.joints[f.flange]!.shearFlowPerShear,
        flowFactorSlip: u.joints[f.flange]!.shearFlowPerShear,
        rigidCount: rigidCounts.get(f.joint) ?? null,
        slipAwareCount: model === "slip-aware" ? (p.runs.get(f.joint)!.schedule?.count ?? null) : null,
      };
    }),
    iterations,
    converged,
    reference: REFERENCE,
  };
  const assumptions = [
    model === "slip-aware"
      ? `Composite action with slip (γ-method): K_u for connector forces and stresses, K_ser for deflection; ${analysis.effectiveLength.rule}, l = ${inJobUnits(analysis.effectiveLength.effectiveLength, "span", p.job.units)} used in γ; a varying spacing enters γ as s_ef = 0.75·s_min + 0.25·s_max with s_max ≤ 4·s_min (Annex B [M]). ${converged ? `s_ef settled within 5 % after ${iterations} design round(s), on a round whose s_ef did not shrink (so its real flow is no larger than the flow it was designed for).` : keptRound ? `s_ef had not settled within 5 % after ${MAX_ITERATIONS} rounds; round ${keptRound}, the last whose s_ef did not shrink (so it is on the safe side), is shown.` : `s_ef had not settled and no round was on the safe side; the rigid design is shown.`}`
      : "Composite action taken as rigid (q = V·Q/I); the slip-aware figures (γ-method, EN 1995-1-1 Annex B) are shown beside for comparison only.",
    ...(allGlued ? ["Every flange joint is glued: a glue line does not slip (γ = 1), so the slip-aware model gives the rigid section's stiffness and shear flow."] : []),
  ];
  const stiffness: StiffnessFactor | null =
    model === "slip-aware"
      ? { factor: ser.deflectionFactor, finalFactor: result.finalDeflectionFactor, note: `slip-aware: × (EI)_rigid/(EI)_ef = ${ser.deflectionFactor.toFixed(3)} (K_ser)` }
      : null;
  return { result, stiffness, checks: model === "slip-aware" ? slipAwareChecks(p, layered.parts, analysis) : [], assumptions };
}

function empty(model: "rigid" | "slip-aware"): NonNullable<DesignResult["composite"]> {
  return { model, applies: false, reason: null, effectiveLength: null, effectiveLengthRule: null, stiffness: null, deflectionFactor: null, finalDeflectionFactor: null, joints: [], iterations: 0, converged: true, reference: REFERENCE };
}

/** Stresses of the jointed section with slip (K_u): axial plus bending stress in each layer (B.7 + B.8), and the web's largest shear (B.9). */
function slipAwareChecks(
  p: { section: SectionModel; beam: BeamAnalysis },
  parts: { web: string[] } & Partial<Record<FlangeName, string[]>>,
  analysis: CompositeAnalysis,
): MemberCheck[] {
  const u = analysis.ultimate;
  const checks: MemberCheck[] = [];
  let mWorst = { value: 0, x: 0, combination: "" };
  let vWorst = { value: 0, x: 0, combination: "" };
  for (const r of p.beam.results) {
    const { max, min } = momentExtremes(r.actions);
    for (const m of [max, min]) if (Math.abs(m.value) > mWorst.value) mWorst = { value: Math.abs(m.value), x: m.x, combination: r.combination.id };
    const v = maxAbsShear(r.actions, 0, p.beam.length);
    if (v.value > vWorst.value) vWorst = { value: v.value, x: v.x, combination: r.combination.id };
  }
  for (const layer of ["top", "web", "bottom"] as const) {
    const ids = parts[layer];
    const response = u.layers[layer];
    if (!ids || !response) continue;
    const material = p.section.parts.find((x) => x.id === ids[0])!.material;
    const fb = material.strength.bending;
    if (fb !== undefined) {
      const sigma = (Math.abs(response.axialStressPerMoment) + response.bendingStressPerMoment) * mWorst.value;
      checks.push({
        id: `slip-bending-${layer}`,
        title: `Axial + bending stress with slip, ${layer === "web" ? "web" : `${layer} flange`} (${ids.join(", ")})`,
        quantity: "stress",
        demand: sigma,
        capacity: fb,
        utilisation: sigma / fb,
        passes: sigma <= fb * (1 + 1e-9),
        combination: mWorst.combination,
        at: mWorst.x,
        reference: "σ_i + σ_m,i = (γ_i E_i a_i + 0.5 E_i h_i)·M/(EI)_ef, EN 1995-1-1 Annex B (B.7), (B.8), taken against the bending strength (conservative for the axial part)",
      });
    }
  }
  const web = p.section.parts.find((x) => x.id === parts.web[0])!.material;
  if (web.strength.shear !== undefined) {
    const tau = u.webShearStressPerShear * vWorst.value;
    checks.push({
      id: "slip-web-shear",
      title: `Largest web shear stress with slip (${parts.web.join(", ")})`,
      quantity: "stress",
      demand: tau,
      capacity: web.strength.shear,
      utilisation: tau / web.strength.shear,
      passes: tau <= web.strength.shear * (1 + 1e-9),
      combination: vWorst.combination,
      at: vWorst.x,
      reference: "τ_2,max, EN 1995-1-1 Annex B (B.9)",
    });
  }
  return checks;
}

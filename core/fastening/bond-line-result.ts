import type { BondLineKind } from "../connector/connector-kind.js";
import type { Connector } from "../connector/registry.js";
import { checkBondLine } from "../checks/bond-line.js";
import type { BondLineResult } from "../schema/result.js";
import { demandActionsOf, type JointInput } from "./discrete-schedule.js";

/** The bond line of a glued joint: τ(x) = q(x)/t for every combination against that combination's design strength. */
export function bondLineResult(input: JointInput, kind: BondLineKind<Connector>): BondLineResult {
  const { beam, stations, joint, connector, contexts, stressFactor } = input;
  const strengths = contexts.map((lines) => lines.map((c) => kind.shearStrength(connector, c)).reduce((a, b) => (b.value < a.value ? b : a)));
  const check = checkBondLine(beam, stressFactor, strengths, stations, demandActionsOf(input));
  return {
    joint: joint.id,
    connector: connector.id,
    connectorLabel: kind.describe(connector),
    width: joint.contactWidth,
    strength: strengths.map((s, i) => ({ combination: beam.results[i]!.combination.id, value: s.value, governing: s.governing, reference: s.reference, steps: s.steps })),
    maxStress: check.maxStress,
    at: check.at,
    combination: check.combination,
    utilisation: check.utilisation,
    passes: check.passes,
    stress: check.stress,
  };
}

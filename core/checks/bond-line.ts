import type { BeamAnalysis } from "../beam/analyse-beam.js";
import { maxAbsShear, shearAt } from "../beam/member-actions.js";
import type { BondStrength } from "../connector/connector-kind.js";

export interface BondLineCheck {
  maxStress: number;
  at: number;
  combination: string;
  utilisation: number;
  passes: boolean;
  /** Largest stress over the combinations at each station. */
  stress: number[];
}

/**
 * Bond-line shear stress τ(x) = q(x)/t = |V(x)|·Q/(I·t) for every combination against that
 * combination's design shear strength; the governing station is where τ/f is largest.
 */
export function checkBondLine(beam: BeamAnalysis, stressFactor: number, strengths: BondStrength[], stations: { x: number; side: "left" | "right" }[], actions = beam.results.map((r) => r.actions)): BondLineCheck {
  let worst = { utilisation: 0, stress: 0, at: 0, combination: beam.results[0]?.combination.id ?? "" };
  beam.results.forEach((r, i) => {
    const v = maxAbsShear(actions[i]!, 0, beam.length);
    const tau = v.value * stressFactor;
    const u = tau / strengths[i]!.value;
    if (u > worst.utilisation) worst = { utilisation: u, stress: tau, at: v.x, combination: r.combination.id };
  });
  const stress = stations.map((s) => Math.max(...actions.map((a) => Math.abs(shearAt(a, s.x, s.side)) * stressFactor)));
  return { maxStress: worst.stress, at: worst.at, combination: worst.combination, utilisation: worst.utilisation, passes: worst.utilisation <= 1 + 1e-9, stress };
}

import type { WorkingStep } from "../connector/connector-kind.js";

/**
 * Axial compression with bending, AISC 360-16 §H1.1 [M] (eq. H1-1a, H1-1b): required over available
 * strengths on one basis (LRFD or ASD). The available flexural strengths come from Chapter F, which
 * this file does not compute. Forces in N, moments in N·mm.
 */
export function aiscH1Interaction(p: { requiredAxial: number; availableAxial: number; requiredMomentX: number; availableMomentX: number; requiredMomentY?: number; availableMomentY?: number }): { utilisation: number; equation: "H1-1a" | "H1-1b"; passes: boolean; steps: WorkingStep[] } {
  for (const [name, v] of Object.entries(p)) if (v !== undefined && !(Number.isFinite(v) && v >= 0)) throw new RangeError(`${name} must be a non-negative finite number, got ${v}`);
  if (!(p.availableAxial > 0 && p.availableMomentX > 0)) throw new RangeError("availableAxial and availableMomentX must be positive");
  const axialRatio = p.requiredAxial / p.availableAxial;
  const my = p.requiredMomentY ? p.requiredMomentY / (p.availableMomentY ?? NaN) : 0;
  if (Number.isNaN(my)) throw new RangeError("availableMomentY: needed with requiredMomentY");
  const bending = p.requiredMomentX / p.availableMomentX + my;
  const steep = axialRatio >= 0.2;
  const utilisation = steep ? axialRatio + (8 / 9) * bending : axialRatio / 2 + bending;
  const equation = steep ? "H1-1a" : "H1-1b";
  return {
    utilisation,
    equation,
    passes: utilisation <= 1 + 1e-9,
    steps: [
      { symbol: "P_r/P_c", description: "required over available axial strength", value: axialRatio, quantity: "ratio", reference: "AISC 360-16 §H1.1 [M]" },
      { symbol: "M_rx/M_cx + M_ry/M_cy", description: "required over available flexural strengths", value: bending, quantity: "ratio", reference: "AISC 360-16 §H1.1 [M]" },
      {
        symbol: "interaction",
        description: steep ? "P_r/P_c ≥ 0.2: P_r/P_c + 8/9 (M_rx/M_cx + M_ry/M_cy) ≤ 1.0" : "P_r/P_c < 0.2: P_r/(2P_c) + (M_rx/M_cx + M_ry/M_cy) ≤ 1.0",
        value: utilisation,
        quantity: "ratio",
        reference: `AISC 360-16 eq. ${equation} [M]`,
      },
    ],
  };
}

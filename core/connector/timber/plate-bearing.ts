import type { ConnectorContext, ModeValue, WorkingStep } from "../connector-kind.js";
import { MM_PER_IN } from "../quantity-text.js";
import { inchBolt, metricBoltSize } from "../steel/bolt-sizes.js";
import { EN1993_GAMMA_M2 } from "../steel/en1993-bolt.js";
import type { DowelGeometry, DowelSpec } from "./dowel-joint.js";

/** AISC 360-16 §J3.10 [M]: φ = 0.75 (LRFD), Ω = 2.00 (ASD). */
const AISC_BEARING = { phi: 0.75, omega: 2.0 };

/**
 * Bearing of a bolt or dowel on each steel plate it passes through, per contact line, on the job's
 * basis: the plate's limit states beside the timber's yield modes. A central plate serves both contact
 * lines of a double-shear joint (half per line); an outer plate bears on its own line; in single shear
 * the plate at the line. Null when the fastener crosses no steel or is not a bolt or dowel; a plain dowel
 * gets only a warning that it is not checked.
 *
 * NDS-2018 (timber, allowable or LRFD): AISC 360-16 §J3.10(a) [M], bearing R_n = 2.4 d t F_u and tear-out
 * R_n = 1.2 l_c t F_u with l_c at the least edge distance of Table J3.4 less half a standard hole (d + 1/16 in,
 * Table J3.3 [M]): the program places the rows by the timber's distances, not the plate's, so the plate's
 * edge distance is taken at the least it may be. Allowable: R_n/Ω beside Z′ (both ASD values); factored φR_n.
 *
 * EN 1995-1-1 (factored): EN 1993-1-8 Table 3.4 [M], F_b,Rd = k₁ α_b f_u d t/γ_M2, γ_M2 = 1.25 (Table 2.1
 * [M]). The force runs across the plate (across the member) for side-by-side plies and along it otherwise;
 * either way the bolt's distances to the plate's edges and ends are not placed here, so e₁ = e₂ = 1.2 d₀,
 * the least of Table 3.3 [M]: α_d = e₁/3d₀ = 0.4, k₁ = 2.8 e₂/d₀ − 1.7 = 1.66, α_b = min(α_d, f_ub/f_u, 1).
 */
export function plateBearing(spec: DowelSpec, context: ConnectorContext, g: DowelGeometry): { modes: ModeValue[]; steps: WorkingStep[]; warnings: string[] } | null {
  const steel = g.parts.map((p) => p.member).filter((m) => m.material.family === "steel");
  if (steel.length === 0 || (spec.family !== "bolt" && spec.family !== "dowel")) return null;
  if (spec.family === "dowel") {
    // A plain dowel (pin) bears on a plate by EN 1993-1-8 Table 3.10 rather than Table 3.4: not written here.
    return { modes: [], steps: [], warnings: [`Bearing of the dowels on steel part${steel.length > 1 ? "s" : ""} ${steel.map((m) => `"${m.part}"`).join(", ")} is not checked (a plain dowel through a steel plate: check the plate's bearing by hand).`] };
  }
  const central = g.double?.central.material.family === "steel" ? g.double.central.part : null;
  // Double shear: a central plate carries the whole bolt force (half per line); an outer plate its own line's.
  const perLine = (part: string) => (spec.shear === "double" && part === central ? 0.5 : 1);
  const d = spec.diameter;
  const modes: ModeValue[] = [];
  const steps: WorkingStep[] = [];
  const warnings: string[] = [];
  for (const m of steel) {
    const fu = m.material.tensileStrength;
    const t = m.thickness;
    if (fu === undefined) {
      warnings.push(`Bearing of the ${spec.noun}s on steel part "${m.part}" is not checked: its material gives no tensile strength f_u.`);
      continue;
    }
    const share = perLine(m.part);
    const half = share < 1 ? "; the central plate serves both contact lines, half per line" : "";
    if (spec.standard === "NDS-2018") {
      const factor = context.basis === "allowable" ? 1 / AISC_BEARING.omega : AISC_BEARING.phi;
      const basis = context.basis === "allowable" ? "R_n/Ω, Ω = 2.00 (ASD, beside the allowable Z′)" : "φR_n, φ = 0.75";
      const bearing = 2.4 * d * t * fu;
      const dIn = d / MM_PER_IN;
      const hole = (dIn < 1 ? dIn + 1 / 16 : dIn + 1 / 8) * MM_PER_IN;
      const minEdge = (inchBolt(dIn)?.minEdgeIn ?? 1.25 * dIn) * MM_PER_IN;
      const lc = Math.max(0, minEdge - hole / 2);
      const tearOut = 1.2 * lc * t * fu;
      steps.push({ symbol: "R_n,b", description: `bearing on plate "${m.part}": 2.4 d t F_u (t = ${round(t)} mm, F_u = ${round(fu)} MPa), ${basis}${half}`, value: bearing * factor * share, quantity: "connectorForce", reference: "AISC 360-16 eq. J3-6a [M]" });
      steps.push({ symbol: "R_n,t", description: `tear-out of plate "${m.part}": 1.2 l_c t F_u, l_c = ${round(lc)} mm (the least edge distance of Table J3.4, ${round(minEdge)} mm, less half a standard hole ${round(hole)} mm: the plate's own edge distance is not placed here), ${basis}${half}`, value: tearOut * factor * share, quantity: "connectorForce", reference: "AISC 360-16 eq. J3-6c [M]" });
      modes.push({ mode: `bearing on plate "${m.part}"`, value: bearing * factor * share, reference: "AISC 360-16 §J3.10, eq. J3-6a [M]" });
      modes.push({ mode: `tear-out of plate "${m.part}"`, value: tearOut * factor * share, reference: "AISC 360-16 §J3.10, eq. J3-6c [M]" });
    } else {
      const d0 = (Number.isInteger(d) ? metricBoltSize(`M${d}`)?.d0 : undefined) ?? d + (d <= 14 ? 1 : d <= 24 ? 2 : 3);
      const alphaD = 1.2 / 3;
      const k1 = 2.8 * 1.2 - 1.7;
      const fub = spec.ultimateStrength;
      const alphaB = Math.min(alphaD, fub !== undefined ? fub / fu : 1, 1);
      const value = (k1 * alphaB * fu * d * t) / EN1993_GAMMA_M2;
      steps.push({
        symbol: "F_b,Rd",
        description: `bearing on plate "${m.part}": k₁ α_b f_u d t/γ_M2 (t = ${round(t)} mm, f_u = ${round(fu)} MPa, d₀ = ${round(d0)} mm); the distances to the plate's edges and ends are not placed here, so e₁ = e₂ = 1.2 d₀ (the least of Table 3.3): α_d = 0.4, k₁ = 1.66, α_b = ${round(alphaB)}${half}`,
        value: value * share,
        quantity: "connectorForce",
        reference: "EN 1993-1-8 Table 3.4 [M]",
      });
      modes.push({ mode: `bearing on plate "${m.part}"`, value: value * share, reference: "EN 1993-1-8 Table 3.4 [M]" });
    }
  }
  return { modes, steps, warnings };
}

const round = (x: number) => Number(x.toPrecision(4));

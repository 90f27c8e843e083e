/**
 * One bolt by EN 1993-1-8:2005 Table 3.4 (shear and bearing, category A bearing type), N and mm;
 * γ_M2 = 1.25 (recommended value, §2.2).
 */
export const EN1993_GAMMA_M2 = 1.25;
/** Slip resistance at the ultimate limit state (category C) and at serviceability (category B), EN 1993-1-8 Table 2.1 recommended values [M]. */
export const EN1993_GAMMA_M3 = 1.25;
export const EN1993_GAMMA_M3_SER = 1.1;
/** Slip factor μ by class of friction surface, EN 1993-1-8 Table 3.7 [M]. */
export const frictionSurfaceSlipFactor = { A: 0.5, B: 0.4, C: 0.3, D: 0.2 } as const;

export interface En1993Ply {
  name: string;
  thickness: number;
  /** Ultimate tensile strength f_u of the ply, MPa. */
  tensileStrength: number;
  /** Share of the bolt force the ply carries (1, or 1/2 for each outer ply of a double-shear joint). */
  share: number;
}

export interface En1993BoltInput {
  d: number;
  d0: number;
  /** Tensile stress area A_s, mm². */
  As: number;
  fub: number;
  alphaVThreads: number;
  threads: "included" | "excluded";
  shearPlanes: 1 | 2;
  plies: En1993Ply[];
  /** e₁ end distance, p₁ spacing along the load, e₂ edge distance, p₂ spacing between rows (null for one row), mm. */
  e1: number;
  p1: number;
  e2: number;
  p2: number | null;
  /** A preloaded bolt in a slip-resistant joint (§3.9.1): its category, class of friction surface and hole factor k_s (Table 3.6). */
  slip?: { category: "B" | "C"; surface: keyof typeof frictionSurfaceSlipFactor; ks: number } | null;
}

export interface En1993Resistance {
  name: string;
  /** Design resistance for the whole bolt, N. */
  value: number;
  equation: string;
  factors: Record<string, number>;
  symbol: string;
  reference: string;
}

export function en1993Bolt(p: En1993BoltInput): { resistances: En1993Resistance[]; governing: En1993Resistance; shearPerPlane: number } {
  const out: En1993Resistance[] = [];
  const gross = (Math.PI * p.d * p.d) / 4;
  const [A, alphaV] = p.threads === "included" ? [p.As, p.alphaVThreads] : [gross, 0.6];
  const shearPerPlane = (alphaV * p.fub * A) / EN1993_GAMMA_M2;
  out.push({ name: "bolt shear", value: shearPerPlane * p.shearPlanes, equation: `F_v,Rd = α_v f_ub A/γ_M2 per plane, A = ${p.threads === "included" ? "A_s" : "gross area"} (Table 3.4)`, factors: { α_v: alphaV, A }, symbol: "F_v,Rd", reference: "EN 1993-1-8 Table 3.4" });
  const k1Edge = Math.min(2.8 * (p.e2 / p.d0) - 1.7, p.p2 === null ? Infinity : 1.4 * (p.p2 / p.d0) - 1.7, 2.5);
  for (const ply of p.plies) {
    for (const [which, alphaD] of [["end bolt", p.e1 / (3 * p.d0)], ["inner bolts", p.p1 / (3 * p.d0) - 0.25]] as const) {
      const alphaB = Math.min(alphaD, p.fub / ply.tensileStrength, 1.0);
      const value = (k1Edge * alphaB * ply.tensileStrength * p.d * ply.thickness) / EN1993_GAMMA_M2 / ply.share;
      out.push({
        name: `bearing on ${ply.name}, ${which}`,
        value,
        equation: `F_b,Rd = k₁ α_b f_u d t/γ_M2 (Table 3.4), α_d = ${which === "end bolt" ? "e₁/3d₀" : "p₁/3d₀ − 1/4"}${ply.share < 1 ? "; the ply carries half the bolt force" : ""}`,
        factors: { k1: k1Edge, alphaD, alphaB },
        symbol: "F_b,Rd",
        reference: "EN 1993-1-8 Table 3.4",
      });
    }
  }
  if (p.slip) {
    // F_s,Rd = k_s n μ F_p,C/γ_M3 (eq. 3.6), F_p,C = 0.7 f_ub A_s (eq. 3.7) [M]; n friction surfaces = shear planes.
    const mu = frictionSurfaceSlipFactor[p.slip.surface];
    const Fpc = 0.7 * p.fub * p.As;
    const gamma = p.slip.category === "C" ? EN1993_GAMMA_M3 : EN1993_GAMMA_M3_SER;
    out.push({
      name: `slip, category ${p.slip.category}, friction surface class ${p.slip.surface}`,
      value: (p.slip.ks * p.shearPlanes * mu * Fpc) / gamma,
      equation: `F_s,Rd${p.slip.category === "B" ? ",ser" : ""} = k_s n μ F_p,C/γ_M3${p.slip.category === "B" ? ",ser" : ""}, F_p,C = 0.7 f_ub A_s = ${Number(Fpc.toPrecision(5))} N (eq. 3.6, 3.7)`,
      factors: { k_s: p.slip.ks, n: p.shearPlanes, μ: mu, [p.slip.category === "B" ? "γ_M3,ser" : "γ_M3"]: gamma },
      symbol: p.slip.category === "B" ? "F_s,Rd,ser" : "F_s,Rd",
      reference: "EN 1993-1-8 §3.9.1 [M]",
    });
  }
  const governing = out.reduce((a, b) => (b.value < a.value ? b : a));
  return { resistances: out, governing, shearPerPlane };
}

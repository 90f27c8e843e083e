/** How the member is supported, for the effective length l in γ_i (EN 1995-1-1 Annex B). */
export type SpanKind = "simple" | "continuous" | "cantilever";

export interface EffectiveLength {
  /** l, mm. */
  effectiveLength: number;
  rule: string;
  reference: string;
}

/**
 * The length l in γ_i = [1 + π²E_iA_is_i/(K_il²)]⁻¹. Annex B derives γ for a simply supported span
 * (the slip follows a half sine over l); for continuous spans l = 0.8 × the span, for cantilevers
 * l = 2 × the cantilever's length. The 0.8 and 2 factors are written from memory of the Annex B
 * assumptions (B.1.2) and are flagged [M]. length in mm.
 */
export function effectiveLength(length: number, kind: SpanKind): EffectiveLength {
  if (!(length > 0)) throw new RangeError(`effective length needs a positive span, got ${length}`);
  switch (kind) {
    case "simple":
      return { effectiveLength: length, rule: "l = span (simply supported)", reference: "EN 1995-1-1 Annex B, B.1.2 (assumptions) [M]" };
    case "continuous":
      return { effectiveLength: 0.8 * length, rule: "l = 0.8 × span (continuous span) [M]", reference: "EN 1995-1-1 Annex B, B.1.2 (assumptions) [M]" };
    case "cantilever":
      return { effectiveLength: 2 * length, rule: "l = 2 × cantilever length [M]", reference: "EN 1995-1-1 Annex B, B.1.2 (assumptions) [M]" };
  }
}

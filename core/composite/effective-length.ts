import type { SupportCondition } from "../beam/beam-model.js";

/**
 * How the member is supported, for the effective length l in γ_i (EN 1995-1-1 Annex B): a simply
 * supported span, a span with a fixed end (taken as continuous), continuous spans, or a cantilever.
 */
export type SpanKind = "simple" | "fixed-end" | "continuous" | "cantilever";

export interface EffectiveLength {
  /** l, mm. */
  effectiveLength: number;
  kind: SpanKind;
  rule: string;
  reference: string;
}

const REFERENCE = "EN 1995-1-1 Annex B, B.1 (note on continuous beams and cantilevers) [M]";

/**
 * The length l in γ_i = [1 + π²E_iA_is_i/(K_il²)]⁻¹. Annex B derives γ for a simply supported span
 * (the slip follows a half sine over l); its note allows l = 0.8 × the span for continuous beams and
 * l = 2 × the cantilever's length for cantilevers [M]. A single span with a fixed end is not simply
 * supported: its end restraint is read as continuity, so it takes the continuous rule (this program's
 * reading, stated in the rule). length in mm.
 */
export function effectiveLength(length: number, kind: SpanKind): EffectiveLength {
  if (!(length > 0)) throw new RangeError(`effective length needs a positive span, got ${length}`);
  switch (kind) {
    case "simple":
      return { effectiveLength: length, kind, rule: "l = span (simply supported)", reference: REFERENCE };
    case "fixed-end":
      return { effectiveLength: 0.8 * length, kind, rule: "l = 0.8 × span (a span with a fixed end is not simply supported; its end restraint is taken as continuity) [M]", reference: REFERENCE };
    case "continuous":
      return { effectiveLength: 0.8 * length, kind, rule: "l = 0.8 × the longest span (continuous) [M]", reference: REFERENCE };
    case "cantilever":
      return { effectiveLength: 2 * length, kind, rule: "l = 2 × cantilever length [M]", reference: REFERENCE };
  }
}

/**
 * The support condition of a member for Annex B from its spans' lengths (the regions between
 * supports, mm), its overhangs' lengths and the condition at each span end.
 */
export function spanKindOf(spans: number[], overhangs: number[], ends: readonly SupportCondition[]): { kind: SpanKind; length: number } {
  if (spans.length === 0) return { kind: "cantilever", length: Math.max(...overhangs) };
  const longest = Math.max(...spans);
  if (spans.length > 1 || overhangs.length > 0) return { kind: "continuous", length: longest };
  return { kind: ends.includes("fixed") ? "fixed-end" : "simple", length: longest };
}

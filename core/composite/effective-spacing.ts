export interface EffectiveSpacing {
  /** s_ef = 0.75·s_min + 0.25·s_max, mm. */
  effectiveSpacing: number;
  minSpacing: number;
  maxSpacing: number;
  /** s_max/s_min. */
  ratio: number;
  /** Annex B allows spacing that varies with the shear force only while s_max ≤ 4·s_min. */
  withinLimit: boolean;
  reference: string;
}

/**
 * Effective spacing for a joint whose spacing varies with the shear force (EN 1995-1-1 Annex B, B.1.2 [M]:
 * s_ef = 0.75 s_min + 0.25 s_max, with s_max ≤ 4 s_min). mm.
 */
export function effectiveSpacing(minSpacing: number, maxSpacing: number): EffectiveSpacing {
  if (!(minSpacing > 0) || !(maxSpacing >= minSpacing)) {
    throw new RangeError(`effective spacing needs 0 < s_min ≤ s_max, got s_min = ${minSpacing}, s_max = ${maxSpacing}`);
  }
  const ratio = maxSpacing / minSpacing;
  return {
    effectiveSpacing: 0.75 * minSpacing + 0.25 * maxSpacing,
    minSpacing,
    maxSpacing,
    ratio,
    withinLimit: ratio <= 4 * (1 + 1e-12),
    reference: "EN 1995-1-1 Annex B, B.1.2: s_max ≤ 4 s_min; s_ef = 0.75 s_min + 0.25 s_max [M]",
  };
}

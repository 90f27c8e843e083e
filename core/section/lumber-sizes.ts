const INCH = 25.4;

/**
 * Dressed (dry) size of US dimension lumber and boards from a nominal size, in inches: 1 → 3/4;
 * 2 to 6 → less 1/2; 8 and over → less 3/4 (American Softwood Lumber Standard PS 20, dry dressed sizes).
 */
export function dressedInches(nominal: number): number {
  if (nominal <= 1) return 0.75;
  return nominal <= 6 ? nominal - 0.5 : nominal - 0.75;
}

/**
 * Thickness and width of a nominal size such as "2x10", mm. Timbers (5 in and thicker, both nominal sizes
 * at least 5 in: beams and stringers, posts and timbers) are dressed 1/2 in less on each dimension
 * (PS 20; NDS Supplement Table 1A [M]): 6x10 → 5.5 × 9.5 in.
 */
export function lumberSize(nominal: string): { thickness: number; width: number } {
  const [t, w] = nominal.split("x").map(Number) as [number, number];
  if (Math.min(t, w) >= 5) return { thickness: (t - 0.5) * INCH, width: (w - 0.5) * INCH };
  return { thickness: dressedInches(t) * INCH, width: dressedInches(w) * INCH };
}

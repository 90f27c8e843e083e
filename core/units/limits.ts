/**
 * Relative tolerance for comparing a number with a limit or a band edge. A value entered on the limit
 * and converted to the other unit system and back moves by a rounding error (about 1e-10 of itself);
 * it stays on the side it was entered.
 */
export const LIMIT_TOLERANCE = 1e-9;

/** `value` is above `limit` by more than the tolerance. */
export const exceeds = (value: number, limit: number) => value > limit + LIMIT_TOLERANCE * Math.abs(limit);

/** `value` is below `limit` by more than the tolerance. */
export const fallsShort = (value: number, limit: number) => value < limit - LIMIT_TOLERANCE * Math.abs(limit);

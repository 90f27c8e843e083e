import type { UnitSystem } from "../units/quantity.js";

/**
 * Spacing settings used when the job leaves them out, in the job's own units (mm or in).
 * Common practice, not from a standard: a 5 mm or 1/4 in module, zones at least 300 mm or 12 in
 * long, and no spacing above 600 mm or 24 in where the connector sets no maximum.
 */
export function spacingDefaults(system: UnitSystem): { module: number; minZoneLength: number; maxSpacing: number } {
  return system === "si" ? { module: 5, minZoneLength: 300, maxSpacing: 600 } : { module: 0.25, minZoneLength: 12, maxSpacing: 24 };
}

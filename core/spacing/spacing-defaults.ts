import { toCore, type UnitSystem } from "../units/quantity.js";

/**
 * Spacing settings used when the job leaves them out, in the job's own units (mm or in).
 * Common practice, not from a standard: a 5 mm or 1/4 in module, zones at least 300 mm or 12 in
 * long, and no spacing above 600 mm or 24 in where the connector sets no maximum.
 */
export function spacingDefaults(system: UnitSystem): { module: number; minZoneLength: number; maxSpacing: number } {
  return system === "si" ? { module: 5, minZoneLength: 300, maxSpacing: 600 } : { module: 0.25, minZoneLength: 12, maxSpacing: 24 };
}

/** The spacing practice a job follows (`spacing.practice`, else its units) and its defaults in core units (mm). */
export function spacingPractice(job: { units: UnitSystem; spacing: { practice?: UnitSystem | undefined } }): { system: UnitSystem; module: number; minZoneLength: number; maxSpacing: number } {
  const system = job.spacing.practice ?? job.units;
  const d = spacingDefaults(system);
  const mm = (v: number) => toCore(v, "length", system);
  return { system, module: mm(d.module), minZoneLength: mm(d.minZoneLength), maxSpacing: mm(d.maxSpacing) };
}

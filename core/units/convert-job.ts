import { JobDocument } from "../schema/job.js";
import { rescale } from "./convert.js";
import { convertNumber } from "./convert-number.js";
import type { UnitSystem } from "./quantity.js";

export { convertNumber, withoutNoise } from "./convert-number.js";

/**
 * A parsed job rewritten in the other unit system: every number that declares a quantity kind is
 * converted to the shortest decimal that converts back to it (no visible noise, and a round trip
 * returns the numbers entered). The spacing practice of the job (its module, shortest zone and
 * round zone boundaries when the job leaves them out) stays that of the system it came from, so the
 * converted job designs the same schedules; taking up the other system's practice is the user's choice.
 */
export function convertJob(job: JobDocument, to: UnitSystem): JobDocument {
  if (job.units === to) return job;
  const converted = rescale(JobDocument, job, (v, q) => convertNumber(v, q, job.units, to));
  const practice = job.spacing.practice ?? job.units;
  const { practice: _dropped, ...spacing } = converted.spacing;
  return { ...converted, units: to, spacing: practice === to ? spacing : { ...spacing, practice } };
}

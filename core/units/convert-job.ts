import { JobDocument } from "../schema/job.js";
import { rescale } from "./convert.js";
import { fromCore, toCore, type UnitSystem } from "./quantity.js";

/**
 * A parsed job rewritten in the other unit system: every number that declares a quantity kind is
 * converted and rounded to 9 significant figures: no visible noise, and parts that touch still touch.
 */
export function convertJob(job: JobDocument, to: UnitSystem): JobDocument {
  if (job.units === to) return job;
  const converted = rescale(JobDocument, job, (v, q) => {
    const out = fromCore(toCore(v, q, job.units), q, to);
    return out === 0 || !Number.isFinite(out) ? out : Number(out.toPrecision(9));
  });
  return { ...converted, units: to };
}

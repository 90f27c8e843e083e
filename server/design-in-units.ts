import { designMember, DesignResult, firstNonFinite, prepareJob, toDisplayUnits, unitLabels, type JobDocument, type UnitSystem } from "../core/index.js";
import { fingerprintOf } from "./fingerprint.js";
import { ApiError } from "./errors.js";

export interface UnitsRun {
  /** The job as parsed, in its own units, defaults filled in. */
  job: JobDocument;
  /** The job in core units (placements resolved), for converting it to the other system. */
  core: JobDocument;
  /** The result in the job's units, with the fingerprint: what the worksheet prints. */
  result: DesignResult;
  /** The result in the asked units (the same object when they are the job's). */
  shown: DesignResult;
}

/** Like runDesign, and also gives the result in another unit system; the fingerprint is always the job's own. */
export function designInUnits(input: unknown, units?: UnitSystem): UnitsRun {
  if (input === undefined || input === null || typeof input !== "object" || Array.isArray(input)) {
    throw new ApiError("ERR_INPUT_INVALID", undefined, [{ path: "(document)", message: "must be a job document (a JSON object)" }]);
  }
  const prepared = prepareJob(input);
  if (!prepared.ok) throw new ApiError("ERR_INPUT_INVALID", undefined, prepared.issues);
  const core = designMember(prepared.core);
  const fingerprint = fingerprintOf(prepared.job);
  const result = { ...toDisplayUnits(DesignResult, core, prepared.job.units), fingerprint };
  // The converter rescales numbers; the result's own statement of its units is set here.
  const shown = units && units !== prepared.job.units ? { ...toDisplayUnits(DesignResult, core, units), units, unitLabels: unitLabels(units), fingerprint } : result;
  // A result with a number that is not finite is never served, as a pass or at all (core already fails it).
  const where = firstNonFinite(result) ?? (shown === result ? null : firstNonFinite(shown));
  if (where !== null) throw new ApiError("ERR_RESULT_NOT_FINITE", undefined, [{ path: where, message: "is not a finite number: the job lies outside what this program can compute, and no result is given" }]);
  return { job: prepared.job, core: prepared.core, result, shown };
}

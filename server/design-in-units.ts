import { designMember, DesignResult, firstNonFinite, knownFinite, prepareJob, toDisplayUnits, unitLabels, type JobDocument, type UnitSystem } from "../core/index.js";
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
  return inUnits(prepared.job, prepared.core, designMember(prepared.core), units);
}

/** The answer of designInUnits from the job as parsed, in core units, and its design (core units). */
export function inUnits(job: JobDocument, coreJob: JobDocument, core: DesignResult, units?: UnitSystem): UnitsRun {
  const fingerprint = fingerprintOf(job);
  // The conversion notes a number that it turns non-finite; those it does not touch are core's, which the
  // design has already walked (knownFinite). Only when either fails is the whole answer walked for the place.
  const converted = { nonFinite: !knownFinite(core) };
  const result = { ...toDisplayUnits(DesignResult, core, job.units, converted), fingerprint };
  // The converter rescales numbers; the result's own statement of its units is set here.
  const shown = units && units !== job.units ? { ...toDisplayUnits(DesignResult, core, units, converted), units, unitLabels: unitLabels(units), fingerprint } : result;
  // A result with a number that is not finite is never served, as a pass or at all (core already fails it).
  const where = converted.nonFinite ? (firstNonFinite(result) ?? (shown === result ? null : firstNonFinite(shown))) : null;
  if (where !== null) throw new ApiError("ERR_RESULT_NOT_FINITE", undefined, [{ path: where, message: "is not a finite number: the job lies outside what this program can compute, and no result is given" }]);
  return { job, core: coreJob, result, shown };
}

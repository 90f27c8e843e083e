import { createHash } from "node:crypto";
import { canonicalJson, designMember, DesignResult, JOB_VERSION, PROGRAM, prepareJob, toDisplayUnits, type JobDocument } from "../core/index.js";
import { ApiError } from "./errors.js";
import { jobLimitIssues } from "./job-limits.js";

export interface DesignRun {
  /** The job as parsed, in its own units, defaults filled in. */
  job: JobDocument;
  /** The result in the job's units, with the fingerprint. */
  result: DesignResult;
}

/** SHA-256 of the canonical job with the schema and program versions: printed on every worksheet page. */
export function fingerprintOf(job: JobDocument): string {
  const text = canonicalJson({ job, schemaVersion: JOB_VERSION, program: `${PROGRAM.name} ${PROGRAM.version}` });
  return createHash("sha256").update(text).digest("hex");
}

/** Validates and designs one job; bad input throws ERR_INPUT_INVALID with every problem and its path. */
export function runDesign(input: unknown): DesignRun {
  if (input === undefined || input === null || typeof input !== "object" || Array.isArray(input)) {
    throw new ApiError("ERR_INPUT_INVALID", undefined, [{ path: "(document)", message: "must be a job document (a JSON object)" }]);
  }
  const prepared = prepareJob(input);
  if (!prepared.ok) throw new ApiError("ERR_INPUT_INVALID", undefined, prepared.issues);
  const overLimit = jobLimitIssues(prepared.core, prepared.job.units);
  if (overLimit.length > 0) throw new ApiError("ERR_INPUT_INVALID", undefined, overLimit);
  const core = designMember(prepared.core);
  const result = toDisplayUnits(DesignResult, core, prepared.job.units);
  return { job: prepared.job, result: { ...result, fingerprint: fingerprintOf(prepared.job) } };
}

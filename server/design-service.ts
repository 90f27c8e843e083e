import type { DesignResult, JobDocument } from "../core/index.js";
import { designInUnits } from "./design-in-units.js";

export interface DesignRun {
  /** The job as parsed, in its own units, defaults filled in. */
  job: JobDocument;
  /** The result in the job's units, with the fingerprint. */
  result: DesignResult;
}

/** Validates and designs one job; bad input throws ERR_INPUT_INVALID with every problem and its path. */
export function runDesign(input: unknown): DesignRun {
  const { job, result } = designInUnits(input);
  return { job, result };
}

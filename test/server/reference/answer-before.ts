// POST /api/designs's answer as it was built before the speed work (issue 20): the reference for
// test/server/answer-bytes.test.ts. Not used by the program.
import { createHash } from "node:crypto";
import { designMember, DesignResult, JOB_VERSION, prepareJob, PROGRAM, unitLabels, type JobDocument, type UnitSystem } from "../../../core/index.js";
import { canonicalJson, firstNonFinite, toDisplayUnits } from "./convert-before.js";

export type AnswerBefore = { bytes: Uint8Array } | { error: string; issues: { path: string; message: string }[] };

export function answerBefore(input: unknown, units?: UnitSystem): AnswerBefore {
  const prepared = prepareJob(input);
  if (!prepared.ok) return { error: "ERR_INPUT_INVALID", issues: prepared.issues };
  return answerBeforeFrom(prepared.job, designMember(prepared.core), units);
}

export function answerBeforeFrom(job: JobDocument, core: DesignResult, units?: UnitSystem): AnswerBefore {
  const prepared = { job };
  const text = canonicalJson({ job: prepared.job, schemaVersion: JOB_VERSION, program: `${PROGRAM.name} ${PROGRAM.version}` });
  const fingerprint = createHash("sha256").update(text).digest("hex");
  const result = { ...toDisplayUnits(DesignResult, core, prepared.job.units), fingerprint };
  const shown = units && units !== prepared.job.units ? { ...toDisplayUnits(DesignResult, core, units), units, unitLabels: unitLabels(units), fingerprint } : result;
  const where = firstNonFinite(result) ?? (shown === result ? null : firstNonFinite(shown));
  if (where !== null) return { error: "ERR_RESULT_NOT_FINITE", issues: [{ path: where, message: "is not a finite number: the job lies outside what this program can compute, and no result is given" }] };
  return { bytes: new TextEncoder().encode(JSON.stringify(shown)) };
}

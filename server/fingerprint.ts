import { createHash } from "node:crypto";
import { canonicalJson, JOB_VERSION, PROGRAM, type JobDocument } from "../core/index.js";

/** SHA-256 of the canonical job with the schema and program versions: printed on every worksheet page. */
export function fingerprintOf(job: JobDocument): string {
  const text = canonicalJson({ job, schemaVersion: JOB_VERSION, program: `${PROGRAM.name} ${PROGRAM.version}` });
  return createHash("sha256").update(text).digest("hex");
}

import { designMember, prepareJob, type DesignResult, type JobDocument, type JobIssue, type UnitSystem } from "../core/index.js";
import { designInUnits } from "./design-in-units.js";
import { ApiError, type ErrorCode } from "./errors.js";
import { summariseResult, type ResultSummary } from "./result-summary.js";
import { renderWorksheet, worksheetFileName } from "./pdf/worksheet.js";

/** Work the design threads do: everything that may take long runs there, never on the thread that answers HTTP. */
export type DesignTask =
  /** The result as JSON text encoded in UTF-8 (moved to the HTTP thread, not copied), in `units` or the job's own. */
  | { kind: "result-json"; input: unknown; units?: UnitSystem | undefined }
  /** The job, the job in core units and the result in the job's and in `units`, as objects. */
  | { kind: "result"; input: unknown; units?: UnitSystem | undefined }
  /** What a list of members shows for a job being saved; null when the design itself fails (the revision is kept). */
  | { kind: "summary"; input: unknown }
  /** A revision of a project file: the job as parsed (defaults filled in) and its summary, so the import validates off the HTTP thread too. */
  | { kind: "prepared-summary"; input: unknown }
  /** The PDF worksheet, with what its headers need. */
  | { kind: "worksheet"; input: unknown; printDate?: string | undefined };

export interface ResultRun {
  job: JobDocument;
  core: JobDocument;
  result: DesignResult;
  shown: DesignResult;
}

export interface WorksheetRun {
  pdf: Uint8Array;
  fileName: string;
  fingerprint: string;
  titleRevision: string;
}

export type TaskAnswer<T extends DesignTask> = T extends { kind: "result-json" }
  ? Uint8Array
  : T extends { kind: "result" }
    ? ResultRun
    : T extends { kind: "summary" }
      ? ResultSummary | null
      : T extends { kind: "prepared-summary" }
        ? PreparedSummary
        : WorksheetRun;

export interface PreparedSummary {
  job: JobDocument;
  summary: ResultSummary | null;
}

/** An error as it crosses between threads. */
export interface WireError {
  code: ErrorCode;
  message: string;
  issues: JobIssue[];
}

const utf8 = new TextEncoder();

/**
 * The text in UTF-8, as `encode` gives it. encodeInto skips encode's first pass over the text (counting its
 * bytes) when the bytes fit a little more room than one a character; an answer with more characters beyond
 * ASCII than that takes the counting way.
 */
export function utf8Bytes(text: string): Uint8Array {
  const room = new Uint8Array(text.length + 256 + (text.length >> 6));
  const { read, written } = utf8.encodeInto(text, room);
  return read === text.length ? room.subarray(0, written) : utf8.encode(text);
}

export async function performTask(task: DesignTask): Promise<Uint8Array | ResultRun | WorksheetRun | ResultSummary | PreparedSummary | null> {
  switch (task.kind) {
    case "result-json":
      // Encoded once, here: the bytes own their memory, so they move to the HTTP thread, which sends them as they are.
      return utf8Bytes(JSON.stringify(designInUnits(task.input, task.units).shown));
    case "result": {
      const { job, core, result, shown } = designInUnits(task.input, task.units);
      return { job, core, result, shown };
    }
    case "summary": {
      let run;
      try {
        run = designInUnits(task.input);
      } catch (error) {
        if (error instanceof ApiError) throw error;
        return null;
      }
      return summariseResult(run.result);
    }
    case "prepared-summary": {
      const input = task.input;
      if (input === null || typeof input !== "object" || Array.isArray(input)) {
        throw new ApiError("ERR_INPUT_INVALID", undefined, [{ path: "(document)", message: "must be a job document (a JSON object)" }]);
      }
      const prepared = prepareJob(input);
      if (!prepared.ok) throw new ApiError("ERR_INPUT_INVALID", undefined, prepared.issues);
      let summary: ResultSummary | null = null;
      try {
        // Utilisations and counts are pure numbers: the result in core units gives the same summary.
        summary = summariseResult(designMember(prepared.core));
      } catch (error) {
        if (error instanceof ApiError) throw error;
      }
      return { job: prepared.job, summary };
    }
    case "worksheet": {
      const run = designInUnits(task.input);
      const pdf = await renderWorksheet(run.job, run.result, task.printDate ? { printDate: task.printDate } : {});
      // A copy owns its memory, so it can be moved to the other thread instead of copied again.
      return { pdf: new Uint8Array(pdf), fileName: worksheetFileName(run.job), fingerprint: run.result.fingerprint!, titleRevision: run.job.member.revision };
    }
  }
}

/** A Buffer over the same memory as an answer's bytes (no copy), for a reply. */
export const bytesOf = (bytes: Uint8Array) => Buffer.from(bytes.buffer, bytes.byteOffset, bytes.byteLength);

export function toWire(error: unknown): WireError {
  if (error instanceof ApiError) return { code: error.code, message: error.message, issues: error.issues };
  return { code: "ERR_INTERNAL", message: `The server failed while computing (${error instanceof Error ? error.message : String(error)}); please report the job. Nothing was stored or changed.`, issues: [] };
}

export const fromWire = (wire: WireError) => new ApiError(wire.code, wire.message, wire.issues);

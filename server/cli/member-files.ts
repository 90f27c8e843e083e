import { closeSync, constants, fstatSync, openSync, readFileSync } from "node:fs";
import type { JobIssue, UnitSystem } from "../../core/index.js";
import { positionsCsv, scheduleCsv, weldsCsv } from "../../core/export/schedule-csv.js";
import { designInUnits } from "../design-in-units.js";
import { ApiError } from "../errors.js";
import { summariseResult, type ResultSummary } from "../result-summary.js";
import { writeOutputFileAsync } from "./output-file.js";

/** One job file of a batch, and where its outputs go. */
export interface MemberTask {
  index: number;
  file: string;
  /** Output path without extension: `<out>/<name>`; `.result.json`, `.schedule.csv`, `.positions.csv`, `.welds.csv` (welded members), `.pdf` are added. */
  outBase: string;
  mode: "design" | "check";
  units?: UnitSystem | undefined;
  pdf: boolean;
  /** Print date on the worksheets, YYYY-MM-DD. */
  printDate: string;
}

/**
 * Members in progress on a batch worker thread at once, so that one member's file read and writes overlap
 * another's design. A worker takes its tasks in the order they were sent, so when it dies only the first
 * this many of its unfinished ones can have begun (server/cli/worker-pool.ts).
 */
export const WORKER_LANES = 2;

export interface MemberOutcome {
  index: number;
  file: string;
  /** The member's mark, or "" when the file could not be read. */
  mark: string;
  /** invalid: the file or its job has problems · error: the program or the output folder failed. */
  status: "pass" | "fail" | "invalid" | "error";
  summary: ResultSummary | null;
  /** Each problem with its field path; `(file)` for the file itself. */
  problems: JobIssue[];
  written: string[];
  milliseconds: { design: number; pdf: number };
}

/** Line and column of a position in a text, for a JSON syntax error a person can find. */
function lineAndColumn(text: string, position: number): string {
  const before = text.slice(0, position);
  const line = before.split("\n").length;
  return `line ${line}, column ${position - before.lastIndexOf("\n")}`;
}

/** What went wrong in JSON text, without any of the text itself (a file may hold anything). */
function jsonProblem(message: string, text: string): string {
  const at = /position (\d+)/.exec(message);
  const what = /end of (JSON )?input/i.test(message) ? "it ends before the document does" : /unexpected (token|character|non-whitespace)/i.test(message) ? "an unexpected character" : /expected/i.test(message) ? "a character is missing or out of place" : "it cannot be parsed";
  return `is not valid JSON (${what}${at ? `, at ${lineAndColumn(text, Number(at[1]))}` : ""})`;
}

/**
 * Reads a job file: a problem at `(file)` when it cannot be read, is not a regular file (a FIFO or a
 * device would block or never end: opened without waiting, then refused) or is not JSON. No message
 * repeats the file's content. Read with blocking calls: a job file of a few kilobytes takes about a
 * tenth of the time of the four hops to the system's threads (measured: 0.04 against 0.15 ms a file).
 */
export async function readJobFile(file: string): Promise<{ job: unknown } | { problems: JobIssue[] }> {
  let text: string;
  try {
    const fd = openSync(file, constants.O_RDONLY | constants.O_NONBLOCK);
    try {
      const info = fstatSync(fd);
      if (info.isDirectory()) return { problems: [{ path: "(file)", message: "is a folder, not a job file" }] };
      if (!info.isFile()) return { problems: [{ path: "(file)", message: "is not a regular file (a pipe, socket or device); skipped" }] };
      text = readFileSync(fd, "utf8");
    } finally {
      closeSync(fd);
    }
  } catch (error) {
    const code = (error as NodeJS.ErrnoException).code;
    return { problems: [{ path: "(file)", message: code === "ENOENT" ? "does not exist" : code === "EISDIR" ? "is a folder, not a job file" : `cannot be read (${code ?? "unknown error"})` }] };
  }
  if (text.trim() === "") return { problems: [{ path: "(file)", message: "is empty; a job file holds one job document as JSON" }] };
  try {
    return { job: JSON.parse(text.replace(/^\uFEFF/, "")) };
  } catch (error) {
    return { problems: [{ path: "(file)", message: jsonProblem(error instanceof Error ? error.message : "", text) }] };
  }
}

/**
 * Designs (or checks) one job file and writes its result JSON, schedule and positions CSV and, if asked,
 * its worksheet PDF. `inputs`: the identities (device:inode) of every input file of the batch, made once
 * per batch or thread; no output is written over one.
 */
export async function runMemberTask(task: MemberTask, inputs: ReadonlySet<string>): Promise<MemberOutcome> {
  const outcome: MemberOutcome = { index: task.index, file: task.file, mark: "", status: "invalid", summary: null, problems: [], written: [], milliseconds: { design: 0, pdf: 0 } };
  const read = await readJobFile(task.file);
  if ("problems" in read) return { ...outcome, problems: read.problems };
  const job = read.job as { mode?: unknown; member?: { mark?: unknown } };
  if (job && typeof job === "object" && typeof job.member?.mark === "string") outcome.mark = job.member.mark;
  if (task.mode === "check" && job && typeof job === "object" && job.mode !== "check") {
    const problems = [{ path: "mode", message: `is ${JSON.stringify(job.mode ?? "design")}; stitchplan check runs check-mode jobs ("mode": "check" with the schedules in fastening.*.provided); use stitchplan design for this one` }];
    return { ...outcome, problems };
  }
  const started = performance.now();
  let run;
  try {
    run = designInUnits(read.job, task.units);
  } catch (error) {
    if (error instanceof ApiError) return { ...outcome, problems: error.issues.length > 0 ? error.issues : [{ path: "(document)", message: error.message }] };
    return { ...outcome, status: "error", problems: [{ path: "(program)", message: `stitchplan failed on this job (a bug; please report it with the file): ${error instanceof Error ? error.message : String(error)}` }] };
  }
  outcome.milliseconds.design = performance.now() - started;
  outcome.mark = run.job.member.mark;
  outcome.summary = summariseResult(run.shown);
  outcome.status = run.shown.status.passes ? "pass" : "fail";

  const files: [string, string | Buffer][] = [
    [`${task.outBase}.result.json`, `${JSON.stringify(run.shown, null, 2)}\n`],
    [`${task.outBase}.schedule.csv`, scheduleCsv(run.shown)],
    [`${task.outBase}.positions.csv`, positionsCsv(run.shown)],
  ];
  const welds = weldsCsv(run.shown);
  if (welds) files.push([`${task.outBase}.welds.csv`, welds]);
  if (task.pdf) {
    const t0 = performance.now();
    try {
      // pdfkit and the fonts load only for batches that draw worksheets.
      const { renderWorksheet } = await import("../pdf/worksheet.js");
      files.push([`${task.outBase}.pdf`, await renderWorksheet(run.job, run.result, { printDate: task.printDate })]);
    } catch (error) {
      return { ...outcome, status: "error", problems: [{ path: "(program)", message: `the worksheet could not be drawn (a bug; please report it with the file): ${error instanceof Error ? error.message : String(error)}` }] };
    }
    outcome.milliseconds.pdf = performance.now() - t0;
  }
  const failed: JobIssue[] = [];
  // The files are written on the system's threads while this thread goes on to the next member, on a
  // worker thread too: written there with blocking calls, creating the files (0.3 to 1 ms each on this
  // machine's ext4 after other programs delete files) held up its designs, and two workers on a shared
  // 2-core machine took 1.7 times as long (600 members, in turns: 20.6 and 23.5 s against 11.7 and 14.2).
  await Promise.all(
    files.map(async ([path, content]) => {
      try {
        await writeOutputFileAsync(path, content, inputs);
        outcome.written.push(path);
      } catch (error) {
        const code = (error as NodeJS.ErrnoException).code;
        failed.push({ path: "(output)", message: code ? `cannot write ${path} (${code === "ELOOP" ? "it is a symbolic link; stitchplan does not write through links" : code})` : (error as Error).message });
      }
    }),
  );
  outcome.written.sort();
  return failed.length > 0 ? { ...outcome, status: "error", problems: failed } : outcome;
}

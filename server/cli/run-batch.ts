import { lstatSync, statSync } from "node:fs";
import { mkdir } from "node:fs/promises";
import { availableParallelism, cpus } from "node:os";
import { join, resolve } from "node:path";
import type { UnitSystem } from "../../core/index.js";
import { collectJobFiles, outputNames } from "./collect-job-files.js";
import { identityOf, writeOutputFile } from "./output-file.js";
import { runMemberTask as runHere, type MemberOutcome, type MemberTask } from "./member-files.js";
import { summaryCsv } from "./summary-table.js";
import { runInWorkers } from "./worker-pool.js";
import { importBundled } from "../thread-entry.js";

export interface BatchOptions {
  mode: "design" | "check";
  /** Job files and folders of job files. */
  inputs: string[];
  /** Output folder, created if needed. */
  out: string;
  /** Results and CSV in this system (worksheets stay in each job's own units); each job's own when absent. */
  units?: UnitSystem | undefined;
  pdf: boolean;
  /** Worker threads; 1 runs everything on this thread; chosen from the batch when absent. */
  threads?: number | undefined;
  /** Print date on the worksheets, YYYY-MM-DD; today when absent. */
  printDate?: string | undefined;
  /** Also write summary.csv into the output folder. */
  summaryFile?: boolean;
  onOutcome?: (done: number, total: number, outcome: MemberOutcome) => void;
}

export interface BatchReport {
  /** One per job file and per command-line path that gave none, in command-line order. */
  outcomes: MemberOutcome[];
  threads: number;
  seconds: number;
  /** 0 all pass · 1 a member does not pass · 3 a file is invalid or could not be done. */
  exitCode: number;
}

/**
 * Worker threads pay off once the work outweighs starting them: bundling their code once and loading it
 * (about half a second from source: a quarter to bundle, or a fiftieth when a bundle kept from an earlier
 * run still matches every source, and a third to load it) and about a tenth of a second each (measured on
 * the shared 2-core machine; a second each when they loaded the sources through tsx). See bench/batch.ts
 * for the batch's figures.
 */
export const WORKER_START_MS = 600;
const BUNDLE_MS = 500;
const MEMBER_FILES = new URL("./member-files.ts", import.meta.url);
export const ESTIMATED_MS = { design: 15, pdf: 150 };

/** Whether a batch's work, by the estimates above, outweighs starting workers (twice their start). */
const worthWorkers = (members: number, pdf: boolean) => members * (ESTIMATED_MS.design + (pdf ? ESTIMATED_MS.pdf : 0)) >= 2 * WORKER_START_MS;

/**
 * Worker threads for a batch: none for small batches, and none when other programs already keep the
 * cores busy (`busy`, in cores), since a worker then only competes with this thread for the same core.
 */
export function autoThreads(members: number, pdf: boolean, cores = availableParallelism(), busy = 0): number {
  const spare = cores - Math.floor(busy);
  if (spare < 2 || !worthWorkers(members, pdf)) return 1;
  return Math.min(spare, members);
}

/**
 * How many cores other programs keep busy: the share of a window of `ms` the cores spend not idle (the
 * system's own counters, os.cpus()), less what this process used in it (process.cpuUsage), so the window
 * can run while the batch collects its files. Not the load average, which also counts tasks waiting for
 * the disk and trails by a minute: on the build machine it read 1.3 with every core idle, which kept
 * batches on one thread where two took 3.3–3.8 s for 1,000 members instead of 4.4–4.7 s. `read()` waits
 * for the window's end; `stop()` ends a sample no one will read.
 */
export function busySampler(ms = 100): { read(): Promise<number>; stop(): void } {
  const times = () => cpus().map((c) => c.times);
  const before = times();
  const own = process.cpuUsage();
  const begun = performance.now();
  let timer: NodeJS.Timeout | undefined;
  const ended = new Promise<void>((resolve) => (timer = setTimeout(resolve, ms)));
  return {
    stop: () => clearTimeout(timer),
    read: async () => {
      await ended;
      const used = process.cpuUsage(own);
      const ownCores = (used.user + used.system) / 1000 / Math.max(1, performance.now() - begun);
      let idle = 0;
      let total = 0;
      times().forEach((t, i) => {
        const b = before[i];
        if (!b) return;
        idle += t.idle - b.idle;
        total += t.user - b.user + (t.nice - b.nice) + (t.sys - b.sys) + (t.idle - b.idle) + (t.irq - b.irq);
      });
      const busy = total > 0 ? before.length * (1 - idle / total) - ownCores : 0;
      return Math.max(0, Math.min(before.length, busy));
    },
  };
}

/** Tasks kept in flight on one thread, so that one member's file read (and worksheet stream) overlaps another's design. */
export const IN_FLIGHT = 3;

async function runInThisThread(tasks: MemberTask[], inputs: ReadonlySet<string>, onOutcome: (outcome: MemberOutcome) => void): Promise<MemberOutcome[]> {
  const outcomes: MemberOutcome[] = [];
  // From source, a large batch runs the members' code from one bundle (see bundleThread: a fifth faster than through tsx, for up to half a second of bundling and loading).
  const bundled = tasks.length * ESTIMATED_MS.design >= 4 * BUNDLE_MS ? await importBundled<typeof import("./member-files.js")>(MEMBER_FILES) : undefined;
  const runMemberTask = bundled?.runMemberTask ?? runHere;
  let next = 0;
  const lane = async () => {
    while (next < tasks.length) {
      const outcome = await runMemberTask(tasks[next++]!, inputs);
      outcomes.push(outcome);
      onOutcome(outcome);
    }
  };
  await Promise.all(Array.from({ length: IN_FLIGHT }, lane));
  return outcomes;
}

export function exitCodeOf(outcomes: MemberOutcome[]): number {
  if (outcomes.some((o) => o.status === "invalid" || o.status === "error")) return 3;
  if (outcomes.some((o) => o.status === "fail")) return 1;
  return 0;
}

/** Designs (or checks) every job file and writes each member's result JSON, schedule CSV, positions CSV and worksheet PDF. */
export async function runBatch(options: BatchOptions): Promise<BatchReport> {
  const started = performance.now();
  // The cores are looked at while the files are collected, and read only for a batch large enough to use workers.
  const sample = options.threads === undefined ? busySampler() : undefined;
  const collected = await collectJobFiles(options.inputs);
  const outcomes: MemberOutcome[] = collected.problems.map((p, i) => ({
    index: i - collected.problems.length,
    file: p.file,
    mark: "",
    status: "invalid",
    summary: null,
    problems: p.problems,
    written: [],
    milliseconds: { design: 0, pdf: 0 },
  }));
  await mkdir(options.out, { recursive: true });
  const names = outputNames(collected.files);
  const inputsResolved = new Set(collected.files.map((f) => resolve(f)));
  // Inputs by identity as well as by path: an output folder reached through a link, or a file under another letter case, is the same file.
  const identities = collected.files.flatMap((f) => {
    try {
      return [identityOf(statSync(f))];
    } catch {
      return [];
    }
  });
  const inputs = new Set(identities);
  const isInput = (path: string) => {
    if (inputsResolved.has(resolve(path))) return true;
    try {
      return inputs.has(identityOf(lstatSync(path)));
    } catch {
      return false;
    }
  };
  const tasks: MemberTask[] = [];
  collected.files.forEach((file, index) => {
    const outBase = join(options.out, names[index]!);
    const clash = [".result.json", ".schedule.csv", ".positions.csv", ".welds.csv", ".pdf"].map((ext) => outBase + ext).find(isInput);
    if (clash) {
      outcomes.push({ index, file, mark: "", status: "error", summary: null, problems: [{ path: "(output)", message: `writing its outputs would overwrite the input file ${clash}; choose another --out folder` }], written: [], milliseconds: { design: 0, pdf: 0 } });
      return;
    }
    tasks.push({ index, file, outBase, mode: options.mode, units: options.units, pdf: options.pdf, printDate: options.printDate ?? new Date().toISOString().slice(0, 10) });
  });

  const total = tasks.length;
  let done = 0;
  const onOutcome = (outcome: MemberOutcome) => options.onOutcome?.(++done, total, outcome);
  const busy = sample && worthWorkers(total, options.pdf) ? await sample.read() : (sample?.stop(), 0);
  const threads = Math.max(1, Math.min(options.threads ?? autoThreads(total, options.pdf, availableParallelism(), busy), Math.max(total, 1)));
  if (threads > 1) outcomes.push(...(await runInWorkers(tasks, threads, inputs, onOutcome)));
  else outcomes.push(...(await runInThisThread(tasks, inputs, onOutcome)));
  // Command-line paths that gave no file first, then the job files in order.
  outcomes.sort((a, b) => a.index - b.index);
  if (options.summaryFile !== false) {
    try {
      writeOutputFile(join(options.out, "summary.csv"), summaryCsv(outcomes), inputs);
    } catch (error) {
      const code = (error as NodeJS.ErrnoException).code;
      outcomes.push({ index: outcomes.length, file: join(options.out, "summary.csv"), mark: "", status: "error", summary: null, problems: [{ path: "(output)", message: code ? `cannot write summary.csv (${code === "ELOOP" ? "it is a symbolic link" : code})` : (error as Error).message }], written: [], milliseconds: { design: 0, pdf: 0 } });
    }
  }
  return { outcomes, threads, seconds: (performance.now() - started) / 1000, exitCode: exitCodeOf(outcomes) };
}

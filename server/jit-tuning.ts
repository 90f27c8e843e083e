import { setFlagsFromString } from "node:v8";

/**
 * How much a function must run before V8 optimises it (`--interrupt-budget`, bytes of bytecode run;
 * 67,584 by default in Node 20), for the two kinds of work this program does. Measured on the 2-core
 * build machine, runs in turns:
 *
 * - `repeating`: the service's design threads run for hours on the same kinds of job, and a batch with
 *   worksheets spends nearly all its time in the same drawing code: optimise soon. With 20,000 the
 *   simple member's whole request settled (1.2 ms median, 1.9 ms of process CPU) after 1,000 designs
 *   instead of about 10,000; over HTTP, 10 connections of distinct designs ran at 361–425 a second
 *   against 295–368 with the default, 3.0–3.6 ms of server CPU each against 3.6–4.6; the median
 *   worksheet of a 100-member batch took 118–123 ms against 132–185.
 * - `varied`: a batch without worksheets designs each member once, most unlike the last, so code
 *   optimised early was mostly thrown away again ("wrong map" deoptimisations) and the optimising
 *   compiler took half the process's CPU. With 300,000, 1,000 members' designs took 2.4–2.7 s instead
 *   of 2.9–3.6 s (CPU 3.5–3.8 s instead of 5.1–6.3 s). The default would catch up only after about
 *   3,000 designs in one process. With worksheets it was slower (median 160–173 ms), hence `repeating`.
 *
 * Only when the optimiser starts changes, never what the code computes (test/server/jit-tuning.test.ts).
 */
export const INTERRUPT_BUDGET = { repeating: 20_000, varied: 300_000 } as const;

export type JitProfile = keyof typeof INTERRUPT_BUDGET;

/** The profile of a batch: worksheets are the same drawing code over and over, designs alone are not. */
export const batchProfile = (worksheets: boolean): JitProfile => (worksheets ? "repeating" : "varied");

/**
 * Sets the budget for this process (V8 flags are per process: every worker thread started after this
 * shares it). Only on Node 20, the release it was measured on (another V8 may name or weigh the flag
 * differently), and not when `--interrupt-budget` was given to node itself. Returns the budget set, or
 * undefined when it left V8's own.
 */
export function tuneJit(profile: JitProfile, node = process.versions.node, execArgv: readonly string[] = process.execArgv): number | undefined {
  if (node.split(".")[0] !== "20") return undefined;
  if (execArgv.some((a) => a.startsWith("--interrupt-budget") || a.startsWith("--interrupt_budget"))) return undefined;
  const budget = INTERRUPT_BUDGET[profile];
  setFlagsFromString(`--interrupt-budget=${budget}`);
  return budget;
}

/**
 * For a batch on worker threads: each worker optimises its code on its own thread
 * (`--no-concurrent-recompilation`), instead of handing the work to V8's background threads. Every core
 * already runs a worker, so background compiling only took turns with the workers. Measured in turns
 * on the 2-core build machine, 1,000 members on two workers: median 2.90 s against 3.09 (8 runs each),
 * 2.87 against 3.13 and 4.00 against 4.40 (10 runs, a busier hour); 100 members with worksheets 8.8 s
 * against 10.0. Not for the service: there a design would wait out an optimisation of designMember
 * (up to a tenth of a second) that now runs beside it. V8 reads the flag when a thread starts, so it
 * holds for threads started after the call. Node 20 only, and not when node was given the flag either
 * way. Returns whether it was set.
 */
export function compileInThread(node = process.versions.node, execArgv: readonly string[] = process.execArgv): boolean {
  if (node.split(".")[0] !== "20") return false;
  if (execArgv.some((a) => /^--(no-)?concurrent[-_]recompilation/.test(a))) return false;
  setFlagsFromString("--no-concurrent-recompilation");
  return true;
}

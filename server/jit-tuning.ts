import { setFlagsFromString } from "node:v8";

/**
 * How much a function must run before V8 optimises it (its `--interrupt-budget`, in bytes of bytecode
 * executed; 67,584 by default in Node 20), for the two ways this program runs:
 *
 * - `service`: the design threads run for hours and see the same kinds of job again and again, so they
 *   should reach their optimised code soon. With 20,000 the simple member's whole request settled at
 *   1.2 ms median and 1.9 ms of process CPU after 1,000 designs, where the default took about 10,000
 *   designs to get there (1.45 ms and 2.6 ms after 1,000); over HTTP, distinct designs at 10 connections
 *   went from 470–539 to 542–557 a second, 2.3–2.8 to 2.2–2.3 ms of server CPU each (runs in turns, 2 cores).
 * - `batch`: a batch designs each member once, most of them unlike the last, so code optimised early is
 *   mostly thrown away again ("wrong map" deoptimisations) and the optimising compiler took half the
 *   process's CPU. With 300,000, 1,000 members' designs alone took 2.4–2.7 s instead of 2.9–3.6 s
 *   (CPU 3.5–3.8 s instead of 5.1–6.3 s); the batch on one thread 4.7 s instead of 5.8 s. Past about
 *   3,000 designs in one process the default would catch up, which no batch of a project reaches.
 *
 * Measured on the build machine (bench/README figures). Only the optimiser's timing changes, never what
 * the code computes.
 */
export const INTERRUPT_BUDGET = { service: 20_000, batch: 300_000 } as const;

export type JitProfile = keyof typeof INTERRUPT_BUDGET;

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

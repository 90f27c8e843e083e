// The whole POST /api/designs work timed inside a worker thread of its own, as the server's design
// thread runs it: its own heap (the bench process's heap, full of the examples' results and worksheets,
// would make every collection dearer), the bundled code, the answer's JSON encoded as bytes.
import { parentPort } from "node:worker_threads";
import { designInUnits } from "../server/design-in-units.js";

export interface ThreadTiming {
  median: number;
  p95: number;
  /** CPU time of the whole process per call (the collector's helper threads included), ms. */
  cpu: number;
}

parentPort?.once("message", ({ input, runs, warmup }: { input: unknown; runs: number; warmup: number }) => {
  const utf8 = new TextEncoder();
  const call = () => void utf8.encode(JSON.stringify(designInUnits(input).shown));
  for (let i = 0; i < warmup; i++) call();
  const times: number[] = [];
  const cpu0 = process.cpuUsage();
  for (let i = 0; i < runs; i++) {
    const t0 = performance.now();
    call();
    times.push(performance.now() - t0);
  }
  const cpu = process.cpuUsage(cpu0);
  times.sort((a, b) => a - b);
  const timing: ThreadTiming = { median: times[Math.floor(runs / 2)]!, p95: times[Math.floor(runs * 0.95)]!, cpu: (cpu.user + cpu.system) / 1000 / runs };
  parentPort!.postMessage(timing);
});

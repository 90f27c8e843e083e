// Loopback load test: the real server (as `npm start` runs it) under mixed load for a fixed time,
// designs of every example and worksheets at once, each request a different job. Passes when there
// are no connection errors, no timeouts, no non-2xx answers and every answer is a result or a PDF, and
// the server still answers afterwards. Stops by itself: after `seconds`, or `maxDesigns` designs and
// `maxWorksheets` worksheets, whichever comes first (and a watchdog ends it 60 s past its time).
//   npm run load-test                    60 s
//   npm run load-test -- --seconds 10
import { parseArgs } from "node:util";
import { distinctBody, exampleJob, exampleNames, fire, isPdf, isResult, processStats, startServer, type LoadFigures } from "../bench/loopback.js";

export interface LoadTestOptions {
  seconds: number;
  designConnections?: number;
  worksheetConnections?: number;
  maxDesigns?: number;
  maxWorksheets?: number;
  /**
   * How long the worksheet connections run, when not `seconds`: a short run on a busy machine (the CI's test
   * files run side by side) may see no worksheet finish in `seconds`, and an unfinished request counts nothing.
   */
  worksheetSeconds?: number;
}

export interface LoadTestReport {
  passed: boolean;
  seconds: number;
  designs: LoadFigures;
  worksheets: LoadFigures;
  healthAfter: number;
  peakMiB: number;
  problems: string[];
}

export async function runLoadTest(options: LoadTestOptions): Promise<LoadTestReport> {
  const server = await startServer();
  const watchdog = setTimeout(() => {
    console.error(`load test: still running ${options.seconds + 60} s after it started; stopping the server`);
    void server.stop();
  }, (Math.max(options.seconds, options.worksheetSeconds ?? 0) + 60) * 1000);
  try {
    const names = exampleNames();
    const designs = names.map((name) => distinctBody(exampleJob(name)));
    const worksheets = names.map((name) => distinctBody(exampleJob(name)));
    const t0 = performance.now();
    const [d, w] = await Promise.all([
      fire(server.url, { path: "/api/designs", body: designs, connections: options.designConnections ?? 8, distinct: true, check: isResult }, options.seconds, options.maxDesigns ?? 200_000),
      fire(server.url, { path: "/api/worksheets", body: worksheets, connections: options.worksheetConnections ?? 2, distinct: true, check: isPdf }, options.worksheetSeconds ?? options.seconds, options.maxWorksheets ?? 5_000),
    ]);
    const seconds = (performance.now() - t0) / 1000;
    const health = await fetch(`${server.url}/api/health`);
    const problems: string[] = [];
    for (const [what, f] of [
      ["designs", d],
      ["worksheets", w],
    ] as const) {
      if (f.requests === 0) problems.push(`no ${what} were answered`);
      if (f.errors > 0) problems.push(`${f.errors} connection errors on ${what}`);
      if (f.timeouts > 0) problems.push(`${f.timeouts} timeouts on ${what}`);
      if (f.non2xx > 0) problems.push(`${f.non2xx} non-2xx answers on ${what}: ${f.badSamples.join(" | ")}`);
      else if (f.bad > 0) problems.push(`${f.bad} bad answers on ${what}: ${f.badSamples.join(" | ")}`);
    }
    if (health.status !== 200) problems.push(`GET /api/health answered ${health.status} afterwards`);
    return { passed: problems.length === 0, seconds, designs: d, worksheets: w, healthAfter: health.status, peakMiB: processStats(server.pid).peakMiB, problems };
  } finally {
    clearTimeout(watchdog);
    await server.stop();
  }
}

if (import.meta.url === `file://${process.argv[1]}`) {
  const { values } = parseArgs({ options: { seconds: { type: "string", default: process.env.LOAD_SECONDS ?? "60" } } });
  const seconds = Number(values.seconds);
  if (!Number.isFinite(seconds) || seconds <= 0 || seconds > 3600) {
    console.error(`--seconds must be a number from 1 to 3600, not "${values.seconds}"`);
    process.exit(2);
  }
  const r = await runLoadTest({ seconds });
  const line = (what: string, f: LoadFigures) =>
    `${what}: ${f.requests} answered (${f.perSecond.toFixed(1)}/s), latency p50 ${f.latency.p50} ms, p99 ${f.latency.p99} ms, max ${f.latency.max} ms; ${f.errors} errors, ${f.timeouts} timeouts, ${f.non2xx} non-2xx, ${f.bad} bad`;
  console.log(`load test, ${r.seconds.toFixed(0)} s on loopback:`);
  console.log(`  ${line("designs", r.designs)}`);
  console.log(`  ${line("worksheets", r.worksheets)}`);
  console.log(`  server peak resident size ${r.peakMiB.toFixed(0)} MiB; health afterwards ${r.healthAfter}`);
  console.log(r.passed ? "PASSED: zero errors" : `FAILED: ${r.problems.join("; ")}`);
  process.exit(r.passed ? 0 : 1);
}

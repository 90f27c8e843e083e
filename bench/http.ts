// HTTP on loopback: the real server (a child process, as `npm start` runs it) under autocannon.
// Designs per second and latency with 10 and 100 connections, worksheets per second, the server's
// CPU per answer, its peak resident size, and a soak (BENCH_SOAK_SECONDS, default 60) that compares
// its resident size over the first and the last 10 s. Prints; asserts nothing.
import { availableParallelism, loadavg } from "node:os";
import { distinctBody, exampleJob, fire, isJob, isPdf, isResult, processStats, startServer, type Load, type LoadFigures, type RunningServer } from "./loopback.js";

/** The page's opening example: a 4.8 m simple span, nailed box beam. */
export const SIMPLE_MEMBER = "workshop-box-beam.si";

const median = (xs: number[]) => [...xs].sort((a, b) => a - b)[Math.floor(xs.length / 2)] ?? Number.NaN;

export interface HttpFigures {
  designsPerSecond: number;
  /** Designs per second ÷ unit conversions per second of the same distinct jobs, 10 connections, measured one after the other. */
  designsOverConversions: number;
  worksheetsPerSecond: number;
  peakMiB: number;
  soakGrowthMiB: number;
}

async function measured(server: RunningServer, load: Load, seconds: number): Promise<LoadFigures & { cpuMsPerAnswer: number }> {
  const before = processStats(server.pid).cpuMs;
  const figures = await fire(server.url, load, seconds);
  const cpu = processStats(server.pid).cpuMs - before;
  return { ...figures, cpuMsPerAnswer: cpu / Math.max(1, figures.requests) };
}

export async function httpBench(say: (line: string) => void, largestExample: string): Promise<HttpFigures> {
  const seconds = Number(process.env.BENCH_HTTP_SECONDS ?? 10);
  const soakSeconds = Number(process.env.BENCH_SOAK_SECONDS ?? 60);
  const server = await startServer();
  try {
    const simple = exampleJob(SIMPLE_MEMBER);
    const largest = exampleJob(largestExample);
    say("");
    say(`## HTTP on loopback (autocannon ${seconds} s per row; ${availableParallelism()} cores shared by the server and autocannon; load average at the start ${loadavg().map((l) => l.toFixed(1)).join(", ")})`);
    say("");
    say(`The server runs as \`npm start\` does (its HTTP thread and ${Math.max(1, Math.min(4, availableParallelism() - 1))} design thread). "Distinct jobs": every request a different job (a unique id in member.description), so each is designed; "same job": the page sending a job again, answered from the result cache. Server CPU is user + system time of the server process (all threads) per answer.`);
    say("");
    say("| route | member | jobs | connections | answers/s | p50 (ms) | p90 (ms) | p99 (ms) | max (ms) | server CPU per answer (ms) | errors / non-2xx / bad |");
    say("|---|---|---|---|---|---|---|---|---|---|---|");
    const row = (route: string, member: string, jobs: string, connections: number, f: Awaited<ReturnType<typeof measured>>) =>
      say(
        `| ${route} | ${member} | ${jobs} | ${connections} | ${f.perSecond.toFixed(0)} | ${f.latency.p50.toFixed(0)} | ${f.latency.p90.toFixed(0)} | ${f.latency.p99.toFixed(0)} | ${f.latency.max.toFixed(0)} | ${f.cpuMsPerAnswer.toFixed(2)} | ${f.errors} / ${f.non2xx} / ${f.bad} |`,
      );
    // The first designs start the thread's code and let the JIT settle (a few hundred designs): the rows measure the steady state, not part of any figure.
    await fire(server.url, { path: "/api/designs", body: distinctBody(simple), connections: 10, distinct: true, check: isResult }, 5);
    await fire(server.url, { path: "/api/conversions?to=us", body: distinctBody(simple), connections: 10, distinct: true, check: isJob }, 3);
    let designsPerSecond = 0;
    let designsOverConversions = Number.NaN;
    for (const connections of [10, 100]) {
      const distinct = await measured(server, { path: "/api/designs", body: distinctBody(simple), connections, distinct: true, check: isResult }, seconds);
      row("POST /api/designs", SIMPLE_MEMBER, "distinct", connections, distinct);
      if (connections === 10) {
        // The same jobs converted to US units: the same parsing and validation without the design, as the yardstick.
        const conversions = await measured(server, { path: "/api/conversions?to=us", body: distinctBody(simple), connections, distinct: true, check: isJob }, seconds);
        row("POST /api/conversions?to=us", SIMPLE_MEMBER, "distinct", connections, conversions);
        designsOverConversions = distinct.perSecond / conversions.perSecond;
      }
      const same = await measured(server, { path: "/api/designs", body: JSON.stringify(simple), connections, distinct: false, check: isResult }, seconds);
      row("POST /api/designs", SIMPLE_MEMBER, "same", connections, same);
      if (connections === 10) designsPerSecond = distinct.perSecond;
    }
    const sheets = await measured(server, { path: "/api/worksheets", body: distinctBody(largest), connections: 4, distinct: true, check: isPdf }, Math.max(seconds, 10));
    row("POST /api/worksheets", largestExample, "distinct", 4, sheets);
    const afterThroughput = processStats(server.pid);

    // Soak: mixed designs and worksheets, resident size sampled every second.
    const samples: number[] = [];
    const sampler = setInterval(() => samples.push(processStats(server.pid).rssMiB), 1000);
    const [designs, worksheets] = await Promise.all([
      fire(server.url, { path: "/api/designs", body: distinctBody(simple), connections: 8, distinct: true, check: isResult }, soakSeconds),
      fire(server.url, { path: "/api/worksheets", body: distinctBody(largest), connections: 2, distinct: true, check: isPdf }, soakSeconds),
    ]);
    clearInterval(sampler);
    const window = Math.min(10, Math.floor(samples.length / 2));
    const first = median(samples.slice(0, window));
    const last = median(samples.slice(-window));
    const peak = processStats(server.pid).peakMiB;
    say("");
    say(`Soak: ${soakSeconds} s of mixed load (8 connections of distinct designs and 2 of distinct worksheets at once): ${designs.requests} designs and ${worksheets.requests} worksheets, ${designs.errors + worksheets.errors} errors, ${designs.non2xx + worksheets.non2xx} non-2xx, ${designs.bad + worksheets.bad} bad answers.`);
    say("");
    say("| server memory | MiB |");
    say("|---|---|");
    say(`| resident after the throughput rows | ${afterThroughput.rssMiB.toFixed(0)} |`);
    say(`| resident, median of the soak's first ${window} s | ${first.toFixed(0)} |`);
    say(`| resident, median of the soak's last ${window} s | ${last.toFixed(0)} |`);
    say(`| growth, last − first | ${(last - first).toFixed(1)} (${(((last - first) / first) * 100).toFixed(1)} %) |`);
    say(`| peak resident during every HTTP run | ${peak.toFixed(0)} |`);
    say("");
    say(`Designs ÷ conversions of the same distinct jobs, 10 connections: ${designsOverConversions.toFixed(2)} (goal ≥ 0.40, with the designs' p99 ≤ 50 ms).`);
    say("");
    say("Targets: ≥ 1,000 designs/s of the simple member over HTTP (on 2 cores); memory flat under load (growth within 10 % between the first and last 10 s).");
    return { designsPerSecond, designsOverConversions, worksheetsPerSecond: sheets.perSecond, peakMiB: peak, soakGrowthMiB: last - first };
  } finally {
    await server.stop();
  }
}

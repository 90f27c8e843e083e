// Fairness: the p99 latency of designs alone, and while heavy worksheets print (the invented 200-load
// member of test/job-builders.ts, one after another). Designs and worksheets have their own threads and
// queues, so the second figure should stay within about twice the first. Prints; asserts nothing.
import { availableParallelism, loadavg } from "node:os";
import { manyLoadsJob } from "../test/job-builders.js";
import { SIMPLE_MEMBER } from "./http.js";
import { distinctBody, exampleJob, fire, isPdf, isResult, startServer } from "./loopback.js";

export interface FairnessFigures {
  p99Alone: number;
  p99WithWorksheet: number;
}

export async function fairnessBench(say: (line: string) => void): Promise<FairnessFigures> {
  const seconds = Number(process.env.BENCH_HTTP_SECONDS ?? 10);
  const server = await startServer();
  try {
    const designs = { path: "/api/designs", body: distinctBody(exampleJob(SIMPLE_MEMBER)), connections: 4, distinct: true, check: isResult };
    const heavy = { path: "/api/worksheets", body: distinctBody(manyLoadsJob() as unknown as Record<string, unknown>), connections: 1, distinct: true, check: isPdf };
    // Start both kinds of thread; not part of any figure.
    await fire(server.url, designs, 2);
    await fire(server.url, heavy, 1, 1);
    const alone = await fire(server.url, designs, seconds);
    const [mixed, sheets] = await Promise.all([fire(server.url, designs, seconds), fire(server.url, heavy, seconds)]);
    say("");
    say(`## Fairness: designs while a heavy worksheet prints (${seconds} s each; ${availableParallelism()} cores; load average at the start ${loadavg().map((l) => l.toFixed(1)).join(", ")})`);
    say("");
    say(`Designs of ${SIMPLE_MEMBER} on 4 connections, every one a new job; "with worksheets": at the same time one connection asks for worksheets of the invented 200-load member (six spans, four patterned categories, 172 combinations) one after another.`);
    say("");
    say("| designs | answers/s | p50 (ms) | p99 (ms) | errors / non-2xx / bad |");
    say("|---|---|---|---|---|");
    say(`| alone | ${alone.perSecond.toFixed(0)} | ${alone.latency.p50.toFixed(0)} | ${alone.latency.p99.toFixed(0)} | ${alone.errors} / ${alone.non2xx} / ${alone.bad} |`);
    say(`| with worksheets | ${mixed.perSecond.toFixed(0)} | ${mixed.latency.p50.toFixed(0)} | ${mixed.latency.p99.toFixed(0)} | ${mixed.errors} / ${mixed.non2xx} / ${mixed.bad} |`);
    say("");
    say(
      `Heavy worksheets meanwhile: ${sheets.requests} in ${seconds} s, p50 ${(sheets.latency.p50 / 1000).toFixed(1)} s, ${sheets.errors + sheets.non2xx + sheets.bad} failed. p99 with ÷ without: ${(mixed.latency.p99 / Math.max(1, alone.latency.p99)).toFixed(2)} (goal ≤ 2).`,
    );
    return { p99Alone: alone.latency.p99, p99WithWorksheet: mixed.latency.p99 };
  } finally {
    await server.stop();
  }
}

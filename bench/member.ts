// One member through the whole pipeline in process, step by step: the simple member (the page's
// example) and a three-span member with every combination of a set and its live-load patterns.
import { readFileSync } from "node:fs";
import { designMember, DesignResult, prepareJob, toDisplayUnits } from "../core/index.js";
import { fingerprintOf } from "../server/fingerprint.js";
import { once } from "node:events";
import { bundleThread, startThread } from "../server/thread-entry.js";
import type { ThreadTiming } from "./member-thread.js";
import { SIMPLE_MEMBER } from "./http.js";
import { threeSpanJob } from "./three-span-job.js";
import { timeIt } from "./time-it.js";

export interface MemberFigures {
  simpleMedianMs: number;
  /** The same request as the design threads run it: the bundled code (see server/thread-entry.ts), result JSON as bytes. */
  simpleThreadMedianMs: number;
  /** The same in a design thread that has already done 3,000 of them. */
  simpleWarmThreadMedianMs: number;
  threeSpanMedianMs: number;
}

const THREAD_ENTRY = new URL("./member-thread.ts", import.meta.url);

/** The whole request timed `runs` times in a fresh worker thread (bench/member-thread.ts), after `warmup` untimed. */
async function inThread(input: unknown, runs: number, warmup = 30): Promise<ThreadTiming> {
  await bundleThread(THREAD_ENTRY);
  const worker = startThread(THREAD_ENTRY);
  try {
    worker.postMessage({ input, runs, warmup });
    const [timing] = (await once(worker, "message")) as [ThreadTiming];
    return timing;
  } finally {
    await worker.terminate();
  }
}

export async function memberBench(say: (line: string) => void): Promise<MemberFigures> {
  say("");
  say("## One member, in process, step by step (median and p95 of 200 runs, ms)");
  say("");
  say("| member | result combinations | stations | prepareJob | designMember | toDisplayUnits | fingerprint | JSON text | whole (median) | whole (p95) | in a design thread: median | p95 | CPU | result (kB) |");
  say("|---|---|---|---|---|---|---|---|---|---|---|---|---|---|");
  const figures: number[] = [];
  const threadFigures: number[] = [];
  for (const [name, input] of [
    [`${SIMPLE_MEMBER} (simple span)`, JSON.parse(readFileSync(new URL(`../fixtures/examples/${SIMPLE_MEMBER}.json`, import.meta.url), "utf8"))],
    ["three spans, 20 loads, asce7-22-allowable with live, roof-live and snow patterned", threeSpanJob()],
  ] as const) {
    const prepared = prepareJob(input);
    if (!prepared.ok) throw new Error(`${name}: ${JSON.stringify(prepared.issues)}`);
    const core = designMember(prepared.core);
    const shown = toDisplayUnits(DesignResult, core, prepared.job.units);
    const text = JSON.stringify(shown);
    const prepare = timeIt(() => prepareJob(input), 200);
    const design = timeIt(() => designMember(prepared.core), 200);
    const display = timeIt(() => toDisplayUnits(DesignResult, core, prepared.job.units), 200);
    const fingerprint = timeIt(() => fingerprintOf(prepared.job), 200);
    const json = timeIt(() => JSON.stringify(shown), 200);
    const wholeRequest = () => {
      const p = prepareJob(input);
      if (p.ok) JSON.stringify({ ...toDisplayUnits(DesignResult, designMember(p.core), p.job.units), fingerprint: fingerprintOf(p.job) });
    };
    const whole = timeIt(wholeRequest, 200);
    const thread = await inThread(input, 400);
    figures.push(whole.median);
    threadFigures.push(thread.median);
    say(
      `| ${name} | ${core.beam.combinations.length} | ${core.beam.stations.length} | ${prepare.median.toFixed(2)} | ${design.median.toFixed(2)} | ${display.median.toFixed(2)} | ${fingerprint.median.toFixed(2)} | ${json.median.toFixed(2)} | ${whole.median.toFixed(2)} | ${whole.p95.toFixed(2)} | ${thread.median.toFixed(2)} | ${thread.p95.toFixed(2)} | ${thread.cpu.toFixed(2)} | ${(text.length / 1024).toFixed(0)} |`,
    );
  }
  // A design thread of the service runs for hours: the same request once its thread has done 3,000 of them.
  const simple = JSON.parse(readFileSync(new URL(`../fixtures/examples/${SIMPLE_MEMBER}.json`, import.meta.url), "utf8"));
  const warm = await inThread(simple, 1000, 3000);
  say("");
  say(`${SIMPLE_MEMBER} in a warm design thread (1,000 requests after 3,000 untimed): median ${warm.median.toFixed(2)} ms, p95 ${warm.p95.toFixed(2)} ms, ${warm.cpu.toFixed(2)} ms of process CPU each.`);
  say("");
  say("\"whole\" is what one POST /api/designs computes: validation, design, conversion to the job's units, fingerprint and the JSON text. \"as the design thread runs it\": the same from the bundle the server's design threads run (no tsx keepNames wrappers), the JSON encoded as bytes; target for the simple member ≤ 0.7 ms. The beam-actions table below evaluates the three-span member's combinations at 2,000 stations.");
  return { simpleMedianMs: figures[0]!, simpleThreadMedianMs: threadFigures[0]!, simpleWarmThreadMedianMs: warm.median, threeSpanMedianMs: figures[1]! };
}

// One member through the whole pipeline in process, step by step: the simple member (the page's
// example) and a three-span member with every combination of a set and its live-load patterns.
import { readFileSync } from "node:fs";
import { designMember, DesignResult, prepareJob, toDisplayUnits } from "../core/index.js";
import { fingerprintOf } from "../server/fingerprint.js";
import type { designInUnits as DesignInUnits } from "../server/design-in-units.js";
import { importBundled } from "../server/thread-entry.js";
import { SIMPLE_MEMBER } from "./http.js";
import { threeSpanJob } from "./three-span-job.js";
import { timeIt } from "./time-it.js";

export interface MemberFigures {
  simpleMedianMs: number;
  /** The same request as the design threads run it: the bundled code (see server/thread-entry.ts), result JSON as bytes. */
  simpleThreadMedianMs: number;
  threeSpanMedianMs: number;
}

/** Median and p95 of `a` and of `b`, called in turn `runs` times each after a warm-up, ms. */
function timePair(a: () => void, b: () => void, runs: number): [{ median: number; p95: number }, { median: number; p95: number }] {
  const times: [number[], number[]] = [[], []];
  for (let i = 0; i < runs + 20; i++) {
    for (const [k, fn] of (i % 2 ? [[0, a], [1, b]] : [[1, b], [0, a]]) as [0 | 1, () => void][]) {
      const t0 = performance.now();
      fn();
      if (i >= 20) times[k].push(performance.now() - t0);
    }
  }
  const figures = (t: number[]) => (t.sort((x, y) => x - y), { median: t[Math.floor(runs / 2)]!, p95: t[Math.floor(runs * 0.95)]! });
  return [figures(times[0]), figures(times[1])];
}

export async function memberBench(say: (line: string) => void): Promise<MemberFigures> {
  const bundled = await importBundled<{ designInUnits: typeof DesignInUnits }>(new URL("../server/design-in-units.ts", import.meta.url));
  const utf8 = new TextEncoder();
  say("");
  say("## One member, in process, step by step (median and p95 of 200 runs, ms)");
  say("");
  say("| member | result combinations | stations | prepareJob | designMember | toDisplayUnits | fingerprint | JSON text | whole (median) | whole (p95) | whole as the design thread runs it (median) | result (kB) |");
  say("|---|---|---|---|---|---|---|---|---|---|---|---|");
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
    const threadRequest = bundled ? () => void utf8.encode(JSON.stringify(bundled.designInUnits(input).shown)) : wholeRequest;
    // Alternated call by call, so that other work on the machine weighs on both alike.
    const [whole, thread] = timePair(wholeRequest, threadRequest, 200);
    figures.push(whole.median);
    threadFigures.push(thread.median);
    say(
      `| ${name} | ${core.beam.combinations.length} | ${core.beam.stations.length} | ${prepare.median.toFixed(2)} | ${design.median.toFixed(2)} | ${display.median.toFixed(2)} | ${fingerprint.median.toFixed(2)} | ${json.median.toFixed(2)} | ${whole.median.toFixed(2)} | ${whole.p95.toFixed(2)} | ${thread.median.toFixed(2)} | ${(text.length / 1024).toFixed(0)} |`,
    );
  }
  say("");
  say("\"whole\" is what one POST /api/designs computes: validation, design, conversion to the job's units, fingerprint and the JSON text. \"as the design thread runs it\": the same from the bundle the server's design threads run (no tsx keepNames wrappers), the JSON encoded as bytes; target for the simple member ≤ 0.7 ms. The beam-actions table below evaluates the three-span member's combinations at 2,000 stations.");
  return { simpleMedianMs: figures[0]!, simpleThreadMedianMs: threadFigures[0]!, threeSpanMedianMs: figures[1]! };
}

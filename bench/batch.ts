// Batch figures: invented members (variations of the examples) through the CLI's code path (runBatch),
// without worksheets and with them, on one worker thread and on all cores. Prints; asserts nothing.
import { mkdirSync, mkdtempSync, readdirSync, readFileSync, rmSync, writeFileSync } from "node:fs";
import { availableParallelism, loadavg, tmpdir } from "node:os";
import { join } from "node:path";
import { Worker } from "node:worker_threads";
import { runBatch, type BatchReport } from "../server/cli/run-batch.js";
import { batchProfile, tuneJit } from "../server/jit-tuning.js";

/** Mulberry32: a small seeded generator, so every run invents the same members. */
function seeded(seed: number): () => number {
  let a = seed >>> 0;
  return () => {
    a = (a + 0x6d2b79f5) >>> 0;
    let t = a;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}

const LOAD_FIELDS = new Set(["w", "wStart", "wEnd", "P", "M"]);

/** `count` members, each an example with its loads and rated connector resistances scaled by a random factor. */
export function inventMembers(folder: string, count: number, seed = 10): string[] {
  const examplesDir = new URL("../fixtures/examples/", import.meta.url);
  const examples = readdirSync(examplesDir)
    .filter((f) => f.endsWith(".json"))
    .sort()
    // eslint-disable-next-line @typescript-eslint/no-explicit-any
    .map((f) => JSON.parse(readFileSync(new URL(f, examplesDir), "utf8")) as Record<string, any>);
  const random = seeded(seed);
  const files: string[] = [];
  for (let i = 0; i < count; i++) {
    const job = structuredClone(examples[i % examples.length]!);
    const loadFactor = 0.6 + 0.5 * random();
    for (const load of job.beam.loads as Record<string, unknown>[]) {
      for (const key of Object.keys(load)) if (LOAD_FIELDS.has(key) && typeof load[key] === "number") load[key] = Number(((load[key] as number) * loadFactor).toPrecision(4));
    }
    for (const connector of job.connectors as Record<string, unknown>[]) {
      if (typeof connector.resistance === "number") connector.resistance = Math.round(connector.resistance * (0.9 + 0.2 * random()));
    }
    job.member.mark = `B-${String(i + 1).padStart(4, "0")}`;
    const file = join(folder, `${job.member.mark}.${job.units}.json`);
    writeFileSync(file, JSON.stringify(job));
    files.push(file);
  }
  return files;
}

/** How many cores this process really gets now: the same spin on 1 and on 2 worker threads (1.0 = a second core is free, 0 = none). */
async function spareCoreProbe(): Promise<{ one: number; two: number; spare: number }> {
  const spin = "let x = 0; for (let i = 0; i < 2e8; i++) x += i % 7; require('node:worker_threads').parentPort.postMessage(x);";
  const run = async (n: number) => {
    const t0 = performance.now();
    await Promise.all(Array.from({ length: n }, () => new Promise((resolve) => new Worker(spin, { eval: true }).once("message", resolve))));
    return performance.now() - t0;
  };
  const one = await run(1);
  const two = await run(2);
  return { one, two, spare: Math.max(0, Math.min(1, (2 * one - two) / one)) };
}

const mean = (xs: number[]) => xs.reduce((a, b) => a + b, 0) / xs.length;

const median = (xs: number[]) => {
  const s = [...xs].sort((a, b) => a - b);
  return s.length ? s[Math.floor(s.length / 2)]! : Number.NaN;
};

export async function batchBench(say: (line: string) => void): Promise<void> {
  const work = mkdtempSync(join(tmpdir(), "stitchplan-bench-"));
  try {
    say("");
    say(`## Batch (stitchplan design): invented members, variations of the examples, ${availableParallelism()} cores`);
    say("");
    const probe = await spareCoreProbe();
    say(
      `Load average when the batch bench started: ${loadavg().map((l) => l.toFixed(1)).join(", ")} (1, 5, 15 min). The same spin took ${probe.one.toFixed(0)} ms on one worker thread and ${probe.two.toFixed(0)} ms on each of two at once: about ${probe.spare.toFixed(1)} of a second core was free. Other work on the machine slows every figure and hides the gain from threads.`,
    );
    say("");
    say("| members | worksheets | threads | seconds | members/s | design mean (ms) | worksheet median (ms) | worksheet p95 (ms) | pass / fail / other |");
    say("|---|---|---|---|---|---|---|---|---|");
    const row = (n: number, pdf: boolean, r: BatchReport) => {
      const designed = r.outcomes.filter((o) => o.status === "pass" || o.status === "fail");
      const pdfs = designed.map((o) => o.milliseconds.pdf).sort((a, b) => a - b);
      const p95 = pdfs.length ? pdfs[Math.floor(pdfs.length * 0.95)]! : Number.NaN;
      const count = (s: string) => r.outcomes.filter((o) => o.status === s).length;
      say(
        `| ${n} | ${pdf ? "yes" : "no"} | ${r.threads} | ${r.seconds.toFixed(2)} | ${(designed.length / r.seconds).toFixed(1)} | ${mean(designed.map((o) => o.milliseconds.design)).toFixed(1)} | ${pdf ? median(pdfs).toFixed(0) : "—"} | ${pdf ? p95.toFixed(0) : "—"} | ${count("pass")} / ${count("fail")} / ${r.outcomes.length - count("pass") - count("fail")} |`,
      );
    };
    const cores = availableParallelism();
    for (const [n, pdf] of [
      [1000, false],
      [100, true],
    ] as const) {
      // As `stitchplan design` sets it (server/cli/main.ts); for the rest of this process.
      tuneJit(batchProfile(pdf));
      const folder = join(work, `jobs-${n}`);
      mkdirSync(folder);
      inventMembers(folder, n);
      for (const threads of cores > 1 ? [1, cores] : [1]) {
        const report = await runBatch({ mode: "design", inputs: [folder], out: join(work, `out-${n}-${threads}`), pdf, threads, printDate: "2025-03-14", summaryFile: true });
        row(n, pdf, report);
      }
    }
    say("");
    say("Targets: 1,000 members without worksheets under 3 s (issue 20); a worksheet under 300 ms. Seconds include reading the job files and writing every output, and bundling the members' code once and loading it (about half a second; a quarter less when the bundle kept from an earlier run still matches every source: server/thread-entry.ts) for a large batch or for worker threads, and with threads > 1 starting them.");
  } finally {
    rmSync(work, { recursive: true, force: true });
  }
}

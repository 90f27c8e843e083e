// Benchmarks: prints figures and writes them to bench/results/latest.md (and one line per run to
// history.tsv); asserts nothing. BENCH_ONLY=examples,member,worksheet,spacing,beam,batch,http,fairness picks parts.
import { appendFileSync, existsSync, mkdirSync, readdirSync, readFileSync, writeFileSync } from "node:fs";
import { availableParallelism, cpus, loadavg } from "node:os";
import { designMember, prepareJob } from "../core/index.js";
import { runDesign } from "../server/design-service.js";
import { tuneJit } from "../server/jit-tuning.js";
import { renderWorksheet } from "../server/pdf/worksheet.js";
import { beamBench } from "./beam.js";
import { batchBench } from "./batch.js";
import { fairnessBench } from "./fairness.js";
import { httpBench, type HttpFigures } from "./http.js";
import { memberBench, type MemberFigures } from "./member.js";
import { spacingBench } from "./spacing.js";
import { timeAsync, timeIt } from "./time-it.js";
import { worksheetBench } from "./worksheet.js";

const root = new URL("../", import.meta.url);
const only = process.env.BENCH_ONLY?.split(",").map((s) => s.trim());
const wanted = (part: string) => !only || only.includes(part);
const lines: string[] = [];
const say = (s: string) => {
  console.log(s);
  lines.push(s);
};

const started = new Date().toISOString();
// The in-process figures with the JIT as the service sets it (server/jit-tuning.ts); the batch part sets it per row as `stitchplan design` does, the HTTP parts run a server of their own.
const budget = tuneJit("repeating");
say(`# stitchplan benchmark — ${started}`);
say(`machine: ${availableParallelism()} cores (${cpus()[0]?.model ?? "unknown"}), Node ${process.version}; load average at the start ${loadavg().map((l) => l.toFixed(1)).join(", ")} (1, 5, 15 min); V8 interrupt budget ${budget ?? "V8's own"} in process`);

/** Every example: design time, economy, worksheet time and size; returns the example with the largest worksheet. */
async function examplesTable(): Promise<string> {
  say("");
  say("## The examples, in process (design: 200 runs; worksheet: median of 3 after one warm-up)");
  say("");
  say("| member | design median (ms) | design p95 (ms) | connectors / lower bound | uniform spacing / zoned (count) | worksheet (ms) | worksheet (kB) |");
  say("|---|---|---|---|---|---|---|");
  const folder = new URL("fixtures/examples/", root);
  let largest = { name: "", bytes: 0 };
  for (const file of readdirSync(folder).filter((f) => f.endsWith(".json")).sort()) {
    const input = JSON.parse(readFileSync(new URL(file, folder), "utf8"));
    const prepared = prepareJob(input);
    if (!prepared.ok) throw new Error(`${file}: ${JSON.stringify(prepared.issues)}`);
    const t = timeIt(() => designMember(prepared.core), 200);
    const result = designMember(prepared.core);
    const worst = (values: (number | null)[]) => {
      const known = values.filter((r): r is number => r !== null);
      return known.length ? Math.max(...known).toFixed(3) : "—";
    };
    const run = runDesign(input);
    let pdf: Buffer = Buffer.alloc(0);
    // The first worksheet of a process also parses the fonts and compiles pdfkit: warmed up, not counted.
    const pdfMs = (await timeAsync(async () => (pdf = await renderWorksheet(run.job, run.result)), 3, 1)).median;
    if (pdf.length > largest.bytes) largest = { name: file.replace(/\.json$/, ""), bytes: pdf.length };
    say(
      `| ${file} | ${t.median.toFixed(2)} | ${t.p95.toFixed(2)} | ${worst(result.schedules.map((s) => s.efficiency.countOverLowerBound))} | ${worst(result.schedules.map((s) => s.efficiency.uniformOverCount))} | ${pdfMs.toFixed(0)} | ${(pdf.length / 1024).toFixed(0)} |`,
    );
  }
  say("");
  say("Economy columns: the largest ratio over the member's joints. Connectors / lower bound is the count placed ÷ the continuous lower bound ∫ max(d(x), 1/s_max) dx; uniform spacing / zoned is the count one uniform spacing would need ÷ the count placed (above 1: the zones save connectors).");
  return largest.name;
}

const largestExample = wanted("examples") || wanted("worksheet") || wanted("http") ? await examplesTable() : "";
let member: MemberFigures | undefined;
if (wanted("member")) member = await memberBench(say);
let worksheetMs: number | undefined;
if (wanted("worksheet")) worksheetMs = await worksheetBench(say, largestExample);
if (wanted("spacing")) spacingBench(say);
if (wanted("beam")) beamBench(say);
if (wanted("batch")) await batchBench(say);
let http: HttpFigures | undefined;
if (wanted("http")) http = await httpBench(say, largestExample);
if (wanted("fairness")) await fairnessBench(say);

mkdirSync(new URL("bench/results/", root), { recursive: true });
writeFileSync(new URL(`bench/results/${only ? `latest-${only.join("-")}` : "latest"}.md`, root), lines.join("\n") + "\n");
const history = new URL("bench/results/history.tsv", root);
if (!existsSync(history)) {
  appendFileSync(history, ["date", "cores", "load1", "parts", "simple member request work median ms", "three-span request work median ms", "worksheet median ms", "designs/s (distinct, 10 conn)", "worksheets/s", "peak MiB", "soak growth MiB"].join("\t") + "\n");
}
const cell = (n: number | undefined, digits: number) => (n === undefined ? "" : n.toFixed(digits));
appendFileSync(
  history,
  [
    started,
    availableParallelism(),
    loadavg()[0]!.toFixed(1),
    only?.join(",") ?? "all",
    cell(member?.simpleMedianMs, 2),
    cell(member?.threeSpanMedianMs, 2),
    cell(worksheetMs, 0),
    cell(http?.designsPerSecond, 0),
    cell(http?.worksheetsPerSecond, 1),
    cell(http?.peakMiB, 0),
    cell(http?.soakGrowthMiB, 1),
  ].join("\t") + "\n",
);

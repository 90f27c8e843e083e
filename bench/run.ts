// Benchmarks: prints figures and writes them to bench/results/latest.md; asserts nothing.
import { mkdirSync, readdirSync, readFileSync, writeFileSync } from "node:fs";
import { availableParallelism, cpus } from "node:os";
import { designMember, prepareJob } from "../core/index.js";
import { runDesign } from "../server/design-service.js";
import { renderWorksheet } from "../server/pdf/worksheet.js";
import { beamBench } from "./beam.js";
import { batchBench } from "./batch.js";
import { spacingBench } from "./spacing.js";

const root = new URL("../", import.meta.url);
const lines: string[] = [];
const say = (s: string) => {
  console.log(s);
  lines.push(s);
};

function timeIt(fn: () => void, runs: number): { median: number; p95: number } {
  for (let i = 0; i < Math.min(20, runs); i++) fn();
  const t: number[] = [];
  for (let i = 0; i < runs; i++) {
    const t0 = performance.now();
    fn();
    t.push(performance.now() - t0);
  }
  t.sort((a, b) => a - b);
  return { median: t[Math.floor(runs / 2)]!, p95: t[Math.floor(runs * 0.95)]! };
}

say(`# stitchplan benchmark — ${new Date().toISOString()}`);
say(`machine: ${availableParallelism()} cores (${cpus()[0]?.model ?? "unknown"}), Node ${process.version}`);
say("");
say("| member | design median (ms) | design p95 (ms) | connectors / lower bound | worksheet (ms) | worksheet (kB) |");
say("|---|---|---|---|---|---|");
const folder = new URL("fixtures/examples/", root);
for (const file of readdirSync(folder).filter((f) => f.endsWith(".json")).sort()) {
  const input = JSON.parse(readFileSync(new URL(file, folder), "utf8"));
  const prepared = prepareJob(input);
  if (!prepared.ok) throw new Error(`${file}: ${JSON.stringify(prepared.issues)}`);
  const t = timeIt(() => designMember(prepared.core), 200);
  const result = designMember(prepared.core);
  const ratios = result.schedules.map((s) => s.efficiency.countOverLowerBound).filter((r): r is number => r !== null);
  const run = runDesign(input);
  const t0 = performance.now();
  const pdf = await renderWorksheet(run.job, run.result);
  const pdfMs = performance.now() - t0;
  say(`| ${file} | ${t.median.toFixed(2)} | ${t.p95.toFixed(2)} | ${ratios.length ? Math.max(...ratios).toFixed(3) : "—"} | ${pdfMs.toFixed(0)} | ${(pdf.length / 1024).toFixed(0)} |`);
}
spacingBench(say);
beamBench(say);
await batchBench(say);
mkdirSync(new URL("bench/results/", root), { recursive: true });
writeFileSync(new URL("bench/results/latest.md", root), lines.join("\n") + "\n");

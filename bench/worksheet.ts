// The worksheet of the largest example (by PDF size): time and size over repeated renders.
import { readFileSync } from "node:fs";
import { runDesign } from "../server/design-service.js";
import { renderWorksheet } from "../server/pdf/worksheet.js";
import { timeAsync } from "./time-it.js";

export async function worksheetBench(say: (line: string) => void, example: string): Promise<number> {
  const input = JSON.parse(readFileSync(new URL(`../fixtures/examples/${example}.json`, import.meta.url), "utf8"));
  const run = runDesign(input);
  let bytes = 0;
  let pages = 0;
  const t = await timeAsync(async () => {
    const pdf = await renderWorksheet(run.job, run.result, { printDate: "2025-03-14" });
    bytes = pdf.length;
    pages = (pdf.toString("latin1").match(/\/Type \/Page\b/g) ?? []).length;
  }, 15);
  const design = await timeAsync(async () => runDesign(input), 15);
  say("");
  say(`## Worksheet of the largest example (${example}), in process: 15 renders after 2 warm-up (target < 300 ms)`);
  say("");
  say("| example | pages | size (kB) | render median (ms) | render p95 (ms) | design + render median (ms) |");
  say("|---|---|---|---|---|---|");
  say(`| ${example} | ${pages} | ${(bytes / 1024).toFixed(0)} | ${t.median.toFixed(0)} | ${t.p95.toFixed(0)} | ${(t.median + design.median).toFixed(0)} |`);
  return t.median;
}

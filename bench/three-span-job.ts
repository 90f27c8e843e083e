// The three-span, 20-load member of the member benchmark (invented, demo data); the golden test designs it too.
import { readFileSync } from "node:fs";

/** The simple member's section on three continuous spans, 20 loads of every built-in category (invented, demo data). */
export function threeSpanJob(set = "asce7-22-allowable", basis?: "allowable" | "factored"): Record<string, unknown> {
  const job = JSON.parse(readFileSync(new URL(`../fixtures/examples/workshop-box-beam.si.json`, import.meta.url), "utf8"));
  const categories = ["dead", "live", "roof-live", "snow", "wind"];
  const loads: Record<string, unknown>[] = [];
  for (let i = 0; i < 20; i++) {
    const category = categories[i % categories.length]!;
    const from = ((i * 617) % 11_000) / 1000;
    if (i % 4 === 0) loads.push({ type: "uniform", category, w: 0.4 + 0.1 * (i % 3) });
    else if (i % 4 === 1) loads.push({ type: "linear", category, wStart: 0.2, wEnd: 0.8, from, to: Math.min(12, from + 2.5) });
    else if (i % 4 === 2) loads.push({ type: "point", category, P: 0.5 + 0.05 * i, at: from + 0.3 });
    else loads.push({ type: "uniform", category, w: 0.5, from, to: Math.min(12, from + 1.8) });
  }
  job.member.mark = "B-3S";
  job.beam = { spans: [4.2, 4.8, 3.0], loads, patternedCategories: ["live", "roof-live", "snow"] };
  job.combinations = { set };
  if (basis) job.basis = basis;
  return job;
}

// Beam actions: a three-span continuous member, 20 loads of every category, every combination of a
// built-in set with its live-load patterns, evaluated at about 2,000 stations (analysis and result).
import { analyseMember } from "../core/beam/analyse-beam.js";
import { beamResult } from "../core/beam/beam-result.js";
import { combinationSet } from "../core/beam/combinations.js";
import { stationsFor } from "../core/beam/stations.js";
import { Beam, CombinationSettings, type CombinationSet, type Load } from "../core/schema/beam.js";

/** Invented member (demo data), core units: mm, N, N/mm, N·mm. Live load is patterned (the default). */
function member(): Beam {
  const categories = ["dead", "live", "roof-live", "snow", "wind"];
  const loads: Partial<Load>[] = [];
  for (let i = 0; i < 20; i++) {
    const category = categories[i % categories.length]!;
    const from = (i * 617) % 11_000;
    if (i % 4 === 0) loads.push({ type: "uniform", category, w: 1 + (i % 3) });
    else if (i % 4 === 1) loads.push({ type: "linear", category, wStart: 0.5, wEnd: 2.5, from, to: Math.min(12_000, from + 2500) });
    else if (i % 4 === 2) loads.push({ type: "point", category, P: 2000 + 150 * i, at: from + 300 });
    else loads.push({ type: "uniform", category, w: 1.5, from, to: Math.min(12_000, from + 1800) });
  }
  return Beam.parse({ spans: [4200, 4800, 3000], loads });
}

function timed(fn: () => void, runs: number): { median: number; fastest: number } {
  for (let i = 0; i < 20; i++) fn();
  const t: number[] = [];
  for (let i = 0; i < runs; i++) {
    const t0 = performance.now();
    fn();
    t.push(performance.now() - t0);
  }
  t.sort((a, b) => a - b);
  return { median: t[Math.floor(runs / 2)]!, fastest: t[0]! };
}

export function beamBench(say: (s: string) => void): void {
  const beam = member();
  say("");
  say("## Beam actions: three continuous spans, 20 loads, every combination of a set with its live-load patterns, ≈ 2,000 stations (target < 5 ms)");
  say("");
  say("| combination set | combinations | with patterns | stations | analysis + result at the stations, median (ms) | fastest run (ms) | analysis alone, median (ms) |");
  say("|---|---|---|---|---|---|---|");
  for (const set of ["asce7-22-strength", "asce7-22-allowable", "en1990-6.10"] as CombinationSet[]) {
    const { combinations } = combinationSet(beam, CombinationSettings.parse({ set }), 0.5);
    let entries = 0;
    let stationCount = 0;
    const t = timed(() => {
      const analysis = analyseMember({ beam, combinations, selfWeight: 0.5, flexuralRigidity: 2e12, serviceLoads: true });
      const stations = stationsFor(analysis.length, [...new Set(analysis.results.flatMap((r) => r.actions.breaks))], 2000, false);
      const result = beamResult(analysis, stations);
      entries = result.combinations.length;
      stationCount = stations.length;
    }, 200);
    const analysisOnly = timed(() => analyseMember({ beam, combinations, selfWeight: 0.5, flexuralRigidity: 2e12, serviceLoads: true }), 200);
    say(`| ${set} | ${combinations.length} | ${entries} | ${stationCount} | ${t.median.toFixed(2)} | ${t.fastest.toFixed(2)} | ${analysisOnly.median.toFixed(2)} |`);
  }
}

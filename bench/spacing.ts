// Spacing economy and optimiser time: connectors placed ÷ the lower bound, and ÷ one uniform spacing.
import { simpleSpanReactions } from "../core/beam/analyse-beam.js";
import { memberActions, type LoadSet } from "../core/beam/member-actions.js";
import { designSchedule } from "../core/spacing/design-schedule.js";

interface Case {
  name: string;
  length: number;
  loads: LoadSet;
  resistance: number;
  flowFactor: number;
}

/** Invented members (demo data) covering the usual demand shapes. */
const cases: Case[] = [
  { name: "uniform load, 6 m", length: 6000, loads: { points: [], moments: [], lines: [{ x0: 0, x1: 6000, w0: 6, w1: 6 }] }, resistance: 900, flowFactor: 1.2e-3 },
  { name: "uniform load, 4 m, light", length: 4000, loads: { points: [], moments: [], lines: [{ x0: 0, x1: 4000, w0: 3, w1: 3 }] }, resistance: 600, flowFactor: 1.2e-3 },
  { name: "two point loads at thirds, 5.4 m", length: 5400, loads: { points: [{ x: 1800, P: 12_000 }, { x: 3600, P: 12_000 }], moments: [], lines: [{ x0: 0, x1: 5400, w0: 1, w1: 1 }] }, resistance: 900, flowFactor: 1.2e-3 },
  { name: "off-centre point load, 4.8 m", length: 4800, loads: { points: [{ x: 1200, P: 15_000 }], moments: [], lines: [{ x0: 0, x1: 4800, w0: 2, w1: 2 }] }, resistance: 900, flowFactor: 1.2e-3 },
];

export function spacingBench(say: (s: string) => void): void {
  say("");
  say("## Spacing economy (3 zones per half span, 5 mm module, 25–300 mm)");
  say("");
  say("| member | connectors | ÷ lower bound (with s_max) | ÷ ∫q/R dx | uniform ÷ zoned | optimiser per joint (ms, median) |");
  say("|---|---|---|---|---|---|");
  for (const c of cases) {
    const actions = memberActions(c.length, c.loads, simpleSpanReactions(c.loads, 0, c.length));
    const problem = {
      length: c.length,
      combinations: [{ id: "C", actions, resistance: c.resistance }],
      flowFactor: c.flowFactor,
      lines: 1,
      rows: 1,
      minSpacing: 25,
      maxSpacing: 300,
      module: 5,
      preferred: null,
      endDistance: 20,
      minZoneLength: 300,
      maxZones: 5,
      symmetric: true,
      system: "si" as const,
    };
    const times: number[] = [];
    let design = designSchedule(problem);
    for (let i = 0; i < 60; i++) {
      const t0 = performance.now();
      design = designSchedule(problem);
      times.push(performance.now() - t0);
    }
    times.sort((a, b) => a - b);
    const uniform = design.uniform ? (design.uniform.count / design.count).toFixed(3) : "—";
    say(`| ${c.name} | ${design.count} | ${(design.count / design.lowerBound).toFixed(3)} | ${(design.count / design.demandIntegral).toFixed(3)} | ${uniform} | ${times[30]!.toFixed(2)} |`);
  }
}

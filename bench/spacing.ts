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

/** Zones over the whole member for `half` zones per half span, mirrored (the central zone counts once). */
const zonesFor = (half: number) => 2 * half - 1;

export function spacingBench(say: (s: string) => void): void {
  say("");
  say("## Spacing economy (3 zones per half span, 5 mm module, 25–300 mm; and with more zones allowed)");
  say("");
  say("| member | connectors | ÷ lower bound (with s_max) | ÷ ∫q/R dx | uniform ÷ zoned | optimiser per joint (ms, median) | ÷ lower bound, 6 / 13 zones per half span | optimiser, 13 zones (ms) |");
  say("|---|---|---|---|---|---|---|---|");
  for (const c of cases) {
    const actions = memberActions(c.length, c.loads, simpleSpanReactions(c.loads, 0, c.length));
    const problem = (half: number) => ({
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
      minZoneLength: half > 3 ? 100 : 300,
      maxZones: zonesFor(half),
      symmetric: true,
      system: "si" as const,
    });
    const timed = (half: number) => {
      const times: number[] = [];
      let design = designSchedule(problem(half));
      for (let i = 0; i < 60; i++) {
        const t0 = performance.now();
        design = designSchedule(problem(half));
        times.push(performance.now() - t0);
      }
      times.sort((a, b) => a - b);
      return { design, median: times[30]! };
    };
    const { design, median } = timed(3);
    const six = designSchedule(problem(6));
    const thirteen = timed(13);
    const ratio = (d: typeof design) => (d.count / d.lowerBound).toFixed(3);
    const uniform = design.uniform ? (design.uniform.count / design.count).toFixed(3) : "—";
    say(`| ${c.name} | ${design.count} | ${ratio(design)} | ${(design.count / design.demandIntegral).toFixed(3)} | ${uniform} | ${median.toFixed(2)} | ${ratio(six)} / ${ratio(thirteen.design)} | ${thirteen.median.toFixed(2)} |`);
  }
  say("");
  say(
    "Target (issue): ≤ 1.08 with at most 3 zones per half span. Not reachable for a demand that falls linearly (a uniform load on a simple span): the rows of k zones follow the demand as a staircase of k steps, whose area is at least (k + 1)/k times the area under the line (equal steps are best), 1.33 for k = 3, and 1.08 would need k ≥ 13. The s_max floor, where the demand is below 1/s_max, is met exactly; that is what brings members with a long low-demand middle below 1.33. More zones do not close the rest of the gap on members of this size (36 to 104 connectors): each zone ends on a whole row and its end rows carry the demand half a spacing into the next zone, which costs about a row per zone boundary, as much as a finer staircase saves.",
  );
}

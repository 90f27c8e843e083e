// Profiling aid (not a benchmark): designs one member in a loop; prints the median wall time and the
// CPU time per design, which a shared machine disturbs less. `tsx scripts/prof-member.ts three|simple [runs]`;
// run under `node --cpu-prof` for a profile.
import { readFileSync } from "node:fs";
import { threeSpanJob } from "../bench/three-span-job.js";
import { designMember, prepareJob } from "../core/index.js";

const which = process.argv[2] ?? "three";
const input = which === "simple" ? JSON.parse(readFileSync(new URL("../fixtures/examples/workshop-box-beam.si.json", import.meta.url), "utf8")) : threeSpanJob();
const prepared = prepareJob(input);
if (!prepared.ok) throw new Error(JSON.stringify(prepared.issues));
const runs = Number(process.argv[3] ?? 300);
for (let i = 0; i < 30; i++) designMember(prepared.core);
const wall: number[] = [];
const cpu0 = process.cpuUsage();
for (let i = 0; i < runs; i++) {
  const t0 = performance.now();
  designMember(prepared.core);
  wall.push(performance.now() - t0);
}
const cpu = process.cpuUsage(cpu0);
wall.sort((a, b) => a - b);
console.log(`${which}: wall median ${wall[runs >> 1]!.toFixed(2)} ms, p10 ${wall[Math.floor(runs / 10)]!.toFixed(2)} ms; CPU ${((cpu.user + cpu.system) / 1000 / runs).toFixed(2)} ms per design`);

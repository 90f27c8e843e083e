// Speed work must not change a design: every example and the benchmark's three-span, 20-load member
// (on four combination sets) is designed and its whole result (core units) compared with a digest
// taken from the code before the optimisations. Numbers are compared to 12 significant digits, so that
// a change of summation order in the last bit does not count; anything larger does.
// GOLDEN_UPDATE=1 rewrites the digests (only for a change that is meant to change results: say why in
// the commit); GOLDEN_DUMP=dir writes each result's JSON there for a diff.
import { createHash } from "node:crypto";
import { existsSync, mkdirSync, readFileSync, writeFileSync } from "node:fs";
import { describe, expect, it } from "vitest";
import { threeSpanJob } from "../../../bench/three-span-job.js";
import { designMember, prepareJob } from "../../../core/index.js";
import { exampleJobs } from "../../example-jobs.js";

const digestsFile = new URL("./designs.golden.json", import.meta.url);

const jobs: [string, unknown][] = [
  ...exampleJobs().map(({ file, job }): [string, unknown] => [file, job]),
  ["three-span asce7-22-allowable", threeSpanJob("asce7-22-allowable")],
  ["three-span unfactored", threeSpanJob("unfactored")],
  ["three-span asce7-22-strength (factored)", threeSpanJob("asce7-22-strength", "factored")],
  ["three-span en1990-6.10 (factored)", threeSpanJob("en1990-6.10", "factored")],
];

/** Keys sorted, numbers to 12 significant digits. */
function canonical(value: unknown): string {
  if (typeof value === "number") return Number.isFinite(value) ? String(Number(value.toPrecision(12))) : String(value);
  if (value === null || typeof value !== "object") return JSON.stringify(value) ?? "null";
  if (Array.isArray(value)) return `[${value.map((v) => (v === undefined ? "null" : canonical(v))).join(",")}]`;
  const entries = Object.entries(value as Record<string, unknown>)
    .filter(([, v]) => v !== undefined)
    .sort(([a], [b]) => (a < b ? -1 : a > b ? 1 : 0));
  return `{${entries.map(([k, v]) => `${JSON.stringify(k)}:${canonical(v)}`).join(",")}}`;
}

describe("designs are unchanged (golden digests)", () => {
  const stored: Record<string, string> = existsSync(digestsFile) ? JSON.parse(readFileSync(digestsFile, "utf8")) : {};
  const computed: Record<string, string> = {};
  const dump = process.env.GOLDEN_DUMP;
  if (dump) mkdirSync(dump, { recursive: true });
  for (const [name, input] of jobs) {
    it(name, () => {
      const prepared = prepareJob(input);
      if (!prepared.ok) throw new Error(`${name}: ${JSON.stringify(prepared.issues)}`);
      const text = canonical(designMember(prepared.core));
      if (dump) writeFileSync(`${dump}/${name.replace(/[^\w.-]+/g, "_")}.json`, JSON.stringify(JSON.parse(text), null, 1));
      computed[name] = createHash("sha256").update(text).digest("hex");
      if (process.env.GOLDEN_UPDATE) {
        writeFileSync(digestsFile, JSON.stringify({ ...stored, ...computed }, null, 2) + "\n");
        return;
      }
      expect(computed[name], `${name}: the design changed (GOLDEN_DUMP=dir writes the results for a diff)`).toBe(stored[name]);
    });
  }
});

// Every output file of a batch (result JSON, schedule, positions and welds CSV, summary.csv) compared
// with stored digests, on one thread and on two, in the jobs' own units and converted: speed work on the
// batch must leave what it writes byte-identical. CLI_DIGESTS_UPDATE=1 rewrites the digests (only for a
// change meant to change the files: say why in the commit).
import { createHash } from "node:crypto";
import { existsSync, mkdirSync, readdirSync, readFileSync, writeFileSync } from "node:fs";
import { join } from "node:path";
import { afterAll, describe, expect, test } from "vitest";
import { inventMembers } from "../../bench/batch.js";
import { runBatch } from "../../server/cli/run-batch.js";
import { EXAMPLES, tempFolder } from "./store/store-fixtures.js";

const digestsFile = new URL("./cli-outputs.digests.json", import.meta.url);
const work = tempFolder("cli-outputs");
afterAll(() => work.remove());

/** Each file of the folder by name → sha256 of its bytes; summary.csv with the batch's folder replaced, since it names the job files by path. */
function digests(out: string, inputs: string[]): Record<string, string> {
  const found: Record<string, string> = {};
  for (const name of readdirSync(out).sort()) {
    let bytes = readFileSync(join(out, name));
    if (name === "summary.csv") bytes = Buffer.from(inputs.reduce((text, dir) => text.replaceAll(dir, "<in>"), bytes.toString("utf8")));
    found[name] = createHash("sha256").update(bytes).digest("hex");
  }
  return found;
}

describe("batch outputs are unchanged (stored digests)", () => {
  const stored: Record<string, Record<string, string>> = existsSync(digestsFile) ? JSON.parse(readFileSync(digestsFile, "utf8")) : {};
  const invented = join(work.dir, "invented");
  mkdirSync(invented);
  inventMembers(invented, 45, 20);
  const runs = [
    { name: "examples, own units, one thread", inputs: [EXAMPLES], units: undefined, threads: 1 },
    { name: "examples, in SI, two threads", inputs: [EXAMPLES], units: "si" as const, threads: 2 },
    { name: "examples, in US units, one thread", inputs: [EXAMPLES], units: "us" as const, threads: 1 },
    { name: "invented members, two threads", inputs: [invented], units: undefined, threads: 2 },
  ];
  const computed: Record<string, Record<string, string>> = {};
  for (const run of runs) {
    test(run.name, { timeout: 120_000 }, async () => {
      const out = join(work.dir, run.name.replace(/\W+/g, "-"));
      const report = await runBatch({ mode: "design", inputs: run.inputs, out, units: run.units, pdf: false, threads: run.threads, printDate: "2025-03-14" });
      expect(report.threads).toBe(run.threads);
      computed[run.name] = digests(out, run.inputs);
      if (process.env.CLI_DIGESTS_UPDATE) {
        writeFileSync(digestsFile, JSON.stringify({ ...stored, ...computed }, null, 2) + "\n");
        return;
      }
      expect(computed[run.name]).toEqual(stored[run.name]);
    });
  }
});

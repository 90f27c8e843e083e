// The JIT profiles (server/jit-tuning.ts) change when V8 optimises, never what is computed: every
// example's answer, in both unit systems, is the same byte for byte under each profile as under V8's own
// settings, in a process of its own (V8 flags are per process).
import { spawnSync } from "node:child_process";
import { createRequire } from "node:module";
import { pathToFileURL } from "node:url";
import { describe, expect, test } from "vitest";
import { batchProfile, compileInThread, INTERRUPT_BUDGET, tuneJit } from "../../server/jit-tuning.js";
import { examplesDigest } from "./jit-tuning-digest.js";

const tsx = pathToFileURL(createRequire(import.meta.url).resolve("tsx")).href;
const child = new URL("./jit-tuning-child.ts", import.meta.url).pathname;

describe("JIT profiles", () => {
  test("a batch with worksheets repeats, one without varies", () => {
    expect(batchProfile(true)).toBe("repeating");
    expect(batchProfile(false)).toBe("varied");
  });

  test("left to V8 on another Node release, or when node was given a budget itself", () => {
    expect(tuneJit("repeating", "22.11.0", [])).toBeUndefined();
    expect(tuneJit("varied", "20.19.0", ["--interrupt-budget=1000"])).toBeUndefined();
    expect(compileInThread("22.11.0", [])).toBe(false);
    expect(compileInThread("20.19.0", ["--concurrent-recompilation"])).toBe(false);
    expect(compileInThread("20.19.0", ["--no-concurrent_recompilation"])).toBe(false);
  });

  test.runIf(process.versions.node.startsWith("20."))("each profile is taken by this V8 (no warning) and leaves every answer as it was, a batch worker's in-thread optimising too", { timeout: 120_000 }, () => {
    const expected = examplesDigest(1);
    for (const [profile, where] of [["repeating", ""], ["varied", ""], ["varied", "in-thread"]] as const) {
      const run = spawnSync(process.execPath, ["--import", tsx, child, profile, where], { encoding: "utf8" });
      expect(run.stderr).toBe("");
      const { budget, digest } = JSON.parse(run.stdout) as { budget: number | null; digest: string };
      expect(budget).toBe(INTERRUPT_BUDGET[profile]);
      expect(digest).toBe(expected);
    }
  });

  test.runIf(process.versions.node.startsWith("20."))("an unknown flag would have been reported on stderr, so the check above can fail", () => {
    const run = spawnSync(process.execPath, ["-e", 'require("node:v8").setFlagsFromString("--no-such-stitchplan-flag")'], { encoding: "utf8" });
    expect(run.stderr).toMatch(/unrecognized flag/);
  });
});

// A short run of the loopback load test (scripts/load-test.ts; `npm run load-test` runs it for 60 s).
import { describe, expect, test } from "vitest";
import { runLoadTest } from "../../scripts/load-test.js";

describe("loopback load", () => {
  // Worksheets run until two are answered (at most 30 s): on a machine busy with the other test files, none may
  // finish within the designs' 5 s, and a request still running when its connections stop counts nothing.
  test("8 connections of designs for 5 s and 2 of worksheets until two are answered, every request a different job: zero errors, and the server answers afterwards", { timeout: 180_000 }, async () => {
    const report = await runLoadTest({ seconds: 5, worksheetSeconds: 30, maxWorksheets: 2 });
    expect(report.problems).toEqual([]);
    expect(report.designs.requests).toBeGreaterThan(0);
    expect(report.worksheets.requests).toBeGreaterThan(0);
    expect(report.healthAfter).toBe(200);
  });
});

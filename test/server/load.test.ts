// A short run of the loopback load test (scripts/load-test.ts; `npm run load-test` runs it for 60 s).
import { describe, expect, test } from "vitest";
import { runLoadTest } from "../../scripts/load-test.js";

describe("loopback load", () => {
  test("8 connections of designs and 2 of worksheets for 5 s, every request a different job: zero errors, and the server answers afterwards", { timeout: 180_000 }, async () => {
    const report = await runLoadTest({ seconds: 5 });
    expect(report.problems).toEqual([]);
    expect(report.designs.requests).toBeGreaterThan(0);
    expect(report.worksheets.requests).toBeGreaterThan(0);
    expect(report.healthAfter).toBe(200);
  });
});

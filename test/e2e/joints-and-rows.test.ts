import { readFileSync, rmSync, writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import type { Page } from "playwright-core";
import { afterAll, beforeAll, describe, expect, test } from "vitest";
import { platedCoreJob } from "../job-builders.js";
import { startHarness, toolbarMessage, untilText, upToDate, type Harness } from "./page-harness.js";

// Issue 16 §1 and §2 through the page: every contact line fastened, and a row that does not fit shown as failing.

let h: Harness;
let page: Page;
const jobFile = join(tmpdir(), `stitchplan-e2e-joints-${process.pid}.json`);

beforeAll(async () => {
  h = await startHarness();
  page = h.page;
});

afterAll(async () => {
  rmSync(jobFile, { force: true });
  await h?.close();
});

async function open(job: unknown): Promise<void> {
  writeFileSync(jobFile, JSON.stringify(job));
  await page.goto(h.base);
  await upToDate(page);
  await page.locator("#job-file").setInputFiles(jobFile);
  await untilText(page, toolbarMessage(page), (t) => t.includes("Opened"), "the job file was not opened");
  await upToDate(page);
}

describe("joints and rows on the page (issue 16)", () => {
  test("a core with plates on its upper sides under a cap: the plates' lines to the core get a schedule of their own", async () => {
    await open(platedCoreJob());
    for (const joint of ["cap", "left+right+cap"]) await expect(page.locator(`[aria-label="Schedule for joint ${joint}"]`).count()).resolves.toBe(1);
    expect(h.errors).toEqual([]);
  });

  test("three 16d nails per row across a 1-1/2 in web edge: the joints fail in red with the width needed and the width there is", async () => {
    const job = JSON.parse(readFileSync(new URL("../../fixtures/examples/porch-beam-16d-nds.us.json", import.meta.url), "utf8"));
    job.fastening.default.rows = 3;
    await open(job);
    const failures = page.locator("#status .failures");
    await untilText(page, failures, (t) => t.includes("a row does not fit across the contact"), "the failure was not listed");
    // 2 × 2.5D + 2 × 5D, D = 0.162 in (REFERENCES §5.4 [V]; the code's nail spacings [CP]) = 2.43 in [D].
    await expect(failures.textContent()).resolves.toMatch(/need 2\.43 in across the contact between "web" and "top" .* only 1\.5 in wide/);
    const block = page.locator('[aria-label="Schedule for joint top"]');
    await expect(block.getAttribute("class")).resolves.toContain("fails");
    await expect(block.locator(".detailing").textContent()).resolves.toContain("the row cannot be built");
    await expect(block.locator(".detailing").evaluate((e) => getComputedStyle(e).color)).resolves.toBe("rgb(179, 38, 30)");
    expect(h.errors).toEqual([]);
  });
});

import { rmSync, writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import type { Page } from "playwright-core";
import { afterAll, beforeAll, describe, expect, test } from "vitest";
import type { JobInput } from "../../core/schema/job.js";
import { plankIJob } from "../job-builders.js";
import { startHarness, toolbarMessage, untilText, upToDate, type Harness } from "./page-harness.js";

let h: Harness;
let page: Page;
const jobFile = join(tmpdir(), `stitchplan-e2e-weak-nails-${process.pid}.json`);

beforeAll(async () => {
  h = await startHarness();
  page = h.page;
});

afterAll(async () => {
  rmSync(jobFile, { force: true });
  await h?.close();
});

describe("rows a builder can set out, and remedies that work (through the page)", () => {
  test("every example, as the page's API answers it: no two rows closer than the joint's minimum spacing", async () => {
    const examples = (await (await fetch(`${h.base}/api/examples`)).json()) as { id: string }[];
    for (const { id } of examples) {
      const job = await (await fetch(`${h.base}/api/examples/${id}`)).json();
      const res = await fetch(`${h.base}/api/designs`, { method: "POST", headers: { "content-type": "application/json" }, body: JSON.stringify(job) });
      expect(res.status, id).toBe(200);
      const result = (await res.json()) as { unitLabels: { span: string }; schedules: { joint: string; positions: number[]; limits: { minSpacing: number } }[] };
      // Positions are in the span unit and the minimum in the length unit (m and mm, or ft and in).
      const perSpan = result.unitLabels.span === "ft" ? 12 : 1000;
      expect(result.unitLabels.span).toMatch(/^(m|ft)$/);
      for (const s of result.schedules) {
        const gaps = s.positions.slice(1).map((x, k) => (x - s.positions[k]!) * perSpan);
        for (const g of gaps) expect(g, `${id} joint ${s.joint}`).toBeGreaterThanOrEqual(s.limits.minSpacing * (1 - 1e-6));
      }
    }
  });

  test("the opening example says beside its end zones that the end row governs them", async () => {
    await page.goto(`${h.base}/`);
    await upToDate(page);
    const notes = page.locator(".schedule-block .zone-notes li");
    await notes.first().waitFor();
    expect(await notes.first().textContent()).toMatch(/^Zone 1: End row governs: the row at the end distance/);
  });

  test("a member with too-weak nails offers more per row with the utilisation reached, and applying it in the form passes", async () => {
    const job: JobInput = plankIJob();
    job.connectors = [{ id: "N", kind: "rated", label: "nail rated 100 N (invented)", resistance: 100, minSpacing: 40, maxSpacing: 600, endDistance: 30 }];
    writeFileSync(jobFile, JSON.stringify(job));
    await page.locator("#job-file").setInputFiles(jobFile);
    await untilText(page, toolbarMessage(page), (t) => t.includes("Opened"), "the job file was not opened");
    await upToDate(page);
    const options = await page.locator(".status-banner .infeasible li").allTextContents();
    const perRow = options.map((o) => /^(\d+) connectors per row \(now 1\): designed again, the schedule passes with utilisation (\d\.\d+)/.exec(o)).find(Boolean);
    expect(perRow, options.join("\n")).toBeTruthy();
    expect(Number(perRow![2])).toBeLessThanOrEqual(1);
    const rows = page.getByLabel(/^Side by side in a row/).first();
    await rows.fill(perRow![1]!);
    await rows.press("Tab");
    await upToDate(page);
    await untilText(page, page.locator(".status-banner h2"), (t) => t.includes("Passes every check made"), "the remedy applied in the form did not pass");
    expect(h.errors).toEqual([]);
  });
});

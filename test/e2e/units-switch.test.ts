// Through the page: every example switched to the other unit system and back designs to the same
// verdict, zones and connector counts (the job keeps its spacing practice; numbers come back as entered).
import type { Page } from "playwright-core";
import { afterAll, beforeAll, describe, expect, test } from "vitest";
import { startHarness, upToDate, type Harness } from "./page-harness.js";

let h: Harness;
let page: Page;
let examples: { id: string; title: string; units: string }[] = [];

beforeAll(async () => {
  h = await startHarness();
  page = h.page;
  examples = (await (await fetch(`${h.base}/api/examples`)).json()) as typeof examples;
});

afterAll(async () => {
  await h?.close();
});

type Shown = { status: { passes: boolean }; schedules: { joint: string; count: number; zones: unknown[] }[]; welds: { joint: string; passes: boolean }[] };
const summary = (r: Shown) => ({ passes: r.status.passes, schedules: r.schedules.map((s) => [s.joint, s.count, s.zones.length]), welds: r.welds.map((w) => [w.joint, w.passes]) });

const nextDesign = () => page.waitForResponse((r) => r.url().endsWith("/api/designs") && r.request().method() === "POST" && r.ok(), { timeout: 20_000 });

async function switchTo(label: "SI" | "US"): Promise<Shown> {
  const designed = nextDesign();
  await page.locator(".units-option", { hasText: new RegExp(`^${label}$`) }).click();
  await page.locator(".toolbar-message", { hasText: "The whole job is now in" }).waitFor();
  const result = (await (await designed).json()) as Shown;
  await upToDate(page);
  return result;
}

describe("units switch", () => {
  test("every example, switched to the other system and back, keeps its verdict, zones and connector counts", async () => {
    for (const example of examples) {
      const designed = nextDesign();
      await page.goto(`${h.base}/?example=${example.id}`);
      const before = summary((await (await designed).json()) as Shown);
      await upToDate(page);
      const there = summary(await switchTo(example.units === "us" ? "SI" : "US"));
      expect(there, `${example.id} converted`).toEqual(before);
      const back = summary(await switchTo(example.units === "us" ? "US" : "SI"));
      expect(back, `${example.id} back`).toEqual(before);
    }
    expect(h.errors).toEqual([]);
  });
});

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

describe("every example", () => {
  test("opens from the examples menu and computes without a problem", async () => {
    expect(examples.length).toBeGreaterThanOrEqual(7);
    await page.goto(`${h.base}/?example=${examples[0]!.id}`);
    await upToDate(page);
    for (const example of examples) {
      await page.locator("details.examples-menu > summary").click();
      await page.locator("details.examples-menu[open] .menu-item", { hasText: example.title }).click();
      await page.locator(".toolbar-message", { hasText: `Opened the example “${example.title}”` }).waitFor();
      await upToDate(page);
      await page.locator(".status-banner").waitFor();
      expect(await page.getByRole("alert").count(), `${example.id}: a problem is reported`).toBe(0);
      expect(await page.locator(".field-issue").count(), `${example.id}: a field shows a problem`).toBe(0);
      const units = await page.locator(".units-value").textContent();
      expect(units, example.id).toContain(example.units === "us" ? "US customary" : "SI");
      // Something was fastened and drawn: a schedule, a weld or a bond line, and the section.
      expect(await page.locator(".schedule-block, .bond-lines").count(), example.id).toBeGreaterThan(0);
      expect(await page.locator("#section svg").count(), example.id).toBeGreaterThan(0);
    }
    expect(h.errors).toEqual([]);
  });
});

describe("a column example", () => {
  test("shows the built-up column's table: each axis's K_e, l_e/d, K_f and C_P, and the interaction", async () => {
    await page.goto(`${h.base}/?example=stud-pack-wind.us`);
    await upToDate(page);
    const axes = page.locator("table.column-axes");
    await axes.waitFor();
    expect(await axes.locator("tbody tr").count()).toBe(2);
    expect(await axes.textContent()).toContain("across the joints");
    expect(await page.locator("table.column-combinations tbody tr").count()).toBeGreaterThan(0);
    expect(h.errors).toEqual([]);
  });
});

import { join } from "node:path";
import type { Page } from "playwright-core";
import { afterAll, beforeAll, describe, expect, test } from "vitest";
import { shots, startHarness, upToDate, type Harness } from "./page-harness.js";

let h: Harness;
let page: Page;

beforeAll(async () => {
  h = await startHarness({ width: 390, height: 844 });
  page = h.page;
});

afterAll(async () => {
  await h?.close();
});

const scrollWidth = () => page.evaluate(() => document.scrollingElement!.scrollWidth);

describe("a phone-sized screen (390 px)", () => {
  test("the opening example with its results never scrolls sideways", async () => {
    await page.goto(h.base);
    await page.locator(".status-banner").waitFor();
    await upToDate(page);
    await page.getByRole("table", { name: /^Schedule, joint/ }).first().waitFor();
    expect(await scrollWidth()).toBeLessThanOrEqual(390);
    // The results' section links stay in view while the results scroll by.
    await page.getByRole("table", { name: /^Schedule, joint/ }).first().scrollIntoViewIfNeeded();
    const nav = await page.getByRole("navigation", { name: "Results sections" }).boundingBox();
    expect(nav!.y).toBeGreaterThanOrEqual(0);
    expect(nav!.y + nav!.height).toBeLessThanOrEqual(844);
    await page.screenshot({ path: join(shots, "results-390.png") });
  });

  test("nor with a menu open or the build-up dialog shown", async () => {
    await page.locator("details.menu > summary", { hasText: "Examples" }).click();
    expect(await scrollWidth()).toBeLessThanOrEqual(390);
    await page.locator("details.menu > summary", { hasText: "File" }).click();
    await page.locator("details.menu[open] .menu-item", { hasText: "New member from a typical build-up" }).click();
    const dialog = page.getByRole("dialog", { name: "New member from a typical build-up" });
    await dialog.waitFor();
    expect(await scrollWidth()).toBeLessThanOrEqual(390);
    const box = await dialog.boundingBox();
    expect(box!.x).toBeGreaterThanOrEqual(0);
    expect(box!.x + box!.width).toBeLessThanOrEqual(390);
    await page.screenshot({ path: join(shots, "build-up-dialog-390.png") });
    await dialog.getByRole("button", { name: "Cancel" }).click();
    expect(h.errors).toEqual([]);
  });
});

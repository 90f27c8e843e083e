import { readFileSync } from "node:fs";
import { join } from "node:path";
import type { Page } from "playwright-core";
import { afterAll, beforeAll, describe, expect, test } from "vitest";
import { fieldMessage, fromMenu, resultsState, shots, startHarness, untilText, type Harness } from "./page-harness.js";

/** Designs of a column on a shared, busy machine: wait longer than the harness's ten seconds. */
const SLOW = 60_000;
const upToDate = (page: Page) => untilText(page, resultsState(page), (t) => t.includes("Up to date"), "results never came up to date", SLOW);

let h: Harness;
let page: Page;

beforeAll(async () => {
  h = await startHarness();
  page = h.page;
});

afterAll(async () => {
  await h?.close();
});

const columnSwitch = () => page.getByLabel("This member is a column (axial compression)");
const columnStep = () => page.locator("section.step", { has: page.locator("h2", { hasText: "Column (axial compression)" }) });
const checks = () => page.locator("#checks");
const byCombination = () => page.getByRole("table", { name: "Axial load by combination" });
const axes = () => page.getByRole("table", { name: /^Built-up column/ });

/** The column step at a desk's width and a phone's; at the phone's, nothing scrolls sideways. */
async function screenshots(name: string): Promise<void> {
  for (const width of [1280, 390]) {
    await page.setViewportSize({ width, height: 900 });
    await page.waitForTimeout(350);
    await columnStep().scrollIntoViewIfNeeded();
    await columnStep().screenshot({ path: join(shots, `column-form-${name}-${width}.png`) });
    if (width === 390) await expect(page.evaluate(() => document.documentElement.scrollWidth <= window.innerWidth)).resolves.toBe(true);
  }
  await page.setViewportSize({ width: 1280, height: 900 });
  await page.waitForTimeout(350);
}

describe("a beam turned into a column in the form", () => {
  test("the switch adds a column with one dead axial load; its P and the timber's compression strength bring the column's tables", async () => {
    await page.goto(`${h.base}/?example=three-ply-header.us`);
    await upToDate(page);
    await expect(columnSwitch().isChecked()).resolves.toBe(false);
    await expect(checks().textContent()).resolves.not.toContain("Built-up column");
    await columnSwitch().check();
    const P = page.getByLabel("Axial load 1 P (lbf)");
    await expect(P.evaluate((input) => input === document.activeElement)).resolves.toBe(true);
    await expect(page.getByLabel("Axial load 1 category").inputValue()).resolves.toBe("dead");
    await P.fill("3000");
    await upToDate(page);
    // The plies have no compression strength yet: the results say the column is not designed, and why.
    await untilText(page, checks(), (t) => t.includes("Not designed as a column") && t.includes("compression strength"), "no word on the column", SLOW);
    await page.locator("summary", { hasText: "More properties for connectors" }).first().click();
    await page.getByLabel("Material 1 Compression ∥ grain (psi)").fill("1350");
    await upToDate(page);
    await untilText(page, axes(), (t) => t.includes("x axis") && t.includes("y axis"), "no buckling table", SLOW);
    await expect(byCombination().textContent()).resolves.toContain("D");
    await axes().screenshot({ path: join(shots, "column-form-three-ply-axes-1280.png") });
    await byCombination().screenshot({ path: join(shots, "column-form-three-ply-combinations-1280.png") });
    await screenshots("three-ply");
    expect(h.errors).toEqual([]);
  }, 4 * SLOW);

  test("a brace point beyond the top is reported at its field in the form's words", async () => {
    const braced = page.getByLabel("Buckling about y brace points (ft)");
    await braced.fill("9");
    await untilText(page, page.getByRole("alert"), (t) => t.includes("problem"), "no notice for a brace point above the column", SLOW);
    await expect(braced.getAttribute("aria-invalid")).resolves.toBe("true");
    expect(await fieldMessage(braced)).toContain("at or beyond the top of the column");
    await braced.fill("4");
    await upToDate(page);
    await expect(braced.getAttribute("aria-invalid")).resolves.toBeNull();
  }, 4 * SLOW);
});

describe("fields shown where the column's rule can use them", () => {
  const serviceClass = () => page.getByLabel("Column Service class (EN 1995)", { exact: true });
  const spacedSwitch = () => page.getByLabel("The shafts are held apart by packs or gussets (a spaced column)");

  test("a spaced timber column (EN 1995-1-1 Annex C.3) shows its packing, packs and service class", async () => {
    await page.goto(`${h.base}/?example=gallery-spaced-post.si`);
    await upToDate(page);
    await expect(page.getByLabel("Packing: pack").isChecked()).resolves.toBe(true);
    await expect(page.getByLabel("Packing: shaft-1").isChecked()).resolves.toBe(false);
    await expect(spacedSwitch().isChecked()).resolves.toBe(true);
    await expect(page.getByLabel("Spaced column Pack spacing l_1 (m)").inputValue()).resolves.toBe("0.6");
    await expect(page.getByLabel("Spaced column Pack length l_2 (mm)").inputValue()).resolves.toBe("360");
    await expect(serviceClass().inputValue()).resolves.toBe("1");
    await expect(page.getByLabel("Built-up column rule").inputValue()).resolves.toBe("en1995-c3-spaced");
    await screenshots("spaced-post");
  }, 4 * SLOW);

  test("double angles with a packing plate (AISC §E6) show the packing only; a nailed post shows neither", async () => {
    await page.goto(`${h.base}/?example=double-angle-strut.us`);
    await upToDate(page);
    await expect(page.getByLabel("Packing: packing").isChecked()).resolves.toBe(true);
    await expect(serviceClass().count()).resolves.toBe(0);
    await expect(spacedSwitch().count()).resolves.toBe(0);
    await page.goto(`${h.base}/?example=girder-truss-post.us`);
    await upToDate(page);
    await expect(columnSwitch().isChecked()).resolves.toBe(true);
    await expect(page.getByLabel(/^Packing: /).count()).resolves.toBe(0);
    await expect(serviceClass().count()).resolves.toBe(0);
    await expect(spacedSwitch().count()).resolves.toBe(0);
    expect(h.errors).toEqual([]);
  }, 4 * SLOW);
});

describe("the girder-truss post", () => {
  test("a larger P changes the column's results", async () => {
    await page.goto(`${h.base}/?example=girder-truss-post.us`);
    await upToDate(page);
    await expect(columnSwitch().isChecked()).resolves.toBe(true);
    const P = page.getByLabel("Axial load 1 P (lbf)");
    await expect(P.inputValue()).resolves.toBe("2400");
    const before = (await byCombination().textContent()) ?? "";
    await P.fill("4800");
    await untilText(page, byCombination(), (t) => t !== before, "the column's combinations did not follow P", SLOW);
    await upToDate(page);
    await screenshots("girder-truss-post");
  }, 4 * SLOW);

  test("switched off, the compression is gone from the job and from the results", async () => {
    await columnSwitch().uncheck();
    await upToDate(page);
    await expect(byCombination().count()).resolves.toBe(0);
    await expect(page.getByLabel("Axial load 1 P (lbf)").count()).resolves.toBe(0);
    const [download] = await Promise.all([page.waitForEvent("download"), fromMenu(page, "File", "Save job file")]);
    const saved = JSON.parse(readFileSync((await download.path())!, "utf8"));
    expect(saved.compression).toBeUndefined();
    expect(h.errors).toEqual([]);
  }, 4 * SLOW);
});

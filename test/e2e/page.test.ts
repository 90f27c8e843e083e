import { mkdirSync, readFileSync } from "node:fs";
import type { AddressInfo } from "node:net";
import { join } from "node:path";
import type { FastifyInstance } from "fastify";
import { chromium, type Browser, type Locator, type Page } from "playwright-core";
import { afterAll, beforeAll, describe, expect, test } from "vitest";
import { buildApp, projectRoot } from "../../server/app.js";

const shots = join(projectRoot, "test-output");
const EXAMPLE = "workshop-box-beam.si";

let app: FastifyInstance;
let browser: Browser;
let page: Page;
let base: string;

beforeAll(async () => {
  mkdirSync(shots, { recursive: true });
  app = await buildApp();
  await app.listen({ port: 0, host: "127.0.0.1" });
  base = `http://127.0.0.1:${(app.server.address() as AddressInfo).port}`;
  browser = await chromium.launch({
    executablePath: "/usr/bin/chromium",
    args: ["--headless", "--no-sandbox", "--disable-gpu", "--disable-quic", "--no-first-run", "--disable-background-networking", "--disable-component-update", "--disable-sync"],
  });
  const context = await browser.newContext({ viewport: { width: 1280, height: 900 }, acceptDownloads: true });
  page = await context.newPage();
});

afterAll(async () => {
  await browser?.close();
  await app?.close();
});

/** Waits until the locator's text passes the check; fails with the last text seen. */
async function untilText(locator: Locator, check: (text: string) => boolean, what: string): Promise<string> {
  let last = "";
  for (const deadline = Date.now() + 10_000; Date.now() < deadline; await page.waitForTimeout(100)) {
    last = (await locator.count()) > 0 ? ((await locator.first().textContent()) ?? "") : "";
    if (check(last)) return last;
  }
  throw new Error(`${what}; last text seen: ${JSON.stringify(last.slice(0, 300))}`);
}

const scheduleTable = () => page.getByRole("table", { name: "Schedule, joint bottom" });
const resultsState = () => page.getByRole("status").filter({ hasText: /Up to date|Updating|problems|not answering/ });
const upToDate = () => untilText(resultsState(), (t) => t.includes("Up to date"), "results never came up to date");

/** The message shown for a field: the text of the elements its aria-describedby names. */
const fieldMessage = (field: Locator) =>
  field.evaluate((input) =>
    (input.getAttribute("aria-describedby") ?? "")
      .split(" ")
      .map((id) => document.getElementById(id)?.textContent ?? "")
      .join(" "),
  );

describe("the job page", () => {
  test("opens with the example entered and computed, and says who must review it", async () => {
    await page.goto(`${base}/?example=${EXAMPLE}`);
    await scheduleTable().waitFor();
    expect(await scheduleTable().locator("tbody tr").count()).toBeGreaterThan(0);
    await expect(page.getByRole("note").textContent()).resolves.toContain("For review by a licensed engineer");
    await expect(page.getByRole("note").textContent()).resolves.toContain("engineer of record govern");
    await expect(page.getByRole("heading", { name: "Standards and sources used" }).isVisible()).resolves.toBe(true);
    await expect(page.getByLabel("Span (m)").inputValue()).resolves.toBe("4.8");
    await upToDate();
    await page.screenshot({ path: join(shots, "page-1280.png"), fullPage: false });
  });

  test("a longer span changes the schedule", async () => {
    const before = (await scheduleTable().textContent()) ?? "";
    await page.getByLabel("Span (m)").fill("6");
    await untilText(scheduleTable(), (t) => t !== before, "the schedule did not change with the span");
    await upToDate();
    expect(await scheduleTable().textContent()).toContain("6");
  });

  test("a negative depth is reported at its cell, keeps the old results marked out of date, and clears when fixed", async () => {
    const depth = page.getByLabel("Part 2 h (mm)");
    await depth.fill("-70");
    await untilText(page.getByRole("alert"), (t) => t.includes("results below are from the last valid input"), "no out-of-date notice");
    await expect(depth.getAttribute("aria-invalid")).resolves.toBe("true");
    expect(await fieldMessage(depth)).toContain("must be greater than 0");
    expect(await depth.inputValue()).toBe("-70");
    expect(await scheduleTable().isVisible()).toBe(true);
    await expect(page.locator(".results-body.stale").count()).resolves.toBe(1);
    await page.screenshot({ path: join(shots, "page-1280-bad-input.png") });

    await page.getByRole("button", { name: /Part 2 · h: must be greater than 0/ }).click();
    await expect(depth.evaluate((input) => input === document.activeElement)).resolves.toBe(true);

    await depth.fill("70");
    await upToDate();
    await expect(depth.getAttribute("aria-invalid")).resolves.toBeNull();
    await expect(page.getByRole("alert").count()).resolves.toBe(0);
  });

  test("text that is not a number is kept and explained at the field", async () => {
    const span = page.getByLabel("Span (m)");
    await span.fill("6 m");
    await untilText(page.getByRole("alert"), (t) => t.includes("problem"), "no notice for a span that is not a number");
    expect(await fieldMessage(span)).toContain("is not a number");
    expect(await span.inputValue()).toBe("6 m");
    await span.fill("6");
    await upToDate();
  });

  test("a reload keeps the job being edited", async () => {
    await page.goto(`${base}/`);
    await scheduleTable().waitFor();
    await expect(page.getByLabel("Span (m)").inputValue()).resolves.toBe("6");
  });

  test("the worksheet downloads as a PDF", async () => {
    const [download] = await Promise.all([page.waitForEvent("download"), page.getByRole("button", { name: "Download worksheet (PDF)" }).click()]);
    expect(download.suggestedFilename()).toMatch(/\.pdf$/);
    const bytes = readFileSync((await download.path())!);
    expect(bytes.subarray(0, 4).toString("latin1")).toBe("%PDF");
  });

  test("on a tablet the results stack under the form", async () => {
    await page.setViewportSize({ width: 800, height: 1000 });
    await page.waitForTimeout(300);
    const form = await page.locator("#job-form").boundingBox();
    const results = await page.locator("#results").boundingBox();
    expect(results!.y).toBeGreaterThan(form!.y + form!.height - 1);
    await page.screenshot({ path: join(shots, "page-800.png") });
  });
});

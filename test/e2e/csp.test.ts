// The page under the service's real security headers: no content-security-policy violation while it
// opens, computes the example and downloads the worksheet; and names people type are shown as text.
import type { AddressInfo } from "node:net";
import type { FastifyInstance } from "fastify";
import { chromium, type Browser, type BrowserContext, type Page } from "playwright-core";
import { afterAll, beforeAll, describe, expect, test } from "vitest";
import { buildApp } from "../../server/app.js";
import { example } from "../server/store/store-fixtures.js";

let app: FastifyInstance;
let browser: Browser;
let context: BrowserContext;
let page: Page;
let base: string;
const violations: string[] = [];

beforeAll(async () => {
  app = await buildApp();
  await app.listen({ port: 0, host: "127.0.0.1" });
  base = `http://127.0.0.1:${(app.server.address() as AddressInfo).port}`;
  browser = await chromium.launch({
    executablePath: "/usr/bin/chromium",
    args: ["--headless", "--no-sandbox", "--disable-gpu", "--disable-quic", "--no-first-run", "--disable-background-networking", "--disable-component-update", "--disable-sync"],
  });
  context = await browser.newContext({ viewport: { width: 1280, height: 900 }, acceptDownloads: true });
  // Every violation the browser reports, from the first script on.
  await context.addInitScript(() => {
    document.addEventListener("securitypolicyviolation", (event) => {
      const w = window as unknown as { __violations?: string[] };
      (w.__violations ??= []).push(`${event.violatedDirective} ${event.blockedURI} ${event.sourceFile}:${event.lineNumber}`);
    });
  });
  page = await context.newPage();
  page.on("console", (message) => {
    if (/content security policy/i.test(message.text())) violations.push(message.text());
  });
});

afterAll(async () => {
  await browser?.close();
  await app?.close();
});

const pageViolations = async () => [...violations, ...((await page.evaluate(() => (window as unknown as { __violations?: string[] }).__violations ?? [])) as string[])];

async function untilUpToDate(): Promise<void> {
  const status = page.getByRole("status").filter({ hasText: /Up to date|Updating|problems|not answering/ });
  for (const deadline = Date.now() + 15_000; Date.now() < deadline; await page.waitForTimeout(100)) {
    if ((await status.count()) > 0 && ((await status.first().textContent()) ?? "").includes("Up to date")) return;
  }
  throw new Error("results never came up to date");
}

/** The worksheet command: a button of its own, or an item of the Export menu. */
async function clickWorksheet(): Promise<void> {
  const button = page.getByRole("button", { name: "Download worksheet (PDF)" });
  if ((await button.count()) > 0) return button.click();
  await page.locator("summary", { hasText: "Export" }).click();
  await page.getByRole("button", { name: /^Worksheet \(PDF\)/ }).click();
}

describe("the page under the real headers", () => {
  test("the response carries the strict policy", async () => {
    const res = await page.goto(`${base}/?example=workshop-box-beam.si`);
    expect(res?.headers()["content-security-policy"]).toContain("script-src 'self'");
  });

  test("opens, computes the example and downloads the worksheet without any policy violation", { timeout: 60_000 }, async () => {
    await page.getByRole("table", { name: "Schedule, joint bottom" }).waitFor();
    await untilUpToDate();
    expect(await page.getByRole("table", { name: "Schedule, joint bottom" }).locator("tbody tr").count()).toBeGreaterThan(0);
    // The diagrams are inline SVG built by the page: they too must pass the policy.
    expect(await page.locator("svg").count()).toBeGreaterThan(0);
    const [download] = await Promise.all([page.waitForEvent("download"), clickWorksheet()]);
    expect(download.suggestedFilename()).toMatch(/\.pdf$/);
    expect(await pageViolations()).toEqual([]);
  });

  test("project names and member marks with markup are shown as text, never run", { timeout: 60_000 }, async () => {
    const job = example("workshop-box-beam.si");
    job.project.name = `<img src=x onerror="window.__xss=1"> O'Brien & "Sons" — Δοκός`;
    job.member.mark = `<script>window.__xss=2</script>`;
    await page.evaluate((text) => localStorage.setItem("stitchplan.job", text), JSON.stringify(job));
    await page.goto(`${base}/`);
    await page.getByRole("table", { name: "Schedule, joint bottom" }).waitFor();
    await untilUpToDate();
    const identity = (await page.locator("#job-identity").textContent()) ?? "";
    expect(identity).toContain("<script>window.__xss=2</script>");
    expect(await page.getByLabel("Project name").inputValue()).toBe(job.project.name);
    expect(await page.evaluate(() => (window as unknown as { __xss?: number }).__xss)).toBeUndefined();
    expect(await page.locator('img[src="x"]').count()).toBe(0);
    expect(await page.locator("script:not([src])").count()).toBe(0);
    expect(await pageViolations()).toEqual([]);
  });

  test("the watch works: an image from another origin, added last, is reported", async () => {
    await page.evaluate(() => {
      const img = document.createElement("img");
      img.src = "http://example.invalid/probe.png";
      document.body.append(img);
    });
    await page.waitForTimeout(300);
    expect((await pageViolations()).join(" ")).toMatch(/img-src/);
  });
});

import { mkdirSync, mkdtempSync, rmSync } from "node:fs";
import type { AddressInfo } from "node:net";
import { tmpdir } from "node:os";
import { join } from "node:path";
import type { FastifyInstance } from "fastify";
import { chromium, type Browser, type BrowserContext, type Locator, type Page } from "playwright-core";
import { buildApp, projectRoot } from "../../server/app.js";

export const shots = join(projectRoot, "test-output");

export interface Harness {
  app: FastifyInstance;
  browser: Browser;
  context: BrowserContext;
  page: Page;
  base: string;
  /** Page errors seen so far (uncaught exceptions in the page's script). */
  errors: string[];
  close: () => Promise<void>;
}

/** The app on a free port (with a job store in a fresh folder when asked) and Debian's Chromium, headless. */
export async function startHarness(options: { store?: boolean; width?: number; height?: number } = {}): Promise<Harness> {
  mkdirSync(shots, { recursive: true });
  const dataDir = options.store ? mkdtempSync(join(tmpdir(), "stitchplan-e2e-")) : undefined;
  const app = await buildApp(dataDir ? { dataDir } : {});
  await app.listen({ port: 0, host: "127.0.0.1" });
  const base = `http://127.0.0.1:${(app.server.address() as AddressInfo).port}`;
  const browser = await chromium.launch({
    executablePath: "/usr/bin/chromium",
    args: ["--headless", "--no-sandbox", "--disable-gpu", "--disable-quic", "--no-first-run", "--disable-background-networking", "--disable-component-update", "--disable-sync"],
  });
  const context = await browser.newContext({ viewport: { width: options.width ?? 1280, height: options.height ?? 900 }, acceptDownloads: true });
  const page = await context.newPage();
  const errors: string[] = [];
  page.on("pageerror", (error) => errors.push(error.message));
  // The server sends a strict Content Security Policy: anything the page does against it is an error.
  page.on("console", (message) => {
    if (message.type() === "error" && message.text().includes("Content Security Policy")) errors.push(message.text());
  });
  return {
    app,
    browser,
    context,
    page,
    base,
    errors,
    close: async () => {
      await browser.close();
      await app.close();
      if (dataDir) rmSync(dataDir, { recursive: true, force: true });
    },
  };
}

/** Waits until the locator's text passes the check; fails with the last text seen. */
export async function untilText(page: Page, locator: Locator, check: (text: string) => boolean, what: string, timeoutMs = 10_000): Promise<string> {
  let last = "";
  for (const deadline = Date.now() + timeoutMs; Date.now() < deadline; await page.waitForTimeout(100)) {
    last = (await locator.count()) > 0 ? ((await locator.first().textContent()) ?? "") : "";
    if (check(last)) return last;
  }
  throw new Error(`${what}; last text seen: ${JSON.stringify(last.slice(0, 400))}`);
}

export const resultsState = (page: Page) => page.locator(".results-state");
export const upToDate = (page: Page) => untilText(page, resultsState(page), (t) => t.includes("Up to date"), "results never came up to date");
export const toolbarMessage = (page: Page) => page.locator(".toolbar-message");

/** The message shown for a field: the text of the elements its aria-describedby names. */
export const fieldMessage = (field: Locator) =>
  field.evaluate((input) =>
    (input.getAttribute("aria-describedby") ?? "")
      .split(" ")
      .map((id) => document.getElementById(id)?.textContent ?? "")
      .join(" "),
  );

/** Opens a toolbar menu by its name and clicks one of its items. */
export async function fromMenu(page: Page, menu: string, item: string | RegExp): Promise<void> {
  await page.locator("details.menu > summary", { hasText: menu }).click();
  await page.locator("details.menu[open] .menu-item", { hasText: item }).click();
}

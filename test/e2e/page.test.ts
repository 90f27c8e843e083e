import { join } from "node:path";
import type { Page } from "playwright-core";
import { afterAll, beforeAll, describe, expect, test } from "vitest";
import { fieldMessage, fromMenu, shots, startHarness, untilText, upToDate, type Harness } from "./page-harness.js";

const EXAMPLE = "workshop-box-beam.si";

let h: Harness;
let page: Page;

beforeAll(async () => {
  h = await startHarness();
  page = h.page;
});

afterAll(async () => {
  await h?.close();
});

const scheduleTable = () => page.getByRole("table", { name: "Schedule, joint bottom" });

describe("the job page", () => {
  test("opens with the example entered and computed, and says who must review it", async () => {
    await page.goto(`${h.base}/?example=${EXAMPLE}`);
    await scheduleTable().waitFor();
    expect(await scheduleTable().locator("tbody tr").count()).toBeGreaterThan(0);
    await expect(page.getByRole("note").textContent()).resolves.toContain("For review by a licensed engineer");
    await expect(page.getByRole("note").textContent()).resolves.toContain("engineer of record govern");
    await expect(page.getByRole("heading", { name: "Standards and sources used" }).isVisible()).resolves.toBe(true);
    await expect(page.getByLabel("Span (m)").inputValue()).resolves.toBe("4.8");
    await upToDate(page);
    await page.screenshot({ path: join(shots, "page-1280.png"), fullPage: false });
  });

  test("draws the section with the τ profile at the governing station, and V and M with their governing combination", async () => {
    const profile = page.locator("#section svg[aria-label^='Shear stress over the depth']");
    await expect(profile.count()).resolves.toBe(1);
    await expect(profile.locator("[data-role='stress-peak']").textContent()).resolves.toMatch(/MPa$/);
    await expect(page.locator("#diagrams figcaption", { hasText: "Largest |V|" }).textContent()).resolves.toMatch(/kN at x = .* m/);
    // The box beam's two flange joints carry the same q: one curve, named for both, and no joint missing.
    const flow = page.locator("#diagrams svg", { has: page.locator("[data-role^='series shear-flow']") });
    await expect(flow.locator("[data-role^='series shear-flow']").count()).resolves.toBe(1);
    await expect(flow.textContent()).resolves.toContain("joint bottom = joint top");
  });

  test("a longer span changes the schedule", async () => {
    const before = (await scheduleTable().textContent()) ?? "";
    await page.getByLabel("Span (m)").fill("6");
    await untilText(page, scheduleTable(), (t) => t !== before, "the schedule did not change with the span");
    await upToDate(page);
    expect(await scheduleTable().textContent()).toContain("6");
  });

  test("a negative depth is reported at its cell, keeps the old results marked out of date, and clears when fixed", async () => {
    const depth = page.getByLabel("Part 2 h (mm)");
    await depth.fill("-70");
    await untilText(page, page.getByRole("alert"), (t) => t.includes("results below are from the last valid input"), "no out-of-date notice");
    await expect(depth.getAttribute("aria-invalid")).resolves.toBe("true");
    expect(await fieldMessage(depth)).toContain("must be greater than 0");
    expect(await depth.inputValue()).toBe("-70");
    expect(await scheduleTable().isVisible()).toBe(true);
    await expect(page.locator(".results-body.stale").count()).resolves.toBe(1);
    await page.screenshot({ path: join(shots, "page-1280-bad-input.png") });

    await fromMenu(page, "Export", "Schedule (CSV)");
    await expect(page.locator(".toolbar-message").textContent()).resolves.toContain("No schedule CSV");

    await page.getByRole("button", { name: /Part 2 · h: must be greater than 0/ }).click();
    await expect(depth.evaluate((input) => input === document.activeElement)).resolves.toBe(true);

    await depth.fill("70");
    await upToDate(page);
    await expect(depth.getAttribute("aria-invalid")).resolves.toBeNull();
    await expect(page.getByRole("alert").count()).resolves.toBe(0);
  });

  test("text that is not a number is kept and explained at the field", async () => {
    const span = page.getByLabel("Span (m)");
    await span.fill("6 m");
    await untilText(page, page.getByRole("alert"), (t) => t.includes("problem"), "no notice for a span that is not a number");
    expect(await fieldMessage(span)).toContain("is not a number");
    expect(await span.inputValue()).toBe("6 m");
    await span.fill("6");
    await upToDate(page);
  });

  test("check mode checks the zones given, under a heading that says so", async () => {
    await page.getByLabel("Check: I give the schedule, stitchplan checks it").check();
    const given = page.getByLabel("Every joint fastened by the default connector: schedule given as");
    await given.selectOption("zones");
    // The designed zones are the starting point; widen the first one's spacing until it fails.
    const firstSpacing = page.getByLabel(/^Every joint fastened by the default connector, zone 1 spacing/);
    await firstSpacing.fill("150");
    await upToDate(page);
    const checked = page.getByRole("table", { name: "Checked schedule, joint bottom" });
    await checked.waitFor();
    await expect(page.getByRole("heading", { name: "Checked schedule (given in the job)" }).isVisible()).resolves.toBe(true);
    await expect(checked.locator("tbody tr").first().getAttribute("class")).resolves.toContain("fails");
    await expect(page.locator(".status-banner").getAttribute("class")).resolves.toContain("fails");
    await page.getByLabel("Design: stitchplan lays out the zones").check();
    await scheduleTable().waitFor();
    await upToDate(page);
  });

  test("a reload keeps the job being edited", async () => {
    await page.goto(`${h.base}/`);
    await scheduleTable().waitFor();
    await expect(page.getByLabel("Span (m)").inputValue()).resolves.toBe("6");
  });

  test("on a tablet the results stack under the form", async () => {
    await page.setViewportSize({ width: 800, height: 1000 });
    await page.waitForTimeout(300);
    const form = await page.locator("#job-form").boundingBox();
    const results = await page.locator("#results").boundingBox();
    expect(results!.y).toBeGreaterThan(form!.y + form!.height - 1);
    await page.screenshot({ path: join(shots, "page-800.png") });
    expect(h.errors).toEqual([]);
  });
});

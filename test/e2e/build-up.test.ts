import { join } from "node:path";
import type { Locator, Page } from "playwright-core";
import { afterAll, beforeAll, describe, expect, test } from "vitest";
import { shots, startHarness, toolbarMessage, untilText, upToDate, type Harness } from "./page-harness.js";

let h: Harness;
let page: Page;

beforeAll(async () => {
  h = await startHarness();
  page = h.page;
});

afterAll(async () => {
  await h?.close();
});

describe("a new member from a typical build-up", () => {
  test("a nailed box beam reaches its first schedule in at most 12 inputs, and the form stays editable", async () => {
    await page.goto(`${h.base}/?example=workshop-box-beam.si`);
    await page.locator(".status-banner").waitFor();
    let inputs = 0;
    const click = async (target: Locator) => {
      inputs++;
      await target.click();
    };
    const fill = async (target: Locator, value: string) => {
      inputs++;
      await target.fill(value);
    };

    await click(page.locator("details.menu > summary", { hasText: "File" }));
    await click(page.locator("details.menu[open] .menu-item", { hasText: "New member from a typical build-up" }));
    const dialog = page.getByRole("dialog", { name: "New member from a typical build-up" });
    await dialog.waitFor();
    inputs++;
    await dialog.getByLabel("Build-up").selectOption("nailed-box");
    await fill(dialog.getByLabel("Flange width (mm)"), "95");
    await fill(dialog.getByLabel("Flange depth (mm)"), "70");
    await fill(dialog.getByLabel("Web panel thickness (mm)"), "18");
    await fill(dialog.getByLabel("Overall depth (mm)"), "450");
    await fill(dialog.getByLabel("Span (m)"), "5");
    await page.screenshot({ path: join(shots, "build-up-dialog.png") });
    await click(dialog.getByRole("button", { name: "Fill the form" }));
    await expect(dialog.count()).resolves.toBe(0);

    await upToDate(page);
    await page.getByRole("table", { name: /Schedule, joint (bottom|top)/ }).first().waitFor();
    expect(inputs).toBeLessThanOrEqual(12);
    await untilText(page, toolbarMessage(page), (t) => t.includes("nailed box beam"), "no message after filling the form");

    // Joints named by what they join, in the form's list and beside the section.
    await expect(page.locator(".joint-item .joint-words").allTextContents()).resolves.toEqual(expect.arrayContaining([": Top flange to both webs", ": Bottom flange to both webs"]));
    await expect(page.locator(".joint-chosen").textContent()).resolves.toMatch(/^Joint (top|bottom): (Top|Bottom) flange to both webs\.$/);

    // The usual form, filled and editable.
    await expect(page.getByLabel("Span (m)").inputValue()).resolves.toBe("5");
    await expect(page.getByLabel("Part 1 h (mm)").inputValue()).resolves.toBe("450");
    // Each part has its own shape: the left web's depth is not the right web's.
    await page.getByLabel("Part 1 h (mm)").fill("460");
    await expect(page.getByLabel("Part 4 h (mm)").inputValue()).resolves.toBe("450");
    await page.getByLabel("Part 1 h (mm)").fill("450");
    await page.getByLabel("Span (m)").fill("4.5");
    await upToDate(page);
    await expect(page.getByLabel("Span (m)").inputValue()).resolves.toBe("4.5");
    // The joints' "default" text follows the rows as they are typed, not the last result.
    await expect(page.locator(".joint-default").first().textContent()).resolves.toMatch(/, 2 per row \(the default\)$/);
    await page.getByLabel(/^Side by side in a row/).first().fill("1");
    await untilText(page, page.locator(".joint-default").first(), (t) => t.endsWith(", 1 per row (the default)"), "the default's text did not follow the rows");
    await upToDate(page);
    await page.screenshot({ path: join(shots, "build-up-filled.png"), fullPage: true });
    expect(h.errors).toEqual([]);
  });

  test("a new part takes the size of the part it goes against, is added at the end, and the 'against' list follows a renamed part", async () => {
    await page.getByLabel("Part 2 id").fill("lower");
    await page.getByLabel("Part 2 id").press("Tab");
    const against = page.getByLabel("Part the new one goes against");
    await against.focus();
    await expect(against.locator("option").allTextContents()).resolves.toEqual(["web-left", "lower", "top", "web-right"]);
    await against.selectOption({ label: "web-right" });
    await page.getByLabel("Where the new part goes").selectOption("right");
    await page.getByRole("button", { name: "Add part" }).click();
    // The right web's own 18 × 450 mm, and parts 1–4 keep their numbers.
    await expect(page.getByLabel("Part 5 b (mm)").inputValue()).resolves.toBe("18");
    await expect(page.getByLabel("Part 5 h (mm)").inputValue()).resolves.toBe("450");
    await expect(page.getByLabel("Part 2 id").inputValue()).resolves.toBe("lower");
    await page.getByRole("button", { name: "Remove Part 5" }).click();
    await upToDate(page);
    expect(h.errors).toEqual([]);
  });

  test("a US nailed box beam from the build-up: lumber by nominal size, zone ends also in feet and inches", async () => {
    await page.getByRole("button", { name: "US", exact: true }).click();
    await untilText(page, page.locator(".units-value"), (t) => t.startsWith("US customary"), "the job did not switch to US units");
    await page.locator("details.menu > summary", { hasText: "File" }).click();
    await page.locator("details.menu[open] .menu-item", { hasText: "New member from a typical build-up" }).click();
    const dialog = page.getByRole("dialog", { name: "New member from a typical build-up" });
    await expect(dialog.getByLabel("Flange lumber (nominal)").inputValue()).resolves.toBe("2x4");
    await dialog.getByLabel("Span (ft)").fill("14");
    await dialog.getByRole("button", { name: "Fill the form" }).click();
    await upToDate(page);
    const first = page.getByRole("table", { name: /^Schedule, joint/ }).first().locator("tbody tr").first().locator("td").nth(1);
    // Zone 1 starts at the member's end: 0 ft, and its end in feet and inches to the sixteenth.
    await expect(first.textContent()).resolves.toMatch(/^0 – [\d.]+0 – \d+'-[\d /]+"$/);
    await page.getByRole("button", { name: "SI", exact: true }).click();
    await untilText(page, page.locator(".units-value"), (t) => t.startsWith("SI"), "the job did not switch back to SI");
    expect(h.errors).toEqual([]);
  });

  test("a bad size is refused in the dialog in its own words, and Cancel leaves the job alone", async () => {
    const spanBefore = await page.getByLabel("Span (m)").inputValue();
    await page.locator("details.menu > summary", { hasText: "File" }).click();
    await page.locator("details.menu[open] .menu-item", { hasText: "New member from a typical build-up" }).click();
    const dialog = page.getByRole("dialog", { name: "New member from a typical build-up" });
    await dialog.getByLabel("Build-up").selectOption("welded-plate-girder");
    await dialog.getByLabel("Web plate depth (mm)").fill("deep");
    await dialog.getByRole("button", { name: "Fill the form" }).click();
    await expect(dialog.getByRole("alert").textContent()).resolves.toBe("Web plate depth (mm): enter a number, 0 or more.");
    await dialog.getByRole("button", { name: "Cancel" }).click();
    await expect(dialog.count()).resolves.toBe(0);
    await expect(page.getByLabel("Span (m)").inputValue()).resolves.toBe(spanBefore);
    expect(h.errors).toEqual([]);
  });
});

import { join } from "node:path";
import type { Locator, Page } from "playwright-core";
import { afterAll, beforeAll, describe, expect, test } from "vitest";
import { shots, startHarness, upToDate, type Harness } from "./page-harness.js";

let h: Harness;
let page: Page;

beforeAll(async () => {
  h = await startHarness();
  page = h.page;
});

afterAll(async () => {
  await h?.close();
});

describe("a flitch beam from the build-up", () => {
  test("two 2x12 plies with a 1/2 × 11 in plate between reach a first schedule in a few inputs; the section shows the plate between the plies, its depth and where it sits", { timeout: 90_000 }, async () => {
    await page.goto(`${h.base}/?example=flitch-door-header.us`);
    await upToDate(page);
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
    await dialog.getByLabel("Build-up").selectOption("side-by-side-plies");
    await expect(dialog.getByLabel("Ply lumber (nominal)").inputValue()).resolves.toBe("2x12");
    await fill(dialog.getByLabel("Number of plies"), "2");
    await fill(dialog.getByLabel(/^Steel plate thickness/), "0.5");
    await fill(dialog.getByLabel(/^Steel plate depth/), "11");
    await fill(dialog.getByLabel("Span (ft)"), "14");
    await page.screenshot({ path: join(shots, "flitch-build-up-dialog.png") });
    await click(dialog.getByRole("button", { name: "Fill the form" }));
    await expect(dialog.count()).resolves.toBe(0);
    await upToDate(page);
    await page.getByRole("table", { name: /^Schedule, joint/ }).first().waitFor();
    expect(inputs).toBeLessThanOrEqual(10);

    // The plate between the plies: side by side ply-1, plate, ply-2, with the plate's depth and where it sits.
    await expect(page.locator("#plies").textContent()).resolves.toMatch(/Ply 1.*Steel plate.*Ply 2/s);
    const section = page.locator("#section svg").first();
    // 2x12 dressed 11.25 in (PS 20 [M]); the 11 in plate centred: its top 0.125 in below [D].
    await expect(section.locator("text", { hasText: "plate 11 in deep" }).count()).resolves.toBe(1);
    await expect(section.locator("text", { hasText: "top 0.125 in below" }).count()).resolves.toBe(1);
    // The interfaces name the joint that passes the load across them, and the joint's lines are listed.
    const interfaces = (await page.locator("#plies .ply-interfaces").textContent()) ?? "";
    expect(interfaces).not.toContain("no joint found here");
    expect((await page.locator("#section table.joints").textContent()) ?? "").not.toContain("no contact found");
    // The bolts carry the plate's share across, perpendicular to the grain: a schedule, and a status.
    const block = (await page.locator(".schedule-block").first().textContent()) ?? "";
    expect(block).toMatch(/^Joint plate: 5\/8 in bolt.*double shear/);
    expect(await page.locator(".schedule-block").count()).toBe(1);
    await page.locator("#section").screenshot({ path: join(shots, "flitch-build-up-section.png") });
    expect(h.errors).toEqual([]);
  });
});

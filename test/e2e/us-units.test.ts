import type { Page } from "playwright-core";
import { afterAll, beforeAll, describe, expect, test } from "vitest";
import { shots, startHarness, upToDate, type Harness } from "./page-harness.js";
import { join } from "node:path";

let h: Harness;
let page: Page;

beforeAll(async () => {
  h = await startHarness();
  page = h.page;
});

afterAll(async () => {
  await h?.close();
});

const open = async (id: string) => {
  await page.goto(`${h.base}/?example=${id}`);
  await upToDate(page);
  await page.locator(".status-banner").waitFor();
};
const textOf = async (selector: string) => ((await page.locator(selector).first().textContent()) ?? "").replace(/\s+/g, " ");

describe("US units on the page: steel in kips and ksi, timber in pounds and psi", () => {
  test("a steel cover-plate retrofit shows kips, kip/in and ksi; never lbf or psi in its results", { timeout: 60_000 }, async () => {
    await open("cover-plate-retrofit.us");
    const checks = await textOf("#checks");
    expect(checks).toMatch(/\d ksi/);
    expect(checks).not.toMatch(/psi/);
    // The schedule block; the cut-off table's sentence on the connectors is core's text, in the job's units.
    const schedules = await textOf(".schedule-block");
    expect(schedules).toMatch(/\d kips/);
    expect(schedules).not.toMatch(/lbf/);
    // The cut-offs' sentence on the connectors there too.
    expect(await textOf(".terminations")).toMatch(/× \d+(\.\d+)? kips between the end and the cut-off/);
    expect(await textOf("#schedules")).not.toMatch(/lbf/);
    const diagrams = await textOf("#diagrams");
    expect(diagrams).toMatch(/kips at x/);
    expect(diagrams).toMatch(/kip·ft/);
    await page.locator("#diagrams").screenshot({ path: join(shots, "us-steel-diagrams.png") });
    expect(h.errors).toEqual([]);
  });

  test("a welded girder's weld reads in kip/in", { timeout: 60_000 }, async () => {
    await open("girder-intermittent-welds.us");
    expect(await textOf("#schedules")).toMatch(/kip\/in/);
    expect(await textOf("#checks")).toMatch(/\d ksi/);
  });

  test("a timber header shows lb and psi; a flitch plate's own stresses in ksi", { timeout: 60_000 }, async () => {
    await open("three-ply-header.us");
    expect(await textOf("#checks")).toMatch(/\d psi/);
    expect(await textOf("#checks")).not.toMatch(/ksi/);
    expect(await textOf("#schedules")).toMatch(/\d lb\b/);
    expect(await textOf("#schedules")).not.toMatch(/kips|lbf/);
    await open("flitch-door-header.us");
    const rows = page.locator("#checks tbody tr");
    const plate = ((await rows.filter({ hasText: "Bending stress, Flitch plate" }).textContent()) ?? "").replace(/\s+/g, " ");
    const ply = ((await rows.filter({ hasText: "Bending stress, Left 2x12" }).textContent()) ?? "").replace(/\s+/g, " ");
    expect(plate).toMatch(/\d ksi/);
    expect(ply).toMatch(/\d psi/);
    expect(await textOf("#schedules")).toMatch(/\d lb\b/);
    expect(h.errors).toEqual([]);
  });
});

describe("feet and inches on the page's schedule tables, as on the field sheet", () => {
  test("zone ends, the worst row, a weld's zones and the cut-offs carry feet and inches in US units", { timeout: 60_000 }, async () => {
    await open("cover-plate-retrofit.us");
    const block = await textOf(".schedule-block");
    // 6.5 ft = 6'-6" and 10.17 ft ≈ 10'-2" [D] (12 in to the foot).
    expect(block).toContain(`6'-6" – 10'-2"`);
    expect(block).toMatch(/Row check passes: largest utilisation [\d.]+ at x = [\d.]+ ft \(\d+'-[\d /]+"\)/);
    expect(await textOf(".terminations")).toContain(`6'-6"`);
    await open("girder-intermittent-welds.us");
    expect(await textOf(".schedule-block, .weld-block, #schedules")).toContain(`7'-0" – 14'-0"`);
    await open("workshop-box-beam.si");
    expect(await textOf("#schedules")).not.toMatch(/\d'-\d/);
    expect(h.errors).toEqual([]);
  });
});

describe("across the contact on the page", () => {
  test("without a layout across in the result, the schedule says what the limits give and draws nothing", { timeout: 60_000 }, async () => {
    // Every discrete schedule has one now: the design's answer is copied with the field deleted to test the path.
    await page.route("**/api/designs", async (route) => {
      const response = await route.fetch();
      const result = (await response.json()) as { schedules: Record<string, unknown>[] };
      for (const s of result.schedules) delete s.layoutAcross;
      await route.fulfill({ response, json: result });
    });
    try {
      await open("flitch-door-header.us");
      const block = await textOf(".schedule-block");
      expect(block).toContain("Across the contact2 per row across the contact of 11 in, at least 3 in from each edge and at least 3 in apart.");
      expect(await page.locator(".schedule-block figure.row-across").count()).toBe(0);
    } finally {
      await page.unroute("**/api/designs");
    }
    expect(h.errors).toEqual([]);
  });

  test("with it: the flitch plate's staggered bolts are said and drawn", { timeout: 60_000 }, async () => {
    await open("flitch-door-header.us");
    const block = await textOf(".schedule-block");
    expect(block).toContain("Across the contactConnectors across the contact at");
    expect(await page.locator(".schedule-block figure.row-across").count()).toBe(1);
    expect(h.errors).toEqual([]);
  });
});

import { rmSync, writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import type { Page } from "playwright-core";
import { afterAll, beforeAll, describe, expect, test } from "vitest";
import { nailedIJob } from "../job-builders.js";
import { shots, startHarness, toolbarMessage, untilText, upToDate, type Harness } from "./page-harness.js";

let h: Harness;
let page: Page;
const jobFile = join(tmpdir(), `stitchplan-e2e-nailed-i-${process.pid}.json`);

beforeAll(async () => {
  h = await startHarness();
  page = h.page;
});

afterAll(async () => {
  rmSync(jobFile, { force: true });
  await h?.close();
});

/** A panel at both widths the page is made for, a desk and a tablet; tall, so the results column shows it whole. */
async function screenshots(name: string, panel: string): Promise<void> {
  for (const width of [1280, 800]) {
    await page.setViewportSize({ width, height: 2200 });
    await page.waitForTimeout(350);
    await page.locator(panel).screenshot({ path: join(shots, `${name}-${width}.png`) });
  }
  await page.setViewportSize({ width: 1280, height: 900 });
  await page.waitForTimeout(350);
}

const rowText = async (table: ReturnType<Page["getByRole"]>, first: string) => (await table.locator("tbody tr", { hasText: first }).first().textContent()) ?? "";

describe("side-by-side plies loaded on one face (three-ply header)", () => {
  const interfaces = () => page.getByRole("table", { name: /^What each interface passes/ });

  test("shows each ply's share and what each interface passes, with the diagrams captioned as force across the interface", async () => {
    await page.goto(`${h.base}/?example=three-ply-header.us`);
    await upToDate(page);
    const shares = page.getByRole("table", { name: "Share of each load by ply" });
    await expect(shares.locator("tbody tr").count()).resolves.toBe(3);
    expect(await shares.textContent()).toContain("0.333");
    // A load on the left face: the first interface passes two thirds of it, the second one third, both towards the right.
    expect(await rowText(interfaces(), "ply-1 / ply-2")).toMatch(/0\.667 →.*0\.333 ←/);
    expect(await rowText(interfaces(), "ply-2 / ply-3")).toMatch(/0\.333 →.*0\.667 ←/);

    const diagram = page.locator("#diagrams svg[aria-label='Force passed across each ply interface, per length']");
    await expect(diagram.count()).resolves.toBe(1);
    await expect(page.locator("#diagrams figcaption", { hasText: "not shear flow" }).count()).resolves.toBe(1);
    await expect(page.locator("#diagrams h2").textContent()).resolves.toContain("force across the ply interfaces");
    await expect(page.locator(".schedule-block .demand-note").first().textContent()).resolves.toContain("Force passed across the interface");
    await expect(page.locator(".schedule-block figcaption", { hasText: "f the force passed across the interface per line" }).count()).resolves.toBe(2);
    await screenshots("plies", "#plies");
  });

  test("a load moved to the other face changes what the interfaces pass", async () => {
    const face = page.getByLabel("Load 1 arrives on");
    await expect(face.inputValue()).resolves.toBe("left");
    const before = await rowText(interfaces(), "ply-1 / ply-2");
    const schedule = (await page.getByRole("table", { name: "Schedule, joint ply-1" }).textContent()) ?? "";
    await face.selectOption("right");
    await untilText(page, interfaces().locator("tbody tr", { hasText: "ply-1 / ply-2" }), (t) => t !== before, "what interface 1 passes did not change with the face");
    await upToDate(page);
    await untilText(page, page.getByRole("table", { name: "Schedule, joint ply-1" }), (t) => t !== schedule, "the schedule of interface 1 did not change with the face");
    await expect(page.getByLabel("Load 1 arrives on").inputValue()).resolves.toBe("right");
    expect(h.errors).toEqual([]);
  });
});

describe("a cover plate over the middle half", () => {
  const ends = () => page.getByRole("table", { name: "Part ends" });

  test("draws the plate's run in elevation, lists the section stretch by stretch and both ends of the plate", async () => {
    await page.goto(`${h.base}/?example=cover-plate-retrofit.us`);
    await upToDate(page);
    const elevation = page.locator("#along svg");
    await expect(elevation.locator("[data-role='part-run plate']").count()).resolves.toBe(1);
    await expect(elevation.locator("[data-role='part-run-label plate']").textContent()).resolves.toContain("6.5 – 19.5 ft");
    await expect(elevation.locator("[data-role^='cutoff-line plate']").count()).resolves.toBe(2);
    const stretches = page.getByRole("table", { name: "Section stretch by stretch" });
    await expect(stretches.locator("tbody tr").count()).resolves.toBe(3);
    expect(await rowText(stretches, "6.5 – 19.5")).toContain("1,058");
    await expect(ends().locator("tbody tr").count()).resolves.toBe(2);
    expect(await rowText(ends(), "plate, left")).toContain("6.5");
    expect(await rowText(ends(), "plate, right")).toContain("19.5");
    await screenshots("cover-plate-along", "#along");
  });

  test("a longer plate moves its ends, and the ends' checks follow", async () => {
    const before = (await ends().textContent()) ?? "";
    await page.locator("summary", { hasText: "Runs from 6.5 to 19.5 ft" }).click();
    await page.getByLabel("Part 1 runs from (ft)").fill("4");
    await page.getByLabel("Part 1 runs to (ft)").fill("22");
    await untilText(page, ends(), (t) => t !== before && t.includes("plate, left4") && t.includes("plate, right22"), "the ends of the plate did not follow its extent");
    await upToDate(page);
    await expect(page.locator("#along [data-role='part-run-label plate']").textContent()).resolves.toContain("4 – 22 ft");
    await expect(page.locator("summary", { hasText: "Runs from 4 to 22 ft" }).count()).resolves.toBe(1);
    expect(h.errors).toEqual([]);
  });
});

describe("composite action with slip (EN 1995-1-1 Annex B)", () => {
  const comparison = () => page.getByRole("table", { name: "Rigid and slip-aware composite action side by side" });
  const slipAware = () => page.getByLabel(/^Slip-aware: γ-method/);

  test("slip-aware asked for on a member whose nails have no slip modulus says why it does not apply, in red", async () => {
    await page.goto(`${h.base}/?example=workshop-box-beam.si`);
    await upToDate(page);
    await expect(page.locator("#composite").count()).resolves.toBe(0);
    await slipAware().check();
    await upToDate(page);
    const refused = page.locator("#composite .composite-refused");
    await expect(refused.textContent()).resolves.toContain("has no slip modulus");
    await expect(refused.evaluate((e) => getComputedStyle(e).color)).resolves.toBe("rgb(179, 38, 30)");
  });

  test("a nailed I chosen slip-aware in the form shows both models side by side, with fewer connectors than rigid", async () => {
    // The symmetric nailed I of test/core/fastening/composite-action.test.ts, to be designed.
    writeFileSync(jobFile, JSON.stringify(nailedIJob("rigid", "design")));
    await page.locator("#job-file").setInputFiles(jobFile);
    await untilText(page, toolbarMessage(page), (t) => t.includes("Opened"), "the job file was not opened");
    await upToDate(page);
    // Rigid: the slip-aware model is shown beside it, for comparison.
    await expect(comparison().locator("thead").textContent()).resolves.toMatch(/Rigid connectionthe design uses this.*With slip \(γ-method\)for comparison/);

    await slipAware().check();
    await upToDate(page);
    await untilText(page, comparison().locator("thead"), (t) => /With slip \(γ-method\)the design uses this/.test(t), "the comparison did not follow the model chosen");
    for (const joint of ["top", "bottom"]) {
      const cells = await comparison().locator("tbody tr", { hasText: `Joint ${joint}: connectors` }).locator("td").allTextContents();
      const [rigid, slip] = [Number(cells[1]), Number(cells[2])];
      expect(rigid, `joint ${joint}`).toBeGreaterThan(0);
      expect(slip, `joint ${joint}`).toBeGreaterThan(0);
      expect(slip, `joint ${joint}: slip-aware needs fewer connectors than rigid`).toBeLessThan(rigid);
    }
    expect(await rowText(comparison(), "Deflection ÷ rigid deflection")).toMatch(/× \d/);
    expect(await rowText(comparison(), "Bending stiffness E·I (serviceability)")).toContain("kN·m²");

    // Long-term factors give the final stiffness beside the others.
    await page.getByLabel("Work out the final (long-term) deflection").check();
    await page.getByLabel("ψ2 of the variable actions").fill("0.3");
    await page.getByLabel("k_def of the timber").fill("0.6");
    await upToDate(page);
    await comparison().locator("tbody tr", { hasText: "final (long term)" }).waitFor();
    await screenshots("composite", "#composite");
    expect(h.errors).toEqual([]);
  });
});

import { readFileSync, writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import type { Page } from "playwright-core";
import { afterAll, beforeAll, describe, expect, test } from "vitest";
import { fieldMessage, fromMenu, shots, startHarness, toolbarMessage, untilText, upToDate, type Harness } from "./page-harness.js";

let h: Harness;
let page: Page;

beforeAll(async () => {
  h = await startHarness();
  page = h.page;
});

afterAll(async () => {
  await h?.close();
});

const value = async (label: string | RegExp) => Number(await page.getByLabel(label, { exact: typeof label === "string" }).inputValue());

describe("a member built from an empty form", () => {
  test("is entered field by field through the page and computed", async () => {
    await page.goto(`${h.base}/?example=workshop-box-beam.si`);
    await page.locator(".status-banner").waitFor();
    await fromMenu(page, "File", "New member (empty form)");
    await expect(page.getByLabel("Project name").inputValue()).resolves.toBe("");
    await page.getByLabel("Project name").fill("Builder test");
    await page.getByLabel("Member mark").fill("B-7");

    await page.getByRole("button", { name: "Add material" }).click();
    // Filled from the grade library, then edited like any other values.
    await page.getByLabel("Material 1: fill from a common grade").selectOption("C24");
    await expect(page.getByLabel("Material 1 E (MPa)").inputValue()).resolves.toBe("11000");
    await expect(page.getByLabel("Material 1 source of values").inputValue()).resolves.toContain("EN 338");
    await page.getByLabel("Material 1 name").fill("Test softwood");
    await page.getByLabel("Material 1 E (MPa)").fill("10000");
    await page.getByLabel("Material 1 density (kg/m³)").fill("450");
    await page.getByLabel("Material 1 bending strength (MPa)").fill("10");
    await page.getByLabel("Material 1 shear strength (MPa)").fill("1.5");

    // A plank I: bottom flange at x, y; the web on top of it; the top flange on top of the web.
    await page.getByRole("button", { name: "Add part" }).click();
    await page.getByLabel("Part 1 b (mm)").fill("100");
    await page.getByLabel("Part 1 h (mm)").fill("20");
    await page.getByRole("button", { name: "Add part" }).click();
    await expect(page.getByLabel("Part 2 placed", { exact: true }).inputValue()).resolves.toBe("top");
    await page.getByLabel("Part 2 b (mm)").fill("20");
    await page.getByLabel("Part 2 h (mm)").fill("100");
    await page.getByRole("button", { name: "Add part" }).click();
    await page.getByLabel("Part 3 b (mm)").fill("100");
    await page.getByLabel("Part 3 h (mm)").fill("20");

    await page.getByLabel("Kind of connector to add").selectOption("rated");
    await page.getByRole("button", { name: "Add connector" }).click();
    await page.getByLabel("Connector 1 Resistance per connector (N)").fill("400");

    await page.getByLabel("Span (m)").fill("4");
    await page.getByRole("button", { name: "Add uniform load" }).click();
    await page.getByLabel("Load 1 w (kN/m)").fill("0.5");

    await upToDate(page);
    await page.getByRole("table", { name: "Schedule, joint P1" }).waitFor();
    await expect(page.locator(".status-banner h2").textContent()).resolves.toMatch(/Passes|Does not pass/);
    await expect(page.locator(".joint-item").count()).resolves.toBe(2);
    await page.screenshot({ path: join(shots, "built-member-1280.png") });
  });

  test("switches to US customary units: every value converts and the results follow", async () => {
    await page.getByRole("button", { name: "US", exact: true }).click();
    await untilText(page, page.locator(".units-value"), (t) => t.startsWith("US customary"), "the job did not switch to US units");
    expect(await value("Span (ft)")).toBeCloseTo(4 / 0.3048, 6);
    expect(await value("Part 1 b (in)")).toBeCloseTo(100 / 25.4, 6);
    expect(await value("Load 1 w (lbf/ft)")).toBeCloseTo((0.5 * 1000) / (4.4482216152605 / 0.3048), 3);
    expect(await value("Material 1 E (psi)")).toBeCloseTo(10000 / 0.006894757293168361, 0);
    await upToDate(page);
    await untilText(page, page.locator(".status-meta"), (t) => t.includes("US customary units"), "the results did not follow the units");
    await expect(page.getByRole("table", { name: "Schedule, joint P1" }).locator("thead").textContent()).resolves.toContain("ft");
  });

  test("saves the job to a file and opens it again", async () => {
    const [download] = await Promise.all([page.waitForEvent("download"), fromMenu(page, "File", "Save job file")]);
    expect(download.suggestedFilename()).toBe("B-7-revA.stitchplan.json");
    const saved = JSON.parse(readFileSync((await download.path())!, "utf8"));
    expect(saved).toMatchObject({ format: "stitchplan-job", version: 1, units: "us", member: { mark: "B-7" } });
    expect(saved.beam.spans[0]).toBeCloseTo(13.1233596, 6);

    saved.member.mark = "B-7a";
    const file = join(tmpdir(), `stitchplan-e2e-${process.pid}.json`);
    writeFileSync(file, JSON.stringify(saved));
    await fromMenu(page, "File", "New member (empty form)");
    await expect(page.getByLabel("Member mark").inputValue()).resolves.toBe("");
    await page.locator("#job-file").setInputFiles(file);
    await untilText(page, toolbarMessage(page), (t) => t.includes("Opened"), "the file was not opened");
    await expect(page.getByLabel("Member mark").inputValue()).resolves.toBe("B-7a");
    expect(await value("Span (ft)")).toBeCloseTo(13.1233596, 6);
    await upToDate(page);
  });

  test("downloads the worksheet, the schedule CSV and the positions CSV in the job's units", async () => {
    const [pdf] = await Promise.all([page.waitForEvent("download"), fromMenu(page, "Export", "Worksheet (PDF)")]);
    expect(readFileSync((await pdf.path())!).subarray(0, 4).toString("latin1")).toBe("%PDF");

    const [schedule] = await Promise.all([page.waitForEvent("download"), fromMenu(page, "Export", "Schedule (CSV)")]);
    expect(schedule.suggestedFilename()).toBe("B-7a-revA.schedule.csv");
    const rows = readFileSync((await schedule.path())!, "utf8").trim().split(/\r\n/);
    expect(rows[0]).toBe("member,joint,zone,from (ft),to (ft),spacing (in),rows,count,utilisation");
    expect(rows.length).toBeGreaterThan(2);
    expect(rows.slice(1).every((r) => r.startsWith("B-7a,P1,") || r.startsWith("B-7a,P3,"))).toBe(true);

    const [positions] = await Promise.all([page.waitForEvent("download"), fromMenu(page, "Export", "Connector positions (CSV)")]);
    const lines = readFileSync((await positions.path())!, "utf8").trim().split(/\r\n/);
    expect(lines[0]).toBe("joint,row,x (ft)");
    expect(lines[1]).toMatch(/^P[13],1,\d/);
  });

  test("shows a bad value at the field that caused it, and keeps what was typed", async () => {
    const web = page.getByLabel("Part 2 h (in)");
    await web.fill("-3");
    await untilText(page, page.getByRole("alert"), (t) => t.includes("problem"), "no notice for a negative depth");
    await expect(web.getAttribute("aria-invalid")).resolves.toBe("true");
    expect(await fieldMessage(web)).toContain("must be greater than 0");
    expect(await web.inputValue()).toBe("-3");
    await page.screenshot({ path: join(shots, "built-member-bad-value.png") });
    await web.fill("3.93700787");
    await upToDate(page);
    expect(h.errors).toEqual([]);
  });
});

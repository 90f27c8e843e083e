import { readFileSync } from "node:fs";
import { join } from "node:path";
import type { Page } from "playwright-core";
import { afterAll, beforeAll, describe, expect, test } from "vitest";
import { shots, startHarness, toolbarMessage, untilText, upToDate, type Harness } from "./page-harness.js";

let h: Harness;
let page: Page;

beforeAll(async () => {
  h = await startHarness({ store: true });
  page = h.page;
});

afterAll(async () => {
  await h?.close();
});

const saveMenu = () => page.locator("details.save-menu");
const storeMessage = () => page.locator(".store-message");

async function saveFromToolbar(note: string): Promise<string> {
  const before = (await toolbarMessage(page).textContent()) ?? "";
  await saveMenu().locator("summary").click();
  await page.getByLabel("Note").fill(note);
  await saveMenu().getByRole("button", { name: /^Save/ }).click();
  return untilText(page, toolbarMessage(page), (t) => t !== before && (t.startsWith("Saved as revision") || t.startsWith("Not saved")), "the save did not answer");
}

describe("the job store on the page", () => {
  test("saves a member into a new project as revision 1", async () => {
    await page.goto(`${h.base}/?example=workshop-box-beam.si`);
    await upToDate(page);
    await expect(page.locator(".store-chip").textContent()).resolves.toContain("Not saved in a project");
    await saveMenu().locator("summary").click();
    await page.getByLabel("Project to save into").selectOption("new");
    await page.getByLabel("New project name").fill("Harbour Lane");
    await page.getByLabel("Note").fill("first issue for review");
    await saveMenu().getByRole("button", { name: "Save", exact: true }).click();
    await untilText(page, toolbarMessage(page), (t) => t.includes("Saved as revision 1 of MB-2"), "revision 1 was not saved");
    await expect(page.locator(".store-chip").textContent()).resolves.toContain("Harbour Lane › MB-2 · saved revision 1");
  });

  test("saves a changed member as revision 2", async () => {
    await page.getByLabel("Span (m)").fill("5.4");
    await upToDate(page);
    expect(await saveFromToolbar("longer span")).toContain("Saved as revision 2 of MB-2");
    await expect(page.locator(".store-chip").textContent()).resolves.toContain("saved revision 2");
  });

  test("two tabs saving at once both become revisions, and the later one is told", async () => {
    const other = await h.context.newPage();
    await other.goto(`${h.base}/`);
    await other.locator(".status-banner").waitFor();
    await other.locator("details.save-menu summary").click();
    await other.getByLabel("Note").fill("from the second tab");
    await other.locator("details.save-menu").getByRole("button", { name: /^Save/ }).click();
    await untilText(other, other.locator(".toolbar-message"), (t) => t.includes("Saved as revision 3"), "the second tab did not save revision 3");
    await other.close();
    const said = await saveFromToolbar("from the first tab");
    expect(said).toContain("Saved as revision 4 of MB-2");
    expect(said).toContain("3");
    await expect(toolbarMessage(page).getAttribute("class")).resolves.toContain("caution");
  });

  test("lists the project, the member and its revisions, and compares two of them", async () => {
    await page.getByRole("button", { name: "Projects and revisions" }).click();
    await page.getByRole("button", { name: "Revisions of MB-2" }).click();
    const revisions = page.getByRole("table", { name: "Revisions of MB-2" });
    await untilText(page, revisions.locator("tbody"), (t) => t.includes("longer span"), "the revisions were not listed");
    await expect(revisions.locator("tbody tr").count()).resolves.toBe(4);
    for (const n of [4, 3]) await page.getByLabel(`Compare revision ${n}`).uncheck();
    for (const n of [1, 2]) await page.getByLabel(`Compare revision ${n}`).check();
    await page.getByRole("button", { name: "Compare the two ticked" }).click();
    const comparison = page.locator(".comparison");
    await untilText(page, comparison, (t) => t.includes("Revision 1 → revision 2"), "no comparison");
    const inputs = page.getByRole("table", { name: /Inputs changed/ });
    await expect(inputs.textContent()).resolves.toMatch(/beam\.spans\[0\]changed4\.8 m5\.4 m/);
    await expect(comparison.textContent()).resolves.toMatch(/Joint bottom: changed/);
    await page.screenshot({ path: join(shots, "store-1280.png"), fullPage: true });
    await page.setViewportSize({ width: 800, height: 1000 });
    await page.screenshot({ path: join(shots, "store-800.png"), fullPage: true });
    await page.setViewportSize({ width: 1280, height: 900 });
  });

  test("issues a worksheet, records it, and finds it by the fingerprint printed on it", async () => {
    // Revision 2 (the longer span) may fail: then the page asks before it issues.
    const fails = ((await page.getByRole("table", { name: "Revisions of MB-2" }).locator("tr[data-revision='2']").textContent()) ?? "").includes("fails");
    const issue = async () => {
      await page.getByRole("button", { name: "Issue the worksheet of revision 2" }).click();
      if (fails) await storeMessage().getByRole("button", { name: /anyway/ }).click();
    };
    const [download] = await Promise.all([page.waitForEvent("download"), issue()]);
    expect(readFileSync((await download.path())!).subarray(0, 4).toString("latin1")).toBe("%PDF");
    // The store's revision beside the title block's.
    expect(download.suggestedFilename()).toBe("DEMO-101_MB-2_rev-A_store-rev-2.pdf");
    const said = await untilText(page, storeMessage(), (t) => t.includes("Issued worksheet #1"), "the issue was not recorded");
    const fingerprint = /fingerprint ([0-9a-f]{64})/.exec(said)![1]!;
    await untilText(page, page.getByRole("table", { name: "Revisions of MB-2" }).locator("tr[data-revision='2']"), (t) => t.includes("#1"), "the issue is not listed with revision 2");

    await page.getByLabel("Fingerprint from the sheet's footer").fill(fingerprint.slice(0, 10));
    await page.getByRole("button", { name: "Find" }).click();
    const found = page.locator(".lookup-found");
    await untilText(page, found, (t) => t.includes("Worksheet #1: Harbour Lane › MB-2, revision 2"), "the fingerprint was not found");
    await expect(found.locator(".fingerprint").textContent()).resolves.toBe(fingerprint);
  });

  test("opens a saved revision in the form", async () => {
    await page.getByRole("button", { name: "Open revision 1", exact: true }).click();
    await page.locator("#job-form").waitFor({ state: "visible" });
    await expect(page.getByLabel("Span (m)").inputValue()).resolves.toBe("4.8");
    await expect(page.locator(".store-chip").textContent()).resolves.toContain("saved revision 1");
    await upToDate(page);
    expect(h.errors).toEqual([]);
  });

  test("an example saved again is not filed into another project, nor turned into a revision of the member with its mark", async () => {
    await page.goto(`${h.base}/?example=workshop-box-beam.si`);
    await upToDate(page);
    await expect(page.locator(".store-chip").textContent()).resolves.toContain("Not saved in a project");
    await saveMenu().locator("summary").click();
    // The store holds "Harbour Lane"; the example names "Harbour Lane workshop mezzanine": a new project is offered.
    await untilText(page, page.getByLabel("Project to save into").locator("option"), (t) => t.length > 0, "the projects were not listed");
    await expect(page.getByLabel("Project to save into").inputValue()).resolves.toBe("new");
    await expect(page.getByLabel("New project name").inputValue()).resolves.toBe("Harbour Lane workshop mezzanine");
    // Chosen by hand, the project that already has an MB-2: nothing is stored and no revision of it is offered.
    const harbourLane = await page.getByLabel("Project to save into").locator("option", { hasText: /(^|· )Harbour Lane$/ }).getAttribute("value");
    await page.getByLabel("Project to save into").selectOption(harbourLane!);
    await saveMenu().getByRole("button", { name: "Save", exact: true }).click();
    const said = await untilText(page, toolbarMessage(page), (t) => t.startsWith("Nothing was stored"), "the taken mark was not reported");
    expect(said).toContain("already has a member MB-2 (4 revisions)");
    await expect(toolbarMessage(page).getByRole("button", { name: /Save as revision/ }).count()).resolves.toBe(0);
    await expect(page.locator(".store-chip").textContent()).resolves.toContain("Not saved in a project");
    expect(h.errors).toEqual([]);
  });

  test("issuing the worksheet of a revision that fails asks first", async () => {
    await page.getByLabel("Member mark").fill("MB-9");
    await page.getByLabel("Load 2 w (kN/m)").fill("40");
    await upToDate(page);
    await expect(page.locator(".status-banner h2").textContent()).resolves.toMatch(/Does not pass/);
    await page.getByLabel("Project to save into").selectOption("new");
    await page.getByLabel("New project name").fill("Failing members");
    await saveMenu().getByRole("button", { name: "Save", exact: true }).click();
    await untilText(page, toolbarMessage(page), (t) => t.includes("Saved as revision 1 of MB-9"), "MB-9 was not saved");
    await page.getByRole("button", { name: "Projects and revisions" }).click();
    await page.locator(".project-button", { hasText: "Failing members" }).click();
    await page.getByRole("button", { name: "Revisions of MB-9" }).click();
    await page.getByRole("button", { name: "Issue the worksheet of revision 1" }).click();
    const said = await untilText(page, storeMessage(), (t) => t.includes("does not pass"), "no question before issuing a failing revision");
    expect(said).toContain("nothing was issued yet");
    const [download] = await Promise.all([page.waitForEvent("download"), storeMessage().getByRole("button", { name: /anyway/ }).click()]);
    expect(download.suggestedFilename()).toMatch(/\.pdf$/);
    await untilText(page, storeMessage(), (t) => t.includes("Issued worksheet"), "the worksheet was not issued");
    await page.getByRole("button", { name: "Back to the member" }).click();
    expect(h.errors).toEqual([]);
  });

  test("an imported project is marked as imported, with its date, in the project list", async () => {
    const projects = (await (await page.request.get(`${h.base}/api/projects`)).json()) as { id: number; name: string }[];
    const failing = projects.find((p) => p.name === "Failing members")!;
    const file = await (await page.request.get(`${h.base}/api/projects/${failing.id}/export`)).body();
    await page.getByRole("button", { name: "Projects and revisions" }).click();
    await page.getByLabel("Project file to import").setInputFiles({ name: "failing.stitchplan-project.json", mimeType: "application/json", buffer: file });
    await untilText(page, storeMessage(), (t) => t.includes("Imported “Failing members”"), "the project file was not imported");
    const buttons = page.locator(".project-button", { hasText: "Failing members" });
    await untilText(page, buttons.nth(1), (t) => t.length > 0, "the imported copy is not listed");
    const texts = await buttons.allTextContents();
    expect(texts.filter((t) => /imported \d{4}-\d\d-\d\d \d\d:\d\d/.test(t))).toHaveLength(1);
    await expect(page.locator(".project-button", { hasText: "Harbour Lane" }).first().textContent()).resolves.not.toContain("imported");
    await page.screenshot({ path: join(shots, "store-imported-project.png"), fullPage: true });
    await page.getByRole("button", { name: "Back to the member" }).click();
    expect(h.errors).toEqual([]);
  });
});

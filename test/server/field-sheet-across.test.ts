import { execFileSync } from "node:child_process";
import { mkdtempSync, readFileSync, rmSync, writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { afterAll, describe, expect, test } from "vitest";
import { runDesign } from "../../server/design-service.js";
import { renderFieldSheet } from "../../server/pdf/worksheet.js";

const EXAMPLES = join(import.meta.dirname, "../../fixtures/examples");
const work = mkdtempSync(join(tmpdir(), "stitchplan-across-"));
afterAll(() => rmSync(work, { recursive: true, force: true }));
const flat = (s: string) => s.replace(/\s+/g, " ").trim();

async function fieldSheetText(result: ReturnType<typeof runDesign>["result"], job: ReturnType<typeof runDesign>["job"], name: string) {
  const file = join(work, `${name}.pdf`);
  writeFileSync(file, await renderFieldSheet(job, result, { printDate: "2025-03-14" }));
  return { text: flat(execFileSync("pdftotext", ["-enc", "UTF-8", file, "-"], { encoding: "utf8" })), pages: Number(/Pages:\s+(\d+)/.exec(execFileSync("pdfinfo", [file], { encoding: "utf8" }))![1]) };
}

describe("field sheet: where the connectors sit across the contact", () => {
  const run = runDesign(JSON.parse(readFileSync(join(EXAMPLES, "flitch-door-header.us.json"), "utf8")));

  test("a result with layoutAcross (made by hand here): offsets from the named edge, the stagger and the face, on one page", async () => {
    const result = { ...run.result, schedules: run.result.schedules.map((s) => ({ ...s, layoutAcross: { edge: "top edge of the plies", offsets: [3, 8.25], stagger: 2, drivenFrom: null } })) };
    const { text, pages } = await fieldSheetText(result, run.job, "with");
    expect(pages).toBe(1);
    // In words on the joint's line, and drawn (the rows are staggered).
    expect(text).toContain("2 per row at 3 in and 8-1/4 in from the top edge of the plies, alternate ones 2 in along the member, from either face");
    expect(text).toContain("Joint plate across the contact");
    expect(text).toContain("stagger 2 in");
  });

  test("rows in line: said on the joint's line, nothing drawn", async () => {
    const result = { ...run.result, schedules: run.result.schedules.map((s) => ({ ...s, layoutAcross: { edge: "top edge of the plies", offsets: [3, 8.25], stagger: null, drivenFrom: null } })) };
    const { text, pages } = await fieldSheetText(result, run.job, "in-line");
    expect(pages).toBe(1);
    expect(text).toContain("2 per row at 3 in and 8-1/4 in from the top edge of the plies, from either face");
    expect(text).not.toContain("Joint plate across the contact");
    expect(text).not.toContain("stagger");
  });

  test("without it: the least distances on the joint's line, and that the positions across are the engineer's to set; nothing invented", async () => {
    // Every discrete schedule has one now: taken out of a copy of the result to test the path.
    const result = { ...run.result, schedules: run.result.schedules.map(({ layoutAcross: _, ...s }) => s) };
    const { text, pages } = await fieldSheetText(result, run.job, "without");
    expect(pages).toBe(1);
    expect(text).toContain("2 per row side by side at least 3 in apart, at least 3 in from every edge");
    expect(text).toContain("The engineer of record sets where rows sit across the contact");
    expect(text).not.toContain("Joint plate across the contact");
    expect(text).not.toContain("either face");
    expect(text).not.toContain("from the top edge");
  });
});

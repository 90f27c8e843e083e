// A worksheet's bytes, its text layer included, must not depend on what the same thread drew before it:
// the service's design threads and a batch's workers draw many worksheets with one copy of the fonts.
// Found when a batch's worksheet of `stud-pack-wind.us` read "10 ⁸" in its text where the page showed
// "10¹⁸" (fontkit keeps a glyph with the characters it was first decoded for; see forgetGlyphs in
// server/pdf/sheet.ts).
import { execFileSync } from "node:child_process";
import { mkdtempSync, rmSync, writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { afterAll, describe, expect, test, vi } from "vitest";
import { designInUnits } from "../../server/design-in-units.js";
import { exampleJobs } from "../example-jobs.js";

const PRINT_DATE = "2025-03-14";
const work = mkdtempSync(join(tmpdir(), "stitchplan-text-layer-"));
afterAll(() => rmSync(work, { recursive: true, force: true }));

const runs = exampleJobs().map(({ file, job }) => ({ file, run: designInUnits(job) }));
type Run = (typeof runs)[number];

/** The worksheet module as a thread that has drawn nothing yet has it (its fonts not parsed). */
async function freshRenderer() {
  vi.resetModules();
  return import("../../server/pdf/worksheet.js");
}

const both = async (renderer: Awaited<ReturnType<typeof freshRenderer>>, { run }: Run) =>
  Buffer.concat([await renderer.renderWorksheet(run.job, run.result, { printDate: PRINT_DATE }), await renderer.renderFieldSheet(run.job, run.result, { printDate: PRINT_DATE })]);

describe("worksheets drawn one after another on one thread", () => {
  test("every example's worksheet and field sheet are byte for byte those of a thread that drew nothing before", async () => {
    const first = new Map<string, Buffer>();
    for (const r of runs) first.set(r.file, await both(await freshRenderer(), r));
    // Each example after every other one, in two orders.
    for (const order of [runs, [...runs].reverse()]) {
      const renderer = await freshRenderer();
      for (const r of order) expect((await both(renderer, r)).equals(first.get(r.file)!), r.file).toBe(true);
    }
  }, 120_000);

  test("the text layer keeps its superscripts after another member's worksheet (pdftotext)", async () => {
    const renderer = await freshRenderer();
    // This worksheet's fonts, embedded, left the superscript one without its character for the next document.
    await both(renderer, runs.find((r) => r.file === "bracing-double-channel.si.json")!);
    const job = structuredClone(exampleJobs().find((e) => e.file === "workshop-box-beam.si.json")!.job) as { member: { description: string }; beam: { loads: { label?: string }[] } };
    // Written in the title block and in the table of loads (two of the worksheet's fonts).
    job.member.description = "Test beam 10¹⁸, π²EI/l²";
    job.beam.loads[0]!.label = "Test load 10¹⁸, π²EI/l²";
    const { job: shown, result } = designInUnits(job);
    const file = join(work, "after.pdf");
    writeFileSync(file, await renderer.renderWorksheet(shown, result, { printDate: PRINT_DATE }));
    const text = execFileSync("pdftotext", ["-layout", file, "-"], { encoding: "utf8" });
    expect(text).toContain("Test beam 10¹⁸, π²EI/l²");
    expect(text).toContain("Test load 10¹⁸, π²EI/l²");
  }, 120_000);
});

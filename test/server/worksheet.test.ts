import { execFileSync } from "node:child_process";
import { mkdtempSync, readdirSync, readFileSync, rmSync, writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { afterAll, describe, expect, test } from "vitest";
import { buildApp } from "../../server/app.js";
import { runDesign, type DesignRun } from "../../server/design-service.js";
import { numberText } from "../../server/pdf/quantity-text.js";
import { REVIEW_NOTICE } from "../../server/pdf/title-block.js";
import { renderWorksheet, worksheetFileName } from "../../server/pdf/worksheet.js";

const EXAMPLES = join(import.meta.dirname, "../../fixtures/examples");
const PRINT_DATE = "2025-03-14";
const work = mkdtempSync(join(tmpdir(), "stitchplan-worksheet-"));
afterAll(() => rmSync(work, { recursive: true, force: true }));

const examples = readdirSync(EXAMPLES)
  .filter((f) => f.endsWith(".json"))
  .sort()
  .map((file) => ({ name: file.replace(/\.json$/, ""), job: JSON.parse(readFileSync(join(EXAMPLES, file), "utf8")) as Record<string, unknown> }));

/** pdftotext breaks lines where the page does; compare with runs of white space collapsed. */
const flat = (s: string) => s.replace(/\s+/g, " ").trim();

interface Rendered {
  pdf: Buffer;
  text: string;
  pageTexts: string[];
  file: string;
  milliseconds: number;
}

async function render(name: string, input: unknown): Promise<Rendered & { run: DesignRun }> {
  const run = runDesign(input);
  const started = performance.now();
  const pdf = await renderWorksheet(run.job, run.result, { printDate: PRINT_DATE });
  const milliseconds = performance.now() - started;
  const file = join(work, `${name}.pdf`);
  writeFileSync(file, pdf);
  const raw = execFileSync("pdftotext", ["-enc", "UTF-8", file, "-"], { encoding: "utf8" });
  const text = flat(raw);
  const pageTexts = raw.split("\f").map(flat);
  return { run, pdf, text, pageTexts, file, milliseconds };
}

/** Renders every page to a greyscale PGM and returns, per page, the dark pixels inside the body (between title block and footer). */
function darkPixelsInBody(file: string, prefix: string): number[] {
  const dpi = 50;
  execFileSync("pdftoppm", ["-r", String(dpi), "-gray", file, join(work, prefix)]);
  const pages = readdirSync(work)
    .filter((f) => f.startsWith(`${prefix}-`) && f.endsWith(".pgm"))
    .sort();
  return pages.map((f) => {
    const image = readPgm(readFileSync(join(work, f)));
    const top = Math.ceil((104 * dpi) / 72);
    const bottom = image.height - Math.ceil((74 * dpi) / 72);
    let dark = 0;
    for (let y = top; y < bottom; y++) for (let x = 0; x < image.width; x++) if (image.pixels[y * image.width + x]! < 160) dark++;
    return dark;
  });
}

/** Binary PGM (P5, 8-bit): header of four white-space separated fields, then one byte per pixel. */
function readPgm(bytes: Buffer): { width: number; height: number; pixels: Uint8Array } {
  const fields: string[] = [];
  let i = 0;
  while (fields.length < 4) {
    while (/\s/.test(String.fromCharCode(bytes[i]!))) i++;
    let field = "";
    while (!/\s/.test(String.fromCharCode(bytes[i]!))) field += String.fromCharCode(bytes[i++]!);
    fields.push(field);
  }
  const [magic, width, height] = fields;
  if (magic !== "P5") throw new Error(`not a binary PGM: ${magic}`);
  return { width: Number(width), height: Number(height), pixels: bytes.subarray(i + 1) };
}

/** Strongly red pixels on page 1 (binary PPM): the colour the worksheet keeps for what fails. */
function redPixelsOnPageOne(file: string, prefix: string): number {
  execFileSync("pdftoppm", ["-r", "40", "-f", "1", "-l", "1", file, join(work, prefix)]);
  const ppm = readdirSync(work).find((f) => f.startsWith(`${prefix}-`) && f.endsWith(".ppm"))!;
  const bytes = readFileSync(join(work, ppm));
  const header = bytes.toString("latin1", 0, 40).match(/^P6\s+(\d+)\s+(\d+)\s+(\d+)\s/);
  if (!header) throw new Error("not a binary PPM");
  let red = 0;
  for (let p = header[0].length; p + 2 < bytes.length; p += 3) if (bytes[p]! > 140 && bytes[p + 1]! < 90 && bytes[p + 2]! < 90) red++;
  return red;
}

function pageSize(file: string): string {
  const info = execFileSync("pdfinfo", [file], { encoding: "utf8" });
  return info.match(/Page size:\s+([\d.]+ x [\d.]+)/)?.[1] ?? "";
}

describe("renderWorksheet(job, result) on every example", () => {
  test.each(examples)("$name: the text a reviewer reads is all there", async ({ name, job }) => {
    const { run, text, pageTexts, file, milliseconds } = await render(name, job);
    const { result } = run;
    console.log(`worksheet ${name}: ${pageTexts.filter(Boolean).length} pages, rendered in ${milliseconds.toFixed(0)} ms`);

    expect(text).toContain(run.job.member.mark);
    expect(text).toContain(flat(run.job.project.name));
    expect(text).toContain(flat(REVIEW_NOTICE));
    expect(text).toContain("Page 1 of");
    expect(text).toMatch(/[τ≤]/);
    expect(result.fingerprint).toMatch(/^[0-9a-f]{64}$/);

    const schedule = result.schedules.find((s) => s.zones.length > 0);
    if (schedule) expect(text).toContain(`${numberText(schedule.zones[0]!.spacing)} ${result.unitLabels.length}`);
    for (const b of result.bondLines) expect(text).toContain(`τ max = ${numberText(b.maxStress)} ${result.unitLabels.stress}`);
    expect(result.schedules.length + result.bondLines.length).toBeGreaterThan(0);

    const pages = pageTexts.filter(Boolean);
    pages.forEach((page, i) => {
      expect(page, `page ${i + 1}`).toContain(`Page ${i + 1} of ${pages.length}`);
      expect(page, `page ${i + 1}`).toContain(result.fingerprint!);
      expect(page, `page ${i + 1}`).toContain(flat(REVIEW_NOTICE));
    });
    for (const item of [...result.notChecked, ...result.standards]) expect(text).toContain(flat(item));

    expect(pageSize(file)).toBe(run.job.units === "us" ? "612 x 792" : "595.28 x 841.89");
  });

  test.each(examples)("$name: every page has something drawn in its body", async ({ name, job }) => {
    const { file, pageTexts } = await render(`${name}-pages`, job);
    const dark = darkPixelsInBody(file, `${name}-page`);
    expect(dark.length).toBe(pageTexts.filter(Boolean).length);
    dark.forEach((count, i) => expect(count, `page ${i + 1} body`).toBeGreaterThan(50));
  });

  test("the same job and print date give the same bytes", async () => {
    const { job } = examples[0]!;
    const run = runDesign(job);
    const a = await renderWorksheet(run.job, run.result, { printDate: PRINT_DATE });
    const b = await renderWorksheet(run.job, run.result, { printDate: PRINT_DATE });
    expect(a.equals(b)).toBe(true);
  });
});

describe("renderWorksheet(job, result) on failing jobs", () => {
  const base = examples.find((e) => (e.job as { connectors: { kind: string }[] }).connectors.some((c) => c.kind === "rated"));
  const glued = examples.find((e) => (e.job as { connectors: { kind: string }[] }).connectors.every((c) => c.kind === "glue"));

  test.runIf(base)("an overloaded nailed member prints its infeasible schedule under a red statement", async () => {
    const job = structuredClone(base!.job) as { beam: { loads: { w?: number; P?: number }[] } };
    for (const load of job.beam.loads) {
      if (load.w !== undefined) load.w *= 4;
      if (load.P !== undefined) load.P *= 4;
    }
    const { run, text, file } = await render("overloaded", job);
    expect(run.result.status.passes).toBe(false);
    expect(text).toContain("DOES NOT PASS");
    expect(text).toContain("THIS SCHEDULE DOES NOT CARRY THE SHEAR FLOW");
    const infeasible = run.result.schedules.find((s) => s.infeasible);
    if (infeasible) {
      expect(text).toContain("INFEASIBLE");
      for (const option of infeasible.infeasible!.options) expect(text).toContain(flat(option));
    }
    expect(redPixelsOnPageOne(file, "overloaded-red")).toBeGreaterThan(200);
  });

  test.runIf(glued)("an overstressed bond line prints τ > f and FAILS in red", async () => {
    const job = structuredClone(glued!.job) as { connectors: { shearStrength: number }[] };
    for (const c of job.connectors) c.shearStrength = 0.01;
    const { run, text, file } = await render("weak-glue", job);
    expect(run.result.status.passes).toBe(false);
    expect(text).toMatch(/τ max = [^>]+ > f = /);
    expect(text).toContain("FAILS");
    expect(redPixelsOnPageOne(file, "weak-glue-red")).toBeGreaterThan(200);
  });

  test("a passing example has no red on page 1", async () => {
    const passing = examples.find((e) => runDesign(e.job).result.status.passes);
    if (!passing) return;
    const { file } = await render("passing-red", passing.job);
    expect(redPixelsOnPageOne(file, "passing-red")).toBe(0);
  });
});

describe("POST /api/worksheets", () => {
  test("answers a PDF attachment named after the job", async () => {
    const app = await buildApp();
    try {
      const { job } = examples[0]!;
      const res = await app.inject({ method: "POST", url: "/api/worksheets", payload: job });
      expect(res.statusCode).toBe(200);
      expect(res.headers["content-type"]).toContain("application/pdf");
      expect(res.rawPayload.subarray(0, 5).toString("latin1")).toBe("%PDF-");
      expect(res.headers["content-disposition"]).toContain(`filename="${worksheetFileName(runDesign(job).job)}"`);
    } finally {
      await app.close();
    }
  });
});

import { execFileSync } from "node:child_process";
import { mkdtempSync, readdirSync, readFileSync, rmSync, writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { afterAll, describe, expect, test } from "vitest";
import { formatRatio } from "../../core/index.js";
import { buildApp } from "../../server/app.js";
import { runDesign, type DesignRun } from "../../server/design-service.js";
import { FIELD_SHEET_BAND, FIELD_SHEET_HEADING } from "../../server/pdf/field-sheet.js";
import { numberText, quantityText } from "../../server/pdf/quantity-text.js";
import { REVIEW_NOTICE } from "../../server/pdf/title-block.js";
import { renderWorksheet, worksheetFileName } from "../../server/pdf/worksheet.js";
import { COMBINATIONS_IN_FULL } from "../../server/pdf/worksheet-context.js";
import { manyLoadsJob, twelveSpansPatternedJob } from "../job-builders.js";

const EXAMPLES = join(import.meta.dirname, "../../fixtures/examples");
const PRINT_DATE = "2025-03-14";
const work = mkdtempSync(join(tmpdir(), "stitchplan-worksheet-"));
afterAll(() => rmSync(work, { recursive: true, force: true }));

type Job = Record<string, any>;
const examples = readdirSync(EXAMPLES)
  .filter((f) => f.endsWith(".json"))
  .sort()
  .map((file) => ({ name: file.replace(/\.json$/, ""), job: JSON.parse(readFileSync(join(EXAMPLES, file), "utf8")) as Job }));
const example = (name: string) => structuredClone(examples.find((e) => e.name === name)!.job);

/**
 * Pages each example's worksheet had when this was written, the field sheet included. Wording and
 * result fields added in core (an assumption, a combination, a working step) move a section by a
 * page, so a count within two of this passes; a jump past that means something was lost or repeated.
 */
const EXPECTED_PAGES: Record<string, number> = {
  "cover-plate-retrofit.us": 11,
  "girder-intermittent-welds.us": 11,
  "glued-lintel.si": 7,
  "loft-beam-16d.us": 10,
  "mezzanine-edge-beam.si": 12,
  "porch-beam-16d-nds.us": 13,
  // 16 since the column and multi-ply work (16 pages without the layout across the contact); its field sheet takes
  // two pages, its staggered rows drawn across the contact.
  "three-ply-header.us": 16,
  "workshop-box-beam.si": 8,
  // The four-ply column: three joints' schedules and the column section, 20 pages before the field sheet.
  "girder-truss-post.us": 21,
};
const PAGE_SLACK = 2;
/** Field sheets longer than a page: every page of them carries the band and the title block. */
const FIELD_SHEET_PAGES: Record<string, number> = { "three-ply-header.us": 2 };

/** pdftotext breaks lines where the page does; compare with runs of white space collapsed. */
const flat = (s: string) => s.replace(/\s+/g, " ").trim();

interface Rendered {
  run: DesignRun;
  pdf: Buffer;
  text: string;
  pageTexts: string[];
  file: string;
  milliseconds: number;
}

async function render(name: string, input: unknown): Promise<Rendered> {
  const run = runDesign(input);
  const started = performance.now();
  const pdf = await renderWorksheet(run.job, run.result, { printDate: PRINT_DATE });
  const milliseconds = performance.now() - started;
  const file = join(work, `${name}.pdf`);
  writeFileSync(file, pdf);
  const raw = execFileSync("pdftotext", ["-enc", "UTF-8", file, "-"], { encoding: "utf8" });
  const pageTexts = raw.split("\f").map(flat).filter(Boolean);
  console.log(`worksheet ${name}: ${pageTexts.length} pages, rendered in ${milliseconds.toFixed(0)} ms`);
  return { run, pdf, text: flat(raw), pageTexts, file, milliseconds };
}

// Each example is rendered once and read by every test that needs it.
const renders = new Map<string, Promise<Rendered>>();
const rendered = (name: string) => {
  if (!renders.has(name)) renders.set(name, render(name, example(name)));
  return renders.get(name)!;
};

/** Renders every page to a greyscale PGM and returns, per page, the dark pixels inside the body (between title block and footer). */
function darkPixelsInBody(file: string, prefix: string): number[] {
  const dpi = 40;
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

/** Strongly red pixels on one page (binary PPM): the colour the worksheet keeps for what fails. */
function redPixelsOnPage(file: string, prefix: string, page = 1): number {
  execFileSync("pdftoppm", ["-r", "40", "-f", String(page), "-l", String(page), file, join(work, prefix)]);
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

/** The section headings every worksheet has, whatever its joints. */
const EVERY_WORKSHEET = [
  "REVIEW AND SEAL — ENGINEER OF RECORD",
  "Status",
  "Schedule at a glance",
  "Inputs",
  "Materials",
  "Parts",
  "Span and supports",
  "Loads",
  "Load combinations",
  "Connectors",
  "Fastening",
  "Cross-section and joint planes",
  "Section properties",
  "Joints",
  "Shear force V",
  "Bending moment M",
  "Extremes and reactions",
  "Member checks",
  "Not checked",
  "Standards and editions used",
  "Assumptions",
  FIELD_SHEET_BAND,
];

describe("renderWorksheet(job, result) on every example", () => {
  test.each(examples)("$name: every section heading, the seal box, the fingerprint and the notice are there", async ({ name }) => {
    const { run, text, pageTexts, file } = await rendered(name);
    const { result } = run;

    for (const heading of EVERY_WORKSHEET) expect(text, heading).toContain(heading);
    // A joint's id may hold "+" (a held group of two parts): escaped for the pattern.
    for (const s of result.schedules) expect(text).toMatch(new RegExp(`(Connector schedule|Given schedule, checked) — joints? [^—]*\\b${s.joint.replace(/[.*+?^${}()|[\]\\]/g, "\\$&")}\\b`));
    if (result.schedules.length > 0) for (const heading of ["Zones", "Resistance per connector", "Limits used", "Efficiency and row verification"]) expect(text).toContain(heading);
    for (const w of result.welds) expect(text).toContain(`Weld — joint ${w.joint}`);
    if (result.welds.length > 0) for (const heading of ["Weld zones", "Weld resistance per unit length, one fillet", "Weld limits used"]) expect(text).toContain(heading);
    for (const b of result.bondLines) expect(text).toContain(`Bond line — joint ${b.joint}`);
    if (result.multiPly) expect(text).toContain("Side-by-side plies: load shares and what each interface passes");
    if (result.composite) expect(text).toContain("Composite action —");
    if (result.stretches.length > 0) expect(text).toContain("Section along the member");
    if (result.terminations.length > 0) expect(text).toContain("Ends of parts that stop short");
    if (result.column) for (const heading of ["Built-up column:", ...(result.column.applies ? ["Buckling about", "Interaction"] : ["Not designed as a column"])]) expect(text).toContain(heading);
    expect(result.schedules.length + result.bondLines.length + result.welds.length).toBeGreaterThan(0);

    expect(text).toContain(run.job.member.mark);
    expect(text).toContain(flat(run.job.project.name));
    expect(text).toMatch(/[τ≤]/);
    expect(result.fingerprint).toMatch(/^[0-9a-f]{64}$/);
    const schedule = result.schedules.find((s) => s.zones.length > 0);
    if (schedule) expect(text).toContain(`${numberText(schedule.zones[0]!.spacing)} ${result.unitLabels.length}`);
    for (const b of result.bondLines) expect(text).toContain(`τ max = ${numberText(b.maxStress)} ${result.unitLabels.stress}`);
    // pdftotext drops a hyphen that ends a line and keeps a dash with a space after it: compare without either.
    const undashed = (x: string) => flat(x).replace(/[-–]\s*/g, "");
    for (const item of [...result.notChecked, ...result.standards, ...result.assumptions]) expect(undashed(text)).toContain(undashed(item));

    // The field sheet is the last page (pages, for the few named), and every page of it carries the band.
    const fieldPages = FIELD_SHEET_PAGES[name] ?? 1;
    expect(pageTexts.filter((page) => page.includes(FIELD_SHEET_BAND))).toHaveLength(fieldPages);
    pageTexts.slice(-fieldPages).forEach((page, i) => {
      expect(page, `field sheet page ${i + 1}`).toContain(FIELD_SHEET_BAND);
      expect(page, `field sheet page ${i + 1}`).toContain(FIELD_SHEET_HEADING);
    });
    pageTexts.forEach((page, i) => {
      expect(page, `page ${i + 1}`).toContain(`Page ${i + 1} of ${pageTexts.length}`);
      expect(page, `page ${i + 1}`).toContain(result.fingerprint!);
      expect(page, `page ${i + 1}`).toContain(flat(REVIEW_NOTICE));
    });
    expect(pageSize(file)).toBe(run.job.units === "us" ? "612 x 792" : "595.28 x 841.89");
  });

  test.each(examples)("$name: the page count is as expected and every page has something drawn in its body", async ({ name }) => {
    const { file, pageTexts } = await rendered(name);
    const expected = EXPECTED_PAGES[name];
    // An example added after this table: a whole worksheet is never under 5 pages nor over 20.
    if (expected === undefined) expect(pageTexts.length).toBeGreaterThanOrEqual(5);
    else expect(Math.abs(pageTexts.length - expected), `${pageTexts.length} pages, expected about ${expected}`).toBeLessThanOrEqual(PAGE_SLACK);
    expect(pageTexts.length).toBeLessThanOrEqual(Math.max(20, (expected ?? 0) + PAGE_SLACK));
    const dark = darkPixelsInBody(file, `${name}-page`);
    expect(dark.length).toBe(pageTexts.length);
    dark.forEach((count, i) => expect(count, `page ${i + 1} body`).toBeGreaterThan(50));
  });

  test("the same job and print date give the same bytes", async () => {
    const { name, job } = examples[0]!;
    const { pdf } = await rendered(name);
    const run = runDesign(job);
    const again = await renderWorksheet(run.job, run.result, { printDate: PRINT_DATE });
    expect(again.equals(pdf)).toBe(true);
  });
});

describe("renderWorksheet(job, result) on welded joints", () => {
  test("the intermittent girder prints every weld zone with its segment and pitch, the weld deposited and its arrangement", async () => {
    const { run, text } = await rendered("girder-intermittent-welds.us");
    const q = quantityText(run.result.unitLabels);
    expect(run.result.welds.length).toBeGreaterThan(0);
    for (const w of run.result.welds) {
      expect(text).toContain(`Weld — joint ${w.joint}`);
      for (const z of w.zones) {
        expect(text).toContain(q.range(z.from, z.to));
        if (z.segmentLength !== null && z.pitch !== null) expect(text).toContain(`${q.of(z.segmentLength, "length")} @ ${q.of(z.pitch, "length")}`);
      }
      expect(text).toContain(`Weld deposited, all fillets on all lines ${q.of(w.weldLength, "span")}`);
      expect(text).toContain(`Largest utilisation ${formatRatio(w.utilisation)} ≤ 1.00`);
    }
    expect(text).toContain("intermittent segments staggered from one side to the other");
  });

  test("a check-mode girder with too long a pitch near the support says the weld is the given one and prints the failing zone", async () => {
    const job = example("girder-intermittent-welds.us");
    job.mode = "check";
    job.fastening.default.provided = { type: "zones", zones: [{ from: 0, to: 12, spacing: 6 }, { from: 12, to: 24, spacing: 9 }, { from: 24, to: 36, spacing: 6 }] };
    const { run, text, file } = await render("girder-check", job);
    expect(run.result.mode).toBe("check");
    expect(text).toContain("CONNECTOR SCHEDULE CHECK WORKSHEET");
    expect(text).toContain("CHECK OF GIVEN SCHEDULES");
    const failing = run.result.welds.flatMap((w) => w.zones.filter((z) => !z.passes).map((z) => ({ w, z })));
    expect(failing.length).toBeGreaterThan(0);
    for (const w of run.result.welds) expect(text).toContain(`Given weld, checked — joint ${w.joint}`);
    expect(text).toContain("Weld zones given");
    expect(text).toContain("The given weld does not carry the shear flow");
    for (const { z } of failing) for (const k of z.failingCombinations) expect(text).toMatch(new RegExp(`FAILS under [^|]*${k}`));
    expect(text).toContain("2 in @ 6 in");
    expect(redPixelsOnPage(file, "girder-check-red")).toBeGreaterThan(200);
  });

  test("a continuous weld too small for the flow prints the leg size it would need in red", async () => {
    const job = example("girder-intermittent-welds.us");
    job.connectors[0] = { id: "FW", kind: "fillet-weld", standard: "AISC-360-16", leg: 0.1875, electrode: "E70", pattern: "continuous", source: "3/16 in E70, continuous" };
    for (const load of job.beam.loads) {
      if (load.w !== undefined) load.w *= 3;
      if (load.P !== undefined) load.P *= 3;
    }
    const { run, text } = await render("girder-continuous-small", job);
    const w = run.result.welds[0]!;
    expect(w.passes).toBe(false);
    expect(w.sizeNote).not.toBeNull();
    expect(text).toContain(flat(w.sizeNote!));
    expect(text).toContain(`Leg size a continuous weld would need ${quantityText(run.result.unitLabels).of(w.sizeNeeded!, "length")}`);
    expect(text).toMatch(/Largest utilisation [\d.]+ > 1\.00/);
  });
});

describe("renderWorksheet(job, result) in check mode", () => {
  const checkJob = (zones: { from: number; to: number; spacing: number }[]) => {
    const job = example("workshop-box-beam.si");
    job.mode = "check";
    job.fastening.default.provided = { type: "zones", zones };
    return job;
  };

  test("a given schedule sparse near the supports is headed as given and checked, with the worst row per combination and the failing zone", async () => {
    const { run, text, file } = await render(
      "box-beam-check",
      checkJob([
        { from: 0, to: 1.2, spacing: 40 },
        { from: 1.2, to: 3.6, spacing: 100 },
        { from: 3.6, to: 4.8, spacing: 40 },
      ]),
    );
    const s = run.result.schedules[0]!;
    expect(s.mode).toBe("check");
    expect(s.passes).toBe(false);
    expect(text).toContain("CONNECTOR SCHEDULE CHECK WORKSHEET");
    expect(text).toMatch(/Given schedule, checked — joints (bottom and top|top and bottom)/);
    expect(text).toContain("This is the schedule given in the job, checked row by row here; it was not designed by this worksheet.");
    expect(text).toContain("THE GIVEN SCHEDULE DOES NOT PASS");
    expect(text).toContain("Zones given");
    expect(text).toContain("Worst row under each combination");
    for (const r of s.perCombination) expect(text).toContain(`${formatRatio(r.maxUtilisation)} ${numberText(r.at)} m`);
    for (const z of s.zones.filter((k) => !k.passes)) expect(text).toContain(`FAILS under ${z.failingCombinations.join(", ")}`);
    expect(text).toContain("Task check the schedules given in the job (check mode)");
    expect(redPixelsOnPage(file, "box-beam-check-red")).toBeGreaterThan(200);
  });

  test("a given spacing below the connector's minimum is printed as a detailing problem in red", async () => {
    const { run, text } = await render("box-beam-check-close", checkJob([{ from: 0, to: 4.8, spacing: 10 }]));
    const s = run.result.schedules[0]!;
    expect(s.detailingProblems.length).toBeGreaterThan(0);
    expect(text).toContain("Detailing problems of the given schedule");
    for (const p of s.detailingProblems) expect(text).toContain(flat(p));
  });
});

describe("renderWorksheet(job, result) with slip-aware composite action", () => {
  test("a nailed I designed with the γ-method says so, with the stiffnesses, γ per flange joint and both connector counts", async () => {
    // A nailed timber I (flanges 120 × 45, web 45 × 200, E = 11 000 MPa) over 5 m; the slip moduli are invented for the demo.
    const job = {
      format: "stitchplan-job",
      version: 1,
      units: "si",
      basis: "factored",
      project: { name: "γ-method demo" },
      member: { mark: "I-1" },
      materials: [{ id: "C24", name: "C24", family: "sawn-timber", E: 11_000, density: 420, strength: { bending: 14.77, shear: 2.46 } }],
      parts: [
        { id: "bottom", material: "C24", shape: { type: "rectangle", b: 120, h: 45 }, x: 0, y: 0 },
        { id: "web", material: "C24", shape: { type: "rectangle", b: 45, h: 200 }, place: { on: "bottom", side: "top" } },
        { id: "top", material: "C24", shape: { type: "rectangle", b: 120, h: 45 }, place: { on: "web", side: "top" } },
      ],
      connectors: [{ id: "N", kind: "rated", label: "3.1 mm nail", resistance: 2000, minSpacing: 31, maxSpacing: 300, slipModulus: 709.32, ultimateSlipModulus: 472.88 }],
      fastening: { default: { connector: "N", rows: 1 } },
      beam: { spans: [5], loads: [{ type: "uniform", w: 4 }] },
      spacing: { module: 5, minZoneLength: 300 },
      compositeAction: { model: "slip-aware" },
    };
    const { run, text } = await render("composite", job);
    const k = run.result.composite!;
    expect(k.model).toBe("slip-aware");
    expect(text).toContain("Composite action — slip-aware (γ-method)");
    expect(text).toContain("rest on the slip-aware model");
    const q = quantityText(run.result.unitLabels);
    expect(text).toContain(`(EI) rigid connection ${q.of(k.stiffness!.rigid, "flexuralRigidity")}`);
    for (const j of k.joints) {
      expect(text).toContain(`${formatRatio(j.gammaServiceability)} / ${formatRatio(j.gammaUltimate)}`);
      expect(text).toContain(`${j.rigidCount} / ${j.slipAwareCount}`);
    }
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
    expect(redPixelsOnPage(file, "overloaded-red")).toBeGreaterThan(200);
  });

  test.runIf(glued)("an overstressed bond line prints τ > f and FAILS in red", async () => {
    const job = structuredClone(glued!.job) as { connectors: { shearStrength: number }[] };
    for (const c of job.connectors) c.shearStrength = 0.01;
    const { run, text, file } = await render("weak-glue", job);
    expect(run.result.status.passes).toBe(false);
    expect(text).toMatch(/τ max = [^>]+ > f = /);
    expect(text).toContain("FAILS");
    expect(redPixelsOnPage(file, "weak-glue-red")).toBeGreaterThan(200);
  });

  test("a passing example has no red on page 1", async () => {
    const passing = examples.find((e) => runDesign(e.job).result.status.passes);
    if (!passing) return;
    const { file } = await rendered(passing.name);
    expect(redPixelsOnPage(file, "passing-red")).toBe(0);
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

describe("worksheets of heavy valid jobs", () => {
  test("twelve spans with nine patterned categories: the combinations that govern are printed in full, the rest summed up by the combination they pattern", { timeout: 120_000 }, async () => {
    const r = await render("twelve-spans-patterned", twelveSpansPatternedJob());
    const combinations = r.run.result.beam.combinations;
    expect(combinations.length).toBeGreaterThan(COMBINATIONS_IN_FULL);
    expect(r.text).toMatch(new RegExp(`${combinations.length} combinations: the \\d+ that govern a result on this worksheet are listed in full; the other \\d+ \\(ASD-1 \\(\\d+ patterns\\)`));
    // Whatever a check or a schedule names as governing is printed with its factors.
    for (const id of [...r.run.result.checks.map((k) => k.combination), ...r.run.result.schedules.map((s) => s.verification.combination)]) {
      // Table cells break an id at its "/" or "-" (and pdftotext drops a hyphen at a line end).
      if (id) expect(r.text.replace(/[\s-]/g, "").includes(id.replace(/-/g, "")), id).toBe(true);
    }
    expect(r.pageTexts.length).toBeLessThan(40);
  });

  test("a note taller than a page (a zone failing under 170 combinations) runs on and ends", { timeout: 120_000 }, async () => {
    const job = manyLoadsJob();
    const r = await render("many-loads", job);
    expect(r.pageTexts.length).toBeLessThan(120);
    expect(r.text).toContain(`${job.beam.loads.length}`);
  });
});

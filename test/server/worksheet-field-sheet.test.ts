import { execFileSync } from "node:child_process";
import { mkdtempSync, readdirSync, readFileSync, rmSync, writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { afterAll, describe, expect, test } from "vitest";
import { builderDimensions, feetInchesText, inchesText } from "../../core/draw/builder-dimensions.js";
import { fieldElevation } from "../../core/draw/field-elevation.js";
import { fieldLayout } from "../../core/draw/field-layout.js";
import { renderSvg } from "../../core/draw/render-svg.js";
import { sectionSketch } from "../../core/draw/section-sketch.js";
import { placeInTiers } from "../../core/draw/label-tiers.js";
import { staggeredSide } from "../../core/spacing/place-rows.js";
import { runDesign, type DesignRun } from "../../server/design-service.js";
import { FIELD_SHEET_BAND, FIELD_SHEET_HEADING } from "../../server/pdf/field-sheet.js";
import { REVIEW_NOTICE } from "../../server/pdf/title-block.js";
import { renderFieldSheet, renderWorksheet } from "../../server/pdf/worksheet.js";

const EXAMPLES = join(import.meta.dirname, "../../fixtures/examples");
const work = mkdtempSync(join(tmpdir(), "stitchplan-field-sheet-"));
afterAll(() => rmSync(work, { recursive: true, force: true }));

type Job = Record<string, any>;
const example = (name: string) => JSON.parse(readFileSync(join(EXAMPLES, `${name}.json`), "utf8")) as Job;
const flat = (s: string) => s.replace(/\s+/g, " ").trim();

interface FieldSheet {
  run: DesignRun;
  file: string;
  pages: number;
  /** Text of the last page, the field sheet. */
  text: string;
  /** Pages that carry the field sheet's band. */
  bandPages: number;
}

/**
 * The field sheet on its own (renderFieldSheet), which is the worksheet's last page set alone: the
 * worksheet tests check that it is the last page and only one, so these need not render the rest.
 */
async function fieldSheetOf(name: string, job: Job): Promise<FieldSheet> {
  const run = runDesign(job);
  const pdf = await renderFieldSheet(run.job, run.result, { printDate: "2025-03-14" });
  const file = join(work, `${name}.pdf`);
  writeFileSync(file, pdf);
  const pageTexts = execFileSync("pdftotext", ["-enc", "UTF-8", file, "-"], { encoding: "utf8" }).split("\f").map(flat).filter(Boolean);
  return { run, file, pages: pageTexts.length, text: pageTexts[pageTexts.length - 1]!, bandPages: pageTexts.filter((t) => t.includes(FIELD_SHEET_BAND)).length };
}

/** Pixels of one page at 40 dpi: how many are dark, and how many strongly red. */
function inkOnPage(file: string, page: number, prefix: string): { dark: number; red: number } {
  execFileSync("pdftoppm", ["-r", "40", "-f", String(page), "-l", String(page), file, join(work, prefix)]);
  const ppm = readdirSync(work).find((f) => f.startsWith(`${prefix}-`) && f.endsWith(".ppm"))!;
  const bytes = readFileSync(join(work, ppm));
  const header = bytes.toString("latin1", 0, 40).match(/^P6\s+(\d+)\s+(\d+)\s+(\d+)\s/);
  if (!header) throw new Error("not a binary PPM");
  let dark = 0;
  let red = 0;
  for (let p = header[0].length; p + 2 < bytes.length; p += 3) {
    const [r, g, b] = [bytes[p]!, bytes[p + 1]!, bytes[p + 2]!];
    if (r + g + b < 3 * 160) dark++;
    if (r > 140 && g < 90 && b < 90) red++;
  }
  return { dark, red };
}

describe("builderDimensions(system): dimensions as a builder reads them", () => {
  test("inches print to the sixteenth as a tape reads, rounded the safe way when asked", () => {
    expect(inchesText(2.5)).toBe("2-1/2");
    expect(inchesText(0.9375)).toBe("15/16");
    expect(inchesText(3)).toBe("3");
    expect(inchesText(1.625)).toBe("1-5/8");
    // An end distance of 2.43 in is a least value: up to 2-7/16; a spacing of 2.43 in is a greatest value: down to 2-3/8.
    expect(inchesText(2.43, "up")).toBe("2-7/16");
    expect(inchesText(2.43, "down")).toBe("2-3/8");
    expect(inchesText(0.592, "up")).toBe("5/8");
  });

  test("positions along a US member print in feet and inches; SI in whole millimetres", () => {
    expect(feetInchesText(26)).toBe(`2'-2"`);
    expect(feetInchesText(168)).toBe(`14'-0"`);
    expect(feetInchesText(1.625)).toBe(`0'-1 5/8"`);
    const us = builderDimensions("us");
    expect(us.position(2.1666666667)).toBe(`2'-2"`);
    expect(us.position(0)).toBe("0");
    expect(us.length(2.5)).toBe("2-1/2 in");
    const si = builderDimensions("si");
    expect(si.position(2.1666666667)).toBe("2,167");
    expect(si.length(55)).toBe("55 mm");
    expect(si.run(8.1)).toBe("8,100 mm");
  });

  test("placeInTiers(labels) keeps labels that would overlap in different tiers and clear of what is drawn", () => {
    const placed = placeInTiers(
      [
        { x: 10, width: 30 },
        { x: 30, width: 30 },
        { x: 80, width: 20 },
      ],
      0,
      200,
      4,
      [{ left: 75, right: 85 }],
    );
    expect(placed.map((p) => p.tier)).toEqual([0, 1, 1]);
    expect(placed[0]!.anchor).toBe("start");
  });
});

describe("fieldElevation(input) and sectionSketch(result): plain drawings the page can show too", () => {
  const names = readdirSync(EXAMPLES).filter((f) => f.endsWith(".json")).map((f) => f.replace(/\.json$/, ""));
  test.each(names)("%s: finite geometry, one strip per joint layout, every joint named in the sketch", (name) => {
    const run = runDesign(example(name));
    const joints = fieldLayout(run.result, {});
    const drawing = fieldElevation(
      {
        dims: builderDimensions(run.result.units),
        length: run.result.beam.length,
        spans: run.result.beam.spans,
        supports: run.result.beam.supports,
        pointLoads: run.job.beam.loads.flatMap((l) => (l.type === "point" ? [{ at: l.at, label: l.label }] : [])),
        joints,
      },
      { width: 515 },
    );
    const svg = renderSvg(drawing);
    expect(svg).not.toMatch(/NaN|Infinity|undefined/);
    expect(drawing.items.filter((i) => i.role === "joint-title")).toHaveLength(joints.length);
    expect(joints.flatMap((j) => j.joints).sort()).toEqual(run.result.joints.map((j) => j.id).sort());
    const sketch = renderSvg(sectionSketch(run.result, { width: 190, height: 112 }));
    expect(sketch).not.toMatch(/NaN|Infinity|undefined/);
    for (const j of run.result.joints) expect(sketch).toContain(`joint ${j.id}`);
  });
});

describe("the field sheet at the end of the worksheet", () => {
  test("a nailed SI box beam: one page with the band, every zone spacing, the boundaries from END A and the end distances", async () => {
    const { run, file, pages, text, bandPages } = await fieldSheetOf("box-beam", example("workshop-box-beam.si"));
    const dims = builderDimensions("si");
    expect(bandPages).toBe(1);
    expect(text).toContain(FIELD_SHEET_BAND);
    expect(text).toContain(FIELD_SHEET_HEADING);
    expect(text).toContain(flat(REVIEW_NOTICE));
    expect(text).toContain(run.result.fingerprint!);
    expect(text).toContain(`Page ${pages} of ${pages}`);
    expect(text).toContain("END A");
    expect(text).toContain("END B");
    for (const s of run.result.schedules) {
      for (const z of s.zones) {
        expect(text).toContain(`@ ${z.spacing} mm`);
        expect(text).toContain(dims.position(z.to));
      }
      const e = s.limits.endDistance;
      expect(text).toContain(`1st row ${e} mm from END A`);
      expect(text).toContain(`last row ${e} mm from END B`);
    }
    // The point load is marked with what it is and where.
    const point = run.job.beam.loads.find((l) => l.type === "point");
    if (point && point.type === "point") expect(text).toContain(`(${dims.position(point.at)})`);
    expect(text).toContain("4,800 mm overall");
    expect(inkOnPage(file, pages, "box-beam-ink").dark).toBeGreaterThan(2000);
    expect(inkOnPage(file, pages, "box-beam-red").red).toBe(0);
  });

  test("a US nailed beam prints spacings in inches and zone boundaries in feet and inches", async () => {
    const { run, text, bandPages } = await fieldSheetOf("loft-beam", example("loft-beam-16d.us"));
    const dims = builderDimensions("us");
    expect(bandPages).toBe(1);
    const s = run.result.schedules[0]!;
    for (const z of s.zones) {
      expect(text).toContain(`@ ${dims.length(z.spacing, "down")}`);
      expect(text).toContain(dims.position(z.from));
    }
    // 16d common nails: first row 1-5/8 in from each end (the schedule's end distance, 1.625 in).
    expect(s.limits.endDistance).toBeCloseTo(1.625, 9);
    expect(text).toContain("1st row 1-5/8 in from END A");
    expect(text).toContain("last row 1-5/8 in from END B");
    expect(text).toContain(`12'-0" overall`);
  });

  test("the welded girder draws its segments by zone: segment @ pitch, segments each side and a segment at each end", async () => {
    const { run, text, bandPages } = await fieldSheetOf("girder", example("girder-intermittent-welds.us"));
    const dims = builderDimensions("us");
    expect(bandPages).toBe(1);
    expect(text).toContain("3/16 in E70 fillet weld");
    expect(text).toContain("segments staggered side to side");
    for (const z of run.result.welds[0]!.zones) expect(text).toContain(`${dims.length(z.segmentLength!, "up")} @ ${dims.length(z.pitch!, "down")}`);
    expect(text).toContain("a segment starts at END A");
    expect(text).toContain("a segment ends at END B");
    expect(text).toContain(`column above (14'-0")`);
    // The segments add up to the weld deposited: the near side's (per zone) and the far side's, a staggered
    // weld's far side having one at each end and one between each two near-side segments, each side
    // with half the fillets: (near + far) × length × fillets/2 × lines.
    const w = run.result.welds[0]!;
    const joint = fieldLayout(run.result, {})[0]!;
    const near = joint.zones.reduce((n, z) => n + z.rows, 0);
    const far = staggeredSide(w.positions).length;
    expect(w.positions.length).toBe(near);
    expect(far).toBe(near + 1);
    expect((near + far) * w.zones[0]!.segmentLength! * (w.fillets / 2) * w.lineCount).toBeCloseTo(w.weldLength * 12, 6);
  });

  test("a cover plate over part of the span is laid out from the plate's own ends, with no connectors drawn where there is no plate", async () => {
    const { run, text } = await fieldSheetOf("cover-plate", example("cover-plate-retrofit.us"));
    const dims = builderDimensions("us");
    const joint = run.result.joints.find((j) => j.extent)!;
    expect(joint).toBeDefined();
    const s = run.result.schedules.find((k) => k.joint === joint.id)!;
    const first = (s.positions[0]! - joint.extent!.from) * 12;
    const last = (joint.extent!.to - s.positions[s.positions.length - 1]!) * 12;
    expect(text).toContain(`1st row ${dims.length(first, "up")} from the end of ${joint.held.join(", ")} at ${dims.position(joint.extent!.from)}`);
    expect(text).toContain(`last row ${dims.length(last, "up")} from the end of ${joint.held.join(", ")} at ${dims.position(joint.extent!.to)}`);
    expect(text).toContain("no connectors here");
    expect(text).toContain(`${dims.position(joint.extent!.from)} to ${dims.position(joint.extent!.to)} from END A`);
  });

  test("the glued lintel shows its bond line over the whole length", async () => {
    const { text, bandPages } = await fieldSheetOf("lintel", example("glued-lintel.si"));
    expect(bandPages).toBe(1);
    expect(text).toContain("glued over the whole length");
    expect(text).toContain("Bond line — Joint");
  });

  test("a check-mode job says the layout is the one given; a failing one says not to build from it, in red", async () => {
    const job = example("workshop-box-beam.si");
    job.mode = "check";
    job.fastening.default.provided = { type: "zones", zones: [{ from: 0, to: 1.2, spacing: 40 }, { from: 1.2, to: 3.6, spacing: 100 }, { from: 3.6, to: 4.8, spacing: 40 }] };
    const { run, file, pages, text } = await fieldSheetOf("box-beam-check", job);
    expect(run.result.status.passes).toBe(false);
    expect(text).toContain("GIVEN SCHEDULE, AS CHECKED");
    expect(text).toContain("(given schedule, checked)");
    expect(text).toContain("DOES NOT PASS — DO NOT BUILD FROM THIS SHEET");
    for (const failure of run.result.status.failures) expect(text).toContain(flat(failure));
    for (const z of run.result.schedules[0]!.zones.filter((k) => !k.passes)) expect(text).toContain(`@ ${z.spacing} mm — FAILS`);
    expect(inkOnPage(file, pages, "box-beam-check-red").red).toBeGreaterThan(200);
  });

  test("three 16d nails across a 1-1/2 in web edge cannot be built: nothing is drawn for those joints and the sheet says why (issue 16 §2)", async () => {
    const job = example("porch-beam-16d-nds.us");
    job.fastening.default.rows = 3;
    const { run, text } = await fieldSheetOf("porch-three-across", job);
    expect(run.result.status.passes).toBe(false);
    expect(fieldLayout(run.result, {})).toEqual([]);
    expect(text).toContain("DOES NOT PASS — DO NOT BUILD FROM THIS SHEET");
    for (const id of ["top", "bottom"]) expect(text).toContain(`Joint ${id} cannot be built as designed`);
    // 2 × 2.5D + 2 × 5D with D = 0.162 in (REFERENCES §5.4 [V]; the code's nail spacings [CP]) = 2.43 in, on a 1.5 in edge.
    expect(text).toContain("need 2.43 in across the contact");
    expect(text).toContain("which is only 1.5 in wide");
    expect(text).not.toMatch(/1st row .* from END A/);
  });

  test("a field sheet that takes two pages has the band, the title block and the notice on each", async () => {
    // The three-ply header's staggered rows are drawn across the contact: its field sheet runs on to a second page.
    const { run, file } = await fieldSheetOf("two-pages", example("three-ply-header.us"));
    const pageTexts = execFileSync("pdftotext", ["-enc", "UTF-8", file, "-"], { encoding: "utf8" }).split("\f").map(flat).filter(Boolean);
    expect(pageTexts.length).toBeGreaterThan(1);
    pageTexts.forEach((page, i) => {
      for (const t of [FIELD_SHEET_BAND, FIELD_SHEET_HEADING, flat(REVIEW_NOTICE), run.result.fingerprint!, run.job.member.mark, `Page ${i + 1} of ${pageTexts.length}`]) expect(page, `page ${i + 1}`).toContain(t);
    });
  });

  test("the field sheet alone is the worksheet's last page, word for word but for the page number", async () => {
    const name = "mezzanine-edge-beam.si";
    const { text, pages } = await fieldSheetOf("field-only", example(name));
    expect(pages).toBe(1);
    const run = runDesign(example(name));
    const file = join(work, "whole.pdf");
    writeFileSync(file, await renderWorksheet(run.job, run.result, { printDate: "2025-03-14" }));
    const whole = execFileSync("pdftotext", ["-enc", "UTF-8", file, "-"], { encoding: "utf8" }).split("\f").map(flat).filter(Boolean);
    const last = whole[whole.length - 1]!;
    expect(last.replace(/Page \d+ of \d+/, "")).toBe(text.replace("Page 1 of 1", ""));
    for (const t of [FIELD_SHEET_HEADING, FIELD_SHEET_BAND, flat(REVIEW_NOTICE), run.result.fingerprint!, "Page 1 of 1", run.job.member.mark]) expect(text).toContain(t);
  });
});

import { execFileSync } from "node:child_process";
import { mkdtempSync, readFileSync, rmSync, writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { afterAll, describe, expect, test } from "vitest";
import { runDesign } from "../../server/design-service.js";
import { renderWorksheet } from "../../server/pdf/worksheet.js";

const EXAMPLES = join(import.meta.dirname, "../../fixtures/examples");
const work = mkdtempSync(join(tmpdir(), "stitchplan-us-units-"));
afterAll(() => rmSync(work, { recursive: true, force: true }));

const flat = (s: string) => s.replace(/\s+/g, " ").trim();

async function worksheetText(name: string) {
  const run = runDesign(JSON.parse(readFileSync(join(EXAMPLES, `${name}.json`), "utf8")));
  const file = join(work, `${name}.pdf`);
  writeFileSync(file, await renderWorksheet(run.job, run.result, { printDate: "2025-03-14" }));
  return { run, text: flat(execFileSync("pdftotext", ["-enc", "UTF-8", "-layout", file, "-"], { encoding: "utf8" })) };
}

describe("worksheet in US units: steel in kips and ksi, timber in pounds and psi", () => {
  test("steel cover-plate retrofit: member checks in ksi, connector resistance in kips, the job's inputs as entered", { timeout: 60_000 }, async () => {
    const { run, text } = await worksheetText("cover-plate-retrofit.us");
    const bending = run.result.checks.find((k) => k.id === "bending-A992")!;
    // 1 ksi = 1000 psi [V] (AISC 360-16 nomenclature).
    expect(text).toContain(`${(bending.demand / 1000).toPrecision(4)} ksi`);
    expect(text).toMatch(/45 ksi/);
    const resistance = run.result.schedules[0]!.resistance[0]!.value;
    expect(text).toContain(`${(resistance / 1000).toPrecision(4)} kips`);
    expect(text).toMatch(/kip\/in/);
    // The loads are the job's own, in its units.
    expect(text).toMatch(/w 1,900 lbf\/ft/);
    expect(text).not.toMatch(/\d psi ≤/);
  });

  test("welded girder: weld shear flow in kip/in", { timeout: 60_000 }, async () => {
    const { text } = await worksheetText("girder-intermittent-welds.us");
    expect(text).toMatch(/kip\/in/);
    expect(text).toMatch(/\d ksi ≤/);
  });

  test("flitch header: timber plies in psi and bolts in lb; the plate's stresses in ksi", { timeout: 60_000 }, async () => {
    const { run, text } = await worksheetText("flitch-door-header.us");
    const ply = run.result.checks.find((k) => k.id === "bending-ply-ply-left")!;
    const plate = run.result.checks.find((k) => k.id === "bending-ply-plate")!;
    expect(text).toContain(`${Number(ply.demand.toPrecision(4)).toLocaleString("en-US")} psi ≤`);
    expect(text).toContain(`${Number((plate.demand / 1000).toPrecision(4))} ksi ≤`);
    expect(text).toMatch(/\d lb\b/);
    expect(text).not.toMatch(/\d kips/);
  });
});

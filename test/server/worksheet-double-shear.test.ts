import { execFileSync } from "node:child_process";
import { mkdtempSync, rmSync, writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { afterAll, expect, test } from "vitest";
import { runDesign } from "../../server/design-service.js";
import { renderWorksheet } from "../../server/pdf/worksheet.js";
import { threeLayerJob } from "../core/connector/double-shear-jobs.js";

const work = mkdtempSync(join(tmpdir(), "stitchplan-double-shear-"));
afterAll(() => rmSync(work, { recursive: true, force: true }));

test("renderWorksheet(job, result) of a bolt in double shear names the central member and both outer members in the working and the assumptions", async () => {
  const timber = (G: number, t: number) => ({ material: { family: "sawn-timber", E: 1_600_000, density: 35, specificGravity: G }, thickness: t, width: 5.5 });
  const run = runDesign(threeLayerJob({ units: "us", basis: "allowable", bottom: timber(0.55, 3.5), core: timber(0.42, 1.5), top: timber(0.55, 3.5), connector: { kind: "timber-bolt", standard: "NDS-2018", size: "3/4", shear: "double" } }));
  const file = join(work, "double-shear.pdf");
  writeFileSync(file, await renderWorksheet(run.job, run.result, { printDate: "2025-03-14" }));
  const text = execFileSync("pdftotext", ["-enc", "UTF-8", file, "-"], { encoding: "utf8" }).replace(/\s+/g, " ");
  expect(text).toContain('central member "core"');
  expect(text).toContain('outer members "bottom" and "top"');
  expect(text).toContain("in double shear the central (main) member is the part between the joint's two contact lines");
});

import { sectionDrawing } from "../../core/index.js";
import { spreadSectionLabels } from "../../core/draw/section-labels.js";
import { paintDrawing } from "./paint-drawing.js";
import { numberText } from "./quantity-text.js";
import { ink } from "./sheet.js";
import { keyValueTable, table } from "./table.js";
import { partNames, type WorksheetContext } from "./worksheet-context.js";

const CELL_HEIGHT = 190;

/** The section to scale, once per joint with its held area shaded and t marked; then properties and the joints table. */
export function sectionPropertiesSection(c: WorksheetContext): void {
  const { sheet, result, text } = c;
  const s = result.section;
  const intro =
    "Each drawing shades the area held by one joint (the parts whose shear flow its connectors pass on) and marks the contact width t of its joint lines. The dashed line is the neutral axis.";
  sheet.heading("Cross-section and joint planes", 1, sheet.textHeight(intro, { size: 8 }) + CELL_HEIGHT + 40);
  sheet.note(intro, 4);

  const properties: [string, string][] = [
    ["Reference modulus E_ref (parts transformed to it)", text.of(s.referenceModulus, "modulus")],
    ["Gross area A", text.of(s.area, "area")],
    ["Transformed area", text.of(s.transformedArea, "area")],
    ["Depth × width", `${text.of(s.depth, "length")} × ${text.of(s.width, "length")}`],
    ["Centroid ȳ, above the lowest fibre", text.of(s.centroidY - s.bounds.y0, "length")],
    ["Second moment of area I (transformed)", text.of(s.secondMoment, "secondMoment")],
    ["First moment Q at the neutral axis", text.of(s.firstMomentAtNeutralAxis, "firstMoment")],
    ["Width cut at the neutral axis", text.of(s.widthAtNeutralAxis, "length")],
  ];
  const targets = result.joints.length > 0 ? result.joints.map((j) => j.id) : [undefined];
  const perRow = targets.length <= 2 ? 2 : 3;
  const cellWidth = sheet.width / perRow;

  if (targets.length === 1) {
    // One drawing leaves half the row free: the properties sit beside it.
    const height = drawingRow(c, targets, cellWidth);
    const bottom = sheet.y + height;
    sheet.textAt("Section properties", sheet.left + cellWidth + 8, sheet.y, { font: "bold", size: 10, width: sheet.width - cellWidth - 8 });
    sheet.y += 16;
    keyValueTable(sheet, properties, { keyWeight: 1.5, indent: cellWidth + 8 });
    sheet.y = Math.max(sheet.y, bottom + 6);
  } else {
    for (let i = 0; i < targets.length; i += perRow) {
      // drawingRow may start a page, so the cursor is read after it.
      const height = drawingRow(c, targets.slice(i, i + perRow), cellWidth);
      sheet.y += height + 6;
    }
    sheet.heading("Section properties", 2, 60);
    keyValueTable(sheet, properties, { keyWeight: 1.3 });
  }

  materialModuliTable(c);
  shearStressSummary(c);

  sheet.heading("Joints", 2, 60);
  if (result.joints.length === 0) {
    sheet.paragraph("No joint plane: the section has a single part or its parts do not touch.", { colour: ink.faint });
    return;
  }
  table(
    sheet,
    [
      { header: "Joint", weight: 0.9 },
      { header: "Held parts", weight: 1.1 },
      { header: "Joint lines (between parts)", weight: 1.7 },
      { header: "t", weight: 0.8, align: "right" },
      { header: "Q", weight: 1.35, align: "right" },
      { header: "Q/I", weight: 1.4, align: "right" },
      { header: "Q/(I·t)", weight: 1.75, align: "right" },
      { header: "Connector", weight: 1.4 },
    ],
    result.joints.map((j) => [
      j.found || j.lines.length > 0
        ? { text: j.id, bold: true, note: [j.found ? "" : "held group named in the job", j.extent ? `runs ${text.range(j.extent.from, j.extent.to)}` : ""].filter(Boolean).join("; ") || undefined }
        : { text: j.id, bold: true, note: "not found in the section", colour: ink.fail },
      partNames(result, j.held),
      j.lines.map((l) => `${l.between.join(" / ")}: ${l.orientation}, ${text.of(l.length, "length")}`).join("\n"),
      text.of(j.contactWidth, "length"),
      text.of(j.firstMoment, "firstMoment"),
      text.of(j.flowFactor, "perLength"),
      text.of(j.stressFactor, "perArea"),
      { text: j.connectorLabel, note: j.mechanism === "bond-line" ? "bond line" : `${j.rows} per row` },
    ]),
  );
  pliesTable(c);
  stretchesTable(c);
}

/** A member whose section changes along it (a part that starts or stops): the section stretch by stretch. */
function stretchesTable(c: WorksheetContext): void {
  const { sheet, result, text } = c;
  const stretches = result.stretches ?? [];
  if (stretches.length === 0) return;
  sheet.heading("Section along the member", 2, 60);
  sheet.note("Parts start or stop along this member, so the section changes: the stiffness analysis, the shear flow and the member checks use each stretch's own section. The properties above are those of the full section.");
  table(
    sheet,
    [
      { header: "From – to", weight: 1.2 },
      { header: "Parts present", weight: 2 },
      { header: "Area", weight: 0.9, align: "right" },
      { header: "Centroid ȳ above the lowest fibre", weight: 1.2, align: "right" },
      { header: "I (transformed)", weight: 1, align: "right" },
    ],
    stretches.map((s) => [text.range(s.from, s.to), partNames(result, s.parts), text.of(s.area, "area"), text.of(s.centroidY - result.section.bounds.y0, "length"), text.of(s.secondMoment, "secondMoment")]),
  );
}

/** Side-by-side plies: each ply's share of a load by E·I, and the share of a unit load each interface passes, by where the load arrives. */
function pliesTable(c: WorksheetContext): void {
  const { sheet, result } = c;
  const m = result.multiPly;
  if (!m) return;
  sheet.heading("Side-by-side plies: load shares and what each interface passes", 2, 60);
  sheet.note("Side-by-side plies deflect together, so each carries its E·I share of every load. A load that arrives on one face, or on top of the plies that reach the top beyond their share (a shallower plate takes none of it directly), must be passed across the interfaces to the other plies: the fraction of a unit load each interface passes is below (positive from the left towards the right).");
  const share = (v: number) => numberText(Math.abs(v) < 1e-9 ? 0 : v, 3);
  table(
    sheet,
    [
      { header: "Ply", weight: 1.4 },
      { header: "Share of each load (E·I)", weight: 1.2, align: "right" },
      { header: "Load on top bears on it", weight: 1.1 },
    ],
    m.plies.map((p) => [partNames(result, [p.part]), share(p.share), p.bearsTopLoad ? "yes" : "no (shallower)"]),
    { width: sheet.width * 0.7 },
  );
  table(
    sheet,
    [
      { header: "Interface between", weight: 1.6 },
      { header: "Joint", weight: 0.8 },
      { header: "Load on the left face", weight: 1, align: "right" },
      { header: "Load on the right face", weight: 1, align: "right" },
      { header: "Load on top", weight: 0.9, align: "right" },
    ],
    m.interfaces.map((i) => [partNames(result, [...i.between]), i.joint ?? "—", share(i.fromLeftFace), share(i.fromRightFace), share(i.fromTop)]),
  );
}

/** Draws one row of section drawings at the cursor, whole on one page; returns its height. */
function drawingRow(c: WorksheetContext, ids: (string | undefined)[], cellWidth: number): number {
  const { sheet, result } = c;
  const captions = ids.map((id) => caption(c, id));
  const captionHeight = Math.max(...captions.map((t) => sheet.textHeight(t, { size: 7.5, width: cellWidth - 12 })));
  const height = CELL_HEIGHT + captionHeight + 6;
  sheet.ensure(height + 2);
  ids.forEach((id, k) => {
    const x = sheet.left + k * cellWidth;
    const drawing = spreadSectionLabels(sectionDrawing(result, { width: cellWidth - 6, height: CELL_HEIGHT, ...(id ? { joint: id } : {}) }));
    sheet.doc.save().rect(x + 2, sheet.y, cellWidth - 4, height).lineWidth(0.5).strokeColor(ink.light).stroke().restore();
    paintDrawing(sheet.doc, drawing, x + 3, sheet.y);
    sheet.textAt(captions[k]!, x + 6, sheet.y + CELL_HEIGHT, { size: 7.5, width: cellWidth - 12 });
  });
  return height;
}

function caption(c: WorksheetContext, id: string | undefined): string {
  const j = c.result.joints.find((k) => k.id === id);
  if (!j) return "Section (no joint)";
  return `Joint ${j.id}: holds ${partNames(c.result, j.held)}; t = ${c.text.of(j.contactWidth, "length")}; Q = ${c.text.of(j.firstMoment, "firstMoment")}; ${j.lines.length} line${j.lines.length === 1 ? "" : "s"}`;
}


/** σ = M/S per material: the fibre distances and elastic moduli the bending check uses. */
function materialModuliTable(c: WorksheetContext): void {
  const { sheet, result, text } = c;
  const moduli = result.section.materialModuli;
  if (!moduli || moduli.length === 0) return;
  sheet.heading("Bending moduli per material", 2, 50);
  const modulus = (v: number | null) => (v === null ? { text: "—", colour: ink.faint } : text.of(v, "firstMoment"));
  table(
    sheet,
    [
      { header: "Material", weight: 2 },
      { header: "n", weight: 0.5, align: "right" },
      { header: "Top fibre from N.A.", weight: 1.1, align: "right" },
      { header: "Bottom fibre from N.A.", weight: 1.1, align: "right" },
      { header: "S top", weight: 1.1, align: "right" },
      { header: "S bottom", weight: 1.1, align: "right" },
    ],
    moduli.map((m) => [m.name || m.material, numberText(m.modularRatio, 3), text.of(m.topFibre, "length"), text.of(m.bottomFibre, "length"), modulus(m.topModulus), modulus(m.bottomModulus)]),
  );
}

/** The largest shear-stress factor over the depth beside the simple forms a reviewer checks it against. */
function shearStressSummary(c: WorksheetContext): void {
  const { sheet, result, text } = c;
  const s = result.section.shearStress;
  if (!s) return;
  const rows: [string, string][] = [[`Largest Q/(I·t) over the depth, at y = ${text.of(s.atY, "length")}`, text.of(s.maxFactor, "perArea")]];
  if (s.rectangleClosedForm !== null) rows.push(["1.5/A for a single rectangle", text.of(s.rectangleClosedForm, "perArea")]);
  for (const w of s.webApproximations) rows.push([`${w.label} (${w.part})`, text.of(w.factor, "perArea")]);
  sheet.heading("Shear stress per unit shear force", 2, 50);
  keyValueTable(sheet, rows, { keyWeight: 1.6 });
}

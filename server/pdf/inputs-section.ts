import { connectorFields, shapeFields } from "./schema-fields.js";
import { numberText } from "./quantity-text.js";
import { ink } from "./sheet.js";
import { keyValueTable, table } from "./table.js";
import type { WorksheetContext } from "./worksheet-context.js";

const UNIT_SYSTEMS = { si: "SI (mm, m, kN, kN/m, N, MPa)", us: "US customary (in, ft, lbf, lbf/ft, psi)" } as const;
const BASES = { allowable: "allowable: service loads against allowable values", factored: "factored: factored loads against design values" } as const;

/** Everything the design was run from, as entered in the job (in the job's units). */
export function inputsSection(c: WorksheetContext): void {
  const { sheet, job, result, text } = c;
  sheet.heading("Inputs", 1);
  keyValueTable(
    sheet,
    [
      ["Project", [job.project.name, job.project.number].filter(Boolean).join(", ")],
      ["Member", [job.member.mark, job.member.description].filter(Boolean).join(" — ")],
      ["Revision and date", `${job.member.revision || "—"}, ${job.member.date ?? "no date given (the print date is shown above)"}`],
      ["Engineer", job.project.engineer || "—"],
      ["Client", job.project.client || "—"],
      ["Units", UNIT_SYSTEMS[job.units]],
      ["Design basis", BASES[job.basis]],
    ],
    { keyWeight: 0.6 },
  );

  sheet.heading("Materials", 2, 40);
  table(
    sheet,
    [
      { header: "Id", weight: 0.8 },
      { header: "Name", weight: 2 },
      { header: "Family", weight: 1.1 },
      { header: "E", weight: 1, align: "right" },
      { header: "Density", weight: 1, align: "right" },
      { header: "Bending strength", weight: 1, align: "right" },
      { header: "Shear strength", weight: 1, align: "right" },
      { header: "Source", weight: 1.5 },
    ],
    job.materials.map((m) => [
      { text: m.id, bold: true },
      m.name,
      m.family,
      text.of(m.E, "modulus"),
      text.of(m.density, "density"),
      m.strength.bending !== undefined ? text.of(m.strength.bending, "stress") : { text: "not given", colour: ink.faint },
      m.strength.shear !== undefined ? text.of(m.strength.shear, "stress") : { text: "not given", colour: ink.faint },
      m.source || "—",
    ]),
  );

  sheet.heading("Parts", 2, 40);
  sheet.paragraph(
    "Shape as entered; b × h is the part's bounding box (b across the member, h deep) and x, y its lower left corner as placed in the section. n = E/E_ref transforms the part to the reference material.",
    { size: 8, colour: ink.faint },
    3,
  );
  table(
    sheet,
    [
      { header: "Id", weight: 0.9 },
      { header: "Name and shape", weight: 2.4 },
      { header: "Material", weight: 0.8 },
      { header: "b", weight: 0.75, align: "right" },
      { header: "h", weight: 0.75, align: "right" },
      { header: "x", weight: 0.75, align: "right" },
      { header: "y", weight: 0.75, align: "right" },
      { header: "n", weight: 0.5, align: "right" },
      { header: "Area", weight: 0.9, align: "right" },
    ],
    job.parts.map((p) => {
      const part = result.section.parts.find((k) => k.id === p.id);
      const box = part && part.rects.length > 0 ? boundsOf(part.rects) : undefined;
      const place = (p as { place?: { on: string; side: string; align?: string } }).place;
      const shape = shapeFields(p.shape, text) + (place ? `; placed on the ${place.side} of ${place.on}, ${place.align ?? "centre"}` : "");
      return [
        { text: p.id, bold: true },
        { text: p.name || "—", note: shape },
        p.material,
        box ? text.of(box.x1 - box.x0, "length") : "—",
        box ? text.of(box.y1 - box.y0, "length") : "—",
        box ? text.of(box.x0, "length") : "—",
        box ? text.of(box.y0, "length") : "—",
        part ? numberText(part.modularRatio, 3) : "—",
        part ? text.of(part.area, "area") : "—",
      ];
    }),
  );

  sheet.heading("Span and supports", 2, 40);
  const beam = result.beam;
  keyValueTable(
    sheet,
    [
      ["Spans", beam.spans.map((s) => text.of(s, "span")).join(", ")],
      ["Supports", beam.supports.map((s) => `${s.type} at x = ${text.of(s.x, "span")}`).join("; ")],
      ["Self-weight", job.beam.selfWeight ? `${text.of(beam.selfWeight, "lineLoad")} over the whole member (dead)` : "not included"],
      ["Deflection limits", `total load span/${numberText(job.beam.deflectionLimits.total)}; live load span/${numberText(job.beam.deflectionLimits.live)}`],
    ],
    { keyWeight: 0.6 },
  );

  sheet.heading("Loads", 2, 40);
  if (job.beam.loads.length === 0) sheet.paragraph("No applied loads.", { colour: ink.faint });
  else
    table(
      sheet,
      [
        { header: "#", weight: 0.35, align: "right" },
        { header: "Label", weight: 2 },
        { header: "Category", weight: 0.9 },
        { header: "Type", weight: 0.8 },
        { header: "Intensity / force", weight: 1.2, align: "right" },
        { header: "Where", weight: 1.6 },
      ],
      job.beam.loads.map((l, i) =>
        l.type === "uniform"
          ? [String(i + 1), l.label || "—", l.category, "uniform", text.of(l.w, "lineLoad"), l.from === undefined && l.to === undefined ? "whole member" : text.range(l.from ?? 0, l.to ?? beam.length)]
          : [String(i + 1), l.label || "—", l.category, "point", text.of(l.P, "force"), `x = ${text.of(l.at, "span")}`],
      ),
    );

  sheet.heading("Load combinations", 2, 40);
  table(
    sheet,
    [
      { header: "Id", weight: 0.5 },
      { header: "Name", weight: 1.5 },
      { header: "Factors by load category", weight: 3 },
      { header: "Duration", weight: 0.9 },
    ],
    beam.combinations.map((k) => [
      { text: k.id, bold: true },
      k.name,
      Object.entries(k.factors)
        .map(([cat, f]) => `${numberText(f, 3)} × ${cat}`)
        .join(" + "),
      k.duration,
    ]),
  );

  sheet.heading("Connectors", 2, 40);
  table(
    sheet,
    [
      { header: "Id", weight: 0.6 },
      { header: "Kind", weight: 0.6 },
      { header: "Description", weight: 1.8 },
      { header: "Properties as entered", weight: 2.6 },
      { header: "Source", weight: 1.4 },
    ],
    job.connectors.map((k) => [{ text: k.id, bold: true }, k.kind, k.label, connectorFields(k, text) || "—", k.source || "—"]),
  );

  sheet.heading("Fastening", 2, 40);
  const connectorLabel = (id: string) => job.connectors.find((k) => k.id === id)?.label ?? id;
  table(
    sheet,
    [
      { header: "Applies to", weight: 2 },
      { header: "Connector", weight: 2.2 },
      { header: "Connectors per row", weight: 1, align: "right" },
    ],
    [
      ["Every joint not listed below (default)", `${job.fastening.default.connector}: ${connectorLabel(job.fastening.default.connector)}`, String(job.fastening.default.rows)],
      ...job.fastening.joints.map((j) => [`Joint holding ${j.held.join(", ")}`, `${j.connector}: ${connectorLabel(j.connector)}`, String(j.rows)]),
    ],
  );

  sheet.heading("Spacing rules", 2, 40);
  const rules = job.spacing;
  const given = (v: number | undefined, fallback: string) => (v === undefined ? { text: fallback, colour: ink.faint } : text.of(v, "length"));
  keyValueTable(
    sheet,
    [
      ["Spacing module", rules.preferred ? { text: "not used (preferred spacings given)", colour: ink.faint } : given(rules.module, "default (see the limits used per joint)")],
      ["Preferred spacings", rules.preferred ? rules.preferred.map((v) => text.of(v, "length")).join(", ") : { text: "none", colour: ink.faint }],
      ["Minimum spacing", given(rules.minimum, "the connector's own")],
      ["Maximum spacing", given(rules.maximum, "the connector's own or the default")],
      ["Shortest zone", given(rules.minZoneLength, "default (see the limits used per joint)")],
      ["Zones per span, at most", String(rules.maxZonesPerSpan)],
      ["Mirror zones about midspan", rules.symmetric ? "yes, where the demand is symmetric" : "no"],
    ],
    { keyWeight: 0.8 },
  );
}

function boundsOf(rects: { x0: number; x1: number; y0: number; y1: number }[]) {
  return {
    x0: Math.min(...rects.map((r) => r.x0)),
    x1: Math.max(...rects.map((r) => r.x1)),
    y0: Math.min(...rects.map((r) => r.y0)),
    y1: Math.max(...rects.map((r) => r.y1)),
  };
}

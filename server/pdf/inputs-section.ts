import { connectorFields, fasteningFields, loadFields, materialFields, shapeFields } from "./schema-fields.js";
import { ownerOfFamilies } from "../../core/units/shown-units.js";
import { numberText, ownedText, type QuantityText } from "./quantity-text.js";
import { ink } from "./sheet.js";
import { keyValueTable, table } from "./table.js";
import { combinationsSummary, inFull, type WorksheetContext } from "./worksheet-context.js";

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
      ["Task", job.mode === "check" ? "check the schedules given in the job (check mode)" : "design the schedules (design mode)"],
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
    job.materials.map((m) => {
      // A steel grade's moduli and strengths in ksi, timber's in psi (US units).
      const own = ownedText(job.units, ownerOfFamilies([m.family]));
      return [
      { text: m.id, bold: true },
      { text: m.name, note: materialFields(m, own) || undefined },
      m.family,
      own.of(m.E, "modulus"),
      own.of(m.density, "density"),
      m.strength.bending !== undefined ? own.of(m.strength.bending, "stress") : { text: "not given", colour: ink.faint },
      m.strength.shear !== undefined ? own.of(m.strength.shear, "stress") : { text: "not given", colour: ink.faint },
      m.source || "—",
      ];
    }),
  );

  sheet.heading("Parts", 2, 40);
  sheet.note("Shape as entered; b × h is the part's bounding box (b across the member, h deep) and x, y its lower left corner as placed in the section. n = E/E_ref transforms the part to the reference material.");
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
  // Read loosely: these settings arrive with continuous spans and the job's own load categories.
  const regions = (beam as { regions?: { x0: number; x1: number; label: string }[] }).regions;
  const extra = job.beam as { categories?: { id: string; name?: string; actsAs: string; duration?: string }[]; patternedCategories?: string[]; deflectionLimits: { liveCategories?: string[] } };
  const beamRows: [string, string][] = [
    ["Spans", `${beam.spans.map((s) => text.of(s, "span")).join(", ")} (member length ${text.of(beam.length, "span")})`],
    ["Supports", beam.supports.map((s) => `${s.type} at x = ${text.of(s.x, "span")}`).join("; ")],
    ...(regions && regions.length > 0 ? [["Spans and overhangs", regions.map((r) => `${r.label}: ${text.range(r.x0, r.x1)}`).join("; ")] as [string, string]] : []),
    ["Self-weight", job.beam.selfWeight ? `${text.of(beam.selfWeight, "lineLoad")} over the whole member (dead)` : "not included"],
    [
      "Deflection limits",
      `total load span/${numberText(job.beam.deflectionLimits.total)}; live load span/${numberText(job.beam.deflectionLimits.live)}${extra.deflectionLimits.liveCategories ? ` (live: ${extra.deflectionLimits.liveCategories.join(", ")})` : ""}`,
    ],
  ];
  if (extra.categories && extra.categories.length > 0)
    beamRows.push(["Load categories of this job", extra.categories.map((k) => `${k.id}${k.name ? ` (${k.name})` : ""} acts as ${k.actsAs}${k.duration ? `, ${k.duration}` : ""}`).join("; ")]);
  if (beam.spans.length > 1 && extra.patternedCategories) beamRows.push(["Placed span by span (patterns)", extra.patternedCategories.join(", ") || "none"]);
  keyValueTable(sheet, beamRows, { keyWeight: 0.6 });

  sheet.heading("Loads", 2, 40);
  sheet.note("Downward positive; positions from the left end of the member. A line load without from and to covers the whole member.");
  if (job.beam.loads.length === 0) sheet.paragraph("No applied loads.", { colour: ink.faint });
  else
    table(
      sheet,
      [
        { header: "#", weight: 0.35, align: "right" },
        { header: "Label", weight: 2 },
        { header: "Category", weight: 0.9 },
        { header: "Type", weight: 0.8 },
        { header: "As entered", weight: 2.8 },
      ],
      job.beam.loads.map((l, i) => [String(i + 1), l.label || "—", l.category, l.type, loadFields(l, text) || "—"]),
    );

  sheet.heading("Load combinations", 2, 40);
  sheet.note(`Combination set: ${job.combinations.set}. Each combination's factors multiply the loads of each category.`);
  const printedCombinations = inFull(result, beam.combinations, (k) => k.id);
  if (printedCombinations.rest.length > 0) {
    sheet.paragraph(
      `${beam.combinations.length} combinations: the ${printedCombinations.shown.length} that govern a result on this worksheet are listed in full; the other ${printedCombinations.rest.length} (${combinationsSummary(result, printedCombinations.rest.map((k) => k.id))}) govern nothing here and are listed in the result file.`,
      { size: 8.5 },
    );
  }
  table(
    sheet,
    [
      { header: "Id", weight: 0.5 },
      { header: "Name", weight: 1.5 },
      { header: "Factors by load category", weight: 3 },
      { header: "Duration", weight: 0.9 },
    ],
    printedCombinations.shown.map((k) => [
      { text: k.id, bold: true },
      { text: k.name, note: patternNote(k) },
      Object.entries(k.factors)
        .map(([cat, f]) => `${numberText(f, 3)} × ${cat}`)
        .join(" + "),
      k.duration,
    ]),
  );

  const service = (beam as { service?: { combination: { id: string; name: string; factors: Record<string, number> } }[] }).service ?? [];
  if (service.length > 0) {
    sheet.heading("Service cases for deflection", 2, 40);
    const rest = inFull(result, service, (k) => k.combination.id).rest;
    if (rest.length > 0) {
      sheet.paragraph(
        `${service.length} service cases: those that govern a deflection check are listed in full; the other ${rest.length} (${combinationsSummary(result, rest.map((k) => k.combination.id))}) govern nothing here and are listed in the result file.`,
        { size: 8.5 },
      );
    }
    table(
      sheet,
      [
        { header: "Id", weight: 0.7 },
        { header: "Name", weight: 1.7 },
        { header: "Factors by load category", weight: 2.6 },
      ],
      inFull(result, service, (k) => k.combination.id).shown.map(({ combination: k }) => [
        { text: k.id, bold: true },
        { text: k.name, note: patternNote(k) },
        Object.entries(k.factors)
          .filter(([, f]) => f !== 0)
          .map(([cat, f]) => `${numberText(f, 3)} × ${cat}`)
          .join(" + ") || "—",
      ]),
    );
  }

  sheet.heading("Connectors", 2, 40);
  // Some kinds are described by the program from their fields rather than by a label of the user's.
  const connectorDescription = (id: string) => {
    const k = job.connectors.find((c) => c.id === id);
    return (k as { label?: string } | undefined)?.label || result.joints.find((j) => j.connector === id)?.connectorLabel || k?.kind || id;
  };
  table(
    sheet,
    [
      { header: "Id", weight: 0.6 },
      { header: "Kind", weight: 0.6 },
      { header: "Description", weight: 1.8 },
      { header: "Properties as entered", weight: 2.6 },
      { header: "Source", weight: 1.4 },
    ],
    job.connectors.map((k) => [{ text: k.id, bold: true }, k.kind, connectorDescription(k.id), connectorFields(k, text) || "—", (k as { source?: string }).source || "—"]),
  );

  sheet.heading("Fastening", 2, 40);
  const fasteningRow = (appliesTo: string, f: (typeof job.fastening.joints)[number] | typeof job.fastening.default) => [
    appliesTo,
    { text: `${f.connector}: ${connectorDescription(f.connector)}`, note: fasteningFields(f, text) || undefined },
    String(f.rows),
    providedText(f, text) ?? { text: "designed here", colour: ink.faint },
  ];
  table(
    sheet,
    [
      { header: "Applies to", weight: 1.6 },
      { header: "Connector", weight: 2.2 },
      { header: "Per row", weight: 0.6, align: "right" },
      { header: "Schedule", weight: 2 },
    ],
    [fasteningRow("Every joint not listed below (default)", job.fastening.default), ...job.fastening.joints.map((j) => fasteningRow(`Joint holding ${j.held.join(", ")}`, j))],
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

/** A schedule given in the job to be checked (check mode), in words; undefined when the program designs it. */
function providedText(fastening: object, text: QuantityText): string | undefined {
  const provided = (fastening as { provided?: { type: string; zones?: { from: number; to: number; spacing: number }[]; positions?: number[] } }).provided;
  if (!provided) return undefined;
  if (provided.zones) return `given, to be checked: ${provided.zones.map((z) => `${text.range(z.from, z.to)} @ ${text.of(z.spacing, "length")}`).join("; ")}`;
  if (provided.positions) return `given, to be checked: ${provided.positions.length} rows at listed positions`;
  return `given, to be checked (${provided.type})`;
}

/** For one live-load pattern of a combination: which spans carry the patterned loads. */
function patternNote(combination: object): string | undefined {
  const k = combination as { base?: string; pattern?: number[] };
  if (!k.pattern) return undefined;
  return `pattern of ${k.base ?? "a combination"}: patterned loads on span${k.pattern.length === 1 ? "" : "s"} ${k.pattern.join(", ")}`;
}

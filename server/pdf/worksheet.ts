import type { DesignResult, JobDocument } from "../../core/index.js";
import { actionsSection } from "./actions-section.js";
import { bondLineSection } from "./bond-line-section.js";
import { closingSection } from "./closing-section.js";
import { compositeSection } from "./composite-section.js";
import { FIELD_SHEET_HEADING, fieldSheet } from "./field-sheet.js";
import { inputsSection } from "./inputs-section.js";
import { memberChecksSection } from "./member-checks-section.js";
import { shownResult, type ShownResult } from "../../core/units/shown-units.js";
import { quantityText } from "./quantity-text.js";
import { reviewBox } from "./review-box.js";
import { identicalSchedules, scheduleSection } from "./schedule-section.js";
import { sectionPropertiesSection } from "./section-properties-section.js";
import { PdfDocument } from "./pdf-engine.js";
import { PAGE_SIZES, Sheet, pageFrame, registerFonts } from "./sheet.js";
import { glanceSection, statusSection } from "./status-section.js";
import { weldSection, weldsOf } from "./weld-section.js";
import { terminationsSection } from "./terminations-section.js";
import { columnSection } from "./column-section.js";
import { stampPages } from "./title-block.js";
import type { WorksheetContext } from "./worksheet-context.js";

export interface WorksheetOptions {
  /** Print date, YYYY-MM-DD; today when absent. Fixing it (with the job) fixes the PDF's bytes. */
  printDate?: string;
}

/** File name for the worksheet of a job: project number, member mark and revision. */
export function worksheetFileName(job: JobDocument): string {
  const safe = (s: string) => s.replace(/[^A-Za-z0-9._-]+/g, "-").replace(/^-+|-+$/g, "");
  return `${[safe(job.project.number), safe(job.member.mark), `rev-${safe(job.member.revision)}`].filter(Boolean).join("_")}.pdf`;
}

/** Today as YYYY-MM-DD (UTC). */
export const today = () => new Date().toISOString().slice(0, 10);

/** The worksheet as a PDF: A4 for SI jobs, Letter for US jobs; its last page is the field sheet for the builder. */
export function renderWorksheet(job: JobDocument, result: DesignResult, options: WorksheetOptions = {}): Promise<Buffer> {
  return renderPages(job, result, options, "connector spacing worksheet", (context, shown) => {
    reviewBox(context.sheet);
    statusSection(context);
    glanceSection(context);
    // The inputs as entered, in the job's own units.
    inputsSection({ ...context, result, text: quantityText(result.unitLabels) });
    sectionPropertiesSection(context);
    actionsSection(context);
    compositeSection(context);
    // A schedule or weld in the units of what its joint joins (kips for steel to steel in US units).
    const ofJoint = (joint: string): WorksheetContext => {
      const unitLabels = shown.labels(shown.owners.joint(joint));
      return { ...context, result: { ...context.result, unitLabels }, text: quantityText(unitLabels) };
    };
    for (const group of identicalSchedules(context.result.schedules)) scheduleSection(ofJoint(group[0]!.joint), group);
    for (const bondLine of context.result.bondLines) bondLineSection(context, bondLine);
    for (const weld of weldsOf(context)) weldSection(ofJoint(weld.joint), weld);
    terminationsSection(context);
    columnSection(context);
    memberChecksSection(context, (check) => quantityText(shown.labels(shown.owners.check(check))));
    closingSection(context);
    return new Map(fieldSheet(context).map((page) => [page, FIELD_SHEET_HEADING]));
  });
}

/** The field sheet alone, one page, with the same title block, notice and fingerprint as the worksheet it comes from. */
export function renderFieldSheet(job: JobDocument, result: DesignResult, options: WorksheetOptions = {}): Promise<Buffer> {
  return renderPages(job, result, options, "field sheet", (context) => new Map(fieldSheet(context).map((page) => [page, FIELD_SHEET_HEADING])));
}

/** A document of the job's page size; `body` sets the pages and names those with their own heading; every page is then stamped. */
function renderPages(job: JobDocument, result: DesignResult, options: WorksheetOptions, title: string, body: (context: WorksheetContext, shown: ShownResult) => Map<number, string>): Promise<Buffer> {
  const printed = options.printDate ?? today();
  const size = PAGE_SIZES[job.units];
  const frame = pageFrame(size);
  const PDFDocument = PdfDocument();
  const doc = new PDFDocument({
    size: size.name,
    margins: { top: frame.top, bottom: frame.height - frame.bottom, left: frame.left, right: frame.width - frame.right },
    bufferPages: true,
    info: {
      Title: `${job.member.mark} — ${job.project.name}: ${title}`,
      Subject: `Input fingerprint ${result.fingerprint ?? ""}`,
      Creator: `${result.program.name} ${result.program.version}`,
      CreationDate: new Date(`${printed}T00:00:00Z`),
    },
  });
  registerFonts(doc);
  const chunks: Buffer[] = [];
  doc.on("data", (c: Buffer) => chunks.push(c));
  const done = new Promise<Buffer>((resolve, reject) => {
    doc.on("end", () => resolve(Buffer.concat(chunks)));
    doc.on("error", reject);
  });

  // Every result number in the unit of what it belongs to: kips and ksi for steel, pounds and psi for timber in US units.
  const shown = shownResult(result, job.materials);
  const context: WorksheetContext = { sheet: new Sheet(doc, frame), job, result: shown.result, text: quantityText(shown.result.unitLabels) };
  const pageHeadings = body(context, shown);

  stampPages(doc, frame, {
    projectName: job.project.name,
    projectNumber: job.project.number,
    engineer: job.project.engineer,
    mark: job.member.mark,
    description: job.member.description,
    revision: job.member.revision,
    date: job.member.date ?? printed,
    printed,
    program: `${result.program.name} ${result.program.version}`,
    fingerprint: result.fingerprint ?? "",
    heading: result.mode === "check" ? "BUILT-UP MEMBER · CONNECTOR SCHEDULE CHECK WORKSHEET" : "BUILT-UP MEMBER · CONNECTOR SPACING WORKSHEET",
    pageHeadings,
  });
  doc.end();
  return done;
}

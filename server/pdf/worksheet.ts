import { createRequire } from "node:module";
import PDFDocument from "pdfkit";
import type { DesignResult, JobDocument } from "../../core/index.js";

const require = createRequire(import.meta.url);
const FONT = require.resolve("dejavu-fonts-ttf/ttf/DejaVuSans.ttf");
const FONT_BOLD = require.resolve("dejavu-fonts-ttf/ttf/DejaVuSans-Bold.ttf");

/** File name for the worksheet of a job: project number, member mark and revision. */
export function worksheetFileName(job: JobDocument): string {
  const safe = (s: string) => s.replace(/[^A-Za-z0-9._-]+/g, "-").replace(/^-+|-+$/g, "");
  return `${[safe(job.project.number), safe(job.member.mark), `rev-${safe(job.member.revision)}`].filter(Boolean).join("_")}.pdf`;
}

/** The worksheet as a PDF. */
export function renderWorksheet(job: JobDocument, result: DesignResult): Promise<Buffer> {
  const doc = new PDFDocument({ size: job.units === "us" ? "LETTER" : "A4", margin: 40, bufferPages: true, info: { Title: `${job.member.mark} — ${job.project.name}`, CreationDate: new Date(0) } });
  doc.registerFont("body", FONT);
  doc.registerFont("bold", FONT_BOLD);
  const chunks: Buffer[] = [];
  doc.on("data", (c: Buffer) => chunks.push(c));
  const done = new Promise<Buffer>((resolve) => doc.on("end", () => resolve(Buffer.concat(chunks))));
  doc.font("bold").fontSize(14).text(`${job.member.mark} — ${job.project.name}`);
  doc.font("body").fontSize(9).text("For review by a licensed engineer. Not for construction until reviewed and sealed by the engineer of record; local codes govern.");
  doc.text(`Input fingerprint (SHA-256): ${result.fingerprint ?? ""}`);
  doc.end();
  return done;
}

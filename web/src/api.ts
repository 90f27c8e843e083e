import type { JobIssue } from "../../core/schema/job-issues.js";
import type { DesignResult } from "../../core/schema/result.js";
import type { JobDraft } from "./job-state.js";

export interface ExampleEntry {
  id: string;
  title: string;
  units: string;
}

export type DesignAnswer =
  | { kind: "designed"; result: DesignResult }
  | { kind: "invalid"; message: string; issues: JobIssue[] }
  | { kind: "unreachable"; message: string };

interface ErrorBody {
  message?: string;
  issues?: JobIssue[];
}

async function errorOf(response: Response): Promise<ErrorBody> {
  try {
    return (await response.json()) as ErrorBody;
  } catch {
    return { message: `The service answered ${response.status} ${response.statusText}.` };
  }
}

async function getJson<T>(url: string): Promise<T> {
  const response = await fetch(url, { headers: { accept: "application/json" } });
  if (!response.ok) throw new Error((await errorOf(response)).message ?? `GET ${url} answered ${response.status}`);
  return (await response.json()) as T;
}

export const fetchExamples = () => getJson<ExampleEntry[]>("/api/examples");
export const fetchExample = (id: string) => getJson<unknown>(`/api/examples/${encodeURIComponent(id)}`);
export const fetchJobSchema = () => getJson<unknown>("/api/schema/job");

/** One grade of the service's material library, as a job material in the units asked for. */
export interface GradeEntry {
  grade: string;
  name: string;
  family: string;
  material: Record<string, unknown>;
}

export const fetchGrades = (units: string, basis: string) => getJson<GradeEntry[]>(`/api/materials?units=${encodeURIComponent(units)}&basis=${encodeURIComponent(basis)}`);

export type ConversionAnswer = { kind: "converted"; job: JobDraft } | { kind: "invalid"; message: string; issues: JobIssue[] } | { kind: "unreachable"; message: string };

/** The whole job in the other unit system, as the service converts it (the job must be valid). */
export async function requestConversion(job: JobDraft, to: "si" | "us"): Promise<ConversionAnswer> {
  let response: Response;
  try {
    response = await postJob(`/api/conversions?to=${to}`, job);
  } catch {
    return { kind: "unreachable", message: "The stitchplan service did not answer. Is it still running?" };
  }
  if (response.ok) return { kind: "converted", job: (await response.json()) as JobDraft };
  const body = await errorOf(response);
  if (response.status === 400) return { kind: "invalid", message: body.message ?? "The job has problems.", issues: body.issues ?? [] };
  return { kind: "unreachable", message: body.message ?? `The service answered ${response.status}.` };
}

const postJob = (url: string, job: unknown, signal?: AbortSignal) =>
  fetch(url, { method: "POST", headers: { "content-type": "application/json" }, body: JSON.stringify(job), ...(signal ? { signal } : {}) });

/** Designs the job; bad input and an unreachable service are answers, not exceptions. Aborting rethrows. */
export async function requestDesign(job: JobDraft, signal?: AbortSignal): Promise<DesignAnswer> {
  let response: Response;
  try {
    response = await postJob("/api/designs", job, signal);
  } catch (error) {
    if (signal?.aborted) throw error;
    return { kind: "unreachable", message: "The stitchplan service did not answer. Is it still running?" };
  }
  if (response.ok) return { kind: "designed", result: (await response.json()) as DesignResult };
  const body = await errorOf(response);
  if (response.status === 400) return { kind: "invalid", message: body.message ?? "The job has problems.", issues: body.issues ?? [] };
  return { kind: "unreachable", message: body.message ?? `The service answered ${response.status}.` };
}

export type WorksheetAnswer = { kind: "pdf"; blob: Blob; fileName: string } | { kind: "refused"; message: string; issues: JobIssue[] };

export async function requestWorksheet(job: JobDraft): Promise<WorksheetAnswer> {
  let response: Response;
  try {
    response = await postJob("/api/worksheets", job);
  } catch {
    return { kind: "refused", message: "The stitchplan service did not answer. Is it still running?", issues: [] };
  }
  if (!response.ok) {
    const body = await errorOf(response);
    return { kind: "refused", message: body.message ?? `The service answered ${response.status}.`, issues: body.issues ?? [] };
  }
  const disposition = response.headers.get("content-disposition") ?? "";
  const fileName = /filename="([^"]+)"/.exec(disposition)?.[1] ?? "stitchplan-worksheet.pdf";
  return { kind: "pdf", blob: await response.blob(), fileName };
}

import type { JobIssue } from "../../../core/schema/job-issues.js";
import type {
  Comparison,
  FingerprintLookUp,
  InputChange,
  Member,
  Project,
  ResultChanges,
  RevisionInfo,
  RevisionListItem,
  SavedRevision,
  StoredRevision,
  WorksheetIssue,
} from "../../../core/schema/store-contract.js";

export type { Comparison, FingerprintLookUp, InputChange, Member, Project, ResultChanges, RevisionInfo, RevisionListItem, SavedRevision, StoredRevision, WorksheetIssue };

export interface IssuedWorksheet {
  blob: Blob;
  fileName: string;
  issue: number;
  revision: number;
  fingerprint: string;
  warning: string | null;
}

/** What went wrong, in the service's words: its code, sentence and the problems at their field paths. */
export interface StoreProblem {
  status: number;
  code: string;
  message: string;
  issues: JobIssue[];
}

export type Answer<T> = { ok: true; value: T } | { ok: false; problem: StoreProblem };

const unreachable: StoreProblem = { status: 0, code: "UNREACHABLE", message: "The stitchplan service did not answer. Is it still running?", issues: [] };

async function call<T>(method: string, url: string, body?: unknown, read: (r: Response) => Promise<T> = (r) => r.json() as Promise<T>): Promise<Answer<T>> {
  // The service takes changes only as JSON (a guard against other sites' forms): a POST without a body sends {}.
  if (method !== "GET" && body === undefined) body = {};
  let response: Response;
  try {
    response = await fetch(url, {
      method,
      headers: body === undefined ? { accept: "application/json" } : { "content-type": "application/json", accept: "application/json" },
      ...(body === undefined ? {} : { body: JSON.stringify(body) }),
    });
  } catch {
    return { ok: false, problem: unreachable };
  }
  if (response.ok) return { ok: true, value: await read(response) };
  let parsed: Partial<StoreProblem> = {};
  try {
    parsed = (await response.json()) as Partial<StoreProblem>;
  } catch {
    // Not JSON: the status alone says what happened.
  }
  return { ok: false, problem: { status: response.status, code: parsed.code ?? `HTTP_${response.status}`, message: parsed.message ?? `The service answered ${response.status}.`, issues: parsed.issues ?? [] } };
}

const p = (projectId: number) => `/api/projects/${projectId}`;
const m = (projectId: number, memberId: number) => `${p(projectId)}/members/${memberId}`;

export const storeInfo = () => call<{ file: string; schemaVersion: number }>("GET", "/api/store");
export const listProjects = () => call<Project[]>("GET", "/api/projects");
export const createProject = (project: { name: string; number?: string; client?: string }) => call<Project>("POST", "/api/projects", project);
export const listMembers = (projectId: number) => call<Member[]>("GET", `${p(projectId)}/members`);
export const createMember = (projectId: number, job: unknown, note: string) => call<SavedRevision>("POST", `${p(projectId)}/members`, { job, note });
export const listRevisions = (projectId: number, memberId: number) => call<RevisionListItem[]>("GET", `${m(projectId, memberId)}/revisions`);
export const getRevision = (projectId: number, memberId: number, revision: number | "latest") => call<StoredRevision>("GET", `${m(projectId, memberId)}/revisions/${revision}`);
export const saveRevision = (projectId: number, memberId: number, job: unknown, note: string, basedOn?: number) =>
  call<SavedRevision>("POST", `${m(projectId, memberId)}/revisions`, { job, note, ...(basedOn !== undefined ? { basedOn } : {}) });
export const compareRevisions = (projectId: number, memberId: number, from: number, to: number) => call<Comparison>("GET", `${m(projectId, memberId)}/compare?from=${from}&to=${to}`);
export const lookUpFingerprint = (fingerprint: string) => call<FingerprintLookUp>("GET", `/api/worksheets/${encodeURIComponent(fingerprint)}`);
export const importProject = (file: unknown) => call<Project>("POST", "/api/projects/import", file);
export const exportProject = (projectId: number) => call<Blob>("GET", `${p(projectId)}/export`, undefined, (r) => r.blob());

/** Issues the worksheet of a saved revision: the PDF, and the issue recorded for it. */
export function issueWorksheet(projectId: number, memberId: number, revision: number): Promise<Answer<IssuedWorksheet>> {
  return call("POST", `${m(projectId, memberId)}/revisions/${revision}/worksheets`, undefined, async (r) => {
    const disposition = r.headers.get("content-disposition") ?? "";
    const warning = r.headers.get("x-stitchplan-warning");
    return {
      blob: await r.blob(),
      fileName: /filename="([^"]+)"/.exec(disposition)?.[1] ?? "worksheet.pdf",
      issue: Number(r.headers.get("x-stitchplan-issue")),
      revision: Number(r.headers.get("x-stitchplan-revision")),
      fingerprint: r.headers.get("x-stitchplan-fingerprint") ?? "",
      warning: warning ? decodeURIComponent(warning) : null,
    };
  });
}

/** A job's problems reported inside a store request (`job.parts[1].shape.h`) at the job's own paths. */
export const jobIssues = (issues: JobIssue[]): JobIssue[] =>
  issues.filter((i) => i.path === "job" || i.path.startsWith("job.") || i.path.startsWith("job[")).map((i) => ({ ...i, path: i.path.replace(/^job\.?/, "") }));

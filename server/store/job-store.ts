import { join } from "node:path";
import Database from "better-sqlite3";
import { showHidden } from "../../core/text/plain-text.js";
import { canonicalJson, issuesFromZod, PROGRAM, prepareJob, type JobDocument, type JobIssue } from "../../core/index.js";
import { fingerprintOf } from "../fingerprint.js";
import { ApiError } from "../errors.js";
import type { FingerprintLookUp, Member, Project, ResultSummary, RevisionInfo, SavedRevision, StoredRevision, WorksheetIssue } from "../../core/schema/store-contract.js";

export type { FingerprintLookUp, Member, Project, RevisionInfo, SavedRevision, StoredRevision, WorksheetIssue };
import { LATEST_SCHEMA_VERSION, schemaVersion } from "./migrations.js";
import { DATABASE_FILE, openDatabase } from "./open-database.js";
import { PROJECT_FILE_FORMAT, PROJECT_FILE_VERSION, ProjectFile, type NewProject } from "./store-schemas.js";








export interface StoreOptions {
  /** The clock; tests fix it. */
  now?: () => Date;
  /** How long a save waits for another process's save, ms (10 s by default). */
  busyTimeoutMs?: number;
  /** Called inside a save's transaction after its rows are written, before the commit (the crash test stops there). */
  beforeCommit?: () => void;
}

interface RevisionRow {
  member_id: number;
  number: number;
  job: string;
  fingerprint: string;
  saved_at: string;
  note: string;
  based_on: number | null;
  program: string;
  summary: string | null;
}

interface IssueRow {
  id: number;
  project_id: number;
  project_name: string;
  member_id: number;
  mark: string;
  revision: number;
  title_revision: string;
  fingerprint: string;
  issued_at: string;
  file_name: string;
  program: string;
  has_pdf: number;
}

const programName = `${PROGRAM.name} ${PROGRAM.version}`;

const ISSUE_SELECT = `
  SELECT w.id, p.id AS project_id, p.name AS project_name, m.id AS member_id, m.mark, w.revision, w.title_revision,
         w.fingerprint, w.issued_at, w.file_name, w.program, w.pdf IS NOT NULL AS has_pdf
  FROM worksheets w JOIN members m ON m.id = w.member_id JOIN projects p ON p.id = m.project_id`;

const issueOf = (r: IssueRow): WorksheetIssue => ({
  id: r.id,
  projectId: r.project_id,
  projectName: showHidden(r.project_name),
  memberId: r.member_id,
  mark: showHidden(r.mark),
  revision: r.revision,
  titleRevision: r.title_revision,
  fingerprint: r.fingerprint,
  issuedAt: r.issued_at,
  fileName: r.file_name,
  program: r.program,
  hasPdf: r.has_pdf === 1,
});

/** Issues of a job inside a request or file: `parts[1].shape.h` becomes `job.parts[1].shape.h`. */
export function prefixIssues(issues: JobIssue[], prefix: string): JobIssue[] {
  return issues.map((i) => ({ path: i.path === "(document)" ? prefix : i.path.startsWith("[") ? `${prefix}${i.path}` : `${prefix}.${i.path}`, message: i.message }));
}

/** Validates a job for saving; throws ERR_INPUT_INVALID with `job.…` paths. */
export function validJob(input: unknown, at: string): { job: JobDocument; core: JobDocument } {
  if (input === undefined) throw new ApiError("ERR_INPUT_INVALID", "The request needs the job document in `job`; nothing was stored.", [{ path: at, message: "is required (the job document)" }]);
  if (typeof input !== "object" || input === null || Array.isArray(input)) {
    throw new ApiError("ERR_INPUT_INVALID", "The job document has problems; nothing was stored.", [{ path: at, message: "must be a job document (a JSON object)" }]);
  }
  const prepared = prepareJob(input);
  if (!prepared.ok) throw new ApiError("ERR_INPUT_INVALID", "The job document has problems, each listed with its field; nothing was stored.", prefixIssues(prepared.issues, at));
  return prepared;
}

/** A project file whose every revision validates, ready to be stored. */
export interface ImportPlan {
  file: ProjectFile;
  members: { createdAt?: string | undefined; revisions: { job: JobDocument; revision: number; savedAt: string; note: string; basedOn: number | null; program: string }[]; worksheets: ProjectFile["members"][number]["worksheets"] }[];
}

const isMarkTaken = (error: unknown) => error instanceof Database.SqliteError && error.code === "SQLITE_CONSTRAINT_UNIQUE" && /members\.mark/.test(error.message);

/** SQLite failures a person can act on: disk full, locked by another program, read-only, damaged. */
function storeFailure(error: unknown): never {
  if (error instanceof Database.SqliteError) {
    const why: Record<string, string> = {
      SQLITE_BUSY: "the database is busy with another program's save for too long; try again",
      SQLITE_LOCKED: "the database is locked; try again",
      SQLITE_FULL: "the disk is full",
      SQLITE_READONLY: "the data folder is read-only",
      SQLITE_CORRUPT: "the database file is damaged",
      SQLITE_CANTOPEN: "the database file cannot be opened",
    };
    const reason = why[error.code] ?? (error.code.startsWith("SQLITE_IOERR") ? "the disk reported an error" : undefined);
    if (reason) throw new ApiError("ERR_STORE_UNAVAILABLE", `The job store could not complete the request: ${reason} (${error.code}). Nothing was stored or changed.`);
  }
  throw error;
}

/**
 * Projects, members and their revisions in one SQLite file. Every save is a new revision in one
 * transaction (nothing is overwritten); every issued worksheet is logged with its revision, date and
 * input fingerprint.
 */
export class JobStore {
  readonly db: Database.Database;
  /** Version the file was at when opened, and the copy taken before upgrading it (null when none). */
  readonly upgrade: { from: number; backup: string | null };
  private readonly now: () => string;

  private constructor(
    readonly file: string,
    opened: ReturnType<typeof openDatabase>,
    private readonly options: StoreOptions,
  ) {
    this.db = opened.db;
    this.upgrade = { from: opened.openedAt, backup: opened.backup };
    this.now = () => (options.now?.() ?? new Date()).toISOString();
  }

  /** Opens the store in a data folder (created if needed), upgrading an older file after copying it. */
  static open(dataDir: string, options: StoreOptions = {}): JobStore {
    const file = join(dataDir, DATABASE_FILE);
    return new JobStore(file, openDatabase(file, options), options);
  }

  close(): void {
    if (this.db.open) this.db.close();
  }

  /** Where the store is and what it holds. */
  info() {
    const count = (table: string) => (this.db.prepare(`SELECT count(*) AS n FROM ${table}`).get() as { n: number }).n;
    return {
      file: this.file,
      schemaVersion: schemaVersion(this.db),
      latestSchemaVersion: LATEST_SCHEMA_VERSION,
      upgrade: { from: this.upgrade.from, to: LATEST_SCHEMA_VERSION, backup: this.upgrade.backup },
      projects: count("projects"),
      members: count("members"),
      revisions: count("revisions"),
      worksheets: count("worksheets"),
    };
  }

  listProjects(): Project[] {
    const rows = this.db
      .prepare(
        `SELECT p.*, (SELECT count(*) FROM members m WHERE m.project_id = p.id) AS members,
                (SELECT max(r.saved_at) FROM revisions r JOIN members m ON m.id = r.member_id WHERE m.project_id = p.id) AS updated_at
         FROM projects p ORDER BY p.name COLLATE NOCASE, p.id`,
      )
      .all() as ProjectRow[];
    return rows.map(projectOf);
  }

  project(projectId: number): Project {
    const row = this.db
      .prepare(
        `SELECT p.*, (SELECT count(*) FROM members m WHERE m.project_id = p.id) AS members,
                (SELECT max(r.saved_at) FROM revisions r JOIN members m ON m.id = r.member_id WHERE m.project_id = p.id) AS updated_at
         FROM projects p WHERE p.id = ?`,
      )
      .get(projectId) as ProjectRow | undefined;
    if (!row) throw new ApiError("ERR_PROJECT_NOT_FOUND", `There is no project ${projectId} in the job store; GET /api/projects lists them.`);
    return projectOf(row);
  }

  createProject(input: NewProject): Project {
    try {
      const id = this.db.prepare("INSERT INTO projects (name, number, client, created_at) VALUES (?, ?, ?, ?)").run(input.name, input.number, input.client, this.now()).lastInsertRowid;
      return this.project(Number(id));
    } catch (error) {
      return storeFailure(error);
    }
  }

  listMembers(projectId: number): Member[] {
    this.project(projectId);
    const ids = this.db.prepare("SELECT id FROM members WHERE project_id = ? ORDER BY mark COLLATE NOCASE, id").pluck().all(projectId) as number[];
    return ids.map((id) => this.member(projectId, id));
  }

  member(projectId: number, memberId: number): Member {
    const row = this.db.prepare("SELECT * FROM members WHERE id = ? AND project_id = ?").get(memberId, projectId) as MemberRow | undefined;
    if (!row) {
      this.project(projectId);
      throw new ApiError("ERR_MEMBER_NOT_FOUND", `Project ${projectId} has no member ${memberId}; GET /api/projects/${projectId}/members lists them.`);
    }
    const latest = this.db.prepare("SELECT * FROM revisions WHERE member_id = ? ORDER BY number DESC LIMIT 1").get(memberId) as RevisionRow;
    const revisions = (this.db.prepare("SELECT count(*) FROM revisions WHERE member_id = ?").pluck().get(memberId) as number) ?? 0;
    const issued = this.db.prepare("SELECT count(*) FROM worksheets WHERE member_id = ?").pluck().get(memberId) as number;
    const last = this.db.prepare(`${ISSUE_SELECT} WHERE w.member_id = ? ORDER BY w.id DESC LIMIT 1`).get(memberId) as IssueRow | undefined;
    return {
      id: row.id,
      projectId: row.project_id,
      // Names saved before control and text-direction characters were refused are shown with them visible.
      mark: showHidden(row.mark),
      description: showHidden(row.description),
      createdAt: row.created_at,
      revisions,
      latest: this.revisionInfo(latest),
      issued,
      lastIssue: last ? issueOf(last) : null,
    };
  }

  /**
   * A new member with its first revision, in one transaction. The job must be valid; its summary is
   * worked out by the caller on a design thread (never here, on the thread that answers requests).
   */
  createMember(projectId: number, input: unknown, options: { note?: string; summary?: ResultSummary | null } = {}): SavedRevision {
    const { job } = validJob(input, "job");
    const summary = options.summary ?? null;
    try {
      return this.db
        .transaction(() => {
          this.project(projectId);
          const at = this.now();
          const memberId = Number(
            this.db.prepare("INSERT INTO members (project_id, mark, description, created_at) VALUES (?, ?, ?, ?)").run(projectId, job.member.mark, job.member.description, at).lastInsertRowid,
          );
          const revision = this.insertRevision(memberId, 1, job, { savedAt: at, note: options.note ?? "", basedOn: null, summary });
          this.options.beforeCommit?.();
          return { projectId, memberId, mark: job.member.mark, revision, warnings: [] };
        })
        .immediate();
    } catch (error) {
      if (isMarkTaken(error)) {
        throw new ApiError("ERR_MEMBER_EXISTS", `Project ${projectId} already has a member "${job.member.mark}"; save a revision of it, or give this member another mark (job.member.mark). Nothing was stored.`, [
          { path: "job.member.mark", message: `"${job.member.mark}" is already a member of this project` },
        ]);
      }
      return storeFailure(error);
    }
  }

  /**
   * Saves a job as the member's next revision. The number is taken inside the write lock, so two saves
   * at once (two tabs, two processes) become two revisions; neither replaces the other.
   */
  saveRevision(projectId: number, memberId: number, input: unknown, options: { basedOn?: number; note?: string; summary?: ResultSummary | null } = {}): SavedRevision {
    const { job } = validJob(input, "job");
    const summary = options.summary ?? null;
    try {
      return this.db
        .transaction((): SavedRevision => {
          const member = this.db.prepare("SELECT * FROM members WHERE id = ? AND project_id = ?").get(memberId, projectId) as MemberRow | undefined;
          if (!member) this.member(projectId, memberId);
          const latest = this.db.prepare("SELECT max(number) FROM revisions WHERE member_id = ?").pluck().get(memberId) as number;
          const warnings: string[] = [];
          const previous = this.db.prepare("SELECT fingerprint FROM revisions WHERE member_id = ? AND number = ?").pluck().get(memberId, latest) as string;
          if (previous === fingerprintOf(job)) warnings.push(`The input is the same as revision ${latest}'s; it is kept as revision ${latest + 1} all the same.`);
          if (options.basedOn !== undefined) {
            if (options.basedOn > latest) {
              throw new ApiError("ERR_INPUT_INVALID", "The request has problems; nothing was stored.", [{ path: "basedOn", message: `revision ${options.basedOn} does not exist (the latest is ${latest})` }]);
            }
            if (options.basedOn < latest) {
              warnings.push(
                `This revision (${latest + 1}) was edited from revision ${options.basedOn}, but revision${latest - options.basedOn > 1 ? "s" : ""} ${range(options.basedOn + 1, latest)} ${latest - options.basedOn > 1 ? "were" : "was"} saved meanwhile (another tab or person?). Both are kept: compare ${latest} with ${latest + 1} to see what this save undid.`,
              );
            }
          }
          if (job.member.mark !== member!.mark || job.member.description !== member!.description) {
            this.db.prepare("UPDATE members SET mark = ?, description = ? WHERE id = ?").run(job.member.mark, job.member.description, memberId);
          }
          const revision = this.insertRevision(memberId, latest + 1, job, { savedAt: this.now(), note: options.note ?? "", basedOn: options.basedOn ?? null, summary });
          this.options.beforeCommit?.();
          return { projectId, memberId, mark: job.member.mark, revision, warnings };
        })
        .immediate();
    } catch (error) {
      if (isMarkTaken(error)) {
        throw new ApiError("ERR_MEMBER_EXISTS", `Another member of project ${projectId} is already called "${job.member.mark}"; this save renames the member, so give it another mark. Nothing was stored.`, [
          { path: "job.member.mark", message: `"${job.member.mark}" is already another member of this project` },
        ]);
      }
      if (error instanceof ApiError) throw error;
      return storeFailure(error);
    }
  }

  listRevisions(projectId: number, memberId: number): (RevisionInfo & { issues: WorksheetIssue[] })[] {
    this.member(projectId, memberId);
    const rows = this.db.prepare("SELECT * FROM revisions WHERE member_id = ? ORDER BY number").all(memberId) as RevisionRow[];
    const issues = this.worksheets(projectId, memberId);
    return rows.map((r) => ({ ...this.revisionInfo(r), issues: issues.filter((i) => i.revision === r.number) }));
  }

  /** One revision with its job; `"latest"` for the newest. */
  revision(projectId: number, memberId: number, revision: number | "latest"): StoredRevision {
    this.member(projectId, memberId);
    const row = (
      revision === "latest"
        ? this.db.prepare("SELECT * FROM revisions WHERE member_id = ? ORDER BY number DESC LIMIT 1").get(memberId)
        : this.db.prepare("SELECT * FROM revisions WHERE member_id = ? AND number = ?").get(memberId, revision)
    ) as RevisionRow | undefined;
    if (!row) {
      const latest = this.db.prepare("SELECT max(number) FROM revisions WHERE member_id = ?").pluck().get(memberId) as number;
      throw new ApiError("ERR_REVISION_NOT_FOUND", `Member ${memberId} has no revision ${revision}; its revisions are 1 to ${latest}.`);
    }
    return { ...this.revisionInfo(row), projectId, memberId, job: JSON.parse(row.job) as JobDocument };
  }

  /** Logs an issued worksheet (with its PDF) for a revision. */
  recordWorksheet(
    projectId: number,
    memberId: number,
    revision: number,
    issue: { fingerprint: string; fileName: string; pdf: Buffer | null; titleRevision: string; program?: string; issuedAt?: string },
  ): { issue: WorksheetIssue; warnings: string[] } {
    try {
      return this.db
        .transaction(() => {
          this.revision(projectId, memberId, revision);
          const clash = this.db
            .prepare("SELECT revision, issued_at FROM worksheets WHERE member_id = ? AND title_revision = ? AND fingerprint <> ? ORDER BY id LIMIT 1")
            .get(memberId, issue.titleRevision, issue.fingerprint) as { revision: number; issued_at: string } | undefined;
          const id = this.db
            .prepare("INSERT INTO worksheets (member_id, revision, fingerprint, issued_at, file_name, pdf, program, title_revision) VALUES (?, ?, ?, ?, ?, ?, ?, ?)")
            .run(memberId, revision, issue.fingerprint, issue.issuedAt ?? this.now(), issue.fileName, issue.pdf, issue.program ?? programName, issue.titleRevision).lastInsertRowid;
          const warnings = clash
            ? [
                `A worksheet with title-block revision "${issue.titleRevision}" was already issued on ${clash.issued_at.slice(0, 10)} from store revision ${clash.revision}, with a different input. Change member.revision in the job so the two sheets can be told apart.`,
              ]
            : [];
          return { issue: issueOf(this.db.prepare(`${ISSUE_SELECT} WHERE w.id = ?`).get(id) as IssueRow), warnings };
        })
        .immediate();
    } catch (error) {
      if (error instanceof ApiError) throw error;
      return storeFailure(error);
    }
  }

  /** The member's issue log, oldest first. */
  worksheets(projectId: number, memberId: number): WorksheetIssue[] {
    this.member(projectId, memberId);
    return (this.db.prepare(`${ISSUE_SELECT} WHERE w.member_id = ? ORDER BY w.id`).all(memberId) as IssueRow[]).map(issueOf);
  }

  /** The bytes of an issued worksheet as they were sent. */
  worksheetPdf(projectId: number, memberId: number, issueId: number): { issue: WorksheetIssue; pdf: Buffer } {
    this.member(projectId, memberId);
    const row = this.db.prepare(`${ISSUE_SELECT} WHERE w.id = ? AND w.member_id = ?`).get(issueId, memberId) as IssueRow | undefined;
    if (!row) throw new ApiError("ERR_WORKSHEET_NOT_FOUND", `Member ${memberId} has no issued worksheet ${issueId}.`);
    const pdf = this.db.prepare("SELECT pdf FROM worksheets WHERE id = ?").pluck().get(issueId) as Buffer | null;
    if (!pdf) throw new ApiError("ERR_WORKSHEET_NOT_FOUND", `Worksheet ${issueId} was brought in by a project import, which carries the issue log but not the PDF; issue the revision again to get a sheet.`);
    return { issue: issueOf(row), pdf };
  }

  /** What a fingerprint printed on a worksheet belongs to; a prefix of 8 or more hexadecimal digits is enough. */
  lookUp(fingerprint: string): FingerprintLookUp {
    const prefix = fingerprint.toLowerCase();
    const range = [prefix, `${prefix}g`];
    const issues = (this.db.prepare(`${ISSUE_SELECT} WHERE w.fingerprint >= ? AND w.fingerprint < ? ORDER BY w.id`).all(...range) as IssueRow[]).map(issueOf);
    const revisions = (
      this.db
        .prepare(
          `SELECT p.id AS project_id, p.name AS project_name, m.id AS member_id, m.mark, r.number, r.saved_at, r.fingerprint
           FROM revisions r JOIN members m ON m.id = r.member_id JOIN projects p ON p.id = m.project_id
           WHERE r.fingerprint >= ? AND r.fingerprint < ? ORDER BY r.saved_at`,
        )
        .all(...range) as { project_id: number; project_name: string; member_id: number; mark: string; number: number; saved_at: string; fingerprint: string }[]
    ).map((r) => ({ projectId: r.project_id, projectName: showHidden(r.project_name), memberId: r.member_id, mark: showHidden(r.mark), revision: r.number, savedAt: r.saved_at, fingerprint: r.fingerprint }));
    if (issues.length === 0 && revisions.length === 0) {
      throw new ApiError("ERR_WORKSHEET_NOT_FOUND", `No issued worksheet or saved revision in this job store has the fingerprint ${fingerprint}.`);
    }
    // A prefix that matches one fingerprint answers with it in full.
    const full = new Set([...issues.map((i) => i.fingerprint), ...revisions.map((r) => r.fingerprint)]);
    return { fingerprint: full.size === 1 ? [...full][0]! : fingerprint, issues, revisions };
  }

  /** The whole project as one file: every revision's job and the issue log. */
  exportProject(projectId: number): ProjectFile {
    const project = this.project(projectId);
    const members = this.db.prepare("SELECT * FROM members WHERE project_id = ? ORDER BY id").all(projectId) as MemberRow[];
    return {
      format: PROJECT_FILE_FORMAT,
      version: PROJECT_FILE_VERSION,
      program: { name: PROGRAM.name, version: PROGRAM.version },
      exportedAt: this.now(),
      project: { name: project.name, number: project.number, client: project.client, createdAt: project.createdAt },
      members: members.map((m) => ({
        mark: m.mark,
        description: m.description,
        createdAt: m.created_at,
        revisions: (this.db.prepare("SELECT * FROM revisions WHERE member_id = ? ORDER BY number").all(m.id) as RevisionRow[]).map((r) => ({
          revision: r.number,
          savedAt: r.saved_at,
          note: r.note,
          basedOn: r.based_on,
          fingerprint: r.fingerprint,
          program: r.program,
          job: JSON.parse(r.job) as unknown,
        })),
        worksheets: (this.db.prepare(`${ISSUE_SELECT} WHERE w.member_id = ? ORDER BY w.id`).all(m.id) as IssueRow[]).map((w) => ({
          revision: w.revision,
          fingerprint: w.fingerprint,
          issuedAt: w.issued_at,
          fileName: w.file_name,
          program: w.program,
          titleRevision: w.title_revision,
        })),
      })),
    };
  }

  /**
   * Brings in a project file as a new project. Every member's every revision is validated first and each
   * problem reported with its path (`members[3].revisions[0].job.parts[1].shape.h`); with any problem,
   * nothing is stored.
   */
  importProject(input: unknown, summaries: (member: number, revision: number) => ResultSummary | null = () => null): Project {
    const file = JobStore.parseProjectFile(input);
    return this.storeImport(this.checkImport(file, (mi, ri) => validJob(file.members[mi]!.revisions[ri]!.job, `members[${mi}].revisions[${ri}].job`).job), summaries);
  }

  /** A project file's own fields (not yet its jobs); throws ERR_PROJECT_FILE_INVALID with every problem. */
  static parseProjectFile(input: unknown): ProjectFile {
    const parsed = ProjectFile.safeParse(input, { reportInput: true });
    if (!parsed.success) throw new ApiError("ERR_PROJECT_FILE_INVALID", undefined, issuesFromZod(parsed.error));
    return parsed.data;
  }

  /**
   * The validation half of an import: every problem with its path, or the plan to store. `jobOf` gives each
   * revision's job as parsed, or throws ERR_INPUT_INVALID with its issues at their paths (the route has them
   * validated on a design thread).
   */
  checkImport(file: ProjectFile, jobOf: (member: number, revision: number) => JobDocument): ImportPlan {
    const issues: JobIssue[] = [];
    const members = file.members.map((m, mi) => {
      const revisions = m.revisions.map((r, ri) => {
        const at = `members[${mi}].revisions[${ri}]`;
        if (r.revision !== ri + 1) issues.push({ path: `${at}.revision`, message: `must be ${ri + 1}: revisions are numbered 1, 2, 3… in order, without gaps` });
        if (r.basedOn !== null && r.basedOn >= r.revision) issues.push({ path: `${at}.basedOn`, message: `must be an earlier revision than ${r.revision}` });
        try {
          return { ...r, job: jobOf(mi, ri) };
        } catch (error) {
          if (!(error instanceof ApiError)) throw error;
          issues.push(...error.issues);
          return null;
        }
      });
      m.worksheets.forEach((w, wi) => {
        if (w.revision > m.revisions.length) issues.push({ path: `members[${mi}].worksheets[${wi}].revision`, message: `this member has no revision ${w.revision} (it has ${m.revisions.length})` });
      });
      return { ...m, revisions };
    });
    const marks = new Map<string, number>();
    members.forEach((m, mi) => {
      const last = m.revisions[m.revisions.length - 1];
      if (!last) return;
      const first = marks.get(last.job.member.mark);
      if (first !== undefined) {
        issues.push({ path: `members[${mi}].revisions[${m.revisions.length - 1}].job.member.mark`, message: `"${last.job.member.mark}" is also the mark of members[${first}]; marks must differ within a project` });
      } else marks.set(last.job.member.mark, mi);
    });
    if (issues.length > 0) throw new ApiError("ERR_PROJECT_FILE_INVALID", `The project file has ${issues.length} problem${issues.length === 1 ? "" : "s"}, each listed with its path; nothing was stored.`, issues);
    return { file, members: members.map((m) => ({ createdAt: m.createdAt, revisions: m.revisions.map((r) => r!), worksheets: m.worksheets })) };
  }

  /** The storing half of an import, with each revision's summary (member and revision index). */
  storeImport(plan: ImportPlan, summaries: (member: number, revision: number) => ResultSummary | null = () => null): Project {
    const { file, members } = plan;
    try {
      return this.db
        .transaction(() => {
          const now = this.now();
          const projectId = Number(
            this.db
              .prepare("INSERT INTO projects (name, number, client, created_at, imported_at) VALUES (?, ?, ?, ?, ?)")
              .run(file.project.name, file.project.number, file.project.client, file.project.createdAt ?? now, now).lastInsertRowid,
          );
          for (const [mi, m] of members.entries()) {
            const revisions = m.revisions;
            const last = revisions[revisions.length - 1]!;
            const memberId = Number(
              this.db
                .prepare("INSERT INTO members (project_id, mark, description, created_at) VALUES (?, ?, ?, ?)")
                .run(projectId, last.job.member.mark, last.job.member.description, m.createdAt ?? revisions[0]!.savedAt).lastInsertRowid,
            );
            for (const [ri, r] of revisions.entries()) {
              this.insertRevision(memberId, r.revision, r.job, { savedAt: r.savedAt, note: r.note, basedOn: r.basedOn, summary: summaries(mi, ri), program: r.program });
            }
            for (const w of m.worksheets) {
              this.db
                .prepare("INSERT INTO worksheets (member_id, revision, fingerprint, issued_at, file_name, pdf, program, title_revision) VALUES (?, ?, ?, ?, ?, NULL, ?, ?)")
                .run(memberId, w.revision, w.fingerprint, w.issuedAt, w.fileName, w.program, w.titleRevision);
            }
          }
          this.options.beforeCommit?.();
          return this.project(projectId);
        })
        .immediate();
    } catch (error) {
      if (error instanceof ApiError) throw error;
      return storeFailure(error);
    }
  }

  /** Keeps a summary worked out later for a revision that had none (a cache: a busy or read-only file just skips it). */
  setSummary(memberId: number, revision: number, summary: ResultSummary): void {
    try {
      this.db.prepare("UPDATE revisions SET summary = ? WHERE member_id = ? AND number = ? AND summary IS NULL").run(JSON.stringify(summary), memberId, revision);
    } catch {
      // Worked out again next time.
    }
  }

  private insertRevision(
    memberId: number,
    number: number,
    job: JobDocument,
    meta: { savedAt: string; note: string; basedOn: number | null; summary: ResultSummary | null; program?: string },
  ): RevisionInfo {
    const fingerprint = fingerprintOf(job);
    this.db
      .prepare("INSERT INTO revisions (member_id, number, job, fingerprint, saved_at, note, based_on, program, summary) VALUES (?, ?, ?, ?, ?, ?, ?, ?, ?)")
      .run(memberId, number, canonicalJson(job), fingerprint, meta.savedAt, meta.note, meta.basedOn, meta.program || programName, meta.summary ? JSON.stringify(meta.summary) : null);
    return { revision: number, savedAt: meta.savedAt, note: meta.note, basedOn: meta.basedOn, fingerprint, program: meta.program || programName, summary: meta.summary };
  }

  /**
   * A listing reads the summary kept with the revision and never designs: a design belongs on a design
   * thread with its limits, and a job that could stop the process must not be run by a listing. A revision
   * from a version-1 store has none (null) until a design thread works it out (`setSummary`).
   */
  private revisionInfo(row: RevisionRow): RevisionInfo {
    const summary = row.summary ? (JSON.parse(row.summary) as ResultSummary) : null;
    return { revision: row.number, savedAt: row.saved_at, note: showHidden(row.note), basedOn: row.based_on, fingerprint: row.fingerprint, program: row.program, summary };
  }
}

interface ProjectRow {
  id: number;
  name: string;
  number: string;
  client: string;
  created_at: string;
  members: number;
  updated_at: string | null;
  imported_at: string | null;
}

interface MemberRow {
  id: number;
  project_id: number;
  mark: string;
  description: string;
  created_at: string;
}

const projectOf = (r: ProjectRow): Project => ({ id: r.id, name: showHidden(r.name), number: showHidden(r.number), client: showHidden(r.client), createdAt: r.created_at, members: r.members, updatedAt: r.updated_at, importedAt: r.imported_at ?? null });

const range = (a: number, b: number) => (a === b ? `${a}` : `${a} to ${b}`);

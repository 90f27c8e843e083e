import type { FastifyInstance } from "fastify";
import type { z } from "zod";
import { issuesFromZod, JobDocument, toDisplayUnits, type JobIssue, type UnitSystem } from "../../core/index.js";
import type { Comparison } from "../../core/schema/store-contract.js";
import type { ResultSummary } from "../result-summary.js";
import type { ProjectFile } from "../store/store-schemas.js";
import { bytesOf, type DesignTask, type PreparedSummary, type TaskAnswer } from "../design-tasks.js";
import type { TaskRunner } from "../design-threads.js";
import { ApiError } from "../errors.js";
import { today } from "../pdf/worksheet.js";
import { inputChanges, resultChanges } from "../store/compare-revisions.js";
import { JobStore, prefixIssues, validJob, type StoreOptions } from "../store/job-store.js";
import { CompareQuery, NewMember, NewProject, SaveRevision } from "../store/store-schemas.js";

export interface StoreRoutesOptions {
  /** Folder holding the store's database (created if needed). */
  dataDir: string;
  store?: StoreOptions;
  /** Where designs and worksheets run. */
  designs: TaskRunner;
}

/** A project file may be far larger than one job. */
const IMPORT_BODY_LIMIT = 64 * 1024 * 1024;

function parse<S extends z.ZodType>(schema: S, value: unknown, message = "The request has problems, each listed with its field; nothing was stored."): z.infer<S> {
  const parsed = schema.safeParse(value ?? {}, { reportInput: true });
  if (!parsed.success) throw new ApiError("ERR_INPUT_INVALID", message, issuesFromZod(parsed.error));
  return parsed.data;
}

const ID = /^[1-9]\d{0,14}$/;

function projectId(value: string): number {
  if (!ID.test(value)) throw new ApiError("ERR_PROJECT_NOT_FOUND", `There is no project "${value}"; project ids are whole numbers (GET /api/projects lists them).`);
  return Number(value);
}

function memberId(value: string): number {
  if (!ID.test(value)) throw new ApiError("ERR_MEMBER_NOT_FOUND", `There is no member "${value}"; member ids are whole numbers.`);
  return Number(value);
}

function revisionNumber(value: string): number | "latest" {
  if (value === "latest") return value;
  if (!ID.test(value)) throw new ApiError("ERR_REVISION_NOT_FOUND", `There is no revision "${value}"; revisions are numbered 1, 2, 3… (or "latest").`);
  return Number(value);
}

function unitsQuery(value: string | undefined): UnitSystem | undefined {
  if (value === undefined) return undefined;
  if (value !== "si" && value !== "us") throw new ApiError("ERR_INPUT_INVALID", undefined, [{ path: "units", message: `must be "si" or "us", not ${JSON.stringify(value)}` }]);
  return value;
}

/** A stored job that no longer validates (a later program changed the schema) is reported with its revision in the path. */
async function designStored<T extends DesignTask>(designs: TaskRunner, task: T, at: string): Promise<TaskAnswer<T>> {
  try {
    return await designs.run(task);
  } catch (error) {
    if (error instanceof ApiError && error.code === "ERR_INPUT_INVALID") {
      throw new ApiError("ERR_INPUT_INVALID", "This stored revision does not validate with this version of the program; open it, correct the fields listed and save a new revision.", prefixIssues(error.issues, at));
    }
    throw error;
  }
}

/**
 * A job to be saved: validated here (the store's messages and paths), then its summary worked out on a
 * design thread with the time and memory limits; a job that cannot be designed within them is not saved (422).
 */
async function summaryForSave(designs: TaskRunner, job: unknown): Promise<ResultSummary | null> {
  validJob(job, "job");
  return designStored(designs, { kind: "summary", input: job }, "job");
}

/**
 * Each revision of an import validated and designed on the design threads, two at a time (the HTTP thread
 * only reads the file's own fields): the jobs as parsed and their summaries, or every problem with its path;
 * a revision past a time or memory limit stops the rest.
 */
async function prepareImport(designs: TaskRunner, file: ProjectFile): Promise<{ jobOf: (m: number, r: number) => JobDocument; summaryOf: (m: number, r: number) => ResultSummary | null }> {
  const work = file.members.flatMap((m, mi) => m.revisions.map((r, ri) => ({ mi, ri, job: r.job })));
  const found = new Map<string, PreparedSummary>();
  const invalid = new Map<string, JobIssue[]>();
  const limits: JobIssue[] = [];
  let next = 0;
  const lane = async () => {
    while (next < work.length && limits.length === 0) {
      const { mi, ri, job } = work[next++]!;
      const at = `members[${mi}].revisions[${ri}]`;
      try {
        found.set(`${mi}/${ri}`, await designs.run({ kind: "prepared-summary", input: job }, { unbounded: true }));
      } catch (error) {
        if (!(error instanceof ApiError)) throw error;
        if (error.code === "ERR_INPUT_INVALID") invalid.set(`${mi}/${ri}`, prefixIssues(error.issues, `${at}.job`));
        else if (error.code === "ERR_DESIGN_TIME_LIMIT" || error.code === "ERR_DESIGN_MEMORY_LIMIT") limits.push({ path: `${at}.job`, message: `cannot be designed within the service's limits: ${error.message}` });
        else throw error;
      }
    }
  };
  await Promise.all([lane(), lane()]);
  if (limits.length > 0) {
    throw new ApiError("ERR_PROJECT_FILE_INVALID", "A revision of the project file cannot be designed within the service's time and memory limits; nothing was stored.", limits);
  }
  return {
    jobOf: (mi, ri) => {
      const issues = invalid.get(`${mi}/${ri}`);
      if (issues) throw new ApiError("ERR_INPUT_INVALID", undefined, issues);
      return found.get(`${mi}/${ri}`)!.job;
    },
    summaryOf: (mi, ri) => found.get(`${mi}/${ri}`)?.summary ?? null,
  };
}

type P = { Params: { project: string } };
type M = { Params: { project: string; member: string } };
type R = { Params: { project: string; member: string; revision: string } };

/**
 * The job store's API: projects, members, revisions (every save is a new one), comparisons, issued
 * worksheets and their fingerprint look-up, whole-project export and import.
 */
export async function storeRoutes(app: FastifyInstance, options: StoreRoutesOptions) {
  const store = JobStore.open(options.dataDir, options.store);
  const { designs } = options;
  app.addHook("onClose", async () => store.close());

  app.get("/api/store", async () => store.info());

  app.get("/api/projects", async () => store.listProjects());

  app.post("/api/projects", async (request, reply) => reply.status(201).send(store.createProject(parse(NewProject, request.body))));

  app.get<P>("/api/projects/:project", async (request) => store.project(projectId(request.params.project)));

  app.get<P>("/api/projects/:project/members", async (request) => store.listMembers(projectId(request.params.project)));

  app.post<P>("/api/projects/:project/members", async (request, reply) => {
    const id = projectId(request.params.project);
    const body = parse(NewMember, request.body);
    store.project(id);
    const summary = await summaryForSave(designs, body.job);
    return reply.status(201).send(store.createMember(id, body.job, { note: body.note, summary }));
  });

  app.get<M>("/api/projects/:project/members/:member", async (request) => store.member(projectId(request.params.project), memberId(request.params.member)));

  app.get<M>("/api/projects/:project/members/:member/revisions", async (request) => store.listRevisions(projectId(request.params.project), memberId(request.params.member)));

  app.post<M>("/api/projects/:project/members/:member/revisions", async (request, reply) => {
    const [p, m] = [projectId(request.params.project), memberId(request.params.member)];
    const body = parse(SaveRevision, request.body);
    store.member(p, m);
    const summary = await summaryForSave(designs, body.job);
    const saved = store.saveRevision(p, m, body.job, body.basedOn === undefined ? { note: body.note, summary } : { basedOn: body.basedOn, note: body.note, summary });
    return reply.status(201).send(saved);
  });

  app.get<R>("/api/projects/:project/members/:member/revisions/:revision", async (request) =>
    store.revision(projectId(request.params.project), memberId(request.params.member), revisionNumber(request.params.revision)),
  );

  app.get<R & { Querystring: { units?: string } }>("/api/projects/:project/members/:member/revisions/:revision/result", async (request, reply) => {
    const stored = store.revision(projectId(request.params.project), memberId(request.params.member), revisionNumber(request.params.revision));
    const json = await designStored(designs, { kind: "result-json", input: stored.job, units: unitsQuery(request.query.units) }, "job");
    if (stored.summary === null) {
      // A revision from a version-1 store: its summary, worked out on a design thread now that it has designed there once.
      designs.run({ kind: "summary", input: stored.job }).then(
        (summary) => summary && store.setSummary(stored.memberId, stored.revision, summary),
        () => undefined,
      );
    }
    return reply.type("application/json; charset=utf-8").send(bytesOf(json));
  });

  app.get<M & { Querystring: Record<string, string> }>("/api/projects/:project/members/:member/compare", async (request) => {
    const [p, m] = [projectId(request.params.project), memberId(request.params.member)];
    const query = parse(CompareQuery, request.query, "The comparison needs two revision numbers: ?from=1&to=2.");
    const from = store.revision(p, m, query.from);
    const to = store.revision(p, m, query.to);
    const units = query.units ?? to.job.units;
    const [a, b] = await Promise.all([
      designStored(designs, { kind: "result", input: from.job, units }, "from.job"),
      designStored(designs, { kind: "result", input: to.job, units }, "to.job"),
    ]);
    // Same units: the documents as saved. Otherwise both in the shown units, so a converted number is not a change.
    const inputs =
      from.job.units === units && to.job.units === units
        ? inputChanges(from.job, to.job)
        : inputChanges(toDisplayUnits(JobDocument, a.core, units), toDisplayUnits(JobDocument, b.core, units), { rel: 1e-9 });
    const meta = (r: typeof from) => ({ revision: r.revision, savedAt: r.savedAt, note: r.note, fingerprint: r.fingerprint, units: r.job.units });
    const comparison: Comparison = {
      projectId: p,
      memberId: m,
      units,
      unitLabels: b.shown.unitLabels,
      from: meta(from),
      to: meta(to),
      sameInputs: inputs.length === 0,
      inputs,
      results: resultChanges(a.shown, b.shown),
    };
    return comparison;
  });

  app.post<R>("/api/projects/:project/members/:member/revisions/:revision/worksheets", async (request, reply) => {
    const [p, m, n] = [projectId(request.params.project), memberId(request.params.member), revisionNumber(request.params.revision)];
    const stored = store.revision(p, m, n);
    const sheet = await designStored(designs, { kind: "worksheet", input: stored.job, printDate: today() }, "job");
    const pdf = Buffer.from(sheet.pdf.buffer, sheet.pdf.byteOffset, sheet.pdf.byteLength);
    // The store's revision number beside the title block's, so two issues of one title revision never share a name.
    const fileName = sheet.fileName.replace(/\.pdf$/, `_store-rev-${stored.revision}.pdf`);
    const { issue, warnings } = store.recordWorksheet(p, m, stored.revision, { fingerprint: sheet.fingerprint, fileName, pdf, titleRevision: sheet.titleRevision });
    if (warnings.length > 0) reply.header("x-stitchplan-warning", encodeURIComponent(warnings.join(" ")));
    return reply
      .status(201)
      .type("application/pdf")
      .header("content-disposition", `attachment; filename="${fileName}"`)
      .header("x-stitchplan-issue", String(issue.id))
      .header("x-stitchplan-revision", String(issue.revision))
      .header("x-stitchplan-fingerprint", issue.fingerprint)
      .send(pdf);
  });

  app.get<M>("/api/projects/:project/members/:member/worksheets", async (request) => store.worksheets(projectId(request.params.project), memberId(request.params.member)));

  app.get<M & { Params: { issue: string } }>("/api/projects/:project/members/:member/worksheets/:issue/pdf", async (request, reply) => {
    const issueId = request.params.issue;
    if (!ID.test(issueId)) throw new ApiError("ERR_WORKSHEET_NOT_FOUND", `There is no issued worksheet "${issueId}"; issue ids are whole numbers.`);
    const { issue, pdf } = store.worksheetPdf(projectId(request.params.project), memberId(request.params.member), Number(issueId));
    return reply
      .type("application/pdf")
      .header("content-disposition", `attachment; filename="${issue.fileName}"`)
      .header("x-stitchplan-fingerprint", issue.fingerprint)
      .send(pdf);
  });

  app.get<{ Params: { fingerprint: string } }>("/api/worksheets/:fingerprint", async (request) => {
    const fingerprint = request.params.fingerprint;
    if (!/^[0-9a-fA-F]{8,64}$/.test(fingerprint)) {
      throw new ApiError("ERR_INPUT_INVALID", "A fingerprint is the 64 hexadecimal digits printed in the worksheet's footer (the first 8 or more are enough).", [
        { path: "fingerprint", message: `must be 8 to 64 hexadecimal digits, not ${JSON.stringify(fingerprint.slice(0, 80))}` },
      ]);
    }
    return store.lookUp(fingerprint);
  });

  app.get<P>("/api/projects/:project/export", async (request, reply) => {
    const file = store.exportProject(projectId(request.params.project));
    const name = (file.project.number || file.project.name).replace(/[^A-Za-z0-9._-]+/g, "-").replace(/^-+|-+$/g, "") || "project";
    return reply.header("content-disposition", `attachment; filename="${name}.stitchplan-project.json"`).send(file);
  });

  app.post("/api/projects/import", { bodyLimit: IMPORT_BODY_LIMIT }, async (request, reply) => {
    const file = JobStore.parseProjectFile(request.body);
    const { jobOf, summaryOf } = await prepareImport(designs, file);
    return reply.status(201).send(store.storeImport(store.checkImport(file, jobOf), summaryOf));
  });
}

import { afterEach, beforeEach, describe, expect, test } from "vitest";
import { ApiError } from "../../../server/errors.js";
import { runDesign } from "../../../server/design-service.js";
import { summariseResult } from "../../../server/result-summary.js";
import { JobStore } from "../../../server/store/job-store.js";
import { example, steppingClock, tempFolder } from "./store-fixtures.js";

let folder: ReturnType<typeof tempFolder>;
let store: JobStore;
beforeEach(() => {
  folder = tempFolder("store");
  store = JobStore.open(folder.dir, { now: steppingClock() });
});
afterEach(() => {
  store.close();
  folder.remove();
});

/** The ApiError a call throws, for its code and issues. */
function thrown(fn: () => unknown): ApiError {
  try {
    fn();
  } catch (error) {
    if (error instanceof ApiError) return error;
    throw error;
  }
  throw new Error("expected an ApiError");
}

const counts = () => {
  const { projects, members, revisions, worksheets } = store.info();
  return { projects, members, revisions, worksheets };
};

describe("JobStore revisions", () => {
  test("saveRevision(…) adds revision 2 and leaves revision 1's job as it was", () => {
    const project = store.createProject({ name: "Barn", number: "DEMO-103", client: "" });
    const job = example("loft-beam-16d.us");
    const first = store.createMember(project.id, job, { note: "first" });
    expect(first.revision.revision).toBe(1);
    const before = store.revision(project.id, first.memberId, 1);

    job.beam.loads[0].w = 52;
    const second = store.saveRevision(project.id, first.memberId, job, { note: "more load" });
    expect(second.revision.revision).toBe(2);
    expect(second.revision.fingerprint).not.toBe(first.revision.fingerprint);
    expect(store.revision(project.id, first.memberId, 1)).toEqual(before);
    expect(store.revision(project.id, first.memberId, "latest").job.beam.loads[0]).toMatchObject({ w: 52 });
    expect(store.listRevisions(project.id, first.memberId).map((r) => [r.revision, r.note])).toEqual([
      [1, "first"],
      [2, "more load"],
    ]);
  });

  test("a saved revision keeps the summary it is given (worked out on a design thread by the route), and a listing reads it", () => {
    const project = store.createProject({ name: "Barn", number: "", client: "" });
    const job = example("loft-beam-16d.us");
    const saved = store.createMember(project.id, job, { summary: summariseResult(runDesign(job).result) });
    expect(saved.revision.summary).toMatchObject({ passes: true, connectors: 70 });
    expect(saved.revision.summary!.governing!.utilisation).toBeGreaterThan(0.5);
    const [member] = store.listMembers(project.id);
    expect(member).toMatchObject({ mark: "LB-1", revisions: 1, issued: 0, lastIssue: null });
  });

  test("an invalid job is refused with job.… paths and nothing is stored", () => {
    const project = store.createProject({ name: "Barn", number: "", client: "" });
    const job = example("loft-beam-16d.us");
    const saved = store.createMember(project.id, job);
    const before = counts();
    job.parts[1].shape.h = -3;
    const error = thrown(() => store.saveRevision(project.id, saved.memberId, job));
    expect(error.code).toBe("ERR_INPUT_INVALID");
    expect(error.issues).toContainEqual({ path: "job.parts[1].shape.h", message: expect.stringContaining("greater than 0") });
    expect(thrown(() => store.createMember(project.id, undefined)).issues).toEqual([{ path: "job", message: expect.stringContaining("required") }]);
    expect(counts()).toEqual(before);
  });

  test("a second member with a mark the project already has is ERR_MEMBER_EXISTS, naming job.member.mark", () => {
    const project = store.createProject({ name: "Barn", number: "", client: "" });
    store.createMember(project.id, example("loft-beam-16d.us"));
    const error = thrown(() => store.createMember(project.id, example("loft-beam-16d.us")));
    expect(error.code).toBe("ERR_MEMBER_EXISTS");
    expect(error.issues[0]!.path).toBe("job.member.mark");
    expect(store.info().members).toBe(1);
  });

  test("a save edited from an older revision is kept, with a warning naming the revision saved meanwhile", () => {
    const project = store.createProject({ name: "Barn", number: "", client: "" });
    const job = example("loft-beam-16d.us");
    const { memberId } = store.createMember(project.id, job);
    job.beam.loads[0].w = 41;
    store.saveRevision(project.id, memberId, job, { basedOn: 1 });
    job.beam.loads[0].w = 42;
    const late = store.saveRevision(project.id, memberId, job, { basedOn: 1 });
    expect(late.revision).toMatchObject({ revision: 3, basedOn: 1 });
    expect(late.warnings.join(" ")).toContain("revision 2 was saved meanwhile");
    expect(thrown(() => store.saveRevision(project.id, memberId, job, { basedOn: 9 })).issues[0]!.path).toBe("basedOn");
  });

  test("unknown project, member and revision each have their own not-found code", () => {
    const project = store.createProject({ name: "Barn", number: "", client: "" });
    const { memberId } = store.createMember(project.id, example("loft-beam-16d.us"));
    expect(thrown(() => store.listMembers(99)).code).toBe("ERR_PROJECT_NOT_FOUND");
    expect(thrown(() => store.member(project.id, 99)).code).toBe("ERR_MEMBER_NOT_FOUND");
    expect(thrown(() => store.revision(project.id, memberId, 2)).code).toBe("ERR_REVISION_NOT_FOUND");
    expect(thrown(() => store.saveRevision(99, memberId, example("loft-beam-16d.us"))).code).toBe("ERR_PROJECT_NOT_FOUND");
  });

  test("two connections saving the same member take turns: revisions 2 and 3, neither lost", () => {
    const project = store.createProject({ name: "Barn", number: "", client: "" });
    const job = example("loft-beam-16d.us");
    const { memberId } = store.createMember(project.id, job);
    const other = JobStore.open(folder.dir);
    try {
      job.beam.loads[0].w = 45;
      const a = store.saveRevision(project.id, memberId, job, { basedOn: 1 });
      job.beam.loads[0].w = 46;
      const b = other.saveRevision(project.id, memberId, job, { basedOn: 1 });
      expect([a.revision.revision, b.revision.revision]).toEqual([2, 3]);
      expect(store.listRevisions(project.id, memberId).map((r) => r.revision)).toEqual([1, 2, 3]);
    } finally {
      other.close();
    }
  });

  test("a save that waits too long for another program's write lock is ERR_STORE_UNAVAILABLE and stores nothing", () => {
    const project = store.createProject({ name: "Barn", number: "", client: "" });
    const { memberId } = store.createMember(project.id, example("loft-beam-16d.us"));
    const impatient = JobStore.open(folder.dir, { busyTimeoutMs: 50 });
    store.db.exec("BEGIN IMMEDIATE");
    try {
      expect(thrown(() => impatient.saveRevision(project.id, memberId, example("loft-beam-16d.us"))).code).toBe("ERR_STORE_UNAVAILABLE");
    } finally {
      store.db.exec("ROLLBACK");
      impatient.close();
    }
    expect(store.info().revisions).toBe(1);
  });
});

describe("JobStore worksheet issues", () => {
  test("recordWorksheet logs revision, date and fingerprint; lookUp finds it by the full fingerprint or a prefix", () => {
    const project = store.createProject({ name: "Barn", number: "DEMO-103", client: "" });
    const saved = store.createMember(project.id, example("loft-beam-16d.us"));
    const fingerprint = saved.revision.fingerprint;
    const { issue } = store.recordWorksheet(project.id, saved.memberId, 1, { fingerprint, fileName: "DEMO-103_LB-1_rev-A.pdf", pdf: Buffer.from("%PDF"), titleRevision: "A" });
    expect(issue).toMatchObject({ projectId: project.id, projectName: "Barn", mark: "LB-1", revision: 1, fingerprint, titleRevision: "A", hasPdf: true });
    expect(issue.issuedAt).toMatch(/^2025-03-14T09:00:\d\d\.000Z$/);

    const found = store.lookUp(fingerprint);
    expect(found.issues).toEqual([issue]);
    expect(found.revisions).toMatchObject([{ projectId: project.id, mark: "LB-1", revision: 1 }]);
    const byPrefix = store.lookUp(fingerprint.slice(0, 10).toUpperCase());
    expect(byPrefix.issues).toEqual([issue]);
    expect(byPrefix.fingerprint).toBe(fingerprint);
    expect(store.worksheetPdf(project.id, saved.memberId, issue.id).pdf.toString()).toBe("%PDF");
    expect(thrown(() => store.lookUp("0".repeat(64))).code).toBe("ERR_WORKSHEET_NOT_FOUND");
  });

  test("issuing a different input under a title-block revision already issued gives a warning", () => {
    const project = store.createProject({ name: "Barn", number: "", client: "" });
    const job = example("loft-beam-16d.us");
    const first = store.createMember(project.id, job);
    store.recordWorksheet(project.id, first.memberId, 1, { fingerprint: first.revision.fingerprint, fileName: "a.pdf", pdf: null, titleRevision: "A" });
    job.beam.loads[0].w = 41;
    const second = store.saveRevision(project.id, first.memberId, job);
    const { warnings } = store.recordWorksheet(project.id, first.memberId, 2, { fingerprint: second.revision.fingerprint, fileName: "a.pdf", pdf: null, titleRevision: "A" });
    expect(warnings.join(" ")).toContain('title-block revision "A" was already issued');
  });
});

describe("JobStore export and import", () => {
  function projectWithHistory() {
    const project = store.createProject({ name: "Maple Hollow", number: "DEMO-103", client: "Invented" });
    const loft = example("loft-beam-16d.us");
    const a = store.createMember(project.id, loft, { note: "first" });
    loft.beam.loads[0].w = 45;
    store.saveRevision(project.id, a.memberId, loft, { basedOn: 1, note: "more load" });
    store.recordWorksheet(project.id, a.memberId, 2, { fingerprint: "ab".repeat(32), fileName: "x.pdf", pdf: Buffer.from("%PDF"), titleRevision: "A" });
    store.createMember(project.id, example("workshop-box-beam.si"));
    store.createMember(project.id, example("glued-lintel.si"));
    return project;
  }

  test("importProject(exportProject(p)) gives a new project with the same jobs, notes and issue log", () => {
    const project = projectWithHistory();
    const file = JSON.parse(JSON.stringify(store.exportProject(project.id)));
    expect(file).toMatchObject({ format: "stitchplan-project", version: 1, project: { name: "Maple Hollow", number: "DEMO-103" } });
    const copy = store.importProject(file);
    expect(copy.id).not.toBe(project.id);
    expect(copy.members).toBe(3);
    const again = JSON.parse(JSON.stringify(store.exportProject(copy.id)));
    expect(again.members).toEqual(file.members);
    const member = store.listMembers(copy.id).find((m) => m.mark === "LB-1")!;
    expect(store.worksheets(copy.id, member.id)).toMatchObject([{ revision: 2, fingerprint: "ab".repeat(32), hasPdf: false }]);
  });

  test("a project file with bad members stores nothing and lists each problem with its path", () => {
    const file = JSON.parse(JSON.stringify(store.exportProject(projectWithHistory().id)));
    const before = counts();
    file.members[1].revisions[0].job.parts[1].shape.h = -5;
    file.members[0].revisions[1].revision = 5;
    file.members[0].worksheets[0].revision = 7;
    file.members[2].revisions[0].job.member.mark = "LB-1";
    const error = thrown(() => store.importProject(file));
    expect(error.code).toBe("ERR_PROJECT_FILE_INVALID");
    const paths = error.issues.map((i) => i.path);
    expect(paths).toContain("members[1].revisions[0].job.parts[1].shape.h");
    expect(paths).toContain("members[0].revisions[1].revision");
    expect(paths).toContain("members[0].worksheets[0].revision");
    expect(paths).toContain("members[2].revisions[0].job.member.mark");
    expect(counts()).toEqual(before);
  });

  test("a file that is not a project file is refused with the envelope's paths", () => {
    const error = thrown(() => store.importProject({ format: "stitchplan-job", members: [{ revisions: [] }] }));
    expect(error.code).toBe("ERR_PROJECT_FILE_INVALID");
    expect(error.issues.map((i) => i.path)).toEqual(expect.arrayContaining(["format", "version", "project", "members[0].revisions"]));
    expect(store.info().projects).toBe(0);
  });
});

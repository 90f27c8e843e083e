import { readdirSync, readFileSync } from "node:fs";
import { join } from "node:path";
import type { FastifyInstance } from "fastify";
import request from "supertest";
import { afterAll, beforeAll, describe, expect, test } from "vitest";
import { z } from "zod";
import * as contract from "../../core/schema/store-contract.js";
import { buildApp } from "../../server/app.js";
import { example, steppingClock, tempFolder } from "./store/store-fixtures.js";

const folder = tempFolder("routes");
let app: FastifyInstance;
beforeAll(async () => {
  app = await buildApp({ dataDir: folder.dir, store: { now: steppingClock() } });
  await app.ready();
});
afterAll(async () => {
  await app.close();
  folder.remove();
});

const api = () => request(app.server);
const binary = (res: request.Response, done: (err: Error | null, body: Buffer) => void) => {
  const chunks: Buffer[] = [];
  res.on("data", (c: Buffer) => chunks.push(c));
  res.on("end", () => done(null, Buffer.concat(chunks)));
};
const storeCounts = async () => (await api().get("/api/store")).body as { projects: number; members: number; revisions: number; worksheets: number };

async function projectWithMember(name = "Barn") {
  const project = await api().post("/api/projects").send({ name, number: "DEMO-103" });
  const member = await api().post(`/api/projects/${project.body.id}/members`).send({ job: example("loft-beam-16d.us"), note: "first" });
  return { p: project.body.id as number, m: member.body.memberId as number, member: member.body };
}

describe("projects and members", () => {
  test("POST /api/projects is a 201 with the project; GET lists it", async () => {
    const res = await api().post("/api/projects").send({ name: "  Level 2 framing ", number: "P-7" });
    expect(res.status).toBe(201);
    expect(res.body).toMatchObject({ id: expect.any(Number), name: "Level 2 framing", number: "P-7", members: 0 });
    const list = await api().get("/api/projects");
    expect(list.body.map((p: { id: number }) => p.id)).toContain(res.body.id);
    expect((await api().get(`/api/projects/${res.body.id}`)).body.name).toBe("Level 2 framing");
  });

  test("a project without a name is a 400 naming the field; an unknown field is named too", async () => {
    const res = await api().post("/api/projects").send({ name: "", colour: "red" });
    expect(res.status).toBe(400);
    expect(res.body).toMatchObject({ statusCode: 400, code: "ERR_INPUT_INVALID" });
    expect(res.body.issues.map((i: { path: string }) => i.path)).toEqual(expect.arrayContaining(["name", "(document)"]));
  });

  test("POST …/members stores revision 1 (201) and GET …/members lists the member with its summary", async () => {
    const { p, m, member } = await projectWithMember();
    expect(member).toMatchObject({ projectId: p, mark: "LB-1", revision: { revision: 1, note: "first", summary: { passes: true } }, warnings: [] });
    const list = await api().get(`/api/projects/${p}/members`);
    expect(list.status).toBe(200);
    expect(list.body).toMatchObject([{ id: m, mark: "LB-1", revisions: 1, latest: { revision: 1 } }]);
  });

  test("a second member with the same mark is a 409 ERR_MEMBER_EXISTS and nothing is stored", async () => {
    const { p } = await projectWithMember();
    const before = await storeCounts();
    const res = await api().post(`/api/projects/${p}/members`).send({ job: example("loft-beam-16d.us") });
    expect(res.status).toBe(409);
    expect(res.body).toMatchObject({ code: "ERR_MEMBER_EXISTS", error: "Conflict", issues: [{ path: "job.member.mark" }] });
    expect(await storeCounts()).toEqual(before);
  });

  test("unknown or malformed ids are 404s with their own codes", async () => {
    const { p, m } = await projectWithMember();
    const cases: [string, string][] = [
      ["/api/projects/9999", "ERR_PROJECT_NOT_FOUND"],
      ["/api/projects/abc/members", "ERR_PROJECT_NOT_FOUND"],
      [`/api/projects/${p}/members/9999`, "ERR_MEMBER_NOT_FOUND"],
      [`/api/projects/${p}/members/${m}/revisions/7`, "ERR_REVISION_NOT_FOUND"],
      [`/api/projects/${p}/members/${m}/revisions/0`, "ERR_REVISION_NOT_FOUND"],
      [`/api/projects/${p}/members/${m}/worksheets/5/pdf`, "ERR_WORKSHEET_NOT_FOUND"],
    ];
    for (const [url, code] of cases) {
      const res = await api().get(url);
      expect(res.status, url).toBe(404);
      expect(res.body.code, url).toBe(code);
    }
  });
});

describe("revisions", () => {
  test("POST …/revisions makes revision 2 (201); GET …/revisions/1 still has the first job; latest is 2", async () => {
    const { p, m } = await projectWithMember();
    const job = example("loft-beam-16d.us");
    job.beam.loads[0].w = 52;
    const res = await api().post(`/api/projects/${p}/members/${m}/revisions`).send({ job, basedOn: 1, note: "storage load" });
    expect(res.status).toBe(201);
    expect(res.body.revision).toMatchObject({ revision: 2, basedOn: 1, note: "storage load", summary: { passes: false } });
    expect((await api().get(`/api/projects/${p}/members/${m}/revisions/1`)).body.job.beam.loads[0].w).toBe(40);
    const latest = (await api().get(`/api/projects/${p}/members/${m}/revisions/latest`)).body;
    expect([latest.revision, latest.job.beam.loads[0].w]).toEqual([2, 52]);
    const list = await api().get(`/api/projects/${p}/members/${m}/revisions`);
    expect(list.body.map((r: { revision: number }) => r.revision)).toEqual([1, 2]);
  });

  test("an invalid job is a 400 with job.… paths, and no revision is stored", async () => {
    const { p, m } = await projectWithMember();
    const before = await storeCounts();
    const job = example("loft-beam-16d.us");
    job.parts[1].shape.h = -5;
    delete job.beam;
    const res = await api().post(`/api/projects/${p}/members/${m}/revisions`).send({ job, basedOn: "two" });
    expect(res.status).toBe(400);
    expect(res.body.issues.map((i: { path: string }) => i.path)).toEqual(["basedOn"]);
    const res2 = await api().post(`/api/projects/${p}/members/${m}/revisions`).send({ job });
    expect(res2.status).toBe(400);
    expect(res2.body.code).toBe("ERR_INPUT_INVALID");
    expect(res2.body.issues.map((i: { path: string }) => i.path)).toEqual(expect.arrayContaining(["job.parts[1].shape.h", "job.beam"]));
    expect(await storeCounts()).toEqual(before);
  });

  test("two saves sent at once (two tabs) both become revisions, the later one with a warning", async () => {
    const { p, m } = await projectWithMember();
    const a = example("loft-beam-16d.us");
    const b = example("loft-beam-16d.us");
    a.beam.loads[0].w = 41;
    b.beam.loads[0].w = 43;
    const [ra, rb] = await Promise.all([
      api().post(`/api/projects/${p}/members/${m}/revisions`).send({ job: a, basedOn: 1 }),
      api().post(`/api/projects/${p}/members/${m}/revisions`).send({ job: b, basedOn: 1 }),
    ]);
    expect([ra.status, rb.status]).toEqual([201, 201]);
    expect([ra.body.revision.revision, rb.body.revision.revision].sort()).toEqual([2, 3]);
    expect([...ra.body.warnings, ...rb.body.warnings]).toHaveLength(1);
    const loads = await Promise.all([2, 3].map(async (n) => (await api().get(`/api/projects/${p}/members/${m}/revisions/${n}`)).body.job.beam.loads[0].w));
    expect(loads.sort()).toEqual([41, 43]);
  });

  test("GET …/revisions/:n/result designs the revision, in other units on request", async () => {
    const { p, m } = await projectWithMember();
    const own = await api().get(`/api/projects/${p}/members/${m}/revisions/1/result`);
    expect(own.status).toBe(200);
    expect(own.body).toMatchObject({ format: "stitchplan-result", units: "us", unitLabels: { span: "ft" } });
    const si = await api().get(`/api/projects/${p}/members/${m}/revisions/1/result?units=si`);
    expect(si.body.unitLabels.span).toBe("m");
    expect(si.body.fingerprint).toBe(own.body.fingerprint);
    expect(si.body.beam.length).toBeCloseTo(own.body.beam.length * 0.3048, 9);
    expect((await api().get(`/api/projects/${p}/members/${m}/revisions/1/result?units=cubits`)).body.issues[0].path).toBe("units");
  });
});

describe("compare", () => {
  test("GET …/compare lists the changed input by path and how the schedule changed per joint", async () => {
    const { p, m } = await projectWithMember();
    const job = example("loft-beam-16d.us");
    job.beam.loads[0].w = 52;
    await api().post(`/api/projects/${p}/members/${m}/revisions`).send({ job });
    const res = await api().get(`/api/projects/${p}/members/${m}/compare?from=1&to=2`);
    expect(res.status).toBe(200);
    expect(res.body.inputs).toEqual([{ path: "beam.loads[0].w", change: "changed", from: 40, to: 52 }]);
    expect(res.body.results.passes).toEqual({ from: true, to: false });
    const top = res.body.results.schedules.find((s: { joint: string }) => s.joint === "top");
    expect(top.change).toBe("changed");
    expect(top.count.to).toBeGreaterThan(top.count.from);
    expect(top.zones[0]).toMatchObject({ zone: 1, change: "changed", fields: expect.arrayContaining(["spacing", "count", "utilisation"]) });
    const same = await api().get(`/api/projects/${p}/members/${m}/compare?from=2&to=2`);
    expect(same.body.sameInputs).toBe(true);
    expect(same.body.results.schedules.every((s: { change: string }) => s.change === "same")).toBe(true);
  });

  test("compare without two revision numbers is a 400 naming from and to; a missing revision is a 404", async () => {
    const { p, m } = await projectWithMember();
    const res = await api().get(`/api/projects/${p}/members/${m}/compare?from=x`);
    expect(res.status).toBe(400);
    expect(res.body.issues.map((i: { path: string }) => i.path).sort()).toEqual(["from", "to"]);
    expect((await api().get(`/api/projects/${p}/members/${m}/compare?from=1&to=4`)).body.code).toBe("ERR_REVISION_NOT_FOUND");
  });

  test("a revision saved in the other unit system is compared in one system, so converted numbers are not changes", async () => {
    const { p, m } = await projectWithMember();
    const us = (await api().get(`/api/projects/${p}/members/${m}/revisions/1`)).body.job;
    const si = (await api().get(`/api/projects/${p}/members/${m}/revisions/1/result?units=si`)).body;
    expect(si.units).toBe("si");
    // The same member entered in SI: spans in m, loads in kN/m and so on, via the job schema's converter.
    const { toCoreUnits, toDisplayUnits, JobDocument } = await import("../../core/index.js");
    const siJob = { ...toDisplayUnits(JobDocument, toCoreUnits(JobDocument, us, "us"), "si"), units: "si" };
    const saved = await api().post(`/api/projects/${p}/members/${m}/revisions`).send({ job: siJob });
    expect(saved.status).toBe(201);
    const res = await api().get(`/api/projects/${p}/members/${m}/compare?from=1&to=2&units=us`);
    expect(res.body.inputs).toEqual([{ path: "units", change: "changed", from: "us", to: "si" }]);
    // Schedules may still differ: the default spacing module and shortest zone depend on the unit system.
    expect(res.body).toMatchObject({ units: "us", unitLabels: { span: "ft" }, from: { units: "us" }, to: { units: "si" } });
  });
});

describe("worksheets", () => {
  test("POST …/revisions/:n/worksheets returns the PDF (201), records the issue, and the fingerprint look-up finds it", async () => {
    const { p, m } = await projectWithMember("Issued");
    const res = await api().post(`/api/projects/${p}/members/${m}/revisions/1/worksheets`).send({}).buffer(true).parse(binary);
    expect(res.status).toBe(201);
    expect(res.headers["content-type"]).toBe("application/pdf");
    expect(res.headers["content-disposition"]).toContain('filename="DEMO-103_LB-1_rev-A_store-rev-1.pdf"');
    expect((res.body as Buffer).subarray(0, 5).toString()).toBe("%PDF-");
    const fingerprint = res.headers["x-stitchplan-fingerprint"] as string;
    expect(fingerprint).toMatch(/^[0-9a-f]{64}$/);
    expect(res.headers["x-stitchplan-revision"]).toBe("1");

    const found = await api().get(`/api/worksheets/${fingerprint}`);
    expect(found.status).toBe(200);
    expect(found.body.issues).toMatchObject([{ projectId: p, projectName: "Issued", memberId: m, mark: "LB-1", revision: 1, fingerprint, hasPdf: true }]);
    expect(found.body.issues[0].issuedAt).toMatch(/^\d{4}-\d\d-\d\dT/);
    expect((await api().get(`/api/worksheets/${fingerprint.slice(0, 12)}`)).body.issues).toHaveLength(1);

    const log = await api().get(`/api/projects/${p}/members/${m}/worksheets`);
    expect(log.body).toMatchObject([{ id: Number(res.headers["x-stitchplan-issue"]), revision: 1 }]);
    const again = await api().get(`/api/projects/${p}/members/${m}/worksheets/${log.body[0].id}/pdf`).buffer(true).parse(binary);
    expect(again.status).toBe(200);
    expect(Buffer.compare(again.body as Buffer, res.body as Buffer)).toBe(0);
  });

  test("the issued file name carries the store's revision beside the title block's, and the log and the re-download keep it", async () => {
    const { p, m } = await projectWithMember("Issued twice");
    const job = (await api().get(`/api/projects/${p}/members/${m}/revisions/1`)).body.job;
    expect((await api().post(`/api/projects/${p}/members/${m}/revisions`).send({ job, note: "same title revision" })).status).toBe(201);
    const res = await api().post(`/api/projects/${p}/members/${m}/revisions/2/worksheets`).send({}).buffer(true).parse(binary);
    expect(res.status).toBe(201);
    expect(res.headers["content-disposition"]).toBe('attachment; filename="DEMO-103_LB-1_rev-A_store-rev-2.pdf"');
    const log = await api().get(`/api/projects/${p}/members/${m}/worksheets`);
    expect(log.body).toMatchObject([{ revision: 2, titleRevision: "A", fileName: "DEMO-103_LB-1_rev-A_store-rev-2.pdf" }]);
    const again = await api().get(`/api/projects/${p}/members/${m}/worksheets/${log.body[0].id}/pdf`).buffer(true).parse(binary);
    expect(again.headers["content-disposition"]).toContain("DEMO-103_LB-1_rev-A_store-rev-2.pdf");
  });

  test("the look-up answers 400 for something that is not a fingerprint and 404 for one nobody issued", async () => {
    const bad = await api().get("/api/worksheets/not-a-hash");
    expect(bad.status).toBe(400);
    expect(bad.body.issues[0].path).toBe("fingerprint");
    const none = await api().get(`/api/worksheets/${"f".repeat(64)}`);
    expect(none.status).toBe(404);
    expect(none.body.code).toBe("ERR_WORKSHEET_NOT_FOUND");
  });
});

describe("export and import", () => {
  test("GET …/export then POST /api/projects/import makes a copy of the project (201)", async () => {
    const { p } = await projectWithMember("Exported");
    const file = await api().get(`/api/projects/${p}/export`);
    expect(file.status).toBe(200);
    expect(file.headers["content-disposition"]).toContain("DEMO-103.stitchplan-project.json");
    const copy = await api().post("/api/projects/import").send(file.body);
    expect(copy.status).toBe(201);
    expect(copy.body).toMatchObject({ name: "Exported", members: 1 });
    expect(copy.body.id).not.toBe(p);
  });

  test("an imported project is marked with the date of its import; one created here is not", async () => {
    const { p } = await projectWithMember("Original");
    const file = await api().get(`/api/projects/${p}/export`);
    const copy = await api().post("/api/projects/import").send(file.body);
    expect(copy.status).toBe(201);
    expect(copy.body.importedAt).toMatch(/^\d{4}-\d\d-\d\dT/);
    // The store's clock is the test's stepping clock: the import is later than the original's creation.
    expect(copy.body.importedAt > (await api().get(`/api/projects/${p}`)).body.createdAt).toBe(true);
    const listed = (await api().get("/api/projects")).body as { id: number; importedAt: string | null }[];
    expect(listed.find((x) => x.id === p)!.importedAt).toBeNull();
    expect(listed.find((x) => x.id === copy.body.id)!.importedAt).toBe(copy.body.importedAt);
    expect((await api().get(`/api/projects/${copy.body.id}`)).body.importedAt).toBe(copy.body.importedAt);
    expect((await api().post("/api/projects").send({ name: "Fresh" })).body.importedAt).toBeNull();
  });

  test("a bad project file is a 400 ERR_PROJECT_FILE_INVALID with each path, and no project is stored", async () => {
    const { p } = await projectWithMember("Bad import");
    const file = (await api().get(`/api/projects/${p}/export`)).body;
    file.members.push(structuredClone(file.members[0]));
    file.members[1].revisions[0].job.parts[1].shape.h = 0;
    file.members[1].revisions[0].job.member.mark = "LB-2";
    const before = await storeCounts();
    const res = await api().post("/api/projects/import").send(file);
    expect(res.status).toBe(400);
    expect(res.body).toMatchObject({ code: "ERR_PROJECT_FILE_INVALID", issues: [{ path: "members[1].revisions[0].job.parts[1].shape.h" }] });
    expect(await storeCounts()).toEqual(before);
    const notJson = await api().post("/api/projects/import").set("content-type", "application/json").send("{ nope");
    expect(notJson.body.code).toBe("ERR_JSON_MALFORMED");
  });
});

test("GET /api/store says where the database is and its schema version", async () => {
  const res = await api().get("/api/store");
  expect(res.body).toMatchObject({ file: expect.stringContaining(folder.dir), schemaVersion: 3 });
});

test("an app built without a data folder serves no store routes", async () => {
  const plain = await buildApp();
  try {
    const res = await plain.inject({ method: "GET", url: "/api/projects" });
    expect(res.statusCode).toBe(404);
  } finally {
    await plain.close();
  }
});

describe("the store's contract (core/schema/store-contract.ts), shared with the page", () => {
  test("every listing and answer of the store parses with the contract's schemas", async () => {
    const { p, m } = await projectWithMember("Contract");
    const job = example("loft-beam-16d.us");
    job.beam.loads[0].w = 52;
    await api().post(`/api/projects/${p}/members/${m}/revisions`).send({ job, basedOn: 1 });
    const check = (schema: z.ZodType, body: unknown, what: string) => {
      const parsed = schema.safeParse(body);
      expect(parsed.success, `${what}: ${JSON.stringify(parsed.error?.issues.slice(0, 3))}`).toBe(true);
    };
    check(z.array(contract.Project), (await api().get("/api/projects")).body, "projects");
    check(contract.Project, (await api().get(`/api/projects/${p}`)).body, "project");
    check(z.array(contract.Member), (await api().get(`/api/projects/${p}/members`)).body, "members");
    check(z.array(contract.RevisionListItem), (await api().get(`/api/projects/${p}/members/${m}/revisions`)).body, "revisions");
    check(contract.StoredRevision, (await api().get(`/api/projects/${p}/members/${m}/revisions/latest`)).body, "revision");
    const compared = (await api().get(`/api/projects/${p}/members/${m}/compare?from=1&to=2`)).body;
    check(contract.Comparison, compared, "comparison");
    check(contract.FingerprintLookUp, (await api().get(`/api/worksheets/${compared.to.fingerprint.slice(0, 12)}`)).body, "look-up");
  });

  test("the page imports no server code", () => {
    const files = readdirSync(join(import.meta.dirname, "../../web/src"), { recursive: true, encoding: "utf8" }).filter((f) => f.endsWith(".ts"));
    expect(files.length).toBeGreaterThan(5);
    for (const file of files) {
      const source = readFileSync(join(import.meta.dirname, "../../web/src", file), "utf8");
      expect(source, file).not.toMatch(/from\s+["'](\.\.\/)+server\//);
    }
  });
});

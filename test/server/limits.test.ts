// Every size limit answers with a 413 or a 400 that names the limit and the field; past the time
// limit a design is stopped with a 422, and the service goes on answering.
import type { FastifyInstance } from "fastify";
import { afterAll, beforeAll, describe, expect, test } from "vitest";
import { buildApp } from "../../server/app.js";
import { serviceLimits } from "../../server/job-limits.js";
import { readFileSync } from "node:fs";
import { JobStore } from "../../server/store/job-store.js";
import { manyLoadsJob, plankIJob, twelveSpansPatternedJob } from "../job-builders.js";
import { example, tempFolder } from "./store/store-fixtures.js";

let app: FastifyInstance;
beforeAll(async () => {
  app = await buildApp();
  await app.ready();
});
afterAll(() => app.close());

const design = (body: unknown) => app.inject({ method: "POST", url: "/api/designs", payload: typeof body === "string" ? body : JSON.stringify(body), headers: { "content-type": "application/json" } });

/** The one issue at `path`, failing with every issue when there is none. */
async function refusedAt(body: unknown, path: string, status = 400) {
  const res = await design(body);
  expect(res.statusCode, res.body.slice(0, 500)).toBe(status);
  const issue = res.json().issues.find((i: { path: string }) => i.path === path);
  expect(issue, JSON.stringify(res.json().issues).slice(0, 500)).toBeDefined();
  return issue.message as string;
}

describe("size limits", () => {
  test("a body over 1 MiB is a 413 that names the limit", async () => {
    const job = example("workshop-box-beam.si");
    job.member.description = "x".repeat(serviceLimits.bodyBytes);
    const res = await design(job);
    expect(res.statusCode).toBe(413);
    expect(res.json()).toMatchObject({ code: "ERR_BODY_TOO_LARGE", message: "The request body is larger than the limit of 1 MiB.", issues: [{ path: "(body)", message: "must be at most 1 MiB" }] });
  });

  test("a project import may be larger than a job (64 MiB), and its 413 says so", async () => {
    const small = await buildApp({ bodyLimit: 1000 });
    try {
      const res = await small.inject({ method: "POST", url: "/api/designs", payload: JSON.stringify({ pad: "x".repeat(2000) }), headers: { "content-type": "application/json" } });
      expect(res.json().message).toBe("The request body is larger than the limit of 1000 bytes.");
    } finally {
      await small.close();
    }
  });

  test("more than 16 parts, 12 materials, 12 connectors, 12 spans or 200 loads: a 400 naming the limit at its field", async () => {
    const job = example("workshop-box-beam.si");
    expect(await refusedAt({ ...job, parts: Array.from({ length: 17 }, () => job.parts[0]) }, "parts")).toBe("at most 16 parts");
    expect(await refusedAt({ ...job, materials: Array.from({ length: 13 }, () => job.materials[0]) }, "materials")).toBe("at most 12 materials");
    expect(await refusedAt({ ...job, connectors: Array.from({ length: 13 }, () => job.connectors[0]) }, "connectors")).toBe("at most 12 connectors");
    expect(await refusedAt({ ...job, beam: { ...job.beam, spans: Array(13).fill(1) } }, "beam.spans")).toBe("at most 12 spans");
    expect(await refusedAt({ ...job, beam: { ...job.beam, loads: Array(201).fill(job.beam.loads[0]) } }, "beam.loads")).toBe("at most 200 loads");
  });

  test("a schedule to check with more than 5000 positions or 60 zones: a 400 naming the limit", async () => {
    const job = example("workshop-box-beam.si");
    const checking = (provided: unknown) => ({ ...job, mode: "check", fastening: { ...job.fastening, default: { ...job.fastening.default, provided } } });
    const positions = Array.from({ length: 5001 }, (_, i) => i / 1000);
    expect(await refusedAt(checking({ type: "positions", positions }), "fastening.default.provided.positions")).toBe("at most 5000 positions");
    const zones = Array.from({ length: 61 }, (_, i) => ({ from: i * 0.05, to: (i + 1) * 0.05, spacing: 50 }));
    expect(await refusedAt(checking({ type: "zones", zones }), "fastening.default.provided.zones")).toBe("at most 60 zones");
  });

  test("a zoned schedule to check is refused at its spacing below 0.05 mm, or past 5,000 rows on the joint (a spacing of 1e-6 mm stopped the process)", async () => {
    const job = example("workshop-box-beam.si");
    const checking = (spacing: number) => ({ ...job, mode: "check", fastening: { ...job.fastening, default: { ...job.fastening.default, provided: { type: "zones", zones: [{ from: 0, to: 4.8, spacing }] } } } });
    for (const spacing of [1e-300, 5e-324, 1e-6, 1e-4, 0.001]) {
      expect(await refusedAt(checking(spacing), "fastening.default.provided.zones[0].spacing")).toMatch(/is outside the range of spacings \(0\.05 mm to 20,000 mm\)/);
    }
    // 4800 mm at 0.25 mm: 19,200 rows on one joint, past the 5,000 a schedule to check may give.
    expect(await refusedAt(checking(0.25), "fastening.default.provided.zones[0].spacing")).toMatch(/gives about 19200 rows on this joint; a schedule to check has at most 5000 rows/);
    // 4800 mm at 1 mm: 4,800 rows, inside the limit (and far below any connector's least spacing, so it fails its detailing).
    expect((await design(checking(1))).statusCode).toBe(200);
    expect((await app.inject({ method: "GET", url: "/api/health" })).statusCode).toBe(200);
  });

  test("a member longer than the limit is refused at beam.spans with the limit, in the job's units (1e300 m used to stop the process)", async () => {
    // The service takes members up to 1,000 m; core may refuse shorter ones with its own range.
    const limit = /(up to|to) (500|1000) m\b/;
    const si = example("workshop-box-beam.si");
    si.beam.loads = [];
    expect(await refusedAt({ ...si, beam: { ...si.beam, spans: [1e300] } }, "beam.spans")).toMatch(new RegExp(`^(the member is )?1e\\+300 m .*${limit.source}`));
    expect(await refusedAt({ ...si, beam: { ...si.beam, spans: [600, 600] } }, "beam.spans")).toMatch(new RegExp(`^(the member is )?1,200 m .*${limit.source}`));
    const us = example("loft-beam-16d.us");
    us.beam.loads = [];
    expect(await refusedAt({ ...us, beam: { ...us.beam, spans: [4000] } }, "beam.spans")).toMatch(/^(the member is )?4,000 ft .*(up to|to) (1,640|3,281) ft\b/);
  });

  test("text fields have a length limit that the message states", async () => {
    const job = example("workshop-box-beam.si");
    expect(await refusedAt({ ...job, project: { ...job.project, name: "n".repeat(10_000) } }, "project.name")).toMatch(/^must be at most \d+ characters$/);
  });

  test("stations stay bounded: 200 point loads on 12 spans give at most about 2 per load and support beyond the 100-division grid", async () => {
    const job = example("workshop-box-beam.si");
    const spans = Array(12).fill(4);
    const loads = Array.from({ length: 200 }, (_, i) => ({ type: "point", category: "dead", P: 0.5, at: 0.1 + i * 0.2395 }));
    const res = await design({ ...job, beam: { spans, loads, patternedCategories: [], selfWeight: false } });
    expect(res.statusCode, res.body.slice(0, 400)).toBe(200);
    expect(res.json().beam.stations.length).toBeLessThanOrEqual(2 * (loads.length + spans.length + 1) + 110);
  });

  test("at most 100 problems are listed; the rest are counted in one line", async () => {
    const job = example("workshop-box-beam.si");
    const res = await design({ ...job, beam: { ...job.beam, loads: Array(150).fill({ type: "point", category: "nonsense" }) } });
    expect(res.statusCode).toBe(400);
    const { issues } = res.json();
    expect(issues).toHaveLength(101);
    expect(issues[100]).toEqual({ path: "(document)", message: expect.stringMatching(/^and \d+ more problems not listed$/) });
  });

  test("a body nested 100,000 deep is a 400, not a crash", async () => {
    const deepArray = "[".repeat(100_000) + "]".repeat(100_000);
    expect((await design(deepArray)).statusCode).toBe(400);
    const job = JSON.stringify(example("workshop-box-beam.si"));
    const deepField = job.replace('"project":{', `"project":{"deep":${'{"a":'.repeat(100_000)}1${"}".repeat(100_000)},`);
    const res = await design(deepField);
    expect(res.statusCode).toBe(400);
    expect(res.json().issues.length).toBeGreaterThan(0);
  });
});

describe("the time limit", () => {
  test("a design past the limit is stopped with a 422 naming the limit, and the next design is answered", { timeout: 120_000 }, async () => {
    const limited = await buildApp({ timeLimits: { designMs: 400 } });
    try {
      const job = example("workshop-box-beam.si");
      // A heavy but valid member at the size limits: twelve spans, 200 loads, three patterned categories (1.5–2.5 s in process, several times the limit).
      const categories = ["dead", "live", "snow", "wind"];
      const heavy = {
        ...job,
        beam: {
          spans: Array(12).fill(3.2),
          loads: Array.from({ length: 200 }, (_, i) => ({ type: "point", category: categories[i % 4], P: 1, at: (i * 0.31) % 38 })),
          patternedCategories: ["live", "snow", "wind"],
        },
        combinations: { set: "asce7-22-allowable" },
      };
      // The first design starts the thread (outside the limit); then the heavy one.
      expect((await limited.inject({ method: "POST", url: "/api/designs", payload: job })).statusCode).toBe(200);
      const res = await limited.inject({ method: "POST", url: "/api/designs", payload: heavy });
      expect(res.statusCode, res.body.slice(0, 300)).toBe(422);
      expect(res.json()).toMatchObject({ code: "ERR_DESIGN_TIME_LIMIT", message: "The design took longer than the limit of 0.4 s and was stopped; nothing was stored or changed." });
      expect(res.json().issues[0].message).toMatch(/^takes longer than 0.4 s to design; fewer spans, loads/);
      const after = await limited.inject({ method: "POST", url: "/api/designs", payload: { ...job, member: { ...job.member, mark: "after" } } });
      expect(after.statusCode).toBe(200);
    } finally {
      await limited.close();
    }
  });
});

describe("designs, summaries and worksheets stay on their threads, within their limits", () => {
  const json = { "content-type": "application/json" };

  test("a design that needs more than the thread's memory is a 422 naming the limit; the service answers on", { timeout: 120_000 }, async () => {
    const small = await buildApp({ threadLimits: { memoryMb: 40 } });
    try {
      const res = await small.inject({ method: "POST", url: "/api/designs", payload: JSON.stringify(manyLoadsJob()), headers: json });
      expect(res.statusCode, res.body.slice(0, 300)).toBe(422);
      expect(res.json()).toMatchObject({ code: "ERR_DESIGN_MEMORY_LIMIT", message: "The design needed more than the memory limit of 40 MiB and was stopped; nothing was stored or changed." });
      expect((await small.inject({ method: "GET", url: "/api/health" })).statusCode).toBe(200);
      expect((await small.inject({ method: "POST", url: "/api/designs", payload: JSON.stringify(plankIJob()), headers: json })).statusCode).toBe(200);
    } finally {
      await small.close();
    }
  });

  test("a full design queue answers 503 with Retry-After; those admitted are answered", { timeout: 120_000 }, async () => {
    const busy = await buildApp({ designThreads: 1, threadLimits: { designQueue: 1 } });
    try {
      const answers = await Promise.all(
        Array.from({ length: 4 }, (_, i) => busy.inject({ method: "POST", url: "/api/designs", payload: JSON.stringify({ ...plankIJob(), member: { mark: `Q-${i}` } }), headers: json })),
      );
      const refused = answers.filter((a) => a.statusCode === 503);
      expect(refused.length).toBeGreaterThan(0);
      expect(refused[0]!.json()).toMatchObject({ statusCode: 503, code: "ERR_BUSY", error: "Service Unavailable" });
      expect(Number(refused[0]!.headers["retry-after"])).toBeGreaterThan(0);
      expect(answers.filter((a) => a.statusCode === 200).length).toBeGreaterThan(0);
      expect(answers.every((a) => a.statusCode === 200 || a.statusCode === 503)).toBe(true);
    } finally {
      await busy.close();
    }
  });

  test("the same job sent many times at once is designed once: with a queue of one, every copy is answered with the same result", { timeout: 120_000 }, async () => {
    const busy = await buildApp({ designThreads: 1, threadLimits: { designQueue: 1 } });
    try {
      const payload = JSON.stringify({ ...plankIJob(), member: { mark: "SAME" } });
      const answers = await Promise.all(Array.from({ length: 6 }, () => busy.inject({ method: "POST", url: "/api/designs", payload, headers: json })));
      expect(answers.map((a) => a.statusCode)).toEqual(Array(6).fill(200));
      expect(new Set(answers.map((a) => a.body)).size).toBe(1);
    } finally {
      await busy.close();
    }
  });

  test("a worksheet does not hold the designs: a design sent while a heavy worksheet prints is answered first; heavy worksheets print within the time and memory limits", { timeout: 120_000 }, async () => {
    const both = await buildApp({ designThreads: 1, warmThreads: true });
    try {
      const order: string[] = [];
      const sheet = both.inject({ method: "POST", url: "/api/worksheets", payload: JSON.stringify(manyLoadsJob()), headers: json }).then((r) => (order.push("worksheet"), r));
      const design = both.inject({ method: "POST", url: "/api/designs", payload: JSON.stringify(plankIJob()), headers: json }).then((r) => (order.push("design"), r));
      const [s, d] = await Promise.all([sheet, design]);
      expect(d.statusCode).toBe(200);
      expect(s.statusCode, s.body.slice(0, 300)).toBe(200);
      expect(order).toEqual(["design", "worksheet"]);
      // The 12-span member with 9 patterned categories: its worksheet ran past 60 s; now it prints within the limits.
      const twelve = await both.inject({ method: "POST", url: "/api/worksheets", payload: JSON.stringify(twelveSpansPatternedJob()), headers: json });
      expect(twelve.statusCode, twelve.body.slice(0, 300)).toBe(200);
    } finally {
      await both.close();
    }
  });
});

describe("the store designs on the design threads, never on the thread that answers", () => {
  const json = { "content-type": "application/json" };

  test("job-store.ts has no way to design: listings read the summary kept with the revision", () => {
    const source = readFileSync(new URL("../../server/store/job-store.ts", import.meta.url), "utf8");
    expect(source).not.toMatch(/designMember|designInUnits|runDesign|summariseResult|renderWorksheet/);
  });

  test("a save past the design time limit is a 422 and stores nothing; an import with such a revision is refused at its path", { timeout: 120_000 }, async () => {
    const folder = tempFolder("limits");
    const limited = await buildApp({ dataDir: folder.dir, timeLimits: { designMs: 300 } });
    try {
      // Starts the thread outside the limit.
      expect((await limited.inject({ method: "POST", url: "/api/designs", payload: JSON.stringify(plankIJob()), headers: json })).statusCode).toBe(200);
      const project = (await limited.inject({ method: "POST", url: "/api/projects", payload: JSON.stringify({ name: "Limits" }), headers: json })).json();
      const save = await limited.inject({ method: "POST", url: `/api/projects/${project.id}/members`, payload: JSON.stringify({ job: manyLoadsJob() }), headers: json });
      expect(save.statusCode, save.body.slice(0, 300)).toBe(422);
      expect(save.json().code).toBe("ERR_DESIGN_TIME_LIMIT");
      expect((await limited.inject({ method: "GET", url: `/api/projects/${project.id}/members` })).json()).toEqual([]);

      const file = {
        format: "stitchplan-project",
        version: 1,
        project: { name: "Imported" },
        members: [
          { revisions: [{ revision: 1, savedAt: "2025-03-14T09:00:00.000Z", job: plankIJob() }] },
          { revisions: [{ revision: 1, savedAt: "2025-03-14T09:00:00.000Z", job: { ...manyLoadsJob(), member: { mark: "H-2" } } }] },
        ],
      };
      const imported = await limited.inject({ method: "POST", url: "/api/projects/import", payload: JSON.stringify(file), headers: json });
      expect(imported.statusCode, imported.body.slice(0, 300)).toBe(400);
      expect(imported.json()).toMatchObject({ code: "ERR_PROJECT_FILE_INVALID", issues: [{ path: "members[1].revisions[0].job", message: expect.stringMatching(/^cannot be designed within the service's limits: The design took longer than the limit of 0.3 s/) }] });
      expect((await limited.inject({ method: "GET", url: "/api/projects" })).json().map((p: { name: string }) => p.name)).toEqual(["Limits"]);
    } finally {
      await limited.close();
      folder.remove();
    }
  });

  test("an import keeps each revision's summary, worked out on a design thread; a revision stored without one lists as null", { timeout: 120_000 }, async () => {
    const folder = tempFolder("limits");
    const app2 = await buildApp({ dataDir: folder.dir });
    try {
      const file = { format: "stitchplan-project", version: 1, project: { name: "Imported" }, members: [{ revisions: [{ revision: 1, savedAt: "2025-03-14T09:00:00.000Z", job: plankIJob() }] }] };
      const project = (await app2.inject({ method: "POST", url: "/api/projects/import", payload: JSON.stringify(file), headers: json })).json();
      const [member] = (await app2.inject({ method: "GET", url: `/api/projects/${project.id}/members` })).json();
      expect(member.latest.summary).toMatchObject({ passes: expect.any(Boolean), connectors: expect.any(Number) });
    } finally {
      await app2.close();
    }
    // Straight into the store, as a version-1 file would hold it: no summary, and a listing does not work one out.
    const store = JobStore.open(folder.dir);
    try {
      const project = store.importProject({ format: "stitchplan-project", version: 1, project: { name: "Old" }, members: [{ revisions: [{ revision: 1, savedAt: "2025-03-14T09:00:00.000Z", job: plankIJob() }] }] });
      expect(store.listMembers(project.id)[0]!.latest.summary).toBeNull();
    } finally {
      store.close();
      folder.remove();
    }
  });
});

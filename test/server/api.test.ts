import { readFileSync } from "node:fs";
import type { FastifyInstance } from "fastify";
import request from "supertest";
import { afterAll, beforeAll, describe, expect, test } from "vitest";
import { DesignResult } from "../../core/index.js";
import { buildApp } from "../../server/app.js";
import { OPENING_EXAMPLE } from "../../server/examples.js";
import { clone, plankIJob } from "../job-builders.js";

let app: FastifyInstance;
beforeAll(async () => {
  app = await buildApp();
  await app.ready();
});
afterAll(() => app.close());

const post = (body: unknown) => request(app.server).post("/api/designs").send(body as object);

describe("GET routes", () => {
  test("GET /api/health answers ok with the program version", async () => {
    const res = await request(app.server).get("/api/health");
    expect(res.status).toBe(200);
    expect(res.body).toMatchObject({ status: "ok", program: "stitchplan" });
  });

  test("GET /api/examples lists examples in both unit systems, and each one designs without a 4xx into a result that matches its schema", async () => {
    const list = await request(app.server).get("/api/examples");
    expect(list.status).toBe(200);
    const units = new Set(list.body.map((e: { units: string }) => e.units));
    expect(units).toEqual(new Set(["si", "us"]));
    // The page opens with the first: the plainest member, a nailed box beam on one span.
    expect(list.body[0].id).toBe(OPENING_EXAMPLE);
    for (const { id } of list.body as { id: string }[]) {
      const job = await request(app.server).get(`/api/examples/${id}`);
      expect(job.status).toBe(200);
      const result = await post(job.body);
      expect(result.status, `example ${id}: ${JSON.stringify(result.body.issues)}`).toBe(200);
      // The server does not parse the engine's result on each request: this is where its shape is proven, as served.
      const parsed = DesignResult.safeParse(result.body);
      expect(parsed.success, `example ${id}: ${parsed.error?.issues.slice(0, 3).map((i) => `${i.path.join(".")}: ${i.message}`).join("; ")}`).toBe(true);
    }
  });

  test("GET /api/examples/:id of an unknown id is a 404 with its code", async () => {
    const res = await request(app.server).get("/api/examples/no-such-member");
    expect(res.status).toBe(404);
    expect(res.body.code).toBe("ERR_EXAMPLE_NOT_FOUND");
  });

  test("an unknown address is a 404 in the API's error shape", async () => {
    const res = await request(app.server).get("/api/nothing-here");
    expect(res.status).toBe(404);
    expect(res.body).toMatchObject({ statusCode: 404, code: "ERR_NOT_FOUND" });
  });

  test("GET /api/materials gives the grade library in the asked units and basis; a bad unit is a 400", async () => {
    const us = await request(app.server).get("/api/materials?units=us&basis=allowable");
    expect(us.status).toBe(200);
    const dfl = us.body.find((g: { grade: string }) => g.grade === "DFL-2");
    expect(dfl.material.E).toBeCloseTo(1_600_000, 3);
    expect(dfl.material.strength.bending).toBeCloseTo(900, 6);
    const bad = await request(app.server).get("/api/materials?units=cubits");
    expect(bad.status).toBe(400);
    expect(bad.body.issues[0].path).toBe("units");
  });

  test("POST /api/conversions?to=us rewrites a job in the other unit system; a bad target is a 400 naming `to`", async () => {
    const res = await request(app.server).post("/api/conversions?to=us").send(plankIJob());
    expect(res.status).toBe(200);
    expect(res.body.units).toBe("us");
    expect(res.body.parts[0].shape.b).toBeCloseTo(100 / 25.4, 6);
    expect(res.body.beam.spans[0]).toBeCloseTo(4000 / 304.8, 6);
    const bad = await request(app.server).post("/api/conversions?to=metric").send(plankIJob());
    expect(bad.status).toBe(400);
    expect(bad.body.issues[0].path).toBe("to");
  });

  test("GET /api/schema/job names the quantity kind of every number, so a client can label and convert it", async () => {
    const res = await request(app.server).get("/api/schema/job");
    expect(res.status).toBe(200);
    expect(res.body.properties.beam.properties.spans.items.quantity).toBe("span");
  });

  test("the page and its script are served", async () => {
    const page = await request(app.server).get("/");
    expect(page.status).toBe(200);
    expect(page.text).toContain("/app.js");
    const script = await request(app.server).get("/app.js");
    expect(script.status).toBe(200);
    expect(script.headers["content-type"]).toContain("javascript");
  });
});

describe("POST /api/designs", () => {
  test("the cover-plate example with its held group named (fastening.joints) designs and prints (it answered 500)", { timeout: 60_000 }, async () => {
    const job = (await request(app.server).get("/api/examples/cover-plate-retrofit.us")).body;
    job.fastening.joints = [{ held: ["plate"], connector: "B34", rows: 2 }];
    const res = await post(job);
    expect(res.status, JSON.stringify(res.body).slice(0, 300)).toBe(200);
    expect(res.body.joints.map((j: { id: string }) => j.id)).toEqual(["plate"]);
    expect((await request(app.server).post("/api/worksheets").send(job)).status).toBe(200);
  });

  test("a valid job returns the result in the job's units with the fingerprint", async () => {
    const res = await post(plankIJob());
    expect(res.status).toBe(200);
    expect(res.body.format).toBe("stitchplan-result");
    expect(res.body.unitLabels.span).toBe("m");
    expect(res.body.beam.length).toBeCloseTo(4, 12);
    expect(res.body.fingerprint).toMatch(/^[0-9a-f]{64}$/);
    expect(res.body.schedules).toHaveLength(2);
    expect(res.body.schedules[0].zones[0].spacing).toBeLessThanOrEqual(27);
  });

  test("a row of connectors that does not fit across its contact fails the joint, with both widths in the job's units (issue 16 §2)", async () => {
    const job = JSON.parse(readFileSync(new URL("../../fixtures/examples/porch-beam-16d-nds.us.json", import.meta.url), "utf8"));
    job.fastening.default.rows = 3;
    const res = await post(job);
    expect(res.status).toBe(200);
    expect(res.body.status.passes).toBe(false);
    // 16d common, D = 0.162 in (REFERENCES §5.4) [V]; edge 2.5D and 5D across (the code's nail spacings) [CP]:
    // 2 × 0.405 + 2 × 0.81 = 2.43 in against the 1-1/2 in web edge [D].
    for (const s of res.body.schedules) {
      expect(s.passes).toBe(false);
      expect(s.rowFit.fits).toBe(false);
      expect(s.rowFit.needed).toBeCloseTo(2.43, 9);
      expect(s.rowFit.available).toBeCloseTo(1.5, 9);
    }
    expect(res.body.status.failures.join("\n")).toMatch(/need 2\.43 in across the contact between "web" and "top" .* only 1\.5 in wide/);
  });

  test("the same job gives the same fingerprint; a changed load changes it", async () => {
    const a = await post(plankIJob());
    const b = await post(plankIJob());
    const changed = clone(plankIJob());
    changed.beam.loads[0] = { type: "uniform", w: 0.3 };
    const c = await post(changed);
    expect(a.body.fingerprint).toBe(b.body.fingerprint);
    expect(c.body.fingerprint).not.toBe(a.body.fingerprint);
  });

  const cases: [string, (job: ReturnType<typeof plankIJob>) => unknown, string, RegExp][] = [
    ["a missing field", (job) => ({ ...job, beam: undefined }), "beam", /required/],
    ["a negative length", (job) => { job.parts[1]!.shape = { type: "rectangle", b: 20, h: -100 }; return job; }, "parts[1].shape.h", /greater than 0/],
    ["a number sent as text", (job) => { job.beam.spans[0] = "4" as unknown as number; return job; }, "beam.spans[0]", /must be a number, not the text "4"/],
    ["overlapping parts", (job) => { job.parts[2]!.y = 110; return job; }, "parts[2]", /overlaps part "web" \(parts\[1\]\) over an area of 200 mm²/],
    ["zero connector capacity", (job) => { (job.connectors[0] as { resistance: number }).resistance = 0; return job; }, "connectors[0].resistance", /greater than 0/],
    ["a part that touches nothing", (job) => { job.parts[2]!.y = 500; return job; }, "parts[2]", /does not touch the rest of the section/],
    ["a load beyond the end of the span", (job) => { job.beam.loads.push({ type: "point", P: 1, at: 5 }); return job; }, "beam.loads[1].at", /beyond the end of the member/],
    ["an unknown material", (job) => { job.parts[0]!.material = "steel"; return job; }, "parts[0].material", /not one of the materials/],
    ["a misspelt field", (job) => ({ ...job, spna: 3 }), "(document)", /does not use: spna/],
    ["an unknown connector kind", (job) => { (job.connectors[0] as { kind: string }).kind = "rivet"; return job; }, "connectors[0].kind", /kind must be one of: rated, glue/],
  ];
  for (const [what, breakIt, path, message] of cases) {
    test(`${what} is a 400 naming ${path}`, async () => {
      const res = await post(breakIt(clone(plankIJob())));
      expect(res.status).toBe(400);
      expect(res.body.code).toBe("ERR_INPUT_INVALID");
      const issue = res.body.issues.find((i: { path: string }) => i.path === path);
      expect(issue, JSON.stringify(res.body.issues)).toBeDefined();
      expect(issue.message).toMatch(message);
    });
  }

  test("malformed JSON, an empty body and a wrong media type get their own codes", async () => {
    const bad = await request(app.server).post("/api/designs").set("content-type", "application/json").send("{not json");
    expect(bad.status).toBe(400);
    expect(bad.body.code).toBe("ERR_JSON_MALFORMED");
    const empty = await request(app.server).post("/api/designs").set("content-type", "application/json").send("");
    expect(empty.status).toBe(400);
    expect(empty.body.code).toBe("ERR_BODY_EMPTY");
    const text = await request(app.server).post("/api/designs").set("content-type", "text/csv").send("a,b");
    expect(text.status).toBe(415);
    expect(text.body.code).toBe("ERR_UNSUPPORTED_MEDIA_TYPE");
  });

  test("a body over the limit is a 413", async () => {
    const huge = { ...plankIJob(), project: { name: "x".repeat(2 * 1024 * 1024) } };
    const res = await post(huge);
    expect(res.status).toBe(413);
    expect(res.body.code).toBe("ERR_BODY_TOO_LARGE");
  });

  test("a JSON array or null instead of a job is a 400, not a crash", async () => {
    for (const body of [[1, 2], null, 42, "job"]) {
      const res = await request(app.server).post("/api/designs").set("content-type", "application/json").send(JSON.stringify(body));
      expect(res.status).toBe(400);
      expect(res.body.code).toBe("ERR_INPUT_INVALID");
    }
  });
});

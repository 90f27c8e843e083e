import type { FastifyInstance } from "fastify";
import request from "supertest";
import { afterAll, beforeAll, describe, expect, test } from "vitest";
import { buildApp } from "../../server/app.js";
import { clone, plankIJob } from "../job-builders.js";

let app: FastifyInstance;
beforeAll(async () => {
  app = await buildApp();
  await app.ready();
});
afterAll(() => app.close());

const post = (body: unknown) => request(app.server).post("/api/designs").send(body as object);
type Job = ReturnType<typeof plankIJob> & { beam: Record<string, unknown>; combinations?: Record<string, unknown> };

describe("POST /api/designs with continuous members", () => {
  test("two spans with an overhang and live load: 200, one combination per live-load pattern, in the job's units", async () => {
    const job = clone(plankIJob()) as Job;
    job.beam = { spans: [3, 3, 0.8], supports: ["pinned", "roller", "roller", "free"], loads: [{ type: "uniform", category: "dead", w: 0.1 }, { type: "uniform", category: "live", w: 0.15 }], selfWeight: false };
    job.combinations = { set: "asce7-22-allowable" };
    const res = await post(job);
    expect(res.status, JSON.stringify(res.body.issues)).toBe(200);
    expect(res.body.beam.length).toBeCloseTo(6.8, 12);
    expect(res.body.beam.supports.map((s: { x: number }) => s.x)).toEqual([0, 3, 6]);
    const ids: string[] = res.body.beam.combinations.map((c: { id: string }) => c.id);
    expect(ids).toContain("ASD-1");
    expect(ids.filter((id) => id.startsWith("ASD-2/P")).length).toBeGreaterThan(1);
    // Reactions in kN: ΣR = 0.1 kN/m × 6.8 m + 0.15 kN/m × 6 m with live on the two spans (statics [D]).
    const spans = res.body.beam.perCombination.find((p: { combination: string }) => p.combination === "ASD-2/P1-2");
    expect(spans.reactions.reduce((s: number, r: { force: number }) => s + r.force, 0)).toBeCloseTo(0.1 * 6.8 + 0.15 * 6, 9);
  });

  const cases: [string, (job: Job) => void, string, RegExp][] = [
    ["a mechanism", (j) => void (j.beam.supports = ["roller", "free"]), "beam.supports", /mechanism/],
    ["no supports", (j) => void (j.beam.supports = ["free", "free"]), "beam.supports", /has no supports/],
    ["an unknown category in a custom combination", (j) => void (j.combinations = { set: "custom", custom: [{ id: "C1", factors: { dead: 1, sonw: 1 } }] }), "combinations.custom[0].factors.sonw", /not a load category/],
    ["a couple beyond the end", (j) => void (j.beam.loads = [{ type: "moment", category: "dead", M: 1, at: 9 }]), "beam.loads[0].at", /beyond the end of the member/],
  ];
  for (const [what, breakIt, path, message] of cases) {
    test(`${what} is a 400 naming ${path}`, async () => {
      const job = clone(plankIJob()) as Job;
      breakIt(job);
      const res = await post(job);
      expect(res.status).toBe(400);
      expect(res.body.code).toBe("ERR_INPUT_INVALID");
      const issue = res.body.issues.find((i: { path: string }) => i.path === path);
      expect(issue, JSON.stringify(res.body.issues)).toBeDefined();
      expect(issue.message).toMatch(message);
    });
  }
});

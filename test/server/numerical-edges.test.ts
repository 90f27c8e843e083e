// Numerical edge cases through the API: each gives a result that passes the result schema (no NaN,
// no infinity, no number missing) and says something a person can use.
import type { FastifyInstance } from "fastify";
import { afterAll, beforeAll, describe, expect, test } from "vitest";
import { DesignResult } from "../../core/index.js";
import { buildApp } from "../../server/app.js";
import { expectClose } from "../expect-close.js";
import { clone, plankIJob } from "../job-builders.js";
import { example } from "./store/store-fixtures.js";

let app: FastifyInstance;
beforeAll(async () => {
  app = await buildApp();
  await app.ready();
});
afterAll(() => app.close());

/** Designs over HTTP; the answer must be a 200 that passes the result schema. */
async function design(job: unknown): Promise<DesignResult> {
  const res = await app.inject({ method: "POST", url: "/api/designs", payload: job as object });
  expect(res.statusCode, res.body.slice(0, 500)).toBe(200);
  const parsed = DesignResult.safeParse(res.json());
  expect(parsed.success, JSON.stringify(parsed.error?.issues.slice(0, 5))).toBe(true);
  return parsed.data!;
}

describe("numerical edge cases", () => {
  test("zero shear everywhere (no loads, no self-weight): every zone at the largest spacing, utilisation 0, nothing NaN", async () => {
    const job = plankIJob();
    job.beam.loads = [];
    const result = await design(job);
    expect(result.schedules.length).toBeGreaterThan(0);
    for (const s of result.schedules) {
      expect(s.zones.map((z) => [z.spacing, z.utilisation])).toEqual(s.zones.map(() => [600, 0]));
      expect(s.verification.maxUtilisation).toBe(0);
      expect(s.efficiency.demandIntegral).toBe(0);
      expect(s.shearFlow.every((q) => q === 0)).toBe(true);
    }
    expect(result.status.passes).toBe(true);
  });

  test("loads that are all zero behave like no loads", async () => {
    const job = plankIJob();
    job.beam.loads = [{ type: "uniform", category: "dead", w: 0 }];
    const result = await design(job);
    for (const s of result.schedules) expect(s.verification.maxUtilisation).toBe(0);
  });

  test("a joint at the neutral axis (two equal 100 × 100 planks): Q = b·t·t/2, Q/I = 3/(4t) and q = V·Q/I at the support [D]", async () => {
    const job = plankIJob();
    job.parts = [
      { id: "bottom", material: "W", shape: { type: "rectangle", b: 100, h: 100 }, x: 0, y: 0 },
      { id: "top", material: "W", shape: { type: "rectangle", b: 100, h: 100 }, x: 0, y: 100 },
    ];
    const result = await design(job);
    expect(result.joints).toHaveLength(1);
    // [D] rectangle 100 × 200: I = 100·200³/12; the half beyond the cut: Q = 100·100·50.
    expectClose(result.joints[0]!.firstMoment, 100 * 100 * 50, { rel: 1e-9 });
    expectClose(result.joints[0]!.flowFactor, 3 / (4 * 100), { rel: 1e-9 });
    // [D] simple span 4 m, w = 0.25 N/mm: V(0) = wL/2 = 500 N; q = 500 × 0.0075 = 3.75 N/mm.
    expectClose(result.schedules[0]!.shearFlow[0]!, 3.75, { rel: 1e-9 });
  });

  test("a vertical joint through the neutral axis (two plies side by side, loaded on top): Q = 0, no demand, spacing limits only", async () => {
    const job = plankIJob();
    job.parts = [
      { id: "left", material: "W", shape: { type: "rectangle", b: 50, h: 200 }, x: 0, y: 0 },
      { id: "right", material: "W", shape: { type: "rectangle", b: 50, h: 200 }, x: 50, y: 0 },
    ];
    const result = await design(job);
    expect(result.joints.map((j) => j.firstMoment)).toEqual([0]);
    for (const s of result.schedules) expect(s.zones.every((z) => z.spacing === 600 && z.utilisation === 0)).toBe(true);
  });

  test("a connector with an enormous capacity (10 MN, the top of the physical range; 1e12 N is refused): the largest spacing, a tiny but finite utilisation", async () => {
    const job = plankIJob();
    job.connectors = [{ ...job.connectors[0]!, resistance: 1e7 } as (typeof job.connectors)[0]];
    const result = await design(job);
    for (const s of result.schedules) {
      expect(s.zones.every((z) => z.spacing === 600)).toBe(true);
      expect(s.verification.maxUtilisation).toBeGreaterThan(0);
      expect(s.verification.maxUtilisation).toBeLessThan(1e-3);
    }
    job.connectors = [{ ...job.connectors[0]!, resistance: 1e12 } as (typeof job.connectors)[0]];
    const refused = await app.inject({ method: "POST", url: "/api/designs", payload: job as object });
    expect(refused.statusCode).toBe(400);
    expect(refused.json().issues[0].path).toBe("connectors[0].resistance");
  });

  test("a member 1 mm long: finite results with every row on the member", async () => {
    for (const job of [plankIJob(), example("workshop-box-beam.si")]) {
      job.beam.spans = [0.001];
      job.beam.loads = [{ type: "uniform", category: "dead", w: 1 }];
      const result = await design(job);
      for (const s of result.schedules) {
        expect(s.positions.length).toBeGreaterThan(0);
        expect(s.positions.every((x) => x >= 0 && x <= 0.001)).toBe(true);
      }
    }
  });

  test("a member 1 mm long says that its rows cannot keep the end distance (30 mm): the schedule is infeasible with the reason", async () => {
    const job = example("workshop-box-beam.si");
    job.beam.spans = [0.001];
    job.beam.loads = [{ type: "uniform", category: "dead", w: 1 }];
    const result = await design(job);
    const said = [...result.warnings, ...result.schedules.flatMap((s) => [...s.detailingProblems, ...(s.infeasible ? ["infeasible"] : [])])];
    expect(said.join(" ")).toMatch(/end distance|minimum spacing|infeasible|too short/i);
  });

  test("a US job with no loads at all is just as finite", async () => {
    const job = clone(example("loft-beam-16d.us"));
    job.beam.loads = [];
    job.beam.selfWeight = false;
    const result = await design(job);
    for (const s of result.schedules) expect(s.verification.maxUtilisation).toBe(0);
  });
});

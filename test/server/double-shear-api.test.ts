import type { FastifyInstance } from "fastify";
import request from "supertest";
import { afterAll, beforeAll, expect, test } from "vitest";
import { buildApp } from "../../server/app.js";
import { flipped, threeLayerJob } from "../core/connector/double-shear-jobs.js";

let app: FastifyInstance;
beforeAll(async () => {
  app = await buildApp();
  await app.ready();
});
afterAll(() => app.close());

const post = (body: unknown) => request(app.server).post("/api/designs").send(body as object);
const timber = (G: number, t: number, b: number) => ({ material: { family: "sawn-timber", E: 1_600_000, density: 35, specificGravity: G }, thickness: t, width: b });
// Unequal outer plies and widths, so that the core carries shear flow and the outer members differ (invented member).
const job = (headSide: "auto" | "held" | "other") =>
  threeLayerJob({ units: "us", basis: "allowable", bottom: timber(0.42, 1.5, 5.5), core: timber(0.5, 3.5, 5.5), top: timber(0.55, 2.5, 7.25), connector: { kind: "timber-bolt", standard: "NDS-2018", size: "5/8", shear: "double" }, headSide });

test("POST /api/designs: a bolt in double shear gets the same resistances, count and verdict with the stack turned over or any headSide", async () => {
  const answers = await Promise.all([post(job("auto")), post(flipped(job("auto"))), post(job("held")), post(job("other"))]);
  for (const a of answers) expect(a.status, JSON.stringify(a.body.issues)).toBe(200);
  const core = (body: { schedules: { joint: string; resistance: { value: number }[]; count: number; passes: boolean }[] }) => body.schedules.find((s) => s.joint === "core")!;
  const first = core(answers[0]!.body);
  expect(first.count).toBeGreaterThan(0);
  for (const a of answers.slice(1)) {
    const s = core(a.body);
    s.resistance.forEach((r, i) => expect(r.value).toBeCloseTo(first.resistance[i]!.value, 6));
    expect(s.count).toBe(first.count);
    expect(s.passes).toBe(first.passes);
  }
});

test("POST /api/designs: a bolt in double shear at a joint of one contact line is a 400 naming connectors[0].shear", async () => {
  const two = job("auto") as unknown as { parts: unknown[]; fastening: { joints: unknown[] } };
  two.parts = two.parts.slice(0, 2);
  two.fastening.joints = [];
  const res = await post(two);
  expect(res.status).toBe(400);
  expect(res.body.issues).toEqual([expect.objectContaining({ path: "connectors[0].shear" })]);
});

import type { FastifyInstance } from "fastify";
import request from "supertest";
import { afterAll, beforeAll, describe, expect, test } from "vitest";
import { buildApp } from "../../server/app.js";
import { boltedPlates, weldedGirder } from "../core/connector/connector-jobs.js";
import { expectClose } from "../expect-close.js";

let app: FastifyInstance;
beforeAll(async () => {
  app = await buildApp();
  await app.ready();
});
afterAll(() => app.close());

const post = (body: unknown) => request(app.server).post("/api/designs").send(body as object);

describe("POST /api/designs: steel connector options of issue 15", () => {
  test("an EN 1993-1-8 category C bolt reads F_s,Rd = 0.5 × 0.7 × 800 × 245/1.25 = 54 880 N for an M20 8.8 on a class A surface, and it governs in 25 and 20 mm S275 plates [D]", async () => {
    const res = await post(boltedPlates({ kind: "steel-bolt", standard: "EN1993-1-8", size: "M20", grade: "8.8", category: "C", frictionSurface: "A" }, "si"));
    expect(res.status, JSON.stringify(res.body.issues)).toBe(200);
    const r = res.body.schedules[0].resistance[0];
    expectClose(r.value, 54_880, { rel: 1e-9 });
    expect(r.governing).toMatch(/slip, category C/);
  });
  test("a slip-resistant EN bolt without its friction surface is a 400 naming the field", async () => {
    const res = await post(boltedPlates({ kind: "steel-bolt", standard: "EN1993-1-8", size: "M20", grade: "8.8", category: "C" }, "si"));
    expect(res.status).toBe(400);
    expect(JSON.stringify(res.body)).toContain("frictionSurface");
  });
  test("an AISC fillet weld on a steel without F_u is a 400 naming the material's tensileStrength", async () => {
    const job = weldedGirder({ kind: "fillet-weld", standard: "AISC-360-16", leg: 6, electrode: "E70" });
    job.materials = job.materials.map((m) => ({ ...m, tensileStrength: undefined }));
    const res = await post(job);
    expect(res.status).toBe(400);
    expect(JSON.stringify(res.body)).toContain("tensileStrength");
  });
});

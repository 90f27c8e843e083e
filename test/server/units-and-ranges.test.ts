// Through the API: a converted example is accepted and designs to the same schedules; a number outside
// its physical range is a 400 at its field, quickly, and the service goes on.
import type { FastifyInstance } from "fastify";
import request from "supertest";
import { afterAll, beforeAll, describe, expect, test } from "vitest";
import { buildApp } from "../../server/app.js";
import { nailedIJob } from "../job-builders.js";

let app: FastifyInstance;
beforeAll(async () => {
  app = await buildApp();
  await app.ready();
});
afterAll(() => app.close());

type Counts = { schedules: { joint: string; count: number; zones: { spacing: number }[] }[]; status: { passes: boolean } };

describe("POST /api/conversions", () => {
  test("every example converted to the other system is accepted, designs to the same verdict and counts, and converts back to itself", async () => {
    const list = (await request(app.server).get("/api/examples")).body as { id: string; units: "si" | "us" }[];
    for (const { id, units } of list) {
      const original = (await request(app.server).get(`/api/examples/${id}`)).body;
      const other = units === "si" ? "us" : "si";
      const there = await request(app.server).post(`/api/conversions?to=${other}`).send(original);
      expect(there.status, id).toBe(200);
      const back = await request(app.server).post(`/api/conversions?to=${units}`).send(there.body);
      expect(back.status, id).toBe(200);
      const parsedOriginal = await request(app.server).post(`/api/conversions?to=${units}`).send(original);
      expect(back.body, id).toEqual(parsedOriginal.body);
      const a = (await request(app.server).post("/api/designs").send(original)).body as Counts;
      const b = (await request(app.server).post("/api/designs").send(there.body)).body as Counts;
      expect(b.status.passes, id).toBe(a.status.passes);
      expect(b.schedules.map((s) => [s.joint, s.count, s.zones.length]), id).toEqual(a.schedules.map((s) => [s.joint, s.count, s.zones.length]));
    }
  });
});

describe("numbers outside their physical range", () => {
  test("a check spacing of 1e-6 mm, a load of 1e300 kN/m and a resistance of 5e-324 N are 400s at their fields; /api/health answers after", async () => {
    const spacing = nailedIJob("rigid", "check");
    spacing.fastening.default.provided = { type: "zones", zones: [{ from: 0, to: 5, spacing: 1e-6 }] };
    const load = nailedIJob("rigid", "design");
    load.beam.loads = [{ type: "uniform", category: "dead", w: 1e300 }];
    const resistance = nailedIJob("rigid", "design");
    (resistance.connectors[0] as { resistance: number }).resistance = 5e-324;
    for (const [job, path] of [
      [spacing, "fastening.default.provided.zones[0].spacing"],
      [load, "beam.loads[0].w"],
      [resistance, "connectors[0].resistance"],
    ] as const) {
      for (const route of ["/api/designs", "/api/conversions?to=us"]) {
        const res = await request(app.server).post(route).send(job);
        expect(res.status, `${route} ${path}`).toBe(400);
        expect(res.body.code).toBe("ERR_INPUT_INVALID");
        expect(res.body.issues.map((i: { path: string }) => i.path)).toContain(path);
      }
    }
    expect((await request(app.server).get("/api/health")).status).toBe(200);
  });
});

import type { FastifyInstance } from "fastify";
import request from "supertest";
import { afterAll, beforeAll, describe, expect, test } from "vitest";
import { buildApp } from "../../server/app.js";
import { boltedPlates, nailedTimberI, weldedGirder } from "../core/connector/connector-jobs.js";
import { expectClose } from "../expect-close.js";

let app: FastifyInstance;
beforeAll(async () => {
  app = await buildApp();
  await app.ready();
});
afterAll(() => app.close());

const post = (body: unknown) => request(app.server).post("/api/designs").send(body as object);

describe("POST /api/designs with connectors picked by their trade description", () => {
  test("16d common nails by the NDS: 141 lbf per nail [V], mode IV, the limits in inches", async () => {
    const res = await post(nailedTimberI({ kind: "nail", standard: "NDS-2018", size: "16d common" }));
    expect(res.status, JSON.stringify(res.body.issues)).toBe(200);
    const s = res.body.schedules[0];
    expectClose(s.resistance[0].value, 141, { abs: 0.5 });
    expect(s.resistance[0].governing).toBe("mode IV");
    expect(s.resistance[0].modes).toHaveLength(6);
    expectClose(s.limits.minSpacing, 2.43, { rel: 1e-9 });
    expect(res.body.unitLabels.connectorForce).toBe("lbf");
  });

  test("a 0.131 × 3 in nail by the NDS: 100 ksi F_yb, mode IV", async () => {
    const res = await post(nailedTimberI({ kind: "nail", standard: "NDS-2018", diameter: 0.131, length: 3 }));
    expect(res.status, JSON.stringify(res.body.issues)).toBe(200);
    const r = res.body.schedules[0].resistance[0];
    expect(r.steps.find((x: { symbol: string }) => x.symbol === "F_yb").value).toBeCloseTo(100_000, 3);
    expect(res.body.schedules[0].connectorLabel).toBe("0.131 × 3 in nail, NDS-2018");
  });

  test("3/4 in Group A bolts (AISC, LRFD) in US units: the shear mode reads 17 892 lbf and is governing", async () => {
    const res = await post(boltedPlates({ kind: "steel-bolt", standard: "AISC-360-16", size: "3/4", grade: "A" }, "us"));
    expect(res.status, JSON.stringify(res.body.issues)).toBe(200);
    const r = res.body.schedules[0].resistance[0];
    expect(r.governing).toBe("bolt shear");
    expectClose(r.value, 17_892, { rel: 1e-4 });
  });

  test("M20 8.8 bolts (EN 1993-1-8) in SI units: shear 94.08 kN per plane in N", async () => {
    const res = await post(boltedPlates({ kind: "steel-bolt", standard: "EN1993-1-8", size: "M20", grade: "8.8", endDistance: 50, minSpacing: 70 }, "si"));
    expect(res.status, JSON.stringify(res.body.issues)).toBe(200);
    const modes = res.body.schedules[0].resistance[0].modes as { mode: string; value: number }[];
    expectClose(modes.find((m) => m.mode === "bolt shear")!.value, 94_080, { rel: 1e-4 });
  });

  test("3/16 in E70 fillets in a US job: the weld result reads 4176 lbf/in per fillet (LRFD)", async () => {
    const job = weldedGirder({ kind: "fillet-weld", standard: "AISC-360-16", leg: 0.1875, electrode: "E70" });
    const us = {
      ...job,
      units: "us",
      materials: [{ id: "S275", name: "A572 Gr. 50", family: "steel", E: 29_000_000, density: 490, yieldStrength: 50_000, tensileStrength: 65_000 }],
      parts: [
        { id: "bottom", material: "S275", shape: { type: "rectangle", b: 12, h: 0.75 }, x: 0, y: 0 },
        { id: "web", material: "S275", shape: { type: "rectangle", b: 0.375, h: 22 }, x: 5.8125, y: 0.75 },
        { id: "top", material: "S275", shape: { type: "rectangle", b: 12, h: 0.75 }, x: 0, y: 22.75 },
      ],
      beam: { spans: [20], loads: [{ type: "point", category: "dead", P: 100_000, at: 10 }], selfWeight: false },
    };
    const res = await post(us);
    expect(res.status, JSON.stringify(res.body.issues)).toBe(200);
    expectClose(res.body.welds[0].resistance[0].value, 4176.4, { rel: 1e-4 });
    expect(res.body.welds[0].connectorLabel).toBe("3/16 in E70 fillet, continuous, AISC 360-16");
    expect(res.body.joints[0].mechanism).toBe("weld");
  });

  test("a 3.1 × 75 mm nail by EN 1995-1-1 needs ρ_k: refused with the material's field path", async () => {
    const job = nailedTimberI({ kind: "nail", standard: "EN1995-1-1", diameter: 3.1, length: 75 }, {
      units: "si",
      basis: "factored",
      materials: [{ id: "DFL", name: "C24 without ρ_k", family: "sawn-timber", E: 11_000, density: 420 }],
      parts: [
        { id: "bottom", material: "DFL", shape: { type: "rectangle", b: 140, h: 38 }, x: 0, y: 0 },
        { id: "web", material: "DFL", shape: { type: "rectangle", b: 38, h: 235 }, x: 51, y: 38 },
        { id: "top", material: "DFL", shape: { type: "rectangle", b: 140, h: 38 }, x: 0, y: 273 },
      ],
      beam: { spans: [3.6], loads: [{ type: "uniform", category: "dead", w: 0.5 }], selfWeight: false },
      spacing: { module: 5, maxZonesPerSpan: 5, symmetric: true },
    });
    const res = await post(job);
    expect(res.status).toBe(400);
    expect(res.body.code).toBe("ERR_INPUT_INVALID");
    expect(res.body.issues.map((i: { path: string }) => i.path)).toContain("materials[0].characteristicDensity");
  });

  test("a weld larger than the web allows is a 400 naming connectors[0].throat", async () => {
    const res = await post(weldedGirder({ kind: "fillet-weld", standard: "EN1993-1-8", throat: 8 }));
    expect(res.status).toBe(400);
    expect(res.body.issues[0].path).toBe("connectors[0].throat");
  });
});

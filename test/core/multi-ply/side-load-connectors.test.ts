import { describe, expect, test } from "vitest";
import type { Ply } from "../../../core/multi-ply/ply-shares.js";
import { concentratedSideLoad, sideLoadSpacing } from "../../../core/multi-ply/side-load-connectors.js";
import { expectClose } from "../../expect-close.js";

// Hand calculations [D] on three and four 2x12 plies (38 × 286 mm, REFERENCES §10 [V]); the connector resistances
// R⊥ are caller-supplied inputs here (the connector kinds compute them), chosen as round numbers.
const lumber = (n: number): Ply[] => Array.from({ length: n }, () => ({ modulus: 11_000, thickness: 38, depth: 286 }));
const limits = { minSpacing: 50, maxSpacing: 600, module: 25 };

describe("sideLoadSpacing (uniform side load by zone)", () => {
  test("3 plies, 6 N/mm on the left face, nails from both faces R⊥ = 600 N, 2 rows: s = 2·600/4 = 300 mm and 2·600/2 = 600 mm [D]", () => {
    const r = sideLoadSpacing({ plies: lumber(3), zones: [{ from: 0, to: 4000, loads: [{ face: "left", magnitude: 6 }] }], fastening: { kind: "per-interface", resistance: 600, rows: 2 }, limits });
    const [i1, i2] = r.zones[0]!.interfaces;
    expectClose(i1!.requiredSpacing, 300, { rel: 1e-12 });
    expectClose(i2!.requiredSpacing, 600, { rel: 1e-12 });
    expect([i1!.spacing, i2!.spacing]).toEqual([300, 600]);
    expectClose(i1!.utilisation, 1, { rel: 1e-12 });
    expect(r.passes).toBe(true);
  });

  test("through-bolts take one spacing per zone, set by the worst interface: 2·2500/4 = 1250 mm, held to s_max = 600 mm [D]", () => {
    const r = sideLoadSpacing({ plies: lumber(3), zones: [{ from: 0, to: 4000, loads: [{ face: "left", magnitude: 6 }] }], fastening: { kind: "through", resistance: 2500, rows: 2 }, limits });
    expect(r.zones[0]!.interfaces.map((i) => i.spacing)).toEqual([600, 600]);
    expectClose(r.zones[0]!.interfaces[0]!.utilisation, (4 * 600) / (2 * 2500), { rel: 1e-12 });
  });

  test("zones with different side loads get their own spacings; a zone loaded on both faces of four plies needs nothing at the middle interface [D]", () => {
    const r = sideLoadSpacing({
      plies: lumber(4),
      zones: [
        { from: 0, to: 2000, loads: [{ face: "left", magnitude: 8 }] },
        { from: 2000, to: 4000, loads: [{ face: "left", magnitude: 8 }, { face: "right", magnitude: 8 }] },
      ],
      fastening: { kind: "per-interface", resistance: 600, rows: 2 },
      limits,
    });
    // Zone 1: T = 6, 4, 2 N/mm → 200, 300, 600 mm. Zone 2: each ply carries 16/4 = 4 N/mm, T = 4, 0, −4 N/mm → 300, s_max, 300 mm.
    expect(r.zones[0]!.interfaces.map((i) => i.spacing)).toEqual([200, 300, 600]);
    expect(r.zones[1]!.interfaces.map((i) => i.spacing)).toEqual([300, 600, 300]);
    expect(r.zones[1]!.interfaces[1]!.requiredSpacing).toBe(Infinity);
  });

  test("a side load the smallest spacing cannot pass is reported with its zone", () => {
    const r = sideLoadSpacing({ plies: lumber(3), zones: [{ from: 0, to: 1000, loads: [{ face: "left", magnitude: 60 }] }], fastening: { kind: "per-interface", resistance: 600, rows: 2 }, limits });
    expect(r.passes).toBe(false);
    expect(r.reasons[0]).toMatch(/zone 1/);
    expect(r.zones[0]!.interfaces[0]!.passes).toBe(false);
  });
});

describe("concentratedSideLoad (girder hung on one face)", () => {
  const base = { plies: lumber(3), loads: [{ face: "left" as const, magnitude: 10_000 }], depth: 286 };

  test("P = 10 kN on the left face of 3 plies, through-bolts R⊥ = 2500 N per shear plane: T = 6667 and 3333 N, 3 bolts within d/2 = 143 mm each side [D, rule CP]", () => {
    const r = concentratedSideLoad({ ...base, fastening: { kind: "through", resistance: 2500, rows: 2 }, minSpacing: 51 });
    expectClose(r.interfaces[0]!.force, 20_000 / 3, { rel: 1e-12 });
    expectClose(r.interfaces[1]!.force, 10_000 / 3, { rel: 1e-12 });
    expect(r.interfaces.map((i) => i.connectorsNeeded)).toEqual([3, 2]);
    expect(r.connectorsNeeded).toBe(3);
    expect(r.stationsNeeded).toBe(2);
    expect(r.transferDistance).toBe(143);
    expect(r.rule).toMatch(/d\/2.*\[CP\]/);
    expect(r.fits).toBe(true);
  });

  test("nails from both faces, R⊥ = 600 N: 12 across the loaded interface and 6 across the other; 6 stations of 2 fit in 286 mm only at ≤ 57.2 mm [D]", () => {
    const at = (minSpacing: number) => concentratedSideLoad({ ...base, fastening: { kind: "per-interface", resistance: 600, rows: 2 }, minSpacing });
    const r = at(50);
    expect(r.interfaces.map((i) => i.connectorsNeeded)).toEqual([12, 6]);
    expect(r.connectorsNeeded).toBe(18);
    expect(r.stationsNeeded).toBe(6);
    expect(r.fits).toBe(true);
    expect(at(57.2).fits).toBe(true);
    expect(at(60).fits).toBe(false);
  });

  test("a uniform side load over the transfer length adds to the same connectors: T_1 = 6667 + 4·286 = 7811 N → 14 nails [D]", () => {
    const r = concentratedSideLoad({ ...base, fastening: { kind: "per-interface", resistance: 600, rows: 2 }, minSpacing: 40, uniformLoads: [{ face: "left", magnitude: 6 }] });
    expectClose(r.interfaces[0]!.force, 20_000 / 3 + 4 * 286, { rel: 1e-12 });
    expect(r.interfaces[0]!.connectorsNeeded).toBe(14);
  });

  test("a given transfer distance replaces the d/2 practice", () => {
    const r = concentratedSideLoad({ ...base, fastening: { kind: "through", resistance: 2500, rows: 1 }, minSpacing: 100, transferDistance: 100 });
    expect(r.transferDistance).toBe(100);
    expect(r.stationsNeeded).toBe(3);
    expect(r.fits).toBe(true);
    expect(r.rule).toMatch(/100 mm/);
  });
});

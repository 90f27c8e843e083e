import { readFileSync } from "node:fs";
import fc from "fast-check";
import { describe, expect, test } from "vitest";
import { valuesAtStations } from "../../../core/beam/beam-result.js";
import { evaluate, momentAt, shearAt } from "../../../core/beam/member-actions.js";
import { stationsFor } from "../../../core/beam/stations.js";
import { designMember, prepareJob } from "../../../core/index.js";
import { DesignResult } from "../../../core/schema/result.js";
import { expectClose } from "../../expect-close.js";
import { analyse, coreBeam } from "./beam-test-kit.js";

const example = JSON.parse(readFileSync(new URL("../../../fixtures/examples/mezzanine-edge-beam.si.json", import.meta.url), "utf8"));

describe("beamResult through designMember (the mezzanine example: two spans and an overhang, EN 1990 6.10)", () => {
  const prepared = prepareJob(example);
  if (!prepared.ok) throw new Error(JSON.stringify(prepared.issues));
  const result = designMember(prepared.core);
  const beam = result.beam;

  test("the result matches its schema and the example passes its checks", () => {
    expect(DesignResult.safeParse(result).success).toBe(true);
    expect(result.status.passes).toBe(true);
  });

  test("every live-load pattern is its own combination with the combination's duration and the categories actually loaded", () => {
    const ids = beam.combinations.map((c) => c.id);
    expect(ids).toContain("EN-1a");
    expect(ids).toContain("EN-2a/P1-2");
    const noLive = beam.combinations.find((c) => c.id === "EN-2a/P0")!;
    expect(noLive).toMatchObject({ base: "EN-2a", pattern: [], duration: "permanent", categories: ["dead"] });
    const loaded = beam.combinations.find((c) => c.id === "EN-2a/P1-3")!;
    expect(loaded).toMatchObject({ duration: "medium", categories: ["dead", "live"], name: "1.35G + 1.5L, live on span 1 and span 3 (right overhang)" });
    expect(beam.regions.map((r) => r.kind)).toEqual(["span", "span", "overhang"]);
    expect(beam.ends).toEqual(["pinned", "roller", "roller", "free"]);
  });

  test("each envelope value is the value of the combination named as governing it", () => {
    const byId = new Map(beam.perCombination.map((p) => [p.combination, p]));
    beam.stations.forEach((_, j) => {
      expect(beam.envelope.shearMax[j]).toBe(byId.get(beam.envelope.governing.shearMax[j]!)!.shear[j]);
      expect(beam.envelope.shearMin[j]).toBe(byId.get(beam.envelope.governing.shearMin[j]!)!.shear[j]);
      expect(beam.envelope.momentMax[j]).toBe(byId.get(beam.envelope.governing.momentMax[j]!)!.moment[j]);
      expect(beam.envelope.momentMin[j]).toBe(byId.get(beam.envelope.governing.momentMin[j]!)!.moment[j]);
      const largest = Math.max(...beam.perCombination.map((p) => Math.abs(p.shear[j]!)));
      expect(Math.abs(byId.get(beam.envelope.governingShear[j]!)!.shear[j]!)).toBe(largest);
    });
  });

  test("each support has a station on either side, and V jumps there by the reaction", () => {
    for (const s of beam.supports.filter((s) => s.x > 0 && s.x < beam.length)) {
      const at = beam.stations.flatMap((x, j) => (x === s.x ? [j] : []));
      expect(at).toHaveLength(2);
      for (const p of beam.perCombination) {
        const r = p.reactions.find((q) => q.x === s.x)!;
        expectClose(p.shear[at[1]!]! - p.shear[at[0]!]!, r.force, { abs: 1e-6 * Math.max(1, Math.abs(r.force)) });
      }
    }
  });

  test("the service cases behind the deflection checks are listed with their deflection", () => {
    expect(beam.service.map((s) => s.combination.id)).toContain("SLS-live/P2");
    const check = result.checks.find((c) => c.id === "deflection-live-2")!;
    const service = beam.service.find((s) => s.combination.id === check.combination)!;
    expectClose(service.maxDeflection.value, check.demand, { rel: 1e-9 });
  });
});

describe("valuesAtStations", () => {
  test("agrees with shearAt, momentAt and evaluate at every station, both sides of every jump", () => {
    fc.assert(
      fc.property(fc.array(fc.integer({ min: 1000, max: 5000 }), { minLength: 1, maxLength: 4 }), fc.array(fc.record({ t: fc.double({ min: 0, max: 1, noNaN: true }), P: fc.integer({ min: -1e4, max: 1e4 }) }), { maxLength: 4 }), (spans, points) => {
        const L = spans.reduce((s, l) => s + l, 0);
        const beam = coreBeam(spans, undefined, [{ type: "uniform", category: "dead", w: 2 }, ...points.map((p) => ({ type: "point" as const, category: "dead", P: p.P, at: p.t * L }))]);
        const r = analyse(beam).results[0]!;
        const stations = stationsFor(L, r.actions.breaks, 150);
        const v = valuesAtStations(r.actions, r.curve, stations);
        stations.forEach((s, j) => {
          expect(v.shear[j]).toBe(shearAt(r.actions, s.x, s.side));
          expect(v.moment[j]).toBe(momentAt(r.actions, s.x, s.side));
          expectClose(v.deflection[j]!, -evaluate(r.curve, s.x, "v"), { abs: 1e-12 });
        });
      }),
      { numRuns: 60 },
    );
  });
});

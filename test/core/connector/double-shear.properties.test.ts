import fc from "fast-check";
import { describe, expect, test } from "vitest";
import type { JobInput } from "../../../core/schema/job.js";
import { coreSchedule, design, flipped, threeLayerJob, type Designed, type Layer } from "./double-shear-jobs.js";

// Invariants of double shear through the whole pipeline (prepareJob, designMember), over generated
// three-layer stacks whose core is held by a connector in double shear (invented members):
// - the roles come from the geometry, so turning the stack over (the outer layers trade places) or
//   changing headSide changes no resistance, no spacing limit, no connector count and no verdict;
// - a thicker layer (through-fasteners) or a denser one never lowers a connector's resistance.
const RUNS = { numRuns: 40 };

type Family = "nds-bolt" | "ec5-bolt" | "nds-nail" | "ec5-nail" | "nds-screw" | "aisc-bolt" | "en1993-bolt";
interface Stack {
  family: Family;
  units: "us" | "si";
  basis: "allowable" | "factored";
  connector: Record<string, unknown>;
  layers: [Layer, Layer, Layer];
  load: number;
  span: number;
}

const between = (min: number, max: number) => fc.double({ min, max, noNaN: true });
const quarter = (min: number, max: number) => fc.integer({ min: Math.round(min * 4), max: Math.round(max * 4) }).map((n) => n / 4);
const timberUs = fc.record({ G: fc.integer({ min: 35, max: 67 }).map((g) => g / 100), t: quarter(0.75, 4), b: quarter(3.5, 7.5) }).map(({ G, t, b }): Layer => ({ material: { family: "sawn-timber", E: 1_600_000, density: 35, specificGravity: G }, thickness: t, width: b }));
const timberSi = fc.record({ rho: fc.integer({ min: 300, max: 480 }), t: fc.integer({ min: 20, max: 120 }), b: fc.integer({ min: 90, max: 220 }) }).map(({ rho, t, b }): Layer => ({ material: { family: "sawn-timber", E: 11_000, density: 450, characteristicDensity: rho, meanDensity: Math.round(rho * 1.2) }, thickness: t, width: b }));
const steelUs = fc.record({ t: fc.constantFrom(0.25, 0.375, 0.5, 0.625, 0.75, 1), b: quarter(6, 10), Fu: fc.constantFrom(58_000, 65_000) }).map(({ t, b, Fu }): Layer => ({ material: { family: "steel", E: 29_000_000, density: 490, yieldStrength: 36_000, tensileStrength: Fu }, thickness: t, width: b }));
const steelSi = fc.record({ t: fc.integer({ min: 6, max: 25 }), b: fc.integer({ min: 150, max: 250 }), fu: fc.constantFrom(410, 430, 470, 510) }).map(({ t, b, fu }): Layer => ({ material: { family: "steel", E: 210_000, density: 7850, yieldStrength: 275, tensileStrength: fu }, thickness: t, width: b }));
const three = (layer: fc.Arbitrary<Layer>) => fc.tuple(layer, layer, layer);

const stacks: fc.Arbitrary<Stack> = fc.oneof(
  fc.record({ size: fc.constantFrom("1/2", "5/8", "3/4"), layers: three(timberUs) }).map(({ size, layers }): Stack => ({ family: "nds-bolt", units: "us", basis: "allowable", connector: { kind: "timber-bolt", standard: "NDS-2018", size, shear: "double" }, layers, load: 200, span: 12 })),
  fc.record({ size: fc.constantFrom("M12", "M16", "M20"), grade: fc.constantFrom("4.6", "8.8"), layers: three(timberSi) }).map(({ size, grade, layers }): Stack => ({ family: "ec5-bolt", units: "si", basis: "factored", connector: { kind: "timber-bolt", standard: "EN1995-1-1", size, grade, shear: "double" }, layers, load: 3, span: 4 })),
  fc.record({ size: fc.constantFrom("40d common", "60d common"), layers: three(timberUs.map((l) => ({ ...l, thickness: Math.min(l.thickness, 2) }))) }).map(({ size, layers }): Stack => ({ family: "nds-nail", units: "us", basis: "allowable", connector: { kind: "nail", standard: "NDS-2018", size, shear: "double" }, layers, load: 100, span: 12 })),
  fc.record({ d: fc.constantFrom(3.1, 4, 5), length: fc.constantFrom(90, 120, 150), predrilled: fc.boolean(), layers: three(timberSi.map((l) => ({ ...l, thickness: Math.min(l.thickness, 50) }))) }).map(({ d, length, predrilled, layers }): Stack => ({ family: "ec5-nail", units: "si", basis: "factored", connector: { kind: "nail", standard: "EN1995-1-1", diameter: d, length, predrilled, shear: "double" }, layers, load: 2, span: 4 })),
  fc.record({ gauge: fc.constantFrom("#10", "#12", "#14"), length: fc.constantFrom(3, 3.5, 4), layers: three(timberUs.map((l) => ({ ...l, thickness: Math.min(l.thickness, 1.5) }))) }).map(({ gauge, length, layers }): Stack => ({ family: "nds-screw", units: "us", basis: "allowable", connector: { kind: "wood-screw", standard: "NDS-2018", gauge, length, shear: "double" }, layers, load: 100, span: 12 })),
  fc.record({ size: fc.constantFrom("5/8", "3/4", "7/8"), grade: fc.constantFrom("A", "B"), layers: three(steelUs) }).map(({ size, grade, layers }): Stack => ({ family: "aisc-bolt", units: "us", basis: "factored", connector: { kind: "steel-bolt", standard: "AISC-360-16", size, grade, shear: "double" }, layers, load: 2000, span: 10 })),
  fc.record({ size: fc.constantFrom("M16", "M20", "M24"), grade: fc.constantFrom("8.8", "10.9"), layers: three(steelSi) }).map(({ size, grade, layers }): Stack => ({ family: "en1993-bolt", units: "si", basis: "factored", connector: { kind: "steel-bolt", standard: "EN1993-1-8", size, grade, shear: "double" }, layers, load: 30, span: 3 })),
);

const jobOf = (s: Stack, headSide: "auto" | "held" | "other" = "auto"): JobInput =>
  threeLayerJob({ units: s.units, basis: s.basis, bottom: s.layers[0], core: s.layers[1], top: s.layers[2], connector: s.connector, headSide, load: s.load, span: s.span });

const same = (a: number, b: number) => Math.abs(a - b) <= 1e-9 * Math.max(1, Math.abs(a), Math.abs(b));

/** What double shear must not change: the refusal, or the resistances, spacing limits, count and verdict of the core's joint. */
function expectSameOutcome(a: Designed, b: Designed) {
  expect(b.ok).toBe(a.ok);
  if (!a.ok || !b.ok) {
    if (!a.ok && !b.ok) expect(new Set(b.issues.map((i) => `${i.path}: ${i.message}`))).toEqual(new Set(a.issues.map((i) => `${i.path}: ${i.message}`)));
    return;
  }
  const [x, y] = [coreSchedule(a.result), coreSchedule(b.result)];
  expect(y.resistance.length).toBe(x.resistance.length);
  x.resistance.forEach((r, i) => expect(same(y.resistance[i]!.value, r.value), `resistance ${r.value} vs ${y.resistance[i]!.value}`).toBe(true));
  for (const key of ["minSpacing", "maxSpacing", "endDistance", "edgeDistance", "rowSpacing"] as const) {
    expect(same(y.limits[key] ?? 0, x.limits[key] ?? 0), `${key}`).toBe(true);
  }
  expect(same(y.limits.penetration?.provided ?? 0, x.limits.penetration?.provided ?? 0)).toBe(true);
  expect(y.count).toBe(x.count);
  expect(y.passes).toBe(x.passes);
  expect(b.result.status.passes).toBe(a.result.status.passes);
}

describe("double shear through designMember (property-based)", () => {
  test("turning the stack over (the two outer parts trade places) or changing headSide changes no resistance, spacing, count or verdict", () => {
    fc.assert(
      fc.property(stacks, (s) => {
        const base = design(jobOf(s));
        expectSameOutcome(base, design(flipped(jobOf(s))));
        expectSameOutcome(base, design(jobOf(s, "held")));
        expectSameOutcome(base, design(jobOf(s, "other")));
      }),
      RUNS,
    );
  });

  test("a thicker layer (bolts) or a denser timber layer (every kind) never lowers the connector's resistance", () => {
    fc.assert(
      fc.property(stacks, fc.integer({ min: 0, max: 2 }), between(1.05, 1.6), fc.boolean(), (s, which, factor, thicker) => {
        const layer = s.layers[which]!;
        const material = layer.material as { family: string; specificGravity?: number; characteristicDensity?: number; meanDensity?: number };
        const bolt = s.family.endsWith("bolt");
        let changed: Layer;
        if (thicker && bolt) changed = { ...layer, thickness: s.units === "us" ? Math.round(layer.thickness * factor * 8) / 8 + 0.125 : Math.round(layer.thickness * factor) + 1 };
        else if (material.specificGravity !== undefined) changed = { ...layer, material: { ...material, specificGravity: Math.min(0.73, Math.round(material.specificGravity * factor * 100) / 100 + 0.01) } };
        else if (material.characteristicDensity !== undefined) changed = { ...layer, material: { ...material, characteristicDensity: Math.min(500, Math.round(material.characteristicDensity * factor)) } };
        else return;
        const before = design(jobOf(s));
        const layers = [...s.layers] as Stack["layers"];
        layers[which] = changed;
        const after = design(jobOf({ ...s, layers }));
        if (!before.ok || !after.ok) return;
        const [x, y] = [coreSchedule(before.result), coreSchedule(after.result)];
        x.resistance.forEach((r, i) => {
          const v = y.resistance[i]!.value;
          expect(v >= r.value * (1 - 1e-9), `${s.family}: ${r.value} (${r.governing}) → ${v} (${y.resistance[i]!.governing})`).toBe(true);
        });
      }),
      RUNS,
    );
  });
});

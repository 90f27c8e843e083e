// A job and its twin in the other unit system are the same design: the same verdicts, zones, spacings
// and connector counts; converting there and back returns every number as it was entered; values that
// sit exactly on a limit or a band edge stay on their side after conversion.
// Conversion factors: NIST SP 811 Appendix B (1 in = 25.4 mm, 1 lbf = 4.4482216152605 N exactly) [V].
import { readFileSync, readdirSync } from "node:fs";
import fc from "fast-check";
import { describe, expect, test } from "vitest";
import { prepareJob } from "../../../core/check-job.js";
import { designMember } from "../../../core/design-member.js";
import type { DesignResult } from "../../../core/schema/result.js";
import type { JobDocument, JobInput } from "../../../core/schema/job.js";
import { convertJob, convertNumber } from "../../../core/units/convert-job.js";
import { gradeMaterial, grades } from "../../../core/materials/grades.js";
import { rescale } from "../../../core/units/convert.js";
import { Material } from "../../../core/schema/job.js";
import { quantities } from "../../../core/units/quantity.js";
import { expectClose } from "../../expect-close.js";

const folder = new URL("../../../fixtures/examples/", import.meta.url);
const examples = readdirSync(folder)
  .filter((f) => f.endsWith(".json"))
  .map((file) => ({ file, input: JSON.parse(readFileSync(new URL(file, folder), "utf8")) as unknown }));

const prepared = (input: unknown) => {
  const p = prepareJob(input);
  if (!p.ok) throw new Error(JSON.stringify(p.issues));
  return p;
};
const other = (job: JobDocument) => (job.units === "si" ? "us" : "si");

/** Asserts that two results (core units) are the same design. */
function expectSameDesign(a: DesignResult, b: DesignResult, what: string) {
  const L = a.beam.length;
  const rel = 1e-9;
  expect(b.status.passes, `${what}: verdict`).toBe(a.status.passes);
  expect(b.schedules.length).toBe(a.schedules.length);
  a.schedules.forEach((s, i) => {
    const t = b.schedules[i]!;
    expect(t.passes, `${what}: joint ${s.joint} passes`).toBe(s.passes);
    expect(t.count, `${what}: joint ${s.joint} connectors`).toBe(s.count);
    expect(t.zones.length, `${what}: joint ${s.joint} zones`).toBe(s.zones.length);
    s.zones.forEach((z, k) => {
      const y = t.zones[k]!;
      expectClose(y.from, z.from, { abs: rel * L }, `${what}: joint ${s.joint} zone ${k} from`);
      expectClose(y.to, z.to, { abs: rel * L }, `${what}: joint ${s.joint} zone ${k} to`);
      expectClose(y.spacing, z.spacing, { rel }, `${what}: joint ${s.joint} zone ${k} spacing`);
    });
  });
  a.welds.forEach((w, i) => {
    const v = b.welds[i]!;
    expect(v.passes, `${what}: weld ${w.joint}`).toBe(w.passes);
    expectClose(v.utilisation, w.utilisation, { rel: 1e-8 }, `${what}: weld ${w.joint} utilisation`);
    expect(v.zones.map((z) => [z.pattern, z.passes])).toEqual(w.zones.map((z) => [z.pattern, z.passes]));
    w.zones.forEach((z, k) => {
      expectClose(v.zones[k]!.to, z.to, { abs: rel * L }, `${what}: weld ${w.joint} zone ${k} to`);
      if (z.pitch !== null) expectClose(v.zones[k]!.pitch!, z.pitch, { rel }, `${what}: weld ${w.joint} zone ${k} pitch`);
    });
  });
  a.bondLines.forEach((l, i) => expect(b.bondLines[i]!.passes, `${what}: bond line ${l.joint}`).toBe(l.passes));
  a.checks.forEach((c, i) => {
    expect(b.checks[i]!.passes, `${what}: ${c.title}`).toBe(c.passes);
    expectClose(b.checks[i]!.utilisation, c.utilisation, { rel: 1e-8 }, `${what}: ${c.title}`);
  });
}

describe("an example and its converted twin are the same design", () => {
  for (const { file, input } of examples) {
    test(`${file}: converted to the other system, the same verdicts, zones, spacings and connectors`, () => {
      const a = prepared(input);
      const twin = prepared(convertJob(a.job, other(a.job)));
      expectSameDesign(designMember(a.core), designMember(twin.core), file);
    });

    test(`${file}: there and back returns every number as entered, in both directions`, () => {
      const { job } = prepared(input);
      const there = convertJob(job, other(job));
      expect(convertJob(there, job.units)).toEqual(job);
      // The twin, taken back and forth again, is itself unchanged.
      expect(convertJob(convertJob(there, job.units), other(job))).toEqual(there);
    });
  }

  test("the opening example has the same connectors in SI and in US units (608: 616 before rows kept the minimum gap; 616 and 632 before the twin was made the same design)", () => {
    const a = prepared(examples.find((e) => e.file === "workshop-box-beam.si.json")!.input);
    const twin = prepared(convertJob(a.job, "us"));
    const count = (r: DesignResult) => r.schedules.reduce((n, s) => n + s.count, 0);
    expect(count(designMember(a.core))).toBe(608);
    expect(count(designMember(twin.core))).toBe(608);
    // The job's spacing practice stays SI: the module shown is 5 mm in inches, not the US 1/4 in.
    expect(twin.job.spacing.practice).toBe("si");
    expectClose(twin.job.spacing.module!, 5 / 25.4, { rel: 1e-9 }, "module");
  });

  test("converted values carry no visible noise: 420 kg/m³, 7000 MPa, 4.8 m", () => {
    // 420 / 16.018463373960138 = 26.21974… lb/ft³; 7000 MPa / 0.006894757293168361 = 1 015 264.2… psi; 4.8 m / 0.3048 = 15.748031… ft [D].
    for (const [value, quantity, expected] of [[420, "density", 26.219743], [7000, "modulus", 1015264.2], [4.8, "span", 15.748031]] as const) {
      const y = convertNumber(value, quantity, "si", "us");
      expectClose(y, expected, { rel: 1e-6 }, quantity);
      expect(String(y).replace(/[-.]/g, "").replace(/^0+/, "").length).toBeLessThanOrEqual(12);
      expect(convertNumber(y, quantity, "us", "si")).toBe(value);
    }
  });

  test("property: any number of up to 9 significant figures comes back exactly, for every quantity kind and both directions", () => {
    fc.assert(
      fc.property(
        fc.integer({ min: 1, max: 999_999_999 }),
        fc.integer({ min: -12, max: 12 }),
        fc.constantFrom(...quantities),
        fc.constantFrom("si" as const, "us" as const),
        fc.boolean(),
        (mantissa, exponent, quantity, from, negative) => {
          const value = Number(`${negative ? "-" : ""}${mantissa}e${exponent}`);
          const to = from === "si" ? "us" : "si";
          const there = convertNumber(value, quantity, from, to);
          expect(convertNumber(there, quantity, to, from)).toBe(value);
          expect(convertNumber(convertNumber(there, quantity, to, from), quantity, from, to)).toBe(there);
        },
      ),
      { numRuns: 3000 },
    );
  });
});

describe("a conversion never produces a job the service refuses", () => {
  const numbersOf = (x: unknown, path: (string | number)[] = [], out: (string | number)[][] = []) => {
    if (typeof x === "number") out.push(path);
    else if (Array.isArray(x)) x.forEach((v, i) => numbersOf(v, [...path, i], out));
    else if (x && typeof x === "object") for (const [k, v] of Object.entries(x)) numbersOf(v, [...path, k], out);
    return out;
  };
  const setAt = (doc: unknown, path: (string | number)[], value: number) => {
    let node = doc as Record<string | number, unknown>;
    for (const key of path.slice(0, -1)) node = node[key] as Record<string | number, unknown>;
    node[path[path.length - 1]!] = value;
  };

  test("property: an example with some numbers scaled by round factors, if valid, converts both ways, is accepted, designs the same, and comes back as it was", () => {
    fc.assert(
      fc.property(
        fc.constantFrom(...examples),
        fc.array(fc.tuple(fc.nat(), fc.constantFrom(0.5, 0.8, 0.999, 1.001, 1.25, 2, 3.7, 10)), { minLength: 1, maxLength: 4 }),
        ({ input }, changes) => {
          const doc = structuredClone(input);
          const paths = numbersOf(doc).filter((p) => !p.includes("version"));
          for (const [i, factor] of changes) {
            const path = paths[i % paths.length]!;
            let node: unknown = doc;
            for (const key of path) node = (node as Record<string | number, unknown>)[key];
            setAt(doc, path, Number(((node as number) * factor).toPrecision(6)));
          }
          const p = prepareJob(doc);
          if (!p.ok) return;
          const there = convertJob(p.job, other(p.job));
          const q = prepareJob(there);
          expect(q.ok ? [] : q.issues).toEqual([]);
          expect(convertJob(there, p.job.units)).toEqual(p.job);
          if (q.ok) expectSameDesign(designMember(p.core), designMember(q.core), "scaled example");
        },
      ),
      { numRuns: 150 },
    );
  });

  test("a 20 m part (787.401575 in) and a member of twelve spans of 500/12 m convert and are accepted", () => {
    const job = prepared(examples.find((e) => e.file === "workshop-box-beam.si.json")!.input).job;
    const long: JobInput = structuredClone(job);
    const top = long.parts.find((p) => p.id === "top")!;
    top.shape = { type: "rectangle", b: 95, h: 20_000 - 330 };
    const webs = long.parts.filter((p) => p.id.startsWith("web"));
    for (const w of webs) w.shape = { type: "rectangle", b: 18, h: 20_000 };
    const us = convertJob(prepared(long).job, "us");
    expect(prepareJob(us).ok).toBe(true);
    expect(convertJob(prepared(us).job, "si")).toEqual(prepared(long).job);

    const spans: JobInput = structuredClone(job);
    spans.beam.spans = Array.from({ length: 12 }, () => 500 / 12);
    spans.beam.loads = [{ type: "uniform", category: "dead", w: 1 }];
    const p = prepared(spans);
    for (const units of ["us", "si"] as const) {
      const twin = units === p.job.units ? p.job : convertJob(p.job, units);
      const q = prepareJob(twin);
      expect(q.ok ? [] : q.issues).toEqual([]);
    }
  });
});

/** A welded steel I in SI: web 10 × 500 mm, flanges 200 × 20 mm, S355, on a 6 m span. */
function weldedGirder(connector: Record<string, unknown>): JobInput {
  return {
    format: "stitchplan-job",
    version: 1,
    units: "si",
    basis: "factored",
    project: { name: "limit cases" },
    member: { mark: "G-1" },
    materials: [{ id: "S355", name: "S355", family: "steel", E: 210_000, density: 7850, yieldStrength: 355, tensileStrength: 490 }],
    parts: [
      { id: "bottom", material: "S355", shape: { type: "rectangle", b: 200, h: 20 }, x: 0, y: 0 },
      { id: "web", material: "S355", shape: { type: "rectangle", b: 10, h: 500 }, place: { on: "bottom", side: "top" } },
      { id: "top", material: "S355", shape: { type: "rectangle", b: 200, h: 20 }, place: { on: "web", side: "top" } },
    ],
    connectors: [{ id: "C", ...connector } as JobInput["connectors"][number]],
    fastening: { default: { connector: "C", rows: 2 } },
    beam: { spans: [6], loads: [{ type: "uniform", category: "dead", w: 40 }] },
    combinations: { set: "en1990-6.10" },
  };
}

describe("values on a limit or a band edge stay on their side after conversion", () => {
  const twins = (input: JobInput) => {
    const a = prepareJob(input);
    expect(a.ok ? [] : a.issues).toEqual([]);
    const job = (a as { job: JobDocument }).job;
    const us = convertJob(job, "us");
    const b = prepareJob(us);
    expect(b.ok ? [] : b.issues).toEqual([]);
    const back = prepareJob(convertJob((b as { job: JobDocument }).job, "si"));
    expect(back.ok ? [] : back.issues).toEqual([]);
    return [designMember((a as { core: JobDocument }).core), designMember((b as { core: JobDocument }).core)] as const;
  };

  test("a 3 mm fillet throat (the least throat of EN 1993-1-8 §4.5.2(2) [M]) on S355: accepted both ways, β_w = 0.9 both ways", () => {
    const [si, us] = twins(weldedGirder({ kind: "fillet-weld", standard: "EN1993-1-8", throat: 3 }));
    const betaW = (r: DesignResult) => r.welds[0]!.resistance[0]!.steps.find((s) => s.symbol === "β_w")!.value;
    // EN 1993-1-8 Table 4.1 [M]: β_w = 0.9 for S355.
    expect(betaW(si)).toBe(0.9);
    expect(betaW(us)).toBe(0.9);
    expectSameDesign(si, us, "fillet weld");
  });

  test("an M16 bolt at p₁ = 2.2·d₀ = 39.6 mm (EN 1993-1-8 Table 3.3 [M], d₀ = 18 mm): accepted both ways", () => {
    const plates = weldedGirder({ kind: "steel-bolt", standard: "EN1993-1-8", size: "M16", grade: "8.8", minSpacing: 39.6 });
    plates.parts = [
      { id: "bottom", material: "S355", shape: { type: "rectangle", b: 200, h: 20 }, x: 0, y: 0 },
      { id: "top", material: "S355", shape: { type: "rectangle", b: 200, h: 20 }, place: { on: "bottom", side: "top" } },
    ];
    plates.beam.loads = [{ type: "uniform", category: "dead", w: 2 }];
    const [si, us] = twins(plates);
    expectSameDesign(si, us, "bolts at 2.2 d₀");
  });

  test("ρ_k = 500 kg/m³ with nails not predrilled (EN 1995-1-1 §8.3.1.2(2) [M]: predrilling above 500): accepted both ways", () => {
    const input: JobInput = {
      format: "stitchplan-job",
      version: 1,
      units: "si",
      basis: "factored",
      project: { name: "limit cases" },
      member: { mark: "N-1" },
      materials: [{ id: "HW", name: "dense softwood", family: "sawn-timber", E: 12_000, density: 550, characteristicDensity: 500, meanDensity: 550, strength: { bending: 14, shear: 2.4 } }],
      parts: [
        { id: "bottom", material: "HW", shape: { type: "rectangle", b: 120, h: 45 }, x: 0, y: 0 },
        { id: "web", material: "HW", shape: { type: "rectangle", b: 45, h: 200 }, place: { on: "bottom", side: "top" } },
        { id: "top", material: "HW", shape: { type: "rectangle", b: 120, h: 45 }, place: { on: "web", side: "top" } },
      ],
      connectors: [{ id: "N", kind: "nail", standard: "EN1995-1-1", diameter: 3.1, length: 90 } as JobInput["connectors"][number]],
      fastening: { default: { connector: "N", rows: 1 } },
      beam: { spans: [4], loads: [{ type: "uniform", category: "dead", w: 2 }] },
      combinations: { set: "en1990-6.10" },
    };
    const [si, us] = twins(input);
    expectSameDesign(si, us, "nails at ρ_k = 500");
  });
});

describe("grades filled in show the round values of their source", () => {
  test("DFL No. 2 (NDS Supplement Table 4A [M]): E = 1 600 000 psi and F_b = 900 psi in US; C24 (EN 338 [M]): E = 11 000 MPa, ρ_k = 350 in SI", () => {
    const dfl = gradeMaterial(grades.find((g) => g.id === "DFL-2")!, "allowable", "us");
    expect(dfl.E).toBe(1_600_000);
    expect(dfl.strength.bending).toBe(900);
    expect(dfl.density).toBe(34);
    const c24 = gradeMaterial(grades.find((g) => g.id === "C24")!, "factored", "si");
    expect(c24.E).toBe(11_000);
    expect(c24.characteristicDensity).toBe(350);
  });

  test("every grade in one system converts to exactly the same grade in the other", () => {
    for (const g of grades) {
      for (const basis of ["allowable", "factored"] as const) {
        const si = gradeMaterial(g, basis, "si");
        const us = gradeMaterial(g, basis, "us");
        expect(rescale(Material, si, (v, q) => convertNumber(v, q, "si", "us")), `${g.id} ${basis}`).toEqual(us);
        expect(rescale(Material, us, (v, q) => convertNumber(v, q, "us", "si")), `${g.id} ${basis}`).toEqual(si);
      }
    }
  });
});

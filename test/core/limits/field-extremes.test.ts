// Every number of a job has a physically meaningful range at its field. A number at an extreme
// (1e-300, 1e300, 5e-324, −0) or at either end of its range gives a refusal naming the field, or a
// result whose every number is finite; never a throw, and never a verdict built on a number that is
// not finite.
import { z } from "zod";
import { describe, expect, test } from "vitest";
import { prepareJob } from "../../../core/check-job.js";
import { designMember } from "../../../core/design-member.js";
import { physicalRanges, rangesInSchema } from "../../../core/physical-ranges.js";
import { quantityOf } from "../../../core/schema/quantity.js";
import { JobDocument, type JobInput } from "../../../core/schema/job.js";
import { nailedIJob } from "../../job-builders.js";
import { EXTREMES, extremeBaseJobs, firstNonFinite, numberPaths, outcome, pathText, rangeEnds, withValue } from "./field-extremes.js";

/** Numeric fields of the job schema, indices written `[]` and record keys `*`. */
function schemaNumberFields(): string[] {
  const root = z.toJSONSchema(JobDocument, { io: "input", unrepresentable: "any", metadata: quantityOf }) as Record<string, unknown>;
  const defs = (root.$defs ?? {}) as Record<string, unknown>;
  const out = new Set<string>();
  const seen = new Set<string>();
  const walk = (node: unknown, path: string) => {
    if (!node || typeof node !== "object") return;
    const s = node as Record<string, unknown>;
    if (typeof s.$ref === "string") {
      const key = s.$ref.split("/").pop()!;
      if (seen.has(`${path}|${key}`)) return;
      seen.add(`${path}|${key}`);
      return walk(defs[key], path);
    }
    if (s.type === "number" || s.type === "integer") return void out.add(path);
    for (const k of ["anyOf", "oneOf", "allOf"]) if (Array.isArray(s[k])) (s[k] as unknown[]).forEach((x) => walk(x, path));
    if (s.properties) for (const [k, v] of Object.entries(s.properties as Record<string, unknown>)) walk(v, path ? `${path}.${k}` : k);
    if (s.items) walk(s.items, `${path}[]`);
    if (s.additionalProperties && typeof s.additionalProperties === "object") walk(s.additionalProperties, `${path}.*`);
  };
  walk(root, "");
  return [...out].sort();
}

describe("physical ranges", () => {
  test("every number of the job schema has a range: in the table of physical ranges or stated by the schema itself", () => {
    const uncovered = schemaNumberFields().filter((f) => !(f in physicalRanges) && !rangesInSchema.includes(f));
    expect(uncovered).toEqual([]);
  });

  // One test per base job, so that each has its own time limit as the examples grow (a design of a column takes 15 ms).
  test.for(extremeBaseJobs().map((job) => [job.name, job] as const))("every field at 1e-300, 1e300, 5e-324, −0 and at both ends of its range: refused at the field, or a finite result (%s)", { timeout: 120_000 }, ([, { name, input }]) => {
    const faults: string[] = [];
    {
      const units = (input as { units: "si" | "us" }).units;
      for (const path of numberPaths(input)) {
        const field = pathText(path);
        if (field === "version") continue;
        const ends = rangeEnds(field.replace(/\[\d+\]/g, "[]"), units);
        for (const value of [...EXTREMES, ...ends]) {
          // At the ends of its range a value is valid; another rule may still refuse the job it makes.
          const o = outcome(withValue(input, path, value), field, !(EXTREMES as readonly number[]).includes(value));
          if (!o.ok) faults.push(`${name}: ${field} = ${Object.is(value, -0) ? "-0" : value}: ${o.fault.slice(0, 300)}`);
        }
      }
    }
    expect(faults).toEqual([]);
  });
});

describe("the measured cases are refused at their field, with the limit in the job's units", () => {
  const refused = (input: JobInput, field: string) => {
    const p = prepareJob(input);
    expect(p.ok).toBe(false);
    const issue = (p as { issues: { path: string; message: string }[] }).issues.find((i) => i.path === field);
    expect(issue, JSON.stringify(p)).toBeDefined();
    return issue!.message;
  };

  test("a check-mode zone spacing of 1e-6 mm and of 1e-4 mm (the process aborted, or answered 500 after 23 s)", () => {
    for (const spacing of [1e-6, 1e-4]) {
      const job = nailedIJob("rigid", "check");
      job.fastening.default.provided = { type: "zones", zones: [{ from: 0, to: 5, spacing }] };
      expect(refused(job, "fastening.default.provided.zones[0].spacing")).toMatch(/outside the range of spacings \(0\.05 mm to 20,000 mm\)/);
    }
  });

  test("a provided zone schedule of more rows than a list of positions may hold (5000)", () => {
    const job = nailedIJob("rigid", "check");
    job.fastening.default.provided = { type: "zones", zones: [{ from: 0, to: 2.5, spacing: 50 }, { from: 2.5, to: 5, spacing: 0.1 }] };
    expect(refused(job, "fastening.default.provided.zones[1].spacing")).toMatch(/about 25050 rows.*at most 5000/);
  });

  test("a load of 1e300 kN/m (answered 200, passes: true, deflection 0); a point load of 1e300 lbf in US units", () => {
    const job = nailedIJob("rigid", "design");
    job.beam.loads = [{ type: "uniform", category: "dead", w: 1e300 }];
    expect(refused(job, "beam.loads[0].w")).toMatch(/kN\/m is outside the range of line loads \(up to 100,000 kN\/m either way\)/);
    const us = prepareJob({ ...nailedIJob("rigid", "design"), units: "us", beam: { spans: [16], loads: [{ type: "point", category: "dead", P: 1e300, at: 8 }], selfWeight: false } });
    expect(us.ok).toBe(false);
    expect((us as { issues: { path: string; message: string }[] }).issues[0]).toMatchObject({ path: "beam.loads[0].P", message: expect.stringMatching(/lbf is outside the range of point loads/) });
  });

  test("a resistance of 5e-324, a specific gravity of 1e-300, a strength of 1e-300 (answered 200 with nulls)", () => {
    const resistance = nailedIJob("rigid", "design");
    (resistance.connectors[0] as { resistance: number }).resistance = 5e-324;
    expect(refused(resistance, "connectors[0].resistance")).toMatch(/outside the range of connector resistances \(1 N to/);
    const gravity = nailedIJob("rigid", "design");
    gravity.materials[0]!.specificGravity = 1e-300;
    expect(refused(gravity, "materials[0].specificGravity")).toMatch(/outside the range of specific gravities of wood \(0\.1 to 1\.2\)/);
    const strength = nailedIJob("rigid", "design");
    strength.materials[0]!.strength = { bending: 1e-300, shear: 2.46 };
    expect(refused(strength, "materials[0].strength.bending")).toMatch(/outside the range of strengths of structural materials \(0\.01 MPa to 10,000 MPa\)/);
  });

  test("a strength of 5e-324 psi, which converts to 0 MPa, is still seen and refused", () => {
    const job = { ...nailedIJob("rigid", "design"), units: "us" as const, beam: { spans: [16], loads: [{ type: "uniform" as const, category: "dead", w: 100 }], selfWeight: false } };
    job.materials[0]!.strength = { bending: 5e-324, shear: 300 };
    expect(refused(job, "materials[0].strength.bending")).toMatch(/psi/);
  });
});

describe("the verdict's invariant: a result with a number that is not finite fails", () => {
  test("designMember given (bypassing the checks) a connector of zero resistance and a load that overflows: it fails, naming the number", () => {
    const p = prepareJob(nailedIJob("rigid", "check"));
    if (!p.ok) throw new Error(JSON.stringify(p.issues));
    const zero = structuredClone(p.core);
    (zero.connectors[0] as { resistance: number }).resistance = 0;
    const overflow = structuredClone(p.core);
    overflow.beam.loads = [{ type: "uniform", category: "dead", face: "top", label: "", w: 1e306 }];
    for (const job of [zero, overflow]) {
      const result = designMember(job);
      expect(firstNonFinite(result)).not.toBeNull();
      expect(result.status.passes).toBe(false);
      expect(result.status.failures.join(" ")).toMatch(/not finite \(\S+\)/);
    }
  });

  test("every example designs to a result whose every number is finite", () => {
    for (const { name, input } of extremeBaseJobs()) {
      const p = prepareJob(input);
      if (!p.ok) throw new Error(`${name}: ${JSON.stringify(p.issues)}`);
      expect(firstNonFinite(designMember(p.core)), name).toBeNull();
    }
  });
});

import { readFileSync, readdirSync } from "node:fs";
import { describe, expect, test } from "vitest";
import { prepareJob } from "../../../core/check-job.js";
import { designMember } from "../../../core/design-member.js";
import { convertJob } from "../../../core/units/convert-job.js";
import { expectClose } from "../../expect-close.js";

const folder = new URL("../../../fixtures/examples/", import.meta.url);
const examples = readdirSync(folder).filter((f) => f.endsWith(".json"));

const design = (input: unknown) => {
  const p = prepareJob(input);
  if (!p.ok) throw new Error(JSON.stringify(p.issues));
  return { job: p.job, result: designMember(p.core) };
};

describe("convertJob: the same member in SI and in US units", () => {
  for (const file of examples) {
    test(`${file}: converted to the other system it gives the same section, actions, demand and a passing schedule`, () => {
      const a = design(JSON.parse(readFileSync(new URL(file, folder), "utf8")));
      const other = a.job.units === "si" ? "us" : "si";
      const b = design(convertJob(a.job, other));
      const rel = 1e-9; // each number is the shortest decimal within 2e-10 of the exact conversion
      expectClose(b.result.section.secondMoment, a.result.section.secondMoment, { rel }, "I");
      expectClose(b.result.beam.length, a.result.beam.length, { rel }, "length");
      a.result.schedules.forEach((s, i) => {
        const t = b.result.schedules[i]!;
        expectClose(Math.max(...t.shearFlow), Math.max(...s.shearFlow), { rel }, `peak q, joint ${s.joint}`);
        expectClose(t.resistance[0]!.value, s.resistance[0]!.value, { rel }, `R, joint ${s.joint}`);
        expect(t.passes).toBe(s.passes);
        // The twin keeps the job's spacing practice (module, zone grid): the same schedule.
        expect(t.count).toBe(s.count);
      });
      a.result.bondLines.forEach((bl, i) => expectClose(b.result.bondLines[i]!.maxStress, bl.maxStress, { rel }, "bond-line stress"));
      a.result.checks.forEach((c, i) => expectClose(b.result.checks[i]!.utilisation, c.utilisation, { rel: 1e-3 }, c.title));
    });
  }

  test("converting there and back returns the numbers as entered", () => {
    const { job } = design(JSON.parse(readFileSync(new URL("workshop-box-beam.si.json", folder), "utf8")));
    const back = convertJob(convertJob(job, "us"), "si");
    expect(back.parts[0]!.shape.type === "rectangle" ? back.parts[0]!.shape.b : NaN).toBe(18);
    expect(back.beam.spans[0]!).toBe(4.8);
    expect(back.units).toBe("si");
  });
});

// The faster answer of POST /api/designs (issue 20: conversion, finite check, fingerprint and encoding) must be
// the same bytes as before: every example and the bench's three-span member, in its own units and in both
// systems, against the path as it was (test/server/reference/). Not a speed test.
import fc from "fast-check";
import { describe, expect, test } from "vitest";
import { threeSpanJob } from "../../bench/three-span-job.js";
import { designMember, DesignResult, JobDocument, prepareJob, type UnitSystem } from "../../core/index.js";
import { unitSystems } from "../../core/units/quantity.js";
import { rescale, roundSignificant, toCoreUnits, toDisplayUnits } from "../../core/units/convert.js";
import { inUnits } from "../../server/design-in-units.js";
import { performTask, utf8Bytes } from "../../server/design-tasks.js";
import { ApiError } from "../../server/errors.js";
import { canonicalJson } from "../../core/canonical-json.js";
import { physicalRangeIssues } from "../../core/physical-ranges.js";
import { exampleJobs } from "../example-jobs.js";
import { mutatedJob } from "./fuzz/payloads.js";
import { answerBefore, answerBeforeFrom } from "./reference/answer-before.js";
import { physicalRangeIssues as rangeIssuesBefore } from "./reference/ranges-before.js";
import { prepareJob as prepareJobBefore } from "./reference/prepare-before.js";
import * as before from "./reference/convert-before.js";

const jobs: [string, unknown][] = [
  ...exampleJobs().map(({ file, job }): [string, unknown] => [file, job]),
  ["three-span asce7-22-allowable", threeSpanJob("asce7-22-allowable")],
  ["three-span en1990-6.10 (factored)", threeSpanJob("en1990-6.10", "factored")],
];

async function answerNow(input: unknown, units?: UnitSystem) {
  try {
    return { bytes: (await performTask({ kind: "result-json", input, units })) as Uint8Array };
  } catch (error) {
    if (!(error instanceof ApiError)) throw error;
    return { error: error.code, issues: error.issues };
  }
}

/** Equal texts, or where they first differ (a deep comparison of 700 kB is too slow to be worth it). */
function sameText(now: string, then: string): void {
  if (now === then) return;
  let i = 0;
  while (now[i] === then[i]) i++;
  expect(now.slice(Math.max(0, i - 80), i + 80), `differs at ${i}`).toBe(then.slice(Math.max(0, i - 80), i + 80));
}
const same = (now: unknown, then: unknown) => sameText(JSON.stringify(now) ?? "", JSON.stringify(then) ?? "");
const text = (bytes: Uint8Array) => Buffer.from(bytes).toString("latin1");

describe("POST /api/designs answers the same bytes as before the speed work", () => {
  for (const [name, input] of jobs) {
    for (const units of [undefined, ...unitSystems]) {
      test(`${name}, ${units ?? "its own units"}`, async () => {
        const now = await answerNow(input, units);
        const then = answerBefore(input, units);
        if ("bytes" in then && "bytes" in now) sameText(text(now.bytes!), text(then.bytes));
        else expect(now).toEqual(then);
      });
    }
  }

  test("a job refused by its checks gives the same issues", async () => {
    const [, input] = jobs[0]!;
    const broken = structuredClone(input) as { parts: { id: string }[]; beam: { spans: number[] } };
    broken.parts[1]!.id = broken.parts[0]!.id;
    expect(await answerNow(broken)).toEqual(answerBefore(broken));
  });
});

describe("a result with a number that is not finite is refused at the same place as before", () => {
  const [, input] = jobs.find(([name]) => name === "workshop-box-beam.si.json")!;
  const prepared = prepareJob(input);
  if (!prepared.ok) throw new Error(JSON.stringify(prepared.issues));
  const refusal = (job: JobDocument, coreJob: JobDocument, core: DesignResult, units?: UnitSystem) => {
    try {
      inUnits(job, coreJob, core, units);
      return null;
    } catch (error) {
      if (!(error instanceof ApiError)) throw error;
      return { error: error.code, issues: error.issues };
    }
  };

  test("one that the design made (a load that overflows, bypassing the checks)", () => {
    const overflow = structuredClone(prepared.core);
    overflow.beam.loads = [{ type: "uniform", category: "dead", face: "top", label: "", w: 1e306 }];
    const core = designMember(overflow);
    for (const units of [undefined, ...unitSystems]) {
      const now = refusal(prepared.job, overflow, core, units);
      expect(now?.error).toBe("ERR_RESULT_NOT_FINITE");
      expect(now).toEqual(answerBeforeFrom(prepared.job, core, units));
    }
  });

  test("one that only the conversion makes (a finite number too large for the other system)", () => {
    const core = designMember(prepared.core);
    core.joints[0]!.flowFactor = 1e308; // ×25.4 in 1/in: beyond the largest double
    const now = refusal(prepared.job, prepared.core, core, "us");
    expect(now?.error).toBe("ERR_RESULT_NOT_FINITE");
    expect(now).toEqual(answerBeforeFrom(prepared.job, core, "us"));
    expect(refusal(prepared.job, prepared.core, core, "si")).toBeNull();
  });
});

describe("the conversion walk gives what the old walk gave", () => {
  for (const [name, input] of jobs) {
    test(`${name}: the result and the job, to and from core units, both systems`, () => {
      const prepared = prepareJob(input);
      if (!prepared.ok) throw new Error(JSON.stringify(prepared.issues));
      const core = designMember(prepared.core);
      for (const system of unitSystems) {
        same(toDisplayUnits(DesignResult, core, system), before.toDisplayUnits(DesignResult, core, system));
        same(toDisplayUnits(JobDocument, prepared.core, system), before.toDisplayUnits(JobDocument, prepared.core, system));
        same(toCoreUnits(JobDocument, prepared.job, system), before.toCoreUnits(JobDocument, prepared.job, system));
        const odd = (v: number, q: string) => v * (q.length + 0.5);
        same(rescale(DesignResult, core, odd), before.rescale(DesignResult, core, odd));
      }
    });
  }

  test("roundSignificant: the same double as before for any double, and near every power of ten", () => {
    const near: number[] = [];
    for (let n = -30; n <= 30; n++) {
      const p = Number(`1e${n}`);
      let up = p;
      let down = p;
      for (let j = 0; j < 40; j++) {
        near.push(up, -up, down, -down, p * (1 + 1e-9), p * (1 - 1e-9), p * (1 + 2e-9), p * (1 - 2e-9));
        up = nextUp(up);
        down = nextDown(down);
      }
    }
    for (const x of near) for (const digits of [6, 9, 12]) expect(Object.is(roundSignificant(x, digits), before.roundSignificant(x, digits)), `${x} to ${digits}`).toBe(true);
    fc.assert(
      fc.property(fc.double(), fc.integer({ min: 1, max: 15 }), (x, digits) => Object.is(roundSignificant(x, digits), before.roundSignificant(x, digits))),
      { numRuns: 20000 },
    );
  });
});

const view = new DataView(new ArrayBuffer(8));
function nextUp(x: number): number {
  view.setFloat64(0, x);
  view.setBigUint64(0, view.getBigUint64(0) + 1n);
  return view.getFloat64(0);
}
function nextDown(x: number): number {
  view.setFloat64(0, x);
  view.setBigUint64(0, view.getBigUint64(0) - 1n);
  return view.getFloat64(0);
}

describe("the physical-range walk finds what the old walk found", () => {
  test("the examples with values broken or bent (fuzz bodies that pass the schema)", () => {
    let compared = 0;
    let withIssues = 0;
    fc.assert(
      fc.property(mutatedJob, ({ job }) => {
        const parsed = JobDocument.safeParse(job);
        if (!parsed.success) return;
        const core = toCoreUnits(JobDocument, parsed.data, parsed.data.units);
        compared++;
        const found = physicalRangeIssues(parsed.data, core);
        if (found.length > 0) withIssues++;
        expect(found).toEqual(rangeIssuesBefore(parsed.data, core));
      }),
      { numRuns: 3000 },
    );
    expect(compared).toBeGreaterThan(300);
    expect(withIssues).toBeGreaterThan(20);
  });
});

describe("prepareJob answers what it answered before", () => {
  test("every example, and the examples with values broken or bent (fuzz bodies)", () => {
    for (const [, input] of jobs) same(prepareJob(input), prepareJobBefore(input));
    let prepared = 0;
    fc.assert(
      fc.property(mutatedJob, ({ job }) => {
        const now = prepareJob(job);
        if (now.ok) prepared++;
        same(now, prepareJobBefore(job));
      }),
      { numRuns: 1000 },
    );
    expect(prepared).toBeGreaterThan(50);
  });
});

describe("the fingerprint's canonical JSON is the old text", () => {
  test("every example as parsed, and any JSON value with undefined fields and array holes", () => {
    for (const [name, input] of jobs) {
      const prepared = prepareJob(input);
      if (!prepared.ok) throw new Error(name);
      expect(canonicalJson({ job: prepared.job, schemaVersion: 1 })).toBe(before.canonicalJson({ job: prepared.job, schemaVersion: 1 }));
    }
    // eslint-disable-next-line no-sparse-arrays
    const odd = { b: [1, , undefined, null, -0, NaN, 1e21, "é\u2028"], a: { "\u0000": 1, z: undefined, "": [{}] }, "10": 2, "9": 3 };
    expect(canonicalJson(odd)).toBe(before.canonicalJson(odd));
    fc.assert(fc.property(fc.anything({ withSparseArray: true, withNullPrototype: true, withDate: true, withMap: true, withSet: true, withBoxedValues: true, withUnicodeString: true }), (v) => canonicalJson(v) === before.canonicalJson(v)), { numRuns: 5000 });
  });
});

describe("an answer's UTF-8 bytes are TextEncoder's", () => {
  const encoder = new TextEncoder();
  const same = (text: string) => Buffer.from(utf8Bytes(text)).equals(Buffer.from(encoder.encode(text)));
  test("short and long texts, beyond ASCII (more than the room kept for it), surrogate pairs and lone surrogates", () => {
    for (const text of ["", "a", "≤", "mm⁴ kN·m", "\u{1F600}", "\ud800", "x\udc00y", "é".repeat(300), "≤".repeat(5000), "a".repeat(100000) + "⁴".repeat(3000)]) {
      expect(same(text), JSON.stringify(text.slice(0, 20))).toBe(true);
    }
    fc.assert(fc.property(fc.string({ unit: "binary", maxLength: 2000 }), same), { numRuns: 3000 });
  });
});

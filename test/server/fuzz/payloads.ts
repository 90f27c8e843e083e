// Generated request bodies for the fuzz tests: mostly the example jobs with a few of their values
// broken or bent (so that validation passes often enough to exercise the engine), also any JSON at
// all, and text that is not JSON.
import fc from "fast-check";
import { exampleJobs } from "../../example-jobs.js";

type Json = null | boolean | number | string | Json[] | { [key: string]: Json };

export const examples: { name: string; job: Json }[] = exampleJobs().map(({ file, job }) => ({ name: file.replace(/\.json$/, ""), job: job as Json }));

/** Every path in a document (objects and arrays too), as keys and indices. */
function pathsOf(value: Json, at: (string | number)[] = [], out: (string | number)[][] = []): (string | number)[][] {
  out.push(at);
  if (Array.isArray(value)) value.forEach((v, i) => pathsOf(v, [...at, i], out));
  else if (value && typeof value === "object") for (const [k, v] of Object.entries(value)) pathsOf(v, [...at, k], out);
  return out;
}

const examplePaths = examples.map(({ job }) => pathsOf(job).filter((p) => p.length > 0));

function nested(depth: number, leaf: Json, asArray: boolean): Json {
  let value = leaf;
  for (let i = 0; i < depth; i++) value = asArray ? [value] : { a: value };
  return value;
}

/** Values a careless or hostile client might put anywhere. */
export const oddValue: fc.Arbitrary<Json> = fc.oneof(
  fc.constantFrom<Json>("NaN", "Infinity", "-Infinity", "1e309", "", " ", "0x10", "1,5", "4.8 m", null, true, false, {}, [], 0, -0, -1, 1e308, -1e308, 5e-324, 1e-300, 1e-12, 1e12, 2 ** 53 + 1),
  fc.double({ noNaN: true, noDefaultInfinity: true }),
  fc.integer({ min: -1e9, max: 1e9 }),
  fc.string({ unit: "binary", maxLength: 40 }),
  fc.string({ unit: "grapheme", maxLength: 40 }),
  fc.constantFrom<Json>("<script>alert(1)</script>", "\"'><img src=x onerror=alert(1)>", "Ünïcödé ✓ 𝄞 漢字 \u202e", "\u0000\u0001\u001f", "\ud800", "../../etc/passwd", "%2e%2e%2f"),
  fc.integer({ min: 1000, max: 200_000 }).map((n) => "x".repeat(n)),
  // At most 800 deep: up to four mutations can nest one such value inside another (a swap copies an ancestor into
  // its own descendant), and the test's own JSON.stringify overflows its stack at about 4,000 levels.
  fc.tuple(fc.integer({ min: 10, max: 800 }), fc.boolean()).map(([depth, asArray]) => nested(depth, 1, asArray)),
  fc.array(fc.double({ noNaN: true, noDefaultInfinity: true }), { minLength: 100, maxLength: 3000 }),
  fc.dictionary(fc.string({ maxLength: 12 }), fc.jsonValue({ maxDepth: 2 }) as fc.Arbitrary<Json>, { maxKeys: 5 }),
  fc.jsonValue({ maxDepth: 3 }) as fc.Arbitrary<Json>,
);

type Mutation =
  | { kind: "set"; pick: number; value: Json }
  | { kind: "delete"; pick: number }
  | { kind: "extra"; pick: number; key: string; value: Json }
  | { kind: "scale"; pick: number; factor: number }
  | { kind: "duplicate"; pick: number }
  | { kind: "swap"; pick: number; other: number };

const mutation: fc.Arbitrary<Mutation> = fc.oneof(
  { weight: 3, arbitrary: fc.record({ kind: fc.constant("set" as const), pick: fc.nat(), value: oddValue }) },
  { weight: 2, arbitrary: fc.record({ kind: fc.constant("delete" as const), pick: fc.nat() }) },
  { weight: 1, arbitrary: fc.record({ kind: fc.constant("extra" as const), pick: fc.nat(), key: fc.oneof(fc.string({ maxLength: 10 }), fc.constantFrom("__proto__", "constructor", "prototype", "toString")), value: oddValue }) },
  {
    weight: 4,
    arbitrary: fc.record({
      kind: fc.constant("scale" as const),
      pick: fc.nat(),
      factor: fc.oneof(fc.constantFrom(0, -1, 0.5, 2, 1e-6, 1e-3, 10, 1e3, 1e6, 1e-300, 1e300), fc.double({ min: 0.2, max: 5, noNaN: true })),
    }),
  },
  { weight: 1, arbitrary: fc.record({ kind: fc.constant("duplicate" as const), pick: fc.nat() }) },
  { weight: 2, arbitrary: fc.record({ kind: fc.constant("swap" as const), pick: fc.nat(), other: fc.nat() }) },
);

function get(root: Json, path: (string | number)[]): Json | undefined {
  let node: Json | undefined = root;
  for (const key of path) {
    if (node === null || typeof node !== "object") return undefined;
    node = (node as Record<string | number, Json>)[key];
  }
  return node;
}

/** Applies one mutation in place; a path that no longer exists (an earlier mutation removed it) is skipped. */
function apply(root: Json, paths: (string | number)[][], m: Mutation): void {
  const path = paths[m.pick % paths.length]!;
  const parent = get(root, path.slice(0, -1));
  const key = path[path.length - 1]!;
  if (parent === null || typeof parent !== "object" || parent === undefined) return;
  const holder = parent as Record<string | number, Json>;
  const current = holder[key];
  if (current === undefined) return;
  switch (m.kind) {
    case "set":
      holder[key] = m.value;
      return;
    case "delete":
      if (Array.isArray(parent)) parent.splice(Number(key), 1);
      else delete holder[key];
      return;
    case "extra":
      if (current && typeof current === "object" && !Array.isArray(current)) Object.defineProperty(current, m.key, { value: m.value, enumerable: true, writable: true, configurable: true });
      else if (Array.isArray(current)) current.push(m.value);
      return;
    case "scale":
      if (typeof current === "number") holder[key] = current * m.factor;
      else if (Array.isArray(current)) holder[key] = current.map((v) => (typeof v === "number" ? v * m.factor : v));
      return;
    case "duplicate":
      if (Array.isArray(parent)) parent.splice(Number(key), 0, structuredClone(current));
      else if (Array.isArray(current) && current.length > 0) current.push(structuredClone(current[current.length - 1]!));
      return;
    case "swap": {
      // Another value of the same example put here: a valid value in the wrong place (ids, enums, numbers).
      const other = get(root, paths[m.other % paths.length]!);
      if (other !== undefined) holder[key] = structuredClone(other);
    }
  }
}

/** An example job with 1 to 4 mutations: often still valid, often wrong at one field. */
export const mutatedJob: fc.Arbitrary<{ example: string; job: Json }> = fc
  .tuple(fc.nat({ max: examples.length - 1 }), fc.array(mutation, { minLength: 1, maxLength: 4 }))
  .map(([index, mutations]) => {
    const job = structuredClone(examples[index]!.job);
    for (const m of mutations) apply(job, examplePaths[index]!, m);
    return { example: examples[index]!.name, job };
  });

/** Only the names people type (project, member, labels) changed: valid jobs with hostile or foreign text. */
export const renamedJob: fc.Arbitrary<{ example: string; job: Json }> = fc
  .tuple(fc.nat({ max: examples.length - 1 }), fc.string({ unit: "binary", maxLength: 60 }), fc.string({ unit: "grapheme", maxLength: 40 }), fc.string({ unit: "binary", maxLength: 120 }))
  .map(([index, name, mark, description]) => {
    const job = structuredClone(examples[index]!.job) as { project: Record<string, Json>; member: Record<string, Json> };
    job.project.name = name;
    job.member.mark = mark.trim() || "M";
    job.member.description = description;
    return { example: examples[index]!.name, job: job as unknown as Json };
  });

/** A request body as text: a job, any JSON value, or text that is not JSON at all. */
export const bodyText: fc.Arbitrary<string> = fc.oneof(
  { weight: 14, arbitrary: mutatedJob.map(({ job }) => JSON.stringify(job)) },
  { weight: 2, arbitrary: fc.jsonValue({ maxDepth: 4 }).map((v) => JSON.stringify(v)) },
  { weight: 1, arbitrary: oddValue.map((v) => JSON.stringify(v)) },
  {
    weight: 2,
    arbitrary: fc.tuple(fc.nat({ max: examples.length - 1 }), fc.constantFrom("NaN", "Infinity", "-Infinity", "1e999", "-0", "0x10", "01", ".5", "1.", "+1", "undefined", "'x'"), fc.nat()).map(([index, token, pick]) => {
      // A number in the example's text replaced by a token JSON does not allow (or allows oddly).
      const text = JSON.stringify(examples[index]!.job);
      const numbers = [...text.matchAll(/:(-?\d+(\.\d+)?)/g)];
      const hit = numbers[pick % numbers.length]!;
      return text.slice(0, hit.index! + 1) + token + text.slice(hit.index! + 1 + hit[1]!.length);
    }),
  },
  { weight: 1, arbitrary: fc.string({ unit: "binary", maxLength: 200 }) },
  { weight: 1, arbitrary: fc.constantFrom("", "{", "[", "{}", "[]", "null", "\ufeff{}", '{"a":1,"a":2}', '{"__proto__":{"polluted":1}}', '{"constructor":{"prototype":{"polluted":1}}}') },
);

/** Spacings and positions at the edges of what a number can be, and around what a schedule can hold. */
const extremeNumber: fc.Arbitrary<Json> = fc.oneof(
  fc.constantFrom<Json>(1e-300, 5e-324, -0, 0, -1, 1e300, 1e-6, 1e-4, 1e-3, 0.05, 0.5, 2 ** 53, Number.MAX_VALUE, "NaN", null),
  fc.double({ min: 10, max: 400, noNaN: true }),
);

/** Examples whose joints are nailed, screwed or bolted (not glued or welded) in SI or US units. */
const discreteExamples = examples.filter(({ job }) => {
  const connectors = (job as { connectors?: { kind?: string }[] }).connectors ?? [];
  return connectors.length > 0 && connectors.every((c) => c.kind !== "glue" && c.kind !== "fillet-weld" && c.kind !== "weld");
});

/**
 * A check-mode job: an example with the schedule to check given in `fastening.default.provided`, as zones
 * from end to end (their spacings, and sometimes their ends, at the extremes) or as row positions.
 */
export const checkModeJob: fc.Arbitrary<{ example: string; job: Json }> = fc
  .tuple(
    fc.nat({ max: Math.max(0, discreteExamples.length - 1) }),
    fc.boolean(),
    fc.array(fc.oneof({ weight: 3, arbitrary: fc.double({ min: 20, max: 300, noNaN: true }) as fc.Arbitrary<Json> }, { weight: 2, arbitrary: extremeNumber }), { minLength: 1, maxLength: 4 }),
    fc.array(fc.oneof({ weight: 4, arbitrary: fc.double({ min: 0, max: 1, noNaN: true }) as fc.Arbitrary<Json> }, { weight: 1, arbitrary: extremeNumber }), { minLength: 1, maxLength: 40 }),
    fc.option(extremeNumber, { nil: undefined }),
  )
  .map(([index, zoned, spacings, fractions, end]) => {
    const { name, job: original } = discreteExamples[index]!;
    const job = structuredClone(original) as { mode?: string; beam: { spans: number[] }; fastening: { default: Record<string, Json>; joints?: Json[] } };
    const length = job.beam.spans.reduce((s, l) => s + l, 0);
    job.mode = "check";
    if (zoned) {
      const n = spacings.length;
      job.fastening.default.provided = {
        type: "zones",
        zones: spacings.map((spacing, i) => ({ from: (length * i) / n, to: i === n - 1 && end !== undefined ? end : (length * (i + 1)) / n, spacing })),
      };
    } else {
      const positions = fractions.map((f) => (typeof f === "number" && f >= 0 && f <= 1 ? f * length : f)).sort((a, b) => (typeof a === "number" && typeof b === "number" ? a - b : 0));
      job.fastening.default.provided = { type: "positions", positions };
    }
    // Joints of their own fastening would need their own schedules: the default fastens every joint here.
    job.fastening.joints = [];
    return { example: name, job: job as unknown as Json };
  });

import { readFileSync, readdirSync } from "node:fs";
import { prepareJob } from "../../../core/check-job.js";
import { designMember } from "../../../core/design-member.js";
import { physicalRanges } from "../../../core/physical-ranges.js";
import { fromCore, type UnitSystem } from "../../../core/units/quantity.js";
import { nailedIJob, plankIJob } from "../../job-builders.js";

export const EXTREMES = [1e-300, 1e300, 5e-324, -0] as const;

/** The ends of a field's physical range in the job's units, where it has one (`pattern`: indices as `[]`). */
export function rangeEnds(pattern: string, units: UnitSystem): number[] {
  const r = physicalRanges[pattern];
  if (!r) return [];
  const inJob = (v: number) => (r.quantity ? fromCore(v, r.quantity, units) : v);
  return [inJob(r.lo), inJob(r.hi), ...(r.lo === 0 ? [-inJob(r.hi)] : [])];
}

const folder = new URL("../../../fixtures/examples/", import.meta.url);

/** The examples, and check-mode jobs with provided zones and positions. */
export function extremeBaseJobs(): { name: string; input: unknown }[] {
  const examples = readdirSync(folder)
    .filter((f) => f.endsWith(".json"))
    .map((file) => ({ name: file, input: JSON.parse(readFileSync(new URL(file, folder), "utf8")) as unknown }));
  const positions = nailedIJob("rigid", "check");
  positions.fastening.default.provided = { type: "positions", positions: [0.05, 0.5, 1, 2, 2.5, 3, 4, 4.95] };
  const plank = plankIJob();
  plank.parts[2]!.extent = { from: 0.5, to: 3.5 };
  plank.beam.loads.push({ type: "linear", category: "live", wStart: 0.1, wEnd: 0.3, from: 0.5, to: 2 }, { type: "point", category: "live", P: 0.2, at: 1 }, { type: "moment", category: "live", M: 0.1, at: 3 });
  return [
    ...examples,
    { name: "nailed I, check zones, slip-aware", input: nailedIJob("slip-aware", "check") },
    { name: "nailed I, check positions", input: positions },
    { name: "plank I with extent and loads of every type", input: plank },
  ];
}

/** Paths of every number in a document, as arrays of keys. */
export function numberPaths(x: unknown, path: (string | number)[] = [], out: (string | number)[][] = []): (string | number)[][] {
  if (typeof x === "number") out.push(path);
  else if (Array.isArray(x)) x.forEach((v, i) => numberPaths(v, [...path, i], out));
  else if (x && typeof x === "object") for (const [k, v] of Object.entries(x)) numberPaths(v, [...path, k], out);
  return out;
}

export const pathText = (path: (string | number)[]) => path.map((k, i) => (typeof k === "number" ? `[${k}]` : i === 0 ? k : `.${k}`)).join("");

export function withValue(input: unknown, path: (string | number)[], value: number): unknown {
  const doc = structuredClone(input);
  let node = doc as Record<string | number, unknown>;
  for (const key of path.slice(0, -1)) node = node[key] as Record<string | number, unknown>;
  node[path[path.length - 1]!] = value;
  return doc;
}

/** The first number in a value that is not finite, with its path; null when every number is finite. */
export function firstNonFinite(x: unknown, path = ""): string | null {
  if (typeof x === "number") return Number.isFinite(x) ? null : `${path || "(result)"} = ${x}`;
  if (Array.isArray(x)) {
    for (let i = 0; i < x.length; i++) {
      const found = firstNonFinite(x[i], `${path}[${i}]`);
      if (found) return found;
    }
    return null;
  }
  if (x && typeof x === "object") {
    for (const [k, v] of Object.entries(x)) {
      const found = firstNonFinite(v, path ? `${path}.${k}` : k);
      if (found) return found;
    }
  }
  return null;
}

/**
 * What one job with one number at an extreme gives: refused at the field (or anywhere, with `anyRefusal`:
 * a value inside its range may break another rule, such as parts that no longer touch), a finite result,
 * or a fault.
 */
export function outcome(input: unknown, field: string, anyRefusal = false): { ok: true } | { ok: false; fault: string } {
  let prepared;
  try {
    prepared = prepareJob(input);
  } catch (error) {
    return { ok: false, fault: `prepareJob threw: ${(error as Error).message}` };
  }
  if (!prepared.ok) {
    // The field itself, a list or object that holds it (a sum of spans), or a field beside it that a cross-field rule names.
    const parent = field.replace(/(\.[^.[\]]+|\[\d+\])$/, "");
    const named = prepared.issues.some((i) => i.path === field || field.startsWith(`${i.path}.`) || field.startsWith(`${i.path}[`) || i.path.startsWith(field) || i.path.startsWith(`${parent}.`));
    return named || anyRefusal ? { ok: true } : { ok: false, fault: `refused without naming ${field}: ${JSON.stringify(prepared.issues.slice(0, 3))}` };
  }
  let result;
  try {
    result = designMember(prepared.core);
  } catch (error) {
    return { ok: false, fault: `designMember threw: ${(error as Error).message}` };
  }
  const bad = firstNonFinite(result);
  if (bad) return { ok: false, fault: `result holds ${bad} (passes: ${result.status.passes})` };
  return { ok: true };
}

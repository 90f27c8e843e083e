import { loadCategories } from "../schema/beam.js";
import type { JobIssue } from "../schema/job-issues.js";
import type { JobDocument } from "../schema/job.js";
import { instability } from "./beam-model.js";

/** Cross-field checks of the beam, its loads and its combinations, in the job's own units. */
export function beamIssues(job: JobDocument): JobIssue[] {
  const issues: JobIssue[] = [];
  const add = (path: string, message: string) => issues.push({ path, message });
  const { beam, combinations } = job;
  const spanUnit = job.units === "si" ? "m" : "ft";
  const L = beam.spans.reduce((s, l) => s + l, 0);
  const round = (x: number) => Number(x.toPrecision(4));
  // Positions are compared with the member's length to a relative 1e-9: a sum of converted spans may round below a position at its end.

  const longest = Math.max(...beam.spans);
  beam.spans.forEach((l, i) => {
    if (l < 1e-3 * longest) add(`beam.spans[${i}]`, `${l} ${spanUnit} is less than 1/1000 of the longest span (${round(longest)} ${spanUnit}); so short a span adds only numerical error: join it to its neighbour`);
  });
  if (beam.supports) {
    if (beam.supports.length !== beam.spans.length + 1) {
      add("beam.supports", `lists ${beam.supports.length} support(s), but ${beam.spans.length} span(s) have ${beam.spans.length + 1} ends; give pinned, roller, fixed or free for each end, left to right`);
    } else {
      const why = instability(beam.supports);
      if (why) add("beam.supports", `the member ${why}`);
    }
  }

  const builtIn = new Set<string>(loadCategories);
  const own = new Map<string, number>();
  beam.categories.forEach((c, i) => {
    if (builtIn.has(c.id)) add(`beam.categories[${i}].id`, `"${c.id}" is a built-in category; give your own category another name`);
    else if (own.has(c.id)) add(`beam.categories[${i}].id`, `"${c.id}" is already the id of beam.categories[${own.get(c.id)}]`);
    else own.set(c.id, i);
  });
  const known = new Set<string>([...builtIn, ...own.keys()]);
  const knownList = [...known].join(", ");
  const checkCategory = (path: string, id: string) => {
    if (!known.has(id)) add(path, `"${id}" is not a load category: use one of ${knownList}, or define it in beam.categories`);
  };

  beam.loads.forEach((load, i) => {
    const path = `beam.loads[${i}]`;
    checkCategory(`${path}.category`, load.category);
    const beyond = (x: number) => `${x} ${spanUnit} is beyond the end of the member (length ${round(L)} ${spanUnit})`;
    if (load.type === "point" || load.type === "moment") {
      if (load.at > L * (1 + 1e-9)) add(`${path}.at`, beyond(load.at));
    } else {
      const from = load.from ?? 0;
      const to = load.to ?? L;
      if (from > L * (1 + 1e-9)) add(`${path}.from`, beyond(from));
      else if (to > L * (1 + 1e-9)) add(`${path}.to`, beyond(to));
      else if (from >= to) add(`${path}.from`, `the loaded length must start before it ends (from ${from} to ${to} ${spanUnit})`);
    }
  });
  beam.patternedCategories.forEach((c, i) => checkCategory(`beam.patternedCategories[${i}]`, c));
  beam.deflectionLimits.liveCategories.forEach((c, i) => checkCategory(`beam.deflectionLimits.liveCategories[${i}]`, c));

  const set = combinations.set;
  if (job.basis === "allowable" && (set === "asce7-22-strength" || set === "en1990-6.10")) {
    add("combinations.set", `"${set}" gives factored (strength) loads, but the job's basis is "allowable"; use "asce7-22-allowable" or set basis to "factored"`);
  }
  if (job.basis === "factored" && set === "asce7-22-allowable") {
    add("combinations.set", `"asce7-22-allowable" gives service loads for allowable stress design, but the job's basis is "factored"; use "asce7-22-strength" or "en1990-6.10", or set basis to "allowable"`);
  }
  if (set === "custom" && (combinations.custom ?? []).length === 0) add("combinations.custom", `is required when set is "custom": list the combinations, each with its factors by load category`);
  if (set !== "custom" && combinations.custom !== undefined) add("combinations.custom", `is only used when set is "custom" (set is "${set}")`);
  if (set !== "en1990-6.10" && combinations.psi0 !== undefined) add("combinations.psi0", `is only used when set is "en1990-6.10" (set is "${set}")`);
  for (const id of Object.keys(combinations.psi0 ?? {})) checkCategory(`combinations.psi0.${id}`, id);
  const ids = new Map<string, number>();
  (combinations.custom ?? []).forEach((c, i) => {
    const path = `combinations.custom[${i}]`;
    if (ids.has(c.id)) add(`${path}.id`, `"${c.id}" is already the id of combinations.custom[${ids.get(c.id)}]`);
    else ids.set(c.id, i);
    for (const id of Object.keys(c.factors)) checkCategory(`${path}.factors.${id}`, id);
    if (!Object.values(c.factors).some((f) => f > 0)) add(`${path}.factors`, "needs at least one category with a factor above 0");
  });
  return issues;
}

import { describe, expect, test } from "vitest";
import { prepareJob } from "../../../core/check-job.js";
import type { JobInput } from "../../../core/schema/job.js";
import { clone, plankIJob } from "../../job-builders.js";

type Edit = (job: JobInput & { beam: Record<string, unknown>; combinations?: Record<string, unknown> }) => void;

function issuesOf(edit: Edit) {
  const job = clone(plankIJob()) as Parameters<Edit>[0];
  edit(job);
  const prepared = prepareJob(job);
  return prepared.ok ? [] : prepared.issues;
}

describe("prepareJob refuses a beam that makes no physical sense, naming the field", () => {
  const cases: [string, Edit, string, RegExp][] = [
    ["a zero span", (j) => void (j.beam.spans = [0]), "beam.spans[0]", /greater than 0/],
    ["a negative span", (j) => void (j.beam.spans = [4, -1]), "beam.spans[1]", /greater than 0/],
    ["no span at all", (j) => void (j.beam.spans = []), "beam.spans", /at least one span/],
    ["a span under 1/1000 of the longest", (j) => void ((j.beam.spans = [4, 0.002]), (j.beam.supports = ["pinned", "roller", "roller"])), "beam.spans[1]", /less than 1\/1000 of the longest span \(4 m\)/],
    ["no supports", (j) => void (j.beam.supports = ["free", "free"]), "beam.supports", /has no supports/],
    ["a single roller", (j) => void (j.beam.supports = ["roller", "free"]), "beam.supports", /mechanism/],
    ["one pin under two spans with free ends", (j) => void ((j.beam.spans = [4, 2]), (j.beam.supports = ["free", "pinned", "free"])), "beam.supports", /mechanism: one pinned or roller support lets the member rotate about it/],
    ["the wrong number of supports", (j) => void (j.beam.supports = ["pinned", "roller", "roller"]), "beam.supports", /lists 3 support\(s\), but 1 span\(s\) have 2 ends/],
    ["an unknown support kind", (j) => void (j.beam.supports = ["pinned", "hinge" as "pinned"]), "beam.supports[1]", /must be one of: "pinned", "roller", "fixed", "free"/],
    ["a point load beyond the end", (j) => void (j.beam.loads = [{ type: "point", category: "live", P: 1, at: 4.5 }]), "beam.loads[0].at", /4\.5 m is beyond the end of the member \(length 4 m\)/],
    ["a couple beyond the end", (j) => void (j.beam.loads = [{ type: "moment", category: "live", M: 1, at: 5 }]), "beam.loads[0].at", /beyond the end/],
    ["a linear load ending beyond the end", (j) => void (j.beam.loads = [{ type: "linear", category: "live", wStart: 1, wEnd: 2, from: 1, to: 6 }]), "beam.loads[0].to", /6 m is beyond the end/],
    ["a uniform load starting beyond the end", (j) => void (j.beam.loads = [{ type: "uniform", category: "live", w: 1, from: 5 }]), "beam.loads[0].from", /5 m is beyond the end/],
    ["a loaded length that ends before it starts", (j) => void (j.beam.loads = [{ type: "uniform", category: "live", w: 1, from: 3, to: 2 }]), "beam.loads[0].from", /must start before it ends/],
    ["a load of an unknown category", (j) => void (j.beam.loads = [{ type: "uniform", category: "crane", w: 1 }]), "beam.loads[0].category", /"crane" is not a load category: use one of dead, live, roof-live, snow, wind/],
    ["a category of the job's own named like a built-in one", (j) => void (j.beam.categories = [{ id: "snow", actsAs: "snow" }]), "beam.categories[0].id", /is a built-in category/],
    ["an unknown category in a custom combination", (j) => void (j.combinations = { set: "custom", custom: [{ id: "C1", factors: { dead: 1.2, snwo: 1.6 } }] }), "combinations.custom[0].factors.snwo", /"snwo" is not a load category/],
    ["a negative factor", (j) => void (j.combinations = { set: "custom", custom: [{ id: "C1", factors: { dead: -1 } }] }), "combinations.custom[0].factors.dead", /must be at least 0 \(got -1\)/],
    ["a custom set with no combinations", (j) => void (j.combinations = { set: "custom" }), "combinations.custom", /is required when set is "custom"/],
    ["strength combinations on the allowable basis", (j) => void (j.combinations = { set: "asce7-22-strength" }), "combinations.set", /gives factored \(strength\) loads, but the job's basis is "allowable"/],
    ["an unknown category among the patterned ones", (j) => void (j.beam.patternedCategories = ["lve"]), "beam.patternedCategories[0]", /"lve" is not a load category/],
    ["an unknown category under the live deflection limit", (j) => void (j.beam.deflectionLimits = { liveCategories: ["floor"] }), "beam.deflectionLimits.liveCategories[0]", /"floor" is not a load category/],
  ];
  for (const [what, edit, path, message] of cases) {
    test(`${what}: an issue at ${path}`, () => {
      const issues = issuesOf(edit);
      const issue = issues.find((i) => i.path === path);
      expect(issue, JSON.stringify(issues)).toBeDefined();
      expect(issue!.message).toMatch(message);
    });
  }

  test("a continuous member with an overhang, a cantilever and a propped cantilever are accepted", () => {
    for (const [spans, supports] of [
      [[4, 4, 1], ["pinned", "roller", "roller", "free"]],
      [[2], ["fixed", "free"]],
      [[4], ["fixed", "roller"]],
      [[1, 3, 1], ["free", "pinned", "roller", "free"]],
    ] as const) {
      expect(issuesOf((j) => void ((j.beam.spans = [...spans]), (j.beam.supports = [...supports])))).toEqual([]);
    }
  });

  test("a job written before supports existed stays a simple span", () => {
    const prepared = prepareJob(plankIJob());
    expect(prepared.ok).toBe(true);
    if (prepared.ok) expect(prepared.core.beam.supports).toBeUndefined();
  });
});

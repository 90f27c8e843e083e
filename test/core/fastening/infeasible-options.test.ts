import { describe, expect, test } from "vitest";
import { prepareJob } from "../../../core/check-job.js";
import { designMember } from "../../../core/design-member.js";
import { largerNailSizes } from "../../../core/connector/timber/fastener-sizes.js";
import { boltedPlates } from "../connector/connector-jobs.js";

const run = (job: ReturnType<typeof boltedPlates>) => {
  const p = prepareJob(job);
  if (!p.ok) throw new Error(JSON.stringify(p.issues));
  return designMember(p.core);
};

describe("options when no spacing carries the flow", () => {
  test("larger nail sizes of the same type come in order of diameter (NDS-2018 Table L4 sizes)", () => {
    expect(largerNailSizes("16d common")).toEqual(["20d common", "30d common", "40d common", "50d common", "60d common"]);
    expect(largerNailSizes("8d box")[0]).toBe("10d box");
    expect(largerNailSizes("no such nail")).toEqual([]);
  });

  test("an overloaded plate bolted with 5/8 in bolts names the next bolt size that carries it", () => {
    const job = boltedPlates({ kind: "steel-bolt", standard: "AISC-360-16", size: "5/8", grade: "A" }, "us", 1);
    job.beam.loads = [{ type: "uniform", category: "dead", w: 2200 }];
    const schedule = run(job).schedules[0]!;
    expect(schedule.infeasible).not.toBeNull();
    const option = schedule.infeasible!.options.find((o) => o.startsWith("The next larger size"));
    expect(option, schedule.infeasible!.options.join("\n")).toMatch(/(3\/4|7\/8|1) in/);
  });
});

import type { Combination } from "../schema/result.js";
import { loadCategories, type JobDocument } from "../schema/job.js";

/** The load combinations of the job's set. "unfactored": every load as entered, factor 1. */
export function combinationsOf(job: JobDocument): Combination[] {
  const present = new Set<string>(job.beam.loads.map((l) => l.category));
  if (job.beam.selfWeight) present.add("dead");
  switch (job.combinations.set) {
    case "unfactored":
      return [
        {
          id: "U",
          name: "Loads as entered",
          factors: Object.fromEntries(loadCategories.map((c) => [c, 1])),
          duration: "unspecified",
          categories: loadCategories.filter((c) => present.has(c)),
        },
      ];
  }
}

import { createHash } from "node:crypto";
import { designInUnits } from "../../server/design-in-units.js";
import { exampleJobs } from "../example-jobs.js";

/** sha256 over every example's answer in its own units and in the other system, the last of `rounds` runs. */
export function examplesDigest(rounds: number): string {
  const jobs = exampleJobs().map(({ job }) => job as { units: "si" | "us" });
  const hash = createHash("sha256");
  for (const job of jobs) {
    for (const units of [job.units, job.units === "si" ? "us" : "si"] as const) {
      let text = "";
      for (let i = 0; i < rounds; i++) text = JSON.stringify(designInUnits(job, units).shown);
      hash.update(text);
    }
  }
  return hash.digest("hex");
}

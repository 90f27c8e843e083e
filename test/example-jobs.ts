import { readdirSync, readFileSync } from "node:fs";

const folder = new URL("../fixtures/examples/", import.meta.url);

/** Every example job document of fixtures/examples, parsed, in file-name order; `file` keeps the `.json`. */
export function exampleJobs(): { file: string; job: unknown }[] {
  return readdirSync(folder)
    .filter((f) => f.endsWith(".json"))
    .sort()
    .map((file) => ({ file, job: JSON.parse(readFileSync(new URL(file, folder), "utf8")) as unknown }));
}

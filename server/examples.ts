import { readdirSync, readFileSync } from "node:fs";
import { join } from "node:path";

export interface Example {
  id: string;
  title: string;
  units: string;
  document: unknown;
}

/** Example jobs: every `*.json` in the folder, sorted by file name; the id is the file name without `.json`. */
export function loadExamples(folder: string): Example[] {
  return readdirSync(folder)
    .filter((f) => f.endsWith(".json"))
    .sort()
    .map((file) => {
      const document = JSON.parse(readFileSync(join(folder, file), "utf8")) as { project?: { name?: string }; member?: { mark?: string; description?: string }; units?: string };
      const title = [document.member?.mark, document.member?.description].filter(Boolean).join(": ") || document.project?.name || file;
      return { id: file.replace(/\.json$/, ""), title, units: document.units ?? "", document };
    });
}

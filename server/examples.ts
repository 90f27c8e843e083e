import { readdirSync, readFileSync } from "node:fs";
import { join } from "node:path";

export interface Example {
  id: string;
  title: string;
  units: string;
  document: unknown;
}

/** The example the page opens with: the plainest member (a nailed box beam on one span), listed first. */
export const OPENING_EXAMPLE = "workshop-box-beam.si";

/**
 * Example jobs: every `*.json` in the folder, the opening example first and the others by file name;
 * the id is the file name without `.json`.
 */
export function loadExamples(folder: string): Example[] {
  const opening = `${OPENING_EXAMPLE}.json`;
  return readdirSync(folder)
    .filter((f) => f.endsWith(".json"))
    .sort((a, b) => (a === opening ? -1 : b === opening ? 1 : a < b ? -1 : a > b ? 1 : 0))
    .map((file) => {
      const document = JSON.parse(readFileSync(join(folder, file), "utf8")) as { project?: { name?: string }; member?: { mark?: string; description?: string }; units?: string };
      const title = [document.member?.mark, document.member?.description].filter(Boolean).join(": ") || document.project?.name || file;
      return { id: file.replace(/\.json$/, ""), title, units: document.units ?? "", document };
    });
}

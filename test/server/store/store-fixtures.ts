import { mkdtempSync, readFileSync, rmSync } from "node:fs";
import { createRequire } from "node:module";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { pathToFileURL } from "node:url";

export const EXAMPLES = join(import.meta.dirname, "../../../fixtures/examples");

/** An example job document as a fresh object, loosely typed so that tests can break it on purpose. */
// eslint-disable-next-line @typescript-eslint/no-explicit-any
export function example(name: "loft-beam-16d.us" | "workshop-box-beam.si" | "glued-lintel.si"): any {
  return JSON.parse(readFileSync(join(EXAMPLES, `${name}.json`), "utf8"));
}

/** A temporary folder removed by the returned function. */
export function tempFolder(prefix: string): { dir: string; remove: () => void } {
  const dir = mkdtempSync(join(tmpdir(), `stitchplan-${prefix}-`));
  return { dir, remove: () => rmSync(dir, { recursive: true, force: true }) };
}

/** Arguments that make `node` run a TypeScript file (the tsx loader, by absolute URL). */
export function tsNodeArgs(script: string): string[] {
  const loader = pathToFileURL(createRequire(import.meta.url).resolve("tsx")).href;
  return ["--import", loader, script];
}

/** A clock that starts at a fixed instant and moves one second per call. */
export function steppingClock(start = "2025-03-14T09:00:00.000Z"): () => Date {
  let t = Date.parse(start);
  return () => new Date((t += 1000));
}

import { readdir, stat } from "node:fs/promises";
import { basename, join, resolve } from "node:path";
import type { JobIssue } from "../../core/index.js";

export interface CollectedFiles {
  files: string[];
  /** Command-line paths that give no job file, each with the reason. */
  problems: { file: string; problems: JobIssue[] }[];
}

/** Result files a batch writes (`*.result.json`) are not job files, so an output folder can be read back without tripping over them. */
const isJobFile = (name: string) => name.endsWith(".json") && !name.endsWith(".result.json") && !name.startsWith(".");

const notRegular = { path: "(file)", message: "is not a regular file (a pipe, socket or device); skipped" };

/** Expands the command line's files and folders (the `*.json` directly inside, by name) into job files, each once. */
export async function collectJobFiles(paths: string[]): Promise<CollectedFiles> {
  const files: string[] = [];
  const problems: CollectedFiles["problems"] = [];
  const seen = new Set<string>();
  const add = (file: string) => {
    const key = resolve(file);
    if (!seen.has(key)) {
      seen.add(key);
      files.push(file);
    }
  };
  for (const path of paths) {
    let info;
    try {
      info = await stat(path);
    } catch (error) {
      const code = (error as NodeJS.ErrnoException).code;
      problems.push({ file: path, problems: [{ path: "(file)", message: code === "ENOENT" ? "does not exist" : `cannot be read (${code ?? String(error)})` }] });
      continue;
    }
    if (!info.isDirectory()) {
      if (info.isFile()) add(path);
      else problems.push({ file: path, problems: [notRegular] });
      continue;
    }
    const names = (await readdir(path)).filter(isJobFile).sort();
    if (names.length === 0) problems.push({ file: path, problems: [{ path: "(folder)", message: "holds no job files (*.json)" }] });
    for (const name of names) {
      const file = join(path, name);
      // A pipe or device named *.json would block the batch on its read.
      const entry = await stat(file).catch(() => null);
      if (entry?.isFile()) add(file);
      else problems.push({ file, problems: [entry ? notRegular : { path: "(file)", message: "cannot be read (a broken link?); skipped" }] });
    }
  }
  return { files, problems };
}

/** Output base names from the job files' names; a name met twice (same file name in two folders) gets -2, -3… */
export function outputNames(files: string[]): string[] {
  const used = new Map<string, number>();
  return files.map((file) => {
    const name = basename(file).replace(/\.json$/i, "") || "job";
    const n = (used.get(name.toLowerCase()) ?? 0) + 1;
    used.set(name.toLowerCase(), n);
    return n === 1 ? name : `${name}-${n}`;
  });
}

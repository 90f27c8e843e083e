import type { UnitSystem } from "../../core/units/quantity.js";
import { pathInWords } from "./form/issue-words.js";
import { listAt, readAt, writeAt } from "./job-path.js";

/** The job document as the user is editing it: it may be incomplete or wrong anywhere. */
export type JobDraft = Record<string, unknown>;

/** "field": one value changed in place; "structure": rows added, removed or changed kind; "replace": a new document. */
export type JobChange = "field" | "structure" | "replace";

/** The page's one copy of the job. Every edit goes through here, so nothing the user typed is dropped. */
export class JobState {
  #job: JobDraft;
  readonly #listeners: ((change: JobChange, path: string) => void)[] = [];

  constructor(job: JobDraft) {
    this.#job = job;
  }

  get job(): JobDraft {
    return this.#job;
  }

  get units(): UnitSystem {
    return this.#job.units === "us" ? "us" : "si";
  }

  read(path: string): unknown {
    return readAt(this.#job, path);
  }

  list(path: string): unknown[] {
    return listAt(this.#job, path);
  }

  set(path: string, value: unknown): void {
    writeAt(this.#job, path, value);
    this.#emit("field", path);
  }

  /** Puts `item` into the list at `index` (the end when absent). */
  insert(listPath: string, item: unknown, index?: number): number {
    const list = [...this.list(listPath)];
    const at = index ?? list.length;
    list.splice(at, 0, item);
    writeAt(this.#job, listPath, list);
    this.#emit("structure", listPath);
    return at;
  }

  remove(listPath: string, index: number): void {
    const list = this.list(listPath).filter((_, i) => i !== index);
    writeAt(this.#job, listPath, list);
    this.#emit("structure", listPath);
  }

  /** Replaces one item whole, e.g. a load switched from uniform to point. */
  replaceItem(path: string, item: unknown): void {
    writeAt(this.#job, path, item);
    this.#emit("structure", path);
  }

  replaceAll(job: JobDraft): void {
    this.#job = job;
    this.#emit("replace", "");
  }

  onChange(listener: (change: JobChange, path: string) => void): void {
    this.#listeners.push(listener);
  }

  #emit(change: JobChange, path: string): void {
    for (const listener of this.#listeners) listener(change, path);
  }
}

const lists = ["materials", "parts", "connectors", "beam.loads", "beam.spans", "fastening.joints", "compression.loads"];
const records = ["project", "member", "beam", "fastening", "fastening.default", "spacing", "combinations", "compression"];

/**
 * Whether a parsed file can be opened in the form: a stitchplan job whose lists are lists and whose
 * groups are objects. Wrong values inside are fine; the service reports them at their fields.
 */
export function openableJob(value: unknown): { ok: true; job: JobDraft } | { ok: false; problems: string[] } {
  if (typeof value !== "object" || value === null || Array.isArray(value)) return { ok: false, problems: ["the file does not hold a JSON object"] };
  const job = value as JobDraft;
  if (job.format !== "stitchplan-job") return { ok: false, problems: [`this is not a stitchplan job file (its "format" is ${JSON.stringify(job.format ?? null)}, not "stitchplan-job")`] };
  const problems: string[] = [];
  // In the form's words, with the file's own key for whoever edits the file by hand.
  const named = (path: string) => `${pathInWords(path)} (“${path}” in the file)`;
  for (const path of lists) {
    const v = readAt(job, path);
    if (v !== undefined && !Array.isArray(v)) problems.push(`${named(path)} must be a list of entries in brackets […]`);
    else if (path !== "beam.spans" && Array.isArray(v) && v.some((item) => typeof item !== "object" || item === null || Array.isArray(item))) problems.push(`each entry of ${named(path)} must be a group of fields in braces {…}, not a single value`);
  }
  for (const path of records) {
    const v = readAt(job, path);
    if (v !== undefined && (typeof v !== "object" || v === null || Array.isArray(v))) problems.push(`${named(path)} must be a group of fields in braces {…}, not a single value`);
  }
  return problems.length ? { ok: false, problems } : { ok: true, job };
}

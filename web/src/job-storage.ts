import { openableJob, type JobDraft } from "./job-state.js";

const KEY = "stitchplan.job";

/** The job last edited in this browser, if there is a usable one. */
export function storedJob(): JobDraft | null {
  try {
    const text = localStorage.getItem(KEY);
    if (!text) return null;
    const opened = openableJob(JSON.parse(text));
    return opened.ok ? opened.job : null;
  } catch {
    return null;
  }
}

/** Keeps the job across reloads; a full or blocked storage only costs that. */
export function storeJob(job: JobDraft): boolean {
  try {
    localStorage.setItem(KEY, JSON.stringify(job));
    return true;
  } catch {
    return false;
  }
}

import { fetchExample, fetchExamples, fetchJobSchema, type ExampleEntry } from "./api.js";
import { DesignSession } from "./design-session.js";
import { el } from "./dom.js";
import { JobSchema } from "./job-schema.js";
import { storedJob } from "./job-storage.js";
import { openableJob, type JobDraft } from "./job-state.js";
import { toolbar } from "./toolbar.js";

/** A job with nothing entered, for when no example can be fetched. */
const emptyJob = (): JobDraft => ({
  format: "stitchplan-job",
  version: 1,
  units: "si",
  basis: "allowable",
  project: { name: "" },
  member: { mark: "" },
  materials: [],
  parts: [],
  connectors: [],
  fastening: { default: { connector: "", rows: 1 } },
  beam: { spans: [], loads: [] },
});

interface Start {
  job: JobDraft;
  example?: string;
  note?: string;
}

async function startingJob(examples: ExampleEntry[]): Promise<Start> {
  const wanted = new URLSearchParams(location.search).get("example");
  if (!wanted) {
    const stored = storedJob();
    if (stored) return { job: stored, note: "Restored the job you were working on in this browser. Use “Start from example” to begin again." };
  }
  const id = wanted ?? examples[0]?.id;
  if (!id) return { job: emptyJob(), note: "No example jobs are available; enter a member from scratch or open a job file." };
  const opened = openableJob(await fetchExample(id));
  return opened.ok ? { job: opened.job, example: id } : { job: emptyJob(), note: `The example “${id}” could not be opened.` };
}

async function boot(): Promise<void> {
  const formRoot = document.getElementById("job-form")!;
  const resultsRoot = document.getElementById("results")!;
  const identity = document.getElementById("job-identity")!;
  let examples: ExampleEntry[] = [];
  let problem: string | undefined;
  const schemaAnswer = fetchJobSchema().catch(() => null);
  try {
    examples = await fetchExamples();
  } catch (error) {
    problem = `The example list could not be loaded (${(error as Error).message}).`;
  }
  const schema = new JobSchema(await schemaAnswer);
  let start: Start;
  try {
    start = await startingJob(examples);
  } catch (error) {
    start = { job: storedJob() ?? emptyJob(), note: `The example could not be loaded (${(error as Error).message}).` };
  }

  const session = new DesignSession(formRoot, resultsRoot, start.job, schema);
  // The job now lives in this browser; without this a reload would load the example over the user's edits.
  if (location.search) history.replaceState(null, "", location.pathname);
  const bar = toolbar(session, examples, start.example);
  document.getElementById("toolbar")!.append(bar);
  const note = [problem, start.note].filter(Boolean).join(" ");
  if (note) bar.querySelector(".toolbar-message")!.textContent = note;

  const showIdentity = () => {
    const job = session.state.job as { project?: { name?: unknown }; member?: { mark?: unknown; revision?: unknown } };
    const parts = [job.project?.name, job.member?.mark, job.member?.revision ? `rev ${String(job.member.revision)}` : ""].filter((p) => typeof p === "string" && p !== "");
    identity.textContent = parts.join(" · ");
  };
  showIdentity();
  session.state.onChange(showIdentity);
  await session.designNow();
}

boot().catch((error: unknown) => {
  document.body.append(el("p", { className: "boot-failure", text: `The page could not start: ${(error as Error).message}. Reload to try again; a job you were editing is kept in this browser.` }));
});

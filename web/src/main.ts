import "./strict-policy.js";
import { fetchExample, fetchExamples, fetchJobSchema, type ExampleEntry } from "./api.js";
import { DesignSession } from "./design-session.js";
import { el } from "./dom.js";
import { emptyJob } from "./empty-job.js";
import { JobSchema } from "./job-schema.js";
import { storedJob } from "./job-storage.js";
import { openableJob, type JobDraft } from "./job-state.js";
import { storeInfo } from "./store/store-api.js";
import { StoreLinkState } from "./store/store-link.js";
import { StoreView } from "./store/store-view.js";
import { toolbar } from "./toolbar.js";

interface Start {
  job: JobDraft;
  example?: string;
  note?: string;
}

async function startingJob(examples: ExampleEntry[]): Promise<Start> {
  const wanted = new URLSearchParams(location.search).get("example");
  if (!wanted) {
    const stored = storedJob();
    if (stored) return { job: stored, note: "Restored the job you were working on in this browser." };
  }
  const id = wanted ?? examples[0]?.id;
  if (!id) return { job: emptyJob(), note: "No example jobs are available; enter a member from scratch or open a job file." };
  const opened = openableJob(await fetchExample(id));
  return opened.ok ? { job: opened.job, example: id } : { job: emptyJob(), note: `The example “${id}” could not be opened.` };
}

async function boot(): Promise<void> {
  const formRoot = document.getElementById("job-form")!;
  const resultsRoot = document.getElementById("results")!;
  const workspace = document.getElementById("workspace")!;
  const storeRoot = document.getElementById("store-root")!;
  const identity = document.getElementById("job-identity")!;
  let examples: ExampleEntry[] = [];
  let problem: string | undefined;
  const schemaAnswer = fetchJobSchema().catch(() => null);
  const storeAnswer = storeInfo();
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

  const link = new StoreLinkState();
  // A job opened from an example is not the one saved in the store.
  if (start.example) link.set(null);
  const session = new DesignSession(formRoot, resultsRoot, start.job, schema);
  // The job now lives in this browser; without this a reload would load the example over the user's edits.
  if (location.search) history.replaceState(null, "", location.pathname);

  const storeAvailable = (await storeAnswer).ok;
  let storeView: StoreView | null = null;
  const showView = (view: "member" | "store") => {
    workspace.hidden = view === "store";
    storeRoot.hidden = view !== "store";
    document.body.dataset.view = view;
    bar.setView(view);
    if (view === "store") {
      if (!storeView) {
        storeView = new StoreView({
          schema,
          link,
          open: (job, opened) => {
            session.replaceJob(job);
            link.set(opened);
            bar.say(`Opened revision ${opened.revision} of ${opened.mark} from “${opened.projectName}”. A save makes revision ${opened.revision}’s successor; nothing saved is changed.`);
            showView("member");
          },
        });
        storeRoot.append(storeView.element);
      }
      void storeView.show();
    }
    window.scrollTo({ top: 0 });
  };
  const bar = toolbar({ session, schema, examples, link, storeAvailable, showView });
  document.getElementById("toolbar")!.append(bar.element);
  const note = [problem, start.note].filter(Boolean).join(" ");
  if (note) bar.say(note);

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

import { bundleThread, startThread } from "../thread-entry.js";
import { runMemberTask, type MemberOutcome, type MemberTask } from "./member-files.js";

/** Tasks sent to a worker before it answers, so that its file writes overlap its next design. */
const PER_WORKER = 2;

const BATCH_WORKER = new URL("./batch-worker.ts", import.meta.url);

/** A batch's worker thread: the bundle made by bundleThread when there is one (a tenth of a second to start), else the sources through tsx (about a second). */
const startWorker = () => startThread(BATCH_WORKER);

const failedOutcome = (task: MemberTask, message: string): MemberOutcome => ({
  index: task.index,
  file: task.file,
  mark: "",
  status: "error",
  summary: null,
  problems: [{ path: "(program)", message }],
  written: [],
  milliseconds: { design: 0, pdf: 0 },
});

/**
 * Runs the tasks on `threads` worker threads, each taking more as it finishes (members differ a lot in
 * cost). A worker that dies marks its tasks as failed and the rest carry on; if every worker dies, the
 * remaining tasks run on this thread.
 */
export async function runInWorkers(tasks: MemberTask[], threads: number, onOutcome: (outcome: MemberOutcome) => void): Promise<MemberOutcome[]> {
  await bundleThread(BATCH_WORKER);
  const outcomes: MemberOutcome[] = [];
  let next = 0;
  const finish = (outcome: MemberOutcome) => {
    outcomes.push(outcome);
    onOutcome(outcome);
  };
  await Promise.all(
    Array.from({ length: Math.min(threads, tasks.length) }, () =>
      new Promise<void>((resolve) => {
        const worker = startWorker();
        const inFlight = new Map<number, MemberTask>();
        const feed = () => {
          while (inFlight.size < PER_WORKER && next < tasks.length) {
            const task = tasks[next++]!;
            inFlight.set(task.index, task);
            worker.postMessage(task);
          }
          if (inFlight.size === 0) void worker.terminate();
        };
        let failure = "the worker thread stopped";
        worker.on("message", (message: MemberOutcome | "ready") => {
          if (message !== "ready") {
            inFlight.delete(message.index);
            finish(message);
          }
          feed();
        });
        worker.on("error", (error) => (failure = error.message));
        worker.on("exit", () => {
          for (const task of inFlight.values()) finish(failedOutcome(task, `a worker thread failed on this job: ${failure}`));
          inFlight.clear();
          resolve();
        });
      }),
    ),
  );
  // Only when workers died: whatever is left runs here.
  while (next < tasks.length) finish(await runMemberTask(tasks[next++]!));
  return outcomes;
}

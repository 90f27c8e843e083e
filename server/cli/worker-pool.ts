import { compileInThread } from "../jit-tuning.js";
import { bundleThread, startThread } from "../thread-entry.js";
import type { FromBatchWorker, ToBatchWorker } from "./batch-worker.js";
import { runMemberTask, WORKER_LANES, type MemberOutcome, type MemberTask } from "./member-files.js";

/**
 * Tasks go to a worker a few to a message, and it holds up to twice that, so that it never waits for
 * the next while its files are written; members differ a lot in cost, so no more than that is handed
 * out ahead (the last members then spread over the workers).
 */
const CHUNK = 4;
const AHEAD = 2 * CHUNK;

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
 * cost). A worker that dies marks as failed the tasks it may have begun (the first WORKER_LANES of its
 * unfinished ones, in the order they were sent); the others it held go to the other workers, and the
 * rest carry on; if every worker dies, the remaining tasks run on this thread. `inputs`: the identities of the batch's input files, sent once.
 */
export async function runInWorkers(tasks: MemberTask[], threads: number, inputs: ReadonlySet<string>, onOutcome: (outcome: MemberOutcome) => void): Promise<MemberOutcome[]> {
  await bundleThread(BATCH_WORKER);
  compileInThread();
  const outcomes: MemberOutcome[] = [];
  let next = 0;
  // Tasks a dead worker held but had not begun: handed out again first.
  const again: MemberTask[] = [];
  const left = () => again.length + tasks.length - next;
  const take = (count: number): MemberTask[] => {
    const chunk = again.splice(0, count);
    const more = tasks.slice(next, next + count - chunk.length);
    next += more.length;
    return [...chunk, ...more];
  };
  const finish = (outcome: MemberOutcome) => {
    outcomes.push(outcome);
    onOutcome(outcome);
  };
  await Promise.all(
    Array.from({ length: Math.min(threads, tasks.length) }, () =>
      new Promise<void>((resolve) => {
        const worker = startWorker();
        const send = (message: ToBatchWorker) => worker.postMessage(message);
        const inFlight = new Map<number, MemberTask>();
        send({ inputs: [...inputs] });
        const feed = () => {
          while (inFlight.size <= AHEAD - CHUNK && left() > 0) {
            const chunk = take(CHUNK);
            for (const task of chunk) inFlight.set(task.index, task);
            send({ tasks: chunk });
          }
          if (inFlight.size === 0) void worker.terminate();
        };
        // Tasks wait in the port while the worker starts.
        feed();
        let failure = "the worker thread stopped";
        worker.on("message", (message: FromBatchWorker) => {
          if (message !== "ready") {
            for (const outcome of message.outcomes) {
              inFlight.delete(outcome.index);
              finish(outcome);
            }
          }
          feed();
        });
        worker.on("error", (error) => (failure = error.message));
        worker.on("exit", () => {
          let begun = 0;
          for (const task of inFlight.values()) {
            if (begun++ < WORKER_LANES) finish(failedOutcome(task, `a worker thread failed on this job: ${failure}`));
            else again.push(task);
          }
          inFlight.clear();
          resolve();
        });
      }),
    ),
  );
  // Only when workers died: whatever is left runs here.
  while (left() > 0) finish(await runMemberTask(take(1)[0]!, inputs));
  return outcomes;
}

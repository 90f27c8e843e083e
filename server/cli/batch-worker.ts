import { parentPort } from "node:worker_threads";
import { runMemberTask, WORKER_LANES, type MemberOutcome, type MemberTask } from "./member-files.js";

/** To a batch's worker: first the identities of the batch's input files (once), then its tasks a few at a time. */
export type ToBatchWorker = { inputs: string[] } | { tasks: MemberTask[] };
/** From it: "ready", then outcomes as they finish, those finished in the same turn in one message. */
export type FromBatchWorker = "ready" | { outcomes: MemberOutcome[] };

let inputs: ReadonlySet<string> = new Set();
const queue: MemberTask[] = [];
let lanes = 0;
let finished: MemberOutcome[] = [];

const flush = () => {
  const outcomes = finished;
  finished = [];
  if (outcomes.length > 0) parentPort!.postMessage({ outcomes } satisfies FromBatchWorker);
};

const failed = (task: MemberTask, error: unknown): MemberOutcome => ({
  index: task.index,
  file: task.file,
  mark: "",
  status: "error",
  summary: null,
  problems: [{ path: "(program)", message: `stitchplan failed on this job: ${error instanceof Error ? error.message : String(error)}` }],
  written: [],
  milliseconds: { design: 0, pdf: 0 },
});

async function lane(): Promise<void> {
  lanes++;
  for (let task = queue.shift(); task; task = queue.shift()) {
    const outcome = await runMemberTask(task, inputs).catch((error: unknown) => failed(task!, error));
    if (finished.push(outcome) === 1) setImmediate(flush);
  }
  lanes--;
}

/** A worker thread of a batch: designs the members it is sent and answers with their outcomes. */
parentPort!.on("message", (message: ToBatchWorker) => {
  if ("inputs" in message) {
    inputs = new Set(message.inputs);
    return;
  }
  queue.push(...message.tasks);
  while (lanes < WORKER_LANES && queue.length > 0) void lane();
});
parentPort!.postMessage("ready" satisfies FromBatchWorker);

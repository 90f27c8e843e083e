import { parentPort } from "node:worker_threads";
import { performTask, toWire, type DesignTask } from "./design-tasks.js";

type Sent = { id: number; task: DesignTask };

/**
 * A design thread: performs the tasks it is sent one after the other (a worksheet awaits its PDF
 * stream: the next task, sent behind it, starts only once it is answered, so each task's time limit
 * is its own) and answers each with its id.
 */
const waiting: Sent[] = [];
let busy = false;

function performNext(): void {
  const sent = busy ? undefined : waiting.shift();
  if (!sent) return;
  busy = true;
  void performTask(sent.task)
    .then(
      (answer) => {
        // Bytes (a result's JSON, a worksheet) are moved to the HTTP thread rather than copied.
        const bytes = answer instanceof Uint8Array ? answer : answer instanceof Object && "pdf" in answer ? answer.pdf : undefined;
        const transfer = bytes ? [bytes.buffer as ArrayBuffer] : [];
        parentPort!.postMessage({ id: sent.id, answer }, transfer);
      },
      (error: unknown) => parentPort!.postMessage({ id: sent.id, error: toWire(error) }),
    )
    .finally(() => {
      busy = false;
      performNext();
    });
}

parentPort!.on("message", (sent: Sent) => {
  waiting.push(sent);
  performNext();
});
parentPort!.postMessage("ready");

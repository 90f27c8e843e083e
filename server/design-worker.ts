import { parentPort } from "node:worker_threads";
import { performTask, toWire, type DesignTask } from "./design-tasks.js";

/** A design thread: performs each task it is sent and answers with its id. */
parentPort!.on("message", ({ id, task }: { id: number; task: DesignTask }) => {
  void performTask(task).then(
    (answer) => {
      // Bytes (a result's JSON, a worksheet) are moved to the HTTP thread rather than copied.
      const bytes = answer instanceof Uint8Array ? answer : answer instanceof Object && "pdf" in answer ? answer.pdf : undefined;
      const transfer = bytes ? [bytes.buffer as ArrayBuffer] : [];
      parentPort!.postMessage({ id, answer }, transfer);
    },
    (error: unknown) => parentPort!.postMessage({ id, error: toWire(error) }),
  );
});
parentPort!.postMessage("ready");

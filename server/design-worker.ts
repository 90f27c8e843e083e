import { parentPort } from "node:worker_threads";
import { performTask, toWire, type DesignTask } from "./design-tasks.js";

/** A design thread: performs each task it is sent and answers with its id. */
parentPort!.on("message", ({ id, task }: { id: number; task: DesignTask }) => {
  void performTask(task).then(
    (answer) => {
      const transfer = answer instanceof Object && "pdf" in answer ? [answer.pdf.buffer as ArrayBuffer] : [];
      parentPort!.postMessage({ id, answer }, transfer);
    },
    (error: unknown) => parentPort!.postMessage({ id, error: toWire(error) }),
  );
});
parentPort!.postMessage("ready");

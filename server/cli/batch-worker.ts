import { parentPort } from "node:worker_threads";
import { runMemberTask, type MemberTask } from "./member-files.js";

/** A worker thread of a batch: designs the members it is sent and answers with each outcome. */
parentPort!.on("message", (task: MemberTask) => {
  void runMemberTask(task).then(
    (outcome) => parentPort!.postMessage(outcome),
    (error: unknown) =>
      parentPort!.postMessage({
        index: task.index,
        file: task.file,
        mark: "",
        status: "error",
        summary: null,
        problems: [{ path: "(program)", message: `stitchplan failed on this job: ${error instanceof Error ? error.message : String(error)}` }],
        written: [],
        milliseconds: { design: 0, pdf: 0 },
      }),
  );
});
parentPort!.postMessage("ready");

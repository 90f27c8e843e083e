// A child process for the crash and concurrency tests: saves revisions of one member in a loop and
// prints "saved <n>" after each commit. With "hold", it stops inside its first save's transaction
// (rows written, not committed), prints "holding" and waits to be killed.
import { readFileSync } from "node:fs";
import { JobStore } from "../../../server/store/job-store.js";

const [dataDir, projectId, memberId, count, how] = process.argv.slice(2);
const job = JSON.parse(readFileSync(new URL("../../../fixtures/examples/workshop-box-beam.si.json", import.meta.url), "utf8"));
const store = JobStore.open(dataDir!, {
  busyTimeoutMs: 30_000,
  beforeCommit:
    how === "hold"
      ? () => {
          process.stdout.write("holding\n");
          Atomics.wait(new Int32Array(new SharedArrayBuffer(4)), 0, 0, 60_000);
        }
      : undefined,
});
for (let i = 0; i < Number(count); i++) {
  job.beam.loads[0].w = 1 + (i % 97) / 10;
  job.member.description = `saved by process ${process.pid}, save ${i}`;
  const saved = store.saveRevision(Number(projectId), Number(memberId), job, { note: `pid ${process.pid} #${i}` });
  process.stdout.write(`saved ${saved.revision.revision}\n`);
}
store.close();

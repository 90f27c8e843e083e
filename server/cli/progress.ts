import { basename } from "node:path";
import cliProgress from "cli-progress";
import type { MemberOutcome } from "./member-files.js";

export interface Progress {
  update(done: number, outcome: MemberOutcome): void;
  stop(): void;
}

/** A bar on a terminal; elsewhere (a log, CI) one plain line per member. */
export function progressReporter(stream: NodeJS.WritableStream & { isTTY?: boolean }, total: number): Progress {
  if (stream.isTTY) {
    const bar = new cliProgress.SingleBar(
      { stream, format: "{bar} {value}/{total} members | {eta_formatted} left | {file}", hideCursor: true, etaBuffer: 50, fps: 10 },
      cliProgress.Presets.shades_classic,
    );
    bar.start(total, 0, { file: "" });
    return {
      update: (done, outcome) => bar.update(done, { file: basename(outcome.file) }),
      stop: () => bar.stop(),
    };
  }
  const width = String(total).length;
  return {
    update: (done, o) => {
      stream.write(`[${String(done).padStart(width)}/${total}] ${o.file}: ${o.mark || "—"} ${o.status}${o.summary?.governing ? ` (${o.summary.governing.utilisation.toFixed(2)})` : ""}\n`);
    },
    stop: () => undefined,
  };
}

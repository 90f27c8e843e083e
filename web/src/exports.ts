import { positionsCsv, scheduleCsv, weldsCsv } from "../../core/export/schedule-csv.js";
import { requestWorksheet } from "./api.js";
import type { DesignSession } from "./design-session.js";
import { jobFileName, saveBlob } from "./file-transfer.js";

type Say = (text: string, tone?: "info" | "problem" | "caution") => void;

const stem = (job: Record<string, unknown>) => jobFileName(job).replace(/\.stitchplan\.json$/, "");

/**
 * The schedule or the connector positions as CSV, from the result that matches the input now
 * entered; a failing member is exported with a warning in red, a stale result not at all.
 */
export function downloadCsv(session: DesignSession, what: "schedule" | "positions" | "welds", say: Say): void {
  const result = session.result;
  if (!result || !session.resultsCurrent) return say(`No ${what} CSV: the results shown are not from the input now entered. Fix the fields marked in red (or wait for the update) and try again.`, "problem");
  const text = what === "welds" ? weldsCsv(result) : result.schedules.length ? (what === "schedule" ? scheduleCsv(result) : positionsCsv(result)) : null;
  if (text === null) {
    return say(
      what === "welds" ? "No welds CSV: no joint of this member is welded." : `No ${what} CSV: no joint of this member is fastened with discrete connectors (glue lines and welds have no rows to list${result.welds.length ? "; welds have their own CSV" : ""}).`,
      "problem",
    );
  }
  const fileName = `${stem(session.state.job)}.${what}.csv`;
  saveBlob(new Blob([text], { type: "text/csv;charset=utf-8" }), fileName);
  if (!result.status.passes) say(`Downloaded ${fileName}. This member does NOT pass every check: what it lists must not be built as it stands.`, "problem");
  else say(`Downloaded ${fileName} (units named in its header). For review by the engineer of record before use.`);
}

export async function downloadWorksheet(session: DesignSession, say: Say): Promise<void> {
  say("Preparing the worksheet…");
  const answer = await requestWorksheet(session.state.job);
  if (answer.kind === "pdf") {
    saveBlob(answer.blob, answer.fileName);
    const failing = session.result && session.resultsCurrent && !session.result.status.passes;
    say(
      failing
        ? `Worksheet ${answer.fileName} downloaded. The member does NOT pass every check; the sheet says so.`
        : `Worksheet ${answer.fileName} downloaded. It is for review by the engineer of record before any use.`,
      failing ? "problem" : "info",
    );
    return;
  }
  if (answer.issues.length) session.showIssues(answer.issues);
  say(answer.issues.length ? "No worksheet: the input has problems, marked at their fields. Fix them and try again." : `No worksheet: ${answer.message}`, "problem");
}

import { csvNumber, csvText } from "../../core/export/schedule-csv.js";
import { formatRatio } from "../../core/index.js";
import type { MemberOutcome } from "./member-files.js";

const statusText = (o: MemberOutcome) =>
  o.status === "pass" ? "pass" : o.status === "fail" ? "FAIL" : o.status === "invalid" ? `invalid (${o.problems.length} problem${o.problems.length === 1 ? "" : "s"})` : "error";

/** The batch summary as an aligned text table: file, member, governing utilisation and what governs, connectors, result. */
export function summaryTable(outcomes: MemberOutcome[], label: (file: string) => string = (f) => f): string {
  const header = ["file", "member", "utilisation", "governs", "connectors", "result"];
  const rows = outcomes.map((o) => [
    label(o.file),
    o.mark || "—",
    o.summary?.governing ? formatRatio(o.summary.governing.utilisation) : "—",
    o.summary?.governing?.item ?? "—",
    o.summary ? String(o.summary.connectors) : "—",
    statusText(o),
  ]);
  const clip = (s: string, n: number) => (s.length > n ? `${s.slice(0, n - 1)}…` : s);
  const limits = [60, 24, 11, 44, 10, 24];
  const cells = [header, ...rows].map((r) => r.map((c, i) => clip(c, limits[i]!)));
  const widths = header.map((_, i) => Math.max(...cells.map((r) => r[i]!.length)));
  const right = new Set([2, 4]);
  const line = (r: string[]) => r.map((c, i) => (right.has(i) ? c.padStart(widths[i]!) : c.padEnd(widths[i]!))).join("  ").trimEnd();
  return [line(cells[0]!), widths.map((w) => "-".repeat(w)).join("  "), ...cells.slice(1).map(line)].join("\n");
}

/** The same summary as CSV, written beside the outputs. */
export function summaryCsv(outcomes: MemberOutcome[]): string {
  const rows = [["file", "member", "governing utilisation", "governing item", "connectors", "result", "problems"]];
  for (const o of outcomes) {
    rows.push([
      csvText(o.file),
      csvText(o.mark),
      o.summary?.governing ? csvNumber(o.summary.governing.utilisation, 4) : "",
      csvText(o.summary?.governing?.item ?? ""),
      o.summary ? String(o.summary.connectors) : "",
      o.status,
      csvText(o.problems.map((p) => `${p.path}: ${p.message}`).join("; ")),
    ]);
  }
  return rows.map((r) => r.join(",")).join("\r\n") + "\r\n";
}

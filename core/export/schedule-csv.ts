import type { DesignResult } from "../schema/result.js";

export interface CsvOptions {
  /** Text of the member column; the result's member mark when absent. */
  member?: string;
  /** CRLF by default (RFC 4180); spreadsheets read either. */
  lineEnding?: "\r\n" | "\n";
}

/** A number without floating-point noise: six significant figures, no trailing zeros. */
export function csvNumber(value: number, significant = 6): string {
  if (!Number.isFinite(value)) return "";
  if (Number.isInteger(value)) return String(value);
  return String(Number(value.toPrecision(significant)));
}

/**
 * One CSV field (RFC 4180): quoted when it holds a comma, quote or line break. Text that a spreadsheet
 * would run as a formula (= + - @ first) is prefixed with an apostrophe.
 */
export function csvText(value: string): string {
  const safe = /^[=+\-@\t\r]/.test(value) ? `'${value}` : value;
  return /[",\r\n]/.test(safe) || safe !== safe.trim() ? `"${safe.replace(/"/g, '""')}"` : safe;
}

const lines = (rows: string[][], options: CsvOptions) => rows.map((r) => r.join(",")).join(options.lineEnding ?? "\r\n") + (options.lineEnding ?? "\r\n");

/**
 * The connector schedule: one row per zone per joint, units named in the header (the result's units).
 * Bond lines have no zones and no rows here; welded joints are in weldsCsv.
 */
export function scheduleCsv(result: DesignResult, options: CsvOptions = {}): string {
  const span = result.unitLabels.span ?? "";
  const length = result.unitLabels.length ?? "";
  const member = csvText(options.member ?? result.member.mark);
  const rows = [["member", "joint", "zone", `from (${span})`, `to (${span})`, `spacing (${length})`, "rows", "count", "utilisation"]];
  for (const schedule of result.schedules) {
    schedule.zones.forEach((zone, i) => {
      rows.push([member, csvText(schedule.joint), String(i + 1), csvNumber(zone.from), csvNumber(zone.to), csvNumber(zone.spacing), String(zone.rows), String(zone.count), csvNumber(zone.utilisation, 4)]);
    });
  }
  return lines(rows, options);
}

/** Where each row of connectors goes: joint, row number from the left end (from 1), position x along the member. */
export function positionsCsv(result: DesignResult, options: CsvOptions = {}): string {
  const rows = [["joint", "row", `x (${result.unitLabels.span ?? ""})`]];
  for (const schedule of result.schedules) {
    schedule.positions.forEach((x, i) => rows.push([csvText(schedule.joint), String(i + 1), csvNumber(x)]));
  }
  return lines(rows, options);
}

/** Welded joints: one row per zone per joint, continuous or segments of a length at a pitch; null when the member has no welds. */
export function weldsCsv(result: DesignResult, options: CsvOptions = {}): string | null {
  const welds = result.welds ?? [];
  if (welds.length === 0) return null;
  const span = result.unitLabels.span ?? "";
  const length = result.unitLabels.length ?? "";
  const member = csvText(options.member ?? result.member.mark);
  const rows = [["member", "joint", "zone", `from (${span})`, `to (${span})`, "pattern", `segment (${length})`, `pitch (${length})`, `leg size (${length})`, "fillets", "utilisation"]];
  for (const weld of welds) {
    weld.zones.forEach((zone, i) => {
      rows.push([
        member,
        csvText(weld.joint),
        String(i + 1),
        csvNumber(zone.from),
        csvNumber(zone.to),
        zone.pattern,
        zone.segmentLength === null ? "" : csvNumber(zone.segmentLength),
        zone.pitch === null ? "" : csvNumber(zone.pitch),
        csvNumber(weld.limits.size),
        String(weld.fillets),
        csvNumber(zone.utilisation, 4),
      ]);
    });
  }
  return lines(rows, options);
}

// The physical-range walk as it was before the speed work (issue 20): the reference for
// test/server/answer-bytes.test.ts. Not used by the program.
import type { JobIssue } from "../../../core/schema/job-issues.js";
import type { JobDocument } from "../../../core/schema/job.js";
import { MAX_PROVIDED_ROWS, physicalRanges } from "../../../core/physical-ranges.js";
import { formatNumber, inJobUnits } from "../../../core/units/format.js";
import { exceeds, fallsShort } from "../../../core/units/limits.js";
import { fromCore, unitLabel, type Quantity } from "../../../core/units/quantity.js";

export function physicalRangeIssues(job: JobDocument, core: JobDocument): JobIssue[] {
  const issues: JobIssue[] = [];
  const text = (value: number, quantity: Quantity | null) => (quantity ? inJobUnits(value, quantity, core.units) : String(value));
  const inJob = (value: number, quantity: Quantity | null) => (quantity ? fromCore(value, quantity, job.units) : value);
  const visit = (x: unknown, path: string, pattern: string) => {
    if (typeof x === "number") {
      const r = physicalRanges[pattern];
      const size = Math.abs(x);
      if (!r || size === 0) return;
      if (fallsShort(size, inJob(r.lo, r.quantity)) || exceeds(size, inJob(r.hi, r.quantity))) {
        issues.push({ path, message: `${r.quantity ? `${formatNumber(x)} ${unitLabel(r.quantity, job.units)}` : formatNumber(x)} is outside the range of ${r.what} (${r.lo === 0 ? "up to" : `${text(r.lo, r.quantity)} to`} ${text(r.hi, r.quantity)}${r.lo === 0 && r.quantity !== "span" && r.quantity !== "length" ? " either way" : ""})` });
      }
    } else if (Array.isArray(x)) x.forEach((v, i) => visit(v, `${path}[${i}]`, `${pattern}[]`));
    else if (x && typeof x === "object") for (const [k, v] of Object.entries(x)) visit(v, path ? `${path}.${k}` : k, pattern ? `${pattern}.${k}` : k);
  };
  visit(job, "", "");
  const L = core.beam.spans.reduce((s, l) => s + l, 0);
  if (fallsShort(L, 1) || exceeds(L, 500_000)) issues.push({ path: "beam.spans", message: `${text(L, "span")} is outside the range of member lengths (${text(1, "span")} to ${text(500_000, "span")})` });
  if (issues.length > 0) return issues;
  const provided = [
    { path: "fastening.default", fastening: core.fastening.default },
    ...core.fastening.joints.map((j, k) => ({ path: `fastening.joints[${k}]`, fastening: j })),
  ];
  for (const { path, fastening } of provided) {
    const p = fastening.provided;
    if (p?.type !== "zones") continue;
    const rows = p.zones.reduce((n, z) => n + Math.max(0, z.to - z.from) / z.spacing, 0);
    if (rows > MAX_PROVIDED_ROWS) {
      const i = p.zones.reduce((best, z, k) => (z.spacing < p.zones[best]!.spacing ? k : best), 0);
      issues.push({ path: `${path}.provided.zones[${i}].spacing`, message: `${text(p.zones[i]!.spacing, "length")} gives about ${Math.round(rows)} rows on this joint; a schedule to check has at most ${MAX_PROVIDED_ROWS} rows (as a list of positions)` });
    }
  }
  return issues;
}

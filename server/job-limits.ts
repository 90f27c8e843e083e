import type { JobIssue } from "../core/index.js";

/**
 * What the service takes beyond the job schema's own limits (16 parts, 12 spans, 200 loads …), so that
 * no single job can hold it for minutes or exhaust its memory. README "Performance and limits".
 */
export const serviceLimits = {
  /** Largest request body, bytes (a project import has its own). */
  bodyBytes: 1024 * 1024,
  /** Longest a design may take, ms, before it is stopped. */
  designMs: 30_000,
  /** Longest a worksheet (design and PDF) may take, ms. */
  worksheetMs: 60_000,
  /** Heap of each design or worksheet thread, MiB. */
  threadMemoryMb: 512,
  /** Designs (results, comparisons, a save's summary) that may wait for a thread; one more is a 503. */
  designQueue: 128,
  /** Worksheets that may wait for a thread. */
  worksheetQueue: 8,
  /** Most problems listed in one error answer; the rest are counted. */
  issues: 100,
} as const;

/** At most `serviceLimits.issues` problems, then one line that counts the rest. */
export function boundedIssues(issues: JobIssue[]): JobIssue[] {
  if (issues.length <= serviceLimits.issues) return issues;
  const rest = issues.length - serviceLimits.issues;
  return [...issues.slice(0, serviceLimits.issues), { path: "(document)", message: `and ${rest} more problem${rest === 1 ? "" : "s"} not listed` }];
}

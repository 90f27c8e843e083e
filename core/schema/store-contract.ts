import { z } from "zod";
import { JobDocument } from "./job.js";

/**
 * What the job store's API answers, shared by the server (server/store/, routes/store.ts) and the page
 * (web/src/store/): one contract, so that the page depends on no server code.
 */

/** What a list of members shows for one result: pass or fail, what governs, how many connectors. */
export const ResultSummary = z.object({
  passes: z.boolean(),
  /** The result's one-sentence status. */
  status: z.string(),
  /** The most utilised item: a schedule, a bond line, a weld or a member check; null when the result has none. */
  governing: z.object({ item: z.string(), utilisation: z.number() }).nullable(),
  /** Connectors placed (or checked) in every schedule, all lines. */
  connectors: z.number(),
});
export type ResultSummary = z.infer<typeof ResultSummary>;

export const Project = z.object({
  id: z.number(),
  name: z.string(),
  number: z.string(),
  client: z.string(),
  createdAt: z.string(),
  /** Members in the project. */
  members: z.number(),
  /** When a revision was last saved in the project; null when it has no members. */
  updatedAt: z.string().nullable(),
  /** When the project was made from an imported project file; null for one created in this store. */
  importedAt: z.string().nullable(),
});
export type Project = z.infer<typeof Project>;

export const RevisionInfo = z.object({
  revision: z.number(),
  savedAt: z.string(),
  note: z.string(),
  /** The revision this one was edited from, when the client said so. */
  basedOn: z.number().nullable(),
  /** Input fingerprint with the program version that saved it. */
  fingerprint: z.string(),
  /** Program version that saved it ("" for a revision from a version-1 store). */
  program: z.string(),
  /** Pass or fail, what governs, connectors, worked out on a design thread when saved; null when it has none (a version-1 store) or the job could not be designed. */
  summary: ResultSummary.nullable(),
});
export type RevisionInfo = z.infer<typeof RevisionInfo>;

export const WorksheetIssue = z.object({
  id: z.number(),
  projectId: z.number(),
  projectName: z.string(),
  memberId: z.number(),
  mark: z.string(),
  revision: z.number(),
  /** Revision text printed in the title block (the job's `member.revision`). */
  titleRevision: z.string(),
  fingerprint: z.string(),
  issuedAt: z.string(),
  fileName: z.string(),
  program: z.string(),
  /** Whether the issued PDF's bytes are kept (not for worksheets brought in by an import). */
  hasPdf: z.boolean(),
});
export type WorksheetIssue = z.infer<typeof WorksheetIssue>;

export const Member = z.object({
  id: z.number(),
  projectId: z.number(),
  /** Mark and description of the latest revision's job. */
  mark: z.string(),
  description: z.string(),
  createdAt: z.string(),
  revisions: z.number(),
  latest: RevisionInfo,
  /** Worksheets issued for any revision of the member. */
  issued: z.number(),
  lastIssue: WorksheetIssue.nullable(),
});
export type Member = z.infer<typeof Member>;

/** One revision in a member's list, with the worksheets issued from it. */
export const RevisionListItem = RevisionInfo.extend({ issues: z.array(WorksheetIssue) });
export type RevisionListItem = z.infer<typeof RevisionListItem>;

export const StoredRevision = RevisionInfo.extend({
  projectId: z.number(),
  memberId: z.number(),
  /** The job document as saved, defaults filled in. */
  job: JobDocument,
});
export type StoredRevision = z.infer<typeof StoredRevision>;

export const SavedRevision = z.object({
  projectId: z.number(),
  memberId: z.number(),
  mark: z.string(),
  revision: RevisionInfo,
  /** For example: another revision was saved after the one this edit started from. */
  warnings: z.array(z.string()),
});
export type SavedRevision = z.infer<typeof SavedRevision>;

export const FingerprintLookUp = z.object({
  fingerprint: z.string(),
  /** Worksheets issued with this fingerprint, oldest first. */
  issues: z.array(WorksheetIssue),
  /** Saved revisions whose input has this fingerprint. */
  revisions: z.array(z.object({ projectId: z.number(), projectName: z.string(), memberId: z.number(), mark: z.string(), revision: z.number(), savedAt: z.string(), fingerprint: z.string() })),
});
export type FingerprintLookUp = z.infer<typeof FingerprintLookUp>;

/** A field of the job that differs between two revisions. */
export const InputChange = z.object({
  path: z.string(),
  change: z.enum(["changed", "added", "removed"]),
  /** Value in the older revision; null when added. */
  from: z.unknown(),
  /** Value in the newer revision; null when removed. */
  to: z.unknown(),
});
export type InputChange = z.infer<typeof InputChange>;

const Change = z.enum(["same", "changed", "added", "removed"]);
const pair = <T extends z.ZodType>(value: T) => z.object({ from: value.nullable(), to: value.nullable() });

export const ZoneView = z.object({ from: z.number(), to: z.number(), spacing: z.number(), rows: z.number(), count: z.number(), utilisation: z.number(), passes: z.boolean() });
export type ZoneView = z.infer<typeof ZoneView>;

export const ZoneChange = pair(ZoneView).extend({
  /** Zone number along the member, from 1. */
  zone: z.number(),
  change: Change,
  /** Fields of the zone that differ. */
  fields: z.array(ZoneView.keyof()),
});
export type ZoneChange = z.infer<typeof ZoneChange>;

export const ScheduleChange = z.object({
  joint: z.string(),
  change: Change,
  connector: pair(z.string()),
  count: pair(z.number()),
  maxUtilisation: pair(z.number()),
  passes: pair(z.boolean()),
  zones: z.array(ZoneChange),
});
export type ScheduleChange = z.infer<typeof ScheduleChange>;

export const UtilisationChange = z.object({
  /** Joint id for a bond line, check id for a member check. */
  id: z.string(),
  title: z.string(),
  change: Change,
  utilisation: pair(z.number()),
  passes: pair(z.boolean()),
});
export type UtilisationChange = z.infer<typeof UtilisationChange>;

export const ResultChanges = z.object({
  passes: pair(z.boolean()),
  connectors: pair(z.number()),
  schedules: z.array(ScheduleChange),
  bondLines: z.array(UtilisationChange),
  /** Welded joints by their largest utilisation (zones of segment and pitch are in the results themselves). */
  welds: z.array(UtilisationChange),
  checks: z.array(UtilisationChange),
});
export type ResultChanges = z.infer<typeof ResultChanges>;

const RevisionMeta = z.object({ revision: z.number(), savedAt: z.string(), note: z.string(), fingerprint: z.string(), units: z.string() });

/** GET …/compare?from=&to=: what changed in the input and in the result between two revisions. */
export const Comparison = z.object({
  projectId: z.number(),
  memberId: z.number(),
  units: z.string(),
  unitLabels: z.record(z.string(), z.string()),
  from: RevisionMeta,
  to: RevisionMeta,
  sameInputs: z.boolean(),
  inputs: z.array(InputChange),
  results: ResultChanges,
});
export type Comparison = z.infer<typeof Comparison>;

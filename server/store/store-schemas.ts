import { z } from "zod";
import { refuseHidden } from "../../core/schema/quantity.js";

/** Request and file contracts of the job store. A job inside them is checked by prepareJob, so it is `unknown` here. */

const Timestamp = z.iso.datetime({ offset: true, message: "must be a date and time such as 2025-03-14T09:30:00.000Z" });

export const NewProject = z.strictObject({
  name: z.string().trim().min(1, "must not be empty").max(120, "must be at most 120 characters").superRefine(refuseHidden),
  number: z.string().trim().max(40, "must be at most 40 characters").superRefine(refuseHidden).default(""),
  client: z.string().trim().max(120, "must be at most 120 characters").superRefine(refuseHidden).default(""),
});
export type NewProject = z.infer<typeof NewProject>;

const Note = z.string().max(500, "must be at most 500 characters").superRefine(refuseHidden).default("");

/** POST …/members: the member's first revision. */
export const NewMember = z.strictObject({ job: z.unknown(), note: Note });
export type NewMember = z.infer<typeof NewMember>;

/** POST …/revisions: a new revision, optionally saying which revision the edit started from. */
export const SaveRevision = z.strictObject({
  job: z.unknown(),
  basedOn: z.number().int("must be a whole number").min(1).optional(),
  note: Note,
});
export type SaveRevision = z.infer<typeof SaveRevision>;

const RevisionNumber = z.string().regex(/^[1-9]\d{0,8}$/, "must be a revision number (1, 2, …)").transform(Number);

export const CompareQuery = z.strictObject({ from: RevisionNumber, to: RevisionNumber, units: z.enum(["si", "us"]).optional() });

export const PROJECT_FILE_FORMAT = "stitchplan-project";
export const PROJECT_FILE_VERSION = 1;

export const ProjectFileRevision = z.strictObject({
  revision: z.number().int("must be a whole number").min(1),
  savedAt: Timestamp,
  note: Note,
  basedOn: z.number().int("must be a whole number").min(1).nullable().default(null),
  /** As saved; recomputed on import, since it depends on the program version. */
  fingerprint: z.string().optional(),
  program: z.string().max(80).default(""),
  job: z.unknown(),
});

export const ProjectFileWorksheet = z.strictObject({
  revision: z.number().int("must be a whole number").min(1),
  fingerprint: z.string().regex(/^[0-9a-f]{64}$/, "must be 64 hexadecimal digits (SHA-256)"),
  issuedAt: Timestamp,
  fileName: z.string().min(1, "must not be empty").max(200),
  program: z.string().max(80).default(""),
  titleRevision: z.string().max(12).default(""),
});

export const ProjectFileMember = z.strictObject({
  /** Informational: a member's mark and description come from its last revision's job. */
  mark: z.string().max(40).optional(),
  description: z.string().max(200).optional(),
  createdAt: Timestamp.optional(),
  revisions: z.array(ProjectFileRevision).min(1, "needs at least one revision").max(1000, "at most 1000 revisions"),
  worksheets: z.array(ProjectFileWorksheet).max(5000).default([]),
});

/** A whole project in one file: every member with every revision's job document and the worksheet issue log (not the PDFs). */
export const ProjectFile = z.strictObject({
  format: z.literal(PROJECT_FILE_FORMAT),
  version: z.literal(PROJECT_FILE_VERSION),
  program: z.strictObject({ name: z.string(), version: z.string() }).optional(),
  exportedAt: Timestamp.optional(),
  project: z.strictObject({
    name: z.string().trim().min(1, "must not be empty").max(120).superRefine(refuseHidden),
    number: z.string().max(40).superRefine(refuseHidden).default(""),
    client: z.string().max(120).superRefine(refuseHidden).default(""),
    createdAt: Timestamp.optional(),
  }),
  members: z.array(ProjectFileMember).max(2000, "at most 2000 members"),
});
export type ProjectFile = z.infer<typeof ProjectFile>;

import { z } from "zod";
import { recordContentSchema } from "../../../../core/contract/records";

/*
 * The records API as the browser reads it (review status, records, comments, decisions, diffs).
 * These schemas follow the records contract agreed for issue 14 field by field; when the
 * server's own schemas land in core/contract/records.ts, each one here is replaced by an import
 * of its namesake there, and nothing else in the web app changes. Fields the server adds later
 * are dropped by zod's default object parsing, so an added field never breaks a page.
 */

/** A person named on a record: id (null once their account is gone; the name stays) and name. */
export const recordPersonSchema = z.object({ id: z.string().nullable(), name: z.string() });
export type RecordPerson = z.infer<typeof recordPersonSchema>;

/** Where a project stands in its review (the product's own words, shown through features/records/model). */
export const projectReviewStatusSchema = z.enum(["in-work", "submitted", "returned", "approved"]);
export type ProjectReviewStatus = z.infer<typeof projectReviewStatusSchema>;

/** Where one frozen record stands; "superseded" once a newer record of the project was submitted. */
export const recordStatusSchema = z.enum(["submitted", "returned", "approved", "superseded"]);
export type RecordStatus = z.infer<typeof recordStatusSchema>;

export const requiredApprovalsSchema = z.union([z.literal(1), z.literal(2)]);
export type RequiredApprovals = z.infer<typeof requiredApprovalsSchema>;

export const recordSummarySchema = z.object({
  id: z.string(),
  /** 1, 2, 3 … across the project. */
  number: z.int(),
  /** "A", "B" …: kept by a resubmission after a return, advanced by the first submission after an approval. */
  revision: z.string(),
  status: recordStatusSchema,
  hash: z.string(),
  engineVersion: z.string(),
  /** What changed and why, in the originator's words. */
  reason: z.string(),
  requiredApprovals: requiredApprovalsSchema,
  submittedBy: recordPersonSchema,
  submittedAt: z.string(),
  approvals: z.array(z.object({ by: recordPersonSchema, at: z.string(), comment: z.string().nullish() })),
  returned: z.object({ by: recordPersonSchema, at: z.string(), comment: z.string() }).nullable(),
  /** When the last required approval was given; absent or null until then. */
  approvedAt: z.string().nullish(),
});
export type RecordSummary = z.infer<typeof recordSummarySchema>;

export const reviewSchema = z.object({
  status: projectReviewStatusSchema,
  requiredApprovals: requiredApprovalsSchema,
  /** The revision being worked on. */
  revision: z.string(),
  latestRecord: recordSummarySchema.nullable(),
  lastApproved: recordSummarySchema.nullable(),
  /** null when nothing is approved yet. */
  currentDiffersFromApproved: z.boolean().nullable(),
});
export type Review = z.infer<typeof reviewSchema>;

export const recordListSchema = z.object({ records: z.array(recordSummarySchema) });

export const recordCommentSchema = z.object({
  id: z.string(),
  recordId: z.string(),
  /** The comparison row the comment is about, or null for the record as a whole. */
  rowId: z.string().nullable(),
  /** The comment this one answers, or null. */
  replyTo: z.string().nullable(),
  text: z.string(),
  by: recordPersonSchema,
  at: z.string(),
});
export type RecordComment = z.infer<typeof recordCommentSchema>;

export const recordEventSchema = z.object({
  /** The record's status after the event. */
  status: recordStatusSchema,
  /** What happened (one approval of two leaves the status "submitted"). */
  action: z.enum(["submit", "approve", "return", "supersede"]).nullish(),
  by: recordPersonSchema,
  at: z.string(),
  note: z.string().nullish(),
});
export type RecordEvent = z.infer<typeof recordEventSchema>;

export const recordDetailSchema = recordSummarySchema.extend({
  content: recordContentSchema,
  comments: z.array(recordCommentSchema),
  events: z.array(recordEventSchema),
});
export type RecordDetail = z.infer<typeof recordDetailSchema>;

export const inputChangeSchema = z.object({
  kind: z.enum(["state", "location", "load-case", "combination", "material", "project"]),
  /** e.g. "Design at shell". */
  label: z.string(),
  field: z.string().nullish(),
  /** Display strings with units. */
  from: z.string().nullish(),
  to: z.string().nullish(),
});
export type InputChange = z.infer<typeof inputChangeSchema>;

/** The verdict word as the API sends it ("pass", "close", "fail"); kept as text so a new one still shows. */
const verdictAtSchema = z.object({ verdict: z.string(), factor: z.number().nullable() }).nullable();

export const verdictChangeSchema = z.object({
  rowId: z.string(),
  caseName: z.string(),
  locationName: z.string(),
  criterion: z.string(),
  from: verdictAtSchema,
  to: verdictAtSchema,
});
export type VerdictChange = z.infer<typeof verdictChangeSchema>;

export const recordDiffSchema = z.object({
  from: recordSummarySchema,
  to: recordSummarySchema,
  inputs: z.object({
    added: z.array(inputChangeSchema),
    changed: z.array(inputChangeSchema),
    removed: z.array(inputChangeSchema),
  }),
  verdictChanges: z.array(verdictChangeSchema),
});
export type RecordDiff = z.infer<typeof recordDiffSchema>;

/** Request bodies (checked by features/records/model before they are sent). */
export type SubmitRecordBody = { reason: string };
export type CommentBody = { text: string; rowId?: string | null; replyTo?: string | null };
export type ReturnRecordBody = { comment: string };
export type ApproveRecordBody = { comment?: string };
export type UpdateReviewBody = { requiredApprovals: RequiredApprovals };

import { z } from "zod";
import {
  PROJECT_REVIEW_STATUSES,
  approveRecordBodySchema,
  RECORD_STATUSES,
  projectReviewSchema,
  recordChangeSchema,
  recordDiffSchema,
  type CreateCommentBody,
  type ProjectReview,
  type RecordChange,
  type RecordDiff,
} from "../../../../core/contract/records";

/*
 * The records API as the browser reads it (review status, records, comments, decisions, diffs):
 * the server's own schemas from core/contract/records.ts, under the names the web app uses.
 */
export {
  recordCommentSchema,
  recordDetailSchema,
  recordDiffSchema,
  recordEventSchema,
  recordListSchema,
  recordPersonSchema,
  recordSummarySchema,
  type ProjectReviewStatus,
  type RecordComment,
  type RecordDetail,
  type RecordDiff,
  type RecordEvent,
  type RecordPerson,
  type RecordSummary,
  type ReturnRecordBody,
  type SubmitRecordBody,
  type UpdateReviewBody,
} from "../../../../core/contract/records";

export const projectReviewStatusSchema = z.enum(PROJECT_REVIEW_STATUSES);
export const recordStatusSchema = z.enum(RECORD_STATUSES);
export type RecordStatus = z.infer<typeof recordStatusSchema>;
export const requiredApprovalsSchema = z.union([z.literal(1), z.literal(2)]);
export type RequiredApprovals = z.infer<typeof requiredApprovalsSchema>;

/** The project's review (the contract calls it ProjectReview). */
export const reviewSchema = projectReviewSchema;
export type Review = ProjectReview;

/** One input that differs between two records. */
export const inputChangeSchema = recordChangeSchema;
export type InputChange = RecordChange;

/** One row whose verdict differs between two records. */
export const verdictChangeSchema = recordDiffSchema.shape.verdictChanges.element;
export type VerdictChange = RecordDiff["verdictChanges"][number];

export type CommentBody = CreateCommentBody;

/** The approval's comment may be left out (the server takes it as empty). */
export type ApproveRecordBody = z.input<typeof approveRecordBodySchema>;

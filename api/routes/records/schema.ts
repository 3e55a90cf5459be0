export {
  approveRecordBodySchema,
  createCommentBodySchema,
  projectReviewSchema,
  recordCommentSchema,
  recordDetailSchema,
  recordDiffQuerySchema,
  recordDiffSchema,
  recordListSchema,
  recordParamsSchema,
  recordSummarySchema,
  returnRecordBodySchema,
  reviewParamsSchema,
  submitRecordBodySchema,
  updateReviewBodySchema,
} from "../../../core/contract/records";

/** Path parameters of the review and records routes. */
export type ProjectParams = { workspaceId: string; projectId: string };
export type RecordParams = ProjectParams & { recordId: string };
export type NoInput = Record<string, never>;

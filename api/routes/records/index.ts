import type { AppContext } from "../../context";
import { defineRoute, type AnyRoute } from "../../openapi/registry";
import { createCommentHandler } from "./comment";
import { approveRecordHandler, returnRecordHandler } from "./decide";
import { diffRecordHandler, getRecordHandler, listRecordsHandler } from "./read";
import { getReviewHandler, updateReviewHandler } from "./review";
import {
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
} from "./schema";
import { submitRecordHandler } from "./submit";

const tag = "records";
const project = "/workspaces/{workspaceId}/projects/{projectId}";
const records = `${project}/records`;
const record = `${records}/{recordId}`;

/**
 * The review of a project and its frozen calculation records: submit for check, comment,
 * return, approve, the revision table and the diff between two records.
 */
export function recordRoutes(context: AppContext): AnyRoute[] {
  return [
    defineRoute({
      method: "get",
      path: `${project}/review`,
      tag,
      summary: "Where the project stands in its review (status, revision, latest and last approved records)",
      description:
        "currentDiffersFromApproved compares the project as it is now with the last approved record (when each was taken left out); null when nothing is approved.",
      access: { kind: "member", role: "viewer" },
      request: { params: reviewParamsSchema },
      responses: { 200: { description: "The review.", schema: projectReviewSchema } },
      handler: getReviewHandler(context),
    }),
    defineRoute({
      method: "patch",
      path: `${project}/review`,
      tag,
      summary: "How many independent approvals the project's records need (1 or 2; from the next submission)",
      access: { kind: "member", role: "owner" },
      request: { params: reviewParamsSchema, body: updateReviewBodySchema },
      responses: { 200: { description: "The review.", schema: projectReviewSchema } },
      handler: updateReviewHandler(context),
    }),
    defineRoute({
      method: "post",
      path: records,
      tag,
      summary: "Submit the project for check: freezes its inputs and results as a new record",
      access: { kind: "member", role: "editor" },
      request: { params: reviewParamsSchema, body: submitRecordBodySchema },
      responses: { 201: { description: "The new record.", schema: recordSummarySchema } },
      errors: { 409: "A record of the project is already submitted for check (record_pending)." },
      handler: submitRecordHandler(context),
    }),
    defineRoute({
      method: "get",
      path: records,
      tag,
      summary: "The project's records, newest first (the revision table)",
      access: { kind: "member", role: "viewer" },
      request: { params: reviewParamsSchema },
      responses: { 200: { description: "The records.", schema: recordListSchema } },
      handler: listRecordsHandler,
    }),
    defineRoute({
      method: "get",
      path: record,
      tag,
      summary: "One record with its frozen content, its comments and its status changes",
      access: { kind: "member", role: "viewer" },
      request: { params: recordParamsSchema },
      responses: { 200: { description: "The record.", schema: recordDetailSchema } },
      handler: getRecordHandler,
    }),
    defineRoute({
      method: "get",
      path: `${record}/diff`,
      tag,
      summary:
        "What changed between two records: inputs added, changed and removed, and verdicts that changed",
      access: { kind: "member", role: "viewer" },
      request: { params: recordParamsSchema, query: recordDiffQuerySchema },
      responses: { 200: { description: "The differences.", schema: recordDiffSchema } },
      handler: diffRecordHandler,
    }),
    defineRoute({
      method: "post",
      path: `${record}/comments`,
      tag,
      summary: "Comment on a record or one of its comparison rows, or answer a comment",
      access: { kind: "member", role: "reviewer" },
      request: { params: recordParamsSchema, body: createCommentBodySchema },
      responses: { 201: { description: "The comment.", schema: recordCommentSchema } },
      errors: { 409: "The record is not open for comments (record_not_open)." },
      handler: createCommentHandler(context),
    }),
    defineRoute({
      method: "post",
      path: `${record}/return`,
      tag,
      summary: "Return a submitted record to its originator with comments (reviewers and owners)",
      access: { kind: "member", role: "reviewer" },
      request: { params: recordParamsSchema, body: returnRecordBodySchema },
      responses: { 200: { description: "The returned record.", schema: recordSummarySchema } },
      errors: {
        403: "Editors cannot return records; the submitter cannot return their own (independence).",
        409: "The record is not submitted for check (record_not_submitted).",
      },
      handler: returnRecordHandler(context),
    }),
    defineRoute({
      method: "post",
      path: `${record}/approve`,
      tag,
      summary: "Approve a submitted record (reviewers and owners, independent of it)",
      access: { kind: "member", role: "reviewer" },
      request: { params: recordParamsSchema, body: approveRecordBodySchema },
      responses: {
        200: {
          description: "The record, approved once it has the approvals it needs.",
          schema: recordSummarySchema,
        },
      },
      errors: {
        403: "Editors cannot approve; nor can whoever submitted the record or last edited one of its inputs (independence).",
        409: "The caller approved already (already_approved) or the record is not submitted (record_not_submitted).",
      },
      handler: approveRecordHandler(context),
    }),
  ];
}

import { mutationOptions, useMutation, useQueryClient, type QueryClient } from "@tanstack/react-query";
import { apiSend } from "../../lib/api-client";
import { auditKeys } from "../audit/keys";
import { projectPath } from "../project/keys";
import { invalidateKeys } from "../invalidate";
import {
  recordCommentSchema,
  recordSummarySchema,
  reviewSchema,
  type ApproveRecordBody,
  type CommentBody,
  type ReturnRecordBody,
  type SubmitRecordBody,
  type UpdateReviewBody,
} from "./api-types";
import { recordKeys } from "./keys";
import { recordsPath } from "./queries";

// Every write is also an audit event (status changes are signed and dated in the trail), so each
// one refreshes the audit trail as well. A status change moves the project's review status and
// may supersede the record before it, so it refreshes the review and every record.

const statusChanged = (queryClient: QueryClient, workspaceId: string, projectId: string) =>
  invalidateKeys(queryClient, [
    recordKeys.review(workspaceId, projectId),
    recordKeys.all(workspaceId, projectId),
    auditKeys.all(workspaceId),
  ]);

/** Owner only: one or two approvals before a record counts as approved. */
export const updateReviewMutation = (queryClient: QueryClient, workspaceId: string, projectId: string) =>
  mutationOptions({
    mutationFn: (body: UpdateReviewBody) =>
      apiSend("PATCH", `${projectPath(workspaceId, projectId)}/review`, body, reviewSchema),
    onSettled: () =>
      invalidateKeys(queryClient, [recordKeys.review(workspaceId, projectId), auditKeys.all(workspaceId)]),
  });

/** Freezes the project's inputs and results as a new record, submitted for check. */
export const submitRecordMutation = (queryClient: QueryClient, workspaceId: string, projectId: string) =>
  mutationOptions({
    mutationFn: (body: SubmitRecordBody) =>
      apiSend("POST", recordsPath(workspaceId, projectId), body, recordSummarySchema),
    onSettled: () => statusChanged(queryClient, workspaceId, projectId),
  });

/** A comment on the record, on one of its rows, or an answer to another comment: only that record changes. */
export const addCommentMutation = (
  queryClient: QueryClient,
  workspaceId: string,
  projectId: string,
  recordId: string,
) =>
  mutationOptions({
    mutationFn: (body: CommentBody) =>
      apiSend(
        "POST",
        `${recordsPath(workspaceId, projectId)}/${recordId}/comments`,
        body,
        recordCommentSchema,
      ),
    onSettled: () =>
      invalidateKeys(queryClient, [
        recordKeys.detail(workspaceId, projectId, recordId),
        auditKeys.all(workspaceId),
      ]),
  });

/** Reviewer or owner: sends the record back to the originator with a comment. */
export const returnRecordMutation = (
  queryClient: QueryClient,
  workspaceId: string,
  projectId: string,
  recordId: string,
) =>
  mutationOptions({
    mutationFn: (body: ReturnRecordBody) =>
      apiSend("POST", `${recordsPath(workspaceId, projectId)}/${recordId}/return`, body, recordSummarySchema),
    onSettled: () => statusChanged(queryClient, workspaceId, projectId),
  });

/** Reviewer or owner: one approval; the record is approved when the required number is reached. */
export const approveRecordMutation = (
  queryClient: QueryClient,
  workspaceId: string,
  projectId: string,
  recordId: string,
) =>
  mutationOptions({
    mutationFn: (body: ApproveRecordBody) =>
      apiSend(
        "POST",
        `${recordsPath(workspaceId, projectId)}/${recordId}/approve`,
        body,
        recordSummarySchema,
      ),
    onSettled: () => statusChanged(queryClient, workspaceId, projectId),
  });

export const useUpdateReview = (workspaceId: string, projectId: string) =>
  useMutation(updateReviewMutation(useQueryClient(), workspaceId, projectId));
export const useSubmitRecord = (workspaceId: string, projectId: string) =>
  useMutation(submitRecordMutation(useQueryClient(), workspaceId, projectId));
export const useAddComment = (workspaceId: string, projectId: string, recordId: string) =>
  useMutation(addCommentMutation(useQueryClient(), workspaceId, projectId, recordId));
export const useReturnRecord = (workspaceId: string, projectId: string, recordId: string) =>
  useMutation(returnRecordMutation(useQueryClient(), workspaceId, projectId, recordId));
export const useApproveRecord = (workspaceId: string, projectId: string, recordId: string) =>
  useMutation(approveRecordMutation(useQueryClient(), workspaceId, projectId, recordId));

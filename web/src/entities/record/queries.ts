import { queryOptions, useQuery } from "@tanstack/react-query";
import { ApiError, apiGet } from "../../lib/api-client";
import { projectPath } from "../project/keys";
import { recordDetailSchema, recordDiffSchema, recordListSchema, reviewSchema } from "./api-types";
import { recordKeys } from "./keys";

/** Base path of a project's record routes. */
export const recordsPath = (workspaceId: string, projectId: string) =>
  `${projectPath(workspaceId, projectId)}/records`;

export const getReview = (workspaceId: string, projectId: string) =>
  apiGet(`${projectPath(workspaceId, projectId)}/review`, reviewSchema);

export const listRecords = (workspaceId: string, projectId: string) =>
  apiGet(recordsPath(workspaceId, projectId), recordListSchema).then((r) => r.records);

export const getRecord = (workspaceId: string, projectId: string, recordId: string) =>
  apiGet(`${recordsPath(workspaceId, projectId)}/${recordId}`, recordDetailSchema);

/** The diff, or null when there is nothing before this record to compare with (the API's 404). */
export const getRecordDiff = (
  workspaceId: string,
  projectId: string,
  recordId: string,
  against: string | null,
) =>
  apiGet(
    `${recordsPath(workspaceId, projectId)}/${recordId}/diff${against ? `?against=${against}` : ""}`,
    recordDiffSchema,
  ).catch((error: unknown) => {
    if (error instanceof ApiError && error.status === 404) return null;
    throw error;
  });

/**
 * The project's review status. Refetched whenever a page shows it: a teammate's submission or
 * approval elsewhere invalidates nothing in this browser.
 */
export const reviewQueryOptions = (workspaceId: string, projectId: string) =>
  queryOptions({
    queryKey: recordKeys.review(workspaceId, projectId),
    queryFn: () => getReview(workspaceId, projectId),
    refetchOnMount: "always",
    retry: false,
  });

export const recordsQueryOptions = (workspaceId: string, projectId: string) =>
  queryOptions({
    queryKey: recordKeys.list(workspaceId, projectId),
    queryFn: () => listRecords(workspaceId, projectId),
    refetchOnMount: "always",
  });

export const recordQueryOptions = (workspaceId: string, projectId: string, recordId: string) =>
  queryOptions({
    queryKey: recordKeys.detail(workspaceId, projectId, recordId),
    queryFn: () => getRecord(workspaceId, projectId, recordId),
    refetchOnMount: "always",
    retry: false,
  });

export const recordDiffQueryOptions = (
  workspaceId: string,
  projectId: string,
  recordId: string,
  against: string | null = null,
) =>
  queryOptions({
    queryKey: recordKeys.diff(workspaceId, projectId, recordId, against),
    queryFn: () => getRecordDiff(workspaceId, projectId, recordId, against),
    retry: false,
  });

/** Status, revision being worked on, latest and last approved record, and whether today's results differ. */
export const useReview = (workspaceId: string, projectId: string) =>
  useQuery(reviewQueryOptions(workspaceId, projectId));

/** Every record of the project, newest first (the revision table). */
export const useRecords = (workspaceId: string, projectId: string) =>
  useQuery(recordsQueryOptions(workspaceId, projectId));

/** One frozen record with its content, comments and events. */
export const useRecord = (workspaceId: string, projectId: string, recordId: string) =>
  useQuery(recordQueryOptions(workspaceId, projectId, recordId));

/** What changed since the previous record (or `against`); data null when there is none. */
export const useRecordDiff = (
  workspaceId: string,
  projectId: string,
  recordId: string,
  against: string | null = null,
) => useQuery(recordDiffQueryOptions(workspaceId, projectId, recordId, against));

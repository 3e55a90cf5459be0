import { keepPreviousData, queryOptions, useQuery } from "@tanstack/react-query";
import {
  linearizationPreviewSchema,
  type LinearizationInputBody,
} from "../../../../../core/contract/linearizations";
import { apiSend } from "../../../lib/api-client";
import { linearizationKeys, linearizationsPath } from "./keys";

export const previewLinearization = (
  workspaceId: string,
  projectId: string,
  loadCaseId: string,
  body: LinearizationInputBody,
) =>
  apiSend(
    "POST",
    `${linearizationsPath(workspaceId, projectId, loadCaseId)}/preview`,
    body,
    linearizationPreviewSchema,
  ).then((r) => r.result);

/**
 * The server's linearization of the form as it stands (nothing saved), keyed by the body's text so
 * the same inputs are not sent twice; the previous result stays on screen while the next computes.
 */
export const previewQueryOptions = (
  workspaceId: string,
  projectId: string,
  loadCaseId: string,
  body: LinearizationInputBody | null,
) =>
  queryOptions({
    queryKey: linearizationKeys.preview(workspaceId, projectId, loadCaseId, JSON.stringify(body)),
    queryFn: () => previewLinearization(workspaceId, projectId, loadCaseId, body!),
    enabled: body !== null && loadCaseId !== "",
    placeholderData: keepPreviousData,
    retry: false,
    staleTime: Infinity,
  });

export const usePreviewLinearization = (
  workspaceId: string,
  projectId: string,
  loadCaseId: string,
  body: LinearizationInputBody | null,
) => useQuery(previewQueryOptions(workspaceId, projectId, loadCaseId, body));

import { keepPreviousData, queryOptions, useQuery } from "@tanstack/react-query";
import {
  pathFromPointTableResponseSchema,
  type PathFromPointTableBody,
} from "../../../../../core/contract/linearizations";
import { apiSend } from "../../../lib/api-client";
import { linearizationKeys, linearizationsPath } from "./keys";

export const pathFromPointTable = (
  workspaceId: string,
  projectId: string,
  loadCaseId: string,
  body: PathFromPointTableBody,
) =>
  apiSend(
    "POST",
    `${linearizationsPath(workspaceId, projectId, loadCaseId)}/path-from-point-table`,
    body,
    pathFromPointTableResponseSchema,
  );

/**
 * The path the server picks out of a stored point table for the ends and tolerance as typed
 * (nothing saved), keyed by the request's text; the previous answer stays while the next comes.
 */
export const pathFromPointTableQueryOptions = (
  workspaceId: string,
  projectId: string,
  loadCaseId: string,
  body: PathFromPointTableBody | null,
) =>
  queryOptions({
    queryKey: linearizationKeys.pick(workspaceId, projectId, loadCaseId, JSON.stringify(body)),
    queryFn: () => pathFromPointTable(workspaceId, projectId, loadCaseId, body!),
    enabled: body !== null && loadCaseId !== "",
    placeholderData: keepPreviousData,
    retry: false,
    staleTime: Infinity,
  });

export const usePathFromPointTable = (
  workspaceId: string,
  projectId: string,
  loadCaseId: string,
  body: PathFromPointTableBody | null,
) => useQuery(pathFromPointTableQueryOptions(workspaceId, projectId, loadCaseId, body));

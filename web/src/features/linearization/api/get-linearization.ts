import { queryOptions, useQuery } from "@tanstack/react-query";
import { linearizationResponseSchema } from "../../../../../core/contract/linearizations";
import { apiGet } from "../../../lib/api-client";
import { linearizationKeys, linearizationsPath } from "./keys";

export const getLinearization = (workspaceId: string, projectId: string, loadCaseId: string, id: string) =>
  apiGet(`${linearizationsPath(workspaceId, projectId, loadCaseId)}/${id}`, linearizationResponseSchema).then(
    (r) => r.linearization,
  );

export const linearizationQueryOptions = (
  workspaceId: string,
  projectId: string,
  loadCaseId: string,
  id: string,
) =>
  queryOptions({
    queryKey: linearizationKeys.detail(workspaceId, projectId, loadCaseId, id),
    queryFn: () => getLinearization(workspaceId, projectId, loadCaseId, id),
    enabled: loadCaseId !== "" && id !== "",
  });

/** One saved line with its inputs and the server's result. */
export const useLinearization = (workspaceId: string, projectId: string, loadCaseId: string, id: string) =>
  useQuery(linearizationQueryOptions(workspaceId, projectId, loadCaseId, id));

import { queryOptions, useQuery } from "@tanstack/react-query";
import { linearizationListSchema } from "../../../../../core/contract/linearizations";
import { apiGet } from "../../../lib/api-client";
import { linearizationKeys, linearizationsPath } from "./keys";

export const listLinearizations = (workspaceId: string, projectId: string, loadCaseId: string) =>
  apiGet(linearizationsPath(workspaceId, projectId, loadCaseId), linearizationListSchema);

export const linearizationsQueryOptions = (workspaceId: string, projectId: string, loadCaseId: string) =>
  queryOptions({
    queryKey: linearizationKeys.list(workspaceId, projectId, loadCaseId),
    queryFn: () => listLinearizations(workspaceId, projectId, loadCaseId),
    enabled: loadCaseId !== "",
  });

/** The saved lines of a load case (without their points). */
export const useLinearizations = (workspaceId: string, projectId: string, loadCaseId: string) =>
  useQuery(linearizationsQueryOptions(workspaceId, projectId, loadCaseId));

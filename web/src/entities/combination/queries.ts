import { queryOptions, useQuery } from "@tanstack/react-query";
import { combinationListSchema } from "../../../../core/contract/combinations";
import { apiGet } from "../../lib/api-client";
import { projectPath } from "../project/keys";
import { combinationKeys } from "./keys";

/** Base path of a project's combination routes. */
export const combinationsPath = (workspaceId: string, projectId: string) =>
  `${projectPath(workspaceId, projectId)}/combinations`;

export const listCombinations = (workspaceId: string, projectId: string) =>
  apiGet(combinationsPath(workspaceId, projectId), combinationListSchema).then((r) => r.combinations);

export const combinationsQueryOptions = (workspaceId: string, projectId: string) =>
  queryOptions({
    queryKey: combinationKeys.list(workspaceId, projectId),
    queryFn: () => listCombinations(workspaceId, projectId),
  });

/** The project's combinations: factored sums of its load cases. */
export const useCombinations = (workspaceId: string, projectId: string) =>
  useQuery(combinationsQueryOptions(workspaceId, projectId));

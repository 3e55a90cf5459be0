import { projectKeys } from "../project/keys";

/** Query keys of a project's comparison; `all` covers every page of it. */
export const comparisonKeys = {
  all: (workspaceId: string, projectId: string) =>
    [...projectKeys.scope(workspaceId, projectId), "comparison"] as const,
  page: (workspaceId: string, projectId: string, page: number) =>
    [...comparisonKeys.all(workspaceId, projectId), page] as const,
};

import { projectKeys } from "../project/keys";

/** Query keys of a project's load cases; a case's state histories sit under the case. */
export const loadCaseKeys = {
  list: (workspaceId: string, projectId: string) =>
    [...projectKeys.scope(workspaceId, projectId), "load-cases"] as const,
  detail: (workspaceId: string, projectId: string, loadCaseId: string) =>
    [...projectKeys.scope(workspaceId, projectId), "load-case", loadCaseId] as const,
  history: (workspaceId: string, projectId: string, loadCaseId: string, locationId: string) =>
    [...loadCaseKeys.detail(workspaceId, projectId, loadCaseId), "history", locationId] as const,
};

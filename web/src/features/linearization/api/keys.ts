import { projectKeys, projectPath } from "../../../entities/project/keys";

/** Query keys of a load case's linearizations, under the project's scope (a project's invalidation covers them). */
export const linearizationKeys = {
  all: (workspaceId: string, projectId: string) =>
    [...projectKeys.scope(workspaceId, projectId), "linearizations"] as const,
  list: (workspaceId: string, projectId: string, loadCaseId: string) =>
    [...linearizationKeys.all(workspaceId, projectId), loadCaseId, "list"] as const,
  detail: (workspaceId: string, projectId: string, loadCaseId: string, id: string) =>
    [...linearizationKeys.all(workspaceId, projectId), loadCaseId, id] as const,
  preview: (workspaceId: string, projectId: string, loadCaseId: string, body: string) =>
    [...linearizationKeys.all(workspaceId, projectId), loadCaseId, "preview", body] as const,
  /** A path picked from a point table; under the case, so a new upload's invalidation of the project refreshes it. */
  pick: (workspaceId: string, projectId: string, loadCaseId: string, body: string) =>
    [...linearizationKeys.all(workspaceId, projectId), loadCaseId, "pick", body] as const,
};

/** Base path of a load case's linearization routes. */
export const linearizationsPath = (workspaceId: string, projectId: string, loadCaseId: string) =>
  `${projectPath(workspaceId, projectId)}/load-cases/${loadCaseId}/linearizations`;

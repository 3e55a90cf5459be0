import { workspaceKeys } from "../workspace/keys";

/**
 * Query keys of projects. Every list and record of one project (its load cases, locations,
 * combinations, comparison) sits under `scope(...)`, and every project's under `all(...)`.
 */
export const projectKeys = {
  list: (workspaceId: string) => [...workspaceKeys.scope(workspaceId), "projects"] as const,
  all: (workspaceId: string) => [...workspaceKeys.scope(workspaceId), "project"] as const,
  scope: (workspaceId: string, projectId: string) => [...projectKeys.all(workspaceId), projectId] as const,
  detail: (workspaceId: string, projectId: string) =>
    [...projectKeys.scope(workspaceId, projectId), "record"] as const,
};

/** Base path of a project's API routes. */
export const projectPath = (workspaceId: string, projectId: string) =>
  `/workspaces/${workspaceId}/projects/${projectId}`;

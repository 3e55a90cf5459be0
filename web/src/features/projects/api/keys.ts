/** Query keys of the project area; every list and record of one project sits under `project(...)`. */
export const projectKeys = {
  workspace: (workspaceId: string) => ["project-area", workspaceId, "workspace"] as const,
  projects: (workspaceId: string) => ["project-area", workspaceId, "projects"] as const,
  project: (workspaceId: string, projectId: string) =>
    ["project-area", workspaceId, "projects", projectId] as const,
  materials: (workspaceId: string) => ["project-area", workspaceId, "materials"] as const,
  trash: (workspaceId: string) => ["project-area", workspaceId, "trash"] as const,
  audit: (workspaceId: string, projectId?: string) =>
    ["project-area", workspaceId, "audit", projectId ?? "all"] as const,
};

/** Base path of a project's API routes. */
export const projectPath = (workspaceId: string, projectId: string) =>
  `/workspaces/${workspaceId}/projects/${projectId}`;

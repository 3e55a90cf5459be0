import { workspaceKeys } from "../workspace/keys";

/** Query keys of the audit trail: the workspace's, or one project's (`all` covers both). */
export const auditKeys = {
  all: (workspaceId: string) => [...workspaceKeys.scope(workspaceId), "audit"] as const,
  list: (workspaceId: string, projectId?: string) =>
    [...auditKeys.all(workspaceId), projectId ?? "all"] as const,
};

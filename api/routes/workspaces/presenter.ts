import type { Role, Workspace } from "../../../core/contract/workspaces";
import type { Workspace as WorkspaceRow } from "../../../db/models/workspace";

/** A workspace as the caller (with `role`) sees it. */
export function presentWorkspace(workspace: WorkspaceRow, role: Role, memberCount: number): Workspace {
  return {
    id: workspace.id,
    name: workspace.name,
    role,
    memberCount,
    createdAt: workspace.createdAt.toISOString(),
  };
}

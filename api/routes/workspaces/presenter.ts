import type { Role, Workspace } from "../../../core/contract/workspaces";
import type { WorkspaceRow } from "../../../db/repositories/workspaces";

/** A workspace as the caller (with `role`) sees it. */
export function presentWorkspace(
  workspace: Pick<WorkspaceRow, "id" | "name" | "createdAt">,
  role: Role,
  memberCount: number,
): Workspace {
  return {
    id: workspace.id,
    name: workspace.name,
    role,
    memberCount,
    createdAt: workspace.createdAt.toISOString(),
  };
}

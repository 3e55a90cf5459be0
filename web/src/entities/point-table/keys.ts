import { projectKeys } from "../project/keys";

/** Query keys of a load case's point tables; they sit under the project's scope like its cases. */
export const pointTableKeys = {
  list: (workspaceId: string, projectId: string, caseId: string) =>
    [...projectKeys.scope(workspaceId, projectId), "point-tables", caseId] as const,
  detail: (workspaceId: string, projectId: string, caseId: string, tableId: string) =>
    [...pointTableKeys.list(workspaceId, projectId, caseId), tableId] as const,
  /**
   * A stored table's points, which never change once stored: outside the list's subtree, so
   * storing or deleting another table (which refreshes the list) does not download tens of
   * megabytes again.
   */
  points: (workspaceId: string, projectId: string, tableId: string) =>
    [...projectKeys.scope(workspaceId, projectId), "point-table-points", tableId] as const,
  /** The points as binary columns. */
  columns: (workspaceId: string, projectId: string, tableId: string) =>
    [...pointTableKeys.points(workspaceId, projectId, tableId), "columns"] as const,
  /** The point ids in table order. */
  ids: (workspaceId: string, projectId: string, tableId: string) =>
    [...pointTableKeys.points(workspaceId, projectId, tableId), "ids"] as const,
};

import { projectKeys } from "../project/keys";

/** Query keys of a load case's point tables; they sit under the project's scope like its cases. */
export const pointTableKeys = {
  list: (workspaceId: string, projectId: string, caseId: string) =>
    [...projectKeys.scope(workspaceId, projectId), "point-tables", caseId] as const,
  detail: (workspaceId: string, projectId: string, caseId: string, tableId: string) =>
    [...pointTableKeys.list(workspaceId, projectId, caseId), tableId] as const,
  /** A stored table's points as binary columns (they never change once stored). */
  columns: (workspaceId: string, projectId: string, caseId: string, tableId: string) =>
    [...pointTableKeys.detail(workspaceId, projectId, caseId, tableId), "columns"] as const,
  /** A stored table's point ids in table order. */
  ids: (workspaceId: string, projectId: string, caseId: string, tableId: string) =>
    [...pointTableKeys.detail(workspaceId, projectId, caseId, tableId), "ids"] as const,
};

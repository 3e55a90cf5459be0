import { queryOptions, useQuery } from "@tanstack/react-query";
import { apiGet } from "../../lib/api-client";
import { projectPath } from "../project/keys";
import { pointTableListSchema, pointTableSchema } from "./contract";
import { pointTableKeys } from "./keys";

/** Base path of a load case's point-table routes. */
export const pointTablesPath = (workspaceId: string, projectId: string, caseId: string) =>
  `${projectPath(workspaceId, projectId)}/load-cases/${caseId}/point-tables`;

export const listPointTables = (workspaceId: string, projectId: string, caseId: string) =>
  apiGet(pointTablesPath(workspaceId, projectId, caseId), pointTableListSchema);

export const pointTablesQueryOptions = (workspaceId: string, projectId: string, caseId: string) =>
  queryOptions({
    queryKey: pointTableKeys.list(workspaceId, projectId, caseId),
    queryFn: () => listPointTables(workspaceId, projectId, caseId),
  });

/** The load case's stored point tables, newest first as the server lists them. */
export const usePointTables = (workspaceId: string, projectId: string, caseId: string) =>
  useQuery(pointTablesQueryOptions(workspaceId, projectId, caseId));

export const getPointTable = (workspaceId: string, projectId: string, caseId: string, tableId: string) =>
  apiGet(`${pointTablesPath(workspaceId, projectId, caseId)}/${tableId}`, pointTableSchema);

/** Where the stored table's original text downloads from (a plain link: the browser saves it). */
export const pointTableDownloadHref = (
  workspaceId: string,
  projectId: string,
  caseId: string,
  tableId: string,
) => `/api${pointTablesPath(workspaceId, projectId, caseId)}/${tableId}/download`;

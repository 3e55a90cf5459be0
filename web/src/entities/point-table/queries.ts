import { queryOptions, useQuery } from "@tanstack/react-query";
import { apiGet } from "../../lib/api-client";
import { projectPath } from "../project/keys";
import { fetchPointColumns } from "./columns";
import { pointTableDetailSchema, pointTableIdsSchema, storedPointTableListSchema } from "./contract";
import { pointTableKeys } from "./keys";

/** Base path of a load case's point-table routes. */
export const pointTablesPath = (workspaceId: string, projectId: string, caseId: string) =>
  `${projectPath(workspaceId, projectId)}/load-cases/${caseId}/point-tables`;

export const listPointTables = (workspaceId: string, projectId: string, caseId: string) =>
  apiGet(pointTablesPath(workspaceId, projectId, caseId), storedPointTableListSchema);

export const pointTablesQueryOptions = (workspaceId: string, projectId: string, caseId: string) =>
  queryOptions({
    queryKey: pointTableKeys.list(workspaceId, projectId, caseId),
    queryFn: () => listPointTables(workspaceId, projectId, caseId),
  });

/** The load case's stored point tables, newest first as the server lists them. */
export const usePointTables = (workspaceId: string, projectId: string, caseId: string) =>
  useQuery(pointTablesQueryOptions(workspaceId, projectId, caseId));

/** The ids that name one stored table. */
export type PointTableIds = { workspaceId: string; projectId: string; caseId: string; tableId: string };

const tablePath = (t: PointTableIds) =>
  `${pointTablesPath(t.workspaceId, t.projectId, t.caseId)}/${t.tableId}`;

/** One stored table with its whole evaluation (per criterion, histogram, worst points) as the server rated it. */
export const getPointTable = (t: PointTableIds) => apiGet(tablePath(t), pointTableDetailSchema);

export const pointTableQueryOptions = (t: PointTableIds) =>
  queryOptions({
    queryKey: pointTableKeys.detail(t.workspaceId, t.projectId, t.caseId, t.tableId),
    queryFn: () => getPointTable(t),
  });

export const usePointTable = (t: PointTableIds, enabled = true) =>
  useQuery({ ...pointTableQueryOptions(t), enabled });

/** A stored table's point ids in table order (1…n when the table maps no id column). */
export const getPointTableIds = (t: PointTableIds) => apiGet(`${tablePath(t)}/ids`, pointTableIdsSchema);

/**
 * The ids, kept as long as the columns: a stored table's points never change, so they are never
 * stale, and a million ids are not compared entry by entry with the last answer.
 */
export const pointTableIdsQueryOptions = (t: PointTableIds) =>
  queryOptions({
    queryKey: pointTableKeys.ids(t.workspaceId, t.projectId, t.tableId),
    queryFn: () => getPointTableIds(t),
    staleTime: Infinity,
    gcTime: 60_000,
    structuralSharing: false,
    retry: false,
  });

/**
 * A stored table's points as binary columns, with the download's progress to `onProgress`.
 * Cancelling the query (`queryClient.cancelQueries` with its key) aborts the download. Never
 * stale (stored points do not change), dropped a minute after the last screen that showed them
 * (they can be tens of megabytes), and not tried again by itself (the engineer asks).
 */
export const pointTableColumnsQueryOptions = (
  t: PointTableIds,
  onProgress: (received: number, total: number) => void,
) =>
  queryOptions({
    queryKey: pointTableKeys.columns(t.workspaceId, t.projectId, t.tableId),
    queryFn: ({ signal }) => fetchPointColumns(`/api${tablePath(t)}/columns`, { signal, onProgress }),
    staleTime: Infinity,
    gcTime: 60_000,
    structuralSharing: false,
    retry: false,
  });

/** Where the stored table's original text downloads from (a plain link: the browser saves it). */
export const pointTableDownloadHref = (
  workspaceId: string,
  projectId: string,
  caseId: string,
  tableId: string,
) => `/api${pointTablesPath(workspaceId, projectId, caseId)}/${tableId}/download`;

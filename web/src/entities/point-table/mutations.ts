import { mutationOptions, useMutation, useQueryClient, type QueryClient } from "@tanstack/react-query";
import { apiSend } from "../../lib/api-client";
import { auditKeys } from "../audit/keys";
import { comparisonKeys } from "../comparison/keys";
import { invalidateKeys } from "../invalidate";
import { loadCaseKeys } from "../load-case/keys";
import { locationKeys } from "../location/keys";
import { keepPointsResponseSchema, pointTableSchema, type CreatePointTableBody } from "./contract";
import { pointTableKeys } from "./keys";
import { pointTablesPath } from "./queries";

// Every write is also an audit event. A table joins the comparison (one summary row per table),
// so adding or removing one changes it too.

/** Registers a table (its name, size, hash and mapping); its bytes follow with `uploadPointTableContent`. */
export const createPointTableMutation = (
  queryClient: QueryClient,
  workspaceId: string,
  projectId: string,
  caseId: string,
) =>
  mutationOptions({
    mutationFn: (body: CreatePointTableBody) =>
      apiSend("POST", pointTablesPath(workspaceId, projectId, caseId), body, pointTableSchema),
    onSettled: () =>
      invalidateKeys(queryClient, [
        pointTableKeys.list(workspaceId, projectId, caseId),
        comparisonKeys.all(workspaceId, projectId),
        auditKeys.all(workspaceId),
      ]),
  });

export const deletePointTableMutation = (
  queryClient: QueryClient,
  workspaceId: string,
  projectId: string,
  caseId: string,
) =>
  mutationOptions({
    mutationFn: (tableId: string) =>
      apiSend("DELETE", `${pointTablesPath(workspaceId, projectId, caseId)}/${tableId}`, undefined, null),
    onSettled: (_nothing, _error, tableId) =>
      invalidateKeys(queryClient, [
        pointTableKeys.detail(workspaceId, projectId, caseId, tableId),
        pointTableKeys.list(workspaceId, projectId, caseId),
        comparisonKeys.all(workspaceId, projectId),
        auditKeys.all(workspaceId),
      ]),
  });

/** What "keep as location" sends: the chosen points by their id in the table. */
export type KeepPointsVariables = { tableId: string; points: (number | string)[]; namePrefix?: string };

/**
 * Promotes points to project locations with their state saved in this case: the locations, the
 * load cases (a new state each) and the comparison change.
 */
export const keepPointsMutation = (
  queryClient: QueryClient,
  workspaceId: string,
  projectId: string,
  caseId: string,
) =>
  mutationOptions({
    mutationFn: (v: KeepPointsVariables) =>
      apiSend(
        "POST",
        `${pointTablesPath(workspaceId, projectId, caseId)}/${v.tableId}/keep`,
        v.namePrefix === undefined ? { points: v.points } : { points: v.points, namePrefix: v.namePrefix },
        keepPointsResponseSchema,
      ),
    onSettled: () =>
      invalidateKeys(queryClient, [
        locationKeys.list(workspaceId, projectId),
        loadCaseKeys.list(workspaceId, projectId),
        comparisonKeys.all(workspaceId, projectId),
        auditKeys.all(workspaceId),
      ]),
  });

export const useCreatePointTable = (workspaceId: string, projectId: string, caseId: string) =>
  useMutation(createPointTableMutation(useQueryClient(), workspaceId, projectId, caseId));
export const useDeletePointTable = (workspaceId: string, projectId: string, caseId: string) =>
  useMutation(deletePointTableMutation(useQueryClient(), workspaceId, projectId, caseId));
export const useKeepPoints = (workspaceId: string, projectId: string, caseId: string) =>
  useMutation(keepPointsMutation(useQueryClient(), workspaceId, projectId, caseId));

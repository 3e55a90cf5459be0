import {
  mutationOptions,
  useMutation,
  useQueryClient,
  type QueryClient,
  type QueryKey,
} from "@tanstack/react-query";
import type { TrashKind } from "../../../../core/contract/projects";
import { apiSend } from "../../lib/api-client";
import { auditKeys } from "../audit/keys";
import { invalidateKeys } from "../invalidate";
import { materialKeys } from "../material/keys";
import { projectKeys } from "../project/keys";
import { trashKeys } from "./keys";

/** A trashed item; `projectId` names the project a location, load case or combination belongs to. */
export type TrashTarget = { kind: TrashKind; id: string; projectId?: string | null };

/**
 * What coming back from the trash changes besides the trash: the list it returns to. A part of a
 * project refreshes that project; a material refreshes every project (they refer to it).
 */
export function restoredKeys(workspaceId: string, item: TrashTarget): QueryKey[] {
  switch (item.kind) {
    case "project":
      return [projectKeys.list(workspaceId)];
    case "material":
      return [materialKeys.list(workspaceId), projectKeys.all(workspaceId)];
    default:
      return [item.projectId ? projectKeys.scope(workspaceId, item.projectId) : projectKeys.all(workspaceId)];
  }
}

export const restoreMutation = (queryClient: QueryClient, workspaceId: string) =>
  mutationOptions({
    mutationFn: (v: TrashTarget) =>
      apiSend("POST", `/workspaces/${workspaceId}/trash/${v.kind}/${v.id}/restore`, undefined, null),
    onSettled: (_nothing, _error, v) =>
      invalidateKeys(queryClient, [
        trashKeys.list(workspaceId),
        ...restoredKeys(workspaceId, v),
        auditKeys.all(workspaceId),
      ]),
  });

/** Deletes a trashed item for good (owners only; the API refuses anyone else). */
export const purgeMutation = (queryClient: QueryClient, workspaceId: string) =>
  mutationOptions({
    mutationFn: (v: TrashTarget) =>
      apiSend("DELETE", `/workspaces/${workspaceId}/trash/${v.kind}/${v.id}`, undefined, null),
    onSettled: () => invalidateKeys(queryClient, [trashKeys.list(workspaceId), auditKeys.all(workspaceId)]),
  });

export const useRestore = (workspaceId: string) =>
  useMutation(restoreMutation(useQueryClient(), workspaceId));
export const usePurge = (workspaceId: string) => useMutation(purgeMutation(useQueryClient(), workspaceId));

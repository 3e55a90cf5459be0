import { mutationOptions, useMutation, useQueryClient, type QueryClient } from "@tanstack/react-query";
import {
  combinationResponseSchema,
  type CreateCombinationBody,
  type UpdateCombinationBody,
} from "../../../../core/contract/combinations";
import { apiSend } from "../../lib/api-client";
import { auditKeys } from "../audit/keys";
import { comparisonKeys } from "../comparison/keys";
import { invalidateKeys } from "../invalidate";
import { trashKeys } from "../trash/keys";
import { combinationKeys } from "./keys";
import { combinationsPath } from "./queries";

/** A combination's change: its list and the comparison (which has a row per combination); and the audit trail. */
const changed = (workspaceId: string, projectId: string) => [
  combinationKeys.list(workspaceId, projectId),
  comparisonKeys.all(workspaceId, projectId),
  auditKeys.all(workspaceId),
];

export const createCombinationMutation = (queryClient: QueryClient, workspaceId: string, projectId: string) =>
  mutationOptions({
    mutationFn: (body: Omit<CreateCombinationBody, "description"> & { description?: string }) =>
      apiSend("POST", combinationsPath(workspaceId, projectId), body, combinationResponseSchema),
    onSettled: () => invalidateKeys(queryClient, changed(workspaceId, projectId)),
  });

/** Saves over the version the edit started from; a stale version gets 409 with the current record. */
export const updateCombinationMutation = (queryClient: QueryClient, workspaceId: string, projectId: string) =>
  mutationOptions({
    mutationFn: ({ id, ...body }: UpdateCombinationBody & { id: string }) =>
      apiSend(
        "PATCH",
        `${combinationsPath(workspaceId, projectId)}/${id}`,
        body,
        combinationResponseSchema,
      ).then((r) => r.combination),
    onSettled: () => invalidateKeys(queryClient, changed(workspaceId, projectId)),
  });

/** Moves a combination to the trash. */
export const deleteCombinationMutation = (queryClient: QueryClient, workspaceId: string, projectId: string) =>
  mutationOptions({
    mutationFn: (id: string) =>
      apiSend("DELETE", `${combinationsPath(workspaceId, projectId)}/${id}`, undefined, null),
    onSettled: () =>
      invalidateKeys(queryClient, [...changed(workspaceId, projectId), trashKeys.list(workspaceId)]),
  });

/** Create, change and delete a project's combinations. */
export function useCombinationMutations(workspaceId: string, projectId: string) {
  const queryClient = useQueryClient();
  return {
    create: useMutation(createCombinationMutation(queryClient, workspaceId, projectId)),
    update: useMutation(updateCombinationMutation(queryClient, workspaceId, projectId)),
    remove: useMutation(deleteCombinationMutation(queryClient, workspaceId, projectId)),
  };
}

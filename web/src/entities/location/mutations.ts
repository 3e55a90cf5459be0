import { mutationOptions, useMutation, useQueryClient, type QueryClient } from "@tanstack/react-query";
import {
  locationResponseSchema,
  type CreateLocationBody,
  type UpdateLocationBody,
} from "../../../../core/contract/projects";
import { apiSend } from "../../lib/api-client";
import { auditKeys } from "../audit/keys";
import { comparisonKeys } from "../comparison/keys";
import { invalidateKeys } from "../invalidate";
import { loadCaseKeys } from "../load-case/keys";
import { trashKeys } from "../trash/keys";
import { locationKeys } from "./keys";
import { locationsPath } from "./queries";

// Every write is also an audit event, so each one refreshes the audit trail as well. The
// comparison has a row per location, so every change of one changes it.

export const createLocationMutation = (queryClient: QueryClient, workspaceId: string, projectId: string) =>
  mutationOptions({
    mutationFn: (body: Partial<CreateLocationBody> & { name: string }) =>
      apiSend("POST", locationsPath(workspaceId, projectId), body, locationResponseSchema),
    onSettled: () =>
      invalidateKeys(queryClient, [
        locationKeys.list(workspaceId, projectId),
        comparisonKeys.all(workspaceId, projectId),
        auditKeys.all(workspaceId),
      ]),
  });

/** Renames a location or changes its material. */
export const updateLocationMutation = (queryClient: QueryClient, workspaceId: string, projectId: string) =>
  mutationOptions({
    mutationFn: (v: { id: string; body: UpdateLocationBody }) =>
      apiSend("PATCH", `${locationsPath(workspaceId, projectId)}/${v.id}`, v.body, locationResponseSchema),
    onSettled: (_answer, _error, v) =>
      invalidateKeys(queryClient, [
        locationKeys.detail(workspaceId, projectId, v.id),
        locationKeys.list(workspaceId, projectId),
        comparisonKeys.all(workspaceId, projectId),
        auditKeys.all(workspaceId),
      ]),
  });

/** Moves a location to the trash: the load cases' states there leave the table with it. */
export const deleteLocationMutation = (queryClient: QueryClient, workspaceId: string, projectId: string) =>
  mutationOptions({
    mutationFn: (id: string) =>
      apiSend("DELETE", `${locationsPath(workspaceId, projectId)}/${id}`, undefined, null),
    onSettled: (_nothing, _error, id) =>
      invalidateKeys(queryClient, [
        locationKeys.detail(workspaceId, projectId, id),
        locationKeys.list(workspaceId, projectId),
        loadCaseKeys.list(workspaceId, projectId),
        comparisonKeys.all(workspaceId, projectId),
        trashKeys.list(workspaceId),
        auditKeys.all(workspaceId),
      ]),
  });

export const useCreateLocation = (workspaceId: string, projectId: string) =>
  useMutation(createLocationMutation(useQueryClient(), workspaceId, projectId));
export const useUpdateLocation = (workspaceId: string, projectId: string) =>
  useMutation(updateLocationMutation(useQueryClient(), workspaceId, projectId));
export const useDeleteLocation = (workspaceId: string, projectId: string) =>
  useMutation(deleteLocationMutation(useQueryClient(), workspaceId, projectId));

/** Create, change and delete a project's locations. */
export function useLocationMutations(workspaceId: string, projectId: string) {
  return {
    create: useCreateLocation(workspaceId, projectId),
    update: useUpdateLocation(workspaceId, projectId),
    remove: useDeleteLocation(workspaceId, projectId),
  };
}

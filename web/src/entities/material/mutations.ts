import { mutationOptions, useMutation, useQueryClient, type QueryClient } from "@tanstack/react-query";
import {
  materialResponseSchema,
  type MaterialInput,
  type UpdateMaterialBody,
} from "../../../../core/contract/materials";
import { apiSend } from "../../lib/api-client";
import { auditKeys } from "../audit/keys";
import { invalidateKeys } from "../invalidate";
import { projectKeys } from "../project/keys";
import { trashKeys } from "../trash/keys";
import { materialKeys } from "./keys";

const materialsPath = (workspaceId: string) => `/workspaces/${workspaceId}/materials`;

export const createMaterialMutation = (queryClient: QueryClient, workspaceId: string) =>
  mutationOptions({
    mutationFn: (body: Partial<MaterialInput> & { name: string }) =>
      apiSend("POST", materialsPath(workspaceId), body, materialResponseSchema),
    onSettled: () =>
      invalidateKeys(queryClient, [materialKeys.list(workspaceId), auditKeys.all(workspaceId)]),
  });

/**
 * Projects refer to library materials (as a default or at a location), so changing or trashing
 * one changes what every project of the workspace shows and checks.
 */
const changedWithProjects = (workspaceId: string) => [
  materialKeys.list(workspaceId),
  projectKeys.all(workspaceId),
  auditKeys.all(workspaceId),
];

/** Saves a library material over the version the edit started from (409 when it moved on). */
export const updateMaterialMutation = (queryClient: QueryClient, workspaceId: string) =>
  mutationOptions({
    mutationFn: ({ id, ...body }: UpdateMaterialBody & { id: string }) =>
      apiSend("PATCH", `${materialsPath(workspaceId)}/${id}`, body, materialResponseSchema).then(
        (r) => r.material,
      ),
    onSettled: () => invalidateKeys(queryClient, changedWithProjects(workspaceId)),
  });

export const deleteMaterialMutation = (queryClient: QueryClient, workspaceId: string) =>
  mutationOptions({
    mutationFn: (id: string) => apiSend("DELETE", `${materialsPath(workspaceId)}/${id}`, undefined, null),
    onSettled: () =>
      invalidateKeys(queryClient, [...changedWithProjects(workspaceId), trashKeys.list(workspaceId)]),
  });

export const useCreateMaterial = (workspaceId: string) =>
  useMutation(createMaterialMutation(useQueryClient(), workspaceId));
export const useUpdateMaterial = (workspaceId: string) =>
  useMutation(updateMaterialMutation(useQueryClient(), workspaceId));
export const useDeleteMaterial = (workspaceId: string) =>
  useMutation(deleteMaterialMutation(useQueryClient(), workspaceId));

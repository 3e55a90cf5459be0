import { useMutation, useQuery, useQueryClient } from "@tanstack/react-query";
import {
  materialListSchema,
  materialResponseSchema,
  type MaterialInput,
  type UpdateMaterialBody,
} from "../../../../../core/contract/materials";
import { apiGet, apiSend } from "../../../lib/api-client";
import { projectKeys } from "./keys";

/** The library and the built-in list of published grades. */
export const useMaterials = (workspaceId: string) =>
  useQuery({
    queryKey: projectKeys.materials(workspaceId),
    queryFn: () => apiGet(`/workspaces/${workspaceId}/materials`, materialListSchema),
  });

export function useCreateMaterial(workspaceId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (body: Partial<MaterialInput> & { name: string }) =>
      apiSend("POST", `/workspaces/${workspaceId}/materials`, body, materialResponseSchema),
    onSettled: () => queryClient.invalidateQueries({ queryKey: ["project-area", workspaceId] }),
  });
}

export function useDeleteMaterial(workspaceId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (id: string) =>
      apiSend("DELETE", `/workspaces/${workspaceId}/materials/${id}`, undefined, null),
    onSettled: () => queryClient.invalidateQueries({ queryKey: ["project-area", workspaceId] }),
  });
}

/** Saves a library material over the version the edit started from (409 when it moved on). */
export function useUpdateMaterial(workspaceId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ id, ...body }: UpdateMaterialBody & { id: string }) =>
      apiSend("PATCH", `/workspaces/${workspaceId}/materials/${id}`, body, materialResponseSchema).then(
        (r) => r.material,
      ),
    onSettled: () => queryClient.invalidateQueries({ queryKey: ["project-area", workspaceId] }),
  });
}

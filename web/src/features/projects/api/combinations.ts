import { useMutation, useQuery, useQueryClient } from "@tanstack/react-query";
import {
  combinationListSchema,
  combinationResponseSchema,
  type CreateCombinationBody,
  type UpdateCombinationBody,
} from "../../../../../core/contract/combinations";
import { apiGet, apiSend } from "../../../lib/api-client";
import { projectKeys, projectPath } from "./keys";

export const useCombinations = (workspaceId: string, projectId: string) =>
  useQuery({
    queryKey: [...projectKeys.project(workspaceId, projectId), "combinations"],
    queryFn: () =>
      apiGet(`${projectPath(workspaceId, projectId)}/combinations`, combinationListSchema).then(
        (r) => r.combinations,
      ),
  });

export function useCombinationMutations(workspaceId: string, projectId: string) {
  const queryClient = useQueryClient();
  const base = `${projectPath(workspaceId, projectId)}/combinations`;
  const onSettled = () => queryClient.invalidateQueries({ queryKey: ["project-area", workspaceId] });
  return {
    create: useMutation({
      mutationFn: (body: Omit<CreateCombinationBody, "description"> & { description?: string }) =>
        apiSend("POST", base, body, combinationResponseSchema),
      onSettled,
    }),
    /** Saves over the version the edit started from; a stale version gets 409 with the current record. */
    update: useMutation({
      mutationFn: ({ id, ...body }: UpdateCombinationBody & { id: string }) =>
        apiSend("PATCH", `${base}/${id}`, body, combinationResponseSchema).then((r) => r.combination),
      onSettled,
    }),
    remove: useMutation({
      mutationFn: (id: string) => apiSend("DELETE", `${base}/${id}`, undefined, null),
      onSettled,
    }),
  };
}

import { useMutation, useQuery, useQueryClient } from "@tanstack/react-query";
import {
  locationListSchema,
  locationResponseSchema,
  type CreateLocationBody,
  type UpdateLocationBody,
} from "../../../../../core/contract/projects";
import { apiGet, apiSend } from "../../../lib/api-client";
import { projectKeys, projectPath } from "./keys";

export const useLocations = (workspaceId: string, projectId: string) =>
  useQuery({
    queryKey: [...projectKeys.project(workspaceId, projectId), "locations"],
    queryFn: () =>
      apiGet(`${projectPath(workspaceId, projectId)}/locations`, locationListSchema).then((r) => r.locations),
  });

/** Create, change and delete locations; each refreshes everything of the project. */
export function useLocationMutations(workspaceId: string, projectId: string) {
  const queryClient = useQueryClient();
  const base = `${projectPath(workspaceId, projectId)}/locations`;
  const onSettled = () => queryClient.invalidateQueries({ queryKey: ["project-area", workspaceId] });
  return {
    create: useMutation({
      mutationFn: (body: Partial<CreateLocationBody> & { name: string }) =>
        apiSend("POST", base, body, locationResponseSchema),
      onSettled,
    }),
    update: useMutation({
      mutationFn: (v: { id: string; body: UpdateLocationBody }) =>
        apiSend("PATCH", `${base}/${v.id}`, v.body, locationResponseSchema),
      onSettled,
    }),
    remove: useMutation({
      mutationFn: (id: string) => apiSend("DELETE", `${base}/${id}`, undefined, null),
      onSettled,
    }),
  };
}

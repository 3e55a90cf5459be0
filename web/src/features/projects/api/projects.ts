import { useMutation, useQuery, useQueryClient } from "@tanstack/react-query";
import {
  projectListSchema,
  projectResponseSchema,
  type CreateProjectBody,
  type UpdateProjectBody,
} from "../../../../../core/contract/projects";
import { apiGet, apiSend } from "../../../lib/api-client";
import { projectKeys, projectPath } from "./keys";

/** The workspace's projects. */
export const useProjects = (workspaceId: string) =>
  useQuery({
    queryKey: projectKeys.projects(workspaceId),
    queryFn: () => apiGet(`/workspaces/${workspaceId}/projects`, projectListSchema).then((r) => r.projects),
  });

/** One project. */
export const useProject = (workspaceId: string, projectId: string) =>
  useQuery({
    queryKey: [...projectKeys.project(workspaceId, projectId), "record"],
    queryFn: () => apiGet(projectPath(workspaceId, projectId), projectResponseSchema).then((r) => r.project),
    retry: false,
  });

export function useCreateProject(workspaceId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (body: Partial<CreateProjectBody> & { name: string }) =>
      apiSend("POST", `/workspaces/${workspaceId}/projects`, body, projectResponseSchema).then(
        (r) => r.project,
      ),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: projectKeys.projects(workspaceId) }),
  });
}

export function useUpdateProject(workspaceId: string, projectId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (body: UpdateProjectBody) =>
      apiSend("PATCH", projectPath(workspaceId, projectId), body, projectResponseSchema).then(
        (r) => r.project,
      ),
    onSettled: () => queryClient.invalidateQueries({ queryKey: ["project-area", workspaceId] }),
  });
}

export function useDeleteProject(workspaceId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (projectId: string) =>
      apiSend("DELETE", projectPath(workspaceId, projectId), undefined, null),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: ["project-area", workspaceId] }),
  });
}

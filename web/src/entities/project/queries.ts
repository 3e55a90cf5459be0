import { queryOptions, useQuery } from "@tanstack/react-query";
import { projectListSchema, projectResponseSchema } from "../../../../core/contract/projects";
import { apiGet } from "../../lib/api-client";
import { projectKeys, projectPath } from "./keys";

export const listProjects = (workspaceId: string) =>
  apiGet(`/workspaces/${workspaceId}/projects`, projectListSchema).then((r) => r.projects);

export const getProject = (workspaceId: string, projectId: string) =>
  apiGet(projectPath(workspaceId, projectId), projectResponseSchema).then((r) => r.project);

export const projectsQueryOptions = (workspaceId: string) =>
  queryOptions({ queryKey: projectKeys.list(workspaceId), queryFn: () => listProjects(workspaceId) });

export const projectQueryOptions = (workspaceId: string, projectId: string) =>
  queryOptions({
    queryKey: projectKeys.detail(workspaceId, projectId),
    queryFn: () => getProject(workspaceId, projectId),
    retry: false,
  });

/** The workspace's projects. */
export const useProjects = (workspaceId: string) => useQuery(projectsQueryOptions(workspaceId));

/** One project (name, unit system, checks, default material). */
export const useProject = (workspaceId: string, projectId: string) =>
  useQuery(projectQueryOptions(workspaceId, projectId));

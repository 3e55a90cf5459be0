import { useQuery } from "@tanstack/react-query";
import { z } from "zod";
import { comparisonSchema } from "../../../../../core/contract/comparison";
import { projectResponseSchema } from "../../../../../core/contract/projects";
import { workspaceSchema } from "../../../../../core/contract/workspaces";
import { apiGet } from "../../../lib/api-client";

const base = (workspaceId: string, projectId: string) => `/workspaces/${workspaceId}/projects/${projectId}`;

/** The comparison, computed by the server with core; refetched whenever the page is shown. */
export const useComparison = (workspaceId: string, projectId: string) =>
  useQuery({
    queryKey: ["project-area", workspaceId, "projects", projectId, "comparison"],
    queryFn: () => apiGet(`${base(workspaceId, projectId)}/comparison`, comparisonSchema),
    refetchOnMount: "always",
  });

/** The project (name, unit system) the comparison belongs to. */
export const useComparedProject = (workspaceId: string, projectId: string) =>
  useQuery({
    queryKey: ["project-area", workspaceId, "projects", projectId, "record"],
    queryFn: () => apiGet(base(workspaceId, projectId), projectResponseSchema).then((r) => r.project),
    retry: false,
  });

const workspaceResponse = z.object({ workspace: workspaceSchema });

/** The workspace (for its name in the header). */
export const useComparedWorkspace = (workspaceId: string) =>
  useQuery({
    queryKey: ["project-area", workspaceId, "workspace"],
    queryFn: () => apiGet(`/workspaces/${workspaceId}`, workspaceResponse).then((r) => r.workspace),
  });

import { keepPreviousData, useQuery } from "@tanstack/react-query";
import { z } from "zod";
import { comparisonPageSchema } from "../../../../../core/contract/comparison";
import { projectResponseSchema } from "../../../../../core/contract/projects";
import { workspaceSchema } from "../../../../../core/contract/workspaces";
import { apiGet } from "../../../lib/api-client";

const base = (workspaceId: string, projectId: string) => `/workspaces/${workspaceId}/projects/${projectId}`;

/** Rows the table shows at a time: every project of ordinary size fits on one page. */
export const COMPARISON_ROWS_PER_PAGE = 500;

/**
 * One page of the comparison (the governing results always cover every row), computed by
 * the server with core; refetched whenever the page is shown. The previous page stays on
 * screen while the next one loads.
 */
export const useComparison = (workspaceId: string, projectId: string, page = 1) =>
  useQuery({
    queryKey: ["project-area", workspaceId, "projects", projectId, "comparison", page],
    queryFn: () =>
      apiGet(
        `${base(workspaceId, projectId)}/comparison?page=${page}&limit=${COMPARISON_ROWS_PER_PAGE}`,
        comparisonPageSchema,
      ),
    refetchOnMount: "always",
    placeholderData: keepPreviousData,
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

import { queryOptions, useQuery } from "@tanstack/react-query";
import { auditListSchema } from "../../../../core/contract/projects";
import { apiGet } from "../../lib/api-client";
import { auditKeys } from "./keys";

export const listAudit = (workspaceId: string, projectId?: string) =>
  apiGet(
    `/workspaces/${workspaceId}/audit?limit=30${projectId ? `&projectId=${projectId}` : ""}`,
    auditListSchema,
  );

export const auditQueryOptions = (workspaceId: string, projectId?: string) =>
  queryOptions({
    queryKey: auditKeys.list(workspaceId, projectId),
    queryFn: () => listAudit(workspaceId, projectId),
  });

/** The most recent audit events, for the workspace or one project. */
export const useAudit = (workspaceId: string, projectId?: string) =>
  useQuery(auditQueryOptions(workspaceId, projectId));

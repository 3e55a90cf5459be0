import { queryOptions, useQuery } from "@tanstack/react-query";
import { recordContentSchema } from "../../../../../core/contract/records";
import { projectKeys, projectPath } from "../../../entities/project/keys";
import { apiGet } from "../../../lib/api-client";

/** The draft report's content: the project as a record would freeze it now (every comparison row). */
export const getReportContent = (workspaceId: string, projectId: string) =>
  apiGet(`${projectPath(workspaceId, projectId)}/report-content`, recordContentSchema);

/**
 * Under the project's scope, so every write to the project invalidates it; refetched whenever the
 * page opens, because a teammate's save elsewhere invalidates nothing in this browser.
 */
export const reportContentQueryOptions = (workspaceId: string, projectId: string) =>
  queryOptions({
    queryKey: [...projectKeys.scope(workspaceId, projectId), "report-content"] as const,
    queryFn: () => getReportContent(workspaceId, projectId),
    refetchOnMount: "always",
  });

export const useReportContent = (workspaceId: string, projectId: string) =>
  useQuery(reportContentQueryOptions(workspaceId, projectId));

import { keepPreviousData, queryOptions, useQuery } from "@tanstack/react-query";
import { comparisonPageSchema } from "../../../../core/contract/comparison";
import { apiGet } from "../../lib/api-client";
import { projectPath } from "../project/keys";
import { comparisonKeys } from "./keys";

/** Rows the table shows at a time: every project of ordinary size fits on one page. */
export const COMPARISON_ROWS_PER_PAGE = 500;

export const getComparisonPage = (workspaceId: string, projectId: string, page: number) =>
  apiGet(
    `${projectPath(workspaceId, projectId)}/comparison?page=${page}&limit=${COMPARISON_ROWS_PER_PAGE}`,
    comparisonPageSchema,
  );

/**
 * One page of the comparison (the governing results always cover every row), computed by the
 * server with core. Writes made here invalidate it; it is still refetched whenever the page is
 * shown, because a teammate's save elsewhere invalidates nothing in this browser. The previous
 * page stays on screen while the next one loads.
 */
export const comparisonQueryOptions = (workspaceId: string, projectId: string, page: number) =>
  queryOptions({
    queryKey: comparisonKeys.page(workspaceId, projectId, page),
    queryFn: () => getComparisonPage(workspaceId, projectId, page),
    refetchOnMount: "always",
    placeholderData: keepPreviousData,
  });

export const useComparison = (workspaceId: string, projectId: string, page = 1) =>
  useQuery(comparisonQueryOptions(workspaceId, projectId, page));

import { queryOptions, useQuery } from "@tanstack/react-query";
import { workspaceListSchema } from "../../../../../core/contract/workspaces";
import { apiGet } from "../../../lib/api-client";

export const listWorkspaces = () => apiGet("/workspaces", workspaceListSchema);

export const workspacesQueryOptions = () =>
  queryOptions({ queryKey: ["workspaces"], queryFn: listWorkspaces });

/** The workspaces the signed-in person belongs to, with their role in each. */
export const useWorkspaces = () => useQuery(workspacesQueryOptions());

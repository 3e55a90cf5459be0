import { queryOptions, useQuery } from "@tanstack/react-query";
import { memberListSchema } from "../../../../../core/contract/workspaces";
import { apiGet } from "../../../lib/api-client";

export const listMembers = (workspaceId: string) =>
  apiGet(`/workspaces/${workspaceId}/members`, memberListSchema).then((r) => r.members);

export const membersQueryOptions = (workspaceId: string) =>
  queryOptions({ queryKey: ["workspaces", workspaceId, "members"], queryFn: () => listMembers(workspaceId) });

export const useMembers = (workspaceId: string) => useQuery(membersQueryOptions(workspaceId));

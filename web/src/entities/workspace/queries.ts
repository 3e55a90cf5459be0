import { queryOptions, useQuery } from "@tanstack/react-query";
import { z } from "zod";
import {
  memberListSchema,
  roleAtLeast,
  workspaceListSchema,
  workspaceSchema,
} from "../../../../core/contract/workspaces";
import { apiGet } from "../../lib/api-client";
import { workspaceKeys } from "./keys";

export const workspaceResponseSchema = z.object({ workspace: workspaceSchema });

export const listWorkspaces = () => apiGet("/workspaces", workspaceListSchema);

export const getWorkspace = (workspaceId: string) =>
  apiGet(`/workspaces/${workspaceId}`, workspaceResponseSchema).then((r) => r.workspace);

export const listMembers = (workspaceId: string) =>
  apiGet(`/workspaces/${workspaceId}/members`, memberListSchema).then((r) => r.members);

export const workspacesQueryOptions = () =>
  queryOptions({ queryKey: workspaceKeys.list(), queryFn: listWorkspaces });

export const workspaceQueryOptions = (workspaceId: string) =>
  queryOptions({
    queryKey: workspaceKeys.detail(workspaceId),
    queryFn: () => getWorkspace(workspaceId),
    retry: false,
  });

export const membersQueryOptions = (workspaceId: string) =>
  queryOptions({ queryKey: workspaceKeys.members(workspaceId), queryFn: () => listMembers(workspaceId) });

/** The workspaces the signed-in person belongs to, with their role in each. */
export const useWorkspaces = () => useQuery(workspacesQueryOptions());

/** One workspace with the caller's role (404 when the caller is not a member). */
export const useWorkspace = (workspaceId: string) => useQuery(workspaceQueryOptions(workspaceId));

/** The workspace with the caller's role, and whether that role may change inputs. */
export function useWorkspaceRole(workspaceId: string) {
  const query = useWorkspace(workspaceId);
  const role = query.data?.role;
  return { ...query, canEdit: !!role && roleAtLeast(role, "editor"), role };
}

export const useMembers = (workspaceId: string) => useQuery(membersQueryOptions(workspaceId));

import { mutationOptions, useMutation, useQueryClient, type QueryClient } from "@tanstack/react-query";
import { z } from "zod";
import {
  memberSchema,
  type CreateWorkspaceBody,
  type Role,
  type UpdateWorkspaceBody,
} from "../../../../core/contract/workspaces";
import { apiSend } from "../../lib/api-client";
import { invalidateKeys } from "../invalidate";
import { workspaceKeys } from "./keys";
import { workspaceResponseSchema } from "./queries";

const memberResponseSchema = z.object({ member: memberSchema });

// Each factory is the whole mutation (request and what it refreshes), so a test can run it on a
// plain QueryClient; the hooks below only bind it to the page's client.

export const createWorkspaceMutation = (queryClient: QueryClient) =>
  mutationOptions({
    mutationFn: (body: CreateWorkspaceBody) =>
      apiSend("POST", "/workspaces", body, workspaceResponseSchema).then((r) => r.workspace),
    onSuccess: () => invalidateKeys(queryClient, [workspaceKeys.list()]),
  });

/** Renames a workspace (owners only): the list and that workspace's record change. */
export const renameWorkspaceMutation = (queryClient: QueryClient) =>
  mutationOptions({
    mutationFn: (v: { workspaceId: string } & UpdateWorkspaceBody) =>
      apiSend("PATCH", `/workspaces/${v.workspaceId}`, { name: v.name }, workspaceResponseSchema).then(
        (r) => r.workspace,
      ),
    onSuccess: (_workspace, v) =>
      invalidateKeys(queryClient, [workspaceKeys.list(), workspaceKeys.detail(v.workspaceId)]),
  });

export const deleteWorkspaceMutation = (queryClient: QueryClient) =>
  mutationOptions({
    mutationFn: (workspaceId: string) => apiSend("DELETE", `/workspaces/${workspaceId}`, undefined, null),
    onSuccess: (_nothing, workspaceId) =>
      invalidateKeys(queryClient, [workspaceKeys.list(), workspaceKeys.detail(workspaceId)]),
  });

/** Leaves a workspace: the caller's list and their role there change. */
export const leaveWorkspaceMutation = (queryClient: QueryClient) =>
  mutationOptions({
    mutationFn: (workspaceId: string) => apiSend("POST", `/workspaces/${workspaceId}/leave`, undefined, null),
    onSuccess: (_nothing, workspaceId) =>
      invalidateKeys(queryClient, [workspaceKeys.list(), workspaceKeys.scope(workspaceId)]),
  });

/**
 * A member's role or membership changed: the members list, the workspace record (the caller's own
 * role may be the one that changed) and the list (which shows the caller's role).
 */
const afterMemberChange = (queryClient: QueryClient, workspaceId: string) =>
  invalidateKeys(queryClient, [
    workspaceKeys.members(workspaceId),
    workspaceKeys.detail(workspaceId),
    workspaceKeys.list(),
  ]);

/** Changes a member's role (owners only; the last owner cannot step down). */
export const updateMemberMutation = (queryClient: QueryClient, workspaceId: string) =>
  mutationOptions({
    mutationFn: (v: { workspaceId: string; memberId: string; role: Role }) =>
      apiSend(
        "PATCH",
        `/workspaces/${v.workspaceId}/members/${v.memberId}`,
        { role: v.role },
        memberResponseSchema,
      ),
    onSettled: () => afterMemberChange(queryClient, workspaceId),
  });

export const removeMemberMutation = (queryClient: QueryClient, workspaceId: string) =>
  mutationOptions({
    mutationFn: (v: { workspaceId: string; memberId: string }) =>
      apiSend("DELETE", `/workspaces/${v.workspaceId}/members/${v.memberId}`, undefined, null),
    onSettled: () => afterMemberChange(queryClient, workspaceId),
  });

export const useCreateWorkspace = () => useMutation(createWorkspaceMutation(useQueryClient()));
export const useRenameWorkspace = () => useMutation(renameWorkspaceMutation(useQueryClient()));
export const useDeleteWorkspace = () => useMutation(deleteWorkspaceMutation(useQueryClient()));
export const useLeaveWorkspace = () => useMutation(leaveWorkspaceMutation(useQueryClient()));
export const useUpdateMember = (workspaceId: string) =>
  useMutation(updateMemberMutation(useQueryClient(), workspaceId));
export const useRemoveMember = (workspaceId: string) =>
  useMutation(removeMemberMutation(useQueryClient(), workspaceId));

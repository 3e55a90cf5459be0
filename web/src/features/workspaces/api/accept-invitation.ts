import { useMutation, useQueryClient } from "@tanstack/react-query";
import { joinedWorkspaceSchema } from "../../../../../core/contract/invitations";
import { invalidateKeys } from "../../../entities/invalidate";
import { workspaceKeys } from "../../../entities/workspace/keys";
import { apiSend } from "../../../lib/api-client";

export const acceptInvitation = (token: string) =>
  apiSend("POST", `/invitations/${token}/accept`, undefined, joinedWorkspaceSchema);

export function useAcceptInvitation() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: acceptInvitation,
    // The caller's list gains the workspace, and any record of it cached while not a member is stale.
    onSuccess: (joined) =>
      invalidateKeys(queryClient, [workspaceKeys.list(), workspaceKeys.scope(joined.workspaceId)]),
  });
}

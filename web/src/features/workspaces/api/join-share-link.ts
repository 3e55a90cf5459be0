import { useMutation, useQueryClient } from "@tanstack/react-query";
import { joinedWorkspaceSchema } from "../../../../../core/contract/invitations";
import { invalidateKeys } from "../../../entities/invalidate";
import { workspaceKeys } from "../../../entities/workspace/keys";
import { apiSend } from "../../../lib/api-client";

export const joinShareLink = (token: string) =>
  apiSend("POST", `/share-links/${token}/join`, undefined, joinedWorkspaceSchema);

export function useJoinShareLink() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: joinShareLink,
    // The caller's list gains the workspace, and any record of it cached while not a member is stale.
    onSuccess: (joined) =>
      invalidateKeys(queryClient, [workspaceKeys.list(), workspaceKeys.scope(joined.workspaceId)]),
  });
}

import { useMutation, useQueryClient } from "@tanstack/react-query";
import { apiSend } from "../../../lib/api-client";
import { workspaceKeys } from "../../../entities/workspace/keys";

export const revokeInvitation = (v: { workspaceId: string; invitationId: string }) =>
  apiSend("DELETE", `/workspaces/${v.workspaceId}/invitations/${v.invitationId}`, undefined, null);

export function useRevokeInvitation(workspaceId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: revokeInvitation,
    onSettled: () => queryClient.invalidateQueries({ queryKey: workspaceKeys.invitations(workspaceId) }),
  });
}

import { useMutation, useQueryClient } from "@tanstack/react-query";
import { joinedWorkspaceSchema } from "../../../../../core/contract/invitations";
import { apiSend } from "../../../lib/api-client";

export const acceptInvitation = (token: string) =>
  apiSend("POST", `/invitations/${token}/accept`, undefined, joinedWorkspaceSchema);

export function useAcceptInvitation() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: acceptInvitation,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: ["workspaces"] }),
  });
}

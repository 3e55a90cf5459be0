import { useMutation, useQueryClient } from "@tanstack/react-query";
import { joinedWorkspaceSchema } from "../../../../../core/contract/invitations";
import { apiSend } from "../../../lib/api-client";

export const joinShareLink = (token: string) =>
  apiSend("POST", `/share-links/${token}/join`, undefined, joinedWorkspaceSchema);

export function useJoinShareLink() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: joinShareLink,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: ["workspaces"] }),
  });
}

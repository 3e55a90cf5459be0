import { useMutation, useQueryClient } from "@tanstack/react-query";
import { apiSend } from "../../../lib/api-client";
import { workspaceKeys } from "../../../entities/workspace/keys";

export const revokeShareLink = (v: { workspaceId: string; linkId: string }) =>
  apiSend("DELETE", `/workspaces/${v.workspaceId}/share-links/${v.linkId}`, undefined, null);

export function useRevokeShareLink(workspaceId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: revokeShareLink,
    onSettled: () => queryClient.invalidateQueries({ queryKey: workspaceKeys.shareLinks(workspaceId) }),
  });
}

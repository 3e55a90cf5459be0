import { useMutation, useQueryClient } from "@tanstack/react-query";
import { createdShareLinkSchema, type CreateShareLinkBody } from "../../../../../core/contract/share-links";
import { apiSend } from "../../../lib/api-client";
import { workspaceKeys } from "../../../entities/workspace/keys";

export const createShareLink = (v: { workspaceId: string; body: CreateShareLinkBody }) =>
  apiSend("POST", `/workspaces/${v.workspaceId}/share-links`, v.body, createdShareLinkSchema);

/** Creates a link; its URL is in the answer only. */
export function useCreateShareLink(workspaceId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: createShareLink,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: workspaceKeys.shareLinks(workspaceId) }),
  });
}

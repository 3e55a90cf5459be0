import { useMutation, useQueryClient } from "@tanstack/react-query";
import { apiSend } from "../../../lib/api-client";

export const removeMember = (v: { workspaceId: string; memberId: string }) =>
  apiSend("DELETE", `/workspaces/${v.workspaceId}/members/${v.memberId}`, undefined, null);

export function useRemoveMember(workspaceId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: removeMember,
    onSettled: () => queryClient.invalidateQueries({ queryKey: ["workspaces", workspaceId] }),
  });
}

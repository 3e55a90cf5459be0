import { useMutation, useQueryClient } from "@tanstack/react-query";
import { apiSend } from "../../../lib/api-client";

export const leaveWorkspace = (workspaceId: string) =>
  apiSend("POST", `/workspaces/${workspaceId}/leave`, undefined, null);

export function useLeaveWorkspace() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: leaveWorkspace,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: ["workspaces"] }),
  });
}

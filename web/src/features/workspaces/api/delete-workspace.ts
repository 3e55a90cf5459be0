import { useMutation, useQueryClient } from "@tanstack/react-query";
import { apiSend } from "../../../lib/api-client";

export const deleteWorkspace = (id: string) => apiSend("DELETE", `/workspaces/${id}`, undefined, null);

export function useDeleteWorkspace() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: deleteWorkspace,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: ["workspaces"] }),
  });
}

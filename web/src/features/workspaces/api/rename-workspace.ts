import { useMutation, useQueryClient } from "@tanstack/react-query";
import { z } from "zod";
import { workspaceSchema, type UpdateWorkspaceBody } from "../../../../../core/contract/workspaces";
import { apiSend } from "../../../lib/api-client";

const responseSchema = z.object({ workspace: workspaceSchema });

export const renameWorkspace = (v: { workspaceId: string } & UpdateWorkspaceBody) =>
  apiSend("PATCH", `/workspaces/${v.workspaceId}`, { name: v.name }, responseSchema).then((r) => r.workspace);

/** Renames a workspace (owners only). */
export function useRenameWorkspace() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: renameWorkspace,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: ["workspaces"] }),
  });
}

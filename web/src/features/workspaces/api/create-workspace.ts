import { useMutation, useQueryClient } from "@tanstack/react-query";
import { z } from "zod";
import { workspaceSchema, type CreateWorkspaceBody } from "../../../../../core/contract/workspaces";
import { apiSend } from "../../../lib/api-client";

const responseSchema = z.object({ workspace: workspaceSchema });

export const createWorkspace = (body: CreateWorkspaceBody) =>
  apiSend("POST", "/workspaces", body, responseSchema).then((r) => r.workspace);

export function useCreateWorkspace() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: createWorkspace,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: ["workspaces"] }),
  });
}

import { useMutation, useQuery, useQueryClient } from "@tanstack/react-query";
import { auditListSchema, trashListSchema, type TrashKind } from "../../../../../core/contract/projects";
import { importResponseSchema } from "../../../../../core/contract/project-export";
import { apiGet, apiSend } from "../../../lib/api-client";
import { projectKeys } from "./keys";

/** The trash (editors and owners only). */
export const useTrash = (workspaceId: string, enabled: boolean) =>
  useQuery({
    queryKey: projectKeys.trash(workspaceId),
    queryFn: () => apiGet(`/workspaces/${workspaceId}/trash`, trashListSchema),
    enabled,
  });

export function useRestore(workspaceId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (v: { kind: TrashKind; id: string }) =>
      apiSend("POST", `/workspaces/${workspaceId}/trash/${v.kind}/${v.id}/restore`, undefined, null),
    onSettled: () => queryClient.invalidateQueries({ queryKey: ["project-area", workspaceId] }),
  });
}

/** Deletes a trashed item for good (owners only; the API refuses anyone else). */
export function usePurge(workspaceId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (v: { kind: TrashKind; id: string }) =>
      apiSend("DELETE", `/workspaces/${workspaceId}/trash/${v.kind}/${v.id}`, undefined, null),
    onSettled: () => queryClient.invalidateQueries({ queryKey: ["project-area", workspaceId] }),
  });
}

/** The most recent audit events, for the workspace or one project. */
export const useAudit = (workspaceId: string, projectId?: string) =>
  useQuery({
    queryKey: projectKeys.audit(workspaceId, projectId),
    queryFn: () =>
      apiGet(
        `/workspaces/${workspaceId}/audit?limit=30${projectId ? `&projectId=${projectId}` : ""}`,
        auditListSchema,
      ),
  });

/** Imports an export file (already parsed JSON) as a new project. */
export function useImportProject(workspaceId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (file: unknown) =>
      apiSend("POST", `/workspaces/${workspaceId}/project-imports`, file, importResponseSchema),
    onSettled: () => queryClient.invalidateQueries({ queryKey: ["project-area", workspaceId] }),
  });
}

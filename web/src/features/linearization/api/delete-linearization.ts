import { mutationOptions, useMutation, useQueryClient, type QueryClient } from "@tanstack/react-query";
import { auditKeys } from "../../../entities/audit/keys";
import { comparisonKeys } from "../../../entities/comparison/keys";
import { invalidateKeys } from "../../../entities/invalidate";
import { apiSend } from "../../../lib/api-client";
import { linearizationKeys, linearizationsPath } from "./keys";

/**
 * Deletes a saved line for good (lines have no trash; the audit trail keeps its inputs).
 * Invalidates the case's lines, the comparison and the audit trail.
 */
export const deleteLinearizationMutation = (
  queryClient: QueryClient,
  workspaceId: string,
  projectId: string,
) =>
  mutationOptions({
    mutationFn: ({ loadCaseId, id }: { loadCaseId: string; id: string }) =>
      apiSend("DELETE", `${linearizationsPath(workspaceId, projectId, loadCaseId)}/${id}`, undefined, null),
    onSettled: () =>
      invalidateKeys(queryClient, [
        linearizationKeys.all(workspaceId, projectId),
        comparisonKeys.all(workspaceId, projectId),
        auditKeys.all(workspaceId),
      ]),
  });

export function useDeleteLinearization(workspaceId: string, projectId: string) {
  return useMutation(deleteLinearizationMutation(useQueryClient(), workspaceId, projectId));
}

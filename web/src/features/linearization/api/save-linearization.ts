import { mutationOptions, useMutation, useQueryClient, type QueryClient } from "@tanstack/react-query";
import {
  linearizationResponseSchema,
  type LinearizationInputBody,
} from "../../../../../core/contract/linearizations";
import { auditKeys } from "../../../entities/audit/keys";
import { comparisonKeys } from "../../../entities/comparison/keys";
import { invalidateKeys } from "../../../entities/invalidate";
import { apiSend } from "../../../lib/api-client";
import { linearizationKeys, linearizationsPath } from "./keys";

/** What a save sends: the case, the body, and the id and version when it replaces a saved line. */
export type SaveLine = { loadCaseId: string; body: LinearizationInputBody; id?: string; version?: number };

/**
 * Saves a line (POST a new one, or PUT over the version the edit started from: a stale version gets
 * 409 with the current record). Invalidates the case's lines, the comparison (a section per line)
 * and the audit trail.
 */
export const saveLinearizationMutation = (queryClient: QueryClient, workspaceId: string, projectId: string) =>
  mutationOptions({
    mutationFn: ({ loadCaseId, body, id, version }: SaveLine) => {
      const base = linearizationsPath(workspaceId, projectId, loadCaseId);
      return (
        id === undefined
          ? apiSend("POST", base, body, linearizationResponseSchema)
          : apiSend("PUT", `${base}/${id}`, { ...body, version }, linearizationResponseSchema)
      ).then((r) => r.linearization);
    },
    onSettled: () =>
      invalidateKeys(queryClient, [
        linearizationKeys.all(workspaceId, projectId),
        comparisonKeys.all(workspaceId, projectId),
        auditKeys.all(workspaceId),
      ]),
  });

export function useSaveLinearization(workspaceId: string, projectId: string) {
  return useMutation(saveLinearizationMutation(useQueryClient(), workspaceId, projectId));
}

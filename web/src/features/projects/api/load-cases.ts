import { useMutation, useQuery, useQueryClient } from "@tanstack/react-query";
import {
  loadCaseListSchema,
  loadCaseResponseSchema,
  type StateSource,
} from "../../../../../core/contract/load-cases";
import type { StressUnitName } from "../../../../../core/contract/materials";
import { apiGet, apiSend } from "../../../lib/api-client";
import { projectKeys, projectPath } from "./keys";

export const useLoadCases = (workspaceId: string, projectId: string) =>
  useQuery({
    queryKey: [...projectKeys.project(workspaceId, projectId), "load-cases"],
    queryFn: () =>
      apiGet(`${projectPath(workspaceId, projectId)}/load-cases`, loadCaseListSchema).then(
        (r) => r.loadCases,
      ),
  });

/** A stress as the forms send it. */
export type StressBody = {
  unit: StressUnitName;
  components: { xx: number; yy: number; zz: number; xy: number; yz: number; zx: number };
};

/** Create, rename, delete load cases and save states; each refreshes everything of the project. */
export function useLoadCaseMutations(workspaceId: string, projectId: string) {
  const queryClient = useQueryClient();
  const base = `${projectPath(workspaceId, projectId)}/load-cases`;
  const onSettled = () => queryClient.invalidateQueries({ queryKey: ["project-area", workspaceId] });
  return {
    create: useMutation({
      mutationFn: (body: { name: string; category: string; description?: string }) =>
        apiSend("POST", base, body, loadCaseResponseSchema),
      onSettled,
    }),
    saveState: useMutation({
      mutationFn: (v: {
        caseId: string;
        locationId: string;
        version: number;
        stress: StressBody;
        source: StateSource;
        note?: string;
      }) =>
        apiSend(
          "PUT",
          `${base}/${v.caseId}/states/${v.locationId}`,
          { version: v.version, stress: v.stress, source: v.source, note: v.note ?? "" },
          loadCaseResponseSchema,
        ),
      onSettled,
    }),
    removeState: useMutation({
      mutationFn: (v: { caseId: string; locationId: string; version: number }) =>
        apiSend(
          "PATCH",
          `${base}/${v.caseId}`,
          { version: v.version, removeStates: [v.locationId] },
          loadCaseResponseSchema,
        ),
      onSettled,
    }),
    update: useMutation({
      mutationFn: (v: {
        id: string;
        body: { version: number; name?: string; category?: string; description?: string };
      }) => apiSend("PATCH", `${base}/${v.id}`, v.body, loadCaseResponseSchema),
      onSettled,
    }),
    remove: useMutation({
      mutationFn: (id: string) => apiSend("DELETE", `${base}/${id}`, undefined, null),
      onSettled,
    }),
  };
}

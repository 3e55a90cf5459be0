import { mutationOptions, useMutation, useQueryClient, type QueryClient } from "@tanstack/react-query";
import {
  loadCaseResponseSchema,
  type Components,
  type StateSource,
} from "../../../../core/contract/load-cases";
import type { CalculatorRecord } from "../../../../core/contract/calculator-inputs";
import type { StressUnitName } from "../../../../core/contract/materials";
import { apiSend } from "../../lib/api-client";
import { auditKeys } from "../audit/keys";
import { combinationKeys } from "../combination/keys";
import { comparisonKeys } from "../comparison/keys";
import { invalidateKeys } from "../invalidate";
import { trashKeys } from "../trash/keys";
import { loadCaseKeys } from "./keys";
import { loadCasesPath } from "./queries";

/** A stress as the forms and the bench send it. */
export type StressBody = { unit: StressUnitName; components: Components };

/** What saving one state sends: over the case version the edit started from (409 when it moved on). */
export type SaveStateVariables = {
  caseId: string;
  locationId: string;
  version: number;
  stress: StressBody;
  source: StateSource;
  note?: string;
  /** the calculator and every input that produced the state (left out: none) */
  calculator?: CalculatorRecord | null;
};

// Every write is also an audit event, so each one refreshes the audit trail as well.

export const createLoadCaseMutation = (queryClient: QueryClient, workspaceId: string, projectId: string) =>
  mutationOptions({
    mutationFn: (body: { name: string; category: string; description?: string }) =>
      apiSend("POST", loadCasesPath(workspaceId, projectId), body, loadCaseResponseSchema),
    onSettled: () =>
      invalidateKeys(queryClient, [
        loadCaseKeys.list(workspaceId, projectId),
        comparisonKeys.all(workspaceId, projectId),
        auditKeys.all(workspaceId),
      ]),
  });

/**
 * Saves one state as a new revision: that case (with its state histories), the project's list of
 * cases and the comparison change.
 */
export const saveStateMutation = (queryClient: QueryClient, workspaceId: string, projectId: string) =>
  mutationOptions({
    mutationFn: (v: SaveStateVariables) =>
      apiSend(
        "PUT",
        `${loadCasesPath(workspaceId, projectId)}/${v.caseId}/states/${v.locationId}`,
        {
          version: v.version,
          stress: v.stress,
          source: v.source,
          note: v.note ?? "",
          calculator: v.calculator ?? null,
        },
        loadCaseResponseSchema,
      ).then((r) => r.loadCase),
    onSettled: (_saved, _error, v) =>
      invalidateKeys(queryClient, [
        loadCaseKeys.detail(workspaceId, projectId, v.caseId),
        loadCaseKeys.list(workspaceId, projectId),
        comparisonKeys.all(workspaceId, projectId),
        auditKeys.all(workspaceId),
      ]),
  });

/** Renames a case or changes its category or description (combinations show and the comparison checks by them). */
export const updateLoadCaseMutation = (queryClient: QueryClient, workspaceId: string, projectId: string) =>
  mutationOptions({
    mutationFn: (v: {
      id: string;
      body: { version: number; name?: string; category?: string; description?: string };
    }) =>
      apiSend("PATCH", `${loadCasesPath(workspaceId, projectId)}/${v.id}`, v.body, loadCaseResponseSchema),
    onSettled: (_answer, _error, v) =>
      invalidateKeys(queryClient, [
        loadCaseKeys.detail(workspaceId, projectId, v.id),
        loadCaseKeys.list(workspaceId, projectId),
        combinationKeys.list(workspaceId, projectId),
        comparisonKeys.all(workspaceId, projectId),
        auditKeys.all(workspaceId),
      ]),
  });

/** Moves a case to the trash: combinations that use it and the comparison change too. */
export const deleteLoadCaseMutation = (queryClient: QueryClient, workspaceId: string, projectId: string) =>
  mutationOptions({
    mutationFn: (id: string) =>
      apiSend("DELETE", `${loadCasesPath(workspaceId, projectId)}/${id}`, undefined, null),
    onSettled: (_nothing, _error, id) =>
      invalidateKeys(queryClient, [
        loadCaseKeys.detail(workspaceId, projectId, id),
        loadCaseKeys.list(workspaceId, projectId),
        combinationKeys.list(workspaceId, projectId),
        comparisonKeys.all(workspaceId, projectId),
        trashKeys.list(workspaceId),
        auditKeys.all(workspaceId),
      ]),
  });

export const useCreateLoadCase = (workspaceId: string, projectId: string) =>
  useMutation(createLoadCaseMutation(useQueryClient(), workspaceId, projectId));
export const useUpdateLoadCase = (workspaceId: string, projectId: string) =>
  useMutation(updateLoadCaseMutation(useQueryClient(), workspaceId, projectId));
export const useDeleteLoadCase = (workspaceId: string, projectId: string) =>
  useMutation(deleteLoadCaseMutation(useQueryClient(), workspaceId, projectId));

/**
 * Saves one state. `callbacks` run on the answer, before the refresh, for a page that shows the
 * outcome itself (the bench's new basis and its conflict notice).
 */
export function useSaveState(
  workspaceId: string,
  projectId: string,
  callbacks: Pick<ReturnType<typeof saveStateMutation>, "onSuccess" | "onError"> = {},
) {
  return useMutation({ ...saveStateMutation(useQueryClient(), workspaceId, projectId), ...callbacks });
}

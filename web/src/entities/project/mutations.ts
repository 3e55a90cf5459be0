import { mutationOptions, useMutation, useQueryClient, type QueryClient } from "@tanstack/react-query";
import { importResponseSchema } from "../../../../core/contract/project-export";
import {
  projectResponseSchema,
  type CreateProjectBody,
  type UpdateProjectBody,
} from "../../../../core/contract/projects";
import { apiSend } from "../../lib/api-client";
import { auditKeys } from "../audit/keys";
import { comparisonKeys } from "../comparison/keys";
import { invalidateKeys } from "../invalidate";
import { trashKeys } from "../trash/keys";
import { projectKeys, projectPath } from "./keys";

// Every write is also an audit event, so each one refreshes the audit trail as well.

export const createProjectMutation = (queryClient: QueryClient, workspaceId: string) =>
  mutationOptions({
    mutationFn: (body: Partial<CreateProjectBody> & { name: string }) =>
      apiSend("POST", `/workspaces/${workspaceId}/projects`, body, projectResponseSchema).then(
        (r) => r.project,
      ),
    onSuccess: () => invalidateKeys(queryClient, [projectKeys.list(workspaceId), auditKeys.all(workspaceId)]),
  });

/** Name, description, unit system, checks or default material: the list, the record and the comparison change. */
export const updateProjectMutation = (queryClient: QueryClient, workspaceId: string, projectId: string) =>
  mutationOptions({
    mutationFn: (body: UpdateProjectBody) =>
      apiSend("PATCH", projectPath(workspaceId, projectId), body, projectResponseSchema).then(
        (r) => r.project,
      ),
    onSettled: () =>
      invalidateKeys(queryClient, [
        projectKeys.list(workspaceId),
        projectKeys.detail(workspaceId, projectId),
        comparisonKeys.all(workspaceId, projectId),
        auditKeys.all(workspaceId),
      ]),
  });

/** Moves a project to the trash: the list and the trash change, and everything cached of it is stale. */
export const deleteProjectMutation = (queryClient: QueryClient, workspaceId: string) =>
  mutationOptions({
    mutationFn: (projectId: string) =>
      apiSend("DELETE", projectPath(workspaceId, projectId), undefined, null),
    onSuccess: (_nothing, projectId) =>
      invalidateKeys(queryClient, [
        projectKeys.list(workspaceId),
        projectKeys.scope(workspaceId, projectId),
        trashKeys.list(workspaceId),
        auditKeys.all(workspaceId),
      ]),
  });

/** Imports an export file (already parsed JSON) as a new project. */
export const importProjectMutation = (queryClient: QueryClient, workspaceId: string) =>
  mutationOptions({
    mutationFn: (file: unknown) =>
      apiSend("POST", `/workspaces/${workspaceId}/project-imports`, file, importResponseSchema),
    onSettled: () => invalidateKeys(queryClient, [projectKeys.list(workspaceId), auditKeys.all(workspaceId)]),
  });

export const useCreateProject = (workspaceId: string) =>
  useMutation(createProjectMutation(useQueryClient(), workspaceId));
export const useUpdateProject = (workspaceId: string, projectId: string) =>
  useMutation(updateProjectMutation(useQueryClient(), workspaceId, projectId));
export const useDeleteProject = (workspaceId: string) =>
  useMutation(deleteProjectMutation(useQueryClient(), workspaceId));
export const useImportProject = (workspaceId: string) =>
  useMutation(importProjectMutation(useQueryClient(), workspaceId));

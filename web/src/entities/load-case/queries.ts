import { queryOptions, useQuery } from "@tanstack/react-query";
import {
  loadCaseListSchema,
  loadCaseResponseSchema,
  stateHistorySchema,
} from "../../../../core/contract/load-cases";
import { apiGet } from "../../lib/api-client";
import { projectPath } from "../project/keys";
import { loadCaseKeys } from "./keys";

/** Base path of a project's load-case routes. */
export const loadCasesPath = (workspaceId: string, projectId: string) =>
  `${projectPath(workspaceId, projectId)}/load-cases`;

export const listLoadCases = (workspaceId: string, projectId: string) =>
  apiGet(loadCasesPath(workspaceId, projectId), loadCaseListSchema).then((r) => r.loadCases);

export const getLoadCase = (workspaceId: string, projectId: string, loadCaseId: string) =>
  apiGet(`${loadCasesPath(workspaceId, projectId)}/${loadCaseId}`, loadCaseResponseSchema).then(
    (r) => r.loadCase,
  );

export const listStateRevisions = (
  workspaceId: string,
  projectId: string,
  loadCaseId: string,
  locationId: string,
) =>
  apiGet(
    `${loadCasesPath(workspaceId, projectId)}/${loadCaseId}/states/${locationId}/revisions`,
    stateHistorySchema,
  ).then((r) => r.revisions);

export const loadCasesQueryOptions = (workspaceId: string, projectId: string) =>
  queryOptions({
    queryKey: loadCaseKeys.list(workspaceId, projectId),
    queryFn: () => listLoadCases(workspaceId, projectId),
  });

export const loadCaseQueryOptions = (workspaceId: string, projectId: string, loadCaseId: string) =>
  queryOptions({
    queryKey: loadCaseKeys.detail(workspaceId, projectId, loadCaseId),
    queryFn: () => getLoadCase(workspaceId, projectId, loadCaseId),
    retry: false,
  });

/** The project's load cases, each with its saved state at every location. */
export const useLoadCases = (workspaceId: string, projectId: string) =>
  useQuery(loadCasesQueryOptions(workspaceId, projectId));

/**
 * One load case with its states and version.
 * @param fresh fetch it anew on every opening and keep no copy once unused: whoever saves over
 * it needs the version on the server now, not a cached one
 */
export const useLoadCase = (workspaceId: string, projectId: string, loadCaseId: string, fresh = false) =>
  useQuery({ ...loadCaseQueryOptions(workspaceId, projectId, loadCaseId), ...(fresh ? { gcTime: 0 } : {}) });

/** Every saved revision of one state, newest first (fetched when shown). */
export const useStateHistory = (
  workspaceId: string,
  projectId: string,
  loadCaseId: string,
  locationId: string,
) =>
  useQuery({
    queryKey: loadCaseKeys.history(workspaceId, projectId, loadCaseId, locationId),
    queryFn: () => listStateRevisions(workspaceId, projectId, loadCaseId, locationId),
  });

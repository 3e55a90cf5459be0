import { useQuery } from "@tanstack/react-query";
import { stateHistorySchema } from "../../../../../core/contract/load-cases";
import { apiGet } from "../../../lib/api-client";
import { projectKeys, projectPath } from "./keys";

/** Every saved revision of one state, newest first (fetched when shown). */
export const useStateHistory = (
  workspaceId: string,
  projectId: string,
  loadCaseId: string,
  locationId: string,
) =>
  useQuery({
    queryKey: [...projectKeys.project(workspaceId, projectId), "history", loadCaseId, locationId],
    queryFn: () =>
      apiGet(
        `${projectPath(workspaceId, projectId)}/load-cases/${loadCaseId}/states/${locationId}/revisions`,
        stateHistorySchema,
      ).then((r) => r.revisions),
  });

import { projectKeys } from "../project/keys";

/** Query keys of a project's locations. */
export const locationKeys = {
  list: (workspaceId: string, projectId: string) =>
    [...projectKeys.scope(workspaceId, projectId), "locations"] as const,
  detail: (workspaceId: string, projectId: string, locationId: string) =>
    [...projectKeys.scope(workspaceId, projectId), "location", locationId] as const,
};

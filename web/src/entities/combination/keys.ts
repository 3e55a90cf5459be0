import { projectKeys } from "../project/keys";

/** Query keys of a project's combinations of load cases. */
export const combinationKeys = {
  list: (workspaceId: string, projectId: string) =>
    [...projectKeys.scope(workspaceId, projectId), "combinations"] as const,
};

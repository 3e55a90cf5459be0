import { workspaceKeys } from "../workspace/keys";

/** Query keys of the workspace's trash. */
export const trashKeys = {
  list: (workspaceId: string) => [...workspaceKeys.scope(workspaceId), "trash"] as const,
};

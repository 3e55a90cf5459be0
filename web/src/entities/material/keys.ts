import { workspaceKeys } from "../workspace/keys";

/** Query keys of a workspace's material library (with the built-in published grades). */
export const materialKeys = {
  list: (workspaceId: string) => [...workspaceKeys.scope(workspaceId), "materials"] as const,
};

/**
 * Query keys of workspaces. Everything of one workspace sits under `scope(id)`; the list of the
 * caller's workspaces stands apart, so renaming one refreshes the list and that record only.
 */
export const workspaceKeys = {
  list: () => ["workspaces"] as const,
  scope: (workspaceId: string) => ["workspace", workspaceId] as const,
  detail: (workspaceId: string) => ["workspace", workspaceId, "record"] as const,
  members: (workspaceId: string) => ["workspace", workspaceId, "members"] as const,
  invitations: (workspaceId: string) => ["workspace", workspaceId, "invitations"] as const,
  shareLinks: (workspaceId: string) => ["workspace", workspaceId, "share-links"] as const,
};

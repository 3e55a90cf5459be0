import { roleAtLeast, type Role } from "../../../../../core/contract/workspaces";

/** A tab of the workspace page and the path under the workspace it opens. */
export type WorkspaceTab = { to: string; label: string };

/**
 * The workspace tabs a role sees: everyone sees projects and members, editors and owners share
 * links, only owners invitations and settings (the API enforces the same; these only hide what
 * would be refused).
 */
export function workspaceTabs(role: Role): WorkspaceTab[] {
  return [
    { to: "projects", label: "Projects", show: true },
    { to: "members", label: "Members", show: true },
    { to: "invitations", label: "Invitations", show: roleAtLeast(role, "owner") },
    { to: "share-links", label: "Share links", show: roleAtLeast(role, "editor") },
    { to: "settings", label: "Settings", show: roleAtLeast(role, "owner") },
  ]
    .filter((t) => t.show)
    .map(({ to, label }) => ({ to, label }));
}

/** "member" or "members" after a count. */
export const membersWord = (count: number): string => (count === 1 ? "member" : "members");

/** What the owner is asked before removing someone. */
export const removeMemberQuestion = (memberName: string, workspaceName: string): string =>
  `Remove ${memberName} from ${workspaceName}?`;

/**
 * The workspace delete button waits for the name typed exactly (case and spaces count): deleting
 * removes everything for every member, so nothing close enough will do.
 */
export const deleteConfirmed = (typed: string, workspaceName: string): boolean => typed === workspaceName;

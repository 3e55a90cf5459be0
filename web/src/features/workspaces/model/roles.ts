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

/** The workspace pages whose controls only some roles may use. */
export type GuardedSection = "invitations" | "share-links" | "settings";

const SECTION_MINIMUM: Record<GuardedSection, { minimum: Role; who: string; what: string }> = {
  invitations: { minimum: "owner", who: "Only owners", what: "invite people by e-mail" },
  "share-links": { minimum: "editor", who: "Only owners and editors", what: "create and revoke share links" },
  settings: { minimum: "owner", who: "Only owners", what: "rename or delete the workspace" },
};

/**
 * Why `role` sees no controls on `section`, or null when it may use them. A page that would
 * only be refused (403) shows this sentence instead of a form that looks as if it works.
 */
export function sectionRefusal(role: Role, section: GuardedSection): string | null {
  const rule = SECTION_MINIMUM[section];
  if (roleAtLeast(role, rule.minimum)) return null;
  return `${rule.who} ${rule.what}. You are a ${role} here: ask an owner if you need this.`;
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

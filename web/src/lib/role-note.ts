import { roleAtLeast, type Role } from "../../../core/contract/workspaces";

/**
 * What a read-only member is told beside the inputs: a reviewer reads the inputs as a viewer
 * does and acts on the records submitted for check; a viewer only reads.
 */
export function readOnlyNote(role: Role): string | null {
  if (roleAtLeast(role, "editor")) return null;
  if (role === "reviewer")
    return "You are a reviewer here: you read the inputs as a viewer does, and you check the records submitted for check: comment, return with comments or approve.";
  return "You are a viewer here: you can read everything but not change inputs.";
}

/** What a member may do in a project's review. */
export type ReviewAction = "submit" | "comment" | "decide" | "set-approvals";

/**
 * Why `role` may not take a review action, said beside the disabled control; null when it may.
 * Editors submit but do not sign off: returning and approving is the checker's (or the owner's).
 */
export function reviewActionNote(role: Role, action: ReviewAction): string | null {
  switch (action) {
    case "submit":
      return roleAtLeast(role, "editor") ? null : "Only editors and owners submit a calculation for check.";
    case "comment":
      return roleAtLeast(role, "reviewer")
        ? null
        : "Viewers read records; reviewers, editors and owners comment on them.";
    case "decide":
      return role === "reviewer" || role === "owner"
        ? null
        : "Only reviewers and owners return a record with comments or approve it.";
    case "set-approvals":
      return role === "owner" ? null : "Only owners choose how many approvals a record needs.";
  }
}

import { roleAtLeast, type Role } from "../../../core/contract/workspaces";

/**
 * What a read-only member is told beside the inputs. Reviewing is not built yet, so the
 * reviewer reads as a viewer does, and is told what the role will add rather than shown
 * buttons that do nothing.
 */
export function readOnlyNote(role: Role): string | null {
  if (roleAtLeast(role, "editor")) return null;
  if (role === "reviewer")
    return "You are a reviewer here: you read everything, as a viewer does. Reviewing and approving calculations is coming; until then nothing here asks you to act.";
  return "You are a viewer here: you can read everything but not change inputs.";
}

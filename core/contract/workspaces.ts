import { z } from "zod";

/** Team workspaces, their members and roles. Imports only zod. */

/** Roles from most to least powerful. */
export const ROLES = ["owner", "editor", "reviewer", "viewer"] as const;
export const roleSchema = z.enum(ROLES, { error: "Choose owner, editor, reviewer or viewer." });
export type Role = z.infer<typeof roleSchema>;

const RANK: Record<Role, number> = { owner: 4, editor: 3, reviewer: 2, viewer: 1 };

/** Whether `role` may do what `minimum` may do (owner ⊇ editor ⊇ reviewer ⊇ viewer). */
export function roleAtLeast(role: Role, minimum: Role): boolean {
  return RANK[role] >= RANK[minimum];
}

/** What each role is for, in the words the members page uses. */
export const ROLE_DESCRIPTIONS: Record<Role, string> = {
  owner: "Everything, including members, sharing and deleting the workspace.",
  editor: "Creates and changes projects, load cases and their inputs; creates share links.",
  reviewer:
    "Reads everything, as a viewer does; reviewing and approving calculations is coming. Cannot change inputs.",
  viewer: "Reads only.",
};

export const workspaceNameSchema = z
  .string({ error: "Name the workspace." })
  .trim()
  .min(1, "Name the workspace.")
  .max(100, "A workspace name has at most 100 characters.");

export const workspaceIdParamsSchema = z.object({
  workspaceId: z.uuid({ error: "must be a workspace id (UUID)" }),
});

export const createWorkspaceBodySchema = z.object({ name: workspaceNameSchema });
export type CreateWorkspaceBody = z.infer<typeof createWorkspaceBodySchema>;
export const updateWorkspaceBodySchema = createWorkspaceBodySchema;
export type UpdateWorkspaceBody = z.infer<typeof updateWorkspaceBodySchema>;

/** A workspace as one of its members sees it. */
export const workspaceSchema = z.object({
  id: z.uuid(),
  name: z.string(),
  /** The caller's role here. */
  role: roleSchema,
  memberCount: z.int(),
  createdAt: z.iso.datetime(),
});
export type Workspace = z.infer<typeof workspaceSchema>;

export const workspaceListSchema = z.object({ workspaces: z.array(workspaceSchema) });
export type WorkspaceList = z.infer<typeof workspaceListSchema>;

export const memberSchema = z.object({
  /** The membership's id (what PATCH/DELETE …/members/{memberId} take). */
  id: z.uuid(),
  userId: z.uuid(),
  name: z.string(),
  email: z.string(),
  role: roleSchema,
  joinedAt: z.iso.datetime(),
  /** Last time this member opened anything in the workspace; null if never since joining. */
  lastActiveAt: z.iso.datetime().nullable(),
  /** Whether this row is the caller. */
  isYou: z.boolean(),
});
export type Member = z.infer<typeof memberSchema>;

export const memberListSchema = z.object({ members: z.array(memberSchema) });
export type MemberList = z.infer<typeof memberListSchema>;

export const memberParamsSchema = workspaceIdParamsSchema.extend({
  memberId: z.uuid({ error: "must be a member id (UUID)" }),
});

export const updateMemberBodySchema = z.object({ role: roleSchema });
export type UpdateMemberBody = z.infer<typeof updateMemberBodySchema>;

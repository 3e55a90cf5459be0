import { z } from "zod";
import { emailSchema, linkTokenSchema } from "./auth";
import { roleSchema, workspaceIdParamsSchema } from "./workspaces";

/** Invitations by e-mail into a workspace. Imports only zod. */

/** How long an invitation link stays valid. */
export const INVITATION_LIFETIME_DAYS = 7;

export const INVITATION_STATES = ["pending", "accepted", "revoked", "expired"] as const;
export const invitationStateSchema = z.enum(INVITATION_STATES);
export type InvitationState = z.infer<typeof invitationStateSchema>;

export const createInvitationBodySchema = z.object({
  email: emailSchema,
  role: roleSchema,
});
export type CreateInvitationBody = z.infer<typeof createInvitationBodySchema>;

export const invitationParamsSchema = workspaceIdParamsSchema.extend({
  invitationId: z.uuid({ error: "must be an invitation id (UUID)" }),
});

export const invitationTokenParamsSchema = z.object({ token: linkTokenSchema });

/** An invitation as the workspace's owners see it (never its token). */
export const invitationSchema = z.object({
  id: z.uuid(),
  email: z.string(),
  role: roleSchema,
  state: invitationStateSchema,
  invitedByName: z.string().nullable(),
  createdAt: z.iso.datetime(),
  expiresAt: z.iso.datetime(),
  lastSentAt: z.iso.datetime(),
  sendCount: z.int(),
  acceptedAt: z.iso.datetime().nullable(),
  revokedAt: z.iso.datetime().nullable(),
});
export type Invitation = z.infer<typeof invitationSchema>;

export const invitationListSchema = z.object({ invitations: z.array(invitationSchema) });
export type InvitationList = z.infer<typeof invitationListSchema>;

/** What the person holding the link may see before accepting. */
export const invitationPreviewSchema = z.object({
  workspaceName: z.string(),
  email: z.string(),
  role: roleSchema,
  invitedByName: z.string().nullable(),
  state: invitationStateSchema,
  expiresAt: z.iso.datetime(),
});
export type InvitationPreview = z.infer<typeof invitationPreviewSchema>;

/** After accepting an invitation or joining through a share link. */
export const joinedWorkspaceSchema = z.object({
  workspaceId: z.uuid(),
  role: roleSchema,
  /** True when the caller was a member already (their role was left as it was). */
  alreadyMember: z.boolean(),
});
export type JoinedWorkspace = z.infer<typeof joinedWorkspaceSchema>;

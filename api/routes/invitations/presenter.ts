import type { Invitation, InvitationPreview } from "../../../core/contract/invitations";
import type { InvitationRow } from "../../../db/repositories/invitations";
import { invitationState } from "../../domain/invitations/state";

/** What the owners' list shows (never the token or its hash). */
export function presentInvitation(invitation: InvitationRow): Invitation {
  return {
    id: invitation.id,
    email: invitation.email,
    role: invitation.role,
    state: invitationState(invitation),
    invitedByName: invitation.inviter?.name ?? null,
    createdAt: invitation.createdAt.toISOString(),
    expiresAt: invitation.expiresAt.toISOString(),
    lastSentAt: invitation.lastSentAt.toISOString(),
    sendCount: invitation.sendCount,
    acceptedAt: invitation.acceptedAt?.toISOString() ?? null,
    revokedAt: invitation.revokedAt?.toISOString() ?? null,
  };
}

/** What the holder of the link sees before accepting. */
export function presentInvitationPreview(invitation: InvitationRow): InvitationPreview {
  return {
    workspaceName: invitation.workspace?.name ?? "",
    email: invitation.email,
    role: invitation.role,
    invitedByName: invitation.inviter?.name ?? null,
    state: invitationState(invitation),
    expiresAt: invitation.expiresAt.toISOString(),
  };
}

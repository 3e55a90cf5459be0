import type { AppContext } from "../../context";
import { defineRoute, type AnyRoute } from "../../openapi/registry";
import {
  acceptInvitationHandler,
  createInvitationHandler,
  listInvitationsHandler,
  previewInvitationHandler,
  resendInvitationHandler,
  revokeInvitationHandler,
} from "./handlers";
import {
  createInvitationBodySchema,
  invitationListSchema,
  invitationParamsSchema,
  invitationPreviewSchema,
  invitationResponseSchema,
  invitationTokenParamsSchema,
  joinedWorkspaceSchema,
  workspaceIdParamsSchema,
} from "./schema";

const tag = "invitations";

/** Invitations by e-mail: owners manage them inside a workspace; the invitee previews and accepts by token. */
export function invitationRoutes(context: AppContext): AnyRoute[] {
  return [
    defineRoute({
      method: "get",
      path: "/workspaces/{workspaceId}/invitations",
      tag,
      summary: "Invitations of the workspace with their state",
      access: { kind: "member", role: "owner" },
      request: { params: workspaceIdParamsSchema },
      responses: { 200: { description: "Newest first.", schema: invitationListSchema } },
      handler: listInvitationsHandler,
    }),
    defineRoute({
      method: "post",
      path: "/workspaces/{workspaceId}/invitations",
      tag,
      summary: "Invite someone by e-mail with a role (the link is mailed, valid 7 days)",
      access: { kind: "member", role: "owner" },
      request: { params: workspaceIdParamsSchema, body: createInvitationBodySchema },
      responses: { 201: { description: "Invitation created and mailed.", schema: invitationResponseSchema } },
      errors: {
        409: "Already a member (already_member) or already invited (already_invited).",
        502: "Saved but not mailed.",
      },
      handler: createInvitationHandler(context),
    }),
    defineRoute({
      method: "post",
      path: "/workspaces/{workspaceId}/invitations/{invitationId}/resend",
      tag,
      summary: "Mail a pending or expired invitation again with a new link and 7 more days",
      access: { kind: "member", role: "owner" },
      request: { params: invitationParamsSchema },
      responses: { 200: { description: "Mailed again.", schema: invitationResponseSchema } },
      errors: { 409: "The invitation was accepted or revoked.", 502: "Saved but not mailed." },
      handler: resendInvitationHandler(context),
    }),
    defineRoute({
      method: "delete",
      path: "/workspaces/{workspaceId}/invitations/{invitationId}",
      tag,
      summary: "Revoke an invitation (its link stops working)",
      access: { kind: "member", role: "owner" },
      request: { params: invitationParamsSchema },
      responses: { 204: { description: "Revoked." } },
      errors: { 409: "The invitation was accepted or revoked already." },
      handler: revokeInvitationHandler,
    }),
    defineRoute({
      method: "get",
      path: "/invitations/{token}",
      tag,
      summary: "What an invitation link offers (workspace, role, address, state)",
      access: { kind: "public" },
      request: { params: invitationTokenParamsSchema },
      responses: {
        200: { description: "The invitation as its holder sees it.", schema: invitationPreviewSchema },
      },
      errors: { 404: "No invitation has this link." },
      handler: previewInvitationHandler,
    }),
    defineRoute({
      method: "post",
      path: "/invitations/{token}/accept",
      tag,
      summary: "Accept an invitation: join the workspace with its role",
      access: { kind: "signed-in" },
      request: { params: invitationTokenParamsSchema },
      responses: { 200: { description: "Joined (or was a member already).", schema: joinedWorkspaceSchema } },
      errors: {
        403: "Signed in with another address than the invitation's (invitation_other_address), or the account's address is not confirmed yet (email_not_verified; a confirmation link is mailed).",
        404: "No invitation has this link.",
        409: "Expired, revoked or used (invitation_expired, invitation_revoked, invitation_accepted).",
      },
      handler: acceptInvitationHandler(context),
    }),
  ];
}

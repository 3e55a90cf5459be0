import type { Transaction } from "sequelize";
import { INVITATION_LIFETIME_DAYS, type CreateInvitationBody } from "../../../core/contract/invitations";
import {
  createInvitation,
  findInvitation as findInvitationRow,
  findInvitationByToken,
  listInvitations,
  lockInvitation,
  openInvitations,
  updateInvitation,
  type InvitationRow,
} from "../../../db/repositories/invitations";
import { findUser } from "../../../db/repositories/users";
import { findMembershipOf, type WorkspaceRow } from "../../../db/repositories/workspaces";
import { sendVerificationMail } from "../../auth/email-verification";
import { currentMembership, currentUser } from "../../auth/guards";
import { hashToken, newLinkToken } from "../../auth/tokens";
import { findUserByEmail, sameEmail } from "../../auth/users";
import type { AppContext } from "../../context";
import { errors, HttpError } from "../../errors";
import { invitationMail } from "../../mail/templates";
import type { RouteHandler } from "../../openapi/registry";
import { addMember } from "../../domain/members/join";
import { lockWorkspace } from "../../../db/repositories/workspaces";
import { invitationState } from "../../domain/invitations/state";
import { presentInvitation, presentInvitationPreview } from "./presenter";

type NoInput = Record<string, never>;
type WorkspaceParams = { workspaceId: string };
type InvitationParams = WorkspaceParams & { invitationId: string };
type TokenParams = { token: string };

const DAY_MS = 24 * 60 * 60 * 1000;
const newExpiry = () => new Date(Date.now() + INVITATION_LIFETIME_DAYS * DAY_MS);

/** Mails the invitation link; a failing mail server becomes a 502 that says the invitation exists. */
async function sendInvitation(
  context: AppContext,
  invitation: InvitationRow,
  token: string,
  workspace: Pick<WorkspaceRow, "name">,
  inviterName: string,
) {
  try {
    await context.mailer.send(
      invitationMail({
        to: invitation.email,
        inviterName,
        workspaceName: workspace.name,
        role: invitation.role,
        url: `${context.publicOrigin}/invitations/${token}`,
        expiresAt: invitation.expiresAt,
      }),
    );
  } catch {
    throw errors.mailNotSent("The invitation");
  }
}

export const listInvitationsHandler: RouteHandler<WorkspaceParams, NoInput, NoInput> = async (_req, res) => {
  const rows = await listInvitations(currentMembership(res).workspace.id);
  res.set("Cache-Control", "no-store").json({ invitations: rows.map(presentInvitation) });
};

export function createInvitationHandler(
  context: AppContext,
): RouteHandler<WorkspaceParams, NoInput, CreateInvitationBody> {
  return async (_req, res) => {
    const { workspace } = currentMembership(res);
    const inviter = currentUser(res);
    const { role } = res.locals.input.body;
    // Addresses are identities here: stored lower-case, so the list and the mail agree with sign-in.
    const email = res.locals.input.body.email.toLowerCase();
    const token = newLinkToken();
    const invitation = await context.sequelize.transaction(async (transaction) => {
      await lockWorkspace(workspace.id, transaction);
      const existingUser = await findUserByEmail(email, transaction);
      if (existingUser && (await findMembershipOf(workspace.id, existingUser.id, transaction))) {
        throw errors.conflictWithId(
          "already_member",
          `${existingUser.name} is a member of this workspace already.`,
        );
      }
      const open = await openInvitationFor(workspace.id, email, transaction);
      if (open && invitationState(open) === "pending") {
        throw errors.conflictWithId(
          "already_invited",
          `${open.email} has an invitation already; resend it or revoke it from the list.`,
        );
      }
      // An expired invitation still holds the "one open invitation per address" slot: retire it.
      if (open)
        await updateInvitation(open.id, { revokedAt: new Date(), revokedBy: inviter.id }, transaction);
      return createInvitation(
        {
          workspaceId: workspace.id,
          email,
          role,
          tokenHash: hashToken(token),
          expiresAt: newExpiry(),
          createdBy: inviter.id,
        },
        transaction,
      );
    });
    await sendInvitation(context, invitation, token, workspace, inviter.name);
    const stored = (await findInvitationRow(workspace.id, invitation.id))!;
    res.status(201).json({ invitation: presentInvitation(stored) });
  };
}

function openInvitationFor(workspaceId: string, email: string, transaction: Transaction) {
  return openInvitations(workspaceId, transaction).then(
    (rows) => rows.find((row) => sameEmail(row.email, email)) ?? null,
  );
}

async function findInvitation(workspaceId: string, invitationId: string): Promise<InvitationRow> {
  const invitation = await findInvitationRow(workspaceId, invitationId);
  if (!invitation) throw errors.notFound("This invitation");
  return invitation;
}

/** A fresh link (the old one stops working) and another 7 days, mailed again. */
export function resendInvitationHandler(
  context: AppContext,
): RouteHandler<InvitationParams, NoInput, NoInput> {
  return async (_req, res) => {
    const { workspace } = currentMembership(res);
    const invitation = await findInvitation(workspace.id, res.locals.input.params.invitationId);
    const state = invitationState(invitation);
    if (state === "accepted" || state === "revoked") {
      throw errors.conflictWithId(
        `invitation_${state}`,
        `This invitation was ${state}; invite the person again instead.`,
      );
    }
    const token = newLinkToken();
    const resent = {
      ...(await updateInvitation(invitation.id, {
        tokenHash: hashToken(token),
        expiresAt: newExpiry(),
        lastSentAt: new Date(),
        sendCount: invitation.sendCount + 1,
      })),
      inviter: invitation.inviter,
    };
    await sendInvitation(context, resent, token, workspace, currentUser(res).name);
    res.json({ invitation: presentInvitation(resent) });
  };
}

export const revokeInvitationHandler: RouteHandler<InvitationParams, NoInput, NoInput> = async (
  _req,
  res,
) => {
  const { workspace } = currentMembership(res);
  const invitation = await findInvitation(workspace.id, res.locals.input.params.invitationId);
  const state = invitationState(invitation);
  if (state === "accepted" || state === "revoked") {
    throw errors.conflictWithId(`invitation_${state}`, `This invitation was ${state} already.`);
  }
  await updateInvitation(invitation.id, { revokedAt: new Date(), revokedBy: currentUser(res).id });
  res.status(204).end();
};

async function invitationByToken(token: string, transaction?: Transaction): Promise<InvitationRow> {
  const invitation = await findInvitationByToken(hashToken(token), transaction);
  if (!invitation) {
    throw errors.notFound("This invitation (the link may have been replaced by a newer one)");
  }
  return invitation;
}

export const previewInvitationHandler: RouteHandler<TokenParams, NoInput, NoInput> = async (_req, res) => {
  const invitation = await invitationByToken(res.locals.input.params.token);
  res.set("Cache-Control", "no-store").json(presentInvitationPreview(invitation));
};

const UNUSABLE: Record<"accepted" | "revoked" | "expired", string> = {
  accepted: "This invitation has been used already.",
  revoked: "This invitation was withdrawn by the workspace's owner.",
  expired: "This invitation has expired; ask the workspace's owner to send it again.",
};

/**
 * Accepting needs the invited address, and an account whose address is proven (by the
 * invitation link at sign-up, a confirmation mail or a password reset): otherwise anyone
 * could sign up with someone else's address and take their seat. An unproven account is
 * refused with 403 `email_not_verified` and mailed a confirmation link that leads back here.
 */
export function acceptInvitationHandler(context: AppContext): RouteHandler<TokenParams, NoInput, NoInput> {
  return async (_req, res) => {
    const user = currentUser(res);
    const { token } = res.locals.input.params;
    const result = await context.sequelize.transaction(async (transaction) => {
      const found = await invitationByToken(token, transaction);
      // Lock the row: two tabs accepting at once must not both succeed.
      const invitation = await lockInvitation(found.id, transaction);
      if (!invitation) throw errors.notFound("This invitation");
      const state = invitationState(invitation);
      if (state !== "pending") throw errors.conflictWithId(`invitation_${state}`, UNUSABLE[state]);
      if (!sameEmail(invitation.email, user.email)) {
        throw new HttpError(
          403,
          "invitation_other_address",
          `This invitation was sent to ${invitation.email}; sign in with that address to accept it.`,
        );
      }
      const account = await findUser(user.id, transaction);
      if (!account) throw new Error(`the signed-in account ${user.id} has no row`);
      if (!account.emailVerifiedAt) return { kind: "unverified" as const, account };
      const joined = await addMember(
        {
          workspaceId: invitation.workspaceId,
          userId: user.id,
          role: invitation.role,
          joinedVia: "invitation",
          invitationId: invitation.id,
          addedBy: invitation.createdBy,
        },
        transaction,
      );
      await updateInvitation(invitation.id, { acceptedAt: new Date(), acceptedBy: user.id }, transaction);
      return { kind: "joined" as const, joined };
    });
    if (result.kind === "unverified") {
      await sendVerificationMail(context, result.account, `/invitations/${token}`).catch(() => {
        throw errors.mailNotSent("The confirmation link");
      });
      throw new HttpError(
        403,
        "email_not_verified",
        `Confirm your address first: we have mailed a link to ${result.account.email}. Open it, and you come back here to accept.`,
      );
    }
    res.json({
      workspaceId: result.joined.membership.workspaceId,
      role: result.joined.membership.role,
      alreadyMember: result.joined.alreadyMember,
    });
  };
}

import { randomUUID } from "node:crypto";
import type { AppContext } from "../../api/context";
import { hashPassword } from "../../api/auth/password";
import { hashToken, newLinkToken } from "../../api/auth/tokens";
import type { Role } from "../../core/contract/workspaces";
import { DevMailMessage } from "../../db/models/dev-mail-message";
import { Invitation } from "../../db/models/invitation";
import { Membership } from "../../db/models/membership";
import { EmailVerificationToken } from "../../db/models/email-verification-token";
import { PasswordResetToken } from "../../db/models/password-reset-token";
import { ShareLink } from "../../db/models/share-link";
import { User } from "../../db/models/user";
import { Workspace } from "../../db/models/workspace";
import { TEST_PASSWORD, uniqueEmail } from "./accounts";

/** Who calls a route in the role matrix. */
export const ACTORS = ["anonymous", "nonMember", "viewer", "reviewer", "editor", "owner"] as const;
export type Actor = (typeof ACTORS)[number];

type Person = { id: string; email: string };

/**
 * A fresh world for one role-matrix case, made straight in the database (fast): a workspace
 * with one member of each role, a spare viewer to change or remove, a pending invitation,
 * an active share link, and a second workspace the actor is not in. Add fields here when
 * new resources (projects, load cases, …) need something to act on.
 */
export type RoleFixture = {
  actor: Actor;
  /** The actor's account (absent for anonymous). */
  actorUser: Person | null;
  /** Cookie header for the actor ("" for anonymous). */
  cookie: string;
  workspaceId: string;
  /** A viewer member other than the actor (for PATCH/DELETE members). */
  spareMemberId: string;
  invitationId: string;
  invitationToken: string;
  shareLinkId: string;
  shareLinkToken: string;
  /** A workspace whose only member is the spare person. */
  otherWorkspaceId: string;
  /** An account nobody acts as, for sign-in and password-reset cases. */
  bystander: Person & { password: string };
  context: AppContext;
};

export type RoleFixtureFactory = (actor: Actor) => Promise<RoleFixture>;

/** Creates the people once (hashing is slow), then a fresh workspace per case. */
export async function roleFixtureFactory(context: AppContext): Promise<RoleFixtureFactory> {
  const passwordHash = await hashPassword(TEST_PASSWORD);
  const person = async (label: string) => {
    const user = await User.create({
      name: `Matrix ${label}`,
      email: uniqueEmail(`matrix-${label}`),
      passwordHash,
      // As after the confirmation mail: invitations need a confirmed address.
      emailVerifiedAt: new Date(),
    });
    return { id: user.id, email: user.email };
  };
  const people: Record<Exclude<Actor, "anonymous">, Person> = {
    nonMember: await person("outsider"),
    viewer: await person("viewer"),
    reviewer: await person("reviewer"),
    editor: await person("editor"),
    owner: await person("owner"),
  };
  const spare = await person("spare");
  const bystander = { ...(await person("bystander")), password: TEST_PASSWORD };

  return async (actor) => {
    const workspace = await Workspace.create({
      name: `Matrix ${randomUUID().slice(0, 6)}`,
      createdBy: people.owner.id,
    });
    const roles: [Person, Role][] = [
      [people.owner, "owner"],
      [people.editor, "editor"],
      [people.reviewer, "reviewer"],
      [people.viewer, "viewer"],
    ];
    for (const [who, role] of roles) {
      await Membership.create({ workspaceId: workspace.id, userId: who.id, role, joinedVia: "seed" });
    }
    const spareMember = await Membership.create({
      workspaceId: workspace.id,
      userId: spare.id,
      role: "viewer",
      joinedVia: "seed",
    });
    const other = await Workspace.create({ name: "Matrix other", createdBy: spare.id });
    await Membership.create({ workspaceId: other.id, userId: spare.id, role: "owner", joinedVia: "seed" });

    const invitationToken = newLinkToken();
    const invitation = await Invitation.create({
      workspaceId: workspace.id,
      email: uniqueEmail("matrix-invitee"),
      role: "viewer",
      tokenHash: hashToken(invitationToken),
      expiresAt: new Date(Date.now() + 86_400_000),
      createdBy: people.owner.id,
    });
    const shareLinkToken = newLinkToken();
    const shareLink = await ShareLink.create({
      workspaceId: workspace.id,
      role: "viewer",
      tokenHash: hashToken(shareLinkToken),
      expiresAt: new Date(Date.now() + 86_400_000),
      createdBy: people.owner.id,
    });

    const actorUser = actor === "anonymous" ? null : people[actor];
    // A new session per case: sign-in, sign-out and password cases end the sessions they find.
    const cookie = actorUser
      ? context.auth
          .createSessionCookie((await context.auth.createSession(actorUser.id, {})).id)
          .serialize()
          .split(";")[0]
      : "";
    return {
      actor,
      actorUser,
      cookie,
      workspaceId: workspace.id,
      spareMemberId: spareMember.id,
      invitationId: invitation.id,
      invitationToken,
      shareLinkId: shareLink.id,
      shareLinkToken,
      otherWorkspaceId: other.id,
      bystander,
      context,
    };
  };
}

/** An invitation into the fixture's other workspace for the actor's own address (for the accept route). */
export async function invitationForActor(f: RoleFixture): Promise<string> {
  const token = newLinkToken();
  await Invitation.create({
    workspaceId: f.otherWorkspaceId,
    email: f.actorUser?.email ?? uniqueEmail("nobody"),
    role: "reviewer",
    tokenHash: hashToken(token),
    expiresAt: new Date(Date.now() + 86_400_000),
  });
  return token;
}

/** A fresh password-reset token for the bystander. */
export async function resetTokenForBystander(f: RoleFixture): Promise<string> {
  const token = newLinkToken();
  await PasswordResetToken.create({
    userId: f.bystander.id,
    tokenHash: hashToken(token),
    expiresAt: new Date(Date.now() + 3_600_000),
  });
  return token;
}

/** A fresh confirmation link's token for the bystander (as the confirmation mail would carry). */
export async function verificationTokenForBystander(f: RoleFixture): Promise<string> {
  const token = newLinkToken();
  await EmailVerificationToken.create({
    userId: f.bystander.id,
    tokenHash: hashToken(token),
    expiresAt: new Date(Date.now() + 3_600_000),
  });
  return token;
}

/** One caught message to read. */
export async function someMailId(): Promise<string> {
  const message = await DevMailMessage.create({
    fromAddress: "Sigmacube <no-reply@sigmacube.test>",
    toAddresses: [uniqueEmail("matrix-mail")],
    subject: "Matrix",
    textBody: "Matrix",
  });
  return message.id;
}

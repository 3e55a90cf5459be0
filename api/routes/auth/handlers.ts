import type { Request, Response } from "express";
import { Op, UniqueConstraintError } from "sequelize";
import type {
  ForgotPasswordBody,
  ResetPasswordBody,
  SignInBody,
  SignUpBody,
  VerifyEmailBody,
} from "../../../core/contract/auth";
import { EmailVerificationToken } from "../../../db/models/email-verification-token";
import { Invitation } from "../../../db/models/invitation";
import { PasswordResetToken } from "../../../db/models/password-reset-token";
import { User } from "../../../db/models/user";
import { markEmailVerified, sendVerificationMail } from "../../auth/email-verification";
import { currentUser } from "../../auth/guards";
import { hashPassword, verifyAgainstNobody, verifyPassword } from "../../auth/password";
import { appendCookie, endSession, startSession } from "../../auth/session-middleware";
import { hashToken, newLinkToken } from "../../auth/tokens";
import { deleteUnusedResetLinks } from "../../auth/reset-links";
import { findUserByEmail, sameEmail } from "../../auth/users";
import type { AppContext } from "../../context";
import { errors } from "../../errors";
import { accountExistsMail, passwordResetMail } from "../../mail/templates";
import type { RouteHandler } from "../../openapi/registry";
import { invitationState } from "../../domain/invitations/state";
import { presentUser } from "../../domain/accounts/present-user";
import { FORGOT_PASSWORD_NOTICE, RESET_LINK_LIFETIME_MS, SIGN_UP_NOTICE } from "./schema";

type NoInput = Record<string, never>;
type BodyHandler<B> = RouteHandler<NoInput, NoInput, B>;

const noStore = (res: Response) => res.set("Cache-Control", "no-store");

/**
 * Sign-up. From an invitation link whose address is the one typed, the link proves the
 * address: the account is made confirmed and signed in (201), as before. Otherwise the
 * answer is the same 202 "check your mail" whether or not the address has an account, and
 * it comes before any work is done, so neither the answer nor its timing tells a stranger
 * which addresses have accounts: a new address gets a confirmation link, a known one a
 * reminder that it has an account.
 */
export function signUpHandler(context: AppContext): BodyHandler<SignUpBody> {
  return async (req, res) => {
    const body = res.locals.input.body;
    if (body.invitationToken && (await pendingInvitationFor(body.invitationToken, body.email))) {
      // Whoever holds the invitation link reads that address's mail: telling them it has an account reveals nothing.
      if (await findUserByEmail(body.email)) throw emailTaken();
      const user = await createUser(body, { emailVerifiedAt: new Date(), lastSignInAt: new Date() });
      if (!user) throw emailTaken();
      await startSession(context.auth, res, user.id);
      noStore(res)
        .status(201)
        .json({ user: presentUser(user) });
      return;
    }
    noStore(res).status(202).json({ message: SIGN_UP_NOTICE });
    afterAnswer(req, "sign-up mail", () => signUpByMail(context, body));
  };
}

const emailTaken = () =>
  errors.conflictWithId(
    "email_taken",
    "An account already uses this e-mail address. Sign in, or reset its password.",
  );

/** The invitation behind `token` if it is pending and addressed to `email`. */
async function pendingInvitationFor(token: string, email: string): Promise<Invitation | null> {
  const invitation = await Invitation.findOne({ where: { tokenHash: hashToken(token) } });
  if (!invitation || invitationState(invitation) !== "pending" || !sameEmail(invitation.email, email))
    return null;
  return invitation;
}

/** Creates the account, or returns null when the address was taken at the same moment (the unique index decides). */
async function createUser(
  body: SignUpBody,
  extra: { emailVerifiedAt?: Date; lastSignInAt?: Date } = {},
): Promise<User | null> {
  const passwordHash = await hashPassword(body.password);
  try {
    return await User.create({ name: body.name, email: body.email, passwordHash, ...extra });
  } catch (error) {
    if (error instanceof UniqueConstraintError) return null;
    throw error;
  }
}

/** The work behind a 202 sign-up: a confirmation link for a new address, a reminder for a known one. */
async function signUpByMail(context: AppContext, body: SignUpBody): Promise<void> {
  const existing = await findUserByEmail(body.email);
  const user = existing ? null : await createUser(body);
  if (user) return sendVerificationMail(context, user, body.next ?? null);
  const owner = existing ?? (await findUserByEmail(body.email));
  if (!owner) return;
  await context.mailer.send(
    accountExistsMail({
      to: owner.email,
      name: owner.name,
      signInUrl: `${context.publicOrigin}/sign-in?email=${encodeURIComponent(owner.email)}`,
      resetUrl: `${context.publicOrigin}/forgot-password`,
    }),
  );
}

/**
 * Runs `work` after the answer has been sent, logging (not throwing) what goes wrong:
 * for answers that must not depend on whether an account exists, nor take longer when it does.
 */
function afterAnswer(req: Request, what: string, work: () => Promise<void>) {
  setImmediate(() => {
    work().catch((error: unknown) => req.log?.error({ err: error }, `${what} failed`));
  });
}

/** Opening the confirmation link: the address is proven, and the browser that opened it is signed in. */
export function verifyEmailHandler(context: AppContext): BodyHandler<VerifyEmailBody> {
  return async (_req, res) => {
    const tokenProblem = (message: string) => errors.invalidInput([{ path: "token", message }]);
    const row = await EmailVerificationToken.findOne({
      where: { tokenHash: hashToken(res.locals.input.body.token) },
    });
    // A new link comes from "Forgot your password?" (a reset proves the address too), not from signing up
    // again: that only reminds the address of its account, so whoever chose the first password keeps no hold on it.
    if (!row)
      throw tokenProblem(
        "This confirmation link is not valid. Sign in, or use “Forgot your password?”: a reset confirms the address too.",
      );
    if (row.usedAt) throw tokenProblem("This confirmation link has been used already. Sign in.");
    if (row.expiresAt.getTime() <= Date.now())
      throw tokenProblem(
        "This confirmation link has expired. Sign in, or use “Forgot your password?”: a reset confirms the address too.",
      );
    const user = await context.sequelize.transaction(async (transaction) => {
      // Single use even if opened twice at once.
      const [claimed] = await EmailVerificationToken.update(
        { usedAt: new Date() },
        { where: { id: row.id, usedAt: { [Op.is]: null } }, transaction },
      );
      if (claimed !== 1) throw tokenProblem("This confirmation link has been used already. Sign in.");
      const owner = await User.findByPk(row.userId, { transaction, rejectOnEmpty: true });
      await markEmailVerified(owner, transaction);
      await owner.update({ lastSignInAt: new Date() }, { transaction });
      return owner;
    });
    await startSession(context.auth, res, user.id);
    noStore(res).json({ user: presentUser(user), next: row.nextPath });
  };
}

export function signInHandler(context: AppContext): BodyHandler<SignInBody> {
  return async (_req, res) => {
    const { email, password } = res.locals.input.body;
    const user = await findUserByEmail(email);
    // Unknown address and wrong password take the same time and give the same answer.
    const ok = user ? await verifyPassword(user.passwordHash, password) : await verifyAgainstNobody(password);
    if (!user || !ok) throw errors.invalidCredentials();
    await user.update({ lastSignInAt: new Date() });
    await startSession(context.auth, res, user.id);
    noStore(res).json({ user: presentUser(user) });
  };
}

export function signOutHandler(context: AppContext): RouteHandler<NoInput, NoInput, NoInput> {
  return async (_req, res) => {
    await endSession(context.auth, res);
    res.status(204).end();
  };
}

export function signOutEverywhereHandler(context: AppContext): RouteHandler<NoInput, NoInput, NoInput> {
  return async (_req, res) => {
    await context.auth.invalidateUserSessions(currentUser(res).id);
    appendCookie(res, context.auth.createBlankSessionCookie().serialize());
    res.status(204).end();
  };
}

export const sessionHandler: RouteHandler<NoInput, NoInput, NoInput> = (_req, res) => {
  const user = res.locals.user as Parameters<typeof presentUser>[0] | null;
  noStore(res).json({ user: user ? presentUser(user) : null });
};

/**
 * Answers first, then looks the address up, issues the link and mails it: a known and an
 * unknown address get the same answer in the same time.
 */
export function forgotPasswordHandler(context: AppContext): BodyHandler<ForgotPasswordBody> {
  return (req, res) => {
    const { email } = res.locals.input.body;
    noStore(res).status(202).json({ message: FORGOT_PASSWORD_NOTICE });
    afterAnswer(req, "reset mail", () => issueResetLink(context, email));
  };
}

async function issueResetLink(context: AppContext, email: string): Promise<void> {
  const user = await findUserByEmail(email);
  if (!user) return;
  const token = newLinkToken();
  await context.sequelize.transaction(async (transaction) => {
    // Only the newest link works: asking again retires the earlier unused ones.
    await PasswordResetToken.destroy({ where: { userId: user.id, usedAt: null }, transaction });
    await PasswordResetToken.create(
      {
        userId: user.id,
        tokenHash: hashToken(token),
        expiresAt: new Date(Date.now() + RESET_LINK_LIFETIME_MS),
      },
      { transaction },
    );
  });
  await context.mailer.send(
    passwordResetMail({
      to: user.email,
      name: user.name,
      url: `${context.publicOrigin}/reset-password/${token}`,
    }),
  );
}

export function resetPasswordHandler(context: AppContext): BodyHandler<ResetPasswordBody> {
  return async (_req, res) => {
    const { token, password } = res.locals.input.body;
    const tokenProblem = (message: string) => errors.invalidInput([{ path: "token", message }]);
    const row = await PasswordResetToken.findOne({ where: { tokenHash: hashToken(token) } });
    if (!row) throw tokenProblem("This reset link is not valid. Ask for a new one.");
    if (row.usedAt) throw tokenProblem("This reset link has been used already. Ask for a new one.");
    if (row.expiresAt.getTime() <= Date.now())
      throw tokenProblem("This reset link has expired (links work for one hour). Ask for a new one.");
    const passwordHash = await hashPassword(password);
    const user = await context.sequelize.transaction(async (transaction) => {
      // The conditional update makes the link single-use even if it is opened twice at once.
      const [claimed] = await PasswordResetToken.update(
        { usedAt: new Date() },
        { where: { id: row.id, usedAt: { [Op.is]: null } }, transaction },
      );
      if (claimed !== 1) throw tokenProblem("This reset link has been used already. Ask for a new one.");
      const owner = await User.findByPk(row.userId, { transaction, rejectOnEmpty: true });
      await owner.update({ passwordHash, passwordChangedAt: new Date() }, { transaction });
      // Any other link issued before this change must not work after it.
      await deleteUnusedResetLinks(owner.id, transaction);
      // The link came by mail to the address: it is proven.
      await markEmailVerified(owner, transaction);
      return owner;
    });
    // Every other session ends; this browser gets a new one.
    await context.auth.invalidateUserSessions(user.id);
    res.locals.session = null;
    await startSession(context.auth, res, user.id);
    noStore(res).json({ user: presentUser(user) });
  };
}

import type { Response } from "express";
import { Op, UniqueConstraintError } from "sequelize";
import type {
  ForgotPasswordBody,
  ResetPasswordBody,
  SignInBody,
  SignUpBody,
} from "../../../core/contract/auth";
import { PasswordResetToken } from "../../../db/models/password-reset-token";
import { User } from "../../../db/models/user";
import { currentUser } from "../../auth/guards";
import { hashPassword, verifyAgainstNobody, verifyPassword } from "../../auth/password";
import { appendCookie, endSession, startSession } from "../../auth/session-middleware";
import { hashToken, newLinkToken } from "../../auth/tokens";
import { findUserByEmail } from "../../auth/users";
import type { AppContext } from "../../context";
import { errors } from "../../errors";
import { passwordResetMail } from "../../mail/templates";
import type { RouteHandler } from "../../openapi/registry";
import { presentUser } from "./presenter";
import { FORGOT_PASSWORD_NOTICE, RESET_LINK_LIFETIME_MS } from "./schema";

type NoInput = Record<string, never>;
type BodyHandler<B> = RouteHandler<NoInput, NoInput, B>;

const noStore = (res: Response) => res.set("Cache-Control", "no-store");

export function signUpHandler(context: AppContext): BodyHandler<SignUpBody> {
  return async (_req, res) => {
    const { name, email, password } = res.locals.input.body;
    if (await findUserByEmail(email)) {
      throw errors.conflictWithId(
        "email_taken",
        "An account already uses this e-mail address. Sign in, or reset its password.",
      );
    }
    let user: User;
    try {
      user = await User.create({
        name,
        email,
        passwordHash: await hashPassword(password),
        lastSignInAt: new Date(),
      });
    } catch (error) {
      // Two sign-ups with one address at the same moment: the unique index decides.
      if (error instanceof UniqueConstraintError) {
        throw errors.conflictWithId("email_taken", "An account already uses this e-mail address.");
      }
      throw error;
    }
    await startSession(context.auth, res, user.id);
    noStore(res)
      .status(201)
      .json({ user: presentUser(user) });
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

export function forgotPasswordHandler(context: AppContext): BodyHandler<ForgotPasswordBody> {
  return async (req, res) => {
    const user = await findUserByEmail(res.locals.input.body.email);
    if (user) {
      const token = newLinkToken();
      // Only the newest link works: asking again retires the earlier unused ones.
      await PasswordResetToken.destroy({ where: { userId: user.id, usedAt: null } });
      await PasswordResetToken.create({
        userId: user.id,
        tokenHash: hashToken(token),
        expiresAt: new Date(Date.now() + RESET_LINK_LIFETIME_MS),
      });
      const mail = passwordResetMail({
        to: user.email,
        name: user.name,
        url: `${context.publicOrigin}/reset-password/${token}`,
      });
      // Not awaited: waiting for the mail server would make known addresses answer measurably slower.
      void context.mailer
        .send(mail)
        .catch((error: unknown) => req.log?.error({ err: error }, "reset mail failed"));
    }
    noStore(res).status(202).json({ message: FORGOT_PASSWORD_NOTICE });
  };
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
      return owner;
    });
    // Every other session ends; this browser gets a new one.
    await context.auth.invalidateUserSessions(user.id);
    res.locals.session = null;
    await startSession(context.auth, res, user.id);
    noStore(res).json({ user: presentUser(user) });
  };
}

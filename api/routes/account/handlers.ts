import { Op } from "sequelize";
import type { ChangePasswordBody, UpdateAccountBody } from "../../../core/contract/account";
import { Session } from "../../../db/models/session";
import { User } from "../../../db/models/user";
import { currentUser } from "../../auth/guards";
import { hashPassword, verifyPassword } from "../../auth/password";
import { deleteUnusedResetLinks } from "../../auth/reset-links";
import { hashToken } from "../../auth/tokens";
import { errors } from "../../errors";
import type { RouteHandler } from "../../openapi/registry";
import { presentUser } from "../../domain/accounts/present-user";

type NoInput = Record<string, never>;

async function signedInRow(res: Parameters<typeof currentUser>[0]): Promise<User> {
  const user = await User.findByPk(currentUser(res).id);
  if (!user) throw errors.unauthorized();
  return user;
}

export const getAccountHandler: RouteHandler<NoInput, NoInput, NoInput> = async (_req, res) => {
  res.set("Cache-Control", "no-store").json({ user: presentUser(await signedInRow(res)) });
};

export const updateAccountHandler: RouteHandler<NoInput, NoInput, UpdateAccountBody> = async (_req, res) => {
  const user = await signedInRow(res);
  await user.update({ name: res.locals.input.body.name });
  res.json({ user: presentUser(user) });
};

/** Changes the password after checking the current one; every other session of the account ends. */
export const changePasswordHandler: RouteHandler<NoInput, NoInput, ChangePasswordBody> = async (
  _req,
  res,
) => {
  const { currentPassword, newPassword } = res.locals.input.body;
  const user = await signedInRow(res);
  if (!(await verifyPassword(user.passwordHash, currentPassword))) {
    throw errors.invalidInput([{ path: "currentPassword", message: "That is not your current password." }]);
  }
  const passwordHash = await hashPassword(newPassword);
  await user.sequelize.transaction(async (transaction) => {
    await user.update({ passwordHash, passwordChangedAt: new Date() }, { transaction });
    // A reset link mailed before the change (and perhaps read by someone else) must not undo it.
    await deleteUnusedResetLinks(user.id, transaction);
  });
  const session = res.locals.session as { id: string };
  await Session.destroy({ where: { userId: user.id, id: { [Op.ne]: hashToken(session.id) } } });
  res.status(204).end();
};

import type { ChangePasswordBody, UpdateAccountBody } from "../../../core/contract/account";
import {
  endOtherSessions,
  findUser,
  setPassword,
  updateUser,
  type UserRow,
} from "../../../db/repositories/users";
import { currentUser } from "../../auth/guards";
import { hashPassword, verifyPassword } from "../../auth/password";
import { hashToken } from "../../auth/tokens";
import { errors } from "../../errors";
import type { RouteHandler } from "../../openapi/registry";
import { presentUser } from "../../domain/accounts/present-user";

type NoInput = Record<string, never>;

async function signedInRow(res: Parameters<typeof currentUser>[0]): Promise<UserRow> {
  const user = await findUser(currentUser(res).id);
  if (!user) throw errors.unauthorized();
  return user;
}

export const getAccountHandler: RouteHandler<NoInput, NoInput, NoInput> = async (_req, res) => {
  res.set("Cache-Control", "no-store").json({ user: presentUser(await signedInRow(res)) });
};

export const updateAccountHandler: RouteHandler<NoInput, NoInput, UpdateAccountBody> = async (_req, res) => {
  const user = await signedInRow(res);
  res.json({ user: presentUser(await updateUser(user.id, { name: res.locals.input.body.name })) });
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
  // One transaction: a reset link mailed before the change (perhaps read by someone else) must not undo it.
  await setPassword(user.id, passwordHash);
  const session = res.locals.session as { id: string };
  await endOtherSessions(user.id, hashToken(session.id));
  res.status(204).end();
};

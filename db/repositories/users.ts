import { Op, type Transaction } from "sequelize";
import { PasswordResetToken } from "../models/password-reset-token";
import { Session } from "../models/session";
import { User } from "../models/user";
import { toPlainOrNull, updateById, type Row } from "./plain";

/**
 * The names of the users with these ids, by id (one query; unknown ids are left out).
 * Inside a transaction, pass it: a query outside it needs a second connection while the
 * transaction holds one, and ten such writes at once drained the pool of ten until every
 * request waited out the acquire timeout (503).
 */
export async function userNames(ids: string[], transaction?: Transaction): Promise<Map<string, string>> {
  if (ids.length === 0) return new Map();
  const users = await User.findAll({ attributes: ["id", "name"], where: { id: ids }, transaction });
  return new Map(users.map((u) => [u.id, u.name]));
}

/** An account, as a plain object (with its password hash: never send it; presenters pick fields). */
export type UserRow = Row<User>;

/** The account `id`, or null. */
export async function findUser(id: string, transaction?: Transaction): Promise<UserRow | null> {
  return toPlainOrNull(await User.findByPk(id, { transaction }));
}

/** Sets `values` on the account `id`; the row as stored after. */
export async function updateUser(
  id: string,
  values: Partial<UserRow>,
  transaction?: Transaction,
): Promise<UserRow> {
  return (await updateById(User, id, values, transaction))!;
}

/**
 * Sets a new password hash and deletes the account's reset links that were never used (a
 * link mailed before the change, perhaps read by someone else, must not undo it), both in
 * `transaction` or, without one, in a transaction of their own.
 */
export async function setPassword(
  userId: string,
  passwordHash: string,
  transaction?: Transaction,
): Promise<void> {
  const run = async (t: Transaction) => {
    await User.update(
      { passwordHash, passwordChangedAt: new Date() },
      { where: { id: userId }, transaction: t },
    );
    await PasswordResetToken.destroy({ where: { userId, usedAt: null }, transaction: t });
  };
  if (transaction) await run(transaction);
  else await User.sequelize!.transaction(run);
}

/** Ends every session of the account but the one whose stored id is `keepSessionId`. */
export async function endOtherSessions(
  userId: string,
  keepSessionId: string,
  transaction?: Transaction,
): Promise<void> {
  await Session.destroy({ where: { userId, id: { [Op.ne]: keepSessionId } }, transaction });
}

import type { Transaction } from "sequelize";
import { PasswordResetToken } from "../../db/models/password-reset-token";

/**
 * Deletes the account's reset links that were never used. Called whenever the password
 * changes: a link mailed before the change (and perhaps read by someone else) must not
 * undo it.
 */
export async function deleteUnusedResetLinks(userId: string, transaction?: Transaction): Promise<void> {
  await PasswordResetToken.destroy({ where: { userId, usedAt: null }, transaction });
}

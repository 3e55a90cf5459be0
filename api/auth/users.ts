import { col, fn, where, type Transaction } from "sequelize";
import { User } from "../../db/models/user";

/** The account for `email`, compared case-insensitively (as the unique index on lower(email) does). */
export function findUserByEmail(email: string, transaction?: Transaction): Promise<User | null> {
  return User.findOne({ where: where(fn("lower", col("email")), email.trim().toLowerCase()), transaction });
}

/** Whether two addresses are the same account's (case-insensitive, trimmed). */
export function sameEmail(a: string, b: string): boolean {
  return a.trim().toLowerCase() === b.trim().toLowerCase();
}

import type { Transaction } from "sequelize";
import { User } from "../models/user";

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

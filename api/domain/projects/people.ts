import type { Transaction } from "sequelize";
import { User } from "../../../db/models/user";

/** Someone named on a record, as presenters send it. */
export type PersonRef = { id: string; name: string } | null;

/**
 * Looks up the names of the users with these ids (one query); unknown ids are left out.
 * Inside a transaction, pass it: a query outside it needs a second connection while the
 * transaction holds one, and ten such writes at once drained the pool of ten until every
 * request waited out the acquire timeout (503).
 */
export async function peopleById(
  ids: (string | null | undefined)[],
  transaction?: Transaction,
): Promise<Map<string, PersonRef>> {
  const unique = [...new Set(ids.filter((id): id is string => !!id))];
  if (unique.length === 0) return new Map();
  const users = await User.findAll({ attributes: ["id", "name"], where: { id: unique }, transaction });
  return new Map(users.map((u) => [u.id, { id: u.id, name: u.name }]));
}

/** The person for `id` from a map made by {@link peopleById}, or null. */
export function personOf(people: Map<string, PersonRef>, id: string | null): PersonRef {
  return (id && people.get(id)) || null;
}

import type { Transaction } from "sequelize";
import { userNames } from "../../../db/repositories/users";

/** Someone named on a record, as presenters send it. */
export type PersonRef = { id: string; name: string } | null;

/**
 * Looks up the names of the users with these ids (one query); unknown ids are left out.
 * Inside a transaction, pass it (see userNames: a second connection per write drains the pool).
 */
export async function peopleById(
  ids: (string | null | undefined)[],
  transaction?: Transaction,
): Promise<Map<string, PersonRef>> {
  const unique = [...new Set(ids.filter((id): id is string => !!id))];
  const names = await userNames(unique, transaction);
  return new Map([...names].map(([id, name]) => [id, { id, name }]));
}

/** The person for `id` from a map made by {@link peopleById}, or null. */
export function personOf(people: Map<string, PersonRef>, id: string | null): PersonRef {
  return (id && people.get(id)) || null;
}

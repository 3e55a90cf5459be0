import type { User as SessionUser } from "lucia";
import type { User } from "../../../core/contract/auth";
import type { UserRow } from "../../../db/repositories/users";

/** The only user fields that leave the server (never the password hash or a session id). */
export function presentUser(user: UserRow | SessionUser): User {
  return {
    id: user.id,
    name: user.name,
    email: user.email,
    createdAt: new Date(user.createdAt).toISOString(),
  };
}

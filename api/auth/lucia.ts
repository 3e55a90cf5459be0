import { Lucia, TimeSpan } from "lucia";
import { SequelizeSessionAdapter, type SessionUserAttributes } from "./sequelize-adapter";

/** The session cookie's name. */
export const SESSION_COOKIE = "sigmacube_session";

/**
 * lucia over PostgreSQL. Sessions last 30 days and lucia extends them when half is used
 * (`session.fresh`). The cookie is HttpOnly and SameSite=Lax always; Secure when `secure`
 * (everywhere but plain-http development and tests, see `sessionCookieSecure`).
 */
export function createLucia(options: { secure: boolean }) {
  return new Lucia(new SequelizeSessionAdapter(), {
    sessionExpiresIn: new TimeSpan(30, "d"),
    sessionCookie: {
      name: SESSION_COOKIE,
      attributes: { secure: options.secure, sameSite: "lax", path: "/" },
    },
    getUserAttributes: (attributes) => attributes,
  });
}

export type Auth = ReturnType<typeof createLucia>;

declare module "lucia" {
  interface Register {
    Lucia: Auth;
    DatabaseUserAttributes: SessionUserAttributes;
    UserId: string;
  }
}

import type { Logger } from "pino";
import type { Sequelize } from "sequelize";
import { createLucia, type Auth } from "./auth/lucia";
import { publicOrigin as originOf, sessionCookieSecure, type Env } from "./env";
import { createMailer, type Mailer } from "./mail/mailer";
import { defaultRateLimits, type RateLimitSettings } from "./middleware/rate-limit";

/** What every route needs, built once per process by main.ts (or by a test). */
export type AppContext = {
  env: Env;
  sequelize: Sequelize;
  logger: Logger;
  /** The package version, reported by /api/health. */
  version: string;
  /** Folder of the built web app (index.html and assets); null serves no app. */
  webDist: string | null;
  /**
   * Where browsers reach the app (links in mail, the Origin check). With PORT=0 it is
   * known only once the server listens; startServer sets it before any request arrives.
   */
  publicOrigin: string;
  /** lucia: sessions in PostgreSQL, the session cookie. */
  auth: Auth;
  /** Outgoing mail (real SMTP or the fake server behind /dev/mailbox). */
  mailer: Mailer;
  rateLimits: RateLimitSettings;
};

/** Builds the context from its parts, filling in auth, mail and rate limits. */
export function buildAppContext(parts: {
  env: Env;
  sequelize: Sequelize;
  logger: Logger;
  version: string;
  webDist: string | null;
  publicOrigin?: string;
  rateLimits?: Partial<RateLimitSettings>;
}): AppContext {
  const context: AppContext = {
    ...parts,
    publicOrigin: parts.publicOrigin ?? originOf(parts.env, parts.env.PORT),
    auth: createLucia({ secure: sessionCookieSecure(parts.env) }),
    mailer: createMailer({
      smtpUrl: parts.env.SMTP_URL,
      logger: parts.logger,
      from: () => `Sigmacube <no-reply@${new URL(context.publicOrigin).hostname}>`,
    }),
    rateLimits: { ...defaultRateLimits, ...parts.rateLimits },
  };
  return context;
}

import type { Request, RequestHandler } from "express";
import {
  ipKeyGenerator,
  rateLimit,
  type ClientRateLimitInfo,
  type Options,
  type Store,
} from "express-rate-limit";
import { QueryTypes, type Sequelize } from "sequelize";
import { errors } from "../errors";

/** One limit: at most `limit` requests per client per `windowMs`. */
export type Limit = { limit: number; windowMs: number };

/** The limited operations and their limits; tests pass small ones. */
export type RateLimitSettings = {
  /** Failed sign-ins per client address (a correct sign-in does not count). */
  signIn: Limit;
  /** Failed sign-ins per account (the normalised e-mail address), from any address. */
  signInPerAccount: Limit;
  signUp: Limit;
  forgotPassword: Limit;
  /** Prepended to every key, so one test's counters cannot fill another's. */
  prefix: string;
};

/** The names a route can ask for; the per-account sign-in limit comes with "signIn". */
export type RateLimitName = Exclude<keyof RateLimitSettings, "prefix" | "signInPerAccount">;

const MINUTE = 60_000;

/** Defaults: generous for a person, tight for a script guessing passwords or addresses. */
export const defaultRateLimits: RateLimitSettings = {
  signIn: { limit: 10, windowMs: 15 * MINUTE },
  signInPerAccount: { limit: 10, windowMs: 60 * MINUTE },
  signUp: { limit: 10, windowMs: 60 * MINUTE },
  forgotPassword: { limit: 5, windowMs: 60 * MINUTE },
  prefix: "",
};

/**
 * express-rate-limit's store in PostgreSQL (`rate_limit_hits`), so every API process
 * counts the same hits. Written here rather than taken from @acpr/rate-limit-postgresql
 * because that package creates its own schema and tables at run time, outside our
 * migrations; this is one upsert per request over a table the migrations own.
 */
export class PostgresRateLimitStore implements Store {
  readonly localKeys = false;
  private windowMs = MINUTE;

  constructor(
    private readonly sequelize: Sequelize,
    readonly prefix: string,
  ) {}

  init(options: Options) {
    this.windowMs = options.windowMs;
  }

  async increment(key: string): Promise<ClientRateLimitInfo> {
    // A window that has ended starts again at 1; otherwise one more hit. One statement, so concurrent requests cannot both see "fresh".
    const rows = await this.sequelize.query<{ hits: number; reset_at: Date }>(
      `insert into rate_limit_hits (key, hits, reset_at)
       values (:key, 1, now() + make_interval(secs => :seconds))
       on conflict (key) do update set
         hits = case when rate_limit_hits.reset_at <= now() then 1 else rate_limit_hits.hits + 1 end,
         reset_at = case when rate_limit_hits.reset_at <= now() then excluded.reset_at else rate_limit_hits.reset_at end
       returning hits, reset_at`,
      { replacements: { key: this.prefix + key, seconds: this.windowMs / 1000 }, type: QueryTypes.SELECT },
    );
    return { totalHits: rows[0].hits, resetTime: new Date(rows[0].reset_at) };
  }

  async get(key: string): Promise<ClientRateLimitInfo | undefined> {
    const rows = await this.sequelize.query<{ hits: number; reset_at: Date }>(
      "select hits, reset_at from rate_limit_hits where key = :key and reset_at > now()",
      { replacements: { key: this.prefix + key }, type: QueryTypes.SELECT },
    );
    return rows[0] ? { totalHits: rows[0].hits, resetTime: new Date(rows[0].reset_at) } : undefined;
  }

  async decrement(key: string): Promise<void> {
    await this.sequelize.query("update rate_limit_hits set hits = greatest(hits - 1, 0) where key = :key", {
      replacements: { key: this.prefix + key },
    });
  }

  async resetKey(key: string): Promise<void> {
    await this.sequelize.query("delete from rate_limit_hits where key = :key", {
      replacements: { key: this.prefix + key },
    });
  }
}

/**
 * The limiters of one operation, run in turn. Over a limit the answer is 429 with
 * `Retry-After` in seconds and the usual JSON error body.
 *
 * Sign-in counts failures only (an office behind one address must not lock itself out by
 * signing in correctly), per client address and, beside it, per account, so guessing one
 * account's password from many addresses is limited too.
 */
export function rateLimiter(
  name: RateLimitName,
  settings: RateLimitSettings,
  sequelize: Sequelize,
): RequestHandler {
  if (name !== "signIn") return limiterFor(name, settings, sequelize, byAddress, false);
  const perAddress = limiterFor("signIn", settings, sequelize, byAddress, true);
  const perAccount = limiterFor("signInPerAccount", settings, sequelize, byAccount, true);
  return (req, res, next) => {
    void perAddress(req, res, (error?: unknown) => {
      if (error) return next(error);
      void perAccount(req, res, next);
    });
  };
}

/** The client address (IPv6 by /56 subnet); X-Forwarded-For only counts from a trusted proxy (TRUST_PROXY). */
const byAddress = (req: Request) => ipKeyGenerator(req.ip ?? "unknown");

/** The account an attempt names: its e-mail address, trimmed and lower-cased as sign-in compares it. */
const byAccount = (req: Request) => {
  const email = (req.body as { email?: unknown } | undefined)?.email;
  return `account:${typeof email === "string" ? email.trim().toLowerCase() : ""}`;
};

function limiterFor(
  name: Exclude<keyof RateLimitSettings, "prefix">,
  settings: RateLimitSettings,
  sequelize: Sequelize,
  keyGenerator: (req: Request) => string,
  skipSuccessfulRequests: boolean,
): RequestHandler {
  const { limit, windowMs } = settings[name];
  return rateLimit({
    limit,
    windowMs,
    standardHeaders: "draft-8",
    legacyHeaders: false,
    store: new PostgresRateLimitStore(sequelize, `${settings.prefix}${name}:`),
    keyGenerator,
    skipSuccessfulRequests,
    // An X-Forwarded-For from a client that is not a trusted proxy is ignored on purpose, not a mistake to warn about.
    validate: { xForwardedForHeader: false },
    handler: (req, res, next) => {
      const resetTime = (req as { rateLimit?: { resetTime?: Date } }).rateLimit?.resetTime;
      const seconds = Math.max(
        1,
        Math.ceil(((resetTime?.getTime() ?? Date.now() + windowMs) - Date.now()) / 1000),
      );
      res.set("Retry-After", String(seconds));
      next(errors.tooManyRequests(seconds));
    },
  });
}

import type { Logger } from "pino";
import { inject } from "vitest";
import { createApp } from "../../api/app";
import { buildAppContext } from "../../api/context";
import { parseEnv } from "../../api/env";
import { createLogger } from "../../api/logger";
import { appVersion } from "../../api/version";
import { initModels } from "../../db/models";
import { createSequelize } from "../../db/sequelize";
import { webDist } from "../../scripts/web-build";
import type { RateLimitSettings } from "../../api/middleware/rate-limit";
import { relaxedLimits } from "./rate-limits";

/** The origin test apps believe they are served from; send it as `Origin` on state-changing requests. */
export const TEST_ORIGIN = "http://sigmacube.test";

/**
 * The real Express app over the run's test database (or `databaseUrl`), not listening:
 * hand `app` to supertest. Call `close()` in afterAll.
 */
export function buildTestApp(
  options: {
    databaseUrl?: string;
    webDist?: string | null;
    rateLimits?: Partial<RateLimitSettings>;
    nodeEnv?: "test" | "production" | "development";
    /** A logger to read the app's log lines from (silent by default). */
    logger?: Logger;
    /** More variables for the app's environment (e.g. TRUST_PROXY). */
    env?: Record<string, string>;
  } = {},
) {
  const env = parseEnv({
    ...options.env,
    NODE_ENV: options.nodeEnv ?? "test",
    LOG_LEVEL: "silent",
    PUBLIC_ORIGIN: TEST_ORIGIN,
    PORT: "0",
    DATABASE_URL: options.databaseUrl ?? inject("databaseUrl"),
  });
  const sequelize = createSequelize(env.DATABASE_URL, { acquireTimeoutMs: 1_500 });
  initModels(sequelize);
  const context = buildAppContext({
    env,
    sequelize,
    logger: options.logger ?? createLogger(env),
    version: appVersion,
    webDist: options.webDist === undefined ? webDist : options.webDist,
    rateLimits: { ...relaxedLimits(), ...options.rateLimits },
  });
  return {
    app: createApp(context),
    context,
    close: async () => {
      await context.mailer.close();
      await sequelize.close();
    },
  };
}

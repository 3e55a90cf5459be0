import { inject } from "vitest";
import { createApp } from "../../api/app";
import type { AppContext } from "../../api/context";
import { parseEnv } from "../../api/env";
import { createLogger } from "../../api/logger";
import { appVersion } from "../../api/version";
import { initModels } from "../../db/models";
import { createSequelize } from "../../db/sequelize";
import { webDist } from "../../scripts/web-build";

/**
 * The real Express app over the run's test database (or `databaseUrl`), not listening:
 * hand `app` to supertest. Call `close()` in afterAll.
 */
export function buildTestApp(options: { databaseUrl?: string; webDist?: string | null } = {}) {
  const env = parseEnv({
    NODE_ENV: "test",
    LOG_LEVEL: "silent",
    PORT: "0",
    DATABASE_URL: options.databaseUrl ?? inject("databaseUrl"),
  });
  const sequelize = createSequelize(env.DATABASE_URL, { acquireTimeoutMs: 1_500 });
  initModels(sequelize);
  const context: AppContext = {
    env,
    sequelize,
    logger: createLogger(env),
    version: appVersion,
    webDist: options.webDist === undefined ? webDist : options.webDist,
  };
  return { app: createApp(context), context, close: () => sequelize.close() };
}

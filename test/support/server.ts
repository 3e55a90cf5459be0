import { inject } from "vitest";
import { parseEnv } from "../../api/env";
import { startServer } from "../../api/server";
import { webDist } from "../../scripts/web-build";
import { relaxedLimits } from "./rate-limits";

/**
 * The real server (app + API) on a free loopback port over the run's test database, with
 * rate limits no browser test meets: every browser test signs people up from 127.0.0.1, and
 * the counters live in the shared database.
 */
export function startTestServer() {
  const env = parseEnv({
    NODE_ENV: "test",
    LOG_LEVEL: "silent",
    PORT: "0",
    DATABASE_URL: inject("databaseUrl"),
  });
  return startServer(env, { webDist, rateLimits: relaxedLimits() });
}

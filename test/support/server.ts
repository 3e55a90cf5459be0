import { inject } from "vitest";
import { parseEnv } from "../../api/env";
import { startServer } from "../../api/server";
import { webDist } from "../../scripts/web-build";

/** The real server (app + API) on a free loopback port over the run's test database. */
export function startTestServer() {
  const env = parseEnv({
    NODE_ENV: "test",
    LOG_LEVEL: "silent",
    PORT: "0",
    DATABASE_URL: inject("databaseUrl"),
  });
  return startServer(env, { webDist });
}

import { pino, type Logger } from "pino";
import type { Env } from "./env";

/** One JSON logger per process; tests pass LOG_LEVEL=silent. */
export function createLogger(env: Pick<Env, "LOG_LEVEL">): Logger {
  return pino({ level: env.LOG_LEVEL, base: { app: "sigmacube" } });
}

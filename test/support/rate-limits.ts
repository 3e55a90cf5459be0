import { randomUUID } from "node:crypto";
import type { RateLimitSettings } from "../../api/middleware/rate-limit";

/**
 * Limits high enough that no ordinary test meets them, with a prefix of this app's own so
 * counters from other test files (same database) never add up. The rate-limit test passes small ones.
 */
export const relaxedLimits = (): Partial<RateLimitSettings> => ({
  signIn: { limit: 10_000, windowMs: 60_000 },
  signInPerAccount: { limit: 10_000, windowMs: 60_000 },
  signUp: { limit: 10_000, windowMs: 60_000 },
  forgotPassword: { limit: 10_000, windowMs: 60_000 },
  prefix: `test-${randomUUID()}:`,
});

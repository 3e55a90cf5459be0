/**
 * Whether an error means the database connection is gone (server down, restarted, the
 * connection killed or reset mid-query) rather than a mistake in the request or the code.
 * Such a request may succeed if repeated, so it is a 503 `database_unavailable`, not a 500.
 */

/** Sequelize's own names for "could not reach or lost the server". */
const CONNECTION_ERROR_NAMES = new Set([
  "SequelizeConnectionError",
  "SequelizeConnectionRefusedError",
  "SequelizeConnectionTimedOutError",
  "SequelizeConnectionAcquireTimeoutError",
  "SequelizeHostNotFoundError",
  "SequelizeHostNotReachableError",
  "SequelizeAccessDeniedError",
  "SequelizeInvalidConnectionError",
]);

/**
 * PostgreSQL SQLSTATE codes of a lost or refused connection: class 08 (connection exception),
 * 57P01 admin_shutdown (pg_terminate_backend, a fast shutdown), 57P02 crash_shutdown,
 * 57P03 cannot_connect_now (starting up or shutting down), 53300 too_many_connections.
 * Source: PostgreSQL documentation, Appendix A "PostgreSQL Error Codes".
 */
const LOST_CONNECTION_SQLSTATE = /^(08\w{3}|57P0[123]|53300)$/;

/** Node's socket errors when the server goes away under an open connection. */
const SOCKET_ERROR_CODES = new Set(["ECONNRESET", "ECONNREFUSED", "EPIPE", "ETIMEDOUT", "EHOSTUNREACH"]);

/** node-postgres's messages for a connection that ended or broke (it gives them no code). */
const LOST_CONNECTION_MESSAGES = [
  "Connection terminated",
  "Client has encountered a connection error and is not queryable",
  "terminating connection",
  "the database system is shutting down",
  "the database system is starting up",
];

type ErrorLike = { name?: unknown; code?: unknown; message?: unknown };

/** The error and the errors it wraps (Sequelize keeps the driver's error as `parent`/`original`). */
function* chain(error: unknown): Generator<ErrorLike> {
  const seen = new Set<unknown>();
  const queue = [error];
  while (queue.length) {
    const current = queue.shift();
    if (!current || typeof current !== "object" || seen.has(current)) continue;
    seen.add(current);
    yield current as ErrorLike;
    const wrapped = current as { parent?: unknown; original?: unknown; cause?: unknown };
    queue.push(wrapped.parent, wrapped.original, wrapped.cause);
  }
}

export function isDatabaseUnavailable(error: unknown): boolean {
  for (const link of chain(error)) {
    if (typeof link.name === "string" && CONNECTION_ERROR_NAMES.has(link.name)) return true;
    if (typeof link.code === "string") {
      if (LOST_CONNECTION_SQLSTATE.test(link.code) || SOCKET_ERROR_CODES.has(link.code)) return true;
    }
    if (typeof link.message === "string") {
      const message = link.message;
      if (LOST_CONNECTION_MESSAGES.some((m) => message.includes(m))) return true;
    }
  }
  return false;
}

import {
  ConnectionAcquireTimeoutError,
  ConnectionError,
  ConnectionRefusedError,
  DatabaseError,
  UniqueConstraintError,
  ValidationError,
} from "sequelize";
import { describe, expect, it } from "vitest";
import { isDatabaseUnavailable } from "./database-unavailable";

/** An error as node-postgres reports a server message: SQLSTATE in `code`. */
const pgError = (message: string, code?: string) => Object.assign(new Error(message), { code });
/** Sequelize wraps the driver's error and keeps it as `parent`/`original`. */
const wrapped = (driverError: Error) => new DatabaseError(driverError as never);

describe("isDatabaseUnavailable", () => {
  it("when Sequelize reports a connection error of any kind, then the database is unavailable", () => {
    expect(isDatabaseUnavailable(new ConnectionError(new Error("x")))).toBe(true);
    expect(isDatabaseUnavailable(new ConnectionRefusedError(new Error("x")))).toBe(true);
    expect(isDatabaseUnavailable(new ConnectionAcquireTimeoutError(new Error("x")))).toBe(true);
  });

  // SQLSTATE codes from the PostgreSQL documentation, Appendix A "PostgreSQL Error Codes".
  it("when a query fails with 57P01 admin_shutdown (pg_terminate_backend), 57P03 or class 08, then it is unavailable", () => {
    expect(
      isDatabaseUnavailable(wrapped(pgError("terminating connection due to administrator command", "57P01"))),
    ).toBe(true);
    expect(isDatabaseUnavailable(wrapped(pgError("the database system is starting up", "57P03")))).toBe(true);
    expect(isDatabaseUnavailable(wrapped(pgError("connection failure", "08006")))).toBe(true);
  });

  it("when the socket was reset or node-postgres says the connection ended, then it is unavailable", () => {
    expect(isDatabaseUnavailable(wrapped(pgError("read ECONNRESET", "ECONNRESET")))).toBe(true);
    expect(isDatabaseUnavailable(wrapped(pgError("Connection terminated unexpectedly")))).toBe(true);
    expect(
      isDatabaseUnavailable(
        wrapped(pgError("Client has encountered a connection error and is not queryable")),
      ),
    ).toBe(true);
  });

  it("when the error is about the data or the code (unique violation, bad SQL, a bug), then it is not", () => {
    expect(isDatabaseUnavailable(new UniqueConstraintError({ message: "duplicate" }))).toBe(false);
    expect(isDatabaseUnavailable(wrapped(pgError('syntax error at or near "FROM"', "42601")))).toBe(false);
    expect(isDatabaseUnavailable(new ValidationError("bad", []))).toBe(false);
    expect(isDatabaseUnavailable(new TypeError("Cannot read properties of undefined"))).toBe(false);
    expect(isDatabaseUnavailable(null)).toBe(false);
  });

  it("when errors wrap each other in a cycle, then the search still ends", () => {
    const a = pgError("a") as Error & { cause?: unknown };
    const b = pgError("b") as Error & { cause?: unknown };
    a.cause = b;
    b.cause = a;
    expect(isDatabaseUnavailable(a)).toBe(false);
  });
});

import type { RequestHandler } from "express";
import { QueryTypes, type Sequelize } from "sequelize";
import type { HealthResponse } from "../../../core/contract/health";

/** How long the database may take to answer before health reports it unavailable. */
const PING_TIMEOUT_MS = 2_000;

function withTimeout<T>(promise: Promise<T>, ms: number): Promise<T> {
  return new Promise((resolve, reject) => {
    const timer = setTimeout(() => reject(new Error(`no answer within ${ms} ms`)), ms);
    promise.then(
      (value) => (clearTimeout(timer), resolve(value)),
      (error: unknown) => (clearTimeout(timer), reject(error)),
    );
  });
}

/** `GET /api/health`: 200 when PostgreSQL answers, 503 with the same shape when it does not. */
export function healthHandler(sequelize: Sequelize, version: string): RequestHandler {
  return async (req, res) => {
    let body: HealthResponse;
    try {
      const rows = await withTimeout(
        sequelize.query<{ server_version: string }>("show server_version", { type: QueryTypes.SELECT }),
        PING_TIMEOUT_MS,
      );
      body = {
        ok: true,
        version,
        database: { ok: true, serverVersion: rows[0]?.server_version.split(" ")[0] ?? null },
      };
    } catch (error) {
      req.log?.warn({ err: error }, "health: database check failed");
      body = {
        ok: false,
        version,
        database: { ok: false, serverVersion: null, message: "The database did not answer." },
      };
    }
    res
      .status(body.ok ? 200 : 503)
      .set("Cache-Control", "no-store")
      .json(body);
  };
}

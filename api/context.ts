import type { Logger } from "pino";
import type { Sequelize } from "sequelize";
import type { Env } from "./env";

/** What every route needs, built once per process by main.ts (or by a test). */
export type AppContext = {
  env: Env;
  sequelize: Sequelize;
  logger: Logger;
  /** The package version, reported by /api/health. */
  version: string;
  /** Folder of the built web app (index.html and assets); null serves no app. */
  webDist: string | null;
};

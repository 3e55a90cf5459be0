import { Sequelize } from "sequelize";

export type SequelizeOptions = {
  /** Log SQL through this function; silent when absent. */
  log?: (sql: string) => void;
  /** How long a request waits for a connection before it fails (ms). */
  acquireTimeoutMs?: number;
};

/**
 * The one way the project opens a database: PostgreSQL through pg, UTC, small pool.
 * Each API process holds its own pool; nothing else is kept in process memory.
 */
export function createSequelize(databaseUrl: string, options: SequelizeOptions = {}): Sequelize {
  return new Sequelize(databaseUrl, {
    dialect: "postgres",
    logging: options.log ?? false,
    timezone: "+00:00",
    pool: { max: 10, min: 0, idle: 10_000, acquire: options.acquireTimeoutMs ?? 5_000 },
    dialectOptions: { connectionTimeoutMillis: options.acquireTimeoutMs ?? 5_000 },
    define: { underscored: true, timestamps: true },
  });
}

import type { Sequelize } from "sequelize";

/** A statement PostgreSQL plans once per connection and runs again by name. */
export type PreparedStatement = { name: string; text: string };

type PgClient = {
  query<Row>(query: PreparedStatement & { values: unknown[] }): Promise<{ rows: Row[] }>;
};

/**
 * Runs `statement` with `values` ($1, $2, …) as a named prepared statement on a connection of
 * Sequelize's pool, outside any transaction.
 *
 * For hot reads whose planning costs more than their execution. The comparison's input
 * statement (six correlated subqueries building one JSON text) took PostgreSQL about 0.55 ms
 * to plan and 0.35 ms to run for an 8-row project (EXPLAIN ANALYZE), and Sequelize's
 * `query` re-sends and re-plans it every time with the values inlined. Prepared by name it is
 * planned once per pooled connection; in `npm run bench -- api-load` (100 connections,
 * machine loaded by other work, so noisy) the comparison/health ratio went from 0.35–0.44× to
 * 0.48–0.74× over two paired runs.
 */
export async function preparedQuery<Row>(
  sequelize: Sequelize,
  statement: PreparedStatement,
  values: unknown[],
): Promise<Row[]> {
  // Logged like Sequelize's own statements, so a SQL log (createSequelize's `log`) still shows every one.
  const log = (sequelize as unknown as { options: { logging?: false | ((sql: string) => void) } }).options
    .logging;
  if (typeof log === "function") log(`Executing (prepared "${statement.name}"): ${statement.text}`);
  // Sequelize's pg dialect hands out node-postgres clients; its typings call them Connection.
  const connection = await sequelize.connectionManager.getConnection({ type: "read" });
  try {
    return (await (connection as unknown as PgClient).query<Row>({ ...statement, values })).rows;
  } finally {
    await sequelize.connectionManager.releaseConnection(connection);
  }
}

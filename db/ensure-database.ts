import pg from "pg";

/**
 * Creates `database` on the server behind `adminUrl` if it is not there yet.
 * The name is checked, not quoted blindly, because it ends up in DDL.
 */
export async function ensureDatabase(adminUrl: string, database: string): Promise<void> {
  if (!/^[a-z_][a-z0-9_]{0,62}$/.test(database)) {
    throw new RangeError(`database name "${database}" must be lower-case letters, digits and _`);
  }
  const client = new pg.Client({ connectionString: adminUrl });
  await client.connect();
  try {
    const found = await client.query("select 1 from pg_database where datname = $1", [database]);
    if (found.rowCount === 0) await client.query(`create database "${database}"`);
  } finally {
    await client.end();
  }
}

import path from "node:path";
import { startCluster, type RunningCluster } from "../db/cluster";
import { ensureDatabase } from "../db/ensure-database";
import { migrate } from "../db/migrate";
import { initModels } from "../db/models";
import { seedDemo } from "../db/seed";
import { createSequelize } from "../db/sequelize";
import { repoRoot } from "./web-build";

/** Where `npm start` and `npm run dev` keep their cluster; SIGMACUBE_DATA_DIR moves it (tests use a temp folder). */
export const dataDir = path.resolve(process.env.SIGMACUBE_DATA_DIR ?? path.join(repoRoot, ".data"));

/**
 * The database part of `npm start` and `npm run dev`: the server in DATABASE_URL, or the
 * project's own cluster in `.data/` (started, database created); then pending migrations
 * and the demo seed. The caller stops `cluster` on exit.
 */
export async function prepareDatabase(
  say: (line: string) => void,
  onCluster: (cluster: RunningCluster) => void,
): Promise<{ databaseUrl: string }> {
  let databaseUrl = process.env.DATABASE_URL;
  if (databaseUrl) {
    say("using the PostgreSQL server in DATABASE_URL (no private cluster started)");
  } else {
    const clusterDir = path.join(dataDir, "postgres");
    say(`starting the private PostgreSQL cluster in ${clusterDir}…`);
    const cluster = await startCluster({ baseDir: clusterDir, durable: true });
    onCluster(cluster);
    await ensureDatabase(cluster.adminUrl, "sigmacube");
    databaseUrl = cluster.urlFor("sigmacube");
    say(`PostgreSQL is up on 127.0.0.1:${cluster.port}`);
  }
  const sequelize = createSequelize(databaseUrl);
  try {
    const applied = await migrate(sequelize);
    say(applied.length ? `applied migrations: ${applied.join(", ")}` : "database schema is up to date");
    initModels(sequelize);
    const seed = await seedDemo(sequelize, say);
    if (seed.seeded) say(`demo data seeded (seed version ${seed.version})`);
  } finally {
    await sequelize.close();
  }
  return { databaseUrl };
}

import path from "node:path";
import {
  chooseDataDir,
  prepareDataDir,
  serverCanEnter,
  startCluster,
  type RunningCluster,
} from "../db/cluster";
import { ensureDatabase } from "../db/ensure-database";
import { migrate } from "../db/migrate";
import { initModels } from "../db/models";
import { seedDemo } from "../db/seed";
import { freezeForSeed } from "../api/domain/records/seed-freeze";
import { createSequelize } from "../db/sequelize";
import { repoRoot } from "./web-build";

/**
 * The database part of `npm start` and `npm run dev`: the server in DATABASE_URL, or the
 * project's own cluster (started, database created) in SIGMACUBE_DATA_DIR, `.data/`, or a
 * per-checkout folder under /var/tmp when PostgreSQL cannot enter the checkout; then pending
 * migrations and the demo seed. The caller stops `cluster` on exit; `restart` starts the same
 * cluster again on the same port (for the watch that restarts a lost postmaster).
 */
export async function prepareDatabase(
  say: (line: string) => void,
  onCluster: (cluster: RunningCluster, restart: () => Promise<RunningCluster>) => void,
): Promise<{ databaseUrl: string }> {
  let databaseUrl = process.env.DATABASE_URL;
  if (databaseUrl) {
    say("using the PostgreSQL server in DATABASE_URL (no private cluster started)");
  } else {
    const choice = await chooseDataDir({
      explicit: process.env.SIGMACUBE_DATA_DIR,
      checkoutDir: repoRoot,
      canEnter: serverCanEnter,
    });
    await prepareDataDir(choice);
    const clusterDir = path.join(choice.dir, "postgres");
    say(`starting the private PostgreSQL cluster in ${clusterDir} (${choice.reason})…`);
    const cluster = await startCluster({ baseDir: clusterDir, durable: true });
    onCluster(cluster, () => startCluster({ baseDir: clusterDir, durable: true, port: cluster.port }));
    await ensureDatabase(cluster.adminUrl, "sigmacube");
    databaseUrl = cluster.urlFor("sigmacube");
    say(`PostgreSQL is up on 127.0.0.1:${cluster.port}`);
  }
  const sequelize = createSequelize(databaseUrl);
  try {
    const applied = await migrate(sequelize);
    say(applied.length ? `applied migrations: ${applied.join(", ")}` : "database schema is up to date");
    initModels(sequelize);
    const seed = await seedDemo(sequelize, say, freezeForSeed(sequelize));
    if (seed.seeded) say(`demo data seeded (seed version ${seed.version})`);
  } finally {
    await sequelize.close();
  }
  return { databaseUrl };
}

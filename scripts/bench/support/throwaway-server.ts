import { mkdtemp } from "node:fs/promises";
import os from "node:os";
import path from "node:path";
import { parseEnv } from "../../../api/env";
import { startServer, type RunningServer } from "../../../api/server";
import { removeCluster, startCluster } from "../../../db/cluster";
import { ensureDatabase } from "../../../db/ensure-database";
import { migrate } from "../../../db/migrate";
import { createSequelize } from "../../../db/sequelize";
import { ensureWebBuild, webDist } from "../../web-build";

/**
 * A benchmark's own world: a throwaway cluster, a migrated database, a current web build
 * and the real server on a free port. `stop()` removes all of it.
 */
export async function startThrowawayServer(): Promise<{
  server: RunningServer;
  /** The throwaway cluster's postmaster, for benchmarks that read PostgreSQL's CPU time. */
  postmasterPid: number;
  stop: () => Promise<void>;
}> {
  const baseDir = await mkdtemp(path.join(os.tmpdir(), "sigmacube-bench-pg-"));
  const cluster = await startCluster({ baseDir, durable: false });
  await ensureDatabase(cluster.adminUrl, "sigmacube_bench");
  const databaseUrl = cluster.urlFor("sigmacube_bench");
  const sequelize = createSequelize(databaseUrl);
  await migrate(sequelize);
  await sequelize.close();
  await ensureWebBuild();
  const server = await startServer(parseEnv({ LOG_LEVEL: "silent", PORT: "0", DATABASE_URL: databaseUrl }), {
    webDist,
  });
  return {
    server,
    postmasterPid: cluster.pid,
    stop: async () => {
      await server.close();
      await cluster.stop("immediate");
      await removeCluster(baseDir);
    },
  };
}

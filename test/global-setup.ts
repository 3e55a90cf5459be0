import { mkdtemp } from "node:fs/promises";
import os from "node:os";
import path from "node:path";
import type { TestProject } from "vitest/node";
import { removeCluster, startCluster } from "../db/cluster";
import { ensureDatabase } from "../db/ensure-database";
import { migrate } from "../db/migrate";
import { createSequelize } from "../db/sequelize";
import { ensureWebBuild } from "../scripts/web-build";

declare module "vitest" {
  export interface ProvidedContext {
    /** The throwaway test database, migrated once for the whole run. */
    databaseUrl: string;
    /** The same server's maintenance database (to create more databases). */
    adminUrl: string;
  }
}

/**
 * One throwaway PostgreSQL cluster for the whole test run: started on a random port with
 * fsync off, migrated once (per-file migrations would race), stopped and deleted at the end.
 * Also makes sure dist/web is current for the browser tests.
 */
export default async function setup(project: TestProject) {
  const baseDir = await mkdtemp(path.join(os.tmpdir(), "sigmacube-test-pg-"));
  const cluster = await startCluster({ baseDir, durable: false });
  try {
    await ensureDatabase(cluster.adminUrl, "sigmacube_test");
    const databaseUrl = cluster.urlFor("sigmacube_test");
    const sequelize = createSequelize(databaseUrl);
    await migrate(sequelize);
    await sequelize.close();
    await ensureWebBuild();
    project.provide("databaseUrl", databaseUrl);
    project.provide("adminUrl", cluster.adminUrl);
  } catch (error) {
    await cluster.stop("immediate");
    await removeCluster(baseDir);
    throw error;
  }
  return async () => {
    await cluster.stop("immediate");
    await removeCluster(baseDir);
  };
}

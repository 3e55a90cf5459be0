/**
 * What `npm start` runs once dependencies are installed: its own PostgreSQL (unless
 * DATABASE_URL is set), migrations, the demo seed on first start, the web build if
 * stale, then the app and the API on one port. Ctrl-C stops the server and the cluster.
 */
import path from "node:path";
import { startCluster, type RunningCluster } from "../db/cluster";
import { ensureDatabase } from "../db/ensure-database";
import { migrate } from "../db/migrate";
import { initModels } from "../db/models";
import { seedDemo } from "../db/seed";
import { createSequelize } from "../db/sequelize";
import { EnvError, parseEnv } from "../api/env";
import { startServer, type RunningServer } from "../api/server";
import { ensureWebBuild, repoRoot, webDist } from "./web-build";

const say = (line: string) => console.log(`[sigmacube] ${line}`);
/** Where `npm start` keeps its cluster; SIGMACUBE_DATA_DIR moves it (tests use a temp folder). */
const dataDir = path.resolve(process.env.SIGMACUBE_DATA_DIR ?? path.join(repoRoot, ".data"));

let cluster: RunningCluster | null = null;
let server: RunningServer | null = null;
let stopping = false;

async function shutdown(signal: string) {
  if (stopping) return;
  stopping = true;
  say(`${signal}: stopping…`);
  await server?.close();
  if (cluster) {
    await cluster.stop("fast");
    say("PostgreSQL stopped.");
  }
  process.exit(0);
}
process.on("SIGINT", () => void shutdown("SIGINT"));
process.on("SIGTERM", () => void shutdown("SIGTERM"));
// Started by scripts/start.mjs with an IPC channel: if that parent goes away, stop too.
process.on("disconnect", () => void shutdown("parent exited"));

async function main() {
  let databaseUrl = process.env.DATABASE_URL;
  if (databaseUrl) {
    say("using the PostgreSQL server in DATABASE_URL (no private cluster started)");
  } else {
    const clusterDir = path.join(dataDir, "postgres");
    say(`starting the private PostgreSQL cluster in ${clusterDir}…`);
    cluster = await startCluster({ baseDir: clusterDir, durable: true });
    await ensureDatabase(cluster.adminUrl, "sigmacube");
    databaseUrl = cluster.urlFor("sigmacube");
    say(`PostgreSQL is up on 127.0.0.1:${cluster.port}`);
  }
  const env = parseEnv({ ...process.env, DATABASE_URL: databaseUrl });

  const sequelize = createSequelize(env.DATABASE_URL);
  try {
    const applied = await migrate(sequelize);
    say(applied.length ? `applied migrations: ${applied.join(", ")}` : "database schema is up to date");
    initModels(sequelize);
    const seed = await seedDemo(sequelize, say);
    if (seed.seeded) say(`demo data seeded (seed version ${seed.version})`);
  } finally {
    await sequelize.close();
  }

  if (await ensureWebBuild(say)) say("web app built");
  if (stopping) return;
  server = await startServer(env, { webDist });
  say(`Sigmacube is running at ${server.url}  (Ctrl-C stops it)`);
}

main().catch(async (error: unknown) => {
  console.error(error instanceof EnvError ? error.message : error);
  await server?.close().catch(() => {});
  await cluster?.stop("fast").catch(() => {});
  process.exit(1);
});

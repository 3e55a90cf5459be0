/**
 * What `npm start` runs once dependencies are installed: its own PostgreSQL (unless
 * DATABASE_URL is set), migrations, the demo seed on first start, the web build if
 * stale, then the app and the API on one port. Ctrl-C stops the server and the cluster.
 * While it serves, a watch restarts the private cluster if its postmaster dies.
 */
import { watchCluster, type ClusterWatch } from "../db/cluster-watch";
import type { RunningCluster } from "../db/cluster";
import { EnvError, parseEnv } from "../api/env";
import { startServer, type RunningServer } from "../api/server";
import { prepareDatabase } from "./prepare-database";
import { ensureWebBuild, webDist } from "./web-build";

const say = (line: string) => console.log(`[sigmacube] ${line}`);

let cluster: RunningCluster | null = null;
let watch: ClusterWatch | null = null;
let server: RunningServer | null = null;
let stopping = false;

async function shutdown(reason: string) {
  if (stopping) return;
  stopping = true;
  say(`${reason}: stopping…`);
  await server?.close();
  await watch?.stop();
  const running = watch?.current() ?? cluster;
  if (running) {
    await running.stop("fast").catch((error: unknown) => say(`stopping PostgreSQL: ${String(error)}`));
    say("PostgreSQL stopped.");
  }
  process.exit(0);
}
process.on("SIGINT", () => void shutdown("SIGINT"));
process.on("SIGTERM", () => void shutdown("SIGTERM"));
// Started by scripts/start.mjs with an IPC channel: if that parent goes away, stop too.
process.on("disconnect", () => void shutdown("parent exited"));

async function main() {
  const { databaseUrl } = await prepareDatabase(say, (started, restart) => {
    cluster = started;
    watch = watchCluster(started, { restart, say });
  });
  const env = parseEnv({ ...process.env, DATABASE_URL: databaseUrl });
  if (await ensureWebBuild(say)) say("web app built");
  if (stopping) return;
  server = await startServer(env, { webDist, warmReports: true });
  say(`Sigmacube is running at ${server.url}  (Ctrl-C stops it)`);
}

main().catch(async (error: unknown) => {
  console.error(error instanceof EnvError ? error.message : error);
  await server?.close().catch(() => {});
  await watch?.stop();
  await (watch?.current() ?? cluster)?.stop("fast").catch(() => {});
  process.exit(1);
});

/**
 * `npm run dev`: the private cluster (or DATABASE_URL), migrations and seed as in
 * `npm start`, then the API under `tsx watch` on API_PORT and the Vite dev server with hot
 * reload, which proxies /api to it. Ctrl-C stops all three.
 */
import { spawn, type ChildProcess } from "node:child_process";
import type { RunningCluster } from "../db/cluster";
import { prepareDatabase } from "./prepare-database";
import { repoRoot } from "./web-build";

const say = (line: string) => console.log(`[sigmacube dev] ${line}`);
const apiPort = process.env.API_PORT ?? "5174";
const children: ChildProcess[] = [];
let cluster: RunningCluster | null = null;
let stopping = false;

async function shutdown() {
  if (stopping) return;
  stopping = true;
  for (const child of children) child.kill("SIGTERM");
  await Promise.all(
    children.map(
      (child) =>
        new Promise((resolve) => (child.exitCode !== null ? resolve(null) : child.once("exit", resolve))),
    ),
  );
  await cluster?.stop("fast");
  say("stopped.");
  process.exit(0);
}
process.on("SIGINT", () => void shutdown());
process.on("SIGTERM", () => void shutdown());

const { databaseUrl } = await prepareDatabase(say, (started) => (cluster = started));
const webOrigin = "http://127.0.0.1:5173";
// The browser talks to Vite, which proxies /api: links and the Origin check use Vite's origin.
const env = {
  ...process.env,
  DATABASE_URL: databaseUrl,
  PORT: apiPort,
  API_PORT: apiPort,
  WEB_DIST: "",
  PUBLIC_ORIGIN: webOrigin,
};
children.push(
  spawn("npx", ["tsx", "watch", "--clear-screen=false", "api/main.ts"], {
    cwd: repoRoot,
    env,
    stdio: "inherit",
  }),
  spawn("npx", ["vite"], { cwd: repoRoot, env, stdio: "inherit" }),
);
say(`API on http://127.0.0.1:${apiPort}; open ${webOrigin} (Vite, hot reload).`);

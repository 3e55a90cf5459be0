import { existsSync, readdirSync, statSync } from "node:fs";
import path from "node:path";
import { fileURLToPath } from "node:url";

export const repoRoot = path.resolve(path.dirname(fileURLToPath(import.meta.url)), "..");
export const webDist = path.join(repoRoot, "dist", "web");

/** Newest modification time (ms) of any file below `dir`, skipping node_modules. */
function newestMtime(target: string): number {
  if (!existsSync(target)) return 0;
  const stat = statSync(target);
  if (!stat.isDirectory()) return stat.mtimeMs;
  let newest = stat.mtimeMs;
  for (const entry of readdirSync(target)) {
    if (entry === "node_modules" || entry === "dist") continue;
    newest = Math.max(newest, newestMtime(path.join(target, entry)));
  }
  return newest;
}

/** The inputs of the web build: a change in any of them makes dist/web stale. */
const buildInputs = ["web", "core", "tailwind.config.ts", "vite.config.ts", "package-lock.json"];

export function webBuildIsStale(): boolean {
  const built = path.join(webDist, "index.html");
  if (!existsSync(built)) return true;
  const builtAt = statSync(built).mtimeMs;
  return buildInputs.some((input) => newestMtime(path.join(repoRoot, input)) > builtAt);
}

/** Builds the web app with Vite when it is missing or older than its sources. Returns whether it built. */
export async function ensureWebBuild(log: (line: string) => void = () => {}): Promise<boolean> {
  if (!webBuildIsStale()) return false;
  log("building the web app (vite build)…");
  const { build } = await import("vite");
  // Vite (and the React plugin) follow NODE_ENV when it is set, and vitest sets it to "test":
  // without this, a build made by the test run would ship React's development runtime — and
  // npm start would then serve that build. Every build here is a production build.
  const nodeEnv = process.env.NODE_ENV;
  process.env.NODE_ENV = "production";
  try {
    await build({ configFile: path.join(repoRoot, "vite.config.ts"), logLevel: "warn", mode: "production" });
  } finally {
    if (nodeEnv === undefined) delete process.env.NODE_ENV;
    else process.env.NODE_ENV = nodeEnv;
  }
  return true;
}

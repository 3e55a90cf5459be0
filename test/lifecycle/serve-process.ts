import { spawn } from "node:child_process";
import { existsSync } from "node:fs";
import { readFile } from "node:fs/promises";
import path from "node:path";
import { repoRoot } from "../../scripts/web-build";

export type ServeProcess = {
  url: string;
  /** Everything printed so far. */
  output: () => string;
  /** Sends Ctrl-C and waits for the exit. */
  interrupt: () => Promise<{ code: number | null; output: string }>;
};

/** Starts scripts/serve.ts the way `npm start` does, on a free port, and waits for its URL line. */
export function runServeUntilUp(dataDir: string): Promise<ServeProcess> {
  const child = spawn(process.execPath, ["--import", "tsx", "scripts/serve.ts"], {
    cwd: repoRoot,
    env: { ...process.env, SIGMACUBE_DATA_DIR: dataDir, PORT: "0", LOG_LEVEL: "silent", DATABASE_URL: "" },
  });
  let output = "";
  const exited = new Promise<{ code: number | null; output: string }>((resolve) =>
    child.on("exit", (code) => resolve({ code, output })),
  );
  return new Promise<ServeProcess>((resolve, reject) => {
    const onData = (chunk: Buffer) => {
      output += chunk.toString();
      const match = /running at (http:\/\/\S+)/.exec(output);
      if (match) {
        resolve({ url: match[1], output: () => output, interrupt: () => (child.kill("SIGINT"), exited) });
      }
    };
    child.stdout.on("data", onData);
    child.stderr.on("data", onData);
    void exited.then(() => reject(new Error(`serve.ts exited before it was up:\n${output}`)));
  });
}

/**
 * The pid in a data folder's postmaster.pid while that process lives, else null. A killed
 * postmaster may stay a zombie until init reaps it, which `kill(pid, 0)` cannot tell apart.
 */
export async function livePostmasterPid(pgdata: string): Promise<number | null> {
  const pidFile = path.join(pgdata, "postmaster.pid");
  if (!existsSync(pidFile)) return null;
  const pid = Number((await readFile(pidFile, "utf8")).split("\n")[0]);
  const stat = await readFile(`/proc/${pid}/stat`, "utf8").catch(() => null);
  if (stat !== null) return /^[ZX]/.test(stat.slice(stat.lastIndexOf(")") + 2)) ? null : pid;
  try {
    process.kill(pid, 0);
    return pid;
  } catch {
    return null;
  }
}

/** Polls `check` every 200 ms until it returns true or `ms` have passed; returns the time it took. */
export async function waitUntil(check: () => Promise<boolean>, ms: number): Promise<number | null> {
  const started = Date.now();
  while (Date.now() - started < ms) {
    if (await check().catch(() => false)) return Date.now() - started;
    await new Promise((resolve) => setTimeout(resolve, 200));
  }
  return null;
}

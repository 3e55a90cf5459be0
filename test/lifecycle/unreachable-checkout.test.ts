/**
 * Issue 9 §7, end to end: a clone inside a folder the postgres user cannot enter (mode 700, as
 * `mktemp -d` makes, or a root user's home). Today's commit is cloned there and its
 * scripts/serve.ts (what `npm start` runs) is started: the cluster must live in the per-checkout
 * folder under /var/tmp, the start log must say so, health must be 200, and Ctrl-C must stop it.
 * Only meaningful as root (otherwise the server runs as us, and we can enter our own folders).
 */
import { execFileSync, spawn } from "node:child_process";
import { existsSync } from "node:fs";
import { cp, mkdtemp, rm, stat, symlink, utimes } from "node:fs/promises";
import os from "node:os";
import path from "node:path";
import { afterAll, describe, expect, it } from "vitest";
import { chooseDataDir, removeCluster, serverCanEnter } from "../../db/cluster";
import { repoRoot, webDist } from "../../scripts/web-build";
import { livePostmasterPid } from "./serve-process";

const isRoot = process.getuid?.() === 0;
const inGit = existsSync(path.join(repoRoot, ".git"));

describe.runIf(isRoot && inGit)("npm start from a clone the postgres user cannot enter", () => {
  const cleanup: string[] = [];
  afterAll(async () => {
    for (const dir of cleanup) await removeCluster(dir);
  });

  it(
    "when the clone sits in a mode-700 folder, then the cluster lives under /var/tmp, the log says where, health is 200 and Ctrl-C stops it",
    { timeout: 180_000 },
    async () => {
      const outer = await mkdtemp(path.join(os.tmpdir(), "sigmacube-closed-clone-"));
      cleanup.push(outer);
      expect((await stat(outer)).mode & 0o777).toBe(0o700);
      const checkout = path.join(outer, "sigmacube");
      const head = execFileSync("git", ["rev-parse", "HEAD"], { cwd: repoRoot, encoding: "utf8" }).trim();
      execFileSync("git", ["clone", "-q", "--no-checkout", repoRoot, checkout]);
      execFileSync("git", ["checkout", "-q", head], { cwd: checkout });
      // Installed packages and the built app are borrowed, so the clone needs no npm ci and no build.
      await symlink(path.join(repoRoot, "node_modules"), path.join(checkout, "node_modules"));
      if (existsSync(webDist)) {
        await cp(webDist, path.join(checkout, "dist", "web"), { recursive: true });
        const later = new Date(Date.now() + 60_000);
        await utimes(path.join(checkout, "dist", "web", "index.html"), later, later);
      }
      expect(await serverCanEnter(checkout)).toBe(false);
      const expected = await chooseDataDir({ checkoutDir: checkout, canEnter: serverCanEnter });
      expect(expected.dir).toMatch(/^\/var\/tmp\/sigmacube-[0-9a-f]{12}$/);
      cleanup.push(expected.dir);

      const child = spawn(process.execPath, ["--import", "tsx", "scripts/serve.ts"], {
        cwd: checkout,
        env: { ...process.env, PORT: "0", LOG_LEVEL: "silent", DATABASE_URL: "", SIGMACUBE_DATA_DIR: "" },
      });
      let output = "";
      const exited = new Promise<number | null>((resolve) => child.on("exit", resolve));
      const url = await new Promise<string>((resolve, reject) => {
        const onData = (chunk: Buffer) => {
          output += chunk.toString();
          const match = /running at (http:\/\/\S+)/.exec(output);
          if (match) resolve(match[1]);
        };
        child.stdout.on("data", onData);
        child.stderr.on("data", onData);
        void exited.then(() => reject(new Error(`serve.ts exited before it was up:\n${output}`)));
      });
      try {
        expect(output).toContain(
          `starting the private PostgreSQL cluster in ${path.join(expected.dir, "postgres")}`,
        );
        expect(output).toContain(`cannot enter ${checkout}`);
        const health = await (await fetch(`${url}/api/health`)).json();
        expect(health).toMatchObject({ ok: true, database: { ok: true } });
      } finally {
        child.kill("SIGINT");
        expect(await exited).toBe(0);
      }
      expect(await livePostmasterPid(path.join(expected.dir, "postgres", "pgdata"))).toBeNull();
      await rm(checkout, { recursive: true, force: true });
    },
  );
});

/**
 * Issue 10 item 15: when the private PostgreSQL that `npm start` runs dies, the server notices,
 * starts it again and the app recovers by itself (health back to 200) — and it says so in its log.
 */
import { chmod, mkdtemp } from "node:fs/promises";
import os from "node:os";
import path from "node:path";
import { afterAll, describe, expect, it } from "vitest";
import { removeCluster } from "../../db/cluster";
import { livePostmasterPid, runServeUntilUp, waitUntil } from "./serve-process";

describe("npm start's watch over its private cluster", () => {
  const dirs: string[] = [];
  afterAll(async () => {
    for (const dir of dirs) await removeCluster(dir);
  });

  it(
    "when the postmaster is killed with SIGKILL, then npm start restarts it, logs it, and health is 200 again within 30 s",
    { timeout: 180_000 },
    async () => {
      const dataDir = await mkdtemp(path.join(os.tmpdir(), "sigmacube-restart-"));
      await chmod(dataDir, 0o755); // like a project folder the postgres user can pass through
      dirs.push(dataDir);
      const pgdata = path.join(dataDir, "postgres", "pgdata");
      const serve = await runServeUntilUp(dataDir);
      try {
        const health = async () => (await fetch(`${serve.url}/api/health`)).status;
        expect(await health()).toBe(200);
        const killed = await livePostmasterPid(pgdata);
        expect(killed, "a postmaster runs").not.toBeNull();

        process.kill(killed!, "SIGKILL");
        const replaced = await waitUntil(async () => {
          const pid = await livePostmasterPid(pgdata);
          return pid !== null && pid !== killed;
        }, 30_000);
        expect(replaced, "a new postmaster runs").not.toBeNull();
        const recovered = await waitUntil(async () => (await health()) === 200, 30_000);
        expect(recovered, "health is 200 again without a hand restart").not.toBeNull();
        console.log(`postmaster replaced after ${replaced} ms; health 200 again ${recovered} ms later`);
        expect(serve.output()).toMatch(
          /PostgreSQL \(postmaster pid \d+\) stopped unexpectedly; restarting it/,
        );
        // Health can answer before the watch's own "pg_ctl start" returns and it logs: wait for the line.
        const logged = await waitUntil(
          async () => /PostgreSQL is running again/.test(serve.output()),
          30_000,
        );
        expect(logged, "the restart is logged").not.toBeNull();
        expect(serve.output()).toMatch(/PostgreSQL is running again/);
      } finally {
        const exit = await serve.interrupt();
        expect(exit.code).toBe(0);
      }
      expect(await livePostmasterPid(pgdata), "Ctrl-C stopped the restarted cluster").toBeNull();
    },
  );
});

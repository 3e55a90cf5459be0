import { chmod, mkdtemp } from "node:fs/promises";
import os from "node:os";
import path from "node:path";
import pg from "pg";
import { afterAll, describe, expect, it } from "vitest";
import { removeCluster, startCluster } from "../../db/cluster";
import { livePostmasterPid, runServeUntilUp } from "./serve-process";

async function query<T extends pg.QueryResultRow>(url: string, sql: string, values: unknown[] = []) {
  const client = new pg.Client({ connectionString: url });
  await client.connect();
  try {
    return (await client.query<T>(sql, values)).rows;
  } finally {
    await client.end();
  }
}

async function postmasterRunning(dataDir: string): Promise<boolean> {
  return (await livePostmasterPid(dataDir)) !== null;
}

describe("the private cluster, as npm start runs it", () => {
  const dirs: string[] = [];
  afterAll(async () => {
    for (const dir of dirs) await removeCluster(dir);
  });

  it("when the cluster is stopped and started again, then the data written before is still there", async () => {
    const baseDir = await mkdtemp(path.join(os.tmpdir(), "sigmacube-lifecycle-"));
    dirs.push(baseDir);
    const first = await startCluster({ baseDir, durable: true });
    try {
      await query(first.adminUrl, "create table kept (label text)");
      await query(first.adminUrl, "insert into kept values ($1)", ["written before the restart"]);
    } finally {
      await first.stop("fast");
    }
    expect(await postmasterRunning(path.join(baseDir, "pgdata"))).toBe(false);

    const second = await startCluster({ baseDir, durable: true });
    try {
      const rows = await query<{ label: string }>(second.adminUrl, "select label from kept");
      expect(rows).toEqual([{ label: "written before the restart" }]);
    } finally {
      await second.stop("fast");
    }
  });

  it("when the cluster listens, then it is on 127.0.0.1 only and asks for a password", async () => {
    const baseDir = await mkdtemp(path.join(os.tmpdir(), "sigmacube-lifecycle-"));
    dirs.push(baseDir);
    const cluster = await startCluster({ baseDir, durable: false });
    try {
      const [row] = await query<{ listen: string }>(
        cluster.adminUrl,
        "select current_setting('listen_addresses') as listen",
      );
      expect(row.listen).toBe("127.0.0.1");
      const wrong = cluster.adminUrl.replace(/:[^:@/]+@/, ":not-the-password@");
      await expect(query(wrong, "select 1")).rejects.toThrow(/password authentication failed/);
    } finally {
      await cluster.stop("immediate");
    }
  });

  it(
    "when npm start's server runs twice on one data folder and gets Ctrl-C, then health is ok, the seed runs once, and nothing is left running",
    { timeout: 120_000 },
    async () => {
      const dataDir = await mkdtemp(path.join(os.tmpdir(), "sigmacube-serve-"));
      // Like a project folder: the postgres user must be able to pass through it.
      await chmod(dataDir, 0o755);
      dirs.push(dataDir);
      const first = await runServeUntilUp(dataDir);
      const health = await (await fetch(`${first.url}/api/health`)).json();
      expect(health).toMatchObject({ ok: true, database: { ok: true } });
      const firstExit = await first.interrupt();
      expect(firstExit.code).toBe(0);
      expect(firstExit.output).toMatch(/demo data seeded/);
      expect(await postmasterRunning(path.join(dataDir, "postgres", "pgdata"))).toBe(false);

      const second = await runServeUntilUp(dataDir);
      const secondExit = await second.interrupt();
      expect(secondExit.code).toBe(0);
      expect(secondExit.output).toMatch(/database schema is up to date/);
      expect(secondExit.output).not.toMatch(/demo data seeded/);
      expect(await postmasterRunning(path.join(dataDir, "postgres", "pgdata"))).toBe(false);
    },
  );
});

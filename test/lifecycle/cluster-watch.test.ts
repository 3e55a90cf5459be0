/**
 * The watch that restarts a lost postmaster, with stand-in clusters (no PostgreSQL): it restarts
 * only when the postmaster has gone, retries a failed start, logs each step, and a stop during a
 * restart waits for it so that the cluster it started can be stopped too.
 */
import { describe, expect, it } from "vitest";
import type { RunningCluster } from "../../db/cluster";
import { watchCluster } from "../../db/cluster-watch";
import { waitUntil } from "./serve-process";

function standIn(pid: number) {
  let alive = true;
  const cluster: RunningCluster = {
    adminUrl: "postgres://stand-in",
    port: 5999,
    pid,
    isAlive: () => alive,
    urlFor: (database) => `postgres://stand-in/${database}`,
    stop: async () => void (alive = false),
  };
  return { cluster, die: () => (alive = false) };
}

const sleep = (ms: number) => new Promise((resolve) => setTimeout(resolve, ms));

describe("watchCluster", () => {
  it("when the postmaster lives, then nothing is restarted; when it dies, then a new one is started and logged", async () => {
    const first = standIn(100);
    const second = standIn(200);
    const lines: string[] = [];
    let starts = 0;
    const watch = watchCluster(first.cluster, {
      restart: async () => (starts++, second.cluster),
      say: (line) => lines.push(line),
      intervalMs: 20,
    });
    await sleep(100);
    expect(starts).toBe(0);
    first.die();
    expect(await waitUntil(async () => lines.length === 2, 5_000)).not.toBeNull();
    expect(starts).toBe(1);
    expect(watch.current()).toBe(second.cluster);
    expect(lines[0]).toMatch(/postmaster pid 100\) stopped unexpectedly; restarting it on 127\.0\.0\.1:5999/);
    expect(lines[1]).toMatch(/PostgreSQL is running again \(pid 200,/);
    await watch.stop();
  });

  it("when starting again fails, then it tries again until it works, logging the first failure with its reason", async () => {
    const first = standIn(100);
    const second = standIn(300);
    const lines: string[] = [];
    let attempts = 0;
    const watch = watchCluster(first.cluster, {
      restart: async () => {
        attempts++;
        if (attempts < 3) throw new Error('lock file "postmaster.pid" already exists\nsecond line');
        return second.cluster;
      },
      say: (line) => lines.push(line),
      intervalMs: 10,
      retryMs: 10,
    });
    first.die();
    expect(await waitUntil(async () => watch.current() === second.cluster, 5_000)).not.toBeNull();
    expect(attempts).toBe(3);
    expect(watch.current()).toBe(second.cluster);
    expect(lines.filter((line) => /failed \(attempt 1\)/.test(line))).toEqual([
      'restarting PostgreSQL failed (attempt 1), trying again: lock file "postmaster.pid" already exists / second line',
    ]);
    expect(lines.at(-1)).toMatch(/running again \(pid 300/);
    await watch.stop();
  });

  it("when stop is called during a restart, then it resolves after the restart settled and current() is the new cluster", async () => {
    const first = standIn(100);
    const second = standIn(400);
    let release: () => void = () => {};
    let restartBegan = false;
    const watch = watchCluster(first.cluster, {
      restart: () => {
        restartBegan = true;
        return new Promise<RunningCluster>((resolve) => (release = () => resolve(second.cluster)));
      },
      say: () => {},
      intervalMs: 10,
    });
    first.die();
    expect(await waitUntil(async () => restartBegan, 5_000)).not.toBeNull();
    let stopped = false;
    const stopping = watch.stop().then(() => (stopped = true));
    await sleep(30);
    expect(stopped, "stop waits for the restart in flight").toBe(false);
    release();
    await stopping;
    expect(watch.current()).toBe(second.cluster);
  });
});

import type { RunningCluster } from "./cluster";

export type ClusterWatch = {
  /** The cluster running now (a new one after each restart); stop this one on shutdown. */
  current(): RunningCluster;
  /**
   * Stops watching (before a deliberate stop, so that stop is not taken for a crash); resolves once
   * a restart in flight has settled, so `current()` is then the cluster to stop.
   */
  stop(): Promise<void>;
};

export type WatchOptions = {
  /** Starts the cluster again on the same folder and port (the app's pool keeps its URL). */
  restart: () => Promise<RunningCluster>;
  say: (line: string) => void;
  /** How often to look at the postmaster. */
  intervalMs?: number;
  /** Pause between failed restart attempts (old backends may still hold the shared memory). */
  retryMs?: number;
};

/**
 * Watches the private cluster's postmaster and starts it again when it has gone (killed, crashed,
 * OOM): without this `npm start` kept serving 503 until someone restarted it by hand. The app
 * needs no signal: its pool drops broken connections and the next query connects to the new server.
 */
export function watchCluster(cluster: RunningCluster, options: WatchOptions): ClusterWatch {
  const intervalMs = options.intervalMs ?? 1_000;
  const retryMs = options.retryMs ?? 1_000;
  let current = cluster;
  let stopped = false;
  let restarting: Promise<void> | null = null;

  async function restart() {
    const lostAt = Date.now();
    options.say(
      `PostgreSQL (postmaster pid ${current.pid}) stopped unexpectedly; restarting it on 127.0.0.1:${current.port}…`,
    );
    for (let attempt = 1; !stopped; attempt++) {
      try {
        current = await options.restart();
        if (stopped) break; // shutting down: the caller stops `current()` once stop() resolves
        const seconds = ((Date.now() - lostAt) / 1000).toFixed(1);
        options.say(`PostgreSQL is running again (pid ${current.pid}, ${seconds} s after it was lost)`);
        break;
      } catch (error) {
        const message = (error instanceof Error ? error.message : String(error)).replace(/\s*\n\s*/g, " / ");
        if (attempt === 1 || attempt % 10 === 0) {
          options.say(`restarting PostgreSQL failed (attempt ${attempt}), trying again: ${message}`);
        }
        await new Promise((resolve) => setTimeout(resolve, retryMs));
      }
    }
  }

  const timer = setInterval(() => {
    if (stopped || restarting || current.isAlive()) return;
    restarting = restart().finally(() => (restarting = null));
  }, intervalMs);
  timer.unref();

  return {
    current: () => current,
    async stop() {
      stopped = true;
      clearInterval(timer);
      await restarting;
    },
  };
}

import pg from "pg";
import { startThrowawayServer } from "./support/throwaway-server";

const REQUESTS = 3_000;
const CONCURRENCY = 8;

/** Sends `count` requests to `url`, `CONCURRENCY` at a time; returns requests per second. */
async function rate(count: number, send: () => Promise<unknown>): Promise<number> {
  let left = count;
  const started = performance.now();
  await Promise.all(
    Array.from({ length: CONCURRENCY }, async () => {
      while (left-- > 0) await send();
    }),
  );
  return count / ((performance.now() - started) / 1000);
}

/**
 * The cost of `GET /api/health` (Express + a PostgreSQL round trip) against two baselines
 * measured in the same run: the same Express stack answering without the database (a JSON
 * 404), and the bare database query through a pg pool of the same size.
 */
export async function run(): Promise<void> {
  const { server, stop } = await startThrowawayServer();
  try {
    const get = (path: string) => () => fetch(`${server.url}${path}`).then((r) => r.arrayBuffer());
    await rate(300, get("/api/health")); // warm-up: JIT, pool, keep-alive sockets
    await rate(300, get("/api/no-such-route"));

    const pool = new pg.Pool({ connectionString: server.context.env.DATABASE_URL, max: CONCURRENCY });
    const bareQuery = await rate(REQUESTS, () => pool.query("show server_version"));
    await pool.end();

    const express404 = await rate(REQUESTS, get("/api/no-such-route"));
    const health = await rate(REQUESTS, get("/api/health"));
    const row = (label: string, value: number) =>
      console.log(`${label.padEnd(44)} ${value.toFixed(0).padStart(8)} req/s`);
    row("bare pg query (show server_version)", bareQuery);
    row("Express JSON 404, no database (baseline)", express404);
    row("GET /api/health (Express + database ping)", health);
    console.log(
      `health / Express baseline: ${(health / express404).toFixed(2)}×   ` +
        `health / bare query: ${(health / bareQuery).toFixed(2)}×   (${REQUESTS} requests, ${CONCURRENCY} at a time)`,
    );
  } finally {
    await stop();
  }
}

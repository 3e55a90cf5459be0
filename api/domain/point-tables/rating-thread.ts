import { Worker } from "node:worker_threads";
import type { ChunkRating, ChunkRatingBasis } from "./rate-chunk";
import type { RatingAnswer, RatingJob } from "./rating-worker";

type Pending = { resolve: (rating: ChunkRating) => void; reject: (error: Error) => void };

/**
 * One worker thread that rates stored chunks for the whole process, started on first use. One is
 * enough: the machine it is sized for has two cores, one for the event loop and PostgreSQL's
 * reads, one for the batch kernels; concurrent evaluations queue their chunks in it.
 */
let worker: Worker | null = null;
const pending = new Map<number, Pending>();
let nextJob = 1;

/** Rejects every job the worker had and forgets it, so the next job starts a new worker. */
function abandon(error: Error): void {
  worker = null;
  for (const p of pending.values()) p.reject(error);
  pending.clear();
}

function startWorker(): Worker {
  const w = new Worker(new URL("./rating-worker.mjs", import.meta.url));
  w.on("message", (answer: RatingAnswer) => {
    const p = pending.get(answer.job);
    if (!p) return;
    pending.delete(answer.job);
    // An idle worker must not keep the process alive (a server that closes, a test run that ends).
    if (pending.size === 0) w.unref();
    if (answer.ok) p.resolve(answer.rating);
    else p.reject(new Error(`rating a point-table chunk failed: ${answer.message}`));
  });
  w.on("error", (error) => {
    if (worker === w) abandon(error);
  });
  w.on("exit", (code) => {
    if (worker === w) abandon(new Error(`the point-table rating worker stopped (exit code ${code})`));
  });
  w.unref();
  return w;
}

/**
 * Rates one stored chunk in the rating worker (see rate-chunk.ts) and answers its rating. The
 * chunk's buffer is transferred to the worker: `columns` is unusable afterwards.
 * @param columns xx[n] yy[n] zz[n] xy[n] yz[n] zx[n] in Pa, in a buffer of its own
 */
export function rateInWorker(
  columns: Float64Array,
  n: number,
  basis: ChunkRatingBasis,
): Promise<ChunkRating> {
  worker ??= startWorker();
  const w = worker;
  const job = nextJob++;
  return new Promise<ChunkRating>((resolve, reject) => {
    pending.set(job, { resolve, reject });
    w.ref();
    const message: RatingJob = { job, columns, n, basis };
    w.postMessage(message, [columns.buffer as ArrayBuffer]);
  });
}

import { JobThread } from "./job-thread";
import type { ChunkRating, ChunkRatingBasis } from "./rate-chunk";
import type { RatingJob } from "./rating-worker";

/**
 * One worker thread rates stored chunks for the whole process. One is enough: the machine it is
 * sized for has two cores, one for the event loop and PostgreSQL's reads, one for the batch
 * kernels; concurrent evaluations queue their chunks in it.
 */
const thread = new JobThread<RatingJob, ChunkRating>(
  new URL("./rating-worker.mjs", import.meta.url),
  "the point-table rating worker",
);

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
  return thread.run({ columns, n, basis }, [columns.buffer as ArrayBuffer]);
}

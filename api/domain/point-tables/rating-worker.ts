import { parentPort } from "node:worker_threads";
import { rateChunk, type ChunkRating, type ChunkRatingBasis } from "./rate-chunk";

/** A job for the rating worker: one stored chunk's components (transferred, not copied). */
export type RatingJob = { job: number; columns: Float64Array; n: number; basis: ChunkRatingBasis };

/** The worker's answer to a job: its rating, or the message of what went wrong. */
export type RatingAnswer =
  { job: number; ok: true; rating: ChunkRating } | { job: number; ok: false; message: string };

// The worker thread behind rating-thread.ts: rates one chunk per message, in arrival order, so the
// API's event loop never runs the batch kernels itself.
parentPort?.on("message", ({ job, columns, n, basis }: RatingJob) => {
  let answer: RatingAnswer;
  try {
    answer = { job, ok: true, rating: rateChunk(columns, n, basis) };
  } catch (error) {
    answer = { job, ok: false, message: error instanceof Error ? error.message : String(error) };
  }
  parentPort!.postMessage(answer);
});

import { serveJobs } from "./job-thread";
import { rateChunk, type ChunkRating, type ChunkRatingBasis } from "./rate-chunk";

/** A job for the rating worker: one stored chunk's components (transferred, not copied). */
export type RatingJob = { columns: Float64Array; n: number; basis: ChunkRatingBasis };

// The worker thread behind rating-thread.ts: rates one chunk per message, so the API's event
// loop never runs the batch kernels itself.
serveJobs<RatingJob, ChunkRating>(({ columns, n, basis }) => ({ answer: rateChunk(columns, n, basis) }));

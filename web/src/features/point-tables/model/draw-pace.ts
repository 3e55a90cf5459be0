/**
 * How many points the 3D view adds to its picture per frame. Drawing costs per point differ by a
 * factor of ten between a graphics card and software WebGL on a busy machine, so the slice follows
 * the frames: smaller when a frame took longer than {@link SLOW_FRAME_MS}, larger when it was
 * quick, so a frame (drawing and the wait for it) stays well under the 50 ms of a long task.
 */
import { MAX_DRAWN_POINTS } from "./cloud-sample";

/** Points in the first slice. */
export const FIRST_SLICE = 4_000;
export const MIN_SLICE = 1_000;
/** The whole sample the view draws at most: on a graphics card a frame draws the whole picture. */
export const MAX_SLICE = MAX_DRAWN_POINTS;
/** Frames longer than this shrink the next slice. */
export const SLOW_FRAME_MS = 35;
/** Frames shorter than this grow it. */
export const QUICK_FRAME_MS = 22;

/** The next slice after one of `slice` points whose frame took `frameMs`. */
export function nextSlice(slice: number, frameMs: number): number {
  if (frameMs > SLOW_FRAME_MS) {
    // in proportion, so one very slow frame brings the next down at once
    return Math.max(MIN_SLICE, Math.floor(slice * Math.min(0.7, SLOW_FRAME_MS / frameMs)));
  }
  if (frameMs < QUICK_FRAME_MS) return Math.min(MAX_SLICE, Math.floor(slice * 1.25));
  return slice;
}

/**
 * Performance marks for the drag benchmark (scripts/bench/bench-drag.ts): a mark when a pointer
 * move starts being handled, and a measure "bench:move" from it to the React commit that shows
 * the new frame. Cheap enough to leave on; nothing reads them but the benchmark.
 */
const START = "bench:move-start";
let pending = false;

/** Call first thing in a drag's pointer-move handler. */
export function markMoveStart(): void {
  performance.mark(START);
  pending = true;
}

/** Call from a layout effect that runs after the commit of the moved frame. */
export function markCommit(): void {
  if (!pending) return;
  pending = false;
  performance.measure("bench:move", START);
}

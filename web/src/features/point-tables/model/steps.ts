/**
 * Jobs that can pause, so the page can run a pass over a million points without a long task: a
 * job is a generator whose every `yield` is a place to hand the thread back. A worker runs it in
 * one go ({@link runSteps}); the page runs it a slice at a time, yielding to input and drawing
 * between slices ({@link runStepsInSlices}).
 */

/** A job's steps; the generator's return value is the job's result. */
export type Steps<T> = Generator<void, T, void>;

/** Runs a job's steps in one go (in a worker, or in a test). */
export function runSteps<T>(steps: Steps<T>): T {
  for (;;) {
    const next = steps.next();
    if (next.done === true) return next.value;
  }
}

/** Calls `body(from, to)` over 0..total−1 in runs of at most `slice` points, pausing between runs. */
export function* sweep(total: number, slice: number, body: (from: number, to: number) => void): Steps<void> {
  for (let from = 0; from < total; from += slice) {
    if (from > 0) yield;
    body(from, Math.min(total, from + slice));
  }
}

/**
 * Yields to the page through a message (a macrotask: input and drawing run first) rather than
 * setTimeout, which browsers hold back by at least 4 ms once timeouts nest.
 */
export function yieldToPage(): Promise<void> {
  if (typeof MessageChannel === "undefined") return new Promise((resolve) => setTimeout(resolve, 0));
  return new Promise((resolve) => {
    const channel = new MessageChannel();
    channel.port1.onmessage = () => {
      channel.port1.close();
      resolve();
    };
    channel.port2.postMessage(null);
  });
}

/**
 * Runs a job a step at a time, pausing (`pause`, by default {@link yieldToPage}) before each; null
 * when `isCancelled` says so between steps.
 */
export async function runStepsInSlices<T>(
  steps: Steps<T>,
  { pause = yieldToPage, isCancelled }: { pause?: () => Promise<void>; isCancelled?: () => boolean } = {},
): Promise<T | null> {
  for (;;) {
    await pause();
    if (isCancelled?.() === true) return null;
    const next = steps.next();
    if (next.done === true) return next.value;
  }
}

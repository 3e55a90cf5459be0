/**
 * The best rate (items per second) of `fn` over `repeats` runs on `count` items: the least
 * disturbed run, since other work on the machine only ever slows one down.
 */
export function bestRate(count: number, fn: () => void, repeats = 3): number {
  let best = 0;
  for (let r = 0; r < repeats; r++) {
    const t0 = performance.now();
    fn();
    best = Math.max(best, count / ((performance.now() - t0) / 1000));
  }
  return best;
}

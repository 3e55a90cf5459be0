/**
 * A band scale as a plain function: equal bands for a list of keys along a drawing interval, with
 * the same padding rule as d3-scale's `scaleBand().padding(p)` (inner and outer padding p, centred),
 * so a chart drawn from it in the browser or a printed report puts its bars on the same pixels.
 */

/** Where each key's band starts, and the band's width. */
export type BandScale = {
  /** Start of the band of `key` (undefined for a key not in the list). */
  start(key: string): number | undefined;
  /** Width of every band. */
  readonly bandwidth: number;
  /** Distance from one band's start to the next. */
  readonly step: number;
};

/**
 * Bands for `keys` along `range` with `padding` (0…1) of a step between and outside them.
 * @param keys one band per key, in this order (duplicates share the first band)
 * @param range drawing interval [r0, r1]
 * @param padding fraction of a step left empty between bands and at both ends
 */
export function bandScale(
  keys: readonly string[],
  range: readonly [number, number],
  padding: number,
): BandScale {
  const index = new Map<string, number>();
  for (const k of keys) if (!index.has(k)) index.set(k, index.size);
  const n = index.size;
  const reverse = range[1] < range[0];
  let start = reverse ? range[1] : range[0];
  const stop = reverse ? range[0] : range[1];
  const step = (stop - start) / Math.max(1, n - padding + padding * 2);
  start += (stop - start - step * (n - padding)) * 0.5;
  const bandwidth = step * (1 - padding);
  return {
    start: (key) => {
      const i = index.get(key);
      if (i === undefined) return undefined;
      return start + step * (reverse ? n - 1 - i : i);
    },
    bandwidth,
    step,
  };
}

/**
 * Linear scales and round tick values for diagrams, as plain functions over numbers: the same
 * arithmetic as d3-scale's `scaleLinear` and d3-array's `ticks` (the unit tests compare them), so
 * a picture drawn from these numbers in the browser or in a printed report lands on the same
 * pixels. No DOM, no dependencies.
 */

/** A linear map from a data interval (domain) to a drawing interval (range, SVG units). */
export type LinearScale = {
  readonly domain: readonly [number, number];
  readonly range: readonly [number, number];
  /** Data value → drawing coordinate (extrapolates outside the domain, never clamps). */
  map(value: number): number;
  /** Drawing coordinate → data value. */
  invert(at: number): number;
  /** About `count` round values inside the domain (1, 2 or 5 × 10ⁿ apart), in domain order. */
  ticks(count: number): number[];
};

/** t in [0, 1] along [a, b] for x in [a, b]; a degenerate interval maps everything to its middle. */
function normalize(a: number, b: number): (x: number) => number {
  const span = b - a;
  return span ? (x) => (x - a) / span : () => (Number.isNaN(span) ? Number.NaN : 0.5);
}

/** The point at t along [a, b], written as d3-interpolate writes it so the pixels agree. */
function interpolate(a: number, b: number): (t: number) => number {
  return (t) => a * (1 - t) + b * t;
}

/** d3's map for a two-point scale: a descending domain is read from its smaller end. */
function bimap(domain: readonly [number, number], range: readonly [number, number]): (x: number) => number {
  const [d0, d1] = domain;
  const [r0, r1] = range;
  const t = d1 < d0 ? normalize(d1, d0) : normalize(d0, d1);
  const at = d1 < d0 ? interpolate(r1, r0) : interpolate(r0, r1);
  return (x) => at(t(x));
}

/**
 * A linear scale from `domain` to `range`.
 * @param domain data interval [d0, d1] (d0 maps to r0)
 * @param range drawing interval [r0, r1]; may run downward (r1 < r0), as a y axis does
 */
export function linearScale(
  domain: readonly [number, number],
  range: readonly [number, number],
): LinearScale {
  const d: readonly [number, number] = [domain[0], domain[1]];
  const r: readonly [number, number] = [range[0], range[1]];
  return {
    domain: d,
    range: r,
    map: bimap(d, r),
    invert: bimap(r, d),
    ticks: (count) => niceTicks(d[0], d[d.length - 1], count),
  };
}

const E10 = Math.sqrt(50);
const E5 = Math.sqrt(10);
const E2 = Math.sqrt(2);

/** First and last tick as integers of the step, and the step (negative: its reciprocal). */
function tickSpec(start: number, stop: number, count: number): [number, number, number] {
  const step = (stop - start) / Math.max(0, count);
  const power = Math.floor(Math.log10(step));
  const error = step / Math.pow(10, power);
  const factor = error >= E10 ? 10 : error >= E5 ? 5 : error >= E2 ? 2 : 1;
  let i1: number;
  let i2: number;
  let inc: number;
  // Below 1 the step is kept as its reciprocal (an integer), so 0.1 × 3 is written 3 / 10 = 0.3.
  if (power < 0) {
    inc = Math.pow(10, -power) / factor;
    i1 = Math.round(start * inc);
    i2 = Math.round(stop * inc);
    if (i1 / inc < start) ++i1;
    if (i2 / inc > stop) --i2;
    inc = -inc;
  } else {
    inc = Math.pow(10, power) * factor;
    i1 = Math.round(start / inc);
    i2 = Math.round(stop / inc);
    if (i1 * inc < start) ++i1;
    if (i2 * inc > stop) --i2;
  }
  if (i2 < i1 && 0.5 <= count && count < 2) return tickSpec(start, stop, count * 2);
  return [i1, i2, inc];
}

/**
 * About `count` round values between `start` and `stop` (inclusive), 1, 2 or 5 × 10ⁿ apart, in the
 * order start → stop; [] when count ≤ 0, [start] when start = stop.
 */
export function niceTicks(start: number, stop: number, count: number): number[] {
  if (!(count > 0)) return [];
  if (start === stop) return [start];
  const reverse = stop < start;
  const [i1, i2, inc] = reverse ? tickSpec(stop, start, count) : tickSpec(start, stop, count);
  if (!(i2 >= i1)) return [];
  const n = i2 - i1 + 1;
  const out = new Array<number>(n);
  for (let i = 0; i < n; ++i) {
    const k = reverse ? i2 - i : i1 + i;
    out[i] = inc < 0 ? k / -inc : k * inc;
  }
  return out;
}

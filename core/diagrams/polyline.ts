/**
 * An SVG path through points, written as d3-shape's `line()` writes it (coordinates rounded to three
 * decimals), so a curve drawn from core lands exactly where the browser drew it before.
 */

/** Rounds a coordinate as d3-path does for `digits` = 3. */
const round3 = (v: number) => Math.round(v * 1000) / 1000;

/**
 * "M x0,y0 L x1,y1 …" through `points` mapped by `mapX` and `mapY`; "" for no points.
 * @param close append "Z" to close the outline
 */
export function polylinePath(
  points: readonly (readonly [number, number])[],
  mapX: (v: number) => number,
  mapY: (v: number) => number,
  close = false,
): string {
  let d = "";
  points.forEach(([a, b], i) => {
    d += `${i === 0 ? "M" : "L"}${round3(mapX(a))},${round3(mapY(b))}`;
  });
  return close ? `${d}Z` : d;
}

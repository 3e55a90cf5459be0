/**
 * Which rows of a long list to draw: only those in view plus a few either side, each row of one
 * fixed height. @tanstack/react-virtual is not among the project's packages, and a list of rows of
 * one height needs no more than this.
 */

export type RowWindow = { first: number; last: number; padTop: number; padBottom: number };

/**
 * Rows `first`..`last` (inclusive; last < first when there are none) of `count` rows of
 * `rowHeight` px to draw in a viewport of `viewport` px scrolled by `scrollTop`, with `overscan`
 * rows more on each side, and the empty space above and below them.
 */
export function rowWindow(
  scrollTop: number,
  viewport: number,
  rowHeight: number,
  count: number,
  overscan = 6,
): RowWindow {
  if (!(rowHeight > 0)) throw new RangeError(`rowHeight must be > 0, got ${rowHeight}`);
  if (count <= 0) return { first: 0, last: -1, padTop: 0, padBottom: 0 };
  const top = Math.max(0, scrollTop);
  const first = Math.max(0, Math.min(count - 1, Math.floor(top / rowHeight) - overscan));
  const last = Math.min(count - 1, Math.ceil((top + Math.max(0, viewport)) / rowHeight) + overscan);
  return { first, last, padTop: first * rowHeight, padBottom: (count - 1 - last) * rowHeight };
}

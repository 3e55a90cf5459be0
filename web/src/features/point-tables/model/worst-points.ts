/**
 * The list of worst points the results show: the points inside a box of coordinates with the
 * highest utilisation, each with its id, place, principal stresses, von Mises and Tresca (core's
 * object API on its tensor), and the rules that sort them.
 */
import {
  principalValues,
  verdictForUtilisation,
  vonMises,
  type PointTable,
  type StressTensor,
  type Verdict,
} from "../../../../../core";
import { runSteps, sweep, type Steps } from "./steps";

/** Per axis, the lowest and highest coordinate kept (null: open on that side). */
export type CoordinateBox = Record<"x" | "y" | "z", [number | null, number | null]>;
export const OPEN_BOX: CoordinateBox = { x: [null, null], y: [null, null], z: [null, null] };

/** True when every side of the box is open. */
export const isOpenBox = (box: CoordinateBox) =>
  (["x", "y", "z"] as const).every((a) => box[a][0] === null && box[a][1] === null);

/** One row of the list; stresses in Pa. */
export type PointRow = {
  index: number;
  id: number | string;
  x: number | null;
  y: number | null;
  z: number | null;
  utilisation: number;
  verdict: Verdict;
  s1: number;
  s2: number;
  s3: number;
  vonMises: number;
  tresca: number;
};

export type SortKey = "utilisation" | "id" | "x" | "y" | "z" | "s1" | "s3" | "vonMises" | "tresca";
export type SortOrder = { key: SortKey; descending: boolean };
export const DEFAULT_SORT: SortOrder = { key: "utilisation", descending: true };

/** The id the engineer reads for point `index`: the table's id, or its 1-based row number without an id column. */
export function pointId(table: Pick<PointTable, "ids">, index: number): number | string {
  return table.ids === null ? index + 1 : table.ids[index];
}

/** Point `index`'s tensor (Pa). */
export function tensorAt(components: Float64Array, index: number): StressTensor {
  const o = 6 * index;
  return {
    xx: components[o],
    yy: components[o + 1],
    zz: components[o + 2],
    xy: components[o + 3],
    yz: components[o + 4],
    zx: components[o + 5],
  };
}

function inside(coordinates: Float64Array, index: number, box: CoordinateBox): boolean {
  for (let a = 0; a < 3; a++) {
    const [lo, hi] = box[(["x", "y", "z"] as const)[a]];
    const v = coordinates[3 * index + a];
    if ((lo !== null && v < lo) || (hi !== null && v > hi)) return false;
  }
  return true;
}

/**
 * The indices of the `limit` points with the highest utilisation inside the box, highest first
 * (equal ones: lower index first); points without a utilisation are left out. Without
 * coordinates the box cannot apply and every point is a candidate.
 */
export const worstInBox = (
  utilisation: Float64Array,
  coordinates: Float64Array | null,
  box: CoordinateBox,
  limit: number,
): number[] => runSteps(worstInBoxSteps(utilisation, coordinates, box, limit));

/** {@link worstInBox} as steps of at most `slice` points, so the page can run it without a long task. */
export function* worstInBoxSteps(
  utilisation: Float64Array,
  coordinates: Float64Array | null,
  box: CoordinateBox,
  limit: number,
  slice = Infinity,
): Steps<number[]> {
  const open = coordinates === null || isOpenBox(box);
  // kept sorted ascending by (u, −index) so the least critical kept one is at [0]; the list is
  // short (a thousand) next to the table (a million), so most points fail the first comparison
  const keptU: number[] = [];
  const keptI: number[] = [];
  yield* sweep(utilisation.length, slice, (from, to) => {
    for (let i = from; i < to; i++) {
      const u = utilisation[i];
      if (u !== u) continue;
      if (keptU.length === limit && !(u > keptU[0])) continue;
      if (!open && !inside(coordinates, i, box)) continue;
      let at = 0;
      let hi = keptU.length;
      while (at < hi) {
        const mid = (at + hi) >> 1;
        if (keptU[mid] < u || (keptU[mid] === u && keptI[mid] > i)) at = mid + 1;
        else hi = mid;
      }
      keptU.splice(at, 0, u);
      keptI.splice(at, 0, i);
      if (keptU.length > limit) {
        keptU.shift();
        keptI.shift();
      }
    }
  });
  return keptI.reverse();
}

/** The rows for `indices`. */
export function rowsOf(
  table: Pick<PointTable, "components" | "coordinates" | "ids">,
  utilisation: Float64Array,
  indices: readonly number[],
): PointRow[] {
  return indices.map((index) => {
    const t = tensorAt(table.components, index);
    const [s1, s2, s3] = principalValues(t);
    const c = table.coordinates;
    const u = utilisation[index];
    return {
      index,
      id: pointId(table, index),
      x: c === null ? null : c[3 * index],
      y: c === null ? null : c[3 * index + 1],
      z: c === null ? null : c[3 * index + 2],
      utilisation: u,
      verdict: verdictForUtilisation(u),
      s1,
      s2,
      s3,
      vonMises: vonMises(t),
      tresca: s1 - s3,
    };
  });
}

function compare(a: number | string | null, b: number | string | null): number {
  if (a === b) return 0;
  if (a === null) return 1;
  if (b === null) return -1;
  if (typeof a === "number" && typeof b === "number") return a - b;
  return String(a).localeCompare(String(b), "en", { numeric: true });
}

/** The rows sorted by one column (missing values last either way; ties keep the worst first). */
export function sortRows(rows: readonly PointRow[], order: SortOrder): PointRow[] {
  const sign = order.descending ? -1 : 1;
  return [...rows].sort((a, b) => {
    const av = a[order.key];
    const bv = b[order.key];
    if (av === null || bv === null) return compare(av, bv);
    return sign * compare(av, bv) || b.utilisation - a.utilisation || a.index - b.index;
  });
}

/** The order after a click on a column's header: the same column flips, another starts descending. */
export const nextSort = (current: SortOrder, key: SortKey): SortOrder =>
  current.key === key ? { key, descending: !current.descending } : { key, descending: true };

/**
 * Reads a box side typed by the engineer: empty is open, a number (decimal point or comma) is a
 * bound; anything else is refused with a message naming the field.
 */
export function readBound(text: string, field: string): { value: number | null } | { error: string } {
  const t = text.trim().replace(",", ".");
  if (t === "") return { value: null };
  const v = Number(t);
  return Number.isFinite(v) ? { value: v } : { error: `${field} must be a number or empty.` };
}

/** A coordinate as the list shows it: six significant figures, "—" when the table has none. */
export const coordinateText = (v: number | null) => (v === null ? "—" : String(Number(v.toPrecision(6))));

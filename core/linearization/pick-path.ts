import type { Vec3 } from "../tensor/types";
import { MIN_POINTS, RECOMMENDED_MIN_POINTS } from "./path";

/**
 * Picking a stress classification line out of a finite-element point table: the points that lie
 * within a tolerance of the straight segment between two end points, projected onto it and sorted
 * from the first end to the second, ready for {@link linearize} with `distances` and the segment's
 * direction as `lineDirection`.
 *
 * Layout: `coordinates` holds x y z per point (stride 3), `stresses` the six components per point
 * (stride 6, xx yy zz xy yz zx, as in ./types.ts), both in the table's frame and units.
 */

/**
 * Points whose projections onto the line differ by less than this fraction of the line's length
 * count as one place. Our choice, no source: finite-element tables list a node once per element
 * around it (unaveraged results), with coordinates equal to the last digits written.
 */
export const COINCIDENT_FRACTION = 1e-6;

/** A path picked from a point table (see {@link pickPath}). */
export type PickedPath = {
  /** Places on the path, after coincident points were merged; the length of `distances`. */
  count: number;
  /** Points of the table within the tolerance, before merging. */
  found: number;
  /** `count` distances from the first end along the line, strictly increasing (length unit). */
  distances: Float64Array;
  /** 6·count components at those places (stride 6, the table's frame and unit). */
  stresses: Float64Array;
  /** For each place, the index in the table of its first point (the nearest to the line when merged). */
  sourceIndex: Int32Array;
  /** Length of the segment from the first end to the second (length unit). */
  lineLength: number;
  /** Unit direction from the first end to the second: the `lineDirection` for linearize. */
  direction: Vec3;
  /** What was assumed (how points were picked, merged). */
  notes: string[];
  /** What may make the path untrustworthy (too few points, a path short of the ends). */
  warnings: string[];
};

function finitePoint(v: unknown, name: string): Vec3 {
  if (!Array.isArray(v) || v.length !== 3 || !v.every((c) => typeof c === "number" && Number.isFinite(c))) {
    throw new RangeError(`${name} must be three finite numbers [x, y, z]`);
  }
  return [v[0], v[1], v[2]];
}

/** The segment's checked geometry, shared by both functions. */
function segmentOf(start: unknown, end: unknown, tolerance: unknown) {
  const a = finitePoint(start, "start");
  const b = finitePoint(end, "end");
  if (typeof tolerance !== "number" || !Number.isFinite(tolerance) || !(tolerance > 0)) {
    throw new RangeError(`tolerance must be a finite number greater than 0, got ${String(tolerance)}`);
  }
  const d: Vec3 = [b[0] - a[0], b[1] - a[1], b[2] - a[2]];
  const length = Math.hypot(d[0], d[1], d[2]);
  if (!(length > 0)) {
    throw new RangeError("end: the two end points coincide, so the line has zero length");
  }
  const direction: Vec3 = [d[0] / length, d[1] / length, d[2] / length];
  return { a, direction, length, tolerance };
}

function assertCoordinates(coordinates: unknown): number {
  if (!(coordinates instanceof Float64Array)) throw new TypeError("coordinates must be a Float64Array");
  if (coordinates.length % 3 !== 0) {
    throw new RangeError(
      `coordinates has ${coordinates.length} values, not a multiple of 3 (x y z per point)`,
    );
  }
  return coordinates.length / 3;
}

/**
 * Scans `coordinates` for the points within `tolerance` of the segment from `start` to `end`
 * (their distance to the nearest point of the segment, ends included, is at most `tolerance`).
 * Points with a non-finite coordinate are never picked. Cheap enough to run chunk by chunk over a
 * large table before {@link pickPath} sorts the few it keeps.
 * @returns the indices of those points, in the table's order, and their distances along the line
 *   (projections from `start`; slightly below 0 or above the length for points just past an end)
 * @throws RangeError for coordinates whose length is not a multiple of 3, an end that is not three
 *   finite numbers, coinciding ends (zero length), or a tolerance that is not a positive number
 */
export function pointsNearSegment(
  coordinates: Float64Array,
  start: Vec3,
  end: Vec3,
  tolerance: number,
): { indices: Int32Array; along: Float64Array; offLine: Float64Array } {
  const n = assertCoordinates(coordinates);
  const { a, direction: u, length, tolerance: tol } = segmentOf(start, end, tolerance);
  const tol2 = tol * tol;
  const picked: number[] = [];
  const along: number[] = [];
  const offLine: number[] = [];
  for (let i = 0; i < n; i++) {
    const dx = coordinates[3 * i] - a[0];
    const dy = coordinates[3 * i + 1] - a[1];
    const dz = coordinates[3 * i + 2] - a[2];
    const s = dx * u[0] + dy * u[1] + dz * u[2];
    // The nearest point of the segment: the projection, held between the two ends.
    const c = s < 0 ? 0 : s > length ? length : s;
    const ex = dx - c * u[0];
    const ey = dy - c * u[1];
    const ez = dz - c * u[2];
    const d2 = ex * ex + ey * ey + ez * ez;
    // NaN coordinates fail this comparison, so they are never picked.
    if (d2 <= tol2) {
      picked.push(i);
      along.push(s);
      const px = dx - s * u[0];
      const py = dy - s * u[1];
      const pz = dz - s * u[2];
      offLine.push(Math.sqrt(px * px + py * py + pz * pz));
    }
  }
  return {
    indices: Int32Array.from(picked),
    along: Float64Array.from(along),
    offLine: Float64Array.from(offLine),
  };
}

const fmt = (v: number) => Number(v.toPrecision(4)).toString();

/**
 * The path through a wall picked from a point table: every point within `tolerance` of the segment
 * from `start` to `end` (see {@link pointsNearSegment}), projected onto the line and sorted by its
 * distance from `start`. Points whose projections coincide (within {@link COINCIDENT_FRACTION} of the
 * length, e.g. one node listed once per element around it) become one place with the mean of their
 * tensors, which the notes state. It never throws for too few points: it says how many it found and
 * warns below {@link MIN_POINTS} (too few to linearize) and below {@link RECOMMENDED_MIN_POINTS}.
 *
 * @param coordinates 3N coordinates, x y z per point (the table's length unit)
 * @param stresses 6N components, xx yy zz xy yz zx per point (the table's frame and stress unit)
 * @param start the first end of the line (e.g. on the inside surface)
 * @param end the second end (e.g. on the outside surface)
 * @param tolerance how far from the segment a point may lie and still be picked (> 0, length unit)
 * @returns the places in order, their tensors, the direction for linearize, notes and warnings
 * @throws RangeError naming the field: coordinates or stresses of the wrong length, an end that is
 *   not three finite numbers, coinciding ends, a tolerance that is not a positive number
 */
export function pickPath(
  coordinates: Float64Array,
  stresses: Float64Array,
  start: Vec3,
  end: Vec3,
  tolerance: number,
): PickedPath {
  const n = assertCoordinates(coordinates);
  if (!(stresses instanceof Float64Array)) throw new TypeError("stresses must be a Float64Array");
  if (stresses.length !== 6 * n) {
    throw new RangeError(
      `stresses has ${stresses.length} values; the coordinates give ${n} points, which need ${6 * n}`,
    );
  }
  const { direction, length, tolerance: tol } = segmentOf(start, end, tolerance);
  const near = pointsNearSegment(coordinates, start, end, tolerance);
  const found = near.indices.length;
  const order = Array.from({ length: found }, (_, k) => k).sort(
    (p, q) => near.along[p] - near.along[q] || near.offLine[p] - near.offLine[q] || p - q,
  );

  // Merge runs of coincident projections into one place each, averaging their tensors.
  const same = COINCIDENT_FRACTION * length;
  const distances: number[] = [];
  const merged: number[] = [];
  const sources: number[] = [];
  let mergedGroups = 0;
  let k = 0;
  while (k < found) {
    let j = k + 1;
    while (j < found && near.along[order[j]] - near.along[order[k]] <= same) j++;
    const size = j - k;
    if (size > 1) mergedGroups++;
    const sum = [0, 0, 0, 0, 0, 0];
    let at = 0;
    for (let m = k; m < j; m++) {
      const i = near.indices[order[m]];
      at += near.along[order[m]];
      for (let c = 0; c < 6; c++) sum[c] += stresses[6 * i + c];
    }
    distances.push(at / size);
    for (let c = 0; c < 6; c++) merged.push(sum[c] / size);
    sources.push(near.indices[order[k]]);
    k = j;
  }
  const count = distances.length;

  const notes = [
    `Picked the points within ${fmt(tol)} of the segment from the first end to the second ` +
      `(length ${fmt(length)}), projected each onto the line and sorted them by the distance of ` +
      "the projection from the first end; the linearization's line runs along that segment.",
  ];
  if (mergedGroups > 0) {
    notes.push(
      `${found - count} point(s) sat at the same place along the line as another (within ` +
        `${fmt(COINCIDENT_FRACTION * 100)} % of the length), e.g. one node listed for each element around it: ` +
        `each of those ${mergedGroups} place(s) takes the mean of their tensors.`,
    );
  }
  const warnings: string[] = [];
  if (count < MIN_POINTS) {
    warnings.push(
      `Only ${count} place(s) along the line within the tolerance; a linearization needs at least ` +
        `${MIN_POINTS} (${RECOMMENDED_MIN_POINTS} or more recommended). Widen the tolerance or check the two ends.`,
    );
  } else if (count < RECOMMENDED_MIN_POINTS) {
    warnings.push(
      `Only ${count} places along the line: at least ${RECOMMENDED_MIN_POINTS} are recommended for a trustworthy answer.`,
    );
  }
  if (count >= 1 && (distances[0] > tol || distances[count - 1] < length - tol)) {
    warnings.push(
      `The picked points run from ${fmt(distances[0])} to ${fmt(distances[count - 1])} along a line of ` +
        `length ${fmt(length)}: no point lies within the tolerance of ` +
        `${distances[0] > tol ? "the first end" : "the second end"}, so the linearized wall is thinner than the line. ` +
        "Check that both ends are on the surfaces and that the table has points there.",
    );
  }
  const bad = merged.findIndex((v) => !Number.isFinite(v));
  if (bad >= 0) {
    warnings.push(
      `The point at ${fmt(distances[Math.floor(bad / 6)])} along the line has a component that is not a number; ` +
        "the line cannot be linearized with it.",
    );
  }
  return {
    count,
    found,
    distances: Float64Array.from(distances),
    stresses: Float64Array.from(merged),
    sourceIndex: Int32Array.from(sources),
    lineLength: length,
    direction,
    notes,
    warnings,
  };
}

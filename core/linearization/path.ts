import type { Vec3 } from "../tensor/types";

/**
 * The path along a stress classification line: distances x from the first point (0 … t) and the
 * line's unit direction, from the caller's distances or coordinates. Refuses what cannot be a line
 * (RangeError naming the field) and says what it assumed.
 */

/** Fewer points than this are refused: two points give a line but no check of the distribution. */
export const MIN_POINTS = 3;

/**
 * Below this many points the answer is flagged as possibly untrustworthy. Our choice, no source:
 * for a Lamé thick cylinder with ro/ri = 2 (hoop stress, piecewise-linear integration), 11 evenly
 * spaced points give membrane + bending within 0.3 % and bending within 0.6 % of the exact integrals,
 * while 5 points are 1.8 % and 3.2 % off (figures computed for this choice; the refinement test in
 * linearize-closed-form.test.ts checks the error falls as 1/N²). Steeper gradients need more.
 */
export const RECOMMENDED_MIN_POINTS = 11;

/** A point farther than this fraction of t off the first-to-last line is reported. */
export const OFF_LINE_WARN_FRACTION = 0.01;

/** Spacing counts as even when the largest and smallest interval differ by less than this fraction. */
const EVEN_SPACING_REL_TOL = 1e-6;

export type LinePath = {
  /** N distances from the first point, 0 … t (length unit). */
  x: Float64Array;
  /** t = x[N − 1] (length unit, > 0). */
  thickness: number;
  /** Unit direction of the line from the first point to the last, in the stresses' frame. */
  direction: Vec3;
  notes: string[];
  warnings: string[];
};

function finiteVec3(v: unknown, name: string): Vec3 {
  if (!Array.isArray(v) || v.length !== 3 || !v.every((c) => typeof c === "number" && Number.isFinite(c))) {
    throw new RangeError(`${name} must be three finite numbers`);
  }
  return [v[0], v[1], v[2]];
}

/** Unit vector of a finite, non-zero 3-vector. @throws RangeError naming `name` */
export function unitVector(v: unknown, name: string): Vec3 {
  const [a, b, c] = finiteVec3(v, name);
  const n = Math.hypot(a, b, c);
  if (!(n > 0)) throw new RangeError(`${name} must be a non-zero vector`);
  return [a / n, b / n, c / n];
}

/**
 * The path from the caller's input.
 * @param n number of points (from the stresses)
 * @param distances N increasing distances, or undefined
 * @param coordinates 3N coordinates, or undefined
 * @param lineDirection the line's direction (only with distances)
 * @throws RangeError naming the field for a wrong length, a non-finite value, distances that do not
 *   increase, zero thickness, or a missing/extra field
 */
export function linePath(
  n: number,
  distances: Float64Array | undefined,
  coordinates: Float64Array | undefined,
  lineDirection: Vec3 | undefined,
): LinePath {
  if (distances !== undefined && coordinates !== undefined) {
    throw new RangeError("distances and coordinates: give one of them, not both");
  }
  if (distances === undefined && coordinates === undefined) {
    throw new RangeError(
      "distances or coordinates must be given (the positions of the points along the line)",
    );
  }
  const notes: string[] = [];
  const warnings: string[] = [];
  const x = new Float64Array(n);
  let direction: Vec3;
  if (distances !== undefined) {
    if (!(distances instanceof Float64Array)) throw new TypeError("distances must be a Float64Array");
    if (distances.length !== n) {
      throw new RangeError(`distances has ${distances.length} values; the stresses give ${n} points`);
    }
    if (lineDirection === undefined) {
      throw new RangeError(
        "lineDirection must be given with distances: the line's direction in the stresses' frame, from the first point to the last",
      );
    }
    direction = unitVector(lineDirection, "lineDirection");
    for (let i = 0; i < n; i++) {
      if (!Number.isFinite(distances[i]))
        throw new RangeError(`distances[${i}] must be finite, got ${distances[i]}`);
      x[i] = distances[i] - distances[0];
    }
  } else {
    const c = coordinates!;
    if (!(c instanceof Float64Array)) throw new TypeError("coordinates must be a Float64Array");
    if (c.length !== 3 * n) {
      throw new RangeError(`coordinates has ${c.length} values; ${n} points need ${3 * n} (x y z per point)`);
    }
    if (lineDirection !== undefined) {
      throw new RangeError(
        "lineDirection: give it only with distances; with coordinates the line runs from the first point to the last",
      );
    }
    for (let i = 0; i < c.length; i++) {
      if (!Number.isFinite(c[i])) {
        throw new RangeError(`coordinates[${i}] (point ${Math.floor(i / 3)}) must be finite, got ${c[i]}`);
      }
    }
    const last = 3 * (n - 1);
    const chord: Vec3 = [c[last] - c[0], c[last + 1] - c[1], c[last + 2] - c[2]];
    const length = Math.hypot(chord[0], chord[1], chord[2]);
    if (!(length > 0)) {
      throw new RangeError("coordinates: the first and last point coincide, so the thickness is zero");
    }
    direction = [chord[0] / length, chord[1] / length, chord[2] / length];
    let worstOff = 0;
    let worstAt = 0;
    for (let i = 0; i < n; i++) {
      const dx = c[3 * i] - c[0];
      const dy = c[3 * i + 1] - c[1];
      const dz = c[3 * i + 2] - c[2];
      const along = dx * direction[0] + dy * direction[1] + dz * direction[2];
      x[i] = along;
      const off = Math.hypot(dx - along * direction[0], dy - along * direction[1], dz - along * direction[2]);
      if (off > worstOff) {
        worstOff = off;
        worstAt = i;
      }
    }
    notes.push(
      "Distances are the points' projections onto the straight line from the first point to the last.",
    );
    if (worstOff > OFF_LINE_WARN_FRACTION * length) {
      warnings.push(
        `Point ${worstAt} lies ${worstOff.toPrecision(3)} off the line from the first point to the last ` +
          `(${((100 * worstOff) / length).toPrecision(3)} % of the thickness); it was projected onto the line. ` +
          "Check that the path is straight and its points are in order.",
      );
    }
  }
  for (let i = 1; i < n; i++) {
    if (!(x[i] > x[i - 1])) {
      const field = distances !== undefined ? `distances[${i}]` : `coordinates (point ${i})`;
      throw new RangeError(
        `${field}: distances along the line must strictly increase from the first point to the last ` +
          `(point ${i} is at ${x[i]}, point ${i - 1} at ${x[i - 1]})`,
      );
    }
  }
  const thickness = x[n - 1];
  if (!(thickness > 0))
    throw new RangeError("distances: the thickness (last − first) must be greater than 0");

  let hMin = Infinity;
  let hMax = 0;
  for (let i = 1; i < n; i++) {
    const h = x[i] - x[i - 1];
    if (h < hMin) hMin = h;
    if (h > hMax) hMax = h;
  }
  if (hMax - hMin > EVEN_SPACING_REL_TOL * hMax) {
    notes.push(
      `The points are unevenly spaced (largest interval ${(hMax / hMin).toPrecision(3)} × the smallest): ` +
        "the stress was assumed to vary linearly between neighbouring points, whatever their spacing " +
        "(the trapezoidal rule's assumption), with no smoothing or re-sampling.",
    );
  }
  if (n < RECOMMENDED_MIN_POINTS) {
    warnings.push(
      `Only ${n} points: at least ${RECOMMENDED_MIN_POINTS} are recommended for a trustworthy answer ` +
        "(with fewer, a curved distribution such as a thick cylinder's is integrated with errors of a few per cent).",
    );
  }
  return { x, thickness, direction, notes, warnings };
}

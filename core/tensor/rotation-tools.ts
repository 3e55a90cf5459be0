import { radToDeg } from "../units/angles";
import type { Mat3, Vec3 } from "./types";
import { assertMat3, assertVec3 } from "./validate";

/**
 * Tools for working with rotation matrices in core's convention (rows = new axes written in the
 * old frame, so σ' = R σ Rᵀ): composing them, undoing drift, and reading them back as an axis and
 * an angle or as Euler angles. Geometry only; no stress is involved.
 */

/** The identity rotation (the original axes). */
export const IDENTITY_ROTATION: Mat3 = [
  [1, 0, 0],
  [0, 1, 0],
  [0, 0, 1],
];

/**
 * Matrix product a·b of two 3×3 matrices given as rows. In core's convention, if `b` takes the
 * original axes to an intermediate frame and `a` is a further turn written in that intermediate
 * frame, then a·b takes the original axes to the final frame.
 * @param a left factor (rows)
 * @param b right factor (rows)
 * @returns a·b (rows)
 */
export function multiplyMat3(a: Mat3, b: Mat3): Mat3 {
  const row = (i: number): Vec3 => [
    a[i][0] * b[0][0] + a[i][1] * b[1][0] + a[i][2] * b[2][0],
    a[i][0] * b[0][1] + a[i][1] * b[1][1] + a[i][2] * b[2][1],
    a[i][0] * b[0][2] + a[i][1] * b[1][2] + a[i][2] * b[2][2],
  ];
  return [row(0), row(1), row(2)];
}

/** Transpose of a 3×3 matrix (the inverse of a rotation). @param r matrix (rows) */
export function transposeMat3(r: Mat3): Mat3 {
  return [
    [r[0][0], r[1][0], r[2][0]],
    [r[0][1], r[1][1], r[2][1]],
    [r[0][2], r[1][2], r[2][2]],
  ];
}

function cross(a: Vec3, b: Vec3): Vec3 {
  return [a[1] * b[2] - a[2] * b[1], a[2] * b[0] - a[0] * b[2], a[0] * b[1] - a[1] * b[0]];
}

function normalised(v: Vec3, name: string): Vec3 {
  const n = Math.hypot(v[0], v[1], v[2]);
  if (!(n > 0)) throw new RangeError(`${name} must be a non-zero vector`);
  return [v[0] / n, v[1] / n, v[2] / n];
}

/**
 * The nearest proper rotation to a matrix whose rows have drifted slightly from orthonormal (after
 * many composed increments): Gram–Schmidt on the first two rows, third row = first × second.
 * @param r nearly orthonormal matrix (rows)
 * @returns a right-handed rotation (rows orthonormal, det = +1)
 * @throws RangeError if the first two rows are zero or parallel
 */
export function orthonormalize(r: Mat3): Mat3 {
  assertMat3(r, "r");
  const x = normalised(r[0], "r[0]");
  const d = x[0] * r[1][0] + x[1] * r[1][1] + x[2] * r[1][2];
  const y = normalised(
    [r[1][0] - d * x[0], r[1][1] - d * x[1], r[1][2] - d * x[2]],
    "r[1] (minus its part along r[0])",
  );
  return [x, y, cross(x, y)];
}

/**
 * Axis and angle of a rotation matrix, the inverse of `rotationFromAxisAngle`: the returned pair
 * gives back `r`. The angle is in [0°, 180°]; for the identity the axis is z and the angle 0°.
 * @param r rotation (rows = new axes in old frame)
 * @returns `axis` (unit vector, dimensionless) and `angleDeg` (degrees)
 */
export function axisAngleFromRotation(r: Mat3): { axis: Vec3; angleDeg: number } {
  assertMat3(r, "r");
  // Work with the active matrix Q = Rᵀ, whose columns are the turned axes.
  const q = transposeMat3(r);
  const trace = q[0][0] + q[1][1] + q[2][2];
  const sx = q[2][1] - q[1][2];
  const sy = q[0][2] - q[2][0];
  const sz = q[1][0] - q[0][1];
  const sinTimes2 = Math.hypot(sx, sy, sz);
  const cos = Math.min(1, Math.max(-1, (trace - 1) / 2));
  const angle = Math.atan2(sinTimes2 / 2, cos);
  if (sinTimes2 < 1e-12 && cos > 0) return { axis: [0, 0, 1], angleDeg: 0 };
  if (cos < 0) {
    // Beyond 90° the skew part shrinks towards zero: read the axis from B = (Q + Qᵀ)/2 − cI = (1 − c)·a·aᵀ,
    // taking its column with the largest diagonal (most accurate), signed by the skew part.
    const b = [0, 1, 2].map((i) => [0, 1, 2].map((j) => (q[i][j] + q[j][i]) / 2 - (i === j ? cos : 0)));
    const k = b[0][0] >= b[1][1] && b[0][0] >= b[2][2] ? 0 : b[1][1] >= b[2][2] ? 1 : 2;
    let axis: Vec3 = normalised([b[0][k], b[1][k], b[2][k]], "axis");
    if (axis[0] * sx + axis[1] * sy + axis[2] * sz < 0) axis = [-axis[0], -axis[1], -axis[2]];
    return { axis, angleDeg: radToDeg(angle) };
  }
  return { axis: [sx / sinTimes2, sy / sinTimes2, sz / sinTimes2], angleDeg: radToDeg(angle) };
}

const AXIS_INDEX: Readonly<Record<string, number>> = { X: 0, Y: 1, Z: 2 };

/** Active rotation about coordinate axis `a` (0, 1, 2) by `angle` radians. */
function activeAbout(a: number, angle: number): number[][] {
  const m = [
    [1, 0, 0],
    [0, 1, 0],
    [0, 0, 1],
  ];
  const p = (a + 1) % 3;
  const q = (a + 2) % 3;
  const c = Math.cos(angle);
  const s = Math.sin(angle);
  m[p][p] = c;
  m[q][q] = c;
  m[q][p] = s;
  m[p][q] = -s;
  return m;
}

function mul(a: number[][], b: number[][]): number[][] {
  return [0, 1, 2].map((i) =>
    [0, 1, 2].map((j) => a[i][0] * b[0][j] + a[i][1] * b[1][j] + a[i][2] * b[2][j]),
  );
}

/** Angle of an active rotation about axis `a`, read from its matrix. */
function angleAbout(a: number, m: number[][]): number {
  const p = (a + 1) % 3;
  const q = (a + 2) % 3;
  return Math.atan2(m[q][p], m[p][p]);
}

/**
 * Intrinsic Euler angles of a rotation for a named sequence, the inverse of `rotationFromEuler`
 * (which the result reproduces). Tait–Bryan sequences (three different axes, e.g. "ZYX") give the
 * middle angle in [−90°, 90°]; proper sequences (first = last, e.g. "ZXZ") give it in [0°, 180°].
 * At gimbal lock (middle angle ±90° or 0°/180°) the third angle is set to 0°.
 * @param sequence three uppercase axis letters, no axis twice in a row
 * @param r rotation (rows = new axes in old frame)
 * @returns the three angles, degrees, in sequence order
 * @throws RangeError for an invalid sequence
 */
export function eulerFromRotation(sequence: string, r: Mat3): Vec3 {
  if (
    typeof sequence !== "string" ||
    !/^[XYZ]{3}$/.test(sequence) ||
    sequence[0] === sequence[1] ||
    sequence[1] === sequence[2]
  ) {
    throw new RangeError(
      `sequence must be three uppercase axis letters with no axis twice in a row (intrinsic, e.g. "ZYX"), got ${JSON.stringify(sequence)}`,
    );
  }
  assertMat3(r, "r");
  const q = transposeMat3(r).map((row) => [...row]); // active: Q = A_a(α) A_b(β) A_c(γ)
  const a = AXIS_INDEX[sequence[0]];
  const b = AXIS_INDEX[sequence[1]];
  const c = AXIS_INDEX[sequence[2]];
  const LOCK = 1e-10;
  let alpha: number;
  let beta: number;
  let gamma: number;
  if (a !== c) {
    const e = (b - a + 3) % 3 === 1 ? 1 : -1; // +1 when (a, b, c) is a cyclic order of (x, y, z)
    // atan2 rather than asin keeps β accurate near ±90°.
    const cb = Math.hypot(q[b][c], q[c][c]);
    beta = Math.atan2(e * q[a][c], cb);
    if (cb > LOCK) {
      alpha = Math.atan2(-e * q[b][c], q[c][c]);
      gamma = Math.atan2(-e * q[a][b], q[a][a]);
    } else {
      gamma = 0;
      alpha = angleAbout(a, mul(q, transposed(activeAbout(b, beta))));
    }
  } else {
    const other = 3 - a - b;
    const e = (b - a + 3) % 3 === 1 ? 1 : -1;
    const sb = Math.hypot(q[b][a], q[other][a]);
    beta = Math.atan2(sb, q[a][a]);
    if (sb > LOCK) {
      alpha = Math.atan2(q[b][a], -e * q[other][a]);
      gamma = Math.atan2(q[a][b], e * q[a][other]);
    } else {
      gamma = 0;
      alpha = angleAbout(a, mul(q, transposed(activeAbout(b, beta))));
    }
  }
  return [radToDeg(alpha), radToDeg(beta), radToDeg(gamma)];
}

function transposed(m: number[][]): number[][] {
  return [0, 1, 2].map((i) => [0, 1, 2].map((j) => m[j][i]));
}

/**
 * The angle of a rotation about z alone (the plane-stress θ), or null when `r` also tilts the z axis.
 * @param r rotation (rows = new axes in old frame)
 * @param tolerance how far (dimensionless) z′ may be from z and still count as a turn about z
 * @returns θ in degrees, counter-clockwise positive from x towards y, in (−180°, 180°], or null
 */
export function angleAboutZ(r: Mat3, tolerance = 1e-9): number | null {
  assertMat3(r, "r");
  if (Math.abs(r[2][0]) > tolerance || Math.abs(r[2][1]) > tolerance || Math.abs(r[2][2] - 1) > tolerance) {
    return null;
  }
  return radToDeg(Math.atan2(r[0][1], r[0][0]));
}

/**
 * Rotation taking the axes onto a given unit normal as x′: a right-handed frame whose first row is
 * `n` (normalised). Used to draw a plane of interest.
 * @param n plane normal (any non-zero length)
 * @returns R with R[0] = n/|n|
 */
export function frameWithFirstAxis(n: Vec3): Mat3 {
  assertVec3(n, "n");
  const x = normalised(n, "n");
  const helper: Vec3 = Math.abs(x[2]) < 0.9 ? [0, 0, 1] : [1, 0, 0];
  const y = normalised(cross(helper, x), "n × helper");
  return [x, y, cross(x, y)];
}

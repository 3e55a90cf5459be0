import { ROTATION_ORTHONORMAL_TOL } from "../tolerances";
import { cosSinDeg } from "../units/angles";
import type { Mat3, StressTensor, Vec3 } from "./types";
import { assertFinite, assertMat3, assertTensor, assertVec3 } from "./validate";

/**
 * Components of a stress tensor in a rotated frame: σ' = R σ Rᵀ, i.e. σ'ij = Rik σkl Rjl.
 * Rows of `r` are the new axes written in the old frame (a row-orthonormal matrix; a reflection is
 * accepted too, since tensors transform the same way under it).
 * @param s stress tensor in the old frame (any one stress unit)
 * @param r rotation matrix, dimensionless; rows = new axes in old-frame components
 * @returns the tensor in the new frame, same unit as `s`
 * @throws RangeError if `r` is not orthonormal within {@link ROTATION_ORTHONORMAL_TOL}
 */
export function rotateTensor(s: StressTensor, r: Mat3): StressTensor {
  assertTensor(s);
  assertMat3(r, "r");
  let worst = 0;
  for (let i = 0; i < 3; i++) {
    for (let j = 0; j < 3; j++) {
      const d = Math.abs(r[i][0] * r[j][0] + r[i][1] * r[j][1] + r[i][2] * r[j][2] - (i === j ? 1 : 0));
      if (d > worst) worst = d;
    }
  }
  if (!(worst <= ROTATION_ORTHONORMAL_TOL)) {
    throw new RangeError(
      `r must have orthonormal rows: max |R·Rᵀ − I| = ${worst} exceeds ${ROTATION_ORTHONORMAL_TOL}`,
    );
  }
  const S = [
    [s.xx, s.xy, s.zx],
    [s.xy, s.yy, s.yz],
    [s.zx, s.yz, s.zz],
  ];
  // T = R S, then σ'ij = Ti · Rj
  const T = [0, 1, 2].map((i) =>
    [0, 1, 2].map((l) => r[i][0] * S[0][l] + r[i][1] * S[1][l] + r[i][2] * S[2][l]),
  );
  const c = (i: number, j: number): number => T[i][0] * r[j][0] + T[i][1] * r[j][1] + T[i][2] * r[j][2];
  return {
    xx: c(0, 0),
    yy: c(1, 1),
    zz: c(2, 2),
    xy: 0.5 * (c(0, 1) + c(1, 0)),
    yz: 0.5 * (c(1, 2) + c(2, 1)),
    zx: 0.5 * (c(2, 0) + c(0, 2)),
  };
}

/** Transpose of a row-major 3×3 given as nine numbers. */
function transposed(q: readonly number[]): Mat3 {
  return [
    [q[0], q[3], q[6]],
    [q[1], q[4], q[7]],
    [q[2], q[5], q[8]],
  ];
}

/**
 * Rotation of the axes about `axis` by `angleDeg` (right-hand rule: counter-clockwise positive when
 * looking down the axis towards the origin). Rows of the result are the new axes in the old frame,
 * ready for {@link rotateTensor}; e.g. axis z and 30° gives x' = (cos 30°, sin 30°, 0).
 * @param axis rotation axis (any non-zero length, dimensionless; normalised here)
 * @param angleDeg rotation angle, degrees
 * @returns R, rows = new axes in old-frame components
 * @throws RangeError for a zero or non-finite axis or angle
 */
export function rotationFromAxisAngle(axis: Vec3, angleDeg: number): Mat3 {
  assertVec3(axis, "axis");
  assertFinite(angleDeg, "angleDeg");
  const n = Math.hypot(axis[0], axis[1], axis[2]);
  if (n === 0) throw new RangeError("axis must be a non-zero vector");
  const x = axis[0] / n;
  const y = axis[1] / n;
  const z = axis[2] / n;
  const [c, s] = cosSinDeg(angleDeg);
  const k = 1 - c;
  // Rodrigues: Q (columns = rotated axes) = cI + s[a]× + (1 − c) a aᵀ; R = Qᵀ.
  return transposed([
    c + x * x * k,
    x * y * k - z * s,
    x * z * k + y * s,
    y * x * k + z * s,
    c + y * y * k,
    y * z * k - x * s,
    z * x * k - y * s,
    z * y * k + x * s,
    c + z * z * k,
  ]);
}

const AXES: Readonly<Record<string, Vec3>> = { X: [1, 0, 0], Y: [0, 1, 0], Z: [0, 0, 1] };

/**
 * Rotation from three intrinsic Euler angles. `sequence` names the axes in order, uppercase, e.g.
 * "ZYX": first rotate the axes about z by anglesDeg[0], then about the new y′ by anglesDeg[1], then
 * about the newest x″ by anglesDeg[2] (each counter-clockwise positive, right-hand rule). Any of the
 * twelve sequences with no axis repeated twice in a row is accepted ("ZYX", "XYZ", "ZXZ", …).
 * Equivalent to composing {@link rotationFromAxisAngle}: R = R3 · R2 · R1 with each Ri about its
 * axis in the frame left by the previous step.
 * @param sequence three letters from X, Y, Z, intrinsic
 * @param anglesDeg the three angles, degrees
 * @returns R, rows = new axes in old-frame components
 * @throws RangeError for an invalid sequence or non-finite angle
 */
export function rotationFromEuler(sequence: string, anglesDeg: Vec3): Mat3 {
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
  assertVec3(anglesDeg, "anglesDeg");
  let r: Mat3 = [
    [1, 0, 0],
    [0, 1, 0],
    [0, 0, 1],
  ];
  for (let k = 0; k < 3; k++) {
    // Intrinsic: each step rotates about an axis of the current frame, so R ← Rk · R.
    r = multiply(rotationFromAxisAngle(AXES[sequence[k]], anglesDeg[k]), r);
  }
  return r;
}

/** Product of two 3×3 matrices given as rows. */
function multiply(a: Mat3, b: Mat3): Mat3 {
  const row = (i: number): Vec3 => [
    a[i][0] * b[0][0] + a[i][1] * b[1][0] + a[i][2] * b[2][0],
    a[i][0] * b[0][1] + a[i][1] * b[1][1] + a[i][2] * b[2][1],
    a[i][0] * b[0][2] + a[i][1] * b[1][2] + a[i][2] * b[2][2],
  ];
  return [row(0), row(1), row(2)];
}

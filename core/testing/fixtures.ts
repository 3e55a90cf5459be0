/**
 * Deterministic helpers for tests: a seeded generator and tensors with known principal values.
 * Pure TypeScript so that it type-checks with the rest of core; only tests import it.
 */
import type { StressTensor } from "../tensor/types";

/** Seeded uniform generator in [0, 1) (mulberry32). @param seed any 32-bit integer */
export function seededRandom(seed: number): () => number {
  let a = seed >>> 0;
  return () => {
    a = (a + 0x6d2b79f5) >>> 0;
    let t = a;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}

/** Rotation matrix (rows) from a quaternion, normalised here; the zero quaternion gives the identity. */
export function rotationFromQuaternion(w: number, x: number, y: number, z: number): number[][] {
  const k = Math.max(Math.abs(w), Math.abs(x), Math.abs(y), Math.abs(z));
  if (k === 0) {
    return [
      [1, 0, 0],
      [0, 1, 0],
      [0, 0, 1],
    ];
  }
  w /= k;
  x /= k;
  y /= k;
  z /= k;
  const n = Math.hypot(w, x, y, z);
  w /= n;
  x /= n;
  y /= n;
  z /= n;
  return [
    [1 - 2 * (y * y + z * z), 2 * (x * y - w * z), 2 * (x * z + w * y)],
    [2 * (x * y + w * z), 1 - 2 * (x * x + z * z), 2 * (y * z - w * x)],
    [2 * (x * z - w * y), 2 * (y * z + w * x), 1 - 2 * (x * x + y * y)],
  ];
}

/** σ = Q diag(λ) Qᵀ (columns of Q are the principal directions). @param q rotation @param l principal values */
export function tensorWithPrincipal(q: readonly (readonly number[])[], l: readonly number[]): StressTensor {
  const e = (i: number, j: number): number =>
    q[i][0] * l[0] * q[j][0] + q[i][1] * l[1] * q[j][1] + q[i][2] * l[2] * q[j][2];
  return { xx: e(0, 0), yy: e(1, 1), zz: e(2, 2), xy: e(0, 1), yz: e(1, 2), zx: e(2, 0) };
}

/** The tensor as a full 3×3 array. */
export function toMatrix(s: StressTensor): number[][] {
  return [
    [s.xx, s.xy, s.zx],
    [s.xy, s.yy, s.yz],
    [s.zx, s.yz, s.zz],
  ];
}

/** Frobenius norm ‖σ‖F without overflow or underflow. */
export function frobenius(s: StressTensor): number {
  const m = toMatrix(s).flat();
  const k = Math.max(...m.map(Math.abs));
  if (k === 0) return 0;
  return k * Math.sqrt(m.reduce((a, v) => a + (v / k) * (v / k), 0));
}

/** Largest |(σ d − λ d)_i| / ‖σ‖F over i, computed on σ/‖σ‖F so that nothing overflows. */
export function residual(s: StressTensor, lambda: number, d: readonly number[]): number {
  const f = frobenius(s);
  const m = toMatrix(s);
  let r = 0;
  for (let i = 0; i < 3; i++) {
    const sd = (m[i][0] / f) * d[0] + (m[i][1] / f) * d[1] + (m[i][2] / f) * d[2];
    r += (sd - (lambda / f) * d[i]) ** 2;
  }
  return Math.sqrt(r);
}

/** Cross product. */
export function cross(a: readonly number[], b: readonly number[]): [number, number, number] {
  return [a[1] * b[2] - a[2] * b[1], a[2] * b[0] - a[0] * b[2], a[0] * b[1] - a[1] * b[0]];
}

/** Dot product. */
export function dot(a: readonly number[], b: readonly number[]): number {
  return a[0] * b[0] + a[1] * b[1] + a[2] * b[2];
}

import { rotateTensor } from "../tensor/rotate";
import { transposeMat3 } from "../tensor/rotation-tools";
import type { Mat3, Vec3 } from "../tensor/types";
import { rotationFromQuaternion } from "../testing/fixtures";

/**
 * Helpers for the linearization tests only: build stress fields along a line in a known local frame
 * and write them in a global frame, so a test knows the answer before it calls `linearize`.
 */

/** A random right-handed frame (rows = axes) from a seeded generator. */
export function randomFrame(rnd: () => number): Mat3 {
  const q = rotationFromQuaternion(rnd() - 0.5, rnd() - 0.5, rnd() - 0.5, rnd() - 0.5);
  return [
    [q[0][0], q[0][1], q[0][2]],
    [q[1][0], q[1][1], q[1][2]],
    [q[2][0], q[2][1], q[2][2]],
  ];
}

/**
 * Local (frame) components to global ones, point by point: σ = Rᵀ σ' R.
 * @param local 6N components in the frame whose rows are `frame`
 * @param frame rows = local axes in the global frame
 */
export function toGlobal(local: Float64Array, frame: Mat3): Float64Array {
  const back = transposeMat3(frame);
  const out = new Float64Array(local.length);
  for (let o = 0; o < local.length; o += 6) {
    const g = rotateTensor(
      {
        xx: local[o],
        yy: local[o + 1],
        zz: local[o + 2],
        xy: local[o + 3],
        yz: local[o + 4],
        zx: local[o + 5],
      },
      back,
    );
    out.set([g.xx, g.yy, g.zz, g.xy, g.yz, g.zx], o);
  }
  return out;
}

/** 3N coordinates of points at distances `x` from `origin` along the unit `direction`. */
export function pointsAlong(origin: Vec3, direction: Vec3, x: ArrayLike<number>): Float64Array {
  const out = new Float64Array(3 * x.length);
  for (let i = 0; i < x.length; i++) {
    out[3 * i] = origin[0] + x[i] * direction[0];
    out[3 * i + 1] = origin[1] + x[i] * direction[1];
    out[3 * i + 2] = origin[2] + x[i] * direction[2];
  }
  return out;
}

/** N distances from 0 to t, evenly spaced, or jittered by up to ±40 % of an interval when `rnd` is given. */
export function distancesTo(t: number, n: number, rnd?: () => number): Float64Array {
  const x = new Float64Array(n);
  const h = t / (n - 1);
  for (let i = 0; i < n; i++) x[i] = i * h;
  if (rnd) for (let i = 1; i < n - 1; i++) x[i] += (rnd() - 0.5) * 0.8 * h;
  return x;
}

/** 6N components from a function of x giving six local components. */
export function fieldAt(x: ArrayLike<number>, f: (x: number) => readonly number[]): Float64Array {
  const out = new Float64Array(6 * x.length);
  for (let i = 0; i < x.length; i++) out.set(f(x[i]), 6 * i);
  return out;
}

/** Largest |a − b| over the first six entries, relative to `scale`. */
export function maxDiff6(a: ArrayLike<number>, b: ArrayLike<number>, scale = 1): number {
  let m = 0;
  for (let c = 0; c < 6; c++) m = Math.max(m, Math.abs(a[c] - b[c]) / scale);
  return m;
}

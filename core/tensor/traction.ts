import type { StressTensor, Vec3 } from "./types";
import { assertTensor, assertVec3 } from "./validate";

/**
 * Traction (stress vector) on the plane with unit normal n: t = σ n; its normal part σn = t·n and
 * the magnitude of its in-plane part τn = |t − σn n|.
 * @param s stress tensor (any one stress unit)
 * @param n plane normal (any non-zero length, dimensionless; normalised here)
 * @returns `traction` t (stress unit), `normal` σn (tension positive), `shear` τn ≥ 0
 * @throws RangeError for a zero or non-finite normal
 */
export function tractionOnPlane(s: StressTensor, n: Vec3): { traction: Vec3; normal: number; shear: number } {
  assertTensor(s);
  assertVec3(n, "n");
  const len = Math.hypot(n[0], n[1], n[2]);
  if (len === 0) throw new RangeError("n must be a non-zero vector");
  const x = n[0] / len;
  const y = n[1] / len;
  const z = n[2] / len;
  const t0 = s.xx * x + s.xy * y + s.zx * z;
  const t1 = s.xy * x + s.yy * y + s.yz * z;
  const t2 = s.zx * x + s.yz * y + s.zz * z;
  const normal = t0 * x + t1 * y + t2 * z;
  const shear = Math.hypot(t0 - normal * x, t1 - normal * y, t2 - normal * z);
  return { traction: [t0, t1, t2], normal, shear };
}

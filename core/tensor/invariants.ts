import { principalValues } from "./principal";
import { vonMisesOf } from "../eigen/sym3";
import { deg, radToDeg, type Degrees } from "../units/angles";
import type { StressTensor } from "./types";
import { assertTensor } from "./validate";

/** Stress invariants. */
export type Invariants = { i1: number; i2: number; i3: number; j2: number; j3: number };

/**
 * Invariants of the stress tensor and of its deviator s = σ − σm·I.
 * i1 = tr σ; i2 = σxxσyy + σyyσzz + σzzσxx − σxy² − σyz² − σzx² (sum of principal minors, so that
 * λ³ − i1λ² + i2λ − i3 = 0); i3 = det σ; j2 = ½ s:s; j3 = det s.
 * @param s stress tensor (any one stress unit)
 * @returns i1 (unit), i2 (unit²), i3 (unit³), j2 (unit²), j3 (unit³)
 */
export function invariants(s: StressTensor): Invariants {
  assertTensor(s);
  const { xx, yy, zz, xy, yz, zx } = s;
  const i1 = xx + yy + zz;
  const i2 = xx * yy + yy * zz + zz * xx - xy * xy - yz * yz - zx * zx;
  const i3 = xx * (yy * zz - yz * yz) - xy * (xy * zz - yz * zx) + zx * (xy * yz - yy * zx);
  const m = i1 / 3;
  const a = xx - m;
  const b = yy - m;
  const c = zz - m;
  const j2 = 0.5 * (a * a + b * b + c * c) + xy * xy + yz * yz + zx * zx;
  const j3 = a * (b * c - yz * yz) - xy * (xy * c - yz * zx) + zx * (xy * yz - b * zx);
  return { i1, i2, i3, j2, j3 };
}

/**
 * Von Mises equivalent stress σvm = √(3 j2).
 * @param s stress tensor (any one stress unit)
 * @returns σvm, same unit as `s` (0 for a hydrostatic state)
 */
export function vonMises(s: StressTensor): number {
  assertTensor(s);
  return vonMisesOf(s.xx, s.yy, s.zz, s.xy, s.yz, s.zx);
}

/**
 * Tresca equivalent stress σ1 − σ3 (twice the maximum shear stress).
 * @param s stress tensor (any one stress unit)
 * @returns σ1 − σ3, same unit as `s`
 */
export function tresca(s: StressTensor): number {
  const v = principalValues(s);
  return v[0] - v[2];
}

/**
 * Maximum shear stress (σ1 − σ3)/2, over all planes through the point.
 * @param s stress tensor (any one stress unit)
 * @returns τmax, same unit as `s`
 */
export function maxShear(s: StressTensor): number {
  const v = principalValues(s);
  return (v[0] - v[2]) / 2;
}

/**
 * Octahedral normal and shear stress: σoct = i1/3 (the mean stress), τoct = (√2/3)·σvm.
 * @param s stress tensor (any one stress unit)
 * @returns `normal` σoct and `shear` τoct, same unit as `s`
 */
export function octahedral(s: StressTensor): { normal: number; shear: number } {
  assertTensor(s);
  return {
    normal: (s.xx + s.yy + s.zz) / 3,
    shear: (Math.SQRT2 / 3) * vonMisesOf(s.xx, s.yy, s.zz, s.xy, s.yz, s.zx),
  };
}

/**
 * Lode angle θ in [0°, 60°], defined by cos 3θ = (3√3/2)·j3 / j2^(3/2), computed stably from the
 * principal stresses as θ = atan2(√3(σ2 − σ3), 2σ1 − σ2 − σ3). θ = 0° for uniaxial tension (and any
 * state with σ2 = σ3), 30° for pure shear, 60° for uniaxial compression (σ1 = σ2).
 * @param s stress tensor (any one stress unit)
 * @returns θ in degrees; NaN when the deviator is zero (hydrostatic state: the angle is undefined)
 */
export function lodeAngle(s: StressTensor): Degrees {
  const [s1, s2, s3] = principalValues(s);
  const k = Math.max(Math.abs(s1), Math.abs(s3));
  if (s1 - s3 === 0 || k === 0) return deg(NaN);
  const a = s1 / k;
  const b = s2 / k;
  const c = s3 / k;
  return radToDeg(Math.atan2(Math.sqrt(3) * (b - c), 2 * a - b - c));
}

/**
 * Stress triaxiality η = σm / σvm (mean stress over von Mises stress).
 * @param s stress tensor (any one stress unit)
 * @returns η, dimensionless; ±Infinity for a non-zero hydrostatic state, NaN for the zero state
 */
export function triaxiality(s: StressTensor): number {
  assertTensor(s);
  const mean = (s.xx + s.yy + s.zz) / 3;
  return mean / vonMisesOf(s.xx, s.yy, s.zz, s.xy, s.yz, s.zx);
}

import { principalStresses } from "../eigen/principal";
import type { Mat3, StressTensor, Vec3 } from "./types";

/**
 * The two frames an engineer snaps the element to. Both are right-handed rotations in core's
 * convention (rows = new axes in the old frame), ready for `rotateTensor`.
 */

/**
 * The principal frame: x′, y′, z′ along d1, d2, d3, so σ' = diag(σ1, σ2, σ3).
 * @param s stress tensor (any one stress unit)
 * @returns R with rows d1, d2, d3 (right-handed, as `principalStresses` returns them)
 */
export function principalFrame(s: StressTensor): Mat3 {
  const { directions } = principalStresses(s);
  return [directions[0], directions[1], directions[2]];
}

/**
 * The maximum-shear frame: the principal frame turned 45° about d2, with
 * x′ = (d1 + d3)/√2, y′ = (d1 − d3)/√2, z′ = d2. On it σ'xx = σ'yy = (σ1 + σ3)/2, σ'zz = σ2 and
 * σ'xy = (σ1 − σ3)/2 = τmax ≥ 0, the other shears zero (the planes of maximum shear are the x′ and y′ faces).
 * @param s stress tensor (any one stress unit)
 * @returns R, right-handed (z′ = x′ × y′)
 */
export function maxShearFrame(s: StressTensor): Mat3 {
  const { directions } = principalStresses(s);
  const [d1, d2, d3] = directions;
  const k = Math.SQRT1_2;
  const x: Vec3 = [k * (d1[0] + d3[0]), k * (d1[1] + d3[1]), k * (d1[2] + d3[2])];
  const y: Vec3 = [k * (d1[0] - d3[0]), k * (d1[1] - d3[1]), k * (d1[2] - d3[2])];
  return [x, y, d2];
}

import { principalValues } from "../tensor/principal";
import type { StressTensor } from "../tensor/types";

/** One Mohr circle: centre on the σ axis and radius (both in the stress unit). */
export type MohrCircle = { center: number; radius: number };

/**
 * The three Mohr circles of a 3D stress state, in the order (σ1, σ3), (σ1, σ2), (σ2, σ3): the first
 * is the outer circle, its radius the maximum shear stress.
 * @param s stress tensor (any one stress unit)
 * @returns circles with centre (σa + σb)/2 and radius (σa − σb)/2 ≥ 0, same unit as `s`
 */
export function mohrCircles(s: StressTensor): { circles: [MohrCircle, MohrCircle, MohrCircle] } {
  const [s1, s2, s3] = principalValues(s);
  const circle = (a: number, b: number): MohrCircle => ({ center: a / 2 + b / 2, radius: a / 2 - b / 2 });
  return { circles: [circle(s1, s3), circle(s1, s2), circle(s2, s3)] };
}

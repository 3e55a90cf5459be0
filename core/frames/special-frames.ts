import { principalStresses } from "../tensor/principal";
import { planePrincipal } from "../plane/plane-principal";
import { cosSinDeg } from "../units/angles";
import type { Mat3, StressTensor, Vec3 } from "../tensor/types";

/**
 * The two frames an engineer snaps the element to. Both are right-handed rotations in core's
 * convention (rows = new axes in the old frame), ready for `rotateTensor`.
 *
 * When z is already a principal direction (τyz = τzx = 0, plane stress included) both frames are
 * turns about z alone, as an engineer turns a plane-stress element: z′ stays z, and the in-plane
 * Mohr circle's x′ point lands where the handbook puts it (on σ at θp, on +τmax at θs).
 */

/** Rows of a turn by θ about z, counter-clockwise from x towards y. */
function aboutZ(thetaDeg: number): Mat3 {
  const [c, s] = cosSinDeg(thetaDeg);
  return [
    [c, s, 0],
    [-s, c, 0],
    [0, 0, 1],
  ];
}

/**
 * The principal frame.
 * - z already principal: the element turned about z by θp (tan 2θp = 2τxy/(σx − σy), θp in
 *   (−90°, 90°]), so x′ carries the larger in-plane principal stress, y′ the smaller and z′ = z
 *   keeps σz. σ′ is diagonal, but in the order (in-plane larger, in-plane smaller, σz), which is
 *   σ1, σ2, σ3 only when σz is the smallest.
 * - otherwise: x′, y′, z′ along d1, d2, d3, so σ′ = diag(σ1, σ2, σ3).
 * @param s stress tensor (any one stress unit)
 * @returns R (rows = new axes in the old frame), right-handed
 */
export function principalFrame(s: StressTensor): Mat3 {
  const plane = planePrincipal(s);
  if (plane) return aboutZ(plane.thetaP);
  const { directions } = principalStresses(s);
  return [directions[0], directions[1], directions[2]];
}

/**
 * The maximum-shear frame: x′ and y′ are the two planes that carry τmax = (σ1 − σ3)/2, with
 * σ′xx = σ′yy = (σ1 + σ3)/2, σ′zz = σ2, σ′xy = +τmax and the other shears zero.
 * - z already principal and σz between the in-plane pair (the in-plane circle is the outer one,
 *   as in plane stress with in-plane principal stresses of opposite sign or one of them zero):
 *   the element turned about z by θs = θp − 45°.
 * - otherwise: the principal frame turned 45° about d2, x′ = (d1 + d3)/√2, y′ = (d1 − d3)/√2,
 *   z′ = d2.
 * @param s stress tensor (any one stress unit)
 * @returns R, right-handed (z′ = x′ × y′)
 */
export function maxShearFrame(s: StressTensor): Mat3 {
  const plane = planePrincipal(s);
  if (plane && plane.values[plane.inPlaneMinor] <= s.zz && s.zz <= plane.values[plane.inPlaneMajor]) {
    return aboutZ(plane.thetaS);
  }
  const { directions } = principalStresses(s);
  const [d1, d2, d3] = directions;
  const k = Math.SQRT1_2;
  const x: Vec3 = [k * (d1[0] + d3[0]), k * (d1[1] + d3[1]), k * (d1[2] + d3[2])];
  const y: Vec3 = [k * (d1[0] - d3[0]), k * (d1[1] - d3[1]), k * (d1[2] - d3[2])];
  return [x, y, d2];
}

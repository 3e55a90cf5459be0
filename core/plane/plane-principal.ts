import type { StressTensor, Vec3 } from "../tensor/types";
import { cosSinDeg, type Degrees } from "../units/angles";
import { planeStress } from "./plane-stress";

/** Index of a principal stress in σ1 ≥ σ2 ≥ σ3 order: 0 for σ1, 1 for σ2, 2 for σ3. */
export type PrincipalIndex = 0 | 1 | 2;

/**
 * The principal stresses of a state whose z axis is already a principal direction (τyz = τzx = 0,
 * plane stress being the case σz = 0), read the way an engineer reads plane stress: the in-plane
 * pair from the handbook formulas at θp, the third along z. Named by one rule, the 3D one:
 * σ1 ≥ σ2 ≥ σ3 over all three values, σz included, so the in-plane pair is called by where it
 * falls in that order (σx = 150, σy = 0, τxy = 25 gives the in-plane pair σ1 = 154.06 and
 * σ3 = −4.06, with σ2 = 0 out of plane).
 */
export type PlanePrincipal = {
  /** σ1 ≥ σ2 ≥ σ3 of the full 3D state (same unit as the input) */
  values: [number, number, number];
  /** unit directions of σ1, σ2, σ3: the in-plane two at θp and θp + 90° in x–y, the third ±z */
  directions: [Vec3, Vec3, Vec3];
  /** which of σ1, σ2, σ3 is the larger in-plane stress (the one at θp) */
  inPlaneMajor: PrincipalIndex;
  /** which is the smaller in-plane stress (at θp + 90°) */
  inPlaneMinor: PrincipalIndex;
  /** which is the stress along z, out of plane (σz, 0 in plane stress) */
  outOfPlane: PrincipalIndex;
  /** angle from x to the larger in-plane principal direction, counter-clockwise positive, in (−90°, 90°] */
  thetaP: Degrees;
  /** angle from x to the normal of the plane carrying +τmax in plane (θp − 45°), in (−135°, 45°] */
  thetaS: Degrees;
  /** maximum in-plane shear stress, the in-plane circle's radius */
  tauMaxInPlane: number;
};

/** True when z is a principal direction as stored: both out-of-plane shears exactly zero. */
export function zIsPrincipal(s: StressTensor): boolean {
  return s.yz === 0 && s.zx === 0;
}

/**
 * Principal stresses of a state with z already principal, named by the 3D rule σ1 ≥ σ2 ≥ σ3.
 * Ties are broken in favour of the in-plane stresses (they take the lower number), so uniaxial
 * tension σx = 100 reads σ1 = 100 (x), σ2 = 0 (y), σ3 = 0 (z).
 * @param s stress tensor (any one stress unit); τyz and τzx must be exactly zero
 * @returns the named values and directions, or null when z is not a principal direction
 */
export function planePrincipal(s: StressTensor): PlanePrincipal | null {
  if (!zIsPrincipal(s)) return null;
  const p = planeStress(s.xx, s.yy, s.xy);
  const [c, sn] = cosSinDeg(p.thetaP);
  const major: Vec3 = [c, sn, 0];
  const minor: Vec3 = [-sn, c, 0];
  const z = s.zz;
  // Where σz falls among the in-plane pair (ties: in-plane first).
  const outOfPlane: PrincipalIndex = z > p.s1 ? 0 : z > p.s2 ? 1 : 2;
  const inPlaneMajor: PrincipalIndex = outOfPlane === 0 ? 1 : 0;
  const inPlaneMinor: PrincipalIndex = outOfPlane === 2 ? 1 : 2;
  const values: [number, number, number] = [0, 0, 0];
  const raw: [Vec3, Vec3, Vec3] = [major, major, major];
  values[inPlaneMajor] = p.s1;
  values[inPlaneMinor] = p.s2;
  values[outOfPlane] = z;
  raw[inPlaneMajor] = major;
  raw[inPlaneMinor] = minor;
  // The out-of-plane direction is ±z, signed so that d1, d2, d3 form a right-handed set: major ×
  // minor = +z, so z comes first or last as +z and between them (major, z, minor) as −z.
  raw[outOfPlane] = [0, 0, outOfPlane === 1 ? -1 : 1];
  return {
    values,
    directions: raw,
    inPlaneMajor,
    inPlaneMinor,
    outOfPlane,
    thetaP: p.thetaP,
    thetaS: p.thetaS,
    tauMaxInPlane: p.tauMaxInPlane,
  };
}

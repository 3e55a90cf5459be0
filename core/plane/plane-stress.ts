import { assertFinite } from "../tensor/validate";
import { cosSinDeg, deg, radToDeg, type Degrees } from "../units/angles";

/** Principal values and Mohr-circle geometry of a plane-stress state. */
export type PlaneStressResult = {
  /** larger in-plane principal stress */
  s1: number;
  /** smaller in-plane principal stress */
  s2: number;
  /** angle from the x axis to the σ1 direction, counter-clockwise positive, in (−90°, 90°] */
  thetaP: Degrees;
  /** angle from the x axis to the normal of the plane carrying +τmax (θp − 45°), in (−135°, 45°] */
  thetaS: Degrees;
  /** maximum in-plane shear stress (= radius) */
  tauMaxInPlane: number;
  /** Mohr-circle centre (σx + σy)/2 */
  center: number;
  /** Mohr-circle radius √(((σx − σy)/2)² + τxy²) */
  radius: number;
};

/**
 * In-plane principal stresses, principal angle and Mohr's circle of a plane-stress state. Only the
 * in-plane values: the zero out-of-plane stress is not counted here (use the 3D functions for that).
 * τxy positive when it acts in +y on the +x face. An in-plane hydrostatic state gives θp = 0.
 * @param sx normal stress σx (any one stress unit, tension positive)
 * @param sy normal stress σy (same unit)
 * @param txy shear stress τxy (same unit)
 * @returns s1 ≥ s2, thetaP (degrees), thetaS (degrees), tauMaxInPlane, center, radius (stress unit)
 */
export function planeStress(sx: number, sy: number, txy: number): PlaneStressResult {
  assertFinite(sx, "sx");
  assertFinite(sy, "sy");
  assertFinite(txy, "txy");
  const center = sx / 2 + sy / 2;
  const half = sx / 2 - sy / 2;
  const radius = Math.hypot(half, txy);
  let theta = radToDeg(Math.atan2(txy, half)) / 2;
  if (theta <= -90) theta += 180;
  const thetaS = theta - 45;
  return {
    s1: center + radius,
    s2: center - radius,
    thetaP: deg(theta === 0 ? 0 : theta),
    thetaS: deg(thetaS),
    tauMaxInPlane: radius,
    center,
    radius,
  };
}

/**
 * Plane-stress components on axes rotated by θ counter-clockwise from x:
 * σx' = c + h cos 2θ + τxy sin 2θ, σy' = c − h cos 2θ − τxy sin 2θ, τx'y' = −h sin 2θ + τxy cos 2θ,
 * with c = (σx + σy)/2 and h = (σx − σy)/2.
 * @param sx normal stress σx (any one stress unit)
 * @param sy normal stress σy (same unit)
 * @param txy shear stress τxy (same unit)
 * @param thetaDeg rotation of the axes, degrees, counter-clockwise positive
 * @returns the rotated components, same unit
 */
export function transformPlaneStress(
  sx: number,
  sy: number,
  txy: number,
  thetaDeg: number,
): { sx: number; sy: number; txy: number } {
  assertFinite(sx, "sx");
  assertFinite(sy, "sy");
  assertFinite(txy, "txy");
  assertFinite(thetaDeg, "thetaDeg");
  const [c2, s2] = cosSinDeg(2 * thetaDeg);
  const center = sx / 2 + sy / 2;
  const half = sx / 2 - sy / 2;
  const a = half * c2 + txy * s2;
  return { sx: center + a, sy: center - a, txy: -half * s2 + txy * c2 };
}

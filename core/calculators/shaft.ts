/**
 * Solid circular shaft: the stress at a surface point under bending, torsion and axial force.
 *
 * Handbook formulas (any machine-design text, e.g. Shigley's Mechanical Engineering Design, combined
 * loading of shafts): bending σb = 32M/(πd³), axial σa = 4P/(πd²), torsion τ = 16T/(πd³); at the
 * surface point σx = σb + σa, τxy = τ, all other components zero (transverse shear is zero at the
 * point of maximum bending and is not included).
 *
 * Frame at the surface point: x along the shaft axis, y tangential to the surface in the direction a
 * point of the surface moves under a positive rotation about +x (right-hand rule), z completing the
 * right-handed frame (along the radius, pointing inward). Signs:
 * - P > 0 is tension, P < 0 compression (thrust pushing on the shaft);
 * - M is the bending moment that stretches the examined fibre: M > 0 puts the point in tension. The
 *   fibre on the other side of the shaft is found by passing −M; with a compressive P that fibre has
 *   the larger |σx|;
 * - T > 0 is a torque whose vector points along +x on the cut face with outward normal +x, and gives
 *   τxy > 0 in this frame. The sign of τ does not change any principal stress or safety factor.
 * Units: any consistent set — N and m give Pa; N, mm and N·mm give MPa.
 */
import type { StressTensor } from "../tensor/types";
import { assertFinite } from "../tensor/validate";

/** Loads on the shaft section through the examined point. */
export type ShaftLoads = {
  /** bending moment M stretching the examined fibre (force × length; negative for the other side) */
  bendingMoment: number;
  /** torque T about the shaft axis (force × length) */
  torque: number;
  /** axial force P, tension positive (force) */
  axialForce: number;
};

/** Stresses at the surface point of a solid shaft, in force per length² of the inputs. */
export type ShaftSurfaceStress = {
  /** bending stress σb = 32M/(πd³) */
  bending: number;
  /** axial stress σa = 4P/(πd²) */
  axial: number;
  /** normal stress along the shaft σx = σb + σa */
  sigma: number;
  /** torsional shear stress τ = 16T/(πd³) */
  tau: number;
  /** the tensor in x = along the shaft, y = tangential, z = radial (inward): σx and τxy only */
  tensor: StressTensor;
};

/**
 * Stress at the surface of a solid circular shaft under bending moment, torque and axial force (see
 * the file comment for formulas, frame and signs).
 * @param diameter shaft diameter d (any length unit, > 0)
 * @param loads bending moment M and torque T (force × the same length unit) and axial force P (force,
 *   tension positive)
 * @returns σb, σa, σx = σb + σa, τ and the tensor (force / length², e.g. Pa for N and m)
 * @throws TypeError/RangeError naming the argument when a value is missing or not finite, or d ≤ 0
 */
export function solidShaftStress(diameter: number, loads: ShaftLoads): ShaftSurfaceStress {
  assertFinite(diameter, "diameter");
  if (diameter <= 0) throw new RangeError(`diameter must be positive, got ${diameter}`);
  if (typeof loads !== "object" || loads === null) {
    throw new TypeError("loads must be an object with bendingMoment, torque and axialForce");
  }
  assertFinite(loads.bendingMoment, "loads.bendingMoment");
  assertFinite(loads.torque, "loads.torque");
  assertFinite(loads.axialForce, "loads.axialForce");
  const d3 = Math.PI * diameter ** 3;
  const bending = (32 * loads.bendingMoment) / d3;
  const axial = (4 * loads.axialForce) / (Math.PI * diameter ** 2);
  const tau = (16 * loads.torque) / d3;
  const sigma = bending + axial;
  return { bending, axial, sigma, tau, tensor: { xx: sigma, yy: 0, zz: 0, xy: tau, yz: 0, zx: 0 } };
}

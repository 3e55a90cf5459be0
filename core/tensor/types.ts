/**
 * Stress tensor types. Conventions for all of core:
 * - tension positive;
 * - shear components are tensor components (σxy = σyx), not engineering strains;
 * - all six components in one consistent stress unit; core computes in whatever unit it is given.
 */

/** A symmetric Cauchy stress tensor by its six independent components (one stress unit). */
export type StressTensor = { xx: number; yy: number; zz: number; xy: number; yz: number; zx: number };

/** A 3-vector (tuple). */
export type Vec3 = readonly [number, number, number];

/** A 3×3 matrix as three rows. */
export type Mat3 = readonly [Vec3, Vec3, Vec3];

export { COMPONENTS, type Component } from "../constants/components";

import type { StressTensor, Vec3 } from "./types";
import { assertTensor } from "./validate";
import { eigSym3 } from "../eigen/sym3";

/** Principal stresses σ1 ≥ σ2 ≥ σ3 and their unit directions. */
export type Principal = { values: [number, number, number]; directions: [Vec3, Vec3, Vec3] };

const IN = new Float64Array(6);
const VALUES = new Float64Array(3);
const VECS = new Float64Array(9);

/** Copies a tensor into the kernel's input scratch. */
function load(s: StressTensor): void {
  IN[0] = s.xx;
  IN[1] = s.yy;
  IN[2] = s.zz;
  IN[3] = s.xy;
  IN[4] = s.yz;
  IN[5] = s.zx;
}

/**
 * Principal stresses and directions of a stress tensor.
 * Repeated principal stresses are an expected situation: any orthonormal basis of the eigenspace is
 * returned (a hydrostatic state gives the x, y, z axes).
 * @param s stress tensor (any one stress unit; tension positive; tensor shear components)
 * @returns `values` σ1 ≥ σ2 ≥ σ3 (same unit as `s`) and `directions` d1, d2, d3 (unit vectors,
 *   dimensionless, right-handed: d3 = d1 × d2; d1 and d2 signed so their largest component is positive)
 * @throws TypeError/RangeError if a component is missing or not finite
 */
export function principalStresses(s: StressTensor): Principal {
  assertTensor(s);
  load(s);
  eigSym3(IN, 0, VALUES, 0, VECS, 0);
  return {
    values: [VALUES[0], VALUES[1], VALUES[2]],
    directions: [
      [VECS[0], VECS[1], VECS[2]],
      [VECS[3], VECS[4], VECS[5]],
      [VECS[6], VECS[7], VECS[8]],
    ],
  };
}

/**
 * Principal stresses only, σ1 ≥ σ2 ≥ σ3 (no directions; same accuracy).
 * @param s stress tensor (any one stress unit)
 * @returns `[σ1, σ2, σ3]`, same unit as `s`
 * @throws TypeError/RangeError if a component is missing or not finite
 */
export function principalValues(s: StressTensor): [number, number, number] {
  assertTensor(s);
  load(s);
  eigSym3(IN, 0, VALUES, 0, null, 0);
  return [VALUES[0], VALUES[1], VALUES[2]];
}

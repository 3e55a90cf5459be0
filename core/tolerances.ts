/**
 * Named tolerances used by core. Relative tolerances are fractions of a stated reference
 * magnitude; none of them is an absolute stress value, since core computes in whatever unit it is given.
 */

/**
 * Above this |r| (r = cos 3φ of the trigonometric eigenvalue solution) the two eigenvalues near a
 * repeated root are recomputed from a deflated 2×2 problem instead of the closed form, which loses
 * about half its digits as |r| → 1.
 */
export const TRIG_REFINE_THRESHOLD = 0.99;

/**
 * A deviator whose largest entry is below this fraction of the largest tensor entry is treated as
 * exactly hydrostatic (three equal principal stresses, identity directions). 2⁻⁹⁶⁰ ≈ 1.1e-289: far
 * below rounding, chosen only so that rescaling the deviator cannot overflow.
 */
export const HYDROSTATIC_DEVIATOR_REL = 2 ** -960;

/** Default relative symmetry tolerance of an entered 3×3 matrix (declared with the API's bound). */
export { SYMMETRY_REL_TOL } from "./constants/input-bounds";

/**
 * Largest entry of |R Rᵀ − I| accepted for a matrix passed as a rotation (rows must be orthonormal).
 */
export const ROTATION_ORTHONORMAL_TOL = 1e-9;

/** The accuracy core promises, as fractions of the tensor's Frobenius norm ‖σ‖F (checked by tests). */
export const ACCURACY = {
  /** |λ − λexact| ≤ eigenvalue·‖σ‖F */
  eigenvalue: 1e-13,
  /** ‖σd − λd‖ ≤ residual·‖σ‖F */
  residual: 1e-12,
  /** max |DᵀD − I| ≤ orthonormality */
  orthonormality: 1e-13,
} as const;

import type { Verdict } from "../constants/verdicts";

/**
 * Verdict of one check. A utilisation u = n_required / n compares the safety factor n found
 * with the one required: u ≤ 1 passes. "close" flags a passing check whose factor is less than
 * `CLOSE_BAND` (10 %) above the required one, so an engineer looks twice before relying on it.
 */
export type { Verdict };

/** A passing check is "close" when n_required ≤ n < (1 + CLOSE_BAND)·n_required. */
export const CLOSE_BAND = 0.1;

/**
 * The utilisation at which a passing check turns "close": u = 1/(1 + CLOSE_BAND) ≈ 0.909, the
 * same edge as n = (1 + CLOSE_BAND)·n_required (for drawing the band on utilisation charts).
 */
export const CLOSE_UTILISATION = 1 / (1 + CLOSE_BAND);

/**
 * Relative allowance at the close-band edge for the rounding of binary arithmetic: 1.5 × 1.1 is
 * 1.6500000000000001 in doubles and 1.5/1.65 is 0.9090909090909092, one step beyond
 * 1/1.1, so an n typed as exactly 10 % above the required one would read "close" without it.
 * 1e-9 is far below any difference a safety factor carries and far above the rounding (≈1e-16).
 */
export const EDGE_REL_TOL = 1e-9;

/**
 * Utilisation of a check: how much of the allowed margin the state uses.
 * @param factor safety factor n found (dimensionless, > 0; Infinity for a state that never fails)
 * @param requiredFactor safety factor the design must reach (dimensionless, ≥ 1 usually, > 0)
 * @returns u = requiredFactor / factor (dimensionless; 0 for an infinite factor)
 * @throws RangeError when either factor is not a positive number
 */
export function utilisation(factor: number, requiredFactor: number): number {
  if (!(factor > 0)) throw new RangeError(`factor must be a positive number, got ${factor}`);
  if (!(requiredFactor > 0 && Number.isFinite(requiredFactor))) {
    throw new RangeError(`requiredFactor must be a positive finite number, got ${requiredFactor}`);
  }
  return requiredFactor / factor;
}

/**
 * The verdict for a utilisation, the one rule every screen and chart uses: "fail" when u > 1
 * (n < n_required; for positive doubles r/n > 1 exactly when n < r, so no allowance is needed
 * there), "close" when u is beyond the close edge {@link CLOSE_UTILISATION} by more than
 * {@link EDGE_REL_TOL}, "pass" otherwise.
 * @param u utilisation n_required / n (dimensionless, ≥ 0)
 * @throws RangeError for a negative or NaN utilisation
 */
export function verdictForUtilisation(u: number): Verdict {
  if (!(u >= 0)) throw new RangeError(`utilisation must be a number ≥ 0, got ${u}`);
  if (u > 1) return "fail";
  if (u > CLOSE_UTILISATION * (1 + EDGE_REL_TOL)) return "close";
  return "pass";
}

/**
 * The verdict for a safety factor against the one required: "fail" when n < n_required,
 * "close" when n is less than CLOSE_BAND (10 %) above it, "pass" otherwise (exactly 10 % above
 * passes). Decided on the utilisation by {@link verdictForUtilisation}, so a chart that draws
 * utilisations with the edge at CLOSE_UTILISATION agrees with it for every factor.
 * @param factor safety factor found (dimensionless, > 0; Infinity for a state that never fails)
 * @param requiredFactor safety factor required (dimensionless, > 0)
 */
export function verdictForFactor(factor: number, requiredFactor: number): Verdict {
  return verdictForUtilisation(utilisation(factor, requiredFactor));
}

/**
 * Verdict of one check. A utilisation u = n_required / n compares the safety factor n found
 * with the one required: u ≤ 1 passes. "close" flags a passing check whose factor is less than
 * `CLOSE_BAND` (10 %) above the required one, so an engineer looks twice before relying on it.
 */
export type Verdict = "pass" | "close" | "fail";

/** A passing check is "close" when n_required ≤ n < (1 + CLOSE_BAND)·n_required. */
export const CLOSE_BAND = 0.1;

/** The utilisation above which a passing check is "close": u > 1/(1 + CLOSE_BAND) ≈ 0.909. */
const CLOSE_UTILISATION = 1 / (1 + CLOSE_BAND);

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
 * The verdict for a utilisation.
 * @param u utilisation n_required / n (dimensionless, ≥ 0)
 * @returns "fail" above 1 (n < n_required), "close" in (1/(1 + CLOSE_BAND), 1] (n less than 10 %
 *   above n_required), "pass" otherwise
 */
export function verdictFor(u: number): Verdict {
  if (Number.isNaN(u)) throw new RangeError("utilisation must be a number, got NaN");
  if (u > 1) return "fail";
  if (u > CLOSE_UTILISATION) return "close";
  return "pass";
}

/**
 * The verdict for a safety factor against the one required (same rule as {@link verdictFor}).
 * @param factor safety factor found (dimensionless, > 0; Infinity for a state that never fails)
 * @param requiredFactor safety factor required (dimensionless, > 0)
 */
export function verdictForFactor(factor: number, requiredFactor: number): Verdict {
  utilisation(factor, requiredFactor); // the same argument checks
  // Compared on the factors themselves, as the UI states the rule ("less than 10 % above").
  if (factor < requiredFactor) return "fail";
  if (factor < requiredFactor * (1 + CLOSE_BAND)) return "close";
  return "pass";
}

/**
 * Verdict of one check. A utilisation u = n_required / n compares the safety factor n found
 * with the one required: u ≤ 1 passes. "close" flags a passing check whose factor is less than
 * `CLOSE_BAND` (10 %) above the required one, so an engineer looks twice before relying on it.
 */
export type Verdict = "pass" | "close" | "fail";

/** A passing check is "close" when n_required ≤ n < (1 + CLOSE_BAND)·n_required. */
export const CLOSE_BAND = 0.1;

/**
 * The utilisation at which a passing check turns "close": u = 1/(1 + CLOSE_BAND) ≈ 0.909, the
 * same edge as n = (1 + CLOSE_BAND)·n_required (for drawing the band on utilisation charts).
 */
export const CLOSE_UTILISATION = 1 / (1 + CLOSE_BAND);

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
 * The verdict for a safety factor against the one required: "fail" when n < n_required,
 * "close" when n is less than CLOSE_BAND (10 %) above it, "pass" otherwise.
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

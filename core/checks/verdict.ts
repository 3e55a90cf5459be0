/**
 * Verdict of one check. A utilisation u = n_required / n compares the safety factor n found
 * with the one required: u ≤ 1 passes. "close" flags a passing check within `CLOSE_BAND` of the
 * limit, so an engineer looks twice before relying on it.
 */
export type Verdict = "pass" | "close" | "fail";

/** A passing check with utilisation above 1 − CLOSE_BAND (i.e. within 10 % of the limit) is "close". */
export const CLOSE_BAND = 0.1;

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
 * @param u utilisation (dimensionless, ≥ 0)
 * @returns "fail" above 1, "close" in (1 − CLOSE_BAND, 1], "pass" otherwise
 */
export function verdictFor(u: number): Verdict {
  if (Number.isNaN(u)) throw new RangeError("utilisation must be a number, got NaN");
  if (u > 1) return "fail";
  if (u > 1 - CLOSE_BAND) return "close";
  return "pass";
}

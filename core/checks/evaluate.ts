import { safetyFactor, type Criterion, type Material } from "../criteria/safety-factor";
import { principalValues } from "../eigen/principal";
import { vonMises } from "../tensor/invariants";
import type { StressTensor } from "../tensor/types";
import { missingStrengths } from "./requirements";
import { utilisation, verdictForFactor, type Verdict } from "./verdict";

/** A criterion to check and the safety factor the design must reach with it. */
export type CheckRequirement = { criterion: Criterion; requiredFactor: number };

/** The outcome of one criterion on one stress state. */
export type CriterionCheck =
  | {
      criterion: Criterion;
      requiredFactor: number;
      /** Safety factor found (dimensionless; Infinity when the state never reaches the surface). */
      factor: number;
      /** requiredFactor / factor (dimensionless; ≤ 1 passes). */
      utilisation: number;
      verdict: Verdict;
    }
  | {
      criterion: Criterion;
      requiredFactor: number;
      /** The criterion could not be evaluated: the material lacks these strengths. */
      missing: (keyof Material)[];
    };

/** Everything a comparison row shows for one stress state. */
export type StateEvaluation = {
  /** σ1 ≥ σ2 ≥ σ3, in the unit of the tensor. */
  principal: [number, number, number];
  /** Von Mises equivalent stress, same unit. */
  vonMises: number;
  /** Tresca equivalent stress σ1 − σ3, same unit. */
  tresca: number;
  /** Maximum shear (σ1 − σ3)/2, same unit. */
  maxShear: number;
  checks: CriterionCheck[];
};

/**
 * Evaluates one stress state against a material and a list of required checks.
 * A criterion whose strengths the material lacks is reported as not evaluated (an expected
 * situation, e.g. a ductile steel with no compressive strength under Mohr–Coulomb), not thrown.
 * @param s stress tensor, same unit as the strengths
 * @param material strengths, positive, same unit as `s`
 * @param requirements criteria with their required safety factors (dimensionless)
 */
export function evaluateState(
  s: StressTensor,
  material: Material,
  requirements: readonly CheckRequirement[],
): StateEvaluation {
  const principal = principalValues(s);
  const checks = requirements.map((req): CriterionCheck => {
    const missing = missingStrengths(req.criterion, material);
    if (missing.length > 0) return { criterion: req.criterion, requiredFactor: req.requiredFactor, missing };
    const factor = safetyFactor(s, req.criterion, material);
    const u = utilisation(factor, req.requiredFactor);
    return {
      criterion: req.criterion,
      requiredFactor: req.requiredFactor,
      factor,
      utilisation: u,
      verdict: verdictForFactor(factor, req.requiredFactor),
    };
  });
  return {
    principal,
    vonMises: vonMises(s),
    tresca: principal[0] - principal[2],
    maxShear: (principal[0] - principal[2]) / 2,
    checks,
  };
}

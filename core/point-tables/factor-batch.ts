import { factorFromStrengths, strengthsFor, type Criterion, type Material } from "../criteria/safety-factor";

/**
 * The safety factor of one criterion for the points `from` to `to` − 1 of a table, into `out`:
 * the strengths are checked once by `strengthsFor` (the same checks and errors), then each
 * point goes through `factorFromStrengths`, the one place the criteria's formulas are written,
 * so every factor is the same double as `factorFromPrincipals` gives (the tests compare them
 * bit for bit on seeded random states). Why a batch: per point, `factorFromPrincipals` checks
 * the strengths again each time, which was more than half of evaluating a million points with
 * five criteria (scripts/bench/point-tables.ts).
 * @param principal 3 per point: σ1 σ2 σ3 (stress unit of the strengths); a NaN row gives NaN
 * @param vonMises 1 per point (used by "von-mises" only)
 * @throws RangeError as `strengthsFor`
 */
export function factorBatch(
  criterion: Criterion,
  material: Material,
  principal: Float64Array,
  vonMises: Float64Array,
  from: number,
  to: number,
  out: Float64Array,
): void {
  const strengths = strengthsFor(criterion, material);
  for (let k = from; k < to; k++) {
    out[k] = factorFromStrengths(criterion, strengths, principal[3 * k], principal[3 * k + 2], vonMises[k]);
  }
}

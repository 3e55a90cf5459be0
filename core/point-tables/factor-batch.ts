import { factorFromPrincipals, strengthsFor, type Criterion, type Material } from "../criteria/safety-factor";

/**
 * The batch form of `factorFromPrincipals` (core/criteria/safety-factor.ts): the safety factor of
 * one criterion for the points `from` to `to` − 1 of a table, into `out`. The strengths are
 * checked once by `strengthsFor` (the same checks and errors); per point it does the same
 * operations in the same order as `factorFromPrincipals`, so every factor is the same double
 * (the tests compare them bit for bit on seeded random states). Why it exists: called per point,
 * `factorFromPrincipals` checks the strengths again and builds an object each time, which was
 * more than half of evaluating a million points with five criteria (scripts/bench/point-tables.ts).
 * It belongs beside `factorFromPrincipals`; it is here only because that folder was not this
 * change's to edit. A criterion it does not know goes through `factorFromPrincipals` point by point.
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
  const { yield: sy, ultimateTension: st, ultimateCompression: sc } = strengthsFor(criterion, material);
  switch (criterion) {
    case "von-mises":
      for (let k = from; k < to; k++) out[k] = sy / vonMises[k];
      return;
    case "tresca":
      for (let k = from; k < to; k++) out[k] = sy / (principal[3 * k] - principal[3 * k + 2]);
      return;
    case "max-principal":
      for (let k = from; k < to; k++) {
        out[k] = 1 / Math.max(Math.max(principal[3 * k], 0) / st, Math.max(-principal[3 * k + 2], 0) / sc);
      }
      return;
    case "mohr-coulomb":
      for (let k = from; k < to; k++) {
        out[k] = 1 / (Math.max(principal[3 * k], 0) / st - Math.min(principal[3 * k + 2], 0) / sc);
      }
      return;
    case "modified-mohr":
      for (let k = from; k < to; k++) {
        const s1 = principal[3 * k];
        const s3 = principal[3 * k + 2];
        if (s1 <= 0) out[k] = sc / Math.max(-s3, 0);
        else if (s3 >= -s1) out[k] = st / s1;
        else out[k] = 1 / (((sc - st) * s1) / (sc * st) - s3 / sc);
      }
      return;
    default:
      for (let k = from; k < to; k++) {
        out[k] = factorFromPrincipals(
          criterion,
          material,
          principal[3 * k],
          principal[3 * k + 2],
          vonMises[k],
        );
      }
  }
}

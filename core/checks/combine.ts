import { COMPONENTS, type StressTensor } from "../tensor/types";
import { assertFinite, assertTensor } from "../tensor/validate";

/** One term of a load combination: a factor times a load case's stress state. */
export type CombinationTerm = { factor: number; tensor: StressTensor };

/**
 * Superposes load cases: Σ factorᵢ · σᵢ, component by component. Valid only for linear-elastic
 * behaviour and small displacements (superposition), which the UI must say where it shows a
 * combination.
 * @param terms factors (dimensionless) and tensors (all in one stress unit)
 * @returns the combined tensor in the same unit; the zero tensor for no terms
 * @throws TypeError/RangeError for a non-finite factor or component, or when the sum itself
 *   overflows to ±Infinity (factors and stresses too large to combine)
 */
export function combineLoadCases(terms: readonly CombinationTerm[]): StressTensor {
  const out: StressTensor = { xx: 0, yy: 0, zz: 0, xy: 0, yz: 0, zx: 0 };
  terms.forEach((term, i) => {
    assertFinite(term.factor, `terms[${i}].factor`);
    assertTensor(term.tensor, `terms[${i}].tensor`);
    for (const c of COMPONENTS) out[c] += term.factor * term.tensor[c];
  });
  for (const c of COMPONENTS) {
    if (!Number.isFinite(out[c])) {
      throw new RangeError(
        `the combined ${c} component overflows (${out[c]}); check the factors and stresses`,
      );
    }
  }
  return out;
}

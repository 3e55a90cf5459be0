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

/**
 * {@link combineLoadCases} for many combinations over states packed six components apiece
 * (xx yy zz xy yz zx, one stress unit): Σ factors[k] · packed[6·indices[k] …] into `out`.
 * A comparison superposes every combination at every location — up to 50 terms × 100
 * combinations × 100 locations = 500 000 terms — and building a tensor object per term and
 * checking it again took about 3 s of a 4 s comparison; stored states are checked when saved.
 * @param packed components of the states, 6 per state
 * @param indices which state each term takes (0-based)
 * @param factors each term's factor (dimensionless), as many as indices
 * @param out six components receiving the sum (overwritten)
 * @throws RangeError when a combined component overflows, as combineLoadCases does
 */
export function combinePacked(
  packed: Float64Array,
  indices: ArrayLike<number>,
  factors: ArrayLike<number>,
  out: Float64Array,
): void {
  out.fill(0, 0, 6);
  for (let k = 0; k < indices.length; k++) {
    const f = factors[k];
    const base = 6 * indices[k];
    for (let c = 0; c < 6; c++) out[c] += f * packed[base + c];
  }
  for (let c = 0; c < 6; c++) {
    if (!Number.isFinite(out[c])) {
      throw new RangeError(
        `the combined ${COMPONENTS[c]} component overflows (${out[c]}); check the factors and stresses`,
      );
    }
  }
}

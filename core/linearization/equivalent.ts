import { tresca, vonMises } from "../tensor/invariants";
import type { StressTensor } from "../tensor/types";
import type { EquivalentCriterion } from "./types";

/**
 * Equivalent stress of one linearized tensor. Always of the tensor: linearizing an equivalent-stress
 * scalar instead gives a different (wrong) answer, since von Mises and Tresca are not linear.
 */

/** The words a report uses for each criterion. */
export const EQUIVALENT_LABEL: Record<EquivalentCriterion, string> = {
  "von-mises": "von Mises",
  tresca: "Tresca stress intensity σ1 − σ3",
};

function tensorAt(block: Float64Array, o = 0): StressTensor {
  return {
    xx: block[o],
    yy: block[o + 1],
    zz: block[o + 2],
    xy: block[o + 3],
    yz: block[o + 4],
    zx: block[o + 5],
  };
}

/**
 * @param block six components (xx yy zz xy yz zx) from offset `o`
 * @param criterion von Mises or Tresca (σ1 − σ3)
 * @param o offset of the tensor in `block`
 * @returns the equivalent stress, same unit as the tensor
 */
export function equivalentOf(block: Float64Array, criterion: EquivalentCriterion, o = 0): number {
  const t = tensorAt(block, o);
  return criterion === "tresca" ? tresca(t) : vonMises(t);
}

import type { Criterion, Material } from "../criteria/safety-factor";

/**
 * The strengths each criterion needs from a material (see `safetyFactor`). Maximum principal
 * takes the compressive strength when given and falls back to the tensile one.
 */
const NEEDS: Record<Criterion, readonly (keyof Material)[]> = {
  "von-mises": ["yield"],
  tresca: ["yield"],
  "max-principal": ["ultimateTension"],
  "mohr-coulomb": ["ultimateTension", "ultimateCompression"],
  "modified-mohr": ["ultimateTension", "ultimateCompression"],
};

/**
 * Which strengths `criterion` needs that `material` does not give (a missing, non-finite or
 * non-positive value counts as not given). An empty list means the criterion can be evaluated.
 * @param criterion the yield or fracture criterion
 * @param material strengths in one stress unit
 * @returns names of the missing `Material` keys, in a fixed order
 */
export function missingStrengths(criterion: Criterion, material: Material): (keyof Material)[] {
  return NEEDS[criterion].filter((key) => {
    const value = material[key];
    return !(typeof value === "number" && Number.isFinite(value) && value > 0);
  });
}

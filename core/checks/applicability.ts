import type { Criterion, Material, MaterialBehaviour } from "../criteria/safety-factor";

/**
 * Which criteria suit which materials. Von Mises and Tresca predict yielding, so they rate ductile
 * metals; maximum principal, Mohr–Coulomb and modified Mohr predict fracture, so they rate brittle
 * ones (common practice, no source: the usual split in machine-design texts).
 */
export const DUCTILE_CRITERIA: readonly Criterion[] = ["von-mises", "tresca"];
export const BRITTLE_CRITERIA: readonly Criterion[] = ["max-principal", "mohr-coulomb", "modified-mohr"];

/** A material's behaviour and how it was decided, for the reason a screen shows. */
export type BehaviourFinding = { behaviour: MaterialBehaviour; basis: "stated" | "yield strength" };

/**
 * Ductile or brittle: as stated by the material (its data or the user's choice) when it says;
 * otherwise ductile when it has a yield strength (a material that yields before it breaks) and
 * brittle when it has none (common practice, no source).
 */
export function materialBehaviour(material: Material): BehaviourFinding {
  if (material.behaviour === "ductile" || material.behaviour === "brittle") {
    return { behaviour: material.behaviour, basis: "stated" };
  }
  const y = material.yield;
  const hasYield = typeof y === "number" && Number.isFinite(y) && y > 0;
  return { behaviour: hasYield ? "ductile" : "brittle", basis: "yield strength" };
}

/**
 * Why `criterion` does not suit `material`, or null when it does. The reason is written for the
 * screen, after the words "not applicable to this material: ".
 */
export function unsuitedReason(criterion: Criterion, material: Material): string | null {
  const { behaviour, basis } = materialBehaviour(material);
  const suited =
    behaviour === "ductile" ? !BRITTLE_CRITERIA.includes(criterion) : !DUCTILE_CRITERIA.includes(criterion);
  // Most checks suit their material: the words are built only for those that do not (a
  // comparison rates tens of thousands of checks; building them every time doubled its cost).
  if (suited) return null;
  const why =
    basis === "stated"
      ? `the material is set as ${behaviour}`
      : behaviour === "ductile"
        ? "the material has a yield strength, so it is taken as ductile"
        : "the material has no yield strength, so it is taken as brittle";
  return behaviour === "ductile"
    ? `${why}; this criterion predicts brittle fracture and would overrate a ductile material's margin against yielding`
    : `${why}; this criterion predicts yielding, which a brittle material does not show before it breaks`;
}

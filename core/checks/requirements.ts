import { categoryKey } from "../constants/categories";
import type { Criterion, Material, StrengthKey } from "../criteria/safety-factor";

/** A criterion to check and the safety factor the design must reach with it. */
export type CheckRequirement = {
  criterion: Criterion;
  /** dimensionless, > 0 */
  requiredFactor: number;
  /**
   * The load-case category whose factor this is, or null for the project-wide default (also
   * null for a factor typed on the bench with no project behind it). Carried into every check so
   * a screen can say which allowable it used.
   */
  category?: string | null;
};

/**
 * The strengths each criterion needs from a material (see `safetyFactor`). Maximum principal
 * takes the compressive strength when given and falls back to the tensile one.
 */
const NEEDS: Record<Criterion, readonly StrengthKey[]> = {
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
export function missingStrengths(criterion: Criterion, material: Material): StrengthKey[] {
  return NEEDS[criterion].filter((key) => {
    const value = material[key];
    return !(typeof value === "number" && Number.isFinite(value) && value > 0);
  });
}

/** Per load-case category, the factors that replace the project-wide default's (criterion → n). */
export type CategoryFactors = {
  category: string;
  factors: Partial<Record<Criterion, number>>;
};

/**
 * A project's allowables: the criteria it checks with their project-wide default factors, and
 * per load-case category the factors that differ from them. A category that is not listed, or
 * lists no factor for a criterion, uses the default's factor for it.
 */
export type Allowables = {
  defaults: readonly CheckRequirement[];
  categories: readonly CategoryFactors[];
};

export { categoryKey };

/**
 * The requirements a state of `category` is checked against: every criterion of the defaults,
 * each with the category's factor when it has one (its `category` field then names it) or the
 * default's (`category` null).
 * @param allowables the project's defaults and per-category factors
 * @param category the load case's category ("" or null: none)
 */
export function requirementsFor(allowables: Allowables, category: string | null): CheckRequirement[] {
  const key = category === null ? "" : categoryKey(category);
  const own = key === "" ? undefined : allowables.categories.find((c) => categoryKey(c.category) === key);
  return allowables.defaults.map((d) => {
    const factor = own?.factors[d.criterion];
    return factor === undefined
      ? { criterion: d.criterion, requiredFactor: d.requiredFactor, category: null }
      : { criterion: d.criterion, requiredFactor: factor, category: own!.category };
  });
}

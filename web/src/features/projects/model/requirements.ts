import {
  ALLOWABLE_CATEGORY_SUGGESTIONS,
  CRITERION_NAMES,
  type CategoryRequirement,
  type CriterionName,
  type Requirement,
  type UnitSystem,
} from "../../../../../core/contract/projects";

/** The required factor per criterion as typed (empty: the criterion is not checked). */
export type FactorDraft = Record<CriterionName, string>;

/** One category's factors as typed (empty: use the default's). */
export type CategoryDraft = { category: string; factors: FactorDraft };

/** The project's default requirements as form text, one box per criterion (empty where not checked). */
export function toDraft(requirements: Requirement[]): FactorDraft {
  return Object.fromEntries(
    CRITERION_NAMES.map((c) => [
      c,
      String(requirements.find((r) => r.criterion === c)?.requiredFactor ?? ""),
    ]),
  ) as FactorDraft;
}

/** A category row with every box empty. */
export function emptyCategory(category: string): CategoryDraft {
  return {
    category,
    factors: Object.fromEntries(CRITERION_NAMES.map((c) => [c, ""])) as FactorDraft,
  };
}

/**
 * The stored categories as drafts, with the usual four offered first even when they have no factors;
 * a stored category matches a suggested one ignoring case and surrounding spaces.
 */
export function toCategoryDrafts(stored: CategoryRequirement[]): CategoryDraft[] {
  const drafts: CategoryDraft[] = ALLOWABLE_CATEGORY_SUGGESTIONS.map((c) => emptyCategory(c));
  for (const s of stored) {
    let d = drafts.find((x) => x.category.toLowerCase() === s.category.trim().toLowerCase());
    if (!d) {
      d = emptyCategory(s.category);
      drafts.push(d);
    }
    for (const c of CRITERION_NAMES) {
      const v = s.factors[c];
      if (v !== undefined) d.factors[c] = String(v);
    }
  }
  return drafts;
}

/** True when the project checks this criterion in the form as typed (its default box is not empty). */
export const isChecked = (draft: FactorDraft, criterion: CriterionName): boolean =>
  draft[criterion].trim() !== "";

/** The default requirements to send: every criterion with a factor typed, in the usual order. */
export function requirementsFromDraft(draft: FactorDraft): Requirement[] {
  return CRITERION_NAMES.filter((c) => isChecked(draft, c)).map((criterion) => ({
    criterion,
    requiredFactor: Number(draft[criterion]),
  }));
}

/**
 * The category factors to send. Categories with no factor of their own are left out (they use the
 * default anyway); a factor for a criterion no longer checked is dropped with it, as the form shows
 * it greyed. Category names are sent trimmed.
 */
export function categoryRequirementsFromDrafts(
  categories: CategoryDraft[],
  requirements: Requirement[],
): CategoryRequirement[] {
  const checked = new Set(requirements.map((r) => r.criterion));
  return categories
    .map((c) => ({
      category: c.category.trim(),
      factors: Object.fromEntries(
        CRITERION_NAMES.filter((k) => checked.has(k) && c.factors[k].trim() !== "").map((k) => [
          k,
          Number(c.factors[k]),
        ]),
      ),
    }))
    .filter((c) => Object.keys(c.factors).length > 0);
}

/** A new category can be added when it has a name not already listed (ignoring case and spaces). */
export function canAddCategory(categories: CategoryDraft[], name: string): boolean {
  const wanted = name.trim();
  return wanted !== "" && !categories.some((c) => c.category.toLowerCase() === wanted.toLowerCase());
}

/** The usual four categories stay in the form; only ones the user added can be removed. */
export const isRemovableCategory = (category: string): boolean =>
  !(ALLOWABLE_CATEGORY_SUGGESTIONS as readonly string[]).includes(category);

/** The categories with one box changed. */
export function setCategoryFactor(
  categories: CategoryDraft[],
  index: number,
  criterion: CriterionName,
  text: string,
): CategoryDraft[] {
  return categories.map((x, j) => (j === index ? { ...x, factors: { ...x.factors, [criterion]: text } } : x));
}

/**
 * How a category's box for one criterion looks: greyed and empty when the project does not check the
 * criterion, otherwise showing the default factor as its placeholder.
 */
export function categoryBox(
  draft: FactorDraft,
  criterion: CriterionName,
): { disabled: boolean; title: string | undefined; placeholder: string } {
  const checked = isChecked(draft, criterion);
  return {
    disabled: !checked,
    title: checked ? undefined : "the project does not check this criterion",
    placeholder: checked ? draft[criterion] : "—",
  };
}

/** The units line of the checks panel. */
export const unitSystemLabel = (system: UnitSystem): string =>
  system === "US" ? "ksi (US customary)" : "MPa (SI)";

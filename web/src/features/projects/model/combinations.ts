import type { Combination } from "../../../../../core/contract/combinations";

/** One term of a combination as typed: the chosen load case ("" = none yet) and the factor's text. */
export type DraftTerm = { loadCaseId: string; factor: string };

/** A combination's editable fields as typed. */
export type CombinationDraft = { name: string; description: string; terms: DraftTerm[] };

/** The row "Add a term" appends: no load case chosen, factor 1.0. */
export const newTerm = (): DraftTerm => ({ loadCaseId: "", factor: "1.0" });

/** A stored combination as the editor opens it. */
export const draftOf = (c: Combination): CombinationDraft => ({
  name: c.name,
  description: c.description,
  terms: c.terms.map((t) => ({ loadCaseId: t.loadCaseId, factor: String(t.factor) })),
});

/** The terms with one changed. */
export const patchTerm = (terms: DraftTerm[], index: number, patch: Partial<DraftTerm>): DraftTerm[] =>
  terms.map((t, j) => (j === index ? { ...t, ...patch } : t));

/**
 * The terms to send: rows with no load case chosen are left out, factors are read as numbers and the
 * server's shared schema judges them (so its message appears beside the term).
 * @param blankFactor what an empty factor box is sent as. The editor sends NaN (refused as "not a
 *   number"); the new-combination form has always sent Number("") = 0 (refused as zero).
 */
export function termsBody(terms: DraftTerm[], blankFactor: number): { loadCaseId: string; factor: number }[] {
  return terms
    .filter((t) => t.loadCaseId)
    .map((t) => ({
      loadCaseId: t.loadCaseId,
      factor: t.factor.trim() === "" ? blankFactor : Number(t.factor),
    }));
}

/** The server's message for one term, about its factor first, else about its load case. */
export const termError = (errors: Record<string, string>, index: number): string | undefined =>
  errors[`terms.${index}.factor`] ?? errors[`terms.${index}.loadCaseId`];

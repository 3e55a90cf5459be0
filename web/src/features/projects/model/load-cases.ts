import { LOAD_CASE_CATEGORY_SUGGESTIONS } from "../../../../../core/contract/load-cases";

/** Same category as far as the checks go: case and surrounding spaces do not count. */
const sameCategory = (a: string, b: string) => a.trim().toLowerCase() === b.trim().toLowerCase();

/**
 * Which factors a load case is checked with, in words: its category's own when the project gives
 * that category factors (matched ignoring case and spaces), otherwise the project default.
 * @param allowableCategories the categories the checks panel gives factors of their own
 */
export function allowablesNote(category: string, allowableCategories: readonly string[]): string {
  return category && allowableCategories.some((a) => sameCategory(a, category))
    ? `checked with the “${category}” factors`
    : "checked with the project default factors";
}

/** The categories offered when typing one: the usual suggestions, then the project's own, each once. */
export function categorySuggestions(allowableCategories: readonly string[]): string[] {
  return [...new Set([...LOAD_CASE_CATEGORY_SUGGESTIONS, ...allowableCategories.map((a) => a.trim())])];
}

/** One cell of the load-case table: a load case at a location. */
export type CaseCell = { caseId: string; locationId: string };

/** The History button opens a cell's revisions, and closes them when that same cell is open. */
export function toggleCell(open: CaseCell | null, cell: CaseCell): CaseCell | null {
  return open?.caseId === cell.caseId && open.locationId === cell.locationId ? null : cell;
}

/** True when `cell` is the open one. */
export const isOpenCell = (open: CaseCell | null, cell: CaseCell): boolean =>
  open?.caseId === cell.caseId && open.locationId === cell.locationId;

/** "Design at head junction": a cell named for a heading; a location deleted meanwhile is "a location". */
export function cellTitle(
  cell: CaseCell,
  cases: readonly { id: string; name: string }[],
  locations: readonly { id: string; name: string }[],
): string | null {
  const loadCase = cases.find((c) => c.id === cell.caseId);
  if (!loadCase) return null;
  return `${loadCase.name} at ${locations.find((l) => l.id === cell.locationId)?.name ?? "a location"}`;
}

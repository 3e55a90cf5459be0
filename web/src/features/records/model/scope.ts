import type { z } from "zod";
import type { recordScopeInputSchema, recordScopeSchema } from "../../../../../core/contract/records";

/*
 * What a record covers: the whole project, or a chosen set of its load cases and locations.
 * The words the revision table and the record page show, and the submit form's choice as pure
 * state with the actions the form calls and the reader that turns it into the request's `scope`.
 */

/** A subset record's scope as the API sends it; null (or absent in the content) = the whole project. */
export type RecordScope = z.infer<typeof recordScopeSchema>;
/** The `scope` of a submission: the ids chosen, at least one of each. */
export type RecordScopeInput = z.infer<typeof recordScopeInputSchema>;

const counted = (n: number, one: string, many: string) => `${n} ${n === 1 ? one : many}`;

/** "whole project", or "2 of 4 load cases, 1 of 3 locations": short enough for a table cell. */
export function scopeWords(scope: RecordScope | null | undefined): string {
  if (!scope) return "whole project";
  return (
    `${scope.loadCases.length} of ${counted(scope.projectLoadCases, "load case", "load cases")}, ` +
    `${scope.locations.length} of ${counted(scope.projectLocations, "location", "locations")}`
  );
}

/** The subtitle of the record's frozen results: a subset record must not claim every case. */
export function frozenResultsSubtitle(scope: RecordScope | null | undefined): string {
  return scope
    ? "the chosen cases and combinations at the chosen locations; SF against the required factor"
    : "every case and combination at every location; SF against the required factor";
}

/* ---- The submit form's choice ---- */

/** Which of the form's two lists. */
export type ScopeList = "loadCases" | "locations";

/** The form's choice: the whole project, or the ids ticked in each list. */
export type ScopeChoice = {
  mode: "whole" | "chosen";
  loadCaseIds: readonly string[];
  locationIds: readonly string[];
};

/** The form opens on the whole project (today's behaviour) with nothing ticked. */
export const WHOLE_PROJECT: ScopeChoice = { mode: "whole", loadCaseIds: [], locationIds: [] };

const idsKey = (list: ScopeList) => (list === "loadCases" ? "loadCaseIds" : "locationIds");

/** Switches between the whole project and the chosen lists; the ticks are kept for a switch back. */
export const setScopeMode = (choice: ScopeChoice, mode: ScopeChoice["mode"]): ScopeChoice => ({
  ...choice,
  mode,
});

/** Ticks or unticks one load case or location. */
export function tickScopeItem(choice: ScopeChoice, list: ScopeList, id: string, on: boolean): ScopeChoice {
  const key = idsKey(list);
  const rest = choice[key].filter((x) => x !== id);
  return { ...choice, [key]: on ? [...rest, id] : rest };
}

/** "Select all" (every id of the list) or "Select none" (an empty list). */
export const setScopeList = (choice: ScopeChoice, list: ScopeList, ids: readonly string[]): ScopeChoice => ({
  ...choice,
  [idsKey(list)]: [...ids],
});

/** One checkbox of the form: the id it sends and the words beside it. */
export type ScopeOption = { id: string; label: string };

/** The project's load cases as checkboxes: "Hydrostatic test (test)", the category in brackets when there is one. */
export const loadCaseOptions = (loadCases: readonly { id: string; name: string; category: string }[]) =>
  loadCases.map((c): ScopeOption => ({ id: c.id, label: c.category ? `${c.name} (${c.category})` : c.name }));

/** The project's locations as checkboxes. */
export const locationOptions = (locations: readonly { id: string; name: string }[]) =>
  locations.map((l): ScopeOption => ({ id: l.id, label: l.name }));

/** The options ticked, in the project's order (ticks of items deleted meanwhile are dropped). */
const ticked = (options: readonly ScopeOption[], ids: readonly string[]) =>
  options.filter((o) => ids.includes(o.id));

/**
 * The count under the lists: "2 of 4 load cases, 1 of 3 locations", and when every one of both
 * is ticked, that this is the whole project (the API freezes it as such).
 */
export function scopeCountLine(
  choice: ScopeChoice,
  options: { loadCases: readonly ScopeOption[]; locations: readonly ScopeOption[] },
): string {
  const cases = ticked(options.loadCases, choice.loadCaseIds).length;
  const places = ticked(options.locations, choice.locationIds).length;
  const line =
    `${cases} of ${counted(options.loadCases.length, "load case", "load cases")}, ` +
    `${places} of ${counted(options.locations.length, "location", "locations")}`;
  const everything =
    options.loadCases.length > 0 &&
    options.locations.length > 0 &&
    cases === options.loadCases.length &&
    places === options.locations.length;
  return everything ? `${line}: every one of both, so the record covers the whole project` : line;
}

/** Whether the API's 400 names the reason or a scope field, so the form's general message is not needed. */
export const namesAFormField = (fieldErrors: Readonly<Record<string, string>>) =>
  Object.keys(fieldErrors).some((f) => f === "reason" || f === "scope" || f.startsWith("scope."));

/** Errors beside the lists, each naming its list. */
export type ScopeErrors = Partial<Record<ScopeList, string>>;

export type ReadScope = { ok: true; value: RecordScopeInput | null } | { ok: false; errors: ScopeErrors };

export const LOAD_CASES_NONE = "Load cases: choose at least one load case, or cover the whole project.";
export const LOCATIONS_NONE = "Locations: choose at least one location, or cover the whole project.";

/**
 * The request's `scope`: null for the whole project, else the ticked ids in the project's order;
 * an empty list is refused here with the list named, before anything is sent.
 */
export function readScope(
  choice: ScopeChoice,
  options: { loadCases: readonly ScopeOption[]; locations: readonly ScopeOption[] },
): ReadScope {
  if (choice.mode === "whole") return { ok: true, value: null };
  const loadCaseIds = ticked(options.loadCases, choice.loadCaseIds).map((o) => o.id);
  const locationIds = ticked(options.locations, choice.locationIds).map((o) => o.id);
  const errors: ScopeErrors = {};
  if (loadCaseIds.length === 0) errors.loadCases = LOAD_CASES_NONE;
  if (locationIds.length === 0) errors.locations = LOCATIONS_NONE;
  if (errors.loadCases || errors.locations) return { ok: false, errors };
  return { ok: true, value: { loadCaseIds, locationIds } };
}

const LIST_WORDS: Readonly<Record<ScopeList, { title: string; path: string; one: string }>> = {
  loadCases: { title: "Load cases", path: "scope.loadCaseIds", one: "load case" },
  locations: { title: "Locations", path: "scope.locationIds", one: "location" },
};

/**
 * The API's 400 field errors on `scope` (paths "scope.loadCaseIds", "scope.loadCaseIds.<i>",
 * the same for locations), put beside the list they belong to. An indexed error names the item
 * that was sent at that place, by its label when the form still knows it.
 */
export function scopeServerErrors(
  fieldErrors: Readonly<Record<string, string>>,
  sent: RecordScopeInput | null,
  options: { loadCases: readonly ScopeOption[]; locations: readonly ScopeOption[] },
): ScopeErrors {
  const out: ScopeErrors = {};
  for (const list of ["loadCases", "locations"] as const) {
    const { title, path, one } = LIST_WORDS[list];
    const sentIds = sent ? sent[idsKey(list)] : [];
    const lines: string[] = [];
    for (const [field, message] of Object.entries(fieldErrors)) {
      if (field === path) lines.push(message);
      else if (field.startsWith(`${path}.`)) {
        const index = Number(field.slice(path.length + 1));
        const id = Number.isInteger(index) ? sentIds[index] : undefined;
        const label =
          options[list].find((o) => o.id === id)?.label ??
          (Number.isInteger(index) ? `${one} no. ${index + 1} of those sent` : field);
        lines.push(`${label}: ${message}`);
      }
    }
    if (lines.length) out[list] = `${title}: ${lines.join("; ")}`;
  }
  // An error on `scope` as a whole names neither list: it goes beside both.
  if (fieldErrors.scope) {
    out.loadCases ??= `Load cases: ${fieldErrors.scope}`;
    out.locations ??= `Locations: ${fieldErrors.scope}`;
  }
  return out;
}

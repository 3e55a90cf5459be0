import type { RecordScope, RecordScopeInput } from "../../../core/contract/records";
import { errors } from "../../errors";

/**
 * Which load cases and locations a record covers (issue 14: "a project, or a chosen set of its
 * load cases and locations"), from the ids the submitter chose and the project's live ones.
 */

type Named = { id: string; name: string };

/**
 * What to do with a chosen id that is not a live one of the project: refuse it (a submission:
 * 400 naming `scope.loadCaseIds.<i>`), or leave it out (comparing the project now with an
 * approved record whose scope named a case or location deleted since).
 */
export type UnknownScopeIds = "refuse" | "leave-out";

/**
 * The record's scope: the chosen load cases and locations in the project's order (duplicates
 * collapsed) with how many the project has, or undefined when the choice is the whole project
 * (no choice, or every load case and every location), so such a record is the same as one taken
 * without a choice.
 * @param live the project's live load cases and locations, in the project's order
 */
export function resolveRecordScope(
  choice: RecordScopeInput | null | undefined,
  live: { loadCases: readonly Named[]; locations: readonly Named[] },
  unknownIds: UnknownScopeIds,
): RecordScope | undefined {
  if (!choice) return undefined;
  if (unknownIds === "refuse") {
    const problems = [
      ...unknown(live.loadCases, choice.loadCaseIds, "loadCaseIds", "load case"),
      ...unknown(live.locations, choice.locationIds, "locationIds", "location"),
    ];
    if (problems.length > 0) throw errors.invalidInput(problems);
  }
  const loadCases = chosen(live.loadCases, choice.loadCaseIds);
  const locations = chosen(live.locations, choice.locationIds);
  if (loadCases.length === live.loadCases.length && locations.length === live.locations.length) {
    return undefined;
  }
  return {
    loadCases,
    locations,
    projectLoadCases: live.loadCases.length,
    projectLocations: live.locations.length,
  };
}

/** A problem for each chosen id that is not a live one, named by its place in the list. */
function unknown(
  live: readonly Named[],
  ids: readonly string[],
  field: "loadCaseIds" | "locationIds",
  what: string,
): { path: string; message: string }[] {
  const liveIds = new Set(live.map((x) => x.id));
  return ids.flatMap((id, i) =>
    liveIds.has(id)
      ? []
      : [
          {
            path: `scope.${field}.${i}`,
            message: `is not a ${what} of this project (it may be in the trash)`,
          },
        ],
  );
}

/** The live entries that were chosen, in the project's order, each once. */
function chosen(live: readonly Named[], ids: readonly string[]): Named[] {
  const wanted = new Set(ids);
  return live.filter((x) => wanted.has(x.id)).map(({ id, name }) => ({ id, name }));
}

import { combineLoadCases, type StressTensor } from "../../../core";
import { componentsPaOf, type StressStateRow } from "../../../db/repositories/stress-states";

/** What superposition reads of a current state: where it is and its six components in Pa. */
type KeyedState = Pick<
  StressStateRow,
  "loadCaseId" | "locationId" | "xxPa" | "yyPa" | "zzPa" | "xyPa" | "yzPa" | "zxPa"
>;

/** One term as stored: a factor on a load case (with the case's name, and whether it is live). */
export type StoredTerm = { loadCaseId: string; loadCaseName: string; factor: number; live: boolean };

/** The superposed state at one location, or the cases that have no state there. */
export type Superposed =
  | { status: "combined"; tensorPa: StressTensor }
  | { status: "incomplete"; missingCases: { id: string; name: string }[] };

/**
 * Σ factor × state at `locationId` with core's combineLoadCases (superposition, valid for
 * linear-elastic behaviour). A case in the trash, or with no state at the location, makes
 * the result incomplete rather than silently zero.
 * @param states current states keyed "caseId:locationId"
 */
export function superposeAt(
  terms: StoredTerm[],
  locationId: string,
  states: Map<string, KeyedState>,
): Superposed {
  const missing = terms.filter((t) => !t.live || !states.has(`${t.loadCaseId}:${locationId}`));
  if (missing.length > 0) {
    return {
      status: "incomplete",
      missingCases: missing.map((t) => ({ id: t.loadCaseId, name: t.loadCaseName })),
    };
  }
  const tensorPa = combineLoadCases(
    terms.map((t) => ({
      factor: t.factor,
      tensor: componentsPaOf(states.get(`${t.loadCaseId}:${locationId}`)!),
    })),
  );
  return { status: "combined", tensorPa };
}

/** Current states keyed "caseId:locationId". */
export function stateIndex<S extends KeyedState>(states: S[]): Map<string, S> {
  return new Map(states.map((s) => [`${s.loadCaseId}:${s.locationId}`, s]));
}

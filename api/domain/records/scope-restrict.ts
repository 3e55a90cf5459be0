import type { ProjectExport } from "../../../core/contract/project-export";
import type { RecordScope } from "../../../core/contract/records";
import type { ComparisonInput } from "../comparison/build";
import type { StoredLineForComparison } from "../comparison/linearizations";
import type { ExportKeys } from "../projects/export";

/**
 * A record's inputs and the comparison's input cut down to the record's scope (scope.ts). The
 * comparison is restricted before it is built, not filtered afterwards, so its governing cases are
 * those of the scope: a case outside the scope that governs the whole project must not govern here.
 */

/** The chosen load case and location ids. */
type ScopeSets = { cases: ReadonlySet<string>; locations: ReadonlySet<string> };

function idsOf(scope: RecordScope): ScopeSets {
  return {
    cases: new Set(scope.loadCases.map((c) => c.id)),
    locations: new Set(scope.locations.map((l) => l.id)),
  };
}

/**
 * The comparison's input with only the scope's load cases and locations, their states, the
 * combinations whose every load case is in scope, and the point tables and classification lines
 * of chosen load cases (and of chosen locations, for a line that names one).
 */
export function restrictComparisonInput<
  T extends ComparisonInput & { linearizations: StoredLineForComparison[] },
>(input: T, scope: RecordScope): T {
  const { cases, locations } = idsOf(scope);
  // A line whose location is in the trash has none (the export writes it without one): it goes with its case.
  const live = new Set(input.locations.map((l) => l.id));
  const lineLocationInScope = (id: string | null) => id === null || !live.has(id) || locations.has(id);
  return {
    ...input,
    cases: input.cases.filter((c) => cases.has(c.id)),
    locations: input.locations.filter((l) => locations.has(l.id)),
    states: new Map(
      [...input.states].filter(([, s]) => cases.has(s.loadCaseId) && locations.has(s.locationId)),
    ),
    combinations: input.combinations.filter((k) => k.terms.every((t) => cases.has(t.loadCaseId))),
    linearizations: input.linearizations.filter(
      (line) => cases.has(line.caseId) && lineLocationInScope(line.locationId),
    ),
    ...(input.pointTables ? { pointTables: input.pointTables.filter((t) => cases.has(t.caseId)) } : {}),
  };
}

/**
 * The export of the project with only what is in scope — the chosen locations, the chosen load
 * cases with their states and lines at chosen locations, combinations of chosen cases only, and
 * the library materials the project's default and the chosen locations use — with the key maps
 * cut to match. Keys keep the labels the whole export gave them, so they still name the same rows.
 */
export function restrictExport(
  file: ProjectExport,
  keys: ExportKeys,
  scope: RecordScope,
): { file: ProjectExport; keys: ExportKeys } {
  const { cases, locations } = idsOf(scope);
  const keep = (map: Map<string, string>, ids: ReadonlySet<string>) =>
    new Map([...map].filter(([id]) => ids.has(id)));
  const caseKeys = keep(keys.loadCases, cases);
  const locationKeys = keep(keys.locations, locations);
  const caseKeySet = new Set(caseKeys.values());
  const locationKeySet = new Set(locationKeys.values());

  const keptLocations = file.locations.filter((l) => locationKeySet.has(l.key));
  const usedMaterials = new Set(
    [file.project.defaultMaterial, ...keptLocations.map((l) => l.material)].flatMap((ref) =>
      ref?.kind === "library" ? [ref.key] : [],
    ),
  );
  const restricted: ProjectExport = {
    ...file,
    materials: file.materials.filter((m) => usedMaterials.has(m.key)),
    locations: keptLocations,
    loadCases: file.loadCases
      .filter((c) => caseKeySet.has(c.key))
      .map((c) => ({
        ...c,
        states: c.states.filter((s) => locationKeySet.has(s.location)),
        ...(c.linearizations
          ? {
              linearizations: c.linearizations.filter(
                (line) => line.location === null || locationKeySet.has(line.location),
              ),
            }
          : {}),
      })),
    combinations: file.combinations.filter((k) => k.terms.every((t) => caseKeySet.has(t.loadCase))),
  };
  return {
    file: restricted,
    keys: {
      materials: new Map([...keys.materials].filter(([, key]) => usedMaterials.has(key))),
      locations: locationKeys,
      loadCases: caseKeys,
      states: keys.states.filter((s) => cases.has(s.loadCaseId) && locations.has(s.locationId)),
    },
  };
}

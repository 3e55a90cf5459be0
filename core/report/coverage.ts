import type { RecordContent, RecordScope } from "../contract/records";

const counted = (n: number, one: string, many: string) => (n === 1 ? one : many);

/**
 * What a record (or a draft) covers, in one sentence the report's cover and scope section and the
 * record page print: the whole project with its counts, or "N of M load cases (names) and K of L
 * locations (names)" and that results outside it are not part of the record — so nobody reads a
 * subset as the project.
 * @param scope the record's scope; absent or null for the whole project
 * @param frozen how many load cases and locations the content holds (said for the whole project)
 * @param noun what the report is of: "record", or "draft" for the project as it is now
 */
export function scopeCoverageSentence(
  scope: RecordScope | null | undefined,
  frozen: { loadCases: number; locations: number },
  noun: "record" | "draft",
): string {
  if (!scope) {
    const { loadCases: cases, locations } = frozen;
    return `This ${noun} covers the whole project: ${cases} ${counted(cases, "load case", "load cases")} and ${locations} ${counted(locations, "location", "locations")}.`;
  }
  const names = (list: { name: string }[]) => list.map((x) => x.name).join(", ");
  return (
    `This ${noun} covers ${scope.loadCases.length} of ${scope.projectLoadCases} ${counted(scope.projectLoadCases, "load case", "load cases")} (${names(scope.loadCases)})` +
    ` and ${scope.locations.length} of ${scope.projectLocations} ${counted(scope.projectLocations, "location", "locations")} (${names(scope.locations)});` +
    ` results outside it are not part of this ${noun}.`
  );
}

/** The coverage sentence of a record's content (see scopeCoverageSentence). */
export function coverageSentence(content: RecordContent, noun: "record" | "draft"): string {
  return scopeCoverageSentence(
    content.scope,
    { loadCases: content.inputs.loadCases.length, locations: content.inputs.locations.length },
    noun,
  );
}

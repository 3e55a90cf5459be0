import {
  classificationLabel,
  type ComparisonLinearization,
  type LinearizationSummary,
} from "../../../core/contract/linearizations";

/**
 * Saved stress classification lines as sections of the comparison. The loader (load.ts) reads
 * each live case's lines with the checks the server computed at their last save (not their
 * points), so the comparison's input text — and with it the answer kept in answer-cache.ts —
 * changes whenever a line is saved, changed or deleted (its id, version and summary are in it).
 */

/** One line as the loader reads it. */
export type StoredLineForComparison = {
  id: string;
  name: string;
  caseId: string;
  locationId: string | null;
  version: number;
  summary: Pick<LinearizationSummary, "classification" | "equivalent" | "stressUnit" | "checks">;
};

/**
 * Each line as its own section: its checks with their sources and the rule that governs (the
 * highest ratio). Lines of cases that are not live were left out by the loader.
 * @param lines the lines in the loader's order
 * @param cases the project's live cases (for their names)
 * @param locations the project's live locations (a line whose location is in the trash shows none)
 */
export function comparisonLinearizations(
  lines: readonly StoredLineForComparison[],
  cases: readonly { id: string; name: string }[],
  locations: readonly { id: string; name: string }[],
): ComparisonLinearization[] {
  const caseNames = new Map(cases.map((c) => [c.id, c.name]));
  const locationNames = new Map(locations.map((l) => [l.id, l.name]));
  return lines
    .filter((line) => caseNames.has(line.caseId))
    .map((line) => {
      const checks = line.summary.checks.map(({ rule, value, limit, ratio, verdict, source }) => ({
        rule,
        value,
        limit,
        ratio,
        verdict,
        source,
      }));
      const governing = checks.reduce<(typeof checks)[number] | null>(
        (top, k) => (top === null || k.ratio > top.ratio ? k : top),
        null,
      );
      return {
        id: line.id,
        name: line.name,
        caseId: line.caseId,
        caseName: caseNames.get(line.caseId)!,
        locationName: line.locationId === null ? null : (locationNames.get(line.locationId) ?? null),
        category: classificationLabel(line.summary.classification),
        equivalent: line.summary.equivalent,
        stressUnit: line.summary.stressUnit,
        checks,
        governingRule: governing?.rule ?? null,
      };
    });
}

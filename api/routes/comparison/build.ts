import { RESULTS_CAUTION } from "../../../core/contract/cautions";
import {
  evaluateState,
  findGoverning,
  type CheckRequirement,
  type ComparisonRow,
  type CriterionCheck,
  type Governing,
  type StressTensor,
} from "../../../core";
import { SUPERPOSITION_CAUTION } from "../../../core/contract/combinations";
import {
  governingSummary,
  type Comparison,
  type ComparisonCheck,
  type ComparisonRowView,
  type GoverningView,
} from "../../../core/contract/comparison";
import type { StressState } from "../../../db/models/stress-state";
import { superposeAt, type StoredTerm } from "../combinations/superpose";
import { componentsPaOf } from "../load-cases/states";
import type { ResolvedMaterial } from "../materials/resolve";

/** What the comparison is built from (plain data, already loaded). */
export type ComparisonInput = {
  projectId: string;
  requirements: CheckRequirement[];
  locations: { id: string; name: string; material: ResolvedMaterial }[];
  cases: { id: string; name: string; category: string; version: number }[];
  /** Current states keyed "caseId:locationId". */
  states: Map<string, StressState>;
  combinations: { id: string; name: string; version: number; terms: StoredTerm[] }[];
};

/** The standing note about the strengths the factors are measured against. */
export const STRENGTHS_CAUTION =
  "Safety factors are against the strengths shown; published minimum values must be verified against the material certificate.";

function checkView(c: CriterionCheck): ComparisonCheck {
  if (c.status !== "evaluated") {
    return {
      status: "not-evaluated",
      criterion: c.criterion,
      requiredFactor: c.requiredFactor,
      missing: c.status === "not-evaluated" ? c.missing : [],
    };
  }
  return {
    status: "evaluated",
    criterion: c.criterion,
    requiredFactor: c.requiredFactor,
    factor: Number.isFinite(c.factor) ? c.factor : null,
    utilisation: c.utilisation,
    verdict: c.verdict,
  };
}

/**
 * Every load case and combination at every location, evaluated with core's evaluateState
 * against the location's material and the project's required factors; combinations
 * superposed with core's combineLoadCases; the governing row per criterion (overall and per
 * location) chosen by core's findGoverning. Rows are ordered cases first, then
 * combinations, each by location order, which is also findGoverning's tie-break.
 */
export function buildComparison(input: ComparisonInput): Comparison {
  const rows: ComparisonRowView[] = [];
  const coreRows: ComparisonRow[] = [];
  const skipped: Comparison["skipped"] = [];

  const addRow = (
    base: Pick<
      ComparisonRowView,
      "rowId" | "kind" | "caseId" | "caseName" | "category" | "caseVersion" | "stateRevision"
    >,
    location: ComparisonInput["locations"][number],
    tensorPa: StressTensor,
  ) => {
    const evaluation = evaluateState(tensorPa, location.material.strengths, input.requirements);
    coreRows.push({ caseId: base.rowId, locationId: location.id, evaluation });
    rows.push({
      ...base,
      locationId: location.id,
      locationName: location.name,
      material: {
        label: location.material.label,
        kind: location.material.kind,
        note: location.material.note,
      },
      componentsPa: { ...tensorPa },
      principalPa: evaluation.principal,
      vonMisesPa: evaluation.vonMises,
      trescaPa: evaluation.tresca,
      maxShearPa: evaluation.maxShear,
      checks: evaluation.checks.map(checkView),
    });
  };

  for (const c of input.cases) {
    for (const location of input.locations) {
      const state = input.states.get(`${c.id}:${location.id}`);
      if (!state) {
        skipped.push({
          caseName: c.name,
          locationName: location.name,
          reason: "no stress state entered here",
        });
        continue;
      }
      addRow(
        {
          rowId: `case:${c.id}:${location.id}`,
          kind: "load-case",
          caseId: c.id,
          caseName: c.name,
          category: c.category,
          caseVersion: c.version,
          stateRevision: state.revision,
        },
        location,
        componentsPaOf(state),
      );
    }
  }
  for (const combo of input.combinations) {
    for (const location of input.locations) {
      const result = superposeAt(combo.terms, location.id, input.states);
      if (result.status === "incomplete") {
        skipped.push({
          caseName: combo.name,
          locationName: location.name,
          reason: `no state here for ${result.missingCases.map((m) => `"${m.name}"`).join(", ")}`,
        });
        continue;
      }
      addRow(
        {
          rowId: `combination:${combo.id}:${location.id}`,
          kind: "combination",
          caseId: combo.id,
          caseName: combo.name,
          category: "combination",
          caseVersion: combo.version,
          stateRevision: null,
        },
        location,
        result.tensorPa,
      );
    }
  }

  const byRowId = new Map(rows.map((r) => [r.rowId, r]));
  const view = (g: Governing): GoverningView => {
    const row = byRowId.get(g.caseId)!;
    return {
      criterion: g.criterion,
      rowId: row.rowId,
      caseName: row.caseName,
      locationName: row.locationName,
      factor: Number.isFinite(g.check.factor) ? g.check.factor : null,
      requiredFactor: g.check.requiredFactor,
      utilisation: g.check.utilisation,
      verdict: g.check.verdict,
    };
  };
  const governing = findGoverning(coreRows).map(view);
  const governingByLocation = input.locations.map((l) => ({
    locationId: l.id,
    locationName: l.name,
    governing: findGoverning(coreRows, l.id).map(view),
  }));
  const cautions = [RESULTS_CAUTION, STRENGTHS_CAUTION];
  if (input.combinations.length > 0) cautions.push(SUPERPOSITION_CAUTION);
  return {
    projectId: input.projectId,
    requirements: input.requirements,
    rows,
    governing,
    governingByLocation,
    summary: governingSummary(governing),
    skipped,
    cautions,
  };
}

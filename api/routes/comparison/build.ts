import { RESULTS_CAUTION } from "../../../core/contract/cautions";
import {
  evaluateStates,
  findGoverning,
  findOverallGoverning,
  requirementsFor,
  type Allowables,
  type ComparisonRow,
  type CriterionCheck,
  type Governing,
  type StressTensor,
} from "../../../core";
import { SUPERPOSITION_CAUTION } from "../../../core/contract/combinations";
import {
  allowableLabel,
  governingSentence,
  type Comparison,
  type ComparisonCheck,
  type ComparisonRowView,
  type GoverningView,
} from "../../../core/contract/comparison";
import type { CategoryRequirement, Requirement } from "../../../core/contract/projects";
import type { StressState } from "../../../db/models/stress-state";
import { superposeAt, type StoredTerm } from "../combinations/superpose";
import { componentsPaOf } from "../load-cases/states";
import type { ResolvedMaterial } from "../materials/resolve";

/** What the comparison is built from (plain data, already loaded). */
export type ComparisonInput = {
  projectId: string;
  /** The project's allowables: default factors and per-category ones. */
  allowables: { requirements: Requirement[]; categoryRequirements: CategoryRequirement[] };
  /** Rate criteria that do not suit a material and let them govern (the project's choice). */
  includeUnsuitedCriteria: boolean;
  locations: { id: string; name: string; material: ResolvedMaterial }[];
  cases: { id: string; name: string; category: string; version: number }[];
  /** Current states keyed "caseId:locationId". */
  states: Map<string, StressState>;
  combinations: { id: string; name: string; version: number; terms: StoredTerm[] }[];
};

/** The standing note about the strengths the factors are measured against. */
export const STRENGTHS_CAUTION =
  "Safety factors are against the strengths shown; published minimum values must be verified against the material certificate.";

/** The project's allowables as core reads them. */
export function coreAllowables(a: ComparisonInput["allowables"]): Allowables {
  return { defaults: a.requirements, categories: a.categoryRequirements };
}

function checkView(c: CriterionCheck): ComparisonCheck {
  const base = { criterion: c.criterion, requiredFactor: c.requiredFactor, category: c.category };
  if (c.status === "not-evaluated") {
    return { ...base, status: "not-evaluated", missing: c.missing, reason: c.reason };
  }
  if (c.status === "not-applicable") return { ...base, status: "not-applicable", reason: c.reason };
  return {
    ...base,
    status: "evaluated",
    factor: Number.isFinite(c.factor) ? c.factor : null,
    utilisation: c.utilisation,
    verdict: c.verdict,
    unsuited: c.unsuited,
  };
}

type RowBase = Pick<
  ComparisonRowView,
  "rowId" | "kind" | "caseId" | "caseName" | "category" | "caseVersion" | "stateRevision"
>;

/**
 * Every load case and combination at every location, evaluated in one call of core's evaluator
 * (`evaluateStates`, on the batch kernel) against the location's material and the factors of
 * the row's load-case category (core's `requirementsFor`; combinations, which have no category,
 * take the project default); combinations superposed with core's combineLoadCases; the governing
 * row per criterion (overall and per location) and the summary chosen by core's findGoverning and
 * findOverallGoverning, the one rule (highest utilisation) the bench uses too. Rows are ordered
 * cases first, then combinations, each by location order, which is also the tie-break.
 * A pure function of the loaded data, so its output can be paged.
 */
export function buildComparison(input: ComparisonInput): Comparison {
  const allowables = coreAllowables(input.allowables);
  const pending: {
    base: RowBase;
    location: ComparisonInput["locations"][number];
    tensorPa: StressTensor;
    allowableCategory: string | null;
  }[] = [];
  const skipped: Comparison["skipped"] = [];

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
      pending.push({
        base: {
          rowId: `case:${c.id}:${location.id}`,
          kind: "load-case",
          caseId: c.id,
          caseName: c.name,
          category: c.category,
          caseVersion: c.version,
          stateRevision: state.revision,
        },
        location,
        tensorPa: componentsPaOf(state),
        allowableCategory: c.category,
      });
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
      pending.push({
        base: {
          rowId: `combination:${combo.id}:${location.id}`,
          kind: "combination",
          caseId: combo.id,
          caseName: combo.name,
          category: "combination",
          caseVersion: combo.version,
          stateRevision: null,
        },
        location,
        tensorPa: result.tensorPa,
        allowableCategory: null,
      });
    }
  }

  const specs = pending.map((p) => {
    const requirements = requirementsFor(allowables, p.allowableCategory);
    return { tensor: p.tensorPa, material: p.location.material.strengths, requirements };
  });
  const evaluations = evaluateStates(specs, { includeUnsuited: input.includeUnsuitedCriteria });

  const rows: ComparisonRowView[] = [];
  const coreRows: ComparisonRow[] = [];
  pending.forEach((p, k) => {
    const evaluation = evaluations[k];
    // The category whose factors apply to any criterion of this row (null: every factor is the default's).
    const used = specs[k].requirements.find((r) => r.category !== null)?.category ?? null;
    coreRows.push({ caseId: p.base.rowId, locationId: p.location.id, evaluation });
    rows.push({
      ...p.base,
      locationId: p.location.id,
      locationName: p.location.name,
      allowable: {
        category: used,
        label:
          p.base.kind === "combination"
            ? `${allowableLabel(null)} (a combination has no category)`
            : used === null && p.allowableCategory?.trim()
              ? `${allowableLabel(null)} (no factors given for “${p.allowableCategory.trim()}”)`
              : allowableLabel(used),
      },
      material: {
        label: p.location.material.label,
        kind: p.location.material.kind,
        note: p.location.material.note,
      },
      componentsPa: { ...p.tensorPa },
      principalPa: evaluation.principal,
      vonMisesPa: evaluation.vonMises,
      trescaPa: evaluation.tresca,
      maxShearPa: evaluation.maxShear,
      checks: evaluation.checks.map(checkView),
    });
  });

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
      category: g.check.category,
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
  const top = findOverallGoverning(coreRows);
  const cautions = [RESULTS_CAUTION, STRENGTHS_CAUTION];
  if (input.combinations.length > 0) cautions.push(SUPERPOSITION_CAUTION);
  return {
    projectId: input.projectId,
    requirements: input.allowables.requirements,
    categoryRequirements: input.allowables.categoryRequirements,
    includeUnsuitedCriteria: input.includeUnsuitedCriteria,
    rows,
    governing,
    governingByLocation,
    governingOverall: top ? view(top) : null,
    summary: top ? `governs: ${governingSentence(view(top))}` : null,
    skipped,
    cautions,
  };
}

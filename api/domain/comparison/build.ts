import { RESULTS_CAUTION } from "../../../core/contract/cautions";
import {
  combinePacked,
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
import { componentsPaOf } from "../../../db/repositories/stress-states";
import type { StoredTerm } from "../combinations/superpose";
import type { ResolvedMaterial } from "../materials/resolve";
import type { ComparisonPointTable } from "./point-tables";

// Long because building the comparison's rows, its superposition over packed states and the
// governing search share the input's indexes; paging.ts cuts the work into runs.

/** A current stress state as the comparison reads it: its revision and six components in Pa. */
export type ComparisonState = {
  loadCaseId: string;
  locationId: string;
  revision: number;
  xxPa: number;
  yyPa: number;
  zzPa: number;
  xyPa: number;
  yzPa: number;
  zxPa: number;
};

/** The key of a state in `ComparisonInput.states`. */
export function stateKey(loadCaseId: string, locationId: string): string {
  return `${loadCaseId}:${locationId}`;
}

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
  states: Map<string, ComparisonState>;
  combinations: { id: string; name: string; version: number; terms: StoredTerm[] }[];
  /** The project's finite-element point tables with their stored evaluations (paging.ts adds their section). */
  pointTables?: ComparisonPointTable[];
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

/**
 * Every current state of `states`, per location, packed six components apiece for core's
 * combinePacked, with each case's place in the packing (`has` marks the cases with a state at
 * that location). Kept per states map: the paging computes a comparison in many runs that share
 * one map, and packing it again for every run cost as much as the superposition it saves.
 */
const packedByStates = new WeakMap<ComparisonInput["states"], PackedStates>();
type PackedStates = {
  caseIndex: Map<string, number>;
  byLocation: Map<string, { packed: Float64Array; has: Uint8Array }>;
};

function packStates(states: ComparisonInput["states"]): PackedStates {
  const cached = packedByStates.get(states);
  if (cached) return cached;
  const caseIndex = new Map<string, number>();
  for (const state of states.values()) {
    if (!caseIndex.has(state.loadCaseId)) caseIndex.set(state.loadCaseId, caseIndex.size);
  }
  const byLocation = new Map<string, { packed: Float64Array; has: Uint8Array }>();
  for (const state of states.values()) {
    let at = byLocation.get(state.locationId);
    if (!at) {
      at = { packed: new Float64Array(6 * caseIndex.size), has: new Uint8Array(caseIndex.size) };
      byLocation.set(state.locationId, at);
    }
    const i = caseIndex.get(state.loadCaseId)!;
    const t = componentsPaOf(state);
    at.packed.set([t.xx, t.yy, t.zz, t.xy, t.yz, t.zx], 6 * i);
    at.has[i] = 1;
  }
  const packed = { caseIndex, byLocation };
  packedByStates.set(states, packed);
  return packed;
}

const NO_STATES = { packed: new Float64Array(0), has: new Uint8Array(0) };

type RowBase = Pick<
  ComparisonRowView,
  "rowId" | "kind" | "caseId" | "caseName" | "category" | "caseVersion" | "stateRevision"
>;

/**
 * Every load case and combination at every location, evaluated in one call of core's evaluator
 * (`evaluateStates`, on the batch kernel) against the location's material and the factors of
 * the row's load-case category (core's `requirementsFor`; combinations, which have no category,
 * take the project default); combinations superposed with core's combinePacked; the governing
 * row per criterion (overall and per location) and the summary chosen by core's findGoverning and
 * findOverallGoverning, the one rule (highest utilisation) the bench uses too. Rows are ordered
 * cases first, then combinations, each by location order, which is also the tie-break.
 * A pure function of the loaded data, so its output can be paged.
 */
export function buildComparison(input: ComparisonInput): Comparison {
  return buildComparisonWindow(input, { from: 0, to: Infinity }).comparison;
}

/**
 * {@link buildComparison} that writes out only the rows in [window.from, window.to) (0-based, in
 * the comparison's order) while every row still counts for the governing results; `rowCount` is
 * the number of rows there are. Writing a row out (its checks, labels and copies) took about as
 * long as evaluating it and made most of the garbage, so a page of a large project writes only
 * its own rows: measured on 100 locations × (100 cases + 100 combinations) = 20 000 rows,
 * 1.9–2.6 s writing every row vs the figure in the commit that introduced this.
 */
export function buildComparisonWindow(
  input: ComparisonInput,
  window: { from: number; to: number },
): { comparison: Comparison; rowCount: number } {
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
      const state = input.states.get(stateKey(c.id, location.id));
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
  const packedStates = packStates(input.states);
  const sum = new Float64Array(6);
  for (const combo of input.combinations) {
    // -1: no state of this case anywhere (so none at any location).
    const indices = combo.terms.map((t) => packedStates.caseIndex.get(t.loadCaseId) ?? -1);
    const factors = combo.terms.map((t) => t.factor);
    for (const location of input.locations) {
      const { packed, has } = packedStates.byLocation.get(location.id) ?? NO_STATES;
      const missing = combo.terms.filter((t, k) => !t.live || indices[k] < 0 || !has[indices[k]]);
      if (missing.length > 0) {
        skipped.push({
          caseName: combo.name,
          locationName: location.name,
          reason: `no state here for ${missing.map((m) => `"${m.loadCaseName}"`).join(", ")}`,
        });
        continue;
      }
      combinePacked(packed, indices, factors, sum);
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
        tensorPa: { xx: sum[0], yy: sum[1], zz: sum[2], xy: sum[3], yz: sum[4], zx: sum[5] },
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
    if (k < window.from || k >= window.to) return;
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

  const byRowId = new Map(pending.map((p) => [p.base.rowId, p]));
  const view = (g: Governing): GoverningView => {
    const row = byRowId.get(g.caseId)!;
    return {
      criterion: g.criterion,
      rowId: row.base.rowId,
      caseName: row.base.caseName,
      locationName: row.location.name,
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
  const comparison: Comparison = {
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
  return { comparison, rowCount: pending.length };
}

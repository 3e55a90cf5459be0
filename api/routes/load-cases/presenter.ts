import type { Transaction } from "sequelize";
import { convertStress } from "../../../core";
import type {
  Components,
  LoadCase as LoadCaseView,
  StateSource,
  StressState as StateView,
} from "../../../core/contract/load-cases";
import type { StressUnitName } from "../../../core/contract/materials";
import type { LoadCaseRow } from "../../../db/repositories/load-cases";
import { componentsPaOf, currentStatesOf, type StressStateRow } from "../../../db/repositories/stress-states";
import { peopleById, personOf, type PersonRef } from "../../domain/projects/people";

const KEYS = ["xx", "yy", "zz", "xy", "yz", "zx"] as const;

/** A saved state revision as the API sends it: Pa as stored, and the same in the entered unit. */
export function presentState(s: StressStateRow, people: Map<string, PersonRef>): StateView {
  const pa = componentsPaOf(s);
  const unit = s.unit as StressUnitName;
  const inUnit = Object.fromEntries(KEYS.map((k) => [k, convertStress(pa[k], "Pa", unit)])) as Components;
  return {
    id: s.id,
    locationId: s.locationId,
    revision: s.revision,
    unit,
    components: inUnit,
    componentsPa: pa,
    source: s.source as StateSource,
    note: s.note,
    calculator: s.calculator ?? null,
    savedAt: s.createdAt.toISOString(),
    savedBy: personOf(people, s.createdBy),
  };
}

/** A load case with its current states as the API sends it. */
export function presentLoadCase(
  c: LoadCaseRow,
  states: StressStateRow[],
  people: Map<string, PersonRef>,
): LoadCaseView {
  return {
    id: c.id,
    projectId: c.projectId,
    name: c.name,
    category: c.category,
    description: c.description,
    position: c.position,
    version: c.version,
    states: states.map((s) => presentState(s, people)),
    createdAt: c.createdAt.toISOString(),
    updatedAt: c.updatedAt.toISOString(),
    updatedBy: personOf(people, c.updatedBy ?? c.createdBy),
  };
}

/** Loads the current states and the people named (inside `transaction` when given), then presents the cases. */
export async function presentLoadCases(cases: LoadCaseRow[], transaction?: Transaction) {
  const states = await currentStatesOf(
    cases.map((c) => c.id),
    transaction,
  );
  const people = await peopleById(
    [...cases.flatMap((c) => [c.updatedBy, c.createdBy]), ...states.map((s) => s.createdBy)],
    transaction,
  );
  return cases.map((c) =>
    presentLoadCase(
      c,
      states.filter((s) => s.loadCaseId === c.id),
      people,
    ),
  );
}

/** The fields the audit trail compares for a load case (its states are audited one by one). */
export function loadCaseAuditFields(c: LoadCaseRow) {
  return { name: c.name, category: c.category, description: c.description };
}

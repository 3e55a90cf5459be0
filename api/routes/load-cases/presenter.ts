import type { Transaction } from "sequelize";
import type { LoadCase as LoadCaseView } from "../../../core/contract/load-cases";
import type { LoadCase } from "../../../db/models/load-case";
import type { StressState } from "../../../db/models/stress-state";
import { peopleById, personOf, type PersonRef } from "../../domain/projects/people";
import { currentStatesOf, presentState } from "../../domain/load-cases/states";

/** A load case with its current states as the API sends it. */
export function presentLoadCase(
  c: LoadCase,
  states: StressState[],
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
export async function presentLoadCases(cases: LoadCase[], transaction?: Transaction) {
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
export function loadCaseAuditFields(c: LoadCase) {
  return { name: c.name, category: c.category, description: c.description };
}

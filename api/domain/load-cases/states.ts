import type { Transaction } from "sequelize";
import type { User } from "lucia";
import { convertStress, type StressUnit } from "../../../core";
import type { Components, StateInput } from "../../../core/contract/load-cases";
import { liveLocationIdsAmong } from "../../../db/repositories/locations";
import {
  componentsPaOf,
  retireCurrentState,
  writeStressStates,
  type StressStateRow,
} from "../../../db/repositories/stress-states";
import { errors } from "../../errors";
import { recordAudit } from "../audit/record";

/** Six components entered in `unit`, in Pa (as they are stored). */
export function componentsInPa(components: Components, unit: StressUnit): Components {
  const pa = (v: number) => convertStress(v, unit, "Pa");
  return {
    xx: pa(components.xx),
    yy: pa(components.yy),
    zz: pa(components.zz),
    xy: pa(components.xy),
    yz: pa(components.yz),
    zx: pa(components.zx),
  };
}

/**
 * Refuses (400, naming each field) location ids that are not live locations of the project.
 * @param fields the field path of each id, e.g. "states.0.locationId"
 */
export async function assertProjectLocations(
  projectId: string,
  ids: string[],
  fields: string[],
  transaction?: Transaction,
): Promise<void> {
  if (ids.length === 0) return;
  const known = await liveLocationIdsAmong(projectId, ids, transaction);
  const problems = ids
    .map((id, i) =>
      known.has(id) ? null : { path: fields[i], message: "is not a location of this project" },
    )
    .filter((p) => p !== null);
  if (problems.length) throw errors.invalidInput(problems);
}

/** Where a change happened, for the audit trail. */
export type StateScope = { workspaceId: string; projectId: string; caseName: string; locationName?: string };

/**
 * Saves a state as a new immutable revision: the previous current row (if any) stops being
 * current and the new row gets the next revision number. Audited in `transaction`.
 */
export async function saveStateRevision(
  transaction: Transaction,
  user: User,
  loadCaseId: string,
  input: StateInput,
  scope: StateScope,
): Promise<StressStateRow> {
  const [{ saved, previous }] = await writeStressStates(
    [
      {
        loadCaseId,
        locationId: input.locationId,
        componentsPa: componentsInPa(input.stress.components, input.stress.unit),
        unit: input.stress.unit,
        source: input.source,
        note: input.note,
        calculator: input.calculator,
        createdBy: user.id,
      },
    ],
    transaction,
  );
  await recordAudit(transaction, user, {
    workspaceId: scope.workspaceId,
    projectId: scope.projectId,
    entityType: "stress-state",
    entityId: saved.id,
    action: previous ? "update" : "create",
    summary: `${previous ? "changed" : "entered"} the state of "${scope.caseName}" at "${scope.locationName ?? "a location"}" (revision ${saved.revision}, ${input.source}${input.calculator ? `, ${input.calculator.name} calculator` : ""})`,
    changes: {
      loadCaseId,
      locationId: input.locationId,
      revision: saved.revision,
      fromPa: previous ? componentsPaOf(previous) : null,
      toPa: componentsPaOf(saved),
      unit: input.stress.unit,
      ...(input.calculator ? { calculator: input.calculator } : {}),
    },
  });
  return saved;
}

/** Takes a location's state out of a case (its revisions stay for the record). Audited. */
export async function removeState(
  transaction: Transaction,
  user: User,
  loadCaseId: string,
  locationId: string,
  scope: StateScope,
): Promise<boolean> {
  const current = await retireCurrentState(loadCaseId, locationId, transaction);
  if (!current) return false;
  await recordAudit(transaction, user, {
    workspaceId: scope.workspaceId,
    projectId: scope.projectId,
    entityType: "stress-state",
    entityId: current.id,
    action: "delete",
    summary: `removed the state of "${scope.caseName}" at "${scope.locationName ?? "a location"}"`,
    changes: { loadCaseId, locationId, fromPa: componentsPaOf(current) },
  });
  return true;
}

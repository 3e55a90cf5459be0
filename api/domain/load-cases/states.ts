import { literal, Op, type Transaction } from "sequelize";
import type { User } from "lucia";
import { convertStress, type StressUnit } from "../../../core";
import type {
  Components,
  StateInput,
  StateSource,
  StressState as StateView,
} from "../../../core/contract/load-cases";
import type { StressUnitName } from "../../../core/contract/materials";
import { Location } from "../../../db/models/location";
import { StressState } from "../../../db/models/stress-state";
import { errors } from "../../errors";
import { recordAudit } from "../audit/record";
import { personOf, type PersonRef } from "../projects/people";

const KEYS = ["xx", "yy", "zz", "xy", "yz", "zx"] as const;

/** A stored row's six components in Pa. */
export function componentsPaOf(s: StressState): Components {
  return { xx: s.xxPa, yy: s.yyPa, zz: s.zzPa, xy: s.xyPa, yz: s.yzPa, zx: s.zxPa };
}

/** Six components in `unit` as the Pa columns they are stored in. */
export function paColumns(components: Components, unit: StressUnit) {
  const pa = (v: number) => convertStress(v, unit, "Pa");
  return {
    xxPa: pa(components.xx),
    yyPa: pa(components.yy),
    zzPa: pa(components.zz),
    xyPa: pa(components.xy),
    yzPa: pa(components.yz),
    zxPa: pa(components.zx),
  };
}

/** A saved state revision as the API sends it: Pa as stored, and the same in the entered unit. */
export function presentState(s: StressState, people: Map<string, PersonRef>): StateView {
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
    savedAt: s.createdAt.toISOString(),
    savedBy: personOf(people, s.createdBy),
  };
}

/**
 * The current revision of every state of these cases at locations not in the trash, in
 * location order (one query: the location's liveness and position are read in it).
 */
export async function currentStatesOf(caseIds: string[], transaction?: Transaction): Promise<StressState[]> {
  if (caseIds.length === 0) return [];
  return StressState.findAll({
    where: {
      loadCaseId: caseIds,
      isCurrent: true,
      locationId: { [Op.in]: literal("(SELECT id FROM locations WHERE deleted_at IS NULL)") },
    },
    order: [
      [literal('(SELECT position FROM locations WHERE locations.id = "StressState"."location_id")'), "ASC"],
      ["createdAt", "ASC"],
    ],
    transaction,
  });
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
  const found = await Location.findAll({
    attributes: ["id"],
    where: { id: { [Op.in]: ids }, projectId, deletedAt: null },
    transaction,
  });
  const known = new Set(found.map((l) => l.id));
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
): Promise<StressState> {
  const previous = await StressState.findOne({
    where: { loadCaseId, locationId: input.locationId, isCurrent: true },
    transaction,
  });
  const last = (await StressState.max("revision", {
    where: { loadCaseId, locationId: input.locationId },
    transaction,
  })) as number | null;
  if (previous) await previous.update({ isCurrent: false }, { transaction });
  const saved = await StressState.create(
    {
      loadCaseId,
      locationId: input.locationId,
      revision: (last ?? 0) + 1,
      isCurrent: true,
      ...paColumns(input.stress.components, input.stress.unit),
      unit: input.stress.unit,
      source: input.source,
      note: input.note,
      createdBy: user.id,
    },
    { transaction },
  );
  await recordAudit(transaction, user, {
    workspaceId: scope.workspaceId,
    projectId: scope.projectId,
    entityType: "stress-state",
    entityId: saved.id,
    action: previous ? "update" : "create",
    summary: `${previous ? "changed" : "entered"} the state of "${scope.caseName}" at "${scope.locationName ?? "a location"}" (revision ${saved.revision}, ${input.source})`,
    changes: {
      loadCaseId,
      locationId: input.locationId,
      revision: saved.revision,
      fromPa: previous ? componentsPaOf(previous) : null,
      toPa: componentsPaOf(saved),
      unit: input.stress.unit,
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
  const current = await StressState.findOne({
    where: { loadCaseId, locationId, isCurrent: true },
    transaction,
  });
  if (!current) return false;
  await current.update({ isCurrent: false }, { transaction });
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

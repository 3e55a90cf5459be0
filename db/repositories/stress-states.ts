import { col, fn, literal, Op, type Transaction } from "sequelize";
import type { CalculatorRecord } from "../../core/constants/calculators";
import type { Components } from "../../core/contract/load-cases";
import { StressState } from "../models/stress-state";
import { toPlain, type Row } from "./plain";

/** A stored revision of a load case's state at a location, as a plain object. */
export type StressStateRow = Row<StressState>;

/** The six stored components of a state row (Pa). */
type PaColumns = Pick<StressStateRow, "xxPa" | "yyPa" | "zzPa" | "xyPa" | "yzPa" | "zxPa">;

/** A stored row's six components in Pa. */
export function componentsPaOf(s: PaColumns): Components {
  return { xx: s.xxPa, yy: s.yyPa, zz: s.zzPa, xy: s.xyPa, yz: s.yzPa, zx: s.zxPa };
}

/** Six components in Pa as the columns they are stored in. */
function paColumnsOf(pa: Components): PaColumns {
  return { xxPa: pa.xx, yyPa: pa.yy, zzPa: pa.zz, xyPa: pa.xy, yzPa: pa.yz, zxPa: pa.zx };
}

/** A state to store: where, the six components already in Pa, and the unit they were entered in. */
export type NewStressState = {
  loadCaseId: string;
  locationId: string;
  componentsPa: Components;
  unit: string;
  source: string;
  note: string;
  /** the calculator and its inputs that produced the state; null or left out when it came from elsewhere */
  calculator?: CalculatorRecord | null;
  createdBy: string | null;
};

/** What writing one state did: the row stored, and the row that was current before it (or null). */
export type WrittenState = { saved: StressStateRow; previous: StressStateRow | null };

const pairKey = (s: { loadCaseId: string; locationId: string }) => `${s.loadCaseId}:${s.locationId}`;

/**
 * The one writer of `stress_states` rows, for the API's saves, the project import and the
 * demo seed: each state becomes the next revision of its (load case, location) pair and
 * its only current row; the row current before stops being current (rows are otherwise
 * never changed, so the history stays). States are taken in order, so a pair named twice
 * ends at the later one. Four statements whatever the count: the current rows, the last
 * revisions, retiring the replaced rows, one insert.
 */
export async function writeStressStates(
  states: NewStressState[],
  transaction?: Transaction,
): Promise<WrittenState[]> {
  if (states.length === 0) return [];
  const where = {
    loadCaseId: [...new Set(states.map((s) => s.loadCaseId))],
    locationId: [...new Set(states.map((s) => s.locationId))],
  };
  const currentRows = await StressState.findAll({ where: { ...where, isCurrent: true }, transaction });
  const maxima = (await StressState.findAll({
    attributes: ["loadCaseId", "locationId", [fn("max", col("revision")), "revision"]],
    where,
    group: ["loadCaseId", "locationId"],
    raw: true,
    transaction,
  })) as unknown as { loadCaseId: string; locationId: string; revision: number }[];

  const current = new Map(currentRows.map((r) => [pairKey(r), toPlain(r)]));
  const lastRevision = new Map(maxima.map((m) => [pairKey(m), Number(m.revision)]));
  const retire: string[] = [];
  const pending: { values: Omit<StressStateRow, "id" | "createdAt">; previous: StressStateRow | null }[] = [];
  const pendingByPair = new Map<string, (typeof pending)[number]>();
  for (const s of states) {
    const key = pairKey(s);
    const earlier = pendingByPair.get(key);
    let previous = current.get(key) ?? null;
    if (earlier) {
      // The same pair earlier in this call: that new row is the one replaced.
      earlier.values.isCurrent = false;
      previous = null;
    } else if (previous) {
      retire.push(previous.id);
    }
    const revision = (lastRevision.get(key) ?? 0) + 1;
    lastRevision.set(key, revision);
    const entry = {
      values: {
        loadCaseId: s.loadCaseId,
        locationId: s.locationId,
        revision,
        isCurrent: true,
        ...paColumnsOf(s.componentsPa),
        unit: s.unit,
        source: s.source,
        note: s.note,
        calculator: s.calculator ?? null,
        createdBy: s.createdBy,
      },
      previous: previous && { ...previous, isCurrent: false },
    };
    pending.push(entry);
    pendingByPair.set(key, entry);
  }
  if (retire.length > 0) {
    await StressState.update({ isCurrent: false }, { where: { id: retire }, transaction });
  }
  // individualHooks: a row's create hooks run as they would for StressState.create (the app
  // defines none; a test adds one to fail an import halfway through).
  const created = await StressState.bulkCreate(
    pending.map((p) => p.values),
    { transaction, returning: true, individualHooks: true },
  );
  // A pair named twice: the later state's previous row is the earlier one, as stored.
  const saved = created.map(toPlain);
  const seen = new Map<string, StressStateRow>();
  return saved.map((row, i) => {
    const key = pairKey(row);
    const previous = seen.get(key) ?? pending[i].previous;
    seen.set(key, row);
    return { saved: row, previous };
  });
}

/**
 * Takes the current row of a load case at a location out of the case (it stays for the
 * record, no longer current) and returns it as it was, or null when the case had no state there.
 */
export async function retireCurrentState(
  loadCaseId: string,
  locationId: string,
  transaction?: Transaction,
): Promise<StressStateRow | null> {
  const current = await StressState.findOne({
    where: { loadCaseId, locationId, isCurrent: true },
    transaction,
  });
  if (!current) return null;
  const before = toPlain(current);
  await StressState.update({ isCurrent: false }, { where: { id: current.id }, transaction });
  return before;
}

/**
 * The current revision of every state of these cases at locations not in the trash, in
 * location order (one query: the location's liveness and position are read in it).
 */
export async function currentStatesOf(
  caseIds: string[],
  transaction?: Transaction,
): Promise<StressStateRow[]> {
  if (caseIds.length === 0) return [];
  const rows = await StressState.findAll({
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
  return rows.map(toPlain);
}

/** Every revision of a load case's state at a location, newest first. */
export async function stateRevisions(
  loadCaseId: string,
  locationId: string,
  transaction?: Transaction,
): Promise<StressStateRow[]> {
  const rows = await StressState.findAll({
    where: { loadCaseId, locationId },
    order: [["revision", "DESC"]],
    transaction,
  });
  return rows.map(toPlain);
}

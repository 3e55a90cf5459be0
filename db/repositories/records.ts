import { Op, type Transaction } from "sequelize";
import { CalculationRecord, type RecordStatus } from "../models/calculation-record";
import { Project } from "../models/project";
import { RecordApproval } from "../models/record-approval";
import { RecordComment } from "../models/record-comment";
import { RecordEvent } from "../models/record-event";
import { lockOf, toPlain, toPlainOrNull, type ReadOptions, type Row } from "./plain";

/** A calculation record with its frozen content, as a plain object. */
export type RecordRow = Row<CalculationRecord>;
/** A record without its content (lists and summaries need no megabytes of JSON). */
export type RecordHeadRow = Omit<RecordRow, "content">;
export type RecordEventRow = Row<RecordEvent>;
export type RecordCommentRow = Row<RecordComment>;
export type RecordApprovalRow = Row<RecordApproval>;

/** What submitting freezes; status, id and timestamps are set here or by the table. */
export type NewRecord = Omit<
  RecordRow,
  | "id"
  | "status"
  | "returnedBy"
  | "returnedByName"
  | "returnedAt"
  | "returnComment"
  | "approvedAt"
  | "scope"
  | "createdAt"
  | "updatedAt"
>;

/** Every column but the content. */
const HEAD_ATTRIBUTES = { exclude: ["content"] };

/** The record `recordId` of `projectId` with its content (locked FOR UPDATE with `lock`), or null. */
export async function findRecord(
  projectId: string,
  recordId: string,
  options: ReadOptions = {},
): Promise<RecordRow | null> {
  const row = await CalculationRecord.findOne({
    where: { id: recordId, projectId },
    transaction: options.transaction,
    lock: lockOf(options),
  });
  return toPlainOrNull(row);
}

/** The record `recordId` of `projectId` without its content (locked FOR UPDATE with `lock`), or null. */
export async function findRecordHead(
  projectId: string,
  recordId: string,
  options: ReadOptions = {},
): Promise<RecordHeadRow | null> {
  const row = await CalculationRecord.findOne({
    attributes: HEAD_ATTRIBUTES,
    where: { id: recordId, projectId },
    transaction: options.transaction,
    lock: lockOf(options),
  });
  return toPlainOrNull(row) as RecordHeadRow | null;
}

/** The project's records without content, newest (highest number) first. */
export async function listRecordHeads(
  projectId: string,
  transaction?: Transaction,
): Promise<RecordHeadRow[]> {
  const rows = await CalculationRecord.findAll({
    attributes: HEAD_ATTRIBUTES,
    where: { projectId },
    order: [["number", "DESC"]],
    transaction,
  });
  return rows.map((r) => toPlain(r) as RecordHeadRow);
}

/** The record numbered just below `number` in the project (the one before it), with content, or null. */
export async function previousRecord(
  projectId: string,
  number: number,
  transaction?: Transaction,
): Promise<RecordRow | null> {
  const row = await CalculationRecord.findOne({
    where: { projectId, number: { [Op.lt]: number } },
    order: [["number", "DESC"]],
    transaction,
  });
  return toPlainOrNull(row);
}

/** The project's newest approved record with its content, or null. */
export async function lastApprovedRecord(
  projectId: string,
  transaction?: Transaction,
): Promise<RecordRow | null> {
  const row = await CalculationRecord.findOne({
    where: { projectId, status: "approved" },
    order: [["number", "DESC"]],
    transaction,
  });
  return toPlainOrNull(row);
}

/** Freezes a new record as submitted. */
export async function insertRecord(values: NewRecord, transaction?: Transaction): Promise<RecordRow> {
  return toPlain(await CalculationRecord.create({ ...values, status: "submitted" }, { transaction }));
}

/**
 * Moves the record `id` to `status` with the columns that go with it (who returned it, when it
 * was approved). What was frozen cannot be passed: the table's trigger refuses it anyway.
 */
export async function setRecordStatus(
  id: string,
  values: { status: RecordStatus } & Partial<
    Pick<RecordRow, "returnedBy" | "returnedByName" | "returnedAt" | "returnComment" | "approvedAt">
  >,
  transaction?: Transaction,
): Promise<RecordHeadRow> {
  const [, rows] = await CalculationRecord.update(values, { where: { id }, returning: true, transaction });
  const { content: _content, ...head } = toPlain(rows[0]);
  return head;
}

/** The project's records that are returned (about to be superseded by a new submission), without content. */
export async function returnedRecordHeads(
  projectId: string,
  transaction?: Transaction,
): Promise<RecordHeadRow[]> {
  const rows = await CalculationRecord.findAll({
    attributes: HEAD_ATTRIBUTES,
    where: { projectId, status: "returned" },
    transaction,
  });
  return rows.map((r) => toPlain(r) as RecordHeadRow);
}

/** Writes one dated, signed status change. */
export async function insertRecordEvent(
  values: Omit<RecordEventRow, "id" | "createdAt">,
  transaction?: Transaction,
): Promise<RecordEventRow> {
  return toPlain(await RecordEvent.create(values, { transaction }));
}

/** A record's status changes, oldest first. */
export async function recordEventsOf(recordId: string, transaction?: Transaction): Promise<RecordEventRow[]> {
  const rows = await RecordEvent.findAll({ where: { recordId }, order: [["id", "ASC"]], transaction });
  return rows.map(toPlain);
}

export async function insertRecordComment(
  values: Omit<RecordCommentRow, "id" | "createdAt">,
  transaction?: Transaction,
): Promise<RecordCommentRow> {
  return toPlain(await RecordComment.create(values, { transaction }));
}

/** A record's comments, oldest first. */
export async function recordCommentsOf(
  recordId: string,
  transaction?: Transaction,
): Promise<RecordCommentRow[]> {
  const rows = await RecordComment.findAll({
    where: { recordId },
    order: [
      ["createdAt", "ASC"],
      ["id", "ASC"],
    ],
    transaction,
  });
  return rows.map(toPlain);
}

/** The comment `commentId` of the record `recordId`, or null. */
export async function findRecordComment(
  recordId: string,
  commentId: string,
  transaction?: Transaction,
): Promise<RecordCommentRow | null> {
  return toPlainOrNull(await RecordComment.findOne({ where: { id: commentId, recordId }, transaction }));
}

export async function insertRecordApproval(
  values: Omit<RecordApprovalRow, "id" | "createdAt">,
  transaction?: Transaction,
): Promise<RecordApprovalRow> {
  return toPlain(await RecordApproval.create(values, { transaction }));
}

/** The approvals of these records, oldest first, by record id (every id present). */
export async function approvalsOf(
  recordIds: string[],
  transaction?: Transaction,
): Promise<Map<string, RecordApprovalRow[]>> {
  const byRecord = new Map<string, RecordApprovalRow[]>(recordIds.map((id) => [id, []]));
  if (recordIds.length === 0) return byRecord;
  const rows = await RecordApproval.findAll({
    where: { recordId: recordIds },
    order: [
      ["createdAt", "ASC"],
      ["id", "ASC"],
    ],
    transaction,
  });
  for (const r of rows) byRecord.get(r.recordId)!.push(toPlain(r));
  return byRecord;
}

/**
 * Sets how many approvals the project's records need. Silent: not an input of the calculation,
 * so neither the project's version nor its "last changed" moves.
 */
export async function setRequiredApprovals(
  projectId: string,
  requiredApprovals: number,
  transaction?: Transaction,
): Promise<void> {
  await Project.update({ requiredApprovals }, { where: { id: projectId }, silent: true, transaction });
}

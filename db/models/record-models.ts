import type { Sequelize } from "sequelize";
import { initCalculationRecord } from "./calculation-record";
import { initRecordApproval } from "./record-approval";
import { initRecordComment } from "./record-comment";
import { initRecordEvent } from "./record-event";

/**
 * Registers the calculation-record models (records, their events, comments and approvals).
 * Queries join them explicitly by id, so no associations are declared.
 */
export function initRecordModels(sequelize: Sequelize) {
  return {
    CalculationRecord: initCalculationRecord(sequelize),
    RecordEvent: initRecordEvent(sequelize),
    RecordComment: initRecordComment(sequelize),
    RecordApproval: initRecordApproval(sequelize),
  };
}

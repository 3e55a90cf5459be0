import type { LinearizationSummary, LinearizationView } from "../../../core/contract/linearizations";
import type { LinearizationRow } from "../../../db/repositories/linearizations";
import {
  computeLinearization,
  type StoredLinearizationInput,
  type StoredSummary,
} from "../../domain/linearizations/compute";
import { personOf, type PersonRef } from "../../domain/projects/people";

/** The stored document of a row, as the types say it was written. */
export const inputOfRow = (row: LinearizationRow) => row.input as unknown as StoredLinearizationInput;
export const summaryOfRow = (row: LinearizationRow) => row.summary as unknown as StoredSummary;

/**
 * A saved line as the API sends it: its inputs and the result the server computes from them now,
 * with the allowables kept at its last save.
 */
export function presentLinearization(
  row: LinearizationRow,
  people: Map<string, PersonRef>,
): LinearizationView {
  const input = inputOfRow(row);
  return {
    id: row.id,
    projectId: row.projectId,
    loadCaseId: row.loadCaseId,
    locationId: row.locationId,
    name: row.name,
    version: row.version,
    input,
    result: computeLinearization(input, summaryOfRow(row).allowables),
    createdAt: row.createdAt.toISOString(),
    updatedAt: row.updatedAt.toISOString(),
    updatedBy: personOf(people, row.updatedBy ?? row.createdBy),
  };
}

/** A line in a list: no points, its checks from the last save. */
export function presentLinearizationSummary(row: LinearizationRow): LinearizationSummary {
  const { classification, equivalent, stressUnit, pointCount, checks } = summaryOfRow(row);
  return {
    id: row.id,
    loadCaseId: row.loadCaseId,
    locationId: row.locationId,
    name: row.name,
    version: row.version,
    classification,
    equivalent,
    stressUnit,
    pointCount,
    checks,
    updatedAt: row.updatedAt.toISOString(),
  };
}

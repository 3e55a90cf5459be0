import type {
  PointTableEvaluationSummary,
  PointTableEvaluationView,
  PointTableView,
} from "../../../core/contract/point-tables";
import type { PointTableRow } from "../../../db/repositories/point-tables";
import { personOf, type PersonRef } from "../../domain/projects/people";

/** The evaluation as lists carry it: without the histogram and the worst points. */
export function evaluationSummaryOf(e: PointTableEvaluationView): PointTableEvaluationSummary {
  const { histogram: _histogram, worst: _worst, ...summary } = e;
  return summary;
}

/** A table as the API sends it; the fields that leave the server are listed here. */
export function presentPointTable(
  t: PointTableRow,
  people: Map<string, PersonRef>,
  evaluation: PointTableEvaluationSummary | PointTableEvaluationView | null,
): PointTableView {
  return {
    id: t.id,
    loadCaseId: t.loadCaseId,
    status: t.status,
    fileName: t.fileName,
    sizeBytes: t.sizeBytes,
    sha256: t.sha256,
    layout: {
      separator: t.layout.separator,
      decimal: t.layout.decimal,
      skipRows: t.layout.skipRows,
      header: t.layout.header,
    },
    columns: t.columns,
    unit: t.unit as PointTableView["unit"],
    idKind: t.idKind,
    pointCount: t.pointCount,
    hasCoordinates: t.hasCoordinates,
    badRows: t.badRows,
    createdAt: t.createdAt.toISOString(),
    createdBy: personOf(people, t.createdBy),
    evaluation,
  };
}

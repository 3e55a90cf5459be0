export type {
  BadRow,
  BadRows,
  PointColumns,
  PointTable,
  PointTableDecimal,
  PointTableLayout,
  PointTableOptions,
  PointTableSeparator,
} from "./types";
export { PointTableParser, estimateRows, parsePointTable } from "./parse-point-table";
export { splitLine } from "./split-line";
export { lineCuts, mergePointTables } from "./merge-point-tables";
export type { ColumnGuess, LayoutGuess } from "./guess-layout";
export { guessColumns, guessLayout } from "./guess-layout";
export type {
  CriterionOverTable,
  GoverningPoint,
  PointEvaluationOptions,
  PointTableEvaluation,
  PointTableSpec,
  UtilisationHistogram,
} from "./evaluate-point-table";
export {
  EVALUATION_CHUNK,
  PointTableEvaluator,
  UTILISATION_BIN_WIDTH,
  UTILISATION_HISTOGRAM_MAX,
  WORST_POINTS,
  evaluatePointTable,
} from "./evaluate-point-table";

import {
  POINT_TABLE_LIMITS,
  pointTableLimitMessage,
  type PointTableLimitName,
} from "../../../core/contract/limits";
import { HttpError } from "../../errors";

/**
 * The refusal of a point table past one of POINT_TABLE_LIMITS: 413 `point_table_too_large` for
 * a file too big for one table (bytes, rows), 400 `point_table_limit` for one table too many in a
 * load case or project; the message names the limit and its number, `details` the limit, its
 * maximum, what was asked and the field.
 */
export function pointTableLimitError(
  limit: PointTableLimitName,
  field: string,
  requested: number,
): HttpError {
  const tooLarge = limit === "bytesPerTable" || limit === "rowsPerTable";
  return new HttpError(
    tooLarge ? 413 : 400,
    tooLarge ? "point_table_too_large" : "point_table_limit",
    pointTableLimitMessage(limit),
    { limit, max: POINT_TABLE_LIMITS[limit], requested, path: field },
  );
}

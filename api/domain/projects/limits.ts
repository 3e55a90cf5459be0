import { limitMessage, PROJECT_LIMITS, type ProjectLimitName } from "../../../core/contract/limits";
import { HttpError } from "../../errors";

/**
 * The 400 for a project that would grow past one of PROJECT_LIMITS: the id `project_limit`,
 * a message that names the limit and its number, and the limit, its maximum and the field
 * in `details`.
 */
export function projectLimitError(limit: ProjectLimitName, field: string, requested: number): HttpError {
  return new HttpError(400, "project_limit", limitMessage(limit), {
    limit,
    max: PROJECT_LIMITS[limit],
    requested,
    path: field,
  });
}

/**
 * Refuses (400 `project_limit`) adding `adding` items to the `existing` ones when that goes
 * past the limit. Call it after the project row is locked, so two creates cannot both pass.
 */
export function assertWithinLimit(limit: ProjectLimitName, existing: number, adding: number, field: string) {
  if (existing + adding > PROJECT_LIMITS[limit]) throw projectLimitError(limit, field, existing + adding);
}

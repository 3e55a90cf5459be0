import type { z } from "zod";
import { ApiError, fieldErrorsOf } from "../../../lib/api-client";

/** True when a save was refused because someone saved a newer version first (409). */
export const isVersionConflict = (error: unknown): error is ApiError =>
  error instanceof ApiError && error.status === 409;

/** The version now stored, from a 409's details, or null when the error is not a conflict or has none. */
export function currentVersionOf(error: unknown): number | null {
  if (!isVersionConflict(error)) return null;
  const details = error.details as { currentVersion?: unknown } | undefined;
  return typeof details?.currentVersion === "number" ? details.currentVersion : null;
}

/**
 * What a stale save was refused with: the version now stored and that record, read with the
 * record's own schema; null when the error is not a conflict or its details are not that record.
 */
export function versionConflictOf<T>(
  error: unknown,
  schema: z.ZodType<T>,
): { currentVersion: number; current: T } | null {
  const currentVersion = currentVersionOf(error);
  if (currentVersion === null) return null;
  const current = schema.safeParse((error as ApiError & { details: { current?: unknown } }).details.current);
  return current.success ? { currentVersion, current: current.data } : null;
}

/** True when the server says the record is not there for this user (400 bad id, 404 gone or not a member). */
export const isNotThere = (error: unknown): boolean =>
  error instanceof ApiError && [400, 404].includes(error.status);

/** Every field error of a 400 as one line, "path: message; path: message" ("" when there is none). */
export function fieldErrorSummary(error: unknown): string {
  return Object.entries(fieldErrorsOf(error))
    .map(([path, message]) => `${path}: ${message}`)
    .join("; ");
}

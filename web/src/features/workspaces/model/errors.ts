import { ApiError } from "../../../lib/api-client";

/**
 * True when the server says the workspace or link is not there for this user: 400 (an id or token
 * that cannot be one) or 404 (gone, or not a member — the API does not tell which).
 */
export const isNotThere = (error: unknown): boolean =>
  error instanceof ApiError && [400, 404].includes(error.status);

/** True for a 404 (an invitation replaced by a newer mail, or never sent). */
export const isNotFound = (error: unknown): boolean => error instanceof ApiError && error.status === 404;

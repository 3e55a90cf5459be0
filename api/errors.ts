/**
 * Every error the API sends is one of these: an HTTP status, a stable id clients may
 * switch on, a message a person can act on, and optional details (e.g. field paths).
 */
export class HttpError extends Error {
  override name = "HttpError";
  constructor(
    readonly status: number,
    readonly id: string,
    message: string,
    readonly details?: unknown,
  ) {
    super(message);
  }
}

export type ErrorBody = { error: { id: string; message: string; details?: unknown } };

export const errors = {
  badRequest: (message: string, details?: unknown) => new HttpError(400, "bad_request", message, details),
  invalidInput: (details: unknown) =>
    new HttpError(400, "invalid_input", "Some fields are not valid; see details for each one.", details),
  unauthorized: () => new HttpError(401, "signed_out", "Sign in to do this."),
  forbidden: (message = "Your role in this workspace does not allow this.") =>
    new HttpError(403, "forbidden", message),
  notFound: (what = "This resource") => new HttpError(404, "not_found", `${what} was not found.`),
  routeNotFound: (method: string, path: string) =>
    new HttpError(404, "route_not_found", `There is no API route ${method} ${path}.`),
  conflict: (message: string, details?: unknown) => new HttpError(409, "conflict", message, details),
  /** A check or approval refused because the caller is not independent of the record (says why). */
  independence: (message: string) => new HttpError(403, "independence", message),
  /** Send with a `Retry-After: seconds` header (the rate limiter sets it). */
  tooManyRequests: (retryAfterSeconds: number) =>
    new HttpError(
      429,
      "rate_limited",
      `Too many attempts; try again in ${retryAfterSeconds < 120 ? `${retryAfterSeconds} seconds` : `${Math.ceil(retryAfterSeconds / 60)} minutes`}.`,
      { retryAfterSeconds },
    ),
  /** A conflict with a stable id of its own (e.g. "last_owner", "invitation_expired") that pages switch on. */
  conflictWithId: (id: string, message: string) => new HttpError(409, id, message),
  invalidCredentials: () =>
    new HttpError(401, "invalid_credentials", "That e-mail address and password do not match an account."),
  mailNotSent: (what: string) =>
    new HttpError(
      502,
      "mail_not_sent",
      `${what} was saved, but the mail could not be sent; try sending it again.`,
    ),
  unsupportedMediaType: (message: string) => new HttpError(415, "unsupported_media_type", message),
  payloadTooLarge: (limit: string) =>
    new HttpError(413, "payload_too_large", `The request body is larger than ${limit}.`),
  databaseUnavailable: () =>
    new HttpError(503, "database_unavailable", "The database cannot be reached; try again in a moment."),
};

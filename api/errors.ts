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
  payloadTooLarge: (limit: string) =>
    new HttpError(413, "payload_too_large", `The request body is larger than ${limit}.`),
  databaseUnavailable: () =>
    new HttpError(503, "database_unavailable", "The database cannot be reached; try again in a moment."),
};

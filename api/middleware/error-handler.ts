import type { ErrorRequestHandler } from "express";
import { ZodError } from "zod";
import { errors, HttpError, type ErrorBody } from "../errors";
import { isDatabaseUnavailable } from "./database-unavailable";

/**
 * What body-parser, the router and serve-static throw: http-errors with a status, `expose`
 * set for client errors, and for the body parser a `type` naming what went wrong.
 */
type HttpLibraryError = Error & {
  type?: string;
  status?: number;
  expose?: boolean;
  limit?: number;
  charset?: string;
  encoding?: string;
};

/** Client errors of the libraries in front of the routes, in words a client can act on. */
function fromLibraryError(error: HttpLibraryError, contentEncoding: string): HttpError | null {
  switch (error.type) {
    case "entity.parse.failed":
      return errors.badRequest("The request body is not valid JSON.");
    case "entity.too.large":
      return errors.payloadTooLarge(`${error.limit} bytes`);
    case "charset.unsupported":
      return errors.unsupportedMediaType(
        `The body's charset "${error.charset}" is not accepted; send JSON in UTF-8 (Content-Type: application/json; charset=utf-8).`,
      );
    case "encoding.unsupported":
      return errors.unsupportedMediaType(
        `The Content-Encoding "${error.encoding}" is not accepted; send the body as identity, gzip, deflate or br.`,
      );
  }
  // serve-static reports a missing file under /assets as a 404 error.
  if (error.status === 404) return errors.notFound("This file");
  // Any other client error (a body its Content-Encoding does not decode, an aborted or
  // mis-sized body) keeps the status the library gave it instead of becoming a 500.
  if (error.expose && typeof error.status === "number" && error.status >= 400 && error.status < 500) {
    const decoding = contentEncoding && contentEncoding !== "identity";
    const message = decoding
      ? `The request body does not decode as its Content-Encoding "${contentEncoding}" says (${error.message}).`
      : `The request could not be read (${error.message}).`;
    return new HttpError(error.status, error.status === 400 ? "bad_request" : "request_refused", message);
  }
  return null;
}

/** Turns whatever reached Express into HttpError, so there is one place that shapes errors. */
function toHttpError(error: unknown, contentEncoding: string): HttpError {
  if (error instanceof HttpError) return error;
  if (error instanceof ZodError) {
    return errors.invalidInput(error.issues.map((i) => ({ path: i.path.join("."), message: i.message })));
  }
  if (error instanceof Error) {
    const fromLibrary = fromLibraryError(error as HttpLibraryError, contentEncoding);
    if (fromLibrary) return fromLibrary;
  }
  if (isDatabaseUnavailable(error)) return errors.databaseUnavailable();
  return new HttpError(500, "internal", "Something went wrong on the server; it has been logged.");
}

/** The one error middleware: JSON `{ error: { id, message, details? } }`, 5xx logged with the request id. */
export const errorHandler: ErrorRequestHandler = (error, req, res, _next) => {
  const httpError = toHttpError(error, String(req.headers["content-encoding"] ?? "").toLowerCase());
  if (httpError.status >= 500) req.log?.error({ err: error }, "request failed");
  const body: ErrorBody = { error: { id: httpError.id, message: httpError.message } };
  if (httpError.details !== undefined) body.error.details = httpError.details;
  if (res.headersSent) return;
  res.status(httpError.status).json(body);
};

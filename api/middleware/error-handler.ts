import type { ErrorRequestHandler } from "express";
import { ZodError } from "zod";
import { errors, HttpError, type ErrorBody } from "../errors";

type BodyParserError = Error & { type?: string; status?: number; limit?: number };

/** Turns whatever reached Express into HttpError, so there is one place that shapes errors. */
function toHttpError(error: unknown): HttpError {
  if (error instanceof HttpError) return error;
  if (error instanceof ZodError) {
    return errors.invalidInput(error.issues.map((i) => ({ path: i.path.join("."), message: i.message })));
  }
  const parserError = error as BodyParserError;
  if (parserError?.type === "entity.parse.failed")
    return errors.badRequest("The request body is not valid JSON.");
  if (parserError?.type === "entity.too.large") return errors.payloadTooLarge(`${parserError.limit} bytes`);
  // serve-static reports a missing file under /assets as a 404 error.
  if (parserError?.status === 404) return errors.notFound("This file");
  const name = (error as Error)?.name ?? "";
  if (name.startsWith("SequelizeConnection") || name === "SequelizeHostNotFoundError") {
    return errors.databaseUnavailable();
  }
  return new HttpError(500, "internal", "Something went wrong on the server; it has been logged.");
}

/** The one error middleware: JSON `{ error: { id, message, details? } }`, 5xx logged with the request id. */
export const errorHandler: ErrorRequestHandler = (error, req, res, _next) => {
  const httpError = toHttpError(error);
  if (httpError.status >= 500) req.log?.error({ err: error }, "request failed");
  const body: ErrorBody = { error: { id: httpError.id, message: httpError.message } };
  if (httpError.details !== undefined) body.error.details = httpError.details;
  if (res.headersSent) return;
  res.status(httpError.status).json(body);
};

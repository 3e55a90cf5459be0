import type { RequestHandler } from "express";
import { errors } from "../errors";

const SAFE_METHODS = new Set(["GET", "HEAD", "OPTIONS"]);

/**
 * Cross-site request forgery guard: every state-changing request must carry an `Origin`
 * header equal to the app's own origin (`allowedOrigin()`, read per request because with
 * PORT=0 it is known only once the server listens). Browsers always send Origin on
 * POST/PATCH/DELETE from fetch, so a missing one means a non-browser client, which must
 * set it too. Together with SameSite=Lax cookies this closes the classic CSRF paths.
 */
export function originCheck(allowedOrigin: () => string): RequestHandler {
  return (req, _res, next) => {
    if (SAFE_METHODS.has(req.method)) return next();
    const origin = req.headers.origin;
    if (!origin)
      throw errors.forbidden("This request has no Origin header; it must come from Sigmacube's own pages.");
    if (origin !== allowedOrigin()) {
      throw errors.forbidden(
        `Requests from ${origin} are not accepted; open Sigmacube at ${allowedOrigin()}.`,
      );
    }
    next();
  };
}

import type { RequestHandler } from "express";
import { isLoopback } from "../../env";
import { errors } from "../../errors";

/** The paths of the development mailbox: the page (served by the app's history fallback) and its API. */
export const MAILBOX_PATHS = ["/api/dev/mailbox", "/dev/mailbox"];

/**
 * The fake mailbox holds password-reset and invitation links: whoever reads it can take
 * an account over. Only a client on this machine may, judged by the socket's own remote
 * address (never X-Forwarded-For, which the client writes). Everyone else gets the same
 * 404 as for a path that does not exist.
 */
export const loopbackOnly: RequestHandler = (req, _res, next) => {
  const address = req.socket.remoteAddress;
  if (address && isLoopback(address)) return next();
  next(errors.notFound("This page"));
};
